import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { isInputError } from '../design/errors.js';
import { magnetGrade } from '../materials/magnet-grades.js';
import { SWITCHING_SPREAD, saturationFraction } from './saturation.js';
import { judgePart, worstPartProbe } from './verdict-part.js';
import { byId, fixtureResult, rank } from './verdict-fixtures.test-util.js';


describe('judgePart', () => {
  it('worstPartProbe takes the lowest peak over probe 0 and the probes named "part…"', () => {
    const r = fixtureResult({
      probes: [
        { name: 'part centre', peakField_Apm: 3.0e6, timeOfPeak_s: 0 },
        { name: 'part surface', peakField_Apm: 3.2e6, timeOfPeak_s: 0 },
        { name: 'Part minimum', peakField_Apm: 2.5e6, timeOfPeak_s: 0 },
        { name: 'winding face', peakField_Apm: 1.0e6, timeOfPeak_s: 0 },
      ],
    });
    const w = worstPartProbe(r)!;
    expect(w.name).toBe('Part minimum');
    expect(w.peakField_Apm).toBe(2.5e6);
    expect(w.names).toEqual(['part centre', 'part surface', 'Part minimum']);
  });

  it('field.part: pass with the margin, warn inside it, fail below the required field', () => {
    const part = { grade: 'ndfeb-sh', requiredField_Apm: 2.5e6, fieldMargin: 0.1 };
    const at = (H: number) => byId(judgePart(fixtureResult({ figures: { peakField_Apm: H } }), part), 'field.part');
    expect(at(2.8e6)).toMatchObject({ status: 'pass', value: 2.8e6, limit: 2.5e6 });
    expect(at(2.8e6).margin).toBeCloseTo(0.12, 12);
    expect(at(2.6e6).status).toBe('warn');
    expect(at(2.4e6).status).toBe('fail');
    expect(at(2.4e6).margin).toBeCloseTo(-0.04, 12);
  });

  it('field.part: the required field defaults to the grade saturation field, and its source is named', () => {
    const it1 = byId(judgePart(fixtureResult(), { grade: 'ndfeb-h' }), 'field.part');
    expect(it1.limit).toBe(magnetGrade('ndfeb-h')!.saturationField_Apm.value);
    expect(it1.note).toMatch(/saturation field/);
    const ov = byId(judgePart(fixtureResult(), { grade: 'ndfeb-h', overrides: { saturationField_Apm: 3.3e6 } }), 'field.part');
    expect(ov.limit).toBe(3.3e6);
    expect(ov.note).toMatch(/design file/);
  });

  it('part.saturation is an info estimate equal to the model at the worst part field', () => {
    const items = judgePart(fixtureResult({ figures: { peakField_Apm: 2.2e6 } }), { grade: 'sm2co17' });
    const s = byId(items, 'part.saturation');
    expect(s.status).toBe('info');
    expect(s.unit).toBe('%');
    expect(s.value).toBeCloseTo(100 * saturationFraction(2.2e6, 4.0e6, SWITCHING_SPREAD.pinning), 12);
    expect(s.note).toMatch(/Estimate/);
    const custom = byId(judgePart(fixtureResult({ figures: { peakField_Apm: 2.2e6 } }), { grade: 'sm2co17', switchingSpread: 0.5 }), 'part.saturation');
    expect(custom.value).toBeCloseTo(100 * saturationFraction(2.2e6, 4.0e6, 0.5), 12);
    expect(byId(items, 'part.field-over-hcj').value).toBeCloseTo(2.2e6 / magnetGrade('sm2co17')!.intrinsicCoercivity_Apm.value, 12);
  });

  it('part.temperature: hottest part loop vs the maximum working temperature (pass, warn, fail)', () => {
    const loops = [
      { name: 'part shell 1', peakCurrent_A: 1, temperatureRise_K: 35, finalTemperature_C: 60 },
      { name: 'part shell 2', peakCurrent_A: 1, temperatureRise_K: 70, finalTemperature_C: 95 },
      { name: 'sleeve', peakCurrent_A: 1, temperatureRise_K: 275, finalTemperature_C: 300 },
    ];
    const r = fixtureResult({ loops });
    const sh = byId(judgePart(r, { grade: 'ndfeb-sh' }), 'part.temperature'); // 150 °C
    expect(sh).toMatchObject({ status: 'pass', value: 95, limit: 150 });
    expect(sh.margin).toBeCloseTo((150 - 95) / (150 - 25), 12);
    expect(sh.note).toMatch(/part shell 2/);
    const warn = byId(judgePart(r, { grade: 'ndfeb-sh', overrides: { maxWorkingTemperature_C: 100 } }), 'part.temperature');
    expect(warn.status).toBe('warn'); // 5 K left, 10 K wanted
    expect(byId(judgePart(r, { grade: 'ndfeb-n' }), 'part.temperature').status).toBe('fail'); // 80 °C
    expect(byId(judgePart(r, { grade: 'ndfeb-sh', loopPrefix: 'sleeve' }), 'part.temperature').value).toBe(300);
  });

  it('part.temperature is info (not judged) when no loop belongs to the part', () => {
    const t = byId(judgePart(fixtureResult(), { grade: 'ferrite' }), 'part.temperature');
    expect(t.status).toBe('info');
    expect(t.value).toBeNaN();
  });

  it('an unknown grade is an InputError at part.grade with a suggestion', () => {
    try {
      judgePart(fixtureResult(), { grade: 'ndfeb-shh' });
      expect.unreachable();
    } catch (e) {
      expect(isInputError(e)).toBe(true);
      expect(e).toMatchObject({ code: 'design.not-one-of', path: 'part.grade', value: 'ndfeb-shh', suggestion: 'ndfeb-sh' });
    }
  });

  it('a larger required margin never turns a fail into a pass (property)', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 1e5, max: 6e6, noNaN: true }),
        fc.double({ min: 1e5, max: 6e6, noNaN: true }),
        fc.double({ min: 0, max: 1, noNaN: true }),
        fc.double({ min: 0, max: 1, noNaN: true }),
        (H, req, a, b) => {
          const r = fixtureResult({ figures: { peakField_Apm: H } });
          const lo = byId(judgePart(r, { grade: 'ndfeb-n', requiredField_Apm: req, fieldMargin: Math.min(a, b) }), 'field.part');
          const hi = byId(judgePart(r, { grade: 'ndfeb-n', requiredField_Apm: req, fieldMargin: Math.max(a, b) }), 'field.part');
          return rank(hi.status) <= rank(lo.status);
        },
      ),
      { numRuns: 100 },
    );
  });
});
