import { describe, expect, it } from 'vitest';
import {
  brooksInductance_H,
  helmholtzCentreField_ApmPerA,
  isBrooksShape,
  nagaokaCoefficient,
  thickSolenoidAxialField_ApmPerA,
  thickSolenoidCentreField_ApmPerA,
  wheelerMultilayerApplies,
  wheelerSingleLayer_H,
  wheelerSingleLayerApplies,
} from './formulas.js';

describe('nagaokaCoefficient(D/ℓ): closed form', () => {
  // Grover, Inductance Calculations, Table 36 (REFERENCES.md), printed to 4 decimals.
  for (const [x, k] of [
    [1, 0.6884],
    [2, 0.5255],
    [5, 0.3198],
    [10, 0.2033],
  ]) {
    it(`D/ℓ = ${x} gives ${k} (Grover Table 36, ±0.00005 printed rounding)`, () => {
      expect(Math.abs(nagaokaCoefficient(x) - k)).toBeLessThanOrEqual(0.00005);
    });
  }
  it('tends to 1 for a long solenoid and to 0 for a short one (limits of the sheet)', () => {
    expect(nagaokaCoefficient(1e-4)).toBeGreaterThan(0.9999);
    expect(nagaokaCoefficient(1e4)).toBeLessThan(1e-3);
  });
});

describe('Wheeler, Brooks: units and ranges', () => {
  it('Wheeler single layer: 1 in radius, 2 in long, 10 turns → 100/29 µH (the formula by hand)', () => {
    expect(wheelerSingleLayer_H(0.0254, 0.0508, 10)).toBeCloseTo((100 / 29) * 1e-6, 15);
  });
  it('applicability flags follow the stated ranges', () => {
    expect(wheelerSingleLayerApplies(1, 0.81)).toBe(true);
    expect(wheelerSingleLayerApplies(1, 0.79)).toBe(false);
    expect(wheelerMultilayerApplies(0.03, 0.02, 0.018)).toBe(true);
    expect(wheelerMultilayerApplies(0.03, 0.2, 0.018)).toBe(false);
  });
  it('Brooks: L = 1.6994e-6·a·N² and the shape test', () => {
    expect(brooksInductance_H(0.03, 100)).toBeCloseTo(0.50982e-3, 8);
    expect(isBrooksShape(0.02, 0.04, 0.02)).toBe(true);
    expect(isBrooksShape(0.02, 0.04, 0.03)).toBe(false);
  });
});

describe('thick solenoid on the axis (Montgomery 1969)', () => {
  it('the end-difference form at z = 0 equals the centre form', () => {
    expect(thickSolenoidAxialField_ApmPerA(0.02, 0.05, 0.08, 500, 0) / thickSolenoidCentreField_ApmPerA(0.02, 0.05, 0.08, 500)).toBeCloseTo(1, 12);
  });
  it('a thin long winding tends to the long-solenoid value N/ℓ (Ampère)', () => {
    expect(thickSolenoidCentreField_ApmPerA(0.01, 0.0101, 100, 1000) / (1000 / 100)).toBeCloseTo(1, 6);
  });
  it('is symmetric in z and falls to about half at the end of a long solenoid', () => {
    const h = (z: number) => thickSolenoidAxialField_ApmPerA(0.01, 0.011, 2, 1000, z);
    expect(h(0.3)).toBeCloseTo(h(-0.3), 10);
    expect(h(1) / h(0)).toBeCloseTo(0.5, 2);
  });
});

describe('Helmholtz pair', () => {
  it('(4/5)^{3/2}·N/R = 0.71554·N/R', () => {
    expect(helmholtzCentreField_ApmPerA(1, 1)).toBeCloseTo(0.715542, 6);
  });
});
