import { describe, expect, it } from 'vitest';
import { invert, luDiagRecip, luFactor, luSolve, luSolveRecip } from './small-lu.js';

describe('luFactor / luSolve', () => {
  it('solves a 3×3 system that needs a row swap (exact answer by construction)', () => {
    // A·x = b with x = (1, −2, 3): b computed by hand
    const a = Float64Array.from([0, 2, 1, 1, 1, 1, 2, 0, 3]);
    const b = Float64Array.from([0 * 1 + 2 * -2 + 1 * 3, 1 - 2 + 3, 2 * 1 + 0 + 3 * 3]);
    const piv = new Int32Array(3);
    expect(luFactor(a, 3, piv)).toBe(true);
    luSolve(a, 3, piv, b);
    expect(Array.from(b).map((v) => Math.round(v * 1e12) / 1e12)).toEqual([1, -2, 3]);
  });

  it('luSolveRecip (reciprocal pivots) solves the same row-swapped 3×3 system (exact answer by construction)', () => {
    const a = Float64Array.from([0, 2, 1, 1, 1, 1, 2, 0, 3]);
    const b = Float64Array.from([0 * 1 + 2 * -2 + 1 * 3, 1 - 2 + 3, 2 * 1 + 0 + 3 * 3]);
    const piv = new Int32Array(3);
    const rdiag = new Float64Array(3);
    expect(luFactor(a, 3, piv)).toBe(true);
    luDiagRecip(a, 3, rdiag);
    luSolveRecip(a, 3, piv, rdiag, b);
    // one rounding per pivot more or less than luSolve: agree with the exact x to 1e-12
    expect(Array.from(b).map((v) => Math.round(v * 1e12) / 1e12)).toEqual([1, -2, 3]);
  });

  it('reports a singular matrix instead of throwing', () => {
    const a = Float64Array.from([1, 2, 2, 4]);
    expect(luFactor(a, 2, new Int32Array(2))).toBe(false);
  });

  it('inverts an SPD inductance-like matrix: A·A⁻¹ = I to 1e-14', () => {
    const m = 3;
    const a = Float64Array.from([2e-4, 5e-5, 1e-5, 5e-5, 1e-4, 2e-5, 1e-5, 2e-5, 5e-5]);
    const inv = new Float64Array(9);
    expect(invert(a, m, inv, new Float64Array(9), new Int32Array(3), new Float64Array(3))).toBe(true);
    for (let i = 0; i < m; i++) {
      for (let j = 0; j < m; j++) {
        let s = 0;
        for (let k = 0; k < m; k++) s += a[i * m + k] * inv[k * m + j];
        expect(Math.abs(s - (i === j ? 1 : 0))).toBeLessThan(1e-12);
      }
    }
  });
});
