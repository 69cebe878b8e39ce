import { describe, expect, it } from 'vitest';
import { pointRectGmd, pointRectLogGmd, rectRectGmd, rectRectLogGmd, type Rect } from './gmd.js';
import { rectangleGmd_m } from './mutual.js';

const R = (x1: number, x2: number, y1: number, y2: number): Rect => ({ x1, x2, y1, y2 });

/** Brute-force midpoint sum of ln distance over two rectangles (independent check; skips coincident points). */
function bruteLog(p: Rect, q: Rect, n = 60): number {
  let s = 0;
  let c = 0;
  for (let i = 0; i < n; i++)
    for (let j = 0; j < n; j++) {
      const x = p.x1 + ((i + 0.5) * (p.x2 - p.x1)) / n;
      const y = p.y1 + ((j + 0.5) * (p.y2 - p.y1)) / n;
      for (let k = 0; k < n; k++)
        for (let l = 0; l < n; l++) {
          const u = q.x1 + ((k + 0.5) * (q.x2 - q.x1)) / n;
          const v = q.y1 + ((l + 0.5) * (q.y2 - q.y1)) / n;
          s += 0.5 * Math.log((x - u) ** 2 + (y - v) ** 2);
          c++;
        }
    }
  return s / c;
}

describe('rectRectLogGmd / rectRectGmd', () => {
  it("a rectangle from itself equals Maxwell's rectangle GMD (mutual.ts) for several aspect ratios", () => {
    for (const [w, h] of [
      [1, 1],
      [2, 0.3],
      [0.05, 1],
    ]) {
      expect(Math.exp(rectRectLogGmd(R(0, w, 0, h), R(0, w, 0, h))) / rectangleGmd_m(w, h)).toBeCloseTo(1, 10);
    }
  });
  it('two equal squares side by side: g = 1.00655·d, as a brute-force midpoint sum gives (independent check, 1e-3 in ln g)', () => {
    const p = R(0, 1, 0, 1);
    const q = R(1, 2, 0, 1);
    expect(Math.abs(rectRectLogGmd(p, q) - bruteLog(p, q, 24))).toBeLessThan(1e-3);
    expect(rectRectGmd(p, q)).toBeCloseTo(1.00655, 4);
  });
  it('thin touching strips end to end: g → 4·e^(−3/2)·w = 0.8925·w (GMD of adjacent segments)', () => {
    expect(rectRectGmd(R(0, 1, 0, 1e-4), R(1, 2, 0, 1e-4))).toBeCloseTo(4 * Math.exp(-1.5), 4);
  });
  it('matches a brute-force sum for unequal, offset rectangles (1e-3 in ln g; the sum has O(1/n²) error)', () => {
    const p = R(0.3, 0.5, 0, 0.7);
    const q = R(0.55, 0.6, 0.2, 1.5);
    expect(Math.abs(rectRectLogGmd(p, q) - bruteLog(p, q, 24))).toBeLessThan(1e-3);
  });
  it('tends to the centre distance far away and switches to it beyond 30 sizes without a visible jump', () => {
    const p = R(0, 1, 0, 1);
    const near = Math.exp(rectRectLogGmd(p, R(29, 30, 0, 1)));
    expect(near / 29).toBeCloseTo(1, 4);
    expect(rectRectGmd(p, R(31, 32, 0, 1))).toBe(31);
  });
  it('is symmetric', () => {
    const p = R(0.1, 0.4, 0, 0.2);
    const q = R(0.4, 0.5, 0.1, 0.9);
    expect(rectRectLogGmd(p, q)).toBeCloseTo(rectRectLogGmd(q, p), 12);
  });
});

describe('pointRectLogGmd / pointRectGmd', () => {
  it('a point at the centre of a unit square matches a fine midpoint sum of ln ρ (independent check, 1e-4)', () => {
    const r = R(-0.5, 0.5, -0.5, 0.5);
    let s = 0;
    const n = 400;
    for (let i = 0; i < n; i++)
      for (let j = 0; j < n; j++) {
        const x = -0.5 + (i + 0.5) / n;
        const y = -0.5 + (j + 0.5) / n;
        s += 0.5 * Math.log(x * x + y * y);
      }
    expect(pointRectLogGmd(0, 0, r)).toBeCloseTo(s / (n * n), 4);
  });
  it('far away it is the centre distance', () => {
    expect(pointRectGmd(100, 0.5, R(0, 1, 0, 1))).toBeCloseTo(99.5, 10);
    expect(Math.exp(pointRectLogGmd(20, 0.5, R(0, 1, 0, 1))) / 19.5).toBeCloseTo(1, 3);
  });
});
