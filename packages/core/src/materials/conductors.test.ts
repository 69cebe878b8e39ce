import { describe, expect, it } from 'vitest';
import { ALUMINIUM, COPPER, conductor, iec60949K, resistanceAt } from './conductors.js';

describe('conductor constants (IEC 60028, IEC 60949, CRC Handbook)', () => {
  it('K = √(σc(β+20)/ρ20): copper 226, aluminium 148 A·s^½/mm² (IEC 60949; ±0.5, the printed integer)', () => {
    expect(Math.abs(iec60949K(COPPER) - 226)).toBeLessThan(0.5);
    expect(Math.abs(iec60949K(ALUMINIUM) - 148)).toBeLessThan(0.5);
  });

  // IEC 60949 / REFERENCES.md check values of K·√ln((θf+β)/(θi+β)), printed as integers and
  // computed from the integer K. Tolerance: ±0.5 (rounding of the printed value) plus
  // ±0.5·√ln(...) (the printed K is itself rounded to an integer; ours is computed exactly).
  const checks: [string, typeof COPPER, number, number, number][] = [
    ['copper 70→160 °C', COPPER, 70, 160, 115],
    ['copper 90→250 °C', COPPER, 90, 250, 143],
    ['aluminium 70→160 °C', ALUMINIUM, 70, 160, 76],
    ['aluminium 90→250 °C', ALUMINIUM, 90, 250, 94],
  ];
  for (const [label, m, ti, tf, want] of checks) {
    it(`K·√ln((θf+β)/(θi+β)) for ${label} = ${want} (IEC 60949)`, () => {
      const root = Math.sqrt(Math.log((tf + m.iec60949Beta_K) / (ti + m.iec60949Beta_K)));
      const v = iec60949K(m) * root;
      expect(Math.abs(v - want)).toBeLessThan(0.5 + 0.5 * root);
    });
  }

  it('α20 agrees with 1/(β + 20) (IEC 60028 vs IEC 60949; to the 3 printed digits of α20, ±0.5e-5)', () => {
    for (const m of [COPPER, ALUMINIUM]) {
      expect(Math.abs(m.tempCoeff20_perK - 1 / (m.iec60949Beta_K + 20))).toBeLessThan(0.5e-5);
    }
  });

  it('density × specific heat is within 4 % of the IEC 60949 σc (two independent sources)', () => {
    for (const m of [COPPER, ALUMINIUM]) {
      const ratio = (m.density_kgpm3 * m.specificHeat_JpkgK) / m.iec60949VolumetricHeat_JpKm3;
      expect(Math.abs(ratio - 1)).toBeLessThan(0.04);
    }
  });

  it('copper ρ20 is 1/58 Ω·mm²/m (IEC 60028), to the 5 printed digits', () => {
    expect(COPPER.resistivity20_Ohm_m).toBeCloseTo(1e-6 / 58, 12);
  });

  it('resistanceAt follows R20·(1 + α20(T − 20)); every value names its source', () => {
    expect(resistanceAt(0.025, 0.00393, 20)).toBe(0.025);
    expect(resistanceAt(0.025, 0.00393, 120)).toBeCloseTo(0.025 * 1.393, 15);
    expect(conductor('aluminium')).toBe(ALUMINIUM);
    for (const m of [COPPER, ALUMINIUM]) {
      for (const key of Object.keys(m)) if (typeof (m as unknown as Record<string, unknown>)[key] === 'number') expect(m.sources[key], key).toBeTruthy();
    }
  });
});
