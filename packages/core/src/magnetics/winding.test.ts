import { describe, expect, it } from 'vitest';
import { isInputError } from '../design/errors.js';
import { resolveWinding, type WindingSpec } from './winding.js';

const RHO_CU = 1.7241e-8; // IEC 60028 (REFERENCES.md)
const DENSITY_CU = 8890; // IEC 60028
const CP_CU = 385; // CRC Handbook

describe('resolveWinding(spec)', () => {
  it('10 layers × 20 turns of 1.0 mm wire (build 0.1 mm) from the outer radius: turns, length, R20, mass, heat capacity by closed form', () => {
    const w = resolveWinding({
      innerRadius_m: 0.02,
      outerRadius_m: 0.02 + 10 * 1.1e-3,
      length_m: 20 * 1.1e-3,
      conductor: { shape: 'round', diameter_m: 1.0e-3, insulationBuild_m: 0.1e-3 },
    });
    expect(w.layers).toBe(10);
    expect(w.turnsPerLayer).toBe(20);
    expect(w.turns).toBe(200);
    const rMean = 0.02 + 5 * 1.1e-3; // uniform layers: the mean turn radius is the window's mean radius
    const length = 200 * 2 * Math.PI * rMean;
    const area = (Math.PI * 1e-6) / 4;
    expect(w.conductorLength_m).toBeCloseTo(length, 12);
    expect(w.resistance20_Ohm / ((RHO_CU * length) / area)).toBeCloseTo(1, 12); // R = ρℓ/A
    expect(w.mass_kg / (DENSITY_CU * area * length)).toBeCloseTo(1, 12);
    expect(w.heatCapacity_JpK / (DENSITY_CU * area * length * CP_CU)).toBeCloseTo(1, 12);
    expect(w.fillFactor).toBeCloseTo(area / 1.1e-3 ** 2, 9);
  });

  it('AWG 14 round wire has the ASTM B258 diameter 1.628 mm', () => {
    const w = resolveWinding({ innerRadius_m: 0.01, layers: 2, length_m: 0.01, conductor: { shape: 'round', awg: 14 } });
    expect(w.wireDiameter_m! * 1e3).toBeCloseTo(1.628, 3);
    expect(w.turnsPerLayer).toBe(Math.floor(10 / 1.6277));
    expect(w.outerRadius_m).toBeCloseTo(0.01 + 2 * w.wireDiameter_m!, 12);
  });

  it('rectangular conductor: area w·h − (4 − π)·r², pitches from the outer size', () => {
    const w = resolveWinding({
      innerRadius_m: 0.03,
      layers: 4,
      turnsPerLayer: 10,
      length_m: 0.031,
      conductor: { shape: 'rectangular', width_m: 3e-3, height_m: 2e-3, cornerRadius_m: 0.5e-3, insulationBuild_m: 0.1e-3 },
    });
    expect(w.conductorArea_m2).toBeCloseTo(6e-6 - (4 - Math.PI) * 0.25e-6, 15);
    expect(w.outerRadius_m).toBeCloseTo(0.03 + 4 * 2.1e-3, 12);
    expect(w.axialPitch_m).toBeCloseTo(0.0031, 12);
  });

  it('a packing factor of 0.81 stretches both pitches by 1/0.9', () => {
    const w = resolveWinding({ innerRadius_m: 0.01, layers: 3, length_m: 0.1, packingFactor: 0.81, conductor: { shape: 'round', diameter_m: 1e-3 } });
    expect(w.radialPitch_m).toBeCloseTo(1e-3 / 0.9, 12);
    expect(w.turnsPerLayer).toBe(Math.floor(0.1 / (1e-3 / 0.9)));
  });

  it('a fill factor sets the copper fraction of the window (achieved ≤ requested, equal when the grid fits exactly)', () => {
    const area = (Math.PI * 1e-6) / 4;
    const f = 0.5;
    const cell = Math.sqrt(area / f); // square cell for a round wire
    const w = resolveWinding({ innerRadius_m: 0.01, outerRadius_m: 0.01 + 8 * cell, length_m: 12 * cell, fillFactor: f, conductor: { shape: 'round', diameter_m: 1e-3 } });
    expect(w.turns).toBe(96);
    expect(w.fillFactor).toBeCloseTo(f, 9);
  });

  it('opposing sense gives sign −1 on every layer; aluminium takes its own resistivity (IEC 60028, 61 % IACS)', () => {
    const w = resolveWinding({ innerRadius_m: 0.01, layers: 1, length_m: 0.01, conductor: { shape: 'round', diameter_m: 1e-3 }, sense: 'opposing', metal: 'aluminium' });
    expect(w.layerList.every((l) => l.sign === -1)).toBe(true);
    expect(w.resistance20_Ohm / ((2.8264e-8 * w.conductorLength_m) / w.conductorArea_m2)).toBeCloseTo(1, 12);
  });

  const bad: [string, WindingSpec, string][] = [
    ['too many turns per layer', { innerRadius_m: 0.01, layers: 1, turnsPerLayer: 11, length_m: 0.01, conductor: { shape: 'round', diameter_m: 1e-3 } }, 'turnsPerLayer'],
    ['too many layers for the depth', { innerRadius_m: 0.01, outerRadius_m: 0.012, layers: 3, length_m: 0.01, conductor: { shape: 'round', diameter_m: 1e-3 } }, 'layers'],
    ['neither outer radius nor layers', { innerRadius_m: 0.01, length_m: 0.01, conductor: { shape: 'round', diameter_m: 1e-3 } }, 'outerRadius'],
    ['fill factor above what the wire allows', { innerRadius_m: 0.01, layers: 2, length_m: 0.01, fillFactor: 0.9, conductor: { shape: 'round', diameter_m: 1e-3 } }, 'fillFactor'],
    ['no diameter nor gauge', { innerRadius_m: 0.01, layers: 2, length_m: 0.01, conductor: { shape: 'round' } }, 'conductor'],
  ];
  for (const [what, spec, path] of bad) {
    it(`throws an InputError at \`${path}\` for ${what}`, () => {
      let err: unknown;
      try {
        resolveWinding(spec);
      } catch (e) {
        err = e;
      }
      expect(isInputError(err)).toBe(true);
      expect((err as { path: string }).path).toBe(path);
    });
  }
});
