import { describe, expect, it } from 'vitest';
import { DIMENSIONS, describeDimension, parseQuantity, QuantityError, tryParseQuantity, type Dimension } from './quantity.js';

// Expected values are the SI definitions of the prefixes and units (BIPM SI Brochure, 9th ed.):
// u = 1e-6, m = 1e-3, k = 1e3, M = 1e6; T[°C] = T[K] − 273.15; T[°C] = (T[°F] − 32)·5/9.
// Tolerance: exact after rounding to 15 significant digits, except where a conversion factor
// is non-terminating (°F), checked to 1e-12 relative.
describe('parseQuantity(input, dimension) converts to SI (BIPM SI prefixes and units)', () => {
  const cases: [string, Dimension, number][] = [
    ['2200 uF', 'capacitance', 2.2e-3],
    ['1.8 kV', 'voltage', 1800],
    ['35 mohm', 'resistance', 0.035],
    ['12 uH', 'inductance', 12e-6],
    ['40 degC', 'temperature', 40],
    ['2.4 MA/m', 'fieldStrength', 2.4e6],
    ['95 A/m/A', 'fieldPerCurrent', 95],
    ['2.1 kg', 'mass', 2.1],
    ['1.5 mm', 'length', 1.5e-3],
    ['385 J/(kg K)', 'specificHeat', 385],
    ['0.2 µH', 'inductance', 0.2e-6],
    ['0.2 μH', 'inductance', 0.2e-6],
    ['4 mΩ', 'resistance', 4e-3],
    ['4 mOhm', 'resistance', 4e-3],
    ['2.2mF', 'capacitance', 2.2e-3],
    ['1.6kV', 'voltage', 1600],
    ['2.5 mm^2', 'area', 2.5e-6],
    ['240 cm^3', 'volume', 240e-6],
    ['0.00393 /K', 'tempCoeff', 0.00393],
    ['8890 kg/m^3', 'density', 8890],
    ['1.7241e-8 ohm m', 'resistivity', 1.7241e-8],
    ['6 /min', 'frequency', 0.1],
    ['200 A/us', 'currentRate', 2e8],
    ['2e6 A^2 s', 'i2t', 2e6],
    ['3.45e6 J/(K m^3)', 'volumetricHeatCapacity', 3.45e6],
    ['5 %', 'dimensionless', 0.05],
    ['0.8', 'dimensionless', 0.8],
    ['2200e-6', 'capacitance', 2.2e-3],
  ];
  for (const [text, dim, si] of cases) {
    it(`"${text}" as ${dim} -> ${si}`, () => {
      expect(parseQuantity(text, dim)).toBe(si);
    });
  }

  it('every DIMENSIONS example parses to its own dimension', () => {
    for (const key of Object.keys(DIMENSIONS) as Dimension[]) {
      const r = tryParseQuantity(DIMENSIONS[key].example, key);
      expect(r, key).toMatchObject({ ok: true });
    }
  });

  it('a plain number is taken as SI', () => {
    expect(parseQuantity(0.0022, 'capacitance')).toBe(0.0022);
    expect(parseQuantity(-3e-6, 'inductance')).toBe(-3e-6);
  });
});

describe('temperatures come out in °C (T[°C] = T[K] − 273.15, BIPM)', () => {
  it('K and degF convert to °C', () => {
    expect(parseQuantity('313.15 K', 'temperature')).toBeCloseTo(40, 12);
    expect(parseQuantity('104 degF', 'temperature')).toBeCloseTo(40, 12);
    expect(parseQuantity('40 °C', 'temperature')).toBe(40);
    expect(parseQuantity(25, 'temperature')).toBe(25);
  });
  it('a temperature difference counts K and degC 1:1 and degF 5/9', () => {
    expect(parseQuantity('60 K', 'temperatureDifference')).toBe(60);
    expect(parseQuantity('60 degC', 'temperatureDifference')).toBe(60);
    expect(parseQuantity('9 degF', 'temperatureDifference')).toBeCloseTo(5, 12);
  });
});

describe('tryParseQuantity rejects bad input with the expectation', () => {
  it('wrong dimension names what it got and what was expected', () => {
    const r = tryParseQuantity('2 kV', 'capacitance');
    expect(r.ok).toBe(false);
    if (r.ok) return;
    expect(r.code).toBe('quantity.dimension');
    expect(r.reason).toContain('"2 kV"');
    expect(r.reason).toContain('a voltage (V)');
    expect(r.expected).toBe('a capacitance (F), e.g. 2200 uF');
  });
  it('NaN and Infinity are rejected, as numbers and as strings', () => {
    for (const bad of [NaN, Infinity, -Infinity, 'NaN', 'Infinity', '.inf', '1e400 F']) {
      const r = tryParseQuantity(bad, 'capacitance');
      expect(r, String(bad)).toMatchObject({ ok: false, code: 'quantity.not-finite' });
    }
  });
  it('unknown unit, with a suggested spelling when a case change fixes it', () => {
    const r = tryParseQuantity('1.8 KV', 'voltage');
    expect(r).toMatchObject({ ok: false, code: 'quantity.unknown-unit', suggestion: '1.8 kV' });
    expect(tryParseQuantity('2200 uFF', 'capacitance')).toMatchObject({ ok: false, code: 'quantity.unknown-unit' });
  });
  it('non-numbers and wrong types', () => {
    expect(tryParseQuantity('kV', 'voltage')).toMatchObject({ ok: false, code: 'quantity.syntax' });
    expect(tryParseQuantity('', 'voltage')).toMatchObject({ ok: false, code: 'quantity.syntax' });
    expect(tryParseQuantity(true, 'voltage')).toMatchObject({ ok: false, code: 'quantity.type' });
    expect(tryParseQuantity(null, 'voltage')).toMatchObject({ ok: false, code: 'quantity.type' });
    expect(tryParseQuantity('5 %', 'voltage')).toMatchObject({ ok: false, code: 'quantity.dimension' });
  });
  it('parseQuantity throws QuantityError with the same facts', () => {
    expect(() => parseQuantity('35 mH', 'resistance')).toThrow(QuantityError);
    try {
      parseQuantity('35 mH', 'resistance');
    } catch (e) {
      expect((e as QuantityError).code).toBe('quantity.dimension');
      expect((e as QuantityError).message).toContain('an inductance (H)');
      expect((e as QuantityError).message).toContain(describeDimension('resistance'));
    }
  });
});
