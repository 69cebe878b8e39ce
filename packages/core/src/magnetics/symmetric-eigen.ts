/**
 * Eigenvalues and eigenvectors of a real symmetric matrix by the cyclic Jacobi method
 * (Golub & Van Loan, Matrix Computations, §8.5; Rutishauser's stable rotation formulas).
 *
 * Each sweep annihilates every off-diagonal element once with a plane rotation; convergence is
 * quadratic once the off-diagonal mass is small. Sweeps stop when the off-diagonal Frobenius
 * norm falls below 1e-15 × the matrix norm (or after 100 sweeps). Cost ≈ 4n³ flops per sweep,
 * about 6–10 sweeps: fine for the few hundred unknowns of an eddy-current network.
 */

export interface SymmetricEigen {
  /** Eigenvalues, ascending. */
  values: number[];
  /** vectors[k] is the unit eigenvector of values[k]. */
  vectors: number[][];
  sweeps: number;
}

/** Eigen-decomposition of the symmetric matrix A (only its values are read; A is not modified). */
export function symmetricEigen(A: readonly (readonly number[])[]): SymmetricEigen {
  const n = A.length;
  const a: Float64Array[] = A.map((row) => Float64Array.from(row));
  const v: Float64Array[] = Array.from({ length: n }, (_, i) => {
    const r = new Float64Array(n);
    r[i] = 1;
    return r;
  });
  let norm = 0;
  for (let i = 0; i < n; i++) for (let j = 0; j < n; j++) norm += a[i][j] * a[i][j];
  const tol = 1e-30 * norm;
  let sweeps = 0;
  for (; sweeps < 100; sweeps++) {
    let off = 0;
    for (let i = 0; i < n; i++) for (let j = i + 1; j < n; j++) off += 2 * a[i][j] * a[i][j];
    if (off <= tol) break;
    for (let p = 0; p < n - 1; p++) {
      for (let q = p + 1; q < n; q++) {
        const apq = a[p][q];
        if (apq === 0) continue;
        const theta = (a[q][q] - a[p][p]) / (2 * apq);
        const t = Math.sign(theta || 1) / (Math.abs(theta) + Math.sqrt(theta * theta + 1));
        const c = 1 / Math.sqrt(t * t + 1);
        const s = t * c;
        const tau = s / (1 + c);
        a[p][p] -= t * apq;
        a[q][q] += t * apq;
        a[p][q] = a[q][p] = 0;
        for (let k = 0; k < n; k++) {
          if (k !== p && k !== q) {
            const akp = a[k][p];
            const akq = a[k][q];
            const nkp = akp - s * (akq + tau * akp);
            const nkq = akq + s * (akp - tau * akq);
            a[k][p] = a[p][k] = nkp;
            a[k][q] = a[q][k] = nkq;
          }
          const vkp = v[k][p];
          const vkq = v[k][q];
          v[k][p] = vkp - s * (vkq + tau * vkp);
          v[k][q] = vkq + s * (vkp - tau * vkq);
        }
      }
    }
  }
  const order = Array.from({ length: n }, (_, i) => i).sort((i, j) => a[i][i] - a[j][j]);
  return {
    values: order.map((i) => a[i][i]),
    vectors: order.map((i) => Array.from({ length: n }, (_, k) => v[k][i])),
    sweeps,
  };
}
