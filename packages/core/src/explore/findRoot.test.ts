import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { findRoot } from './findRoot.js';

describe('findRoot(f, a, b) by Brent’s method', () => {
  it('finds the real root of x³ − 2x − 5 (Wallis’s cubic) to the stated x tolerance, checked against Cardano’s closed form', () => {
    // Depressed cubic t³ + p·t + q = 0 with p = −2, q = −5; one real root (discriminant > 0):
    // t = cbrt(−q/2 + √(q²/4 + p³/27)) + cbrt(−q/2 − √(q²/4 + p³/27))  (Cardano's formula).
    const p = -2;
    const q = -5;
    const disc = Math.sqrt((q * q) / 4 + (p * p * p) / 27);
    const exact = Math.cbrt(-q / 2 + disc) + Math.cbrt(-q / 2 - disc);
    const xTol = 1e-10;
    const r = findRoot((x) => x ** 3 - 2 * x - 5, 2, 3, { xTol });
    expect(r.converged).toBe(true);
    // Stated guarantee: within 2·(2ε|x| + xTol/2) of the root.
    expect(Math.abs(r.x - exact)).toBeLessThanOrEqual(xTol + 4 * Number.EPSILON * exact);
    expect(r.bracket[0]).toBeLessThanOrEqual(exact + 1e-15);
    expect(r.bracket[1]).toBeGreaterThanOrEqual(exact - 1e-15);
  });

  it('finds √2 from x² − 2 and e from ln x − 1 to machine precision with the default tolerance (closed forms)', () => {
    expect(findRoot((x) => x * x - 2, 0, 2).x).toBeCloseTo(Math.SQRT2, 11);
    expect(Math.abs(findRoot((x) => Math.log(x) - 1, 1, 4).x - Math.E)).toBeLessThan(1e-11);
  });

  it('solves for the charge voltage that gives a target peak current of an underdamped series RLC discharge (Nilsson & Riedel, natural response)', () => {
    // i(t) = V0/(ωd·L)·e^(−αt)·sin(ωd·t), peak at t_p = atan(ωd/α)/ωd: the peak is V0 times a constant,
    // so the voltage for a target current has the closed form V = I_target / (i_peak per volt).
    const R = 0.05;
    const L = 200e-6;
    const C = 2.2e-3;
    const alpha = R / (2 * L);
    const wd = Math.sqrt(1 / (L * C) - alpha * alpha);
    const tp = Math.atan(wd / alpha) / wd;
    const peakPerVolt = (Math.exp(-alpha * tp) * Math.sin(wd * tp)) / (wd * L);
    const target = 12_000;
    const exact = target / peakPerVolt;
    const xTol = 1e-6; // 1 µV on a kilovolt scale
    const r = findRoot((v) => v * peakPerVolt - target, 10, 10_000, { xTol });
    expect(r.converged).toBe(true);
    expect(Math.abs(r.x - exact)).toBeLessThanOrEqual(xTol);
  });

  it('stops on the f tolerance when |f(x)| ≤ fTol', () => {
    const fTol = 1e-3;
    const r = findRoot((x) => Math.atan(x - 0.3), -5, 7, { fTol, xTol: 0 });
    expect(r.converged).toBe(true);
    expect(r.reason).toMatch(/tolerance|exact/);
    expect(Math.abs(r.fx)).toBeLessThanOrEqual(fTol);
  });

  it('never needs more evaluations than about the square of the bisection count, even at a triple root (Brent’s bound)', () => {
    const xTol = 1e-9;
    const r = findRoot((x) => (x - 1 / 3) ** 3, -1, 2, { xTol });
    expect(r.converged).toBe(true);
    expect(Math.abs(r.x - 1 / 3)).toBeLessThanOrEqual(xTol + 1e-15);
    const bisections = Math.ceil(Math.log2(3 / xTol));
    expect(r.evaluations).toBeLessThanOrEqual(bisections * bisections);
  });

  it('reports a bracket without a sign change instead of throwing', () => {
    const r = findRoot((x) => x * x + 1, -1, 2);
    expect(r.converged).toBe(false);
    expect(r.reason).toBe('no-sign-change');
  });

  it('stops on NaN from f and says so', () => {
    const r = findRoot((x) => (x > 0.5 ? NaN : x - 1), 0, 1);
    expect(r.converged).toBe(false);
    expect(r.reason).toBe('nan');
  });

  it('returns an endpoint that is an exact root without iterating', () => {
    const r = findRoot((x) => x - 2, 2, 5);
    expect(r).toMatchObject({ x: 2, converged: true, reason: 'exact', iterations: 0 });
  });

  it('meets the stated x tolerance for any linear f with its root inside the bracket (property)', () => {
    fc.assert(
      fc.property(
        fc.double({ min: -1e3, max: 1e3, noNaN: true }),
        fc.double({ min: 1e-3, max: 1e3, noNaN: true }),
        fc.double({ min: 1e-3, max: 1e3, noNaN: true }),
        fc.double({ min: 0.01, max: 100, noNaN: true }),
        (root, left, right, slope) => {
          const xTol = 1e-9;
          const r = findRoot((x) => slope * (x - root), root - left, root + right, { xTol });
          const allowed = xTol + 4 * Number.EPSILON * Math.max(Math.abs(root), left, right);
          return r.converged && Math.abs(r.x - root) <= allowed;
        },
      ),
    );
  });
});
