import { describe, expect, it } from 'vitest';
import { MU0_HpM, STEEL_NAMES, STEEL_TABLES, bhCurveFromTable, linearMaterial, steelCurve, validateBHTable } from './steels.js';

describe('steel B–H curves', () => {
  it('ships low-carbon steel, silicon steel, cast steel and cast iron, each naming its source', () => {
    expect([...STEEL_NAMES].sort()).toEqual(['cast-iron', 'cast-steel', 'low-carbon-steel', 'silicon-steel']);
    for (const name of STEEL_NAMES) expect(STEEL_TABLES[name].source).toMatch(/from memory|datasheet|\d{4}/);
  });

  for (const name of STEEL_NAMES) {
    describe(name, () => {
      const table = STEEL_TABLES[name];
      const curve = steelCurve(name)!;

      it('passes through every tabulated point (interpolation; rounding tolerance 1e-12 T)', () => {
        table.field_Apm.forEach((h, k) => expect(Math.abs(curve.fluxDensity_T(h) - table.fluxDensity_T[k])).toBeLessThan(1e-12));
      });

      it('is a clean table: polarization J = B − µ0H never decreases (no point levelled)', () => {
        expect(curve.levelledPoints).toBe(0);
      });

      it('stays below the saturation polarization of pure iron, 2.15 T (Bozorth, Ferromagnetism, 1951; from memory)', () => {
        expect(curve.saturationPolarization_T).toBeLessThan(2.16);
        expect(curve.saturationPolarization_T).toBeGreaterThan(1.2);
      });

      it('has dB/dH ≥ µ0 everywhere and exactly µ0 above the table (issue requirement; J constant there)', () => {
        const top = curve.tableTopField_Apm;
        for (let j = 0; j <= 4000; j++) {
          const h = (top * 1.5 * j) / 4000;
          expect(curve.differentialPermeability_HpM(h)).toBeGreaterThanOrEqual(MU0_HpM * (1 - 1e-12));
        }
        expect(curve.differentialPermeability_HpM(top * 1.01)).toBeCloseTo(MU0_HpM, 15);
        // B(H_top + ΔH) − B(H_top) = µ0·ΔH (straight line of slope µ0), relative 1e-12.
        const dH = 1e6;
        const rise = curve.fluxDensity_T(top + dH) - curve.fluxDensity_T(top);
        expect(Math.abs(rise / (MU0_HpM * dH) - 1)).toBeLessThan(1e-12);
      });

      it('is odd in H, and its co-energy density is even with derivative B (central differences, rel 1e-6)', () => {
        for (const h of [50, 700, 5000, 90000, 1e6]) {
          expect(curve.fluxDensity_T(-h)).toBe(-curve.fluxDensity_T(h));
          expect(curve.coEnergyDensity_Jpm3(-h)).toBe(curve.coEnergyDensity_Jpm3(h));
          const d = 1e-4 * h;
          const deriv = (curve.coEnergyDensity_Jpm3(h + d) - curve.coEnergyDensity_Jpm3(h - d)) / (2 * d);
          expect(Math.abs(deriv / curve.fluxDensity_T(h) - 1)).toBeLessThan(1e-6);
        }
      });

      it('fieldStrength_Apm inverts fluxDensity_T (rel 1e-10)', () => {
        for (const h of [1, 33, 700, 5000, 90000, 3e6]) {
          const b = curve.fluxDensity_T(h);
          expect(Math.abs(curve.fieldStrength_Apm(b) / h - 1)).toBeLessThan(1e-10);
          expect(Math.abs(curve.fieldStrength_Apm(-b) / -h - 1)).toBeLessThan(1e-10);
        }
      });
    });
  }

  it('orders the peak relative permeabilities as usual: silicon steel > low-carbon steel > cast steel > cast iron (common practice)', () => {
    const peak = (name: string) => {
      const c = steelCurve(name)!;
      let best = 0;
      for (let h = 1; h < 1e5; h *= 1.02) best = Math.max(best, c.fluxDensity_T(h) / (MU0_HpM * h));
      return best;
    };
    const si = peak('silicon-steel');
    const lc = peak('low-carbon-steel');
    const cs = peak('cast-steel');
    const ci = peak('cast-iron');
    expect(si).toBeGreaterThan(lc);
    expect(lc).toBeGreaterThan(cs);
    expect(cs).toBeGreaterThan(ci);
    // Order of magnitude of the usual figures (from memory): cast iron a few hundred, electrical steels thousands.
    expect(ci).toBeGreaterThan(100);
    expect(ci).toBeLessThan(1000);
    expect(si).toBeGreaterThan(3000);
  });

  it('levels a table whose B is rounded so that J would fall, and still keeps dB/dH ≥ µ0', () => {
    const curve = bhCurveFromTable({
      name: 'rounded',
      description: 'test table with B rounded at high field',
      source: 'constructed for the test',
      field_Apm: [0, 100, 1000, 100000, 200000],
      fluxDensity_T: [0, 0.5, 1.4, 2.06, 2.18], // last slope 1.2e-6 < µ0
    });
    expect(curve.levelledPoints).toBe(1);
    for (let h = 0; h < 3e5; h += 500) expect(curve.differentialPermeability_HpM(h)).toBeGreaterThanOrEqual(MU0_HpM * (1 - 1e-12));
  });

  it('validateBHTable names the first problem of a bad table', () => {
    expect(validateBHTable([0, 1, 2], [0, 1])).toMatch(/lengths/);
    expect(validateBHTable([0, 1], [0, 1])).toMatch(/at least 3/);
    expect(validateBHTable([10, 20, 30], [0, 1, 2])).toMatch(/first point/);
    expect(validateBHTable([0, 20, 20], [0, 1, 2])).toMatch(/H must increase/);
    expect(validateBHTable([0, 20, 30], [0, 1, 1])).toMatch(/B must increase/);
    expect(validateBHTable([0, 20, 30], [0, 1, 1.5])).toBeNull();
  });

  it('linearMaterial is B = µr·µ0·H with co-energy µH²/2 (definition)', () => {
    const m = linearMaterial(1.05);
    expect(m.fluxDensity_T(1e6)).toBeCloseTo(1.05 * MU0_HpM * 1e6, 12);
    expect(m.coEnergyDensity_Jpm3(1e6)).toBeCloseTo(0.5 * 1.05 * MU0_HpM * 1e12, 3);
    expect(m.fieldStrength_Apm(1)).toBeCloseTo(1 / (1.05 * MU0_HpM), 6);
  });
});
