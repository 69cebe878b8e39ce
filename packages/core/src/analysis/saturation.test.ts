import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { SWITCHING_SPREAD, Z_99, saturationFraction, standardNormalCdf } from './saturation.js';

describe('saturationFraction', () => {
  // Standard normal table values, Abramowitz & Stegun Table 26.1: Φ(1) = 0.8413447, Φ(2) = 0.9772499;
  // Table 26.5: Φ⁻¹(0.99) = 2.326348. Tolerance 1e-7: the table's printed digits.
  it('standardNormalCdf matches the A&S table (Φ(0) = 0.5, Φ(1), Φ(2), Φ(z99) = 0.99)', () => {
    expect(standardNormalCdf(0)).toBeCloseTo(0.5, 12);
    expect(standardNormalCdf(1)).toBeCloseTo(0.8413447, 7);
    expect(standardNormalCdf(2)).toBeCloseTo(0.9772499, 7);
    expect(standardNormalCdf(Z_99)).toBeCloseTo(0.99, 7);
  });

  it('saturationFraction(H_sat) = 0.99 for every mechanism (definition of H_sat in the model)', () => {
    for (const s of Object.values(SWITCHING_SPREAD)) expect(saturationFraction(2.4e6, 2.4e6, s)).toBeCloseTo(0.99, 7);
  });

  it('saturationFraction: median switching field at H_sat·exp(−σ·z99) gives one half', () => {
    const s = 0.3;
    expect(saturationFraction(1e6 * Math.exp(-s * Z_99), 1e6, s)).toBeCloseTo(0.5, 10);
  });

  it('saturationFraction: a pinning-type curve is lower than a nucleation-type one below H_sat and higher above', () => {
    const h = 0.6e6;
    expect(saturationFraction(h, 1e6, SWITCHING_SPREAD.pinning)).toBeLessThan(saturationFraction(h, 1e6, SWITCHING_SPREAD.nucleation));
    expect(saturationFraction(1.5e6, 1e6, SWITCHING_SPREAD.pinning)).toBeGreaterThan(saturationFraction(1.5e6, 1e6, SWITCHING_SPREAD.nucleation));
  });

  it('saturationFraction: zero or negative field gives 0; bad parameters give NaN', () => {
    expect(saturationFraction(0, 1e6, 0.3)).toBe(0);
    expect(saturationFraction(-5, 1e6, 0.3)).toBe(0);
    expect(saturationFraction(1e6, 0, 0.3)).toBeNaN();
    expect(saturationFraction(1e6, 1e6, 0)).toBeNaN();
    expect(saturationFraction(Number.NaN, 1e6, 0.3)).toBeNaN();
  });

  it('saturationFraction is non-decreasing in H and stays within [0, 1] (property)', () => {
    fc.assert(
      fc.property(fc.double({ min: 1e3, max: 1e7, noNaN: true }), fc.double({ min: 1e3, max: 1e7, noNaN: true }), fc.double({ min: 0.05, max: 1, noNaN: true }), (a, b, s) => {
        const lo = Math.min(a, b);
        const hi = Math.max(a, b);
        const fl = saturationFraction(lo, 2e6, s);
        const fh = saturationFraction(hi, 2e6, s);
        return fl <= fh + 1e-15 && fl >= 0 && fh <= 1;
      }),
      { numRuns: 200 },
    );
  });
});
