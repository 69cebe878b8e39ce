import { describe, expect, it } from 'vitest';
import { symmetricEigen } from './symmetric-eigen.js';

describe('symmetricEigen(A): cyclic Jacobi', () => {
  it('the tridiagonal (−1, 2, −1) matrix has eigenvalues 2 − 2cos(kπ/(n + 1)) (closed form, 1e-12)', () => {
    const n = 12;
    const A = Array.from({ length: n }, (_, i) => Array.from({ length: n }, (_, j) => (i === j ? 2 : Math.abs(i - j) === 1 ? -1 : 0)));
    const { values } = symmetricEigen(A);
    for (let k = 1; k <= n; k++) expect(values[k - 1]).toBeCloseTo(2 - 2 * Math.cos((k * Math.PI) / (n + 1)), 12);
  });

  it('reconstructs a dense symmetric matrix: A·v = λ·v and the vectors are orthonormal (1e-11)', () => {
    const n = 30;
    const A = Array.from({ length: n }, (_, i) => Array.from({ length: n }, (_, j) => 1 / (1 + i + j) + (i === j ? 1 : 0)));
    const { values, vectors } = symmetricEigen(A);
    for (let k = 0; k < n; k++) {
      for (let i = 0; i < n; i++) {
        let s = 0;
        for (let j = 0; j < n; j++) s += A[i][j] * vectors[k][j];
        expect(Math.abs(s - values[k] * vectors[k][i])).toBeLessThan(1e-11);
      }
      for (let m = 0; m < n; m++) {
        let d = 0;
        for (let j = 0; j < n; j++) d += vectors[k][j] * vectors[m][j];
        expect(Math.abs(d - (k === m ? 1 : 0))).toBeLessThan(1e-11);
      }
    }
    for (let k = 1; k < n; k++) expect(values[k]).toBeGreaterThanOrEqual(values[k - 1]);
  });

  it('handles a diagonal matrix and a 1 × 1 matrix', () => {
    expect(symmetricEigen([[3, 0], [0, 1]]).values).toEqual([1, 3]);
    expect(symmetricEigen([[5]]).values).toEqual([5]);
  });
});
