import { describe, expect, it } from 'vitest';
import { z } from 'zod';
import { choice, count, defaultOf, num, qty, quantityInfo, section, text } from './quantity-schema.js';
import { InputError } from './errors.js';
import { parseWithSchema } from './issues.js';

// Unit conversions follow the SI prefixes (BIPM SI Brochure); the checks are exact.
const demo = section('test section', {
  capacitance: qty('capacitance', { positive: true }),
  esr: qty('resistance', { nonNegative: true }).default(0),
  mutual: qty('inductance').optional(),
  temperature: qty('temperature').default(20),
  margin: num({ min: 0, max: 1 }).default(0.2),
  units: count({ min: 1 }).default(1),
  kind: choice(['thyristor', 'bidirectional']).default('thyristor'),
  label: text().optional(),
});

function issueOf(data: unknown): InputError {
  try {
    parseWithSchema(demo, data, { pathPrefix: 'bank' });
  } catch (e) {
    if (e instanceof InputError) return e;
    throw e;
  }
  throw new Error('expected an InputError');
}

describe('qty/num/count/choice builders', () => {
  it('accept numbers and strings with units and output SI, applying defaults', () => {
    const out = parseWithSchema(demo, { capacitance: '2200 uF', mutual: '-3 uH', margin: '10 %' });
    expect(out).toEqual({ capacitance: 2.2e-3, esr: 0, mutual: -3e-6, temperature: 20, margin: 0.1, units: 1, kind: 'thyristor' });
  });
  it('defaultOf and quantityInfo read the field facts back', () => {
    expect(defaultOf(demo.shape.temperature)).toEqual({ value: 20 });
    expect(defaultOf(demo.shape.capacitance)).toBeUndefined();
    expect(quantityInfo(demo.shape.esr)).toMatchObject({ dimension: 'resistance', unit: 'Ω' });
    expect(quantityInfo(demo.shape.kind)).toBeUndefined();
  });
  it('wrong dimension names the path, the value and the expectation', () => {
    const e = issueOf({ capacitance: '2 kV' });
    expect(e.code).toBe('quantity.dimension');
    expect(e.path).toBe('bank.capacitance');
    expect(e.value).toBe('2 kV');
    expect(e.message).toContain('bank.capacitance');
    expect(e.message).toContain('"2 kV"');
    expect(e.message).toContain('a capacitance (F)');
    expect(e.message).toContain('e.g. 2200 uF');
  });
  it('zero and negative values where physics forbids them', () => {
    expect(issueOf({ capacitance: 0 })).toMatchObject({ code: 'design.out-of-range', path: 'bank.capacitance' });
    const neg = issueOf({ capacitance: 1e-3, esr: '-4 mohm' });
    expect(neg).toMatchObject({ code: 'design.out-of-range', path: 'bank.esr' });
    expect(neg.message).toContain('"-4 mohm" is negative');
    expect(issueOf({ capacitance: 1e-3, units: 1.5 }).message).toContain('not a whole number');
    expect(issueOf({ capacitance: 1e-3, margin: 2 }).message).toContain('is above 1');
  });
  it('missing required field', () => {
    const e = issueOf({});
    expect(e).toMatchObject({ code: 'design.missing-field', path: 'bank.capacitance' });
  });
  it('unknown field suggests the nearest known name', () => {
    const e = issueOf({ capacitance: 1e-3, esrr: 0 });
    expect(e).toMatchObject({ code: 'design.unknown-field', path: 'bank.esrr', suggestion: 'esr' });
    expect(e.message).toContain('Did you mean "esr"?');
  });
  it('wrong enum suggests the nearest choice', () => {
    const e = issueOf({ capacitance: 1e-3, kind: 'thyristr' });
    expect(e).toMatchObject({ code: 'design.not-one-of', path: 'bank.kind', suggestion: 'thyristor' });
    expect(e.message).toContain('one of: thyristor, bidirectional');
  });
  it('collects several problems in one error', () => {
    const e = issueOf({ capacitance: 'NaN', esr: 'x', label: '' });
    expect(e.issues.length).toBe(3);
    expect(e.message).toContain('3 problems');
  });
  it('the JSON Schema shows types, units and defaults', () => {
    const js = z.toJSONSchema(demo, { io: 'input' }) as { properties: Record<string, Record<string, unknown>>; required: string[] };
    expect(js.properties.capacitance).toMatchObject({ type: ['number', 'string'], 'x-unit': 'F' });
    expect(js.required).toEqual(['capacitance']);
  });
});
