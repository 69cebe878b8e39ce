import { describe, expect, it } from 'vitest';
import { parseDesign } from '../parse.js';
import { isInputError } from '../errors.js';
import { partToJudge } from './part.js';
import { BASE_DESIGN } from './judge-sections.test-util.js';

const parse = (yaml: string) => parseDesign(BASE_DESIGN + yaml, 'rig.yaml');
const fail = (yaml: string) => {
  try {
    parse(yaml);
  } catch (e) {
    if (isInputError(e)) return e;
    throw e;
  }
  throw new Error('expected an InputError');
};

describe('design section part', () => {
  it('parses a grade with units and defaults, and partToJudge gives SI inputs', () => {
    const d = parse('part: { grade: ndfeb-sh, requiredField: 3 MA/m, fieldMargin: 15 % }\n');
    expect(partToJudge(d.part!)).toEqual({ grade: 'ndfeb-sh', requiredField_Apm: 3e6, fieldMargin: 0.15, temperatureMargin_K: 10, loopPrefix: 'part' });
  });

  it('datasheet values become overrides in SI (°C for temperatures)', () => {
    const d = parse('part:\n  grade: sm2co17\n  datasheet: { saturationField: 3.6 MA/m, remanence: 1.1 T, maxWorkingTemperature: 350 degC, resistivity: 0.9 uohm m }\n');
    const j = partToJudge(d.part!);
    expect(j.overrides!.saturationField_Apm).toBeCloseTo(3.6e6, 3);
    expect(j.overrides!.remanence_T).toBeCloseTo(1.1, 12);
    expect(j.overrides!.maxWorkingTemperature_C).toBeCloseTo(350, 9);
    expect(j.overrides!.resistivity_Ohm_m).toBeCloseTo(0.9e-6, 15);
  });

  it('an unknown grade is an InputError at part.grade with the nearest suggestion', () => {
    const e = fail('part: { grade: ndfeb-shh }\n');
    expect(e.issues[0]).toMatchObject({ code: 'design.not-one-of', path: 'part.grade', suggestion: 'ndfeb-sh' });
  });

  it('a field of the wrong dimension names the path and the expected dimension', () => {
    const e = fail('part: { grade: ferrite, requiredField: 2 T }\n');
    expect(e.issues[0]).toMatchObject({ path: 'part.requiredField', code: 'quantity.dimension' });
  });
});
