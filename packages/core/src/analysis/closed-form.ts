/**
 * Closed-form responses used as independent oracles for the discharge engine (tests and
 * benchmarks). They share no code with the engine.
 *
 * Series RLC natural response of a capacitor charged to V0 discharging into R and L
 * (Nilsson & Riedel, *Electric Circuits*, natural response of the series RLC circuit):
 *   α = R/(2L), ω0 = 1/√(LC)
 *   underdamped (α < ω0):  ωd = √(ω0² − α²)
 *     i(t) = V0/(ωd·L)·e^(−αt)·sin(ωd·t),  v(t) = V0·e^(−αt)·(cos ωd·t + (α/ωd)·sin ωd·t)
 *     peak at t_p = atan(ωd/α)/ωd, first current zero at π/ωd
 *   critically damped (α = ω0):  i(t) = (V0/L)·t·e^(−αt), v(t) = V0·e^(−αt)·(1 + αt), peak at 1/α
 *   overdamped (α > ω0):  s1,2 = −α ± √(α² − ω0²)
 *     i(t) = V0/(L·(s1 − s2))·(e^(s1 t) − e^(s2 t)),  v(t) = V0·(s1·e^(s2 t) − s2·e^(s1 t))/(s1 − s2)
 *     peak at t_p = ln(s2/s1)/(s1 − s2)
 * (v follows from i = −C·dv/dt with v(0) = V0.)
 *
 * First-order RL decay with a constant opposing drop V_d (freewheel through a diode
 * V_F0 + r_F·i; R' = R + r_F): L·di/dt = −R'·i − V_d, i(0) = I0 (same texts, first-order
 * natural response plus a constant source):
 *   i(t) = (I0 + V_d/R')·e^(−t·R'/L) − V_d/R'
 */

export type Damping = 'underdamped' | 'critically damped' | 'overdamped';

export interface SeriesRlcResponse {
  damping: Damping;
  alpha_per_s: number;
  omega0_radps: number;
  /** Damped angular frequency (underdamped), else 0. */
  omegaD_radps: number;
  current_A(t: number): number;
  capacitorVoltage_V(t: number): number;
  peakTime_s: number;
  peakCurrent_A: number;
  /** First current zero after t = 0 (underdamped), else Infinity. */
  firstZero_s: number;
}

/**
 * @param relCritical |α − ω0|/ω0 below which the response is taken as critically damped
 */
export function seriesRlcClosedForm(p: { C_F: number; L_H: number; R_Ohm: number; V0_V: number }, relCritical = 0): SeriesRlcResponse {
  const { C_F: C, L_H: L, R_Ohm: R, V0_V: V0 } = p;
  const a = R / (2 * L);
  const w0 = 1 / Math.sqrt(L * C);
  if (Math.abs(a - w0) <= relCritical * w0) {
    const cur = (t: number) => (V0 / L) * t * Math.exp(-a * t);
    return {
      damping: 'critically damped',
      alpha_per_s: a,
      omega0_radps: w0,
      omegaD_radps: 0,
      current_A: cur,
      capacitorVoltage_V: (t) => V0 * Math.exp(-a * t) * (1 + a * t),
      peakTime_s: 1 / a,
      peakCurrent_A: cur(1 / a),
      firstZero_s: Infinity,
    };
  }
  if (a < w0) {
    const wd = Math.sqrt(w0 * w0 - a * a);
    const cur = (t: number) => (V0 / (wd * L)) * Math.exp(-a * t) * Math.sin(wd * t);
    const tp = Math.atan2(wd, a) / wd;
    return {
      damping: 'underdamped',
      alpha_per_s: a,
      omega0_radps: w0,
      omegaD_radps: wd,
      current_A: cur,
      capacitorVoltage_V: (t) => V0 * Math.exp(-a * t) * (Math.cos(wd * t) + (a / wd) * Math.sin(wd * t)),
      peakTime_s: tp,
      peakCurrent_A: cur(tp),
      firstZero_s: Math.PI / wd,
    };
  }
  const r = Math.sqrt(a * a - w0 * w0);
  const s1 = -a + r;
  const s2 = -a - r;
  const cur = (t: number) => (V0 / (L * (s1 - s2))) * (Math.exp(s1 * t) - Math.exp(s2 * t));
  const tp = Math.log(s2 / s1) / (s1 - s2);
  return {
    damping: 'overdamped',
    alpha_per_s: a,
    omega0_radps: w0,
    omegaD_radps: 0,
    current_A: cur,
    capacitorVoltage_V: (t) => (V0 * (s1 * Math.exp(s2 * t) - s2 * Math.exp(s1 * t))) / (s1 - s2),
    peakTime_s: tp,
    peakCurrent_A: cur(tp),
    firstZero_s: Infinity,
  };
}

/** First-order RL decay with a constant opposing drop (freewheel through a diode). */
export function rlDecayWithDrop(p: { L_H: number; R_Ohm: number; drop_V: number; I0_A: number }): (t: number) => number {
  const { L_H: L, R_Ohm: R, drop_V: Vd, I0_A: I0 } = p;
  if (R === 0) return (t) => I0 - (Vd / L) * t;
  return (t) => (I0 + Vd / R) * Math.exp((-t * R) / L) - Vd / R;
}
