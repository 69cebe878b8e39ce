/**
 * Test fixtures for the report renderers: a Station and a ShotResult built from the closed-form
 * natural response of a series RLC circuit (Nilsson & Riedel, Electric Circuits, natural response
 * of the series RLC circuit), so the renderers can be tested before and apart from the engine.
 *
 * Underdamped discharge, α = R/(2L), ω0 = 1/√(LC), ωd = √(ω0² − α²):
 *   i(t)   = V0/(ωd·L)·e^(−αt)·sin(ωd·t)
 *   v_C(t) = V0·e^(−αt)·(cos(ωd·t) + (α/ωd)·sin(ωd·t))
 * Without a diode the thyristor stops at the first current zero, t = π/ωd.
 * With an ideal freewheel diode at the bank end, the diode takes over when v_C reaches 0
 * (t1 = (π − atan(ωd/α))/ωd... solved as the first zero of v_C) and the load current then
 * decays as i(t1)·e^(−(t − t1)·R_load/L_load) (first-order RL natural response, same text).
 * Heating is adiabatic with constant R: ΔT = ∫i²R_coil dt / C_th (trapezoid on the samples).
 */
import type { Station } from '../../model/station.js';
import { DEFAULT_SOLVER } from '../../model/station.js';
import type { PhaseRecord, ShotResult, Warning } from '../../model/result.js';

const MU0 = 4e-7 * Math.PI;

export interface RlcOptions {
  capacitance_F?: number;
  voltage_V?: number;
  esr_Ohm?: number;
  cable_Ohm?: number;
  cable_H?: number;
  coil_H?: number;
  coil_Ohm?: number;
  heatCapacity_JpK?: number;
  /** Add an ideal freewheel diode at the bank end. */
  freewheel?: boolean;
  /** Field per ampere at probe 0; a second probe at 0.8 of it is added when `twoProbes`. */
  fieldPerAmpere?: number;
  twoProbes?: boolean;
  samples?: number;
  name?: string;
}

const DEF = {
  capacitance_F: 2.2e-3,
  voltage_V: 1600,
  esr_Ohm: 4e-3,
  cable_Ohm: 3e-3,
  cable_H: 1.5e-6,
  coil_H: 180e-6,
  coil_Ohm: 25e-3,
  heatCapacity_JpK: 2.1 * 385,
  freewheel: false,
  fieldPerAmpere: 95,
  twoProbes: false,
  samples: 400,
  name: 'Fixture test station (series RLC)',
};

export function rlcStation(opts: RlcOptions = {}): Station {
  const o = { ...DEF, ...opts };
  const probes = [{ name: o.twoProbes ? 'part surface' : 'part', coil_ApmPerA: o.fieldPerAmpere, loops_ApmPerA: [] }];
  if (o.twoProbes) probes.push({ name: 'part centre', coil_ApmPerA: 0.8 * o.fieldPerAmpere, loops_ApmPerA: [] });
  return {
    name: o.name,
    bank: { capacitance_F: o.capacitance_F, voltage_V: o.voltage_V, esr_Ohm: o.esr_Ohm, esl_H: 0 },
    switch: { kind: 'thyristor', thresholdVoltage_V: 0, slopeResistance_Ohm: 0 },
    freewheel: o.freewheel ? { position: 'bank', thresholdVoltage_V: 0, slopeResistance_Ohm: 0 } : null,
    cable: { resistance_Ohm: o.cable_Ohm, inductance_H: o.cable_H },
    coil: {
      inductance_H: o.coil_H,
      resistance20_Ohm: o.coil_Ohm,
      tempCoeff_perK: 0,
      heatCapacity_JpK: o.heatCapacity_JpK,
      initialTemperature_C: 20,
      conductor: 'copper',
    },
    coupled: [],
    loopMutual_H: [],
    probes,
    solver: { ...DEFAULT_SOLVER, samples: o.samples },
  };
}

/** Bisection for the first root of f in [a, b] (f(a), f(b) of opposite sign). */
function bisect(f: (t: number) => number, a: number, b: number): number {
  let fa = f(a);
  for (let k = 0; k < 200; k++) {
    const m = 0.5 * (a + b);
    const fm = f(m);
    if (fa * fm <= 0) b = m;
    else {
      a = m;
      fa = fm;
    }
  }
  return 0.5 * (a + b);
}

