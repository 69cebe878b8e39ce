import { describe, expect, it } from 'vitest';
import { engineeringPrefix, formatPercent, formatPlain, formatQuantity } from './quantity.js';

describe('formatQuantity(value, unit) picks the SI prefix (BIPM SI brochure, 9th ed.)', () => {
  it('puts the mantissa in [1, 1000) with 3 significant figures', () => {
    expect(formatQuantity(2816, 'J')).toBe('2.82 kJ');
    expect(formatQuantity(180e-6, 'H')).toBe('180 µH');
    expect(formatQuantity(2.4e6, 'A/m')).toBe('2.4 MA/m');
    expect(formatQuantity(0.004, 'Ω')).toBe('4 mΩ');
    expect(formatQuantity(1.5e-9, 's')).toBe('1.5 ns');
    expect(formatQuantity(12.345, 'V')).toBe('12.3 V');
  });
  it('carries to the next prefix when rounding reaches 1000', () => {
    expect(formatQuantity(999.7, 'A')).toBe('1 kA');
    expect(formatQuantity(999.4e3, 'A')).toBe('999 kA');
  });
  it('keeps the sign, prints NaN as n/a and handles zero and infinity', () => {
    expect(formatQuantity(-350, 'V')).toBe('−350 V');
    expect(formatQuantity(NaN, 'V')).toBe('n/a');
    expect(formatQuantity(0, 'A')).toBe('0 A');
    expect(formatQuantity(Infinity, 'A')).toBe('∞ A');
  });
  it('never prefixes °C, K and %', () => {
    expect(formatQuantity(1234.5, '°C')).toBe('1230 °C');
    expect(formatQuantity(45.67, 'K')).toBe('45.7 K');
    expect(formatQuantity(12.34, '%')).toBe('12.3 %');
  });
  it('shows areas in mm² or m², never with a squared prefix', () => {
    expect(formatQuantity(2.5e-6, 'm²')).toBe('2.5 mm²');
    expect(formatQuantity(0.5, 'm²')).toBe('0.5 m²');
  });
  it('honours the digits option', () => {
    expect(formatQuantity(2816, 'J', { digits: 4 })).toBe('2.816 kJ');
  });
  it('stays within pico..giga', () => {
    expect(formatQuantity(3e-15, 'F')).toBe('0.003 pF');
    expect(formatQuantity(5e12, 'W')).toBe('5000 GW');
  });
});

describe('formatPlain and formatPercent', () => {
  it('uses exponent notation outside [1e-3, 1e6)', () => {
    expect(formatPlain(1.234e-5)).toBe('1.23e-5');
    expect(formatPlain(2.5e7)).toBe('2.5e7');
    expect(formatPlain(1e-9)).toBe('1e-9');
    expect(formatPlain(0.5)).toBe('0.5');
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
    expect(engineeringPrefix(950, '°C')).toEqual({ factor: 1, unit: '°C' });
    expect(engineeringPrefix(0, 'V')).toEqual({ factor: 1, unit: 'V' });
  });
});
