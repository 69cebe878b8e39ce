import { describe, expect, it } from 'vitest';
import { seriesRlcClosedForm } from '../analysis/closed-form.js';
import { makeStation, simulateChecked } from './shot.test-util.js';

const rel = (a: number, b: number) => Math.abs(a - b) / Math.abs(b);

describe('simulateShot: coil coupled to shorted loops', () => {
  const L1 = 200e-6;
  const L2 = 1e-6;
  const k = 0.6;
  const M = k * Math.sqrt(L1 * L2);
  const loop = (R: number) => ({
    name: 'ring',
    inductance_H: L2,
    mutualToCoil_H: M,
    resistance20_Ohm: R,
    tempCoeff_perK: 0,
    heatCapacity_JpK: 1,
    initialTemperature_C: 20,
  });

  for (const method of ['odex', 'stiff'] as const)
  it(`${method} integrator: a resistance-free loop reduces the coil inductance to L1·(1 − k²): series RLC closed form with that inductance (Nilsson & Riedel, coupled coils and natural response)`, () => {
    // A shorted loop without resistance keeps its flux linkage at zero: L2·i2 + M·i1 = 0, so the
    // coil sees L1 − M²/L2 = L1·(1 − k²). Tolerance 1e-6 as for the series RLC checks.
    const st = makeStation({ coupled: [loop(0)], solver: { samples: 201, method } });
    const r = simulateChecked(st);
    const cf = seriesRlcClosedForm({ C_F: 2e-3, L_H: L1 * (1 - k * k), R_Ohm: 0.05, V0_V: 1000 });
    expect(rel(r.figures.peakCurrent_A, cf.peakCurrent_A)).toBeLessThan(1e-6);
    expect(rel(r.figures.timeOfPeak_s, cf.peakTime_s)).toBeLessThan(1e-6);
    const w = r.waveform;
    for (let j = 0; j < w.t_s.length; j += 10) {
      // flux conservation in the loop: i2 = −(M/L2)·i1, to the integration tolerance
      expect(Math.abs(w.loopCurrents_A[0][j] + (M / L2) * w.coilCurrent_A[j])).toBeLessThan(1e-6 * (M / L2) * cf.peakCurrent_A);
    }
    expect(rel(r.loops[0].peakCurrent_A, (M / L2) * cf.peakCurrent_A)).toBeLessThan(1e-6);
  });

  it('a resistive loop takes energy (its loss is in the balance) and lowers the peak below the loop-free one', () => {
    const noLoop = simulateChecked(makeStation({ solver: { samples: 0 } }));
    const st = makeStation({ coupled: [loop(2e-3)], solver: { samples: 0 } });
    const r = simulateChecked(st);
    expect(r.energy.dissipated_J.loops[0]).toBeGreaterThan(0);
    expect(r.figures.peakCurrent_A).toBeLessThan(noLoop.figures.peakCurrent_A);
    expect(r.loops[0].temperatureRise_K).toBeCloseTo(r.energy.dissipated_J.loops[0] / 1, 9);
  });

  it('the field at a probe is coil_ApmPerA·i1 + Σ loops_ApmPerA·i_k (definition, Station.probes)', () => {
    const st = makeStation({
      coupled: [loop(2e-3)],
      probes: [
        { name: 'part', coil_ApmPerA: 100, loops_ApmPerA: [-40] },
        { name: 'edge', coil_ApmPerA: 50, loops_ApmPerA: [10] },
      ],
      solver: { samples: 101 },
    });
    const r = simulateChecked(st);
    const w = r.waveform;
    for (let j = 0; j < w.t_s.length; j += 7) {
      const i1 = w.coilCurrent_A[j];
      const i2 = w.loopCurrents_A[0][j];
      expect(w.field_Apm[0][j]).toBeCloseTo(100 * i1 - 40 * i2, 6);
      expect(w.field_Apm[1][j]).toBeCloseTo(50 * i1 + 10 * i2, 6);
    }
    // the peak field is located on the dense output: no sample exceeds it
    const maxSample = Math.max(...w.field_Apm[0].map(Math.abs));
    expect(r.figures.peakField_Apm).toBeGreaterThanOrEqual(maxSample * (1 - 1e-12));
    expect(r.probes[1].peakField_Apm).toBeGreaterThanOrEqual(Math.max(...w.field_Apm[1].map(Math.abs)) * (1 - 1e-12));
  });

  it('a stiff loop (τ = L2/R2 = 1 µs against a 1 ms pulse): stiff and odex integrators agree to 1e-6, auto picks stiff', () => {
    const fast = { ...loop(1e-6 / 1e-6), inductance_H: 1e-6, resistance20_Ohm: 1 }; // τ = 1 µs
    const base = makeStation({ coupled: [fast], diode: { position: 'fixture', thresholdVoltage_V: 0.9, slopeResistance_Ohm: 3e-4 }, esl: 0.2e-6, cableL: 1e-6, solver: { samples: 0 } });
    const a = simulateChecked({ ...base, solver: { ...base.solver, method: 'odex' } });
    const b = simulateChecked({ ...base, solver: { ...base.solver, method: 'stiff' } });
    const c = simulateChecked(base);
    expect(b.solver.method).toBe('stiff');
    expect(c.solver.method).toBe('stiff');
    expect(rel(b.figures.peakCurrent_A, a.figures.peakCurrent_A)).toBeLessThan(1e-6);
    expect(rel(b.figures.i2tDiode_A2s, a.figures.i2tDiode_A2s)).toBeLessThan(1e-6);
    expect(rel(b.loops[0].peakCurrent_A, a.loops[0].peakCurrent_A)).toBeLessThan(1e-6);
    expect(rel(b.figures.pulseWidthHalfMax_s, a.figures.pulseWidthHalfMax_s)).toBeLessThan(1e-6);
    // the explicit integrator is held to steps of a few µs by the loop; the stiff one is not
    expect(b.solver.steps).toBeLessThan(a.solver.steps / 5);
  });

  it('three mutually coupled loops with a freewheel diode: energy balance and loops decaying after the pulse', () => {
    const loops = [0, 1, 2].map((q) => ({
      name: `shell ${q}`,
      inductance_H: 0.5e-6 * (1 + q),
      mutualToCoil_H: 0.5 * Math.sqrt(L1 * 0.5e-6 * (1 + q)),
      resistance20_Ohm: 1e-3 * (1 + q),
      tempCoeff_perK: 0.004,
      heatCapacity_JpK: 2,
      initialTemperature_C: 25,
    }));
    const mutual = loops.map((a, p) =>
      loops.map((b, q) => (p === q ? 0 : 0.3 * Math.sqrt(a.inductance_H * b.inductance_H))),
    );
    const st = makeStation({
      coupled: loops,
      loopMutual: mutual,
      diode: { position: 'bank', thresholdVoltage_V: 0.8, slopeResistance_Ohm: 2e-4 },
      esl: 0.1e-6,
      cableL: 1e-6,
      cableR: 2e-3,
      probes: [{ name: 'part', coil_ApmPerA: 100, loops_ApmPerA: [-20, -15, -10] }],
      solver: { samples: 301 },
    });
    const r = simulateChecked(st);
    const last = r.waveform.loopCurrents_A.map((a) => Math.abs(a[a.length - 1]));
    for (const v of last) expect(v).toBeLessThan(1e-3 * r.loops[0].peakCurrent_A);
    expect(r.energy.dissipated_J.loops.every((e) => e > 0)).toBe(true);
  });
});