/** Composite Simpson rule on [a, b] with 2000 panels; f smooth on the open interval. */
function simpson(f: (t: number) => number, a: number, b: number): number {
  const m = 2000;
  const h = (b - a) / m;
  // evaluate just inside the ends so a step at a boundary takes the value of this phase
  const eps = h * 1e-9;
  let s = f(a + eps) + f(b - eps);
  for (let k = 1; k < m; k++) s += (k % 2 ? 4 : 2) * f(a + k * h);
  return (s * h) / 3;
}

export function rlcShot(opts: RlcOptions = {}, warnings: Warning[] = []): { station: Station; result: ShotResult } {
  const o = { ...DEF, ...opts };
  const station = rlcStation(opts);
  const C = o.capacitance_F;
  const V0 = o.voltage_V;
  const R = o.esr_Ohm + o.cable_Ohm + o.coil_Ohm;
  const L = o.cable_H + o.coil_H;
  const alpha = R / (2 * L);
  const w0 = 1 / Math.sqrt(L * C);
  if (alpha >= w0) throw new Error('fixture expects an underdamped circuit');
  const wd = Math.sqrt(w0 * w0 - alpha * alpha);
  const iRlc = (t: number) => (V0 / (wd * L)) * Math.exp(-alpha * t) * Math.sin(wd * t);
  const vRlc = (t: number) => V0 * Math.exp(-alpha * t) * (Math.cos(wd * t) + (alpha / wd) * Math.sin(wd * t));

  const phases: PhaseRecord[] = [];
  let iOf: (t: number) => number;
  let vOf: (t: number) => number;
  let swOf: (t: number) => number;
  let dOf: (t: number) => number;
  let tEnd: number;
  if (!o.freewheel) {
    tEnd = Math.PI / wd;
    phases.push({ name: 'discharge', start_s: 0, end_s: tEnd, endReason: 'current-zero' });
    iOf = (t) => (t <= tEnd ? iRlc(t) : 0);
    vOf = (t) => vRlc(Math.min(t, tEnd));
    swOf = iOf;
    dOf = () => 0;
  } else {
    const t1 = bisect(vRlc, 0, Math.PI / wd);
    const i1 = iRlc(t1);
    const Rl = o.cable_Ohm + o.coil_Ohm;
    const tau = L / Rl;
    // freewheel until the current has fallen to 1e-3 of i1 (fixture choice: "decayed")
    tEnd = t1 + tau * Math.log(1000);
    phases.push({ name: 'discharge', start_s: 0, end_s: t1, endReason: 'diode-on' });
    phases.push({ name: 'freewheel', start_s: t1, end_s: tEnd, endReason: 'decayed' });
    iOf = (t) => (t <= t1 ? iRlc(t) : i1 * Math.exp(-(t - t1) / tau));
    vOf = (t) => (t <= t1 ? vRlc(t) : 0);
    swOf = (t) => (t <= t1 ? iRlc(t) : 0);
    dOf = (t) => (t <= t1 ? 0 : iOf(t));
  }
  // samples spread evenly over each phase (every phase boundary is a sample, as the engine stores events)
  const per = Math.max(2, Math.floor(o.samples / phases.length));
  const t_s: number[] = [];
  for (const [k, ph] of phases.entries()) {
    for (let j = k === 0 ? 0 : 1; j < per; j++) t_s.push(ph.start_s + ((ph.end_s - ph.start_s) * j) / (per - 1));
  }
  const n = t_s.length;
  const coilCurrent_A = t_s.map(iOf);
  const capacitorVoltage_V = t_s.map(vOf);
  const switchCurrent_A = t_s.map(swOf);
  const diodeCurrent_A = t_s.map(dOf);
  const field_Apm = station.probes.map((p) => coilCurrent_A.map((i) => p.coil_ApmPerA * i));
  const coilTemperature_C: number[] = [20];
  let heat = 0;
  for (let j = 1; j < n; j++) {
    heat += 0.5 * (coilCurrent_A[j - 1] ** 2 + coilCurrent_A[j] ** 2) * (t_s[j] - t_s[j - 1]) * o.coil_Ohm;
    coilTemperature_C.push(20 + heat / o.heatCapacity_JpK);
  }
  let jPeak = 0;
  for (let j = 1; j < n; j++) if (coilCurrent_A[j] > coilCurrent_A[jPeak]) jPeak = j;
  const peak = coilCurrent_A[jPeak];
  const above = (frac: number) => {
    const idx = coilCurrent_A.map((i, j) => (i >= frac * peak ? j : -1)).filter((j) => j >= 0);
    return t_s[idx[idx.length - 1]] - t_s[idx[0]];
  };
  let vMin = 0;
  for (const v of capacitorVoltage_V) vMin = Math.min(vMin, v);
  // integrals of i² phase by phase with composite Simpson (2000 panels per phase) on the closed forms,
  // so a commutation step between two samples does not smear into the sums
  const sq = (f: (t: number) => number) => (t: number) => f(t) ** 2;
  const i2t = (f: (t: number) => number) => phases.reduce((acc, ph) => acc + simpson(sq(f), ph.start_s, ph.end_s), 0);
  const i2tSw = i2t(swOf);
  const i2tD = i2t(dOf);
  const initial = 0.5 * C * V0 * V0;
  const capFinal = 0.5 * C * capacitorVoltage_V[n - 1] ** 2;
  const indFinal = 0.5 * L * coilCurrent_A[n - 1] ** 2;
  const esr = o.esr_Ohm * i2tSw;
  const cable = o.cable_Ohm * i2t(iOf);
  const coil = o.coil_Ohm * i2t(iOf);
  const total = capFinal + indFinal + esr + cable + coil;
  const relErr = Math.abs(initial - total) / initial;
  let didt = 0;
  for (let j = 1; j < n; j++)
    didt = Math.max(didt, Math.abs(switchCurrent_A[j] - switchCurrent_A[j - 1]) / (t_s[j] - t_s[j - 1]));
  const result: ShotResult = {
    figures: {
      peakCurrent_A: peak,
      timeOfPeak_s: t_s[jPeak],
      pulseWidthHalfMax_s: above(0.5),
      timeAbove90pct_s: above(0.9),
      endOfPulse_s: tEnd,
      peakField_Apm: station.probes[0].coil_ApmPerA * peak,
      peakFluxDensity_T: MU0 * station.probes[0].coil_ApmPerA * peak,
      timeOfPeakField_s: t_s[jPeak],
      finalCapacitorVoltage_V: capacitorVoltage_V[n - 1],
      reverseVoltage_pct: (-vMin / V0) * 100,
      peakReverseVoltage_V: vMin,
      i2tSwitch_A2s: i2tSw,
      i2tDiode_A2s: i2tD,
      peakSwitchCurrent_A: Math.max(...switchCurrent_A),
      peakDiodeCurrent_A: Math.max(...diodeCurrent_A),
      peakDidt_Aps: didt,
      coilTemperatureRise_K: coilTemperature_C[n - 1] - 20,
      coilFinalTemperature_C: coilTemperature_C[n - 1],
      storedEnergy_J: initial,
      energyBalanceRelativeError: relErr,
    },
    phases,
    energy: {
      initial_J: initial,
      capacitorFinal_J: capFinal,
      inductorFinal_J: indFinal,
      dissipated_J: { esr, switch: 0, cable, coil, diode: 0, loops: [] },
      relativeError: relErr,
    },
    loops: [],
    probes: station.probes.map((p, k) => ({
      name: p.name,
      peakField_Apm: p.coil_ApmPerA * peak,
      timeOfPeak_s: t_s[jPeak] + 0 * k,
    })),
    waveform: {
      t_s,
      capacitorVoltage_V,
      coilCurrent_A,
      switchCurrent_A,
      diodeCurrent_A,
      loopCurrents_A: [],
      field_Apm,
      coilTemperature_C,
      loopTemperatures_C: [],
    },
    solver: {
      method: 'closed-form',
      steps: 0,
      rejectedSteps: 0,
      functionEvaluations: 0,
      events: phases.length,
      relTol: 0,
      absTol: 0,
      wallTime_s: 0,
    },
    warnings,
  };
  return { station, result };
}
