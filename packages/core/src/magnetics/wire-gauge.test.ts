import { describe, expect, it } from 'vitest';
import { awgDiameter_m, parseAwg } from './wire-gauge.js';

describe('awgDiameter_m(n): ASTM B258', () => {
  it('AWG 10, 14, 18 are 2.588, 1.628, 1.024 mm (ASTM B258 via REFERENCES.md; printed to 1 µm, tolerance 0.5 µm)', () => {
    expect(Math.abs(awgDiameter_m(10) - 2.588e-3)).toBeLessThan(0.5e-6);
    expect(Math.abs(awgDiameter_m(14) - 1.628e-3)).toBeLessThan(0.5e-6);
    expect(Math.abs(awgDiameter_m(18) - 1.024e-3)).toBeLessThan(0.5e-6);
  });

  it('the defining end points: 36 = 0.005 in, 0000 = 0.46 in (ASTM B258)', () => {
    expect(awgDiameter_m(36)).toBeCloseTo(0.005 * 0.0254, 12);
    expect(awgDiameter_m(-3)).toBeCloseTo(0.46 * 0.0254, 12);
  });

  it('returns NaN outside the gauge range or for fractional gauges', () => {
    expect(awgDiameter_m(57)).toBeNaN();
    expect(awgDiameter_m(12.5)).toBeNaN();
  });
});

describe('parseAwg(text)', () => {
  it('reads plain, prefixed and aught designations', () => {
    expect(parseAwg('14')).toBe(14);
    expect(parseAwg('AWG 8')).toBe(8);
    expect(parseAwg('22 awg')).toBe(22);
    expect(parseAwg('0')).toBe(0);
    expect(parseAwg('00')).toBe(-1);
    expect(parseAwg('4/0')).toBe(-3);
    expect(parseAwg(12)).toBe(12);
  });
  it('rejects what is not a gauge', () => {
    expect(parseAwg('14 mm')).toBeNull();
    expect(parseAwg('5/0')).toBeNull();
    expect(parseAwg(-4)).toBeNull();
  });
});
