import { describe, expect, it } from 'vitest';
import type { Rhs } from './integrator.js';
import { StiffIntegrator } from './stiff-integrator.js';

// Test problems with closed-form solutions (Hairer & Wanner, Solving ODEs II, §IV.1 and IV.9:
// a stiff linear equation relaxing onto a smooth solution; and the harmonic oscillator).
describe('StiffIntegrator (linearly implicit Euler extrapolation)', () => {
  it('follows the smooth solution cos t of y′ = −λ(y − cos t) − sin t for λ = 1e6 with few steps (L-stable)', () => {
    // autonomous form: y0 = y, y1 = t (the time), y2 = ∫y dt (explicit, no feedback)
    const lam = 1e6;
    const f: Rhs = (_t, y, dy) => {
      dy[0] = -lam * (y[0] - Math.cos(y[1])) - Math.sin(y[1]);
      dy[1] = 1;
      dy[2] = y[0];
    };
    const g = new StiffIntegrator();
    let last = new Float64Array(3);
    let worstDense = 0;
    const out = new Float64Array(3);
    const r = g.integrate(
      f,
      0,
      Float64Array.from([1, 0, 0]),
      3,
      (s) => {
        last = Float64Array.from(s.y1);
        for (let q = 1; q < 4; q++) {
          const tt = s.t0 + ((s.t1 - s.t0) * q) / 4;
          s.dense(tt, out);
          worstDense = Math.max(worstDense, Math.abs(out[0] - Math.cos(tt)));
        }
        return true;
      },
      { relTol: 1e-9, absTol: Float64Array.from([1e-10, 1e-10, 1e-10]), maxSteps: 5000, denseCount: 2, implicit: [0, 1] },
    );
    expect(r.outcome).toBe('done');
    expect(Math.abs(last[0] - Math.cos(3))).toBeLessThan(1e-8);
    expect(Math.abs(last[2] - Math.sin(3))).toBeLessThan(1e-8); // ∫cos = sin
    expect(worstDense).toBeLessThan(1e-7);
    // an explicit method would need ~λ·3 = 3e6 steps here
    expect(r.steps).toBeLessThan(300);
  });

  it('integrates the harmonic oscillator over 5 periods to ≤ 1e-7 at relTol 1e-10 (closed form cos ωt), dense output too', () => {
    const omega = 2 * Math.PI * 50;
    const f: Rhs = (_t, y, dy) => {
      dy[0] = y[1];
      dy[1] = -omega * omega * y[0];
    };
    const g = new StiffIntegrator();
    let yEnd = 0;
    let worst = 0;
    const out = new Float64Array(2);
    g.integrate(
      f,
      0,
      Float64Array.from([1, 0]),
      0.1,
      (s) => {
        yEnd = s.y1[0];
        for (let q = 1; q < 6; q++) {
          const tt = s.t0 + ((s.t1 - s.t0) * q) / 6;
          s.dense(tt, out);
          worst = Math.max(worst, Math.abs(out[0] - Math.cos(omega * tt)));
        }
        return true;
      },
      { relTol: 1e-10, absTol: Float64Array.from([1e-10, 1e-10 * omega]), maxSteps: 20000 },
    );
    expect(Math.abs(yEnd - Math.cos(omega * 0.1))).toBeLessThan(1e-7);
    expect(worst).toBeLessThan(1e-7);
  });

  it('stops when the observer returns false and reports the step limit', () => {
    const f: Rhs = (_t, y, dy) => {
      dy[0] = -y[0];
    };
    const g = new StiffIntegrator();
    const o = { relTol: 1e-9, absTol: Float64Array.from([1e-12]), maxSteps: 1000 };
    let c = 0;
    expect(g.integrate(f, 0, Float64Array.from([1]), 10, () => ++c < 2, o).outcome).toBe('stopped');
    expect(g.integrate(f, 0, Float64Array.from([1]), 10, () => true, { ...o, maxSteps: 3 }).outcome).toBe('step-limit');
  });
});
