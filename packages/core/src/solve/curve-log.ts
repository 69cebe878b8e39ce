/**
 * A compact record of one scalar curve (the coil current) over a shot: for every accepted step,
 * its values at 13 Chebyshev–Lobatto nodes read from the dense output, so that level crossings
 * known only after the shot (the pulse width at 50 % and 90 % of the peak) can be located
 * without re-integrating.
 *
 * Inside a step the curve is the degree-12 polynomial through the nodes, evaluated by the
 * barycentric formula with Chebyshev–Lobatto weights w_j = (−1)^j (halved at both ends)
 * (J.-P. Berrut and L. N. Trefethen, "Barycentric Lagrange interpolation", SIAM Review 46 (2004),
 * 501–517, eq. 5.4): stable, and for a step that the integrator resolved to 1e-9 the
 * interpolation error is far below that (the error of Chebyshev interpolation of an analytic
 * function decays geometrically with the degree, ibid. §6).
 */
import { brentZero } from './brent.js';

export const CURVE_NODES = 13;
const M = CURVE_NODES;
/** Node positions on [0, 1]. */
const X = Float64Array.from({ length: M }, (_, j) => 0.5 * (1 - Math.cos((Math.PI * j) / (M - 1))));
const W = Float64Array.from({ length: M }, (_, j) => (j % 2 === 0 ? 1 : -1) * (j === 0 || j === M - 1 ? 0.5 : 1));

export class CurveLog {
  count = 0;
  private t0 = new Float64Array(64);
  private t1 = new Float64Array(64);
  private v = new Float64Array(64 * M);

  private grow(): void {
    const cap = this.t0.length * 2;
    const t0 = new Float64Array(cap);
    t0.set(this.t0);
    const t1 = new Float64Array(cap);
    t1.set(this.t1);
    const v = new Float64Array(cap * M);
    v.set(this.v);
    this.t0 = t0;
    this.t1 = t1;
    this.v = v;
  }

  /** Record the curve on [a, b] through a sampler valid there (the step's dense output). */
  push(a: number, b: number, sample: (t: number) => number): void {
    if (this.count === this.t0.length) this.grow();
    const k = this.count++;
    this.t0[k] = a;
    this.t1[k] = b;
    const h = b - a;
    for (let j = 0; j < M; j++) this.v[k * M + j] = sample(j === M - 1 ? b : a + h * X[j]);
  }

  start(k: number): number {
    return this.t0[k];
  }

  end(k: number): number {
    return this.t1[k];
  }

  /** Value at t inside step k. */
  valueAt(k: number, t: number): number {
    const h = this.t1[k] - this.t0[k];
    const off = k * M;
    if (!(h > 0)) return this.v[off];
    const x = (t - this.t0[k]) / h;
    let num = 0;
    let den = 0;
    for (let j = 0; j < M; j++) {
      const d = x - X[j];
      if (d === 0) return this.v[off + j];
      const c = W[j] / d;
      num += c * this.v[off + j];
      den += c;
    }
    return num / den;
  }

  // The function Brent's method solves, s·curve_k(t) − level, made once per CurveLog (the engine
  // keeps its CurveLog between shots) and reading its parameters from these fields.
  private rootK = 0;
  private rootSign = 1;
  private rootLevel = 0;
  private readonly rootFn = (t: number): number => this.rootSign * this.valueAt(this.rootK, t) - this.rootLevel;

  /** The crossing of s·curve_k with level in [a, b] (NaN if no sign change). */
  private root(k: number, a: number, b: number, s: number, level: number, tol: number): number {
    this.rootK = k;
    this.rootSign = s;
    this.rootLevel = level;
    const f = this.rootFn;
    const fa = f(a);
    const fb = f(b);
    if (fa * fb > 0) return Number.NaN;
    return brentZero(f, a, b, fa, fb, tol);
  }

  private startValue(k: number): number {
    return this.v[k * M];
  }

  private endValue(k: number): number {
    return this.v[k * M + M - 1];
  }

  /**
   * Where s·curve crosses `level` around the peak at tPeak: side 'rise' gives the last upward
   * crossing before tPeak, 'fall' the first downward crossing after it; NaN if there is none.
   * @param s sign applied to the curve (−1 for a negative pulse)
   * @param tol time tolerance, s
   */
  crossing(level: number, s: number, side: 'rise' | 'fall', tPeak: number, tol: number): number {
    if (side === 'rise') {
      for (let k = this.count - 1; k >= 0; k--) {
        if (this.t0[k] >= tPeak) continue;
        const b = Math.min(this.t1[k], tPeak);
        const vb = s * this.valueAt(k, b);
        if (s * this.startValue(k) < level && vb >= level) return this.root(k, this.t0[k], b, s, level, tol);
        if (s * this.startValue(k) < level) return Number.NaN;
      }
      return Number.NaN;
    }
    for (let k = 0; k < this.count; k++) {
      if (this.t1[k] <= tPeak) continue;
      const a = Math.max(this.t0[k], tPeak);
      if (s * this.valueAt(k, a) >= level && s * this.endValue(k) < level) return this.root(k, a, this.t1[k], s, level, tol);
      if (s * this.valueAt(k, a) < level) return a;
    }
    return Number.NaN;
  }
}
