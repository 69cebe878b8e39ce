import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { buildYokeCoil, yokeCoilWarnings, yokeCurrentBound } from './yoke-coil.js';
import { yokeInductanceLimits, yokeOperatingPoint, type YokeSpec } from './yoke.js';
import { steelCurve } from '../materials/steels.js';

const steel = steelCurve('low-carbon-steel')!;
const castIron = steelCurve('cast-iron')!;

/** Invented bench fixture (properties only, never an oracle). */
const spec: YokeSpec = {
  turns: 60,
  yoke: [
    { name: 'core', length_m: 0.1, area_m2: 12e-4, material: steel },
    { name: 'frame', length_m: 0.25, area_m2: 10e-4, material: castIron },
  ],
  poles: [{ name: 'tip', length_m: 0.02, area_m2: 3e-4, material: steel }],
  gaps: [{ name: 'clearance', length_m: 0.3e-3, area_m2: 3e-4 }],
  part: { length_m: 5e-3, area_m2: 2.8e-4, recoilPermeability: 1.05 },
  leakage: [{ name: 'poles', permeance_H: 2e-7 }],
};

describe('buildYokeCoil', () => {
  const iMax = 20000;
  const coil = buildYokeCoil(spec, { maxCurrent_A: iMax });

  it('reaches its tolerance and reports the table it built', () => {
    expect(coil.table.ok).toBe(true);
    expect(coil.table.maxRelError).toBeLessThanOrEqual(1e-6);
    expect(coil.table.knots).toBeGreaterThan(17);
    expect(coil.table.knots).toBeLessThan(4000);
    console.log(`yoke table: ${coil.table.knots} knots, ${coil.table.solves} solves, max midpoint error ${coil.table.maxRelError.toExponential(2)}, co-energy error ${coil.table.coEnergyMaxRelError.toExponential(2)}, ${(coil.table.buildTime_s * 1e3).toFixed(0)} ms`);
  });

  it('matches direct network solves at random currents within 10 × relTol (the documented estimate holds off the midpoints too)', () => {
    fc.assert(
      fc.property(fc.double({ min: 0, max: iMax, noNaN: true }), (i) => {
        const op = yokeOperatingPoint(spec, i);
        const eLam = Math.abs(coil.fluxLinkage_Wb(i) - op.fluxLinkage_Wb) / Math.max(Math.abs(op.fluxLinkage_Wb), 1e-30);
        const eH = Math.abs(coil.fieldAtPart_Apm(i) - op.partField_Apm) / Math.max(Math.abs(op.partField_Apm), 1e-30);
        const eW = Math.abs(coil.coEnergy_J(i) - op.coEnergy_J) / Math.max(op.coEnergy_J, 1e-30);
        return (i < 1e-9 || (eLam < 1e-6 && eH < 1e-6 && eW < 1e-6));
      }),
      { numRuns: 300 },
    );
  });

  it('incremental inductance is the derivative of λ and co-energy the integral of λ (central differences, rel 1e-7)', () => {
    for (const i of [0.3, 12, 170, 900, 4000, 15000, -700]) {
      const h = 1e-4 * Math.abs(i);
      const dl = (coil.fluxLinkage_Wb(i + h) - coil.fluxLinkage_Wb(i - h)) / (2 * h);
      expect(Math.abs(coil.incrementalInductance_H(i) / dl - 1)).toBeLessThan(1e-7);
      const dw = (coil.coEnergy_J(i + h) - coil.coEnergy_J(i - h)) / (2 * h);
      expect(Math.abs(dw / coil.fluxLinkage_Wb(i) - 1)).toBeLessThan(1e-7);
    }
  });

  it('λ(i) is monotone over the table and beyond it, in both directions (issue requirement)', () => {
    let prev = -Infinity;
    let violations = 0;
    for (let i = -2 * iMax; i <= 2 * iMax; i += iMax / 5000) {
      const l = coil.fluxLinkage_Wb(i);
      if (!(l > prev) || !(coil.incrementalInductance_H(i) > 0)) violations++;
      prev = l;
    }
    expect(violations).toBe(0);
  });

  it('is odd in λ and H, even in dλ/di and co-energy', () => {
    for (const i of [3, 333, 3333]) {
      expect(coil.fluxLinkage_Wb(-i)).toBe(-coil.fluxLinkage_Wb(i));
      expect(coil.fieldAtPart_Apm(-i)).toBe(-coil.fieldAtPart_Apm(i));
      expect(coil.incrementalInductance_H(-i)).toBe(coil.incrementalInductance_H(i));
      expect(coil.coEnergy_J(-i)).toBe(coil.coEnergy_J(i));
    }
  });

  it('current_A inverts fluxLinkage_Wb (rel 1e-10)', () => {
    for (const i of [-5000, -2, 0.01, 7, 640, 19999, 35000]) {
      expect(Math.abs(coil.current_A(coil.fluxLinkage_Wb(i)) / i - 1)).toBeLessThan(1e-10);
    }
  });

  it('small-current inductance and field per ampere agree with the table slopes at 0 (rel 1e-12)', () => {
    expect(Math.abs(coil.incrementalInductance_H(0) / coil.smallCurrentInductance_H - 1)).toBeLessThan(1e-12);
    const h = 1e-6;
    expect(Math.abs(coil.fieldAtPart_Apm(h) / h / coil.smallCurrentFieldPerAmpere_ApmPerA - 1)).toBeLessThan(1e-6);
  });

  it('continues exactly above the table once all steel is past its table (straight line of slope L_sat), rel 1e-9', () => {
    // At 20 kA × 60 turns every member is far above its table top, so the network is affine there.
    const op = yokeOperatingPoint(spec, 3 * iMax);
    expect(Math.abs(coil.fluxLinkage_Wb(3 * iMax) / op.fluxLinkage_Wb - 1)).toBeLessThan(1e-9);
    expect(Math.abs(coil.incrementalInductance_H(3 * iMax) / coil.saturatedInductance_H - 1)).toBeLessThan(1e-9);
  });

  it('yokeCurrentBound is V0·√(C/L_sat) (energy conservation with dλ/di ≥ L_sat)', () => {
    const { saturated_H } = yokeInductanceLimits(spec);
    expect(yokeCurrentBound(spec, 2e-3, 1500)).toBeCloseTo(1500 * Math.sqrt(2e-3 / saturated_H), 9);
  });

  it('rejects a non-positive table top', () => {
    expect(() => buildYokeCoil(spec, { maxCurrent_A: 0 })).toThrow(RangeError);
  });

  it('yokeCoilWarnings flags a shot beyond the table and stays silent inside it or for other coils', () => {
    expect(yokeCoilWarnings(coil, 0.9 * iMax)).toEqual([]);
    expect(yokeCoilWarnings(coil, -1.1 * iMax).map((w) => w.code)).toEqual(['yoke.table-range']);
    expect(yokeCoilWarnings(undefined, 1e9)).toEqual([]);
    const capped = buildYokeCoil(spec, { maxCurrent_A: iMax, maxKnots: 20 });
    expect(capped.table.ok).toBe(false);
    expect(yokeCoilWarnings(capped, 1).map((w) => w.code)).toEqual(['yoke.table-tolerance']);
  });
});
