import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { judgeShot } from './verdict.js';
import { fixtureResult, fixtureStation } from './verdict-fixtures.test-util.js';

const station = fixtureStation();

describe('judgeShot', () => {
  it('with no judge inputs reports only the magnetic pressure (info) and passes', () => {
    const v = judgeShot(station, {}, fixtureResult());
    expect(v.items.map((i) => i.id)).toEqual(['winding.pressure']);
    expect(v.overall).toBe('pass');
  });

  it('collects every group and takes the worst status as overall', () => {
    const inputs = {
      part: { grade: 'ndfeb-h', requiredField_Apm: 2.5e6 },
      production: { insulationClass: 'F', shotsPerMinute: 0.25, thermalTimeConstant_s: 900 },
      ratings: { switch: { surgeCurrent_A: 25e3 }, capacitor: { voltage_V: 2200 }, winding: { windingRadius_m: 0.02, windingThickness_m: 0.02 } },
      bleeder: { resistance_Ohm: 10e3 },
    };
    const v = judgeShot(station, inputs, fixtureResult());
    const ids = v.items.map((i) => i.id);
    for (const id of ['field.part', 'part.saturation', 'coil.temperature', 'coil.temperature.production', 'winding.pressure', 'winding.hoop-stress', 'switch.surge', 'switch.i2t', 'capacitor.voltage', 'bleeder.time']) {
      expect(ids).toContain(id);
    }
    expect(v.overall).toBe('pass');
    const failing = judgeShot(station, { ...inputs, ratings: { ...inputs.ratings, capacitor: { voltage_V: 1500 } } }, fixtureResult());
    expect(failing.overall).toBe('fail');
    const warning = judgeShot(station, { ...inputs, ratings: { ...inputs.ratings, capacitor: { voltage_V: 1900 } } }, fixtureResult());
    expect(warning.overall).toBe('warn');
  });

  it('every item carries a finite or NaN limit, a unit and a note (contract of model/verdict.ts)', () => {
    const v = judgeShot(station, { part: { grade: 'smco5' }, bleeder: { resistance_Ohm: 22e3 }, ratings: { diode: { surgeCurrent_A: 30e3 } } }, fixtureResult());
    for (const it of v.items) {
      expect(typeof it.unit).toBe('string');
      expect(it.note.length).toBeGreaterThan(10);
      expect(['pass', 'warn', 'fail', 'info']).toContain(it.status);
      if (it.status === 'info') expect(it.margin).toBeNaN();
    }
  });

  it('a larger field margin or rating margin never improves the overall status (property)', () => {
    const order = { fail: 0, warn: 1, pass: 2 } as const;
    fc.assert(
      fc.property(fc.double({ min: 0, max: 0.8, noNaN: true }), fc.double({ min: 0, max: 0.8, noNaN: true }), fc.double({ min: 1.5e6, max: 4e6, noNaN: true }), (a, b, H) => {
        const run = (m: number) =>
          judgeShot(station, { part: { grade: 'ndfeb-sh', fieldMargin: m }, ratings: { margin: m, switch: { surgeCurrent_A: 22e3 } } }, fixtureResult({ figures: { peakField_Apm: H } })).overall;
        return order[run(Math.max(a, b))] <= order[run(Math.min(a, b))];
      }),
      { numRuns: 60 },
    );
  });
});
