import { describe, expect, it } from 'vitest';
import { engineeringPrefix, formatNumber, formatPercent, formatQuantity, isUnprefixedUnit } from './format.js';

// SI prefixes per the BIPM SI Brochure (9th ed.); the strings are exact.
describe('formatQuantity(value, unit) uses engineering prefixes', () => {
  const cases: [number, string, string][] = [
    [2.2e-3, 'F', '2.2 mF'],
    [1600, 'V', '1.6 kV'],
    [0.035, 'Ω', '35 mΩ'],
    [1.8e-4, 'H', '180 µH'],
    [2.4e6, 'A/m', '2.4 MA/m'],
    [12000, 'A', '12 kA'],
    [5e-13, 's', '0.5 ps'],
    [2.816e3, 'J', '2.82 kJ'],
    [999.96, 'V', '1 kV'],
    [-3e-6, 'H', '−3 µH'],
    [0, 'A', '0 A'],
    [40, '°C', '40 °C'],
    [95, '(A/m)/A', '95 (A/m)/A'],
    [0.00393, '1/K', '0.00393 1/K'],
    [2.1, 'kg', '2.1 kg'],
    [2.5e-6, 'm²', '2.5 mm²'],
    [2.4e-4, 'm³', '240 cm³'],
    [1.5e-3, 'm', '1.5 mm'],
    [1.7241e-8, 'Ω·m', '1.72e-8 Ω·m'],
    [0.44, '1/min', '0.44 1/min'],
    [3e6, 'A²s', '3e6 A²s'],
    [12.5, '1/min', '12.5 1/min'],
    [3e-4, '1/s', '3e-4 1/s'],
    [0.5, '1', '0.5 1'],
    [0.25, '', '0.25'],
    [1234.5, '°C', '1230 °C'],
    [45.67, 'K', '45.7 K'],
    [12.34, '%', '12.3 %'],
    [0.5, 'm²', '0.5 m²'],
    [6e-4, 'm²', '6 cm²'],
    [1.2e-3, 'm²', '12 cm²'],
    [1e-12, 'm²', '1 µm²'],
    [3e-15, 'F', '0.003 pF'],
    [5e12, 'W', '5000 GW'],
    [999.4e3, 'A', '999 kA'],
    [NaN, 'A', 'n/a'],
    [Infinity, 'A', '∞ A'],
  ];
  for (const [v, u, s] of cases) it(`${v} ${u} -> "${s}"`, () => expect(formatQuantity(v, u)).toBe(s));
  it('digits option', () => {
    expect(formatQuantity(1.23456e-3, 'F', { digits: 5 })).toBe('1.2346 mF');
    expect(formatNumber(123456789, 3)).toBe('1.23e8');
  });
});

describe('formatQuantity never prefixes rate units', () => {
  // 0.44 shots per minute once printed as "440 m1/min": a reciprocal unit takes no prefix.
  it('every 1/… unit is unprefixed', () => {
    for (const u of ['1/min', '1/h', '1/s', '1/K']) expect(isUnprefixedUnit(u)).toBe(true);
    expect(isUnprefixedUnit('A/s')).toBe(false);
    expect(formatQuantity(0.44, '1/min')).not.toMatch(/m1\/min/);
  });
});

describe('formatNumber and formatPercent', () => {
  it('uses exponent notation outside [1e-3, 1e6)', () => {
    expect(formatNumber(1.234e-5)).toBe('1.23e-5');
    expect(formatNumber(2.5e7)).toBe('2.5e7');
    expect(formatNumber(1e-9)).toBe('1e-9');
    expect(formatNumber(0.5)).toBe('0.5');
  });
  it('prints a signed percentage from a fraction', () => {
    expect(formatPercent(0.234)).toBe('+23.4 %');
    expect(formatPercent(-0.05)).toBe('−5 %');
    expect(formatPercent(NaN)).toBe('n/a');
  });
});

describe('engineeringPrefix(maxAbs, unit)', () => {
  it('picks one prefix for a whole axis', () => {
    expect(engineeringPrefix(45.8e-3, 's')).toEqual({ factor: 1e-3, unit: 'ms' });
    expect(engineeringPrefix(5120, 'A')).toEqual({ factor: 1e3, unit: 'kA' });
    expect(engineeringPrefix(0, 'V')).toEqual({ factor: 1, unit: 'V' });
  });
  it('leaves unprefixed units, rates, areas and volumes at factor 1', () => {
    expect(engineeringPrefix(950, '°C')).toEqual({ factor: 1, unit: '°C' });
    expect(engineeringPrefix(0.44, '1/min')).toEqual({ factor: 1, unit: '1/min' });
    expect(engineeringPrefix(2.5e-6, 'm²')).toEqual({ factor: 1, unit: 'm²' });
    expect(engineeringPrefix(2.4e-4, 'm³')).toEqual({ factor: 1, unit: 'm³' });
  });
});
