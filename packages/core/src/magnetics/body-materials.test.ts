import { describe, expect, it } from 'vitest';
import { BODY_METALS, magnetBodyMaterial } from './body-materials.js';

describe('BODY_METALS', () => {
  it('copper and aluminium carry the IEC 60028 resistivities of REFERENCES.md', () => {
    expect(BODY_METALS.copper.resistivity20_Ohm_m).toBe(1.7241e-8);
    expect(BODY_METALS.aluminium.resistivity20_Ohm_m).toBe(2.8264e-8);
  });
  it('every value is positive and finite, and each entry names a source', () => {
    for (const m of Object.values(BODY_METALS)) {
      for (const v of [m.resistivity20_Ohm_m, m.density_kgpm3, m.specificHeat_JpkgK]) expect(v).toBeGreaterThan(0);
      expect(m.source.length).toBeGreaterThan(5);
    }
  });
  it('only steel is flagged ferromagnetic', () => {
    expect(Object.values(BODY_METALS).filter((m) => m.ferromagnetic).map((m) => m.name)).toEqual(['steel']);
  });
});

describe('magnetBodyMaterial(family, ρ, name)', () => {
  it('takes the resistivity given and the family thermal data', () => {
    const m = magnetBodyMaterial('ndfeb-sintered', 1.4e-6, 'Sintered NdFeB, SH class');
    expect(m.resistivity20_Ohm_m).toBe(1.4e-6);
    expect(m.density_kgpm3).toBe(7500);
    expect(m.tempCoeff20_perK).toBe(0);
  });
});
