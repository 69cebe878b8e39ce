/**
 * The yoke's nonlinear coil through the discharge engine (solve/shot.ts): energy balance with
 * the co-energy accounted for, an independent integration of the flux-linkage form of the
 * circuit equation, and the linear limit against the closed-form RLC discharge.
 */
import { describe, expect, it } from 'vitest';
import { simulateShot } from '../solve/shot.js';
import { DEFAULT_SOLVER, type Station } from '../model/station.js';
import { buildYokeCoil, yokeCurrentBound, type YokeCoil } from './yoke-coil.js';
import type { YokeSpec } from './yoke.js';
import { linearMaterial, steelCurve } from '../materials/steels.js';

const lowCarbon = steelCurve('low-carbon-steel')!;

/** Invented bench yoke (never an oracle). */
const spec: YokeSpec = {
  turns: 300,
  yoke: [
    { name: 'core', length_m: 0.08, area_m2: 6e-4, material: lowCarbon },
    { name: 'frame', length_m: 0.22, area_m2: 6e-4, material: steelCurve('cast-steel')! },
  ],
  poles: [{ name: 'tips', length_m: 0.02, area_m2: 1.2e-4, material: lowCarbon }],
  gaps: [{ name: 'clearance', length_m: 0.2e-3, area_m2: 1.2e-4 }],
  part: { length_m: 5e-3, area_m2: 1e-4, recoilPermeability: 1.05 },
  leakage: [{ name: 'sides', length_m: 0.025, area_m2: 12e-4 }],
};

function station(coil: YokeCoil, opts: { C: number; V0: number; R: number; Lext: number; tMax?: number; diode?: boolean }): Station {
  return {
    name: 'yoke bench (invented)',
    bank: { capacitance_F: opts.C, voltage_V: opts.V0, esr_Ohm: 0, esl_H: opts.Lext / 2 },
    switch: { kind: 'thyristor', thresholdVoltage_V: 0, slopeResistance_Ohm: 0 },
    freewheel: opts.diode ? { position: 'fixture', thresholdVoltage_V: 0.9, slopeResistance_Ohm: 0.5e-3 } : null,
    cable: { resistance_Ohm: 0, inductance_H: opts.Lext / 2 },
    coil: {
      inductance_H: coil.smallCurrentInductance_H,
      resistance20_Ohm: opts.R,
      tempCoeff_perK: 0, // constant R so that the independent integration below needs no heat model
      heatCapacity_JpK: 500,
      initialTemperature_C: 20,
      nonlinear: coil,
    },
    coupled: [],
    loopMutual_H: [],
    probes: [{ name: 'part', coil_ApmPerA: coil.smallCurrentFieldPerAmpere_ApmPerA, loops_ApmPerA: [] }],
    solver: { ...DEFAULT_SOLVER, tMax_s: opts.tMax ?? 1 },
  };
}

