import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import type { Station } from '../model/station.js';
import { simulateShot } from './shot.js';
import { makeStation, simulateChecked } from './shot.test-util.js';

/** Cholesky test of positive definiteness (an inductance matrix must be). */
function positiveDefinite(a: number[][]): boolean {
  const n = a.length;
  const l = a.map((r) => r.map(() => 0));
  for (let i = 0; i < n; i++) {
    for (let j = 0; j <= i; j++) {
      let s = a[i][j];
      for (let k = 0; k < j; k++) s -= l[i][k] * l[j][k];
      if (i === j) {
        if (!(s > 0)) return false;
        l[i][i] = Math.sqrt(s);
      } else l[i][j] = s / l[j][j];
    }
  }
  return true;
}

const loopArb = fc.record({
  L: fc.double({ min: 0.2e-6, max: 5e-6, noNaN: true }),
  R: fc.double({ min: 0.2e-3, max: 10e-3, noNaN: true }),
  k: fc.double({ min: 0, max: 0.55, noNaN: true }),
  h: fc.double({ min: -50, max: 50, noNaN: true }),
});

const stationArb = fc
  .record({
    C: fc.double({ min: 0.2e-3, max: 10e-3, noNaN: true }),
    V0: fc.double({ min: 100, max: 3000, noNaN: true }),
    // realistic floors on the losses between switch and diode (a lossless source loop with a
    // bidirectional switch rings for ever, one phase per half-cycle); ideal devices are covered by
    // the closed-form tests
    esr: fc.double({ min: 0.5e-3, max: 10e-3, noNaN: true }),
    esl: fc.constantFrom(0, 0.05e-6, 0.3e-6),
    sw: fc.record({
      kind: fc.constantFrom('thyristor' as const, 'bidirectional' as const),
      thresholdVoltage_V: fc.double({ min: 0.5, max: 2, noNaN: true }),
      slopeResistance_Ohm: fc.double({ min: 0, max: 1e-3, noNaN: true }),
    }),
    diode: fc.option(
      fc.record({
        position: fc.constantFrom('bank' as const, 'fixture' as const),
        thresholdVoltage_V: fc.double({ min: 0.3, max: 1.5, noNaN: true }),
        slopeResistance_Ohm: fc.double({ min: 0, max: 1e-3, noNaN: true }),
      }),
      { nil: null },
    ),
    cableR: fc.double({ min: 0, max: 10e-3, noNaN: true }),
    cableL: fc.constantFrom(0, 0.5e-6, 3e-6),
    L1: fc.double({ min: 20e-6, max: 1e-3, noNaN: true }),
    R1: fc.double({ min: 5e-3, max: 0.2, noNaN: true }),
    alpha: fc.constantFrom(0, 0.00393),
    loops: fc.array(loopArb, { minLength: 0, maxLength: 3 }),
    kLoops: fc.double({ min: 0, max: 0.2, noNaN: true }),
    method: fc.constantFrom('auto' as const, 'odex' as const, 'stiff' as const),
  })
  .map((p) => {
    const coupled = p.loops.map((l, q) => ({
      name: `loop ${q}`,
      inductance_H: l.L,
      mutualToCoil_H: l.k * Math.sqrt(l.L * p.L1),
      resistance20_Ohm: l.R,
      tempCoeff_perK: 0.004,
      heatCapacity_JpK: 2,
      initialTemperature_C: 25,
    }));
    const loopMutual = p.loops.map((a, i) => p.loops.map((b, j) => (i === j ? 0 : p.kLoops * Math.sqrt(a.L * b.L))));
    const st = makeStation({
      C: p.C,
      V0: p.V0,
      esr: p.esr,
      esl: p.esl,
      sw: p.sw,
      diode: p.diode,
      cableR: p.cableR,
      cableL: p.cableL,
      L1: p.L1,
      R1: p.R1,
      alpha: p.alpha,
      cth: 500,
      coupled,
      loopMutual,
      probes: [{ name: 'part', coil_ApmPerA: 80, loops_ApmPerA: p.loops.map((l) => l.h) }],
      solver: { samples: 40, tMax_s: 0.2, method: p.method },
    });
    return st;
  })
  .filter((st: Station) => {
    const n = st.coupled.length;
    const m = [[st.coil.inductance_H, ...st.coupled.map((c) => c.mutualToCoil_H)]];
    for (let i = 0; i < n; i++) {
      m.push([st.coupled[i].mutualToCoil_H, ...st.coupled.map((c, j) => (i === j ? c.inductance_H : st.loopMutual_H[i][j]))]);
    }
    return positiveDefinite(m);
  });

describe('simulateShot: properties over random valid stations (fast-check, 30 runs each)', () => {
  it('energy balance ≤ 1e-6 and finite figures and waveform (conservation of energy; any diode position, switch kind, 0–3 loops, each integrator)', () => {
    fc.assert(
      fc.property(stationArb, (st) => {
        simulateChecked(st);
      }),
      { numRuns: 30, seed: 20240611 },
    );
  });

  it('peak current scales linearly with the charge voltage when device drops and heating are zero (linear circuit)', () => {
    fc.assert(
      fc.property(stationArb, fc.double({ min: 0.3, max: 3, noNaN: true }), (st0, factor) => {
        const linear: Station = {
          ...st0,
          switch: { ...st0.switch, thresholdVoltage_V: 0 },
          freewheel: st0.freewheel ? { ...st0.freewheel, thresholdVoltage_V: 0 } : null,
          coil: { ...st0.coil, tempCoeff_perK: 0 },
          coupled: st0.coupled.map((c) => ({ ...c, tempCoeff_perK: 0 })),
          solver: { ...st0.solver, samples: 0 },
        };
        const a = simulateShot(linear);
        const b = simulateShot({ ...linear, bank: { ...linear.bank, voltage_V: linear.bank.voltage_V * factor } });
        // relative 1e-6: both shots run at relTol 1e-9
        expect(Math.abs(b.figures.peakCurrent_A / (factor * a.figures.peakCurrent_A) - 1)).toBeLessThan(1e-6);
        expect(Math.abs(b.figures.timeOfPeak_s / a.figures.timeOfPeak_s - 1)).toBeLessThan(1e-6);
      }),
      { numRuns: 30, seed: 777 },
    );
  });
});
