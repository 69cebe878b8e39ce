/**
 * Circuits and closed forms shared by the ngspice cross-checks (tests/reference/ngspice*.test.ts) and the
 * benchmarks (bench/).
 *
 * Closed form (Nilsson & Riedel, Electric Circuits, natural response of the series RLC circuit; REFERENCES.md):
 *   α = R/(2L), ω0 = 1/√(LC), capacitor charged to V0, current zero at t = 0.
 *   underdamped  (α < ω0): ωd = √(ω0² − α²), i(t) = V0/(ωd·L)·e^(−αt)·sin(ωd·t), peak at t_p = atan(ωd/α)/ωd,
 *                          v_C(t) = V0·e^(−αt)·(cos ωd·t + (α/ωd)·sin ωd·t); first current zero at π/ωd where
 *                          v_C = −V0·e^(−απ/ωd) (a thyristor stops there and the capacitor keeps that voltage).
 *   critically damped (α = ω0): i(t) = (V0/L)·t·e^(−αt), peak at 1/α.
 *   overdamped   (α > ω0): s1,2 = −α ± √(α² − ω0²), i(t) = V0/(L(s1 − s2))·(e^(s1 t) − e^(s2 t)),
 *                          peak at ln(s2/s1)/(s1 − s2); no current zero.
 * Freewheel decay (first-order RL natural response, same text), coil current I1 at t1 in a mesh of L and R
 * with a diode drop V_F0: i(t) = (I1 + V_F0/R)·e^(−(t − t1)R/L) − V_F0/R.
 *
 * The station values below are invented for the checks (an invented shop's "bench press segment fixture");
 * they are never oracles: the oracles are the closed forms above and ngspice.
 */
import type { Station } from '../../packages/core/src/model/station.js';
import { DEFAULT_SOLVER } from '../../packages/core/src/model/station.js';

/** Series RLC discharge: closed-form peak, its time, end of the first half-wave, and the waveform. */
export interface SeriesRlc {
  regime: 'underdamped' | 'critical' | 'overdamped';
  peakCurrent_A: number;
  timeOfPeak_s: number;
  /** First current zero (underdamped only; Infinity otherwise), s. */
  currentZero_s: number;
  /** Capacitor voltage at the first current zero (underdamped), V. */
  capacitorVoltageAtZero_V: number;
  current_A(t_s: number): number;
  capacitorVoltage_V(t_s: number): number;
}

export function seriesRlc(C_F: number, V0_V: number, R_Ohm: number, L_H: number): SeriesRlc {
  const alpha = R_Ohm / (2 * L_H);
  const w0 = 1 / Math.sqrt(L_H * C_F);
  const rel = (alpha - w0) / w0;
  if (Math.abs(rel) < 1e-12) {
    const tp = 1 / alpha;
    const current_A = (t: number) => (V0_V / L_H) * t * Math.exp(-alpha * t);
    return {
      regime: 'critical',
      peakCurrent_A: current_A(tp),
      timeOfPeak_s: tp,
      currentZero_s: Infinity,
      capacitorVoltageAtZero_V: NaN,
      current_A,
      // v_C = V0·e^(−αt)·(1 + αt) for the critically damped case (same text).
      capacitorVoltage_V: (t) => V0_V * Math.exp(-alpha * t) * (1 + alpha * t),
    };
  }
  if (alpha < w0) {
    const wd = Math.sqrt(w0 * w0 - alpha * alpha);
    const tp = Math.atan(wd / alpha) / wd;
    const current_A = (t: number) => (V0_V / (wd * L_H)) * Math.exp(-alpha * t) * Math.sin(wd * t);
    const tz = Math.PI / wd;
    return {
      regime: 'underdamped',
      peakCurrent_A: current_A(tp),
      timeOfPeak_s: tp,
      currentZero_s: tz,
      capacitorVoltageAtZero_V: -V0_V * Math.exp(-alpha * tz),
      current_A,
      capacitorVoltage_V: (t) => V0_V * Math.exp(-alpha * t) * (Math.cos(wd * t) + (alpha / wd) * Math.sin(wd * t)),
    };
  }
  const root = Math.sqrt(alpha * alpha - w0 * w0);
  const s1 = -alpha + root;
  const s2 = -alpha - root;
  const current_A = (t: number) => (V0_V / (L_H * (s1 - s2))) * (Math.exp(s1 * t) - Math.exp(s2 * t));
  const tp = Math.log(s2 / s1) / (s1 - s2);
  return {
    regime: 'overdamped',
    peakCurrent_A: current_A(tp),
    timeOfPeak_s: tp,
    currentZero_s: Infinity,
    capacitorVoltageAtZero_V: NaN,
    current_A,
    // v_C = V0/(s1 − s2)·(s1·e^(s2 t) − s2·e^(s1 t)) (same text).
    capacitorVoltage_V: (t) => (V0_V / (s1 - s2)) * (s1 * Math.exp(s2 * t) - s2 * Math.exp(s1 * t)),
  };
}

