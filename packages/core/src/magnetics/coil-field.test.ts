import { describe, expect, it } from 'vitest';
import { layersField, volumeFieldStats } from './coil-field.js';
import { uniformBlockLayers } from './coil-inductance.js';
import { helmholtzCentreField_ApmPerA, longSolenoidField_ApmPerA, thickSolenoidAxialField_ApmPerA } from './formulas.js';
import { resolveWinding, type WindingLayer } from './winding.js';

const loop = (r: number, z: number, turns = 1): WindingLayer => ({ radius_m: r, z0_m: z, pitch_m: 1, turns, sign: 1, gmd_m: 1e-4 });

describe('layersField(layers, r, z)', () => {
  it('Helmholtz pair: (4/5)^{3/2}·N/R at the centre (REFERENCES.md), 1e-12', () => {
    const R = 0.1;
    const pair = [loop(R, -R / 2), loop(R, R / 2)];
    expect(layersField(pair, 0, 0).hz / helmholtzCentreField_ApmPerA(R, 1)).toBeCloseTo(1, 12);
  });

  it('Helmholtz pair: the field is flat at the centre to fourth order (∂²H/∂z² = 0): H(±R/20) within 1e-5 of H(0)', () => {
    const R = 0.1;
    const pair = [loop(R, -R / 2), loop(R, R / 2)];
    const h0 = layersField(pair, 0, 0).hz;
    expect(Math.abs(layersField(pair, 0, R / 20).hz / h0 - 1)).toBeLessThan(1e-5);
    expect(Math.abs(layersField(pair, R / 20, 0).hz / h0 - 1)).toBeLessThan(1e-5);
  });

  it('single loop on its axis: a²/(2(a² + z²)^{3/2})', () => {
    expect(layersField([loop(0.05, 0.01)], 0, 0.03).hz).toBeCloseTo(0.05 ** 2 / (2 * (0.05 ** 2 + 0.02 ** 2) ** 1.5), 10);
  });

  it('long solenoid limit: 2000 turns over 2 m at 1 cm radius gives N/ℓ within 1e-4 at the centre (Ampère; end correction (a/ℓ)²·2 ≈ 5e-5)', () => {
    const w = resolveWinding({ innerRadius_m: 0.0095, layers: 1, length_m: 2, turnsPerLayer: 2000, conductor: { shape: 'round', diameter_m: 1e-3 } });
    const h = layersField(w.layerList, 0, 0).hz;
    expect(Math.abs(h / longSolenoidField_ApmPerA(2, 2000) - 1)).toBeLessThan(1e-4);
    // off the axis inside a long solenoid the field is the same (uniform interior)
    expect(Math.abs(layersField(w.layerList, 0.006, 0.1).hz / h - 1)).toBeLessThan(1e-4);
  });

  it('thick solenoid (Montgomery 1969): block of sub-filaments converges to the closed form at the centre and on the axis, error ≤ 2e-4 at 48 × 48 and falling as 1/n² (midpoint rule)', () => {
    const a1 = 0.02;
    const a2 = 0.045;
    const len = 0.06;
    const N = 600;
    const field = (n: number, z: number) => (N / (n * n)) * layersField(uniformBlockLayers(a1, a2, len, 0, n, n), 0, z).hz;
    for (const z of [0, 0.02, 0.05]) {
      const ref = thickSolenoidAxialField_ApmPerA(a1, a2, len, N, z);
      const e6 = Math.abs(field(6, z) / ref - 1);
      const e24 = Math.abs(field(24, z) / ref - 1);
      const e48 = Math.abs(field(48, z) / ref - 1);
      expect(e48).toBeLessThan(2e-4);
      expect(e6 / e24).toBeGreaterThan(12); // 16 for a clean second-order rule
      expect(e24 / e48).toBeGreaterThan(3);
    }
  });

  it('off the axis in the bore, the field is curl-free: ∂H_z/∂r = ∂H_r/∂z (Ampère, no current there), to 1e-6 relative by central differences', () => {
    const w = resolveWinding({ innerRadius_m: 0.02, layers: 4, length_m: 0.03, conductor: { shape: 'round', diameter_m: 1.5e-3 } });
    const h = 1e-5;
    const r = 0.012;
    const z = 0.009;
    const dHzdr = (layersField(w.layerList, r + h, z).hz - layersField(w.layerList, r - h, z).hz) / (2 * h);
    const dHrdz = (layersField(w.layerList, r, z + h).hr - layersField(w.layerList, r, z - h).hr) / (2 * h);
    expect(Math.abs(dHzdr - dHrdz)).toBeLessThan(1e-6 * Math.abs(layersField(w.layerList, r, z).hz) / 0.01);
    // and divergence-free: (1/r)∂(r·H_r)/∂r + ∂H_z/∂z = 0
    const dRHr = ((r + h) * layersField(w.layerList, r + h, z).hr - (r - h) * layersField(w.layerList, r - h, z).hr) / (2 * h);
    const dHzdz = (layersField(w.layerList, r, z + h).hz - layersField(w.layerList, r, z - h).hz) / (2 * h);
    expect(Math.abs(dRHr / r + dHzdz)).toBeLessThan(1e-6 * Math.abs(layersField(w.layerList, r, z).hz) / 0.01);
  });
});

describe('volumeFieldStats(field, part)', () => {
  it('mean of H_z = r² over a solid cylinder of radius R is R²/2 (exact for Gauss–Legendre), min on the axis', () => {
    const s = volumeFieldStats((r) => ({ hz: r * r, hr: 0 }), { innerRadius_m: 0, outerRadius_m: 0.01, length_m: 0.02, centre_m: 0.003 });
    expect(s.mean_ApmPerA).toBeCloseTo(0.5e-4, 15);
    expect(s.min_ApmPerA).toBe(0);
    expect(s.minAt.r_m).toBe(0);
    expect(s.max_ApmPerA).toBeCloseTo(1e-4, 15);
  });
  it('mean of H_z = z over a ring centred at z_c is z_c; the minimum sits at the lower end face', () => {
    const s = volumeFieldStats((_r, z) => ({ hz: z, hr: 0.1 * z }), { innerRadius_m: 0.005, outerRadius_m: 0.01, length_m: 0.02, centre_m: 0.03 });
    expect(s.mean_ApmPerA).toBeCloseTo(0.03, 14);
    expect(s.minAt.z_m).toBeCloseTo(0.02, 14);
    expect(s.centre_ApmPerA).toBeCloseTo(0.03, 14);
    expect(s.maxRadialRatio).toBeCloseTo(0.1, 14);
  });
});
