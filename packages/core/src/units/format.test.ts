import { describe, expect, it } from 'vitest';
import { formatNumber, formatQuantity } from './format.js';

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
    [NaN, 'A', 'n/a'],
    [Infinity, 'A', '∞ A'],
  ];
  for (const [v, u, s] of cases) it(`${v} ${u} -> "${s}"`, () => expect(formatQuantity(v, u)).toBe(s));
  it('digits option', () => {
    expect(formatQuantity(1.23456e-3, 'F', { digits: 5 })).toBe('1.2346 mF');
    expect(formatNumber(123456789, 3)).toBe('1.23e8');
  });
});
