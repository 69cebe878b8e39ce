import { describe, expect, it } from 'vitest';
import { parseDesign } from '../parse.js';
import { isInputError, type InputError } from '../errors.js';
import { productionToJudge } from './production.js';
import { BASE_DESIGN } from './judge-sections.test-util.js';

const parse = (yaml: string) => parseDesign(BASE_DESIGN + yaml, 'rig.yaml');
const fail = (yaml: string): InputError => {
  try {
    parse(yaml);
  } catch (e) {
    if (isInputError(e)) return e;
    throw e;
  }
  throw new Error('expected an InputError');
};

describe('design section production', () => {
  it('parses rate, cooling and class to SI inputs with defaults', () => {
    const d = parse('production: { shotsPerMinute: 4, thermalTimeConstant: 20 min, insulationClass: F }\n');
    expect(productionToJudge(d.production!)).toEqual({ ambient_C: 25, margin_K: 10, resistanceRise: true, shotsPerMinute: 4, thermalTimeConstant_s: 1200, insulationClass: 'F' });
  });

  it('accepts the class as a number and the cooling as surface area and convection coefficient', () => {
    const d = parse('production: { shotsPerMinute: 2, surfaceArea: 500 cm^2, convection: 12 W/(m^2 K), insulationClass: 180, ambient: 35 degC }\n');
    const j = productionToJudge(d.production!);
    expect(j.surfaceArea_m2).toBeCloseTo(0.05, 12);
    expect(j.convection_WpM2K).toBeCloseTo(12, 12);
    expect(j.insulationClass).toBe('180');
    expect(j.ambient_C).toBeCloseTo(35, 12);
  });

  it('an unknown insulation class is an InputError with the IEC 60085 list; letters are case-insensitive', () => {
    const e = fail('production: { insulationClass: 150 }\n');
    expect(e.issues[0]).toMatchObject({ code: 'design.not-one-of', path: 'production.insulationClass' });
    expect(e.issues[0]!.expected).toMatch(/155/);
    expect(fail('production: { insulationClass: G }\n').issues[0]).toMatchObject({ code: 'design.not-one-of', path: 'production.insulationClass' });
    expect(productionToJudge(parse('production: { insulationClass: h }\n').production!).insulationClass).toBe('H');
  });

  it('a rate without any cooling, or half of the h·A estimate, is an InputError naming the missing field', () => {
    expect(fail('production: { shotsPerMinute: 3 }\n').issues[0]).toMatchObject({ code: 'design.missing-field', path: 'production.thermalTimeConstant' });
    expect(fail('production: { shotsPerMinute: 3, surfaceArea: 0.05 m^2 }\n').issues[0]).toMatchObject({ code: 'design.missing-field', path: 'production.convection' });
  });
});
