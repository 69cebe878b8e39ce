/**
 * findRoot: a root of f(x) = 0 inside a sign-changing bracket [a, b], by Brent's method.
 *
 * Method: Brent's "zero" procedure (R. P. Brent, *Algorithms for Minimization without
 * Derivatives*, Prentice-Hall 1973, ch. 4; the same algorithm as `zbrent` in Press et al.,
 * *Numerical Recipes*, §9.3). Each step takes inverse quadratic interpolation (or the secant
 * step) when it stays inside the bracket and shrinks it fast enough, and a bisection step
 * otherwise, so it never does worse than bisection: at most about log2((b − a)/xTol)² steps,
 * superlinear convergence near a simple root.
 *
 * Stopping (the stated tolerance): the bracket half-width is at most
 *   xTol_eff = 2·ε·|x| + xTol / 2      (ε = machine epsilon)
 * or |f(x)| ≤ fTol. The returned x is the bracket end with the smaller |f|, so the true root
 * lies within 2·xTol_eff of x when f is continuous.
 *
 * Range: any f continuous on [a, b] with f(a)·f(b) ≤ 0. With no sign change the result says
 * so (`converged: false`, `reason: 'no-sign-change'`) instead of throwing; NaN from f also
 * ends the search (`reason: 'nan'`). Numerical trouble is data, never a throw.
 */

export interface FindRootOptions {
  /** Absolute tolerance on x (same unit as x). Default 1e-12·max(|a|, |b|). */
  xTol?: number;
  /** Stop as soon as |f(x)| ≤ fTol (same unit as f). Default 0 (only the x tolerance). */
  fTol?: number;
  /** Iteration limit. Default 200. */
  maxIterations?: number;
  /** f(a) and f(b) when already known (saves two evaluations). */
  fa?: number;
  fb?: number;
}

export interface RootResult {
  /** The root estimate. */
  x: number;
  /** f at x. */
  fx: number;
  /** Final bracket [lo, hi] that still contains the sign change. */
  bracket: [number, number];
  iterations: number;
  /** Number of calls to f made by this search. */
  evaluations: number;
  converged: boolean;
  reason: 'x-tolerance' | 'f-tolerance' | 'exact' | 'no-sign-change' | 'nan' | 'iteration-limit';
}

export function findRoot(f: (x: number) => number, a: number, b: number, options: FindRootOptions = {}): RootResult {
  const EPS = Number.EPSILON;
  const xTol = options.xTol ?? 1e-12 * Math.max(Math.abs(a), Math.abs(b));
  const fTol = options.fTol ?? 0;
  const maxIterations = options.maxIterations ?? 200;
  let evaluations = 0;
  const call = (x: number): number => {
    evaluations += 1;
    return f(x);
  };
  let fa = options.fa ?? call(a);
  let fb = options.fb ?? call(b);
  const done = (x: number, fx: number, lo: number, hi: number, iterations: number, converged: boolean, reason: RootResult['reason']): RootResult => ({
    x,
    fx,
    bracket: [Math.min(lo, hi), Math.max(lo, hi)],
    iterations,
    evaluations,
    converged,
    reason,
  });
  if (Number.isNaN(fa) || Number.isNaN(fb)) return done(Number.isNaN(fb) ? a : b, Number.isNaN(fb) ? fa : fb, a, b, 0, false, 'nan');
  if (fa === 0) return done(a, fa, a, a, 0, true, 'exact');
  if (fb === 0) return done(b, fb, b, b, 0, true, 'exact');
  if (Math.sign(fa) === Math.sign(fb)) {
    const better = Math.abs(fa) < Math.abs(fb);
    return done(better ? a : b, better ? fa : fb, a, b, 0, false, 'no-sign-change');
  }
  // Brent's variables: b is the best estimate, a the previous one, c the contrapoint (f(b)·f(c) < 0).
  let c = a;
  let fc = fa;
  let d = b - a;
  let e = d;
  for (let iteration = 1; iteration <= maxIterations; iteration++) {
    if (Math.sign(fb) === Math.sign(fc)) {
      c = a;
      fc = fa;
      d = b - a;
      e = d;
    }
    if (Math.abs(fc) < Math.abs(fb)) {
      a = b;
      b = c;
      c = a;
      fa = fb;
      fb = fc;
      fc = fa;
    }
    const tol = 2 * EPS * Math.abs(b) + 0.5 * xTol;
    const m = 0.5 * (c - b);
    if (Math.abs(fb) <= fTol && fb !== 0) return done(b, fb, b, c, iteration - 1, true, 'f-tolerance');
    if (Math.abs(m) <= tol) return done(b, fb, b, c, iteration - 1, true, 'x-tolerance');
    if (fb === 0) return done(b, fb, b, b, iteration - 1, true, 'exact');
    if (Math.abs(e) >= tol && Math.abs(fa) > Math.abs(fb)) {
      // Interpolate: secant when a == c, inverse quadratic otherwise.
      const s = fb / fa;
      let p: number;
      let q: number;
      if (a === c) {
        p = 2 * m * s;
        q = 1 - s;
      } else {
        const qq = fa / fc;
        const r = fb / fc;
        p = s * (2 * m * qq * (qq - r) - (b - a) * (r - 1));
        q = (qq - 1) * (r - 1) * (s - 1);
      }
      if (p > 0) q = -q;
      else p = -p;
      if (2 * p < Math.min(3 * m * q - Math.abs(tol * q), Math.abs(e * q))) {
        e = d;
        d = p / q;
      } else {
        d = m;
        e = m;
      }
    } else {
      d = m;
      e = m;
    }
    a = b;
    fa = fb;
    b += Math.abs(d) > tol ? d : m > 0 ? tol : -tol;
    fb = call(b);
    if (Number.isNaN(fb)) return done(a, fa, a, c, iteration, false, 'nan');
  }
  return done(b, fb, b, c, maxIterations, false, 'iteration-limit');
}
