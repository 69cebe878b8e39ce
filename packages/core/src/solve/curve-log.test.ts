import { describe, expect, it } from 'vitest';
import { CurveLog } from './curve-log.js';

describe('CurveLog', () => {
  // a half sine sin(πt) on [0, 1] recorded in 7 uneven steps (closed form crossings asin(a)/π)
  const log = new CurveLog();
  const edges = [0, 0.05, 0.2, 0.31, 0.5, 0.62, 0.9, 1];
  for (let k = 0; k + 1 < edges.length; k++) log.push(edges[k], edges[k + 1], (t) => Math.sin(Math.PI * t));

  it('interpolates inside a step to ≤ 1e-12 (barycentric Chebyshev–Lobatto, Berrut & Trefethen 2004)', () => {
    for (const t of [0.01, 0.13, 0.45, 0.77, 0.99]) {
      const k = edges.findIndex((e, i) => t >= e && t < edges[i + 1]);
      expect(Math.abs(log.valueAt(k, t) - Math.sin(Math.PI * t))).toBeLessThan(1e-12);
    }
  });

  it('locates the rising and falling half-maximum crossings of a half sine (closed form)', () => {
    const rise = log.crossing(0.5, 1, 'rise', 0.5, 1e-14);
    const fall = log.crossing(0.5, 1, 'fall', 0.5, 1e-14);
    expect(Math.abs(rise - 1 / 6)).toBeLessThan(1e-12);
    expect(Math.abs(fall - 5 / 6)).toBeLessThan(1e-12);
  });

  it('works on a negative pulse with s = −1, and returns NaN when the level is never crossed', () => {
    const neg = new CurveLog();
    neg.push(0, 0.5, (t) => -Math.sin(Math.PI * t));
    neg.push(0.5, 1, (t) => -Math.sin(Math.PI * t));
    expect(Math.abs(neg.crossing(0.9, -1, 'rise', 0.5, 1e-14) - Math.asin(0.9) / Math.PI)).toBeLessThan(1e-12);
    const rising = new CurveLog();
    rising.push(0, 0.5, (t) => Math.sin(Math.PI * t));
    expect(Number.isNaN(rising.crossing(0.5, 1, 'fall', 0.5, 1e-14))).toBe(true);
  });
});
