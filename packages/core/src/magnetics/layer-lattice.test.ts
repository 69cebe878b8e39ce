import { describe, expect, it } from 'vitest';
import { LayerLattice } from './layer-lattice.js';
import { loopField } from './loop-field.js';
import { filamentMutual_H } from './mutual.js';
import type { WindingLayer } from './winding.js';

const layer: WindingLayer = { radius_m: 0.014, z0_m: -0.0195, pitch_m: 0.001, turns: 40, sign: 1, gmd_m: 3e-4 };
const direct = (k: (zeta: number) => number, z: number) => {
  let s = 0;
  for (let i = 0; i < layer.turns; i++) s += k(z - (layer.z0_m + i * layer.pitch_m));
  return s;
};

describe('LayerLattice: running sums over equally spaced turns', () => {
  const r = 0.008;
  const M = (zeta: number) => filamentMutual_H(layer.radius_m, r, zeta);

  it('equals the direct sum at lattice points (same terms; 1e-12 relative)', () => {
    const lat = new LayerLattice(layer, M, true, -0.01, 0.01, 0.00025);
    for (const k of [38, 40, 61, 100, 117]) {
      const z = layer.z0_m + k * lat.h;
      expect(lat.value(z) / direct(M, z)).toBeCloseTo(1, 12);
    }
  });

  it('interpolates between lattice points within 1e-5 when the spacing is a quarter of the distance to the turns (cubic error O(h⁴))', () => {
    const lat = new LayerLattice(layer, M, true, -0.01, 0.01, (layer.radius_m - r) / 4);
    for (const z of [-0.01, -0.00333, 0.00071, 0.0052, 0.01]) expect(Math.abs(lat.value(z) / direct(M, z) - 1)).toBeLessThan(1e-5);
  });

  it('its mean over an interval matches a fine trapezoid rule of the direct sum (1e-5)', () => {
    const lat = new LayerLattice(layer, M, true, -0.01, 0.01, 0.0005);
    const n = 2000;
    let s = 0;
    for (let j = 0; j <= n; j++) s += (j === 0 || j === n ? 0.5 : 1) * direct(M, -0.004 + (0.007 * j) / n);
    expect(Math.abs(lat.average(-0.004, 0.003) / (s / n) - 1)).toBeLessThan(1e-5);
  });

  it('handles an odd kernel (the radial field) and spends fewer evaluations than the direct sums', () => {
    const Hr = (zeta: number) => loopField(layer.radius_m, 0, r, zeta).hr;
    const lat = new LayerLattice(layer, Hr, false, -0.01, 0.01, 0.0015);
    for (const z of [-0.007, 0.0031]) expect(Math.abs(lat.value(z) - direct(Hr, z))).toBeLessThan(1e-5 * Math.abs(direct(Hr, -0.007)));
    expect(lat.evaluations).toBeLessThan(80); // direct: 40 per point
  });

  it('works for a one-turn layer', () => {
    const one: WindingLayer = { ...layer, turns: 1 };
    const lat = new LayerLattice(one, M, true, -0.01, 0.01, 0.001);
    expect(lat.value(0.0042) / M(0.0042 - one.z0_m)).toBeCloseTo(1, 5);
  });
});
