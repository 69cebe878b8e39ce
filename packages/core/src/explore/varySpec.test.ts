import { describe, expect, it } from 'vitest';
import { isInputError, type InputError } from '../design/errors.js';
import { linearValues, logValues, parseVarySpec, resolveVaryAxis } from './varySpec.js';
import { fixtureDesign } from './__fixtures__/design.js';
import { sizingDesign } from './__fixtures__/sizingDesign.js';

const design = fixtureDesign();

function inputError(f: () => unknown): InputError {
  try {
    f();
  } catch (e) {
    if (isInputError(e)) return e;
    throw e;
  }
  throw new Error('no error thrown');
}

describe('parseVarySpec(text)', () => {
  it('reads the three forms', () => {
    expect(parseVarySpec('bank.capacitance=1m:5m:9')).toMatchObject({ pathText: 'bank.capacitance', spacing: 'linear', tokens: ['1m', '5m'], count: 9 });
    expect(parseVarySpec('bank.capacitance=log:1m:10m:9')).toMatchObject({ spacing: 'log', tokens: ['1m', '10m'], count: 9 });
    expect(parseVarySpec('bank.voltage=1k,1.5k,2k')).toMatchObject({ spacing: 'list', tokens: ['1k', '1.5k', '2k'] });
    expect(parseVarySpec('bank.voltage = lin: 1 kV : 2 kV : 3')).toMatchObject({ spacing: 'linear', tokens: ['1 kV', '2 kV'], count: 3 });
  });

  it.each([
    ['bank.capacitance', /no "="/],
    ['=1:2:3', /path before "=" is empty/],
    ['bank.voltage=', /no values/],
    ['bank.voltage=1k:2k', /start:stop:count/],
    ['bank.voltage=1k:2k:3.5', /not a whole number/],
    ['bank.voltage=1k:2k:0', /outside 1/],
    ['bank.voltage=1k,,2k', /empty entry/],
    ['bank.voltage=log:1k:2k:3:4', /start:stop:count/],
  ])('refuses %s with an InputError naming --vary, the value and the expected form', (text, problem) => {
    const err = inputError(() => parseVarySpec(text));
    expect(err.code).toBe('option.invalid');
    expect(err.path).toBe('--vary');
    expect(err.value).toBe(text);
    expect(err.expected).toContain('PATH=start:stop:count');
    expect(err.message).toMatch(problem);
  });
});

describe('linearValues / logValues', () => {
  it('include both ends exactly and space evenly (arithmetic / geometric)', () => {
    expect(linearValues(1e-3, 5e-3, 5)).toEqual([1e-3, 2e-3, 3e-3, 4e-3, 5e-3]);
    const g = logValues(1e-3, 1e-2, 3);
    expect(g[0]).toBe(1e-3);
    expect(g[2]).toBe(1e-2);
    expect(g[1]).toBeCloseTo(Math.sqrt(1e-5), 15); // geometric mean
    expect(linearValues(7, 9, 1)).toEqual([7]);
  });
});

describe('resolveVaryAxis(spec, design)', () => {
  it('parses values with the dimension the design schema gives the field', () => {
    expect(resolveVaryAxis(parseVarySpec('bank.capacitance=1m:3m:3'), design).values).toEqual([1e-3, 2e-3, 3e-3]);
    expect(resolveVaryAxis(parseVarySpec('bank.voltage=1k,1.5 kV,2000'), design)).toMatchObject({ values: [1000, 1500, 2000], dimension: 'voltage' });
    expect(resolveVaryAxis(parseVarySpec('bank.capacitance=log:1 mF:10 mF:3'), design).values[1]).toBeCloseTo(Math.sqrt(1e-5), 15);
    expect(resolveVaryAxis(parseVarySpec('bank.esr=1m,2m'), design).values).toEqual([1e-3, 2e-3]);
    expect(resolveVaryAxis(parseVarySpec('coil.initialTemperature=20 degC,313.15 K'), design).values).toEqual([20, 40]);
    expect(resolveVaryAxis(parseVarySpec('coupled[0].resistance=0.1m:0.3m:3'), design).values).toEqual([1e-4, 2e-4, 3e-4]);
  });

  it('takes the short names capacitance, voltage, esr and esl for the bank fields', () => {
    const axis = resolveVaryAxis(parseVarySpec('capacitance=1m:3m:3'), design);
    expect(axis.path.text).toBe('bank.capacitance');
    expect(axis.values).toEqual([1e-3, 2e-3, 3e-3]);
    expect(resolveVaryAxis(parseVarySpec('voltage=1k:3k:3'), design)).toMatchObject({ values: [1000, 2000, 3000], dimension: 'voltage' });
    expect(resolveVaryAxis(parseVarySpec('esl=0.1u,0.2u'), design).path.text).toBe('bank.esl');
  });

  it('rounds spaced values of a whole-number field and refuses fractions in a list', () => {
    const d = sizingDesign();
    expect(resolveVaryAxis(parseVarySpec('ratings.capacitor.units=1:4:7'), d).values).toEqual([1, 2, 3, 4]);
    expect(inputError(() => resolveVaryAxis(parseVarySpec('ratings.capacitor.units=1,1.5'), d)).message).toMatch(/whole numbers/);
  });

  it('accepts an optional field the schema knows but the design leaves unset', () => {
    expect(resolveVaryAxis(parseVarySpec('coil.conductorArea=10 mm^2,12 mm^2'), design).values).toEqual([1e-5, 1.2e-5]);
  });

  it('refuses a unit of the wrong dimension, naming the option, the value and the expected dimension', () => {
    const err = inputError(() => resolveVaryAxis(parseVarySpec('bank.capacitance=1 kV:2 kV:3'), design));
    expect(err.path).toBe('--vary');
    expect(err.value).toBe('bank.capacitance=1 kV:2 kV:3');
    expect(err.expected).toMatch(/capacitance/);
    expect(err.message).toMatch(/voltage/);
  });

  it('refuses an unknown field with a suggestion, and a field that is not a number', () => {
    expect(inputError(() => resolveVaryAxis(parseVarySpec('bank.volts=1k:2k:3'), design)).suggestion).toBe('bank.voltage');
    expect(inputError(() => resolveVaryAxis(parseVarySpec('switch.kind=1,2'), design)).message).toMatch(/not a numeric field/);
  });

  it('refuses log spacing through zero and equal ends with several points', () => {
    expect(() => resolveVaryAxis(parseVarySpec('bank.voltage=log:0:2k:3'), design)).toThrow(/above zero/);
    expect(() => resolveVaryAxis(parseVarySpec('bank.voltage=1k:1k:3'), design)).toThrow(/equal/);
  });
});
