/**
 * Monotone piecewise cubic Hermite interpolation, used by the magnetic-circuit model for
 * B–H curves (materials/steels.ts) and for the flux-linkage table λ(i) of a yoke fixture.
 *
 * On knot interval [x_k, x_{k+1}] of width h, with t = (x − x_k)/h:
 *   p(x) = h00(t)·y_k + h·h10(t)·d_k + h01(t)·y_{k+1} + h·h11(t)·d_{k+1}
 *   h00 = 2t³ − 3t² + 1, h10 = t³ − 2t² + t, h01 = −2t³ + 3t², h11 = t³ − t².
 * Exact integral of one interval: h·(y_k + y_{k+1})/2 + h²·(d_k − d_{k+1})/12.
 *
 * Method: Fritsch & Carlson, "Monotone piecewise cubic interpolation", SIAM J. Numer. Anal.
 * 17(2), 1980, 238–246. Slopes d_k are either given (exact derivatives, e.g. from implicit
 * differentiation of a solved network) or estimated as the harmonic-type mean of the
 * neighbouring secants (Fritsch & Butland's choice, the one used by MATLAB's pchip); then the
 * Fritsch–Carlson limiter forces monotonicity on every interval: with Δ_k the secant,
 * α = d_k/Δ_k, β = d_{k+1}/Δ_k, if α² + β² > 9 both are scaled by 3/√(α² + β²); where Δ_k = 0
 * both end slopes are set to 0. The result is C¹ and monotone wherever the data are.
 *
 * Outside [x_0, x_n] the interpolant continues as a straight line with the end slope
 * (the caller chooses the end slopes, e.g. µ0 above a B–H table).
 * Evaluation: binary search of the interval, O(log n). Pure functions of the data.
 */

export interface MonotoneCubic {
  /** Knots, strictly increasing. */
  readonly x: Float64Array;
  /** Values at the knots, monotone non-decreasing. */
  readonly y: Float64Array;
  /** Slopes at the knots (after the limiter). */
  readonly d: Float64Array;
  /** Cumulative integral ∫_{x_0}^{x_k} p dx at each knot. */
  readonly cumIntegral: Float64Array;
}

export interface MonotoneCubicOptions {
  /** Exact slopes at the knots; when absent they are estimated from the secants. */
  slopes?: ArrayLike<number>;
  /** Slope at the first knot, overriding the estimate (still limited). */
  startSlope?: number;
  /** Slope at the last knot, overriding the estimate (still limited). */
  endSlope?: number;
}

/** Builds the interpolant. Throws RangeError on malformed data (a programming error, not user input). */
export function monotoneCubic(xs: ArrayLike<number>, ys: ArrayLike<number>, options: MonotoneCubicOptions = {}): MonotoneCubic {
  const n = xs.length;
  if (n < 2 || ys.length !== n) throw new RangeError(`monotoneCubic: need ≥ 2 knots and equal lengths (got ${n}, ${ys.length})`);
  const x = Float64Array.from(xs);
  const y = Float64Array.from(ys);
  const secant = new Float64Array(n - 1);
  for (let k = 0; k < n - 1; k++) {
    const h = x[k + 1] - x[k];
    if (!(h > 0)) throw new RangeError(`monotoneCubic: knots must increase strictly (x[${k}]=${x[k]}, x[${k + 1}]=${x[k + 1]})`);
    secant[k] = (y[k + 1] - y[k]) / h;
    if (secant[k] < 0) throw new RangeError(`monotoneCubic: values must not decrease (y[${k}]=${y[k]}, y[${k + 1}]=${y[k + 1]})`);
  }
  const d = new Float64Array(n);
  if (options.slopes) {
    if (options.slopes.length !== n) throw new RangeError('monotoneCubic: slopes length differs from knots');
    for (let k = 0; k < n; k++) d[k] = Math.max(0, options.slopes[k]);
  } else {
    // Interior: Fritsch–Butland weighted harmonic mean of the neighbouring secants (0 at a flat spot).
    for (let k = 1; k < n - 1; k++) {
      const s0 = secant[k - 1];
      const s1 = secant[k];
      if (s0 === 0 || s1 === 0) {
        d[k] = 0;
      } else {
        const h0 = x[k] - x[k - 1];
        const h1 = x[k + 1] - x[k];
        const w1 = 2 * h1 + h0;
        const w2 = h1 + 2 * h0;
        d[k] = (w1 + w2) / (w1 / s0 + w2 / s1);
      }
    }
    d[0] = secant[0];
    d[n - 1] = secant[n - 2];
  }
  if (options.startSlope !== undefined) d[0] = Math.max(0, options.startSlope);
  if (options.endSlope !== undefined) d[n - 1] = Math.max(0, options.endSlope);
  // Fritsch–Carlson limiter.
  for (let k = 0; k < n - 1; k++) {
    const s = secant[k];
    if (s === 0) {
      d[k] = 0;
      d[k + 1] = 0;
      continue;
    }
    const a = d[k] / s;
    const b = d[k + 1] / s;
    const r2 = a * a + b * b;
    if (r2 > 9) {
      const tau = 3 / Math.sqrt(r2);
      d[k] = tau * a * s;
      d[k + 1] = tau * b * s;
    }
  }
  const cumIntegral = new Float64Array(n);
  for (let k = 0; k < n - 1; k++) {
    const h = x[k + 1] - x[k];
    cumIntegral[k + 1] = cumIntegral[k] + (h * (y[k] + y[k + 1])) / 2 + (h * h * (d[k] - d[k + 1])) / 12;
  }
  return { x, y, d, cumIntegral };
}

