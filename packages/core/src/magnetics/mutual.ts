/**
 * Mutual inductance of coaxial circular filaments (Maxwell), and the self inductance of a thin
 * circular loop of given cross-section.
 *
 *   M = µ0·√(ab)·[(2/k − k)·K(m) − (2/k)·E(m)],   m = k² = 4ab / ((a + b)² + d²)
 *
 * (Maxwell, Treatise §701; Grover, Inductance Calculations, ch. 13; REFERENCES.md.) K, E take the
 * parameter m (magnetics/elliptic.ts). For far filaments (small k) the bracket is a difference of
 * nearly equal terms; below m = 0.1 it is summed instead from its power series in k, obtained by
 * combining the hypergeometric series of K and E (DLMF 19.5.1, 19.5.2):
 *
 *   (2/k − k)K − (2/k)E = (π/2)·Σ_{n≥2} c_{n−1}·(n−1)/n · k^{2n−1},   c_n = [(2n)! / (2^{2n}·n!²)]²
 *
 * whose first term gives the dipole limit M → µ0·π·a²b²/(2·d³).
 *
 * Self inductance of a circular loop of mean radius a whose cross-section has geometric mean
 * distance g from itself (uniform current, low frequency, g ≪ a):
 *
 *   L = µ0·a·(ln(8a/g) − 2)                                  (Grover ch. 13; Rosa 1908)
 *
 * For a round wire of radius ρ, g = ρ·e^(−1/4), which gives L = µ0·a·(ln(8a/ρ) − 7/4)
 * (REFERENCES.md). For a w × h rectangle g comes from Maxwell's exact expression (rectangleGmd).
 * The error of the thin-loop form is of order (g/a)²·ln(a/g).
 */
import { ellipticE, ellipticK } from './elliptic.js';
import { MU0_HpM } from './constants.js';

/** C[j] = c_j = [(2j)! / (2^{2j}·j!²)]², the squared central binomial ratios of the K and E series. */
const C: number[] = (() => {
  const out: number[] = [1];
  for (let j = 1; j <= 40; j++) out.push(out[j - 1] * ((2 * j - 1) / (2 * j)) ** 2);
  return out;
})();

/** The bracket (2/k − k)·K − (2/k)·E of Maxwell's formula, as a function of the modulus k. */
export function maxwellBracket(k: number): number {
  const m = k * k;
  if (m < 0.1) {
    // (π/2)·Σ_{n≥2} c_{n−1}(n−1)/n·k^(2n−1); terms fall by at least m per step.
    let sum = 0;
    let kp = k * m; // k^3 for n = 2
    for (let n = 2; n < C.length; n++) {
      const term = (C[n - 1] * (n - 1)) / n * kp;
      sum += term;
      if (term < 1e-17 * sum) break;
      kp *= m;
    }
    return (Math.PI / 2) * sum;
  }
  return (2 / k - k) * ellipticK(m) - (2 / k) * ellipticE(m);
}

/**
 * Mutual inductance of two coaxial circular filaments of radii a and b (m) whose planes are
 * d apart (m), in H. a, b > 0. Coincident filaments (a = b, d = 0) give +∞.
 */
export function filamentMutual_H(a_m: number, b_m: number, d_m: number): number {
  const s = (a_m + b_m) * (a_m + b_m) + d_m * d_m;
  const m = (4 * a_m * b_m) / s;
  if (m >= 1) return Infinity;
  return MU0_HpM * Math.sqrt(a_m * b_m) * maxwellBracket(Math.sqrt(m));
}

/** Self inductance of a thin circular loop of mean radius a (m) and cross-section GMD g (m), H. */
export function loopSelf_H(a_m: number, gmd_m: number): number {
  return MU0_HpM * a_m * (Math.log((8 * a_m) / gmd_m) - 2);
}

/** Geometric mean distance of a round wire's cross-section (diameter d) from itself: (d/2)·e^(−1/4). */
export function roundWireGmd_m(diameter_m: number): number {
  return (diameter_m / 2) * Math.exp(-0.25);
}

/**
 * Geometric mean distance of a w × h rectangle from itself (Maxwell; Grover, Inductance
 * Calculations, Table 1 / eq. for the rectangle; Rosa & Grover 1916):
 *
 *   ln g = ½·ln(w² + h²) − (w²/12h²)·ln(1 + h²/w²) − (h²/12w²)·ln(1 + w²/h²)
 *          + (2w/3h)·atan(h/w) + (2h/3w)·atan(w/h) − 25/12
 *
 * Square: g = 0.44705·w; thin strip (h → 0): g = e^(−3/2)·w = 0.22313·w.
 */
export function rectangleGmd_m(w_m: number, h_m: number): number {
  if (h_m === 0 || w_m === 0) return Math.exp(-1.5) * (w_m + h_m);
  const w2 = w_m * w_m;
  const h2 = h_m * h_m;
  const lnG =
    0.5 * Math.log(w2 + h2) -
    (w2 / (12 * h2)) * Math.log1p(h2 / w2) -
    (h2 / (12 * w2)) * Math.log1p(w2 / h2) +
    ((2 * w_m) / (3 * h_m)) * Math.atan(h_m / w_m) +
    ((2 * h_m) / (3 * w_m)) * Math.atan(w_m / h_m) -
    25 / 12;
  return Math.exp(lnG);
}
