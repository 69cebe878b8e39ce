import { describe, expect, it } from 'vitest';
import { histogram, summarize } from './summarize.js';

describe('summarize(values)', () => {
  it('gives percentiles by Hyndman & Fan definition 7 (linear between order statistics)', () => {
    // For 1…100: the p-quantile is 1 + 99·p exactly.
    const xs = Array.from({ length: 100 }, (_, i) => 100 - i);
    const s = summarize(xs);
    expect(s.percentiles.p50).toBeCloseTo(50.5, 12);
    expect(s.percentiles.p1).toBeCloseTo(1.99, 12);
    expect(s.percentiles.p95).toBeCloseTo(95.05, 12);
    expect(s.percentiles.p99).toBeCloseTo(99.01, 12);
    expect(s).toMatchObject({ count: 100, missing: 0, min: 1, max: 100, mean: 50.5 });
  });

  it('leaves NaN out and counts it', () => {
    const s = summarize([3, NaN, 1, 2]);
    expect(s).toMatchObject({ count: 3, missing: 1, min: 1, max: 3 });
    expect(summarize([NaN]).percentiles.p50).toBeNaN();
  });
});

describe('histogram(values, bins)', () => {
  it('counts every finite value once, on contiguous bins covering the range', () => {
    const xs = Array.from({ length: 1000 }, (_, i) => Math.sin(i) * 10);
    const h = histogram([...xs, NaN], 10);
    expect(h.reduce((s, b) => s + b.count, 0)).toBe(1000);
    for (let i = 1; i < h.length; i++) expect(h[i]!.x0).toBe(h[i - 1]!.x1);
    expect(h[0]!.x0).toBeLessThanOrEqual(Math.min(...xs));
    expect(h[h.length - 1]!.x1).toBeGreaterThanOrEqual(Math.max(...xs));
    expect(histogram([])).toEqual([]);
  });
});