/** Freewheel decay of the coil current through a diode V_F0 + r_F·i (R includes r_F), from I1 at t1. */
export function freewheelCurrent_A(I1_A: number, t1_s: number, R_Ohm: number, L_H: number, VF0_V: number, t_s: number): number {
  const tail = VF0_V / R_Ohm;
  return (I1_A + tail) * Math.exp((-(t_s - t1_s) * R_Ohm) / L_H) - tail;
}

/** Parts of a station the checks vary; everything else gets a plain value. */
export interface StationSpec {
  name?: string;
  capacitance_F: number;
  voltage_V: number;
  esr_Ohm?: number;
  esl_H?: number;
  switch?: Station['switch'];
  freewheel?: Station['freewheel'];
  cableResistance_Ohm?: number;
  cableInductance_H?: number;
  coilInductance_H: number;
  coilResistance_Ohm: number;
  /** Temperature coefficient of the coil resistance (0: constant R, as ngspice models it). */
  coilTempCoeff_perK?: number;
  coupled?: Station['coupled'];
  loopMutual_H?: number[][];
  solver?: Partial<Station['solver']>;
}

/** A Station in SI built directly (no design file). */
export function makeStation(spec: StationSpec): Station {
  const coupled = spec.coupled ?? [];
  return {
    name: spec.name ?? 'reference check',
    bank: {
      capacitance_F: spec.capacitance_F,
      voltage_V: spec.voltage_V,
      esr_Ohm: spec.esr_Ohm ?? 0,
      esl_H: spec.esl_H ?? 0,
    },
    switch: spec.switch ?? { kind: 'thyristor', thresholdVoltage_V: 0, slopeResistance_Ohm: 0 },
    freewheel: spec.freewheel ?? null,
    cable: { resistance_Ohm: spec.cableResistance_Ohm ?? 0, inductance_H: spec.cableInductance_H ?? 0 },
    coil: {
      inductance_H: spec.coilInductance_H,
      resistance20_Ohm: spec.coilResistance_Ohm,
      tempCoeff_perK: spec.coilTempCoeff_perK ?? 0,
      heatCapacity_JpK: 800, // about 2.1 kg of copper × 385 J/(kg·K); irrelevant when tempCoeff = 0
      initialTemperature_C: 20,
      conductor: 'copper',
    },
    coupled,
    loopMutual_H: spec.loopMutual_H ?? coupled.map(() => coupled.map(() => 0)),
    probes: [{ name: 'part', coil_ApmPerA: 95, loops_ApmPerA: coupled.map(() => 0) }],
    solver: { ...DEFAULT_SOLVER, ...spec.solver },
  };
}

/**
 * The invented magnetizer used for the fluxkick-vs-ngspice check: 2.2 mF at 1.6 kV (2.8 kJ), ESR 4 mΩ, ESL 0.2 µH,
 * thyristor 1.2 V + 0.4 mΩ, freewheel diode at the fixture 0.9 V + 0.3 mΩ, cable 3 mΩ + 1.5 µH,
 * coil 180 µH + 25 mΩ with constant resistance (tempCoeff 0).
 */
export function magnetizerStation(overrides: Partial<StationSpec> = {}): Station {
  return makeStation({
    name: 'bench press segment fixture (invented)',
    capacitance_F: 2.2e-3,
    voltage_V: 1600,
    esr_Ohm: 4e-3,
    esl_H: 0.2e-6,
    switch: { kind: 'thyristor', thresholdVoltage_V: 1.2, slopeResistance_Ohm: 0.4e-3 },
    freewheel: { position: 'fixture', thresholdVoltage_V: 0.9, slopeResistance_Ohm: 0.3e-3 },
    cableResistance_Ohm: 3e-3,
    cableInductance_H: 1.5e-6,
    coilInductance_H: 180e-6,
    coilResistance_Ohm: 25e-3,
    coilTempCoeff_perK: 0,
    ...overrides,
  });
}

