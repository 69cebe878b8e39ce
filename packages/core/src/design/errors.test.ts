import { describe, expect, it } from 'vitest';
import { InputError, formatInputError, joinPath, pathToString, showValue } from './errors.js';

describe('InputError', () => {
  const issue = { code: 'quantity.dimension', path: 'bank.capacitance', value: '2 kV', problem: '"2 kV" is a voltage (V)', expected: 'a capacitance (F), e.g. 2200 uF' };
  it('carries the first issue on the error and formats one line with the file', () => {
    const e = new InputError(issue, 'station.yaml');
    expect(e).toMatchObject({ code: 'quantity.dimension', path: 'bank.capacitance', value: '2 kV', file: 'station.yaml' });
    expect(formatInputError(e)).toBe('station.yaml: bank.capacitance: "2 kV" is a voltage (V); expected a capacitance (F), e.g. 2200 uF');
  });
  it('shows line, column and suggestion when known', () => {
    const e = new InputError({ ...issue, line: 3, column: 17, suggestion: '2 mF' });
    expect(e.message).toBe('bank.capacitance (line 3, column 17): "2 kV" is a voltage (V); expected a capacitance (F), e.g. 2200 uF. Did you mean "2 mF"?');
  });
  it('prefixed() prepends a path', () => {
    expect(new InputError({ ...issue, path: 'mass' }).prefixed('coil').path).toBe('coil.mass');
    expect(new InputError({ ...issue, path: '[2].mass' }).prefixed('coupled').path).toBe('coupled[2].mass');
  });
  it('path helpers', () => {
    expect(pathToString(['coupled', 0, 'mutual'])).toBe('coupled[0].mutual');
    expect(joinPath('', 'a')).toBe('a');
    expect(showValue(undefined)).toBe('(missing)');
    expect(showValue('x')).toBe('"x"');
    expect(showValue(NaN)).toBe('NaN');
  });
});
