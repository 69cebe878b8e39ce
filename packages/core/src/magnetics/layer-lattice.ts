/**
 * Fast sums over the equally spaced turns of a layer, sampled along z.
 *
 * A layer has T turns at z_i = z0 + i·p. For a kernel k(ζ) (the flux a turn sends through a
 * coaxial filament of radius r at axial distance ζ, or its field there), the layer's sum
 *
 *   S(z) = Σ_{i=0}^{T−1} k(z − z_i)
 *
 * at the lattice points z_k = z0 + k·h, h = p/m, is a strided running sum of the samples
 * g_j = k(j·h): S(z_k) = Σ_i g_{k − i·m} = P_k − P_{k − T·m} with P_j = g_j + P_{j − m}. All
 * lattice values over a span of n points then cost n + (T − 1)·m kernel evaluations instead of
 * n·T (and about half that for an even kernel, whose samples at ±j are shared).
 *
 * Between lattice points S is read from the cubic through the four nearest points (Lagrange);
 * averages over [z1, z2] integrate that piecewise cubic exactly (2-point Gauss–Legendre on each
 * lattice interval). Error of the cubic: O(h⁴·S⁗), small when h is a fraction of the distance
 * from the sampled line to the nearest turn (the caller chooses m).
 */
import type { WindingLayer } from './winding.js';

export class LayerLattice {
  readonly h: number;
  private readonly z0: number;
  private readonly kmin: number;
  private readonly values: Float64Array;
  /** Number of kernel evaluations spent. */
  readonly evaluations: number;

  /**
   * @param layer the turns (their radius is baked into `kernel`)
   * @param kernel k(ζ): contribution of one turn at axial distance ζ
   * @param even whether k(−ζ) = k(ζ) (samples are then shared)
   * @param zmin, zmax the z range that will be read
   * @param hTarget largest lattice spacing wanted, m; the spacing used is pitch/m for the
   *   smallest whole m that meets it (any spacing for a one-turn layer)
   */
  constructor(layer: WindingLayer, kernel: (zeta: number) => number, even: boolean, zmin: number, zmax: number, hTarget: number) {
    const T = layer.turns;
    const m = T > 1 ? Math.max(1, Math.ceil(layer.pitch_m / hTarget - 1e-9)) : 1;
    this.h = T > 1 ? layer.pitch_m / m : hTarget;
    this.z0 = layer.z0_m;
    this.kmin = Math.floor((zmin - this.z0) / this.h) - 2;
    const kmax = Math.ceil((zmax - this.z0) / this.h) + 2;
    const jmin = this.kmin - (T - 1) * m;
    const nj = kmax - jmin + 1;
    const g = new Float64Array(nj);
    let evals = 0;
    if (even) {
      const cache = new Map<number, number>();
      for (let j = jmin; j <= kmax; j++) {
        const a = Math.abs(j);
        let v = cache.get(a);
        if (v === undefined) {
          v = kernel(a * this.h);
          cache.set(a, v);
          evals++;
        }
        g[j - jmin] = v;
      }
    } else {
      for (let j = jmin; j <= kmax; j++) g[j - jmin] = kernel(j * this.h);
      evals = nj;
    }
    // strided prefix sums P_j = g_j + P_{j−m}
    const P = g;
    for (let idx = m; idx < nj; idx++) P[idx] += P[idx - m];
    const n = kmax - this.kmin + 1;
    this.values = new Float64Array(n);
    for (let k = this.kmin; k <= kmax; k++) {
      const hi = k - jmin;
      const lo = hi - T * m;
      this.values[k - this.kmin] = P[hi] - (lo >= 0 ? P[lo] : 0);
    }
    this.evaluations = evals;
  }

  /** The layer's sum at lattice point k (k relative to z0). */
  private at(k: number): number {
    const i = Math.min(Math.max(k - this.kmin, 0), this.values.length - 1);
    return this.values[i];
  }

  /** S(z) by cubic interpolation between lattice points. */
  value(z: number): number {
    const t = (z - this.z0) / this.h;
    const k = Math.floor(t);
    const u = t - k;
    const wm = (-u * (u - 1) * (u - 2)) / 6;
    const w0 = ((u + 1) * (u - 1) * (u - 2)) / 2;
    const w1 = (-(u + 1) * u * (u - 2)) / 2;
    const w2 = ((u + 1) * u * (u - 1)) / 6;
    return wm * this.at(k - 1) + w0 * this.at(k) + w1 * this.at(k + 1) + w2 * this.at(k + 2);
  }

  /** Mean of S over [z1, z2] (z1 < z2), integrating the piecewise cubic exactly. */
  average(z1: number, z2: number): number {
    if (z2 <= z1) return this.value(z1);
    const g = 1 / Math.sqrt(3);
    let sum = 0;
    const k1 = Math.floor((z1 - this.z0) / this.h);
    const k2 = Math.floor((z2 - this.z0) / this.h);
    for (let k = k1; k <= k2; k++) {
      const a = Math.max(z1, this.z0 + k * this.h);
      const b = Math.min(z2, this.z0 + (k + 1) * this.h);
      if (b <= a) continue;
      const c = (a + b) / 2;
      const d = (b - a) / 2;
      // both Gauss points lie in lattice interval k, so the same cubic is used
      sum += d * (this.value(c - d * g) + this.value(c + d * g));
    }
    return sum / (z2 - z1);
  }
}
