import { describe, expect, it } from 'vitest';
import { parseDesign } from '../parse.js';
import { isInputError } from '../errors.js';
import { bleederToJudge } from './bleeder.js';
import { BASE_DESIGN } from './judge-sections.test-util.js';

const parse = (yaml: string) => parseDesign(BASE_DESIGN + yaml, 'rig.yaml');

describe('design section bleeder', () => {
  it('parses resistance, threshold and time with units; threshold defaults to 50 V', () => {
    expect(bleederToJudge(parse('bleeder: { resistance: 10 kohm, threshold: 30 V, maxTime: 2 min }\n').bleeder!)).toEqual({ resistance_Ohm: 10e3, threshold_V: 30, maxTime_s: 120 });
    expect(bleederToJudge(parse('bleeder: { resistance: 22 kohm }\n').bleeder!)).toEqual({ resistance_Ohm: 22e3, threshold_V: 50 });
  });

  it('a missing resistance is an InputError at bleeder.resistance', () => {
    try {
      parse('bleeder: { threshold: 30 V }\n');
      expect.unreachable();
    } catch (e) {
      expect(isInputError(e)).toBe(true);
      if (isInputError(e)) expect(e.issues[0]).toMatchObject({ code: 'design.missing-field', path: 'bleeder.resistance' });
    }
  });
});
