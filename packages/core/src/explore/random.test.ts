import { describe, expect, it } from 'vitest';
import { seededRandom } from './random.js';

describe('seededRandom(seed)', () => {
  it('gives the same sequence for the same seed and another for another seed', () => {
    const a = seededRandom(42);
    const b = seededRandom(42);
    const c = seededRandom(43);
    const sa = Array.from({ length: 50 }, () => [a.uniform(), a.normal()]);
    const sb = Array.from({ length: 50 }, () => [b.uniform(), b.normal()]);
    const sc = Array.from({ length: 50 }, () => [c.uniform(), c.normal()]);
    expect(sa).toEqual(sb);
    expect(sa).not.toEqual(sc);
  });

  it('uniform() has mean 1/2 and variance 1/12 (uniform distribution on [0, 1))', () => {
    const n = 40_000;
    const r = seededRandom(7);
    const xs = Array.from({ length: n }, () => r.uniform());
    expect(Math.min(...xs)).toBeGreaterThanOrEqual(0);
    expect(Math.max(...xs)).toBeLessThan(1);
    const mean = xs.reduce((s, x) => s + x, 0) / n;
    const variance = xs.reduce((s, x) => s + (x - mean) ** 2, 0) / (n - 1);
    // 5 standard errors: SE(mean) = √(1/12/n) ≈ 0.0014; SE(var) ≈ √(1/180/n) ≈ 0.00037.
    expect(Math.abs(mean - 0.5)).toBeLessThan(5 * Math.sqrt(1 / 12 / n));
    expect(Math.abs(variance - 1 / 12)).toBeLessThan(5 * Math.sqrt(1 / 180 / n));
  });

  it('normal() puts 68.27 % within ±1 and 95.45 % within ±2 (standard normal table, Abramowitz & Stegun 26.2)', () => {
    const n = 40_000;
    const r = seededRandom(11);
    const zs = Array.from({ length: n }, () => r.normal());
    const within = (k: number) => zs.filter((z) => Math.abs(z) < k).length / n;
    // Binomial standard error √(p(1 − p)/n); allow 5 of them.
    const se = (p: number) => Math.sqrt((p * (1 - p)) / n);
    expect(Math.abs(within(1) - 0.6826894921)).toBeLessThan(5 * se(0.6827));
    expect(Math.abs(within(2) - 0.9544997361)).toBeLessThan(5 * se(0.9545));
    const mean = zs.reduce((s, z) => s + z, 0) / n;
    expect(Math.abs(mean)).toBeLessThan(5 / Math.sqrt(n));
  });
});
