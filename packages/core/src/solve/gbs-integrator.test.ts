import { describe, expect, it } from 'vitest';
import { GbsIntegrator } from './gbs-integrator.js';
import type { Rhs } from './integrator.js';
import { OdexIntegrator } from './odex-integrator.js';

// Test problems with closed-form solutions (any ODE text, e.g. Hairer, Nørsett & Wanner,
// Solving ODEs I): harmonic oscillator y'' = −ω²y and linear decay y' = −λy.
const omega = 2 * Math.PI * 50;
const oscillator: Rhs = (_t, y, dy) => {
  dy[0] = y[1];
  dy[1] = -omega * omega * y[0];
};

describe('GbsIntegrator (ODEX extrapolation, allocation-free)', () => {
  it('integrates the harmonic oscillator over 5 periods to ≤ 1e-8 at relTol 1e-10 (closed form cos ωt)', () => {
    const g = new GbsIntegrator();
    const y0 = Float64Array.from([1, 0]);
    let yEnd = 0;
    const tEnd = 0.1;
    const r = g.integrate(oscillator, 0, y0, tEnd, (s) => ((yEnd = s.y1[0]), true), {
      relTol: 1e-10,
      absTol: Float64Array.from([1e-10, 1e-10 * omega]),
      maxSteps: 10_000,
    });
    expect(r.outcome).toBe('done');
    expect(Math.abs(yEnd - Math.cos(omega * tEnd))).toBeLessThan(1e-8);
    expect(r.steps).toBeGreaterThan(3);
  });

  it('dense output matches cos ωt inside every step to ≤ 1e-8 (Hairer–Ostermann dense output)', () => {
    const g = new GbsIntegrator();
    const out = new Float64Array(2);
    let worst = 0;
    g.integrate(
      oscillator,
      0,
      Float64Array.from([1, 0]),
      0.05,
      (s) => {
        for (let q = 1; q < 8; q++) {
          const t = s.t0 + ((s.t1 - s.t0) * q) / 8;
          s.dense(t, out);
          worst = Math.max(worst, Math.abs(out[0] - Math.cos(omega * t)));
        }
        return true;
      },
      { relTol: 1e-10, absTol: Float64Array.from([1e-10, 1e-10 * omega]), maxSteps: 10_000 },
    );
    expect(worst).toBeLessThan(1e-8);
  });

  it('stops when the observer returns false, and reports the step limit', () => {
    const g = new GbsIntegrator();
    const opts = { relTol: 1e-10, absTol: Float64Array.from([1e-10, 1e-8]), maxSteps: 10_000 };
    let calls = 0;
    expect(g.integrate(oscillator, 0, Float64Array.from([1, 0]), 1, () => ++calls < 3, opts).outcome).toBe('stopped');
    expect(calls).toBe(3);
    expect(g.integrate(oscillator, 0, Float64Array.from([1, 0]), 1, () => true, { ...opts, maxSteps: 5 }).outcome).toBe(
      'step-limit',
    );
  });

  it('agrees with the odex package (same algorithm) on y′ = −λy with a derivative jump-free solution', () => {
    const lam = 300;
    const decay: Rhs = (_t, y, dy) => {
      dy[0] = -lam * y[0];
      dy[1] = y[0];
    };
    const opts = { relTol: 1e-9, absTol: Float64Array.from([1e-12, 1e-12]), maxSteps: 10_000 };
    const ends: number[][] = [];
    for (const integ of [new GbsIntegrator(), new OdexIntegrator()]) {
      let last = [0, 0];
      integ.integrate(decay, 0, Float64Array.from([1, 0]), 0.02, (s) => ((last = [s.y1[0], s.y1[1]]), true), opts);
      ends.push(last);
    }
    const exact0 = Math.exp(-lam * 0.02);
    const exact1 = (1 - exact0) / lam;
    for (const e of ends) {
      expect(Math.abs(e[0] - exact0) / exact0).toBeLessThan(1e-7);
      expect(Math.abs(e[1] - exact1) / exact1).toBeLessThan(1e-9);
    }
    expect(Math.abs(ends[0][0] - ends[1][0]) / exact0).toBeLessThan(1e-7);
  });

  it('replays a step exactly when started with the logged step as initial step', () => {
    const g = new GbsIntegrator();
    const opts = { relTol: 1e-10, absTol: Float64Array.from([1e-10, 1e-8]), maxSteps: 10_000 };
    const log: { t0: number; t1: number; y0: number[]; y1: number[] }[] = [];
    let prev = [1, 0];
    g.integrate(oscillator, 0, Float64Array.from(prev), 0.03, (s) => {
      log.push({ t0: s.t0, t1: s.t1, y0: prev, y1: [s.y1[0], s.y1[1]] });
      prev = [s.y1[0], s.y1[1]];
      return true;
    }, opts);
    const k = 3;
    let y1: number[] = [];
    let steps = 0;
    g.integrate(oscillator, log[k].t0, Float64Array.from(log[k].y0), log[k].t1, (s) => ((y1 = [s.y1[0], s.y1[1]]), ++steps, true), {
      ...opts,
      initialStep: log[k].t1 - log[k].t0,
    });
    expect(steps).toBe(1);
    expect(Math.abs(y1[0] - log[k].y1[0])).toBeLessThan(1e-9);
  });
});
