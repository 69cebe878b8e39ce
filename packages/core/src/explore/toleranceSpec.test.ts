import { describe, expect, it } from 'vitest';
import { isInputError } from '../design/errors.js';
import { parseToleranceSpec, resolveTolerance } from './toleranceSpec.js';
import { fixtureDesign } from './__fixtures__/design.js';

describe('parseToleranceSpec(text)', () => {
  it('reads ±x%, +-x% and +/-x%', () => {
    expect(parseToleranceSpec('bank.capacitance=±10%')).toMatchObject({ pathText: 'bank.capacitance', fraction: 0.1 });
    expect(parseToleranceSpec('bank.capacitance=+-2.5%').fraction).toBeCloseTo(0.025, 15);
    expect(parseToleranceSpec('coil.resistance = +/- 5 %').fraction).toBeCloseTo(0.05, 15);
  });

  it.each([
    ['bank.capacitance', /no "="/],
    ['bank.capacitance=10%', /no ± sign/],
    ['bank.capacitance=±10', /not a relative tolerance/],
    ['bank.capacitance=±0%', /outside/],
    ['bank.capacitance=±150%', /outside/],
    ['=±5%', /path before "=" is empty/],
  ])('refuses %s with an InputError naming --tolerance, the value and the expected form', (text, problem) => {
    let err: unknown;
    try {
      parseToleranceSpec(text);
    } catch (e) {
      err = e;
    }
    expect(isInputError(err)).toBe(true);
    if (!isInputError(err)) return;
    expect(err.path).toBe('--tolerance');
    expect(err.value).toBe(text);
    expect(err.expected).toContain('PATH=±x%');
    expect(err.message).toMatch(problem);
  });

  it('suggests the ± form for a bare percentage', () => {
    try {
      parseToleranceSpec('bank.voltage=3%');
    } catch (e) {
      expect(isInputError(e) && e.suggestion).toBe('bank.voltage=±3%');
    }
  });
});

describe('resolveTolerance(spec, design)', () => {
  it('takes the nominal value from the parsed design, in SI', () => {
    const design = fixtureDesign();
    expect(resolveTolerance(parseToleranceSpec('bank.capacitance=±10%'), design)).toMatchObject({ nominal: 2.2e-3, fraction: 0.1 });
    expect(resolveTolerance(parseToleranceSpec('bank.voltage=±1%'), design).nominal).toBe(1600);
    expect(() => resolveTolerance(parseToleranceSpec('bank.esrr=±1%'), design)).toThrow(/no field "esrr"/);
    expect(() => resolveTolerance(parseToleranceSpec('coil.conductorArea=±1%'), design)).toThrow(/not set in the design/);
  });
});
