import { describe, expect, it } from 'vitest';
import { expandBracket } from './expandBracket.js';

describe('expandBracket(f, x0)', () => {
  it('steps upward from below the root of an increasing function until the sign changes', () => {
    const r = expandBracket((x) => x * x - 9, 0.1);
    expect(r.ok).toBe(true);
    if (r.ok) {
      expect(r.a).toBeLessThanOrEqual(3);
      expect(r.b).toBeGreaterThanOrEqual(3);
      expect(Math.sign(r.fa)).not.toBe(Math.sign(r.fb));
      expect(r.b / r.a).toBeLessThanOrEqual(2 + 1e-12); // one geometric step apart
    }
  });

  it('steps downward from above the root', () => {
    const r = expandBracket((x) => Math.log(x) - Math.log(0.004), 5);
    expect(r.ok && r.a <= 0.004 && r.b >= 0.004).toBe(true);
  });

  it('follows a decreasing function when told the slope', () => {
    const r = expandBracket((x) => 1 / x - 0.25, 1, { slope: -1 });
    expect(r.ok && r.a <= 4 && r.b >= 4).toBe(true);
  });

  it('uses a proposed first step (e.g. a linear estimate) and brackets in two evaluations when it is exact', () => {
    const f = (v: number) => 3 * v - 3000; // root at 1000
    const r = expandBracket(f, 100, { firstStep: (x0, f0) => x0 - f0 / 3 });
    expect(r.ok).toBe(true);
    expect(r.evaluations).toBe(2);
    if (r.ok) expect(r.a <= 1000 && r.b >= 1000).toBe(true);
  });

  it('says so when the bound is reached without a sign change', () => {
    const r = expandBracket(() => -1, 1, { max: 10 });
    expect(r).toMatchObject({ ok: false, reason: 'bound-reached' });
  });
});
