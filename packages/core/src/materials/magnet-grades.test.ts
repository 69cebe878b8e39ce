import { describe, expect, it } from 'vitest';
import { MAGNET_GRADES, MAGNET_PROPERTIES, applyMagnetOverrides, magnetGrade } from './magnet-grades.js';

const families = (f: string) => MAGNET_GRADES.filter((g) => g.family === f);

describe('magnet grade library', () => {
  it('MAGNET_GRADES covers sintered NdFeB in several coercivity classes, bonded NdFeB, SmCo5, Sm2Co17, ferrite, AlNiCo', () => {
    expect(families('ndfeb-sintered').length).toBeGreaterThanOrEqual(5);
    for (const f of ['ndfeb-bonded', 'smco5', 'sm2co17', 'ferrite', 'alnico']) expect(families(f).length).toBeGreaterThanOrEqual(1);
    expect(new Set(MAGNET_GRADES.map((g) => g.id)).size).toBe(MAGNET_GRADES.length);
  });

  it('every value is finite, positive and names its source', () => {
    for (const g of MAGNET_GRADES) {
      for (const k of MAGNET_PROPERTIES) {
        expect(Number.isFinite(g[k].value) && g[k].value > 0, `${g.id}.${k}`).toBe(true);
        expect(g[k].source, `${g.id}.${k}`).toMatch(/REFERENCES\.md|DOMAIN\.md|from memory/);
      }
      // A working limit above the Curie temperature would be nonsense in the table itself.
      expect(g.maxWorkingTemperature_C.value).toBeLessThan(g.curieTemperature_C.value);
    }
  });

  // Values that cite REFERENCES.md must lie inside the ranges printed there (low-confidence magnet section).
  it('values citing REFERENCES.md lie inside its printed ranges', () => {
    const within = (x: number, lo: number, hi: number) => x >= lo - 1e-12 && x <= hi + 1e-12;
    for (const g of families('ndfeb-sintered')) {
      expect(within(g.resistivity_Ohm_m.value, 1.2e-6, 1.6e-6)).toBe(true);
      expect(within(g.curieTemperature_C.value, 310, 400)).toBe(true);
      if (g.saturationField_Apm.source.startsWith('REFERENCES')) expect(within(g.saturationField_Apm.value, 2.4e6, 3.2e6)).toBe(true);
    }
    const smco5 = magnetGrade('smco5')!;
    expect(within(smco5.resistivity_Ohm_m.value, 0.5e-6, 0.6e-6)).toBe(true);
    expect(within(smco5.curieTemperature_C.value, 700, 750)).toBe(true);
    const sm2 = magnetGrade('sm2co17')!;
    expect(within(sm2.resistivity_Ohm_m.value, 0.8e-6, 0.9e-6)).toBe(true);
    expect(within(sm2.curieTemperature_C.value, 800, 825)).toBe(true);
    const fe = magnetGrade('ferrite')!;
    expect(within(fe.saturationField_Apm.value, 0.8e6, 1.1e6)).toBe(true);
    expect(fe.curieTemperature_C.value).toBe(450);
    const al = magnetGrade('alnico5')!;
    expect(within(al.saturationField_Apm.value, 0.24e6, 0.64e6)).toBe(true);
    expect(within(al.curieTemperature_C.value, 700, 860)).toBe(true);
    expect(magnetGrade('ndfeb-bonded')!.saturationField_Apm.value).toBeGreaterThanOrEqual(2.0e6);
  });

  it('sintered NdFeB classes rise in H_cJ, saturation field and working temperature together', () => {
    const s = families('ndfeb-sintered');
    for (let i = 1; i < s.length; i++) {
      expect(s[i].intrinsicCoercivity_Apm.value).toBeGreaterThan(s[i - 1].intrinsicCoercivity_Apm.value);
      expect(s[i].saturationField_Apm.value).toBeGreaterThan(s[i - 1].saturationField_Apm.value);
      expect(s[i].maxWorkingTemperature_C.value).toBeGreaterThan(s[i - 1].maxWorkingTemperature_C.value);
    }
    // 12 kOe = 12e3/(4π)·1e3 A/m = 954.9 kA/m (CGS–SI conversion, exact).
    expect(magnetGrade('ndfeb-n')!.intrinsicCoercivity_Apm.value).toBeCloseTo(954_930, 0);
  });

  it('magnetGrade(id) is case-insensitive and returns undefined for an unknown id', () => {
    expect(magnetGrade('NdFeB-SH')?.family).toBe('ndfeb-sintered');
    expect(magnetGrade('unobtainium')).toBeUndefined();
  });

  it('applyMagnetOverrides(grade, overrides): the datasheet wins and is marked "design file"', () => {
    const g = magnetGrade('ndfeb-h')!;
    const o = applyMagnetOverrides(g, { saturationField_Apm: 3.0e6, maxWorkingTemperature_C: 130 });
    expect(o.saturationField_Apm).toEqual({ value: 3.0e6, source: 'design file (datasheet)' });
    expect(o.maxWorkingTemperature_C.value).toBe(130);
    expect(o.remanence_T).toEqual(g.remanence_T);
    expect(g.saturationField_Apm.value).toBe(2.7e6); // library entry untouched
    expect(applyMagnetOverrides(g, undefined)).toBe(g);
  });
});
