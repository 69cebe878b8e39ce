import { describe, expect, it } from 'vitest';
import { brentZero } from './brent.js';

describe('brentZero(g, a, b, ga, gb, tol)', () => {
  it('finds √2 as the root of t² − 2 to the requested tolerance (closed form)', () => {
    const g = (t: number) => t * t - 2;
    const t = brentZero(g, 0, 2, g(0), g(2), 1e-14);
    expect(Math.abs(t - Math.SQRT2)).toBeLessThan(1e-13);
  });

  it('finds π/2 as the root of cos t (closed form), a root near the bracket end', () => {
    const t = brentZero(Math.cos, 0, Math.PI / 2 + 1e-9, 1, Math.cos(Math.PI / 2 + 1e-9), 1e-15);
    expect(Math.abs(t - Math.PI / 2)).toBeLessThan(1e-14);
  });

  it('returns the end with the smaller |g| when there is no sign change (no throw)', () => {
    const g = (t: number) => t + 1;
    expect(brentZero(g, 0, 1, g(0), g(1), 1e-12)).toBe(0);
  });

  it('handles a root with a steep side (exp(20 t) − 2) in few iterations', () => {
    let calls = 0;
    const g = (t: number) => {
      calls++;
      return Math.exp(20 * t) - 2;
    };
    const t = brentZero(g, 0, 1, g(0), g(1), 1e-15);
    expect(Math.abs(t - Math.log(2) / 20)).toBeLessThan(1e-14);
    expect(calls).toBeLessThan(40);
  });
});

describe("brentZero(..., side = 'nonpositive')", () => {
  it('returns a point where g ≤ 0 within tol of the root (event located on its triggered side)', () => {
    const g = (t: number) => 1 - t * t; // root at 1, g > 0 before
    const tol = 1e-12;
    const t = brentZero(g, 0, 3, g(0), g(3), tol, 100, 'nonpositive');
    expect(g(t)).toBeLessThanOrEqual(0);
    expect(Math.abs(t - 1)).toBeLessThanOrEqual(tol);
  });
});
