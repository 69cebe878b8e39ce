/**
 * expandBracket: find [a, b] with a sign change of f, starting from one point x0 > 0 and
 * stepping geometrically (x·factor upward or x/factor downward) on the positive axis.
 *
 * Method: the usual outward bracketing search (Press et al., *Numerical Recipes*, §9.1,
 * `zbrac`), restricted here to one direction chosen from the sign of f(x0) and the stated
 * slope sign of f, because the quantities we bracket (charge voltage, capacitance) are
 * positive and the responses we solve for (peak field) rise with them. A first step can be
 * proposed by the caller (e.g. a linear estimate), then the search continues geometrically.
 *
 * Never throws: when the bounds are reached without a sign change, the result says so.
 */

export interface ExpandBracketOptions {
  /** +1 when f increases with x (default), −1 when it decreases. */
  slope?: 1 | -1;
  /** Geometric step factor (> 1). Default 2. */
  factor?: number;
  /** Lowest x allowed (> 0). Default x0·1e-6. */
  min?: number;
  /** Highest x allowed. Default x0·1e6. */
  max?: number;
  /** Evaluation limit. Default 60. */
  maxEvaluations?: number;
  /** Optional first step: given (x0, f(x0)) return a better second point (clamped to [min, max]). */
  firstStep?: (x0: number, f0: number) => number;
}

export type BracketResult =
  | { ok: true; a: number; b: number; fa: number; fb: number; evaluations: number }
  | { ok: false; reason: 'bound-reached' | 'nan' | 'evaluation-limit'; x: number; fx: number; evaluations: number };

export function expandBracket(f: (x: number) => number, x0: number, options: ExpandBracketOptions = {}): BracketResult {
  const slope = options.slope ?? 1;
  const factor = options.factor ?? 2;
  const min = options.min ?? x0 * 1e-6;
  const max = options.max ?? x0 * 1e6;
  const maxEvaluations = options.maxEvaluations ?? 60;
  let evaluations = 1;
  let x = Math.min(max, Math.max(min, x0));
  let fx = f(x);
  if (Number.isNaN(fx)) return { ok: false, reason: 'nan', x, fx, evaluations };
  if (fx === 0) return { ok: true, a: x, b: x, fa: fx, fb: fx, evaluations };
  // Direction: move x up when f·slope < 0 (f must rise toward zero), down otherwise.
  const up = fx * slope < 0;
  let proposed = options.firstStep ? options.firstStep(x, fx) : NaN;
  while (evaluations < maxEvaluations) {
    let next: number;
    if (Number.isFinite(proposed) && (up ? proposed > x : proposed < x)) {
      // Accept the caller's estimate, nudged 5 % beyond it so that an accurate estimate brackets.
      next = up ? proposed * 1.05 : proposed / 1.05;
    } else {
      next = up ? x * factor : x / factor;
    }
    proposed = NaN;
    next = Math.min(max, Math.max(min, next));
    if (next === x) return { ok: false, reason: 'bound-reached', x, fx, evaluations };
    const fn = f(next);
    evaluations += 1;
    if (Number.isNaN(fn)) return { ok: false, reason: 'nan', x: next, fx: fn, evaluations };
    if (fn === 0 || Math.sign(fn) !== Math.sign(fx)) {
      return up ? { ok: true, a: x, b: next, fa: fx, fb: fn, evaluations } : { ok: true, a: next, b: x, fa: fn, fb: fx, evaluations };
    }
    x = next;
    fx = fn;
  }
  return { ok: false, reason: 'evaluation-limit', x, fx, evaluations };
}
