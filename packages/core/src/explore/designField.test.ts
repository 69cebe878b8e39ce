import { describe, expect, it } from 'vitest';
import { designFieldInfo } from './designField.js';

describe('designFieldInfo(segments)', () => {
  it('gives the dimension of quantity fields from the design schema', () => {
    expect(designFieldInfo(['bank', 'capacitance'])).toEqual({ known: true, quantity: true, dimension: 'capacitance', integer: false });
    expect(designFieldInfo(['ratings', 'capacitor', 'units'])).toMatchObject({ dimension: 'dimensionless', integer: true });
    expect(designFieldInfo(['coil', 'initialTemperature'])).toMatchObject({ dimension: 'temperature' });
    expect(designFieldInfo(['coupled', 3, 'resistance'])).toMatchObject({ dimension: 'resistance' });
    expect(designFieldInfo(['coupled', 0, 'mutualTo', 'shell-2'])).toMatchObject({ dimension: 'inductance' });
  });

  it('tells sections and text fields from quantities, and unknown paths from known ones', () => {
    expect(designFieldInfo(['bank'])).toEqual({ known: true, quantity: false });
    expect(designFieldInfo(['switch', 'kind'])).toEqual({ known: true, quantity: false });
    expect(designFieldInfo(['bank', 'capacitence'])).toEqual({ known: false });
    expect(designFieldInfo(['bank', 0])).toEqual({ known: false });
  });
});