describe('yoke coil through the discharge engine', () => {
  const C = 2.2e-3;
  const V0 = 450;
  const coil = buildYokeCoil(spec, { maxCurrent_A: 1.25 * yokeCurrentBound(spec, C, V0) });

  it('closes the energy balance with the nonlinear inductor (energy conservation, ≤ 1e-6): whole shot with freewheel diode', () => {
    const r = simulateShot(station(coil, { C, V0, R: 0.3, Lext: 2e-6, diode: true }));
    expect(r.energy.relativeError).toBeLessThanOrEqual(1e-6);
    expect(r.figures.peakCurrent_A).toBeGreaterThan(0);
  });

  it('stops mid-pulse with energy still in the yoke: the stored energy is i·λ(i) − W′(i) + ½·L_ext·i² (magnetic energy of a nonlinear inductor, Fitzgerald & Kingsley ch. 3), and the balance closes', () => {
    const full = simulateShot(station(coil, { C, V0, R: 0.3, Lext: 2e-6 }));
    const tStop = 0.6 * full.figures.timeOfPeak_s;
    const r = simulateShot(station(coil, { C, V0, R: 0.3, Lext: 2e-6, tMax: tStop }));
    const w = r.waveform;
    const iEnd = w.coilCurrent_A[w.coilCurrent_A.length - 1];
    const expected = iEnd * coil.fluxLinkage_Wb(iEnd) - coil.coEnergy_J(iEnd) + 0.5 * 2e-6 * iEnd * iEnd;
    expect(r.energy.inductorFinal_J).toBeGreaterThan(0.05 * r.energy.initial_J);
    expect(Math.abs(r.energy.inductorFinal_J / expected - 1)).toBeLessThan(1e-9);
    expect(r.energy.relativeError).toBeLessThanOrEqual(1e-6);
    // ½·L0·i² would overstate it: the saturated coil stores less than its small-current inductance suggests
    expect(expected).toBeLessThan(0.5 * (coil.smallCurrentInductance_H + 2e-6) * iEnd * iEnd);
  });

  it('peak current and its time agree with an independent RK4 integration of dΛ/dt = v − R·i, dv/dt = −i/C with i recovered from Λ = L_ext·i + λ(i) (rel 1e-6)', () => {
    const R = 0.3;
    const Lext = 2e-6;
    const r = simulateShot(station(coil, { C, V0, R, Lext }));
    // Flux-linkage form, fixed-step classical RK4 (h = t_peak/20000, error O(h⁴) ≪ 1e-6).
    const current = (Lam: number): number => {
      let i = coil.current_A(Lam); // start from the coil alone, then Newton on L_ext·i + λ(i) = Λ
      for (let k = 0; k < 50; k++) {
        const f = Lext * i + coil.fluxLinkage_Wb(i) - Lam;
        const di = f / (Lext + coil.incrementalInductance_H(i));
        i -= di;
        if (Math.abs(di) <= 1e-14 * Math.max(1, Math.abs(i))) break;
      }
      return i;
    };
    const f = (s: [number, number]): [number, number] => {
      const i = current(s[0]);
      return [s[1] - R * i, -i / C];
    };
    const h = r.figures.timeOfPeak_s / 20000;
    let s: [number, number] = [0, V0];
    let t = 0;
    let best = { i: 0, t: 0 };
    let prev = { i: 0, t: 0 };
    for (let k = 0; k < 40000; k++) {
      const k1 = f(s);
      const k2 = f([s[0] + 0.5 * h * k1[0], s[1] + 0.5 * h * k1[1]]);
      const k3 = f([s[0] + 0.5 * h * k2[0], s[1] + 0.5 * h * k2[1]]);
      const k4 = f([s[0] + h * k3[0], s[1] + h * k3[1]]);
      s = [s[0] + (h / 6) * (k1[0] + 2 * k2[0] + 2 * k3[0] + k4[0]), s[1] + (h / 6) * (k1[1] + 2 * k2[1] + 2 * k3[1] + k4[1])];
      t += h;
      const i = current(s[0]);
      if (i > best.i) {
        prev = best;
        best = { i, t };
      } else if (best.t === t - h) {
        // one step past the maximum: parabola through the three samples around it
        const a = prev.i;
        const b = best.i;
        const c = i;
        const off = (0.5 * (a - c)) / (a - 2 * b + c);
        const iPk = b - 0.25 * (a - c) * off;
        expect(Math.abs(r.figures.peakCurrent_A / iPk - 1)).toBeLessThan(1e-6);
        expect(Math.abs(r.figures.timeOfPeak_s - (best.t + off * h)) / r.figures.timeOfPeak_s).toBeLessThan(1e-4);
        return;
      }
    }
    throw new Error('no current peak within the integration span');
  });

  it('linear limit: a yoke of near-ideal steel behaves as the series RLC of Nilsson & Riedel (peak V0/(ωd·L)·e^(−α·tp)·sin(ωd·tp), tp = atan(ωd/α)/ωd), rel 1e-6', () => {
    const ideal = linearMaterial(1e6, 'near-ideal steel');
    const lin: YokeSpec = { ...spec, yoke: [{ name: 'core', length_m: 0.3, area_m2: 6e-4, material: ideal }], poles: [] };
    const lc = buildYokeCoil(lin, { maxCurrent_A: 2000 });
    const L = lc.smallCurrentInductance_H;
    const R = 0.3;
    const r = simulateShot(station(lc, { C, V0, R, Lext: 0 }));
    const alpha = R / (2 * L);
    const wd = Math.sqrt(1 / (L * C) - alpha * alpha);
    const tp = Math.atan(wd / alpha) / wd;
    const ip = (V0 / (wd * L)) * Math.exp(-alpha * tp) * Math.sin(wd * tp);
    expect(Math.abs(r.figures.peakCurrent_A / ip - 1)).toBeLessThan(1e-6);
    expect(Math.abs(r.figures.timeOfPeak_s / tp - 1)).toBeLessThan(1e-6);
    // and the part field at the peak is the field per ampere times the peak current
    expect(Math.abs(r.figures.peakField_Apm / (lc.smallCurrentFieldPerAmpere_ApmPerA * ip) - 1)).toBeLessThan(1e-6);
  });

  it('saturation: the same bank gives less field per ampere of peak current than the small-current value (issue requirement)', () => {
    const r = simulateShot(station(coil, { C, V0, R: 0.3, Lext: 2e-6 }));
    console.log(
      `yoke shot: L0 ${(coil.smallCurrentInductance_H * 1e3).toFixed(3)} mH, Lsat ${(coil.saturatedInductance_H * 1e3).toFixed(3)} mH, ` +
        `peak ${r.figures.peakCurrent_A.toFixed(1)} A at ${(r.figures.timeOfPeak_s * 1e3).toFixed(3)} ms, peak field ${(r.figures.peakField_Apm / 1e6).toFixed(3)} MA/m, ` +
        `field/A ${(r.figures.peakField_Apm / r.figures.peakCurrent_A).toFixed(0)} vs small-current ${coil.smallCurrentFieldPerAmpere_ApmPerA.toFixed(0)} A/m/A, ` +
        `table ${coil.table.knots} knots, energy error ${r.energy.relativeError.toExponential(2)}, wall ${(r.solver.wallTime_s * 1e3).toFixed(0)} ms`,
    );
    expect(r.figures.peakField_Apm / r.figures.peakCurrent_A).toBeLessThan(0.9 * coil.smallCurrentFieldPerAmpere_ApmPerA);
  });
});