/** Index k of the interval [x_k, x_{k+1}] holding v (clamped to 0 … n−2). */
function intervalOf(x: Float64Array, v: number): number {
  let lo = 0;
  let hi = x.length - 1;
  if (v <= x[0]) return 0;
  if (v >= x[hi]) return hi - 1;
  while (hi - lo > 1) {
    const mid = (lo + hi) >> 1;
    if (x[mid] <= v) lo = mid;
    else hi = mid;
  }
  return lo;
}

/** p(v); straight-line continuation with the end slope outside the knots. */
export function cubicValue(c: MonotoneCubic, v: number): number {
  const { x, y, d } = c;
  const n = x.length;
  if (v <= x[0]) return y[0] + d[0] * (v - x[0]);
  if (v >= x[n - 1]) return y[n - 1] + d[n - 1] * (v - x[n - 1]);
  const k = intervalOf(x, v);
  const h = x[k + 1] - x[k];
  const t = (v - x[k]) / h;
  const t2 = t * t;
  const t3 = t2 * t;
  return (2 * t3 - 3 * t2 + 1) * y[k] + h * (t3 - 2 * t2 + t) * d[k] + (3 * t2 - 2 * t3) * y[k + 1] + h * (t3 - t2) * d[k + 1];
}

/** p'(v), the exact derivative of the interpolant (end slope outside the knots). */
export function cubicSlope(c: MonotoneCubic, v: number): number {
  const { x, y, d } = c;
  const n = x.length;
  if (v <= x[0]) return d[0];
  if (v >= x[n - 1]) return d[n - 1];
  const k = intervalOf(x, v);
  const h = x[k + 1] - x[k];
  const t = (v - x[k]) / h;
  const t2 = t * t;
  return ((6 * t2 - 6 * t) * (y[k] - y[k + 1])) / h + (3 * t2 - 4 * t + 1) * d[k] + (3 * t2 - 2 * t) * d[k + 1];
}

/** ∫_{x_0}^{v} p dx, exact for the piecewise cubic (and for the straight continuations). */
export function cubicIntegral(c: MonotoneCubic, v: number): number {
  const { x, y, d, cumIntegral } = c;
  const n = x.length;
  if (v <= x[0]) {
    const u = v - x[0];
    return y[0] * u + (d[0] * u * u) / 2;
  }
  if (v >= x[n - 1]) {
    const u = v - x[n - 1];
    return cumIntegral[n - 1] + y[n - 1] * u + (d[n - 1] * u * u) / 2;
  }
  const k = intervalOf(x, v);
  const h = x[k + 1] - x[k];
  const t = (v - x[k]) / h;
  const t2 = t * t;
  const t3 = t2 * t;
  const t4 = t3 * t;
  // ∫0^t of the Hermite basis functions, times h.
  const H00 = t4 / 2 - t3 + t;
  const H10 = t4 / 4 - (2 * t3) / 3 + t2 / 2;
  const H01 = -t4 / 2 + t3;
  const H11 = t4 / 4 - t3 / 3;
  return cumIntegral[k] + h * (H00 * y[k] + h * H10 * d[k] + H01 * y[k + 1] + h * H11 * d[k + 1]);
}

/**
 * The inverse p⁻¹(w) of a strictly increasing interpolant: interval by binary search on y,
 * then safeguarded Newton inside the interval (bisection fallback). Outside the values the
 * straight continuations are inverted. Returns NaN when the slope there is 0.
 */
export function cubicInverse(c: MonotoneCubic, w: number): number {
  const { x, y, d } = c;
  const n = x.length;
  if (w <= y[0]) return d[0] > 0 ? x[0] + (w - y[0]) / d[0] : w === y[0] ? x[0] : NaN;
  if (w >= y[n - 1]) return d[n - 1] > 0 ? x[n - 1] + (w - y[n - 1]) / d[n - 1] : w === y[n - 1] ? x[n - 1] : NaN;
  const k = intervalOf(y, w);
  let lo = x[k];
  let hi = x[k + 1];
  let v = lo + ((hi - lo) * (w - y[k])) / (y[k + 1] - y[k] || 1);
  for (let it = 0; it < 60; it++) {
    const f = cubicValue(c, v) - w;
    if (f === 0) return v;
    if (f > 0) hi = v;
    else lo = v;
    const s = cubicSlope(c, v);
    let next = s > 0 ? v - f / s : NaN;
    if (!(next > lo && next < hi)) next = 0.5 * (lo + hi);
    if (Math.abs(next - v) <= 1e-15 * Math.max(1, Math.abs(v)) || hi - lo <= 1e-15 * Math.max(1, Math.abs(v))) return next;
    v = next;
  }
  return v;
}