/** Series loop totals of a station without a freewheel diode and with zero device thresholds: R and L of the closed form. */
export function seriesTotals(station: Station): { R_Ohm: number; L_H: number } {
  return {
    R_Ohm: station.bank.esr_Ohm + station.switch.slopeResistance_Ohm + station.cable.resistance_Ohm + station.coil.resistance20_Ohm,
    L_H: station.bank.esl_H + station.cable.inductance_H + station.coil.inductance_H,
  };
}

/**
 * Eight (or `count`) coupled loops for the engine checks and benchmarks: a conductive cylindrical part of radius
 * `partRadius_m` inside the coil, cut into `count` concentric shells of equal thickness, all of the coil's length.
 * Long-solenoid approximation (each shell a one-turn solenoid of its mean radius r_k, coil of N turns at radius R_c):
 *   L_k = µ0·π·r_k²/ℓ, M_jk = µ0·π·min(r_j, r_k)²/ℓ, M_1k = N·µ0·π·r_k²/ℓ, R_k = ρ·2π·r_k/(ℓ·Δr),
 *   field at the part centre per ampere: coil N/ℓ, each shell 1/ℓ.
 * The matrix is positive definite when R_c > every r_k (distinct radii). The numbers are invented; the
 * approximation only has to give a consistent, physical-looking coupled network (oracles are ngspice and
 * conservation, not these values).
 */
export function eddyShellLoops(opts: {
  count?: number;
  coilInductance_H?: number;
  coilRadius_m?: number;
  length_m?: number;
  partRadius_m?: number;
  resistivity_OhmM?: number;
} = {}): { coupled: Station['coupled']; loopMutual_H: number[][]; coilField_ApmPerA: number; loopField_ApmPerA: number[] } {
  const mu0 = 4e-7 * Math.PI;
  const count = opts.count ?? 8;
  const L1 = opts.coilInductance_H ?? 180e-6;
  const Rc = opts.coilRadius_m ?? 0.03;
  const len = opts.length_m ?? 0.05;
  const a = opts.partRadius_m ?? 0.02;
  const rho = opts.resistivity_OhmM ?? 1.5e-6; // sintered NdFeB, 1.4–1.6 µΩ·m (REFERENCES.md, typical)
  const perTurn2 = (mu0 * Math.PI * Rc * Rc) / len;
  const N = Math.sqrt(L1 / perTurn2);
  const dr = a / count;
  const radii = Array.from({ length: count }, (_, k) => (k + 0.5) * dr);
  const coupled = radii.map((r, k) => ({
    name: `part shell ${k + 1}`,
    inductance_H: (mu0 * Math.PI * r * r) / len,
    mutualToCoil_H: (N * mu0 * Math.PI * r * r) / len,
    resistance20_Ohm: (rho * 2 * Math.PI * r) / (len * dr),
    tempCoeff_perK: 0,
    heatCapacity_JpK: 7500 * 440 * 2 * Math.PI * r * dr * len, // density 7500 kg/m³, 440 J/(kg·K), typical
    initialTemperature_C: 20,
  }));
  const loopMutual_H = radii.map((rj, j) => radii.map((rk, k) => (j === k ? 0 : (mu0 * Math.PI * Math.min(rj, rk) ** 2) / len)));
  return { coupled, loopMutual_H, coilField_ApmPerA: N / len, loopField_ApmPerA: radii.map(() => 1 / len) };
}

/** The magnetizer station with `count` eddy shells in the part (constant resistances), probe 0 at the part centre. */
export function magnetizerWithShells(count = 8, overrides: Partial<StationSpec> = {}): Station {
  const shells = eddyShellLoops({ count });
  const st = magnetizerStation({ coupled: shells.coupled, loopMutual_H: shells.loopMutual_H, ...overrides });
  st.probes = [{ name: 'part centre', coil_ApmPerA: shells.coilField_ApmPerA, loops_ApmPerA: shells.loopField_ApmPerA }];
  return st;
}
