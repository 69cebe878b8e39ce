/**
 * LU factorization with partial pivoting of a small dense matrix, and the matching solve,
 * without allocation (the caller owns every buffer). Row-major Float64Array of size m×m.
 *
 * Method: Gaussian elimination with partial (row) pivoting, Golub & Van Loan, *Matrix
 * Computations*, 4th ed., Algorithm 3.4.1; backward stable in practice for the small,
 * well-conditioned inductance matrices of the engine (symmetric positive definite, or
 * one algebraic row in the zero-inductance commutation case).
 *
 * `luFactor` returns false for a singular (or non-finite) matrix instead of throwing.
 */

/** Factor a (m×m, row-major) in place; piv receives the row permutation. */
export function luFactor(a: Float64Array, m: number, piv: Int32Array): boolean {
  for (let k = 0; k < m; k++) {
    let p = k;
    let max = Math.abs(a[k * m + k]);
    for (let i = k + 1; i < m; i++) {
      const v = Math.abs(a[i * m + k]);
      if (v > max) {
        max = v;
        p = i;
      }
    }
    piv[k] = p;
    if (!(max > 0) || !Number.isFinite(max)) return false;
    if (p !== k) {
      for (let j = 0; j < m; j++) {
        const t = a[k * m + j];
        a[k * m + j] = a[p * m + j];
        a[p * m + j] = t;
      }
    }
    const inv = 1 / a[k * m + k];
    for (let i = k + 1; i < m; i++) {
      const l = a[i * m + k] * inv;
      a[i * m + k] = l;
      if (l !== 0) {
        for (let j = k + 1; j < m; j++) a[i * m + j] -= l * a[k * m + j];
      }
    }
  }
  return true;
}

/** Solve (LU)·x = b in place (b becomes x), with the factors and pivots from luFactor. */
export function luSolve(lu: Float64Array, m: number, piv: Int32Array, b: Float64Array): void {
  for (let k = 0; k < m; k++) {
    const p = piv[k];
    if (p !== k) {
      const t = b[k];
      b[k] = b[p];
      b[p] = t;
    }
  }
  for (let i = 1; i < m; i++) {
    let s = b[i];
    for (let j = 0; j < i; j++) s -= lu[i * m + j] * b[j];
    b[i] = s;
  }
  for (let i = m - 1; i >= 0; i--) {
    let s = b[i];
    for (let j = i + 1; j < m; j++) s -= lu[i * m + j] * b[j];
    b[i] = s / lu[i * m + i];
  }
}

/**
 * Reciprocals of U's diagonal (after luFactor), for luSolveRecip: a solve repeated many times with
 * one factorization then multiplies instead of dividing.
 */
export function luDiagRecip(lu: Float64Array, m: number, rdiag: Float64Array): void {
  for (let k = 0; k < m; k++) rdiag[k] = 1 / lu[k * m + k];
}

/** luSolve with the reciprocal diagonal from luDiagRecip. */
export function luSolveRecip(lu: Float64Array, m: number, piv: Int32Array, rdiag: Float64Array, b: Float64Array): void {
  for (let k = 0; k < m; k++) {
    const p = piv[k];
    if (p !== k) {
      const t = b[k];
      b[k] = b[p];
      b[p] = t;
    }
  }
  for (let i = 1; i < m; i++) {
    let s = b[i];
    const row = i * m;
    for (let j = 0; j < i; j++) s -= lu[row + j] * b[j];
    b[i] = s;
  }
  for (let i = m - 1; i >= 0; i--) {
    let s = b[i];
    const row = i * m;
    for (let j = i + 1; j < m; j++) s -= lu[row + j] * b[j];
    b[i] = s * rdiag[i];
  }
}

/** Inverse of a (m×m) into inv, using work (m×m) and piv (m). Returns false if singular. */
export function invert(a: Float64Array, m: number, inv: Float64Array, work: Float64Array, piv: Int32Array, col: Float64Array): boolean {
  work.set(a.subarray(0, m * m));
  if (!luFactor(work, m, piv)) return false;
  for (let j = 0; j < m; j++) {
    col.fill(0, 0, m);
    col[j] = 1;
    luSolve(work, m, piv, col);
    for (let i = 0; i < m; i++) inv[i * m + j] = col[i];
  }
  return true;
}
