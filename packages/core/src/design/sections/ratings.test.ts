import { describe, expect, it } from 'vitest';
import { parseDesign } from '../parse.js';
import { isInputError } from '../errors.js';
import { ratingsToJudge } from './ratings.js';
import { BASE_DESIGN } from './judge-sections.test-util.js';

const parse = (yaml: string) => parseDesign(BASE_DESIGN + yaml, 'rig.yaml');

describe('design section ratings', () => {
  it('parses device, capacitor and winding ratings with units to SI inputs', () => {
    const d = parse(`ratings:
  margin: 25 %
  switch: { surgeCurrent: 18 kA, surgeBasis: 8.3ms, i2t: 1.6e6 A^2 s, didt: 200 A/us, blockingVoltage: 2.2 kV }
  diode: { surgeCurrent: 20 kA }
  capacitor: { voltage: 2 kV, reverse: 20 %, peakCurrent: 8 kA, units: 4 }
  winding: { temper: hard, radius: 32 mm, thickness: 14 mm }
`);
    const j = ratingsToJudge(d.ratings!);
    expect(j.margin).toBe(0.25);
    expect(j.surgeFloor_s).toBe(1e-3);
    expect(j.switch).toEqual({ surgeBasis: '8.3ms', surgeCurrent_A: 18e3, i2t_A2s: 1.6e6, didt_Aps: 200e6, blockingVoltage_V: 2200 });
    expect(j.diode).toEqual({ surgeBasis: '10ms', surgeCurrent_A: 20e3 });
    expect(j.capacitor).toEqual({ units: 4, voltage_V: 2000, reverse_pct: 20, peakCurrent_A: 8e3 });
    expect(j.winding).toMatchObject({ temper: 'hard', safetyFactor: 2, windingRadius_m: 0.032, windingThickness_m: 0.014 });
  });

  it('a surge basis that is not 10ms or 8.3ms is an InputError at the field', () => {
    try {
      parse('ratings: { switch: { surgeCurrent: 18 kA, surgeBasis: 20ms } }\n');
      expect.unreachable();
    } catch (e) {
      expect(isInputError(e)).toBe(true);
      if (isInputError(e)) expect(e.issues[0]).toMatchObject({ code: 'design.not-one-of', path: 'ratings.switch.surgeBasis' });
    }
  });
});
