import { describe, expect, it } from 'vitest';
import { drawTolerances } from './drawTolerances.js';

describe('drawTolerances(fields, samples, seed, distribution)', () => {
  const fields = [
    { nominal: 2.2e-3, fraction: 0.1 },
    { nominal: 1600, fraction: 0.02 },
  ];

  it('is reproduced exactly by its seed', () => {
    expect(drawTolerances(fields, 100, 5, 'normal')).toEqual(drawTolerances(fields, 100, 5, 'normal'));
    expect(drawTolerances(fields, 100, 5)).not.toEqual(drawTolerances(fields, 100, 6));
  });

  it('keeps every draw within ±x of nominal, for both distributions', () => {
    for (const dist of ['uniform', 'normal'] as const) {
      for (const row of drawTolerances(fields, 5000, 1, dist)) {
        row.forEach((v, k) => {
          const f = fields[k]!;
          expect(Math.abs(v / f.nominal - 1)).toBeLessThanOrEqual(f.fraction * (1 + 1e-12));
        });
      }
    }
  });

  it('uniform: relative deviation has standard deviation x/√3 (uniform on ±x)', () => {
    const n = 20_000;
    const d = drawTolerances([{ nominal: 10, fraction: 0.3 }], n, 3).map((r) => r[0]! / 10 - 1);
    const sd = Math.sqrt(d.reduce((s, x) => s + x * x, 0) / n);
    // SE of a standard deviation ≈ σ·√((κ − 1)/(4n)) with κ = 1.8 for a uniform; allow 5 SE.
    const expected = 0.3 / Math.sqrt(3);
    expect(Math.abs(sd - expected)).toBeLessThan(5 * expected * Math.sqrt(0.8 / (4 * n)));
  });

  it('normal: standard deviation (x/3)·0.98658, a normal truncated at ±3σ (Johnson, Kotz & Balakrishnan, truncated normal variance)', () => {
    // Var = 1 − 2·3·φ(3)/(2Φ(3) − 1), φ(3) = 0.00443184841, Φ(3) = 0.998650102 → 0.973338, sd 0.986579.
    const ratio = Math.sqrt(1 - (6 * 0.00443184841) / (2 * 0.998650102 - 1));
    const n = 20_000;
    const d = drawTolerances([{ nominal: 1, fraction: 0.3 }], n, 9, 'normal').map((r) => r[0]! - 1);
    const sd = Math.sqrt(d.reduce((s, x) => s + x * x, 0) / n);
    const expected = 0.1 * ratio;
    // SE of a normal sample's standard deviation ≈ σ/√(2n); allow 5 SE.
    expect(Math.abs(sd - expected)).toBeLessThan((5 * expected) / Math.sqrt(2 * n));
  });
});
