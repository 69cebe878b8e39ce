/**
 * Surge and I²t duty of thyristors and diodes, rated on a single half-sine pulse.
 *
 * RATING BASIS. A thyristor's or rectifier diode's non-repetitive surge current I_TSM (I_FSM) is
 * given for one half-sine of 10 ms (50 Hz mains) or 8.3 ms (60 Hz); the fusing integral of that
 * pulse is (REFERENCES.md)
 *   I²t = I_TSM²·t_base/2              (∫ sin² over a half period = t/2)
 *
 * EQUIVALENT HALF-SINE. A magnetizing pulse is not a half-sine. We replace it by the half-sine
 * with the same peak Ip and the same I²t, whose base is
 *   t_eq = 2·I²t/Ip²
 * (an approximation: it keeps the two quantities the rating limits).
 *
 * SCALING RULE (an approximation, common practice): the equal-I²t rule, the surge current
 * allowed for a half-sine of base t is the one that has the rated I²t:
 *   I_allowed(t) = I_TSM·√(t_base/t)
 * It is applied only down to a floor t_floor (default 1 ms, the shortest time surge curves
 * commonly cover, common practice): for shorter pulses the allowed current stays at
 * I_TSM·√(t_base/t_floor), because makers' curves show the I²t capability falling for very
 * short pulses and the rule would overstate it. For pulses longer than t_base it lowers the
 * allowed current, which is on the safe side. The maker's surge curve, when available,
 * replaces all of this.
 */

import type { SurgeBasis } from '../model/judge-inputs.js';

export type { SurgeBasis };

/** Base duration of a surge basis, s (half a period of 50 Hz or 60 Hz). */
export function surgeBasisDuration_s(basis: SurgeBasis): number {
  return basis === '10ms' ? 0.01 : 1 / 120;
}

/** I²t of a half-sine of peak I and base t: I²·t/2, A²s. */
export function halfSineI2t_A2s(peak_A: number, base_s: number): number {
  return (peak_A * peak_A * base_s) / 2;
}

/** Base of the half-sine with the same peak and I²t: 2·I²t/Ip², s. NaN unless Ip > 0. */
export function equivalentHalfSineDuration_s(peak_A: number, i2t_A2s: number): number {
  if (!(Math.abs(peak_A) > 0)) return Number.NaN;
  return (2 * i2t_A2s) / (peak_A * peak_A);
}

/** Shortest pulse the equal-I²t rule is applied to, s (default; common practice). */
export const DEFAULT_SURGE_FLOOR_s = 1e-3;

/**
 * Surge current allowed for a half-sine of base pulse_s, by the equal-I²t rule floored at
 * floor_s: I_TSM·√(t_base/max(t, t_floor)). A.
 */
export function allowedSurgeCurrent_A(
  surgeRating_A: number,
  base_s: number,
  pulse_s: number,
  floor_s: number = DEFAULT_SURGE_FLOOR_s,
): number {
  if (!(pulse_s > 0)) return Number.NaN;
  return surgeRating_A * Math.sqrt(base_s / Math.max(pulse_s, floor_s));
}

/** Rated I²t: the given value, or the half-sine relation from the surge rating. */
export function ratedI2t_A2s(surgeRating_A: number, base_s: number, given_A2s?: number): number {
  return given_A2s ?? halfSineI2t_A2s(surgeRating_A, base_s);
}
