import { describe, expect, it } from 'vitest';
import { seriesRlcClosedForm } from '../analysis/closed-form.js';
import { makeStation, simulateChecked } from './shot.test-util.js';

describe('simulateShot: bidirectional switch (ring-down, Nilsson & Riedel underdamped series RLC)', () => {
  const C = 2e-3;
  const L = 200e-6;
  const R = 0.05;
  const V0 = 1000;
  const cf = seriesRlcClosedForm({ C_F: C, L_H: L, R_Ohm: R, V0_V: V0 });

  it('rings as V0/(ωd L)·e^(−αt)·sin ωd t through the current zeros: zero spacing π/ωd, peak ratio e^(−απ/ωd)', () => {
    const halfPeriod = Math.PI / cf.omegaD_radps;
    const st = makeStation({ C, V0, L1: L, R1: R, sw: { kind: 'bidirectional' }, solver: { samples: 20001, tMax_s: 6 * halfPeriod } });
    const r = simulateChecked(st);
    // phases alternate discharge / reverse, each ending at a current zero π/ωd after the last
    // (tolerance 1e-6 relative: event location is 1e-12 s, integration relTol 1e-9)
    const ends = r.phases.filter((p) => p.endReason === 'switch-off').map((p) => p.end_s);
    expect(ends.length).toBeGreaterThanOrEqual(5);
    ends.forEach((t, q) => expect(Math.abs(t - (q + 1) * halfPeriod) / halfPeriod).toBeLessThan(1e-6));
    expect(r.phases[1].name).toBe('reverse');
    // successive extremes from the samples (spacing ωd·Δt ≈ 1e-3 rad: sampled maxima within
    // ~2e-7 of the true ones, hence 1e-5 on the ratio)
    const w = r.waveform;
    const peaks: number[] = [];
    for (let q = 0; q < 5; q++) {
      let m = 0;
      for (let j = 0; j < w.t_s.length; j++) {
        if (w.t_s[j] > q * halfPeriod && w.t_s[j] < (q + 1) * halfPeriod) m = Math.max(m, Math.abs(w.coilCurrent_A[j]));
      }
      peaks.push(m);
    }
    const ratio = Math.exp((-cf.alpha_per_s * Math.PI) / cf.omegaD_radps);
    for (let q = 1; q < peaks.length; q++) expect(Math.abs(peaks[q] / peaks[q - 1] - ratio) / ratio).toBeLessThan(1e-5);
    // waveform against the closed form, relative to the first peak
    for (let j = 0; j < w.t_s.length; j += 500) {
      expect(Math.abs(w.coilCurrent_A[j] - cf.current_A(w.t_s[j])) / cf.peakCurrent_A).toBeLessThan(1e-6);
    }
  });

  it('with an on-state threshold the ring stops at the first current zero where |v_C| no longer exceeds V_T0', () => {
    const vT0 = 150;
    const st = makeStation({ C, V0, L1: L, R1: R, sw: { kind: 'bidirectional', thresholdVoltage_V: vT0 }, solver: { samples: 0 } });
    const r = simulateChecked(st);
    const last = r.phases[r.phases.length - 1];
    expect(last.endReason).toBe('current-zero');
    expect(Math.abs(r.figures.finalCapacitorVoltage_V)).toBeLessThanOrEqual(vT0);
    expect(r.phases.length).toBeGreaterThan(1);
  });

  it('a thyristor does not ring: one discharge phase, the capacitor keeps its reverse voltage', () => {
    const r = simulateChecked(makeStation({ C, V0, L1: L, R1: R, solver: { samples: 0 } }));
    expect(r.phases.map((p) => p.name)).toEqual(['discharge']);
    expect(r.figures.reverseVoltage_pct).toBeCloseTo(-100 * cf.capacitorVoltage_V(cf.firstZero_s) / V0, 4);
  });
});
