/**
 * Estimate of the fraction of saturation a pulse reaches in a thermally demagnetized part.
 *
 * MODEL (an estimate, not a measurement): the part is an ensemble of grains/regions, each of
 * which switches to the field direction once the applied field exceeds its own switching field;
 * the switching fields follow a log-normal distribution (a Preisach-type switching-field
 * distribution). The normalized initial magnetization curve is then its cumulative
 * distribution, a function of h = H/H_sat only:
 *
 *   f(h) = Φ( ln(h)/σ + z_q ),   Φ(x) = ½·(1 + erf(x/√2)),   z_q = Φ⁻¹(q)
 *
 * H_sat is the grade's "field to saturate" (materials/magnet-grades.ts, or the datasheet),
 * read as the field that reaches the fraction q = 0.99 of full saturation, so f(1) = 0.99 by
 * construction. σ (the log-spread of switching fields) sets how gradual the curve is: broad for
 * nucleation-type magnets (sintered NdFeB, SmCo5, ferrite: walls move freely in a virgin magnet,
 * much of the magnetization comes at low fields), narrow for pinning-type (Sm2Co17, bonded
 * NdFeB: little happens until the pinning field is reached). The σ values below are
 * assumptions of this model chosen to give those shapes (typical, from memory), not data.
 *
 * ASSUMPTIONS: the part starts thermally demagnetized; H is the peak field at the part as
 * computed (eddy shielding is included only if the part's conductive shells are modelled);
 * the part's own demagnetizing field (−N·M) is NOT subtracted, which flatters short parts in
 * open coils; room temperature; one unipolar pulse. The number is for comparing designs and
 * spotting a shortfall; the grade's measured initial curve, when available, is the authority.
 */
import erf from '@stdlib/math-base-special-erf';
import type { CoercivityMechanism } from '../materials/magnet-grades.js';

/** Fraction of saturation that H_sat denotes (f(H_sat) = SATURATION_QUANTILE). */
export const SATURATION_QUANTILE = 0.99;

/** Φ⁻¹(0.99), the standard normal 99 % quantile (Abramowitz & Stegun Table 26.5: 2.326348). */
export const Z_99 = 2.3263478740408408;

/** Log-spread σ of the switching-field distribution per coercivity mechanism (model assumption). */
export const SWITCHING_SPREAD: Readonly<Record<CoercivityMechanism, number>> = {
  nucleation: 0.45,
  pinning: 0.2,
  shape: 0.35,
};

/** Standard normal cumulative distribution Φ(x). */
export function standardNormalCdf(x: number): number {
  return 0.5 * (1 + erf(x / Math.SQRT2));
}

/**
 * Estimated fraction of saturation (0..1) reached by a peak field H_Apm in a part whose
 * saturation field is saturationField_Apm, with log-spread sigma. Returns 0 for H ≤ 0 and NaN
 * for non-finite or non-positive parameters.
 */
export function saturationFraction(field_Apm: number, saturationField_Apm: number, sigma: number): number {
  if (!Number.isFinite(field_Apm) || !(saturationField_Apm > 0) || !(sigma > 0) || !Number.isFinite(sigma)) return Number.NaN;
  if (field_Apm <= 0) return 0;
  return standardNormalCdf(Math.log(field_Apm / saturationField_Apm) / sigma + Z_99);
}

/** One sentence stating the model, for verdict notes and reports. */
export function saturationModelNote(sigma: number): string {
  return (
    `Estimate: log-normal switching-field model f = Φ(ln(H/H_sat)/σ + 2.326), σ = ${sigma}, ` +
    'f(H_sat) = 99 %; thermally demagnetized start, part self-demagnetization not subtracted.'
  );
}
