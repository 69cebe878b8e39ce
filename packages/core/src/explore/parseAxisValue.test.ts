import { describe, expect, it } from 'vitest';
import { parseAxisValue } from './parseAxisValue.js';

// Expected values: SI prefix definitions (BIPM SI Brochure, 9th ed., Table 7).
describe('parseAxisValue(token, dimension)', () => {
  it('takes values with units of the field’s dimension', () => {
    expect(parseAxisValue('2.2 mF', 'capacitance')).toEqual({ ok: true, value: 2.2e-3 });
    expect(parseAxisValue('1.5kV', 'voltage')).toEqual({ ok: true, value: 1500 });
    expect(parseAxisValue('40 degC', 'temperature')).toEqual({ ok: true, value: 40 });
  });

  it('takes a bare SI prefix as a multiple of the field’s unit', () => {
    expect(parseAxisValue('2.2m', 'capacitance')).toEqual({ ok: true, value: 2.2e-3 });
    expect(parseAxisValue('1.5k', 'voltage')).toEqual({ ok: true, value: 1500 });
    expect(parseAxisValue('10u', 'inductance')).toEqual({ ok: true, value: 1e-5 });
    expect(parseAxisValue('3M', 'fieldStrength')).toEqual({ ok: true, value: 3e6 });
    expect(parseAxisValue('470n', undefined)).toEqual({ ok: true, value: 4.7e-7 });
  });

  it('reads "2m" as metres for a length (the unit wins over the prefix)', () => {
    expect(parseAxisValue('2m', 'length')).toEqual({ ok: true, value: 2 });
  });

  it('takes plain numbers as they are', () => {
    expect(parseAxisValue('1600', 'voltage')).toEqual({ ok: true, value: 1600 });
    expect(parseAxisValue('-2.5e-3', undefined)).toEqual({ ok: true, value: -2.5e-3 });
  });

  it('refuses a unit of the wrong dimension and says what it is', () => {
    const r = parseAxisValue('2 kV', 'capacitance');
    expect(r.ok).toBe(false);
    if (!r.ok) {
      expect(r.reason).toContain('voltage');
      expect(r.expected).toContain('capacitance');
    }
  });

  it('refuses units when the field’s dimension is unknown', () => {
    expect(parseAxisValue('2 mF', undefined).ok).toBe(false);
    expect(parseAxisValue('', 'voltage').ok).toBe(false);
  });
});
