/**
 * brentZero: a root of g(t) = 0 in a sign-changing bracket [a, b], by Brent's method.
 *
 * Method: R. P. Brent, *Algorithms for Minimization without Derivatives* (Prentice-Hall 1973),
 * ch. 4, procedure "zero": inverse quadratic interpolation or secant steps while they stay in the
 * bracket and shrink it fast enough, bisection otherwise. Never worse than bisection; superlinear
 * near a simple root.
 *
 * Used by the engine to locate events and extrema on an integrator's dense output, so it is
 * written without allocation (no options object, no closure created per call) and never throws:
 * with no sign change it returns the end with the smaller |g|.
 *
 * Stopping: bracket half-width ≤ 2·ε·|t| + tol/2, or g(t) = 0 exactly. The returned t is the
 * bracket end with the smaller |g|; the true root lies within tol of it for continuous g.
 */

const EPS = 2.220446049250313e-16;

/**
 * @param g   function of t
 * @param a   left end
 * @param b   right end
 * @param ga  g(a)
 * @param gb  g(b)
 * @param tol absolute tolerance on t (> 0)
 * @param maxIter iteration limit (default 100)
 * @param side    'best' (default): the end with the smaller |g|; 'nonpositive': the bracket end
 *                where g ≤ 0 (an event located on its triggered side, within tol of the root)
 */
export function brentZero(
  g: (t: number) => number,
  a: number,
  b: number,
  ga: number,
  gb: number,
  tol: number,
  maxIter = 100,
  side: 'best' | 'nonpositive' = 'best',
): number {
  if (ga === 0) return a;
  if (gb === 0) return b;
  if (ga * gb > 0 || !Number.isFinite(ga) || !Number.isFinite(gb)) {
    if (side === 'nonpositive') return ga <= 0 ? a : b;
    return Math.abs(ga) < Math.abs(gb) ? a : b;
  }
  let c = a;
  let gc = ga;
  let d = b - a;
  let e = d;
  for (let iter = 0; iter < maxIter; iter++) {
    if ((gb > 0 && gc > 0) || (gb < 0 && gc < 0)) {
      c = a;
      gc = ga;
      d = b - a;
      e = d;
    }
    if (Math.abs(gc) < Math.abs(gb)) {
      a = b;
      b = c;
      c = a;
      ga = gb;
      gb = gc;
      gc = ga;
    }
    const tol1 = 2 * EPS * Math.abs(b) + 0.5 * tol;
    const xm = 0.5 * (c - b);
    if (Math.abs(xm) <= tol1 || gb === 0) return side === 'nonpositive' && gb > 0 ? c : b;
    if (Math.abs(e) >= tol1 && Math.abs(ga) > Math.abs(gb)) {
      // interpolation
      const s = gb / ga;
      let p: number;
      let q: number;
      if (a === c) {
        p = 2 * xm * s;
        q = 1 - s;
      } else {
        const qq = ga / gc;
        const r = gb / gc;
        p = s * (2 * xm * qq * (qq - r) - (b - a) * (r - 1));
        q = (qq - 1) * (r - 1) * (s - 1);
      }
      if (p > 0) q = -q;
      else p = -p;
      if (2 * p < Math.min(3 * xm * q - Math.abs(tol1 * q), Math.abs(e * q))) {
        e = d;
        d = p / q;
      } else {
        d = xm;
        e = d;
      }
    } else {
      d = xm;
      e = d;
    }
    a = b;
    ga = gb;
    b += Math.abs(d) > tol1 ? d : xm > 0 ? tol1 : -tol1;
    gb = g(b);
    if (!Number.isFinite(gb)) return a;
  }
  return side === 'nonpositive' && gb > 0 ? c : b;
}
