import { describe, expect, it } from 'vitest';
import { blockInductance_H, collinearStripGmd_m, layerMutual_H, layersInductance_H, layersMutual_H, sheetInductance_H } from './coil-inductance.js';
import { brooksInductance_H, nagaokaInductance_H, wheelerMultilayer_H, wheelerSingleLayer_H } from './formulas.js';
import { filamentMutual_H, loopSelf_H } from './mutual.js';
import { resolveWinding, type WindingLayer } from './winding.js';

/** Plain double sum over every pair of turns, for checking the Toeplitz grouping. */
function direct(a: WindingLayer, b: WindingLayer): number {
  let s = 0;
  for (let i = 0; i < a.turns; i++)
    for (let j = 0; j < b.turns; j++) {
      const za = a.z0_m + i * a.pitch_m;
      const zb = b.z0_m + j * b.pitch_m;
      s += a === b && i === j ? loopSelf_H(a.radius_m, a.gmd_m) : filamentMutual_H(a.radius_m, b.radius_m, za - zb);
    }
  return a.sign * b.sign * s;
}

describe('layerMutual_H(a, b): Toeplitz grouping of equally spaced turns', () => {
  const A: WindingLayer = { radius_m: 0.03, z0_m: -0.01, pitch_m: 0.001, turns: 17, sign: 1, gmd_m: 3e-4 };
  const B: WindingLayer = { radius_m: 0.034, z0_m: -0.0042, pitch_m: 0.001, turns: 9, sign: -1, gmd_m: 3e-4 };
  const Cq: WindingLayer = { radius_m: 0.05, z0_m: 0.02, pitch_m: 0.0013, turns: 7, sign: 1, gmd_m: 3e-4 };
  it('equals the direct pair sum for one layer with itself (1e-12 relative; same terms, different order)', () => {
    expect(layerMutual_H(A, A) / direct(A, A)).toBeCloseTo(1, 12);
  });
  it('equals the direct pair sum for two layers of equal pitch, unequal counts, opposing signs', () => {
    expect(layerMutual_H(A, B) / direct(A, B)).toBeCloseTo(1, 12);
    expect(layerMutual_H(B, A) / direct(A, B)).toBeCloseTo(1, 12);
  });
  it('equals the direct pair sum for layers of unequal pitch (direct branch)', () => {
    expect(layerMutual_H(A, Cq) / direct(A, Cq)).toBeCloseTo(1, 12);
  });
  it('two windings in series opposing: L = L1 + L2 − 2M', () => {
    const w1 = resolveWinding({ innerRadius_m: 0.02, layers: 2, length_m: 0.01, centre_m: -0.01, conductor: { shape: 'round', diameter_m: 1e-3 } });
    const w2 = resolveWinding({ innerRadius_m: 0.02, layers: 2, length_m: 0.01, centre_m: 0.01, conductor: { shape: 'round', diameter_m: 1e-3 }, sense: 'opposing' });
    const L1 = layersInductance_H(w1.layerList);
    const L2 = layersInductance_H(w2.layerList);
    const M = layersMutual_H(w1.layerList, w2.layerList); // signed: negative
    expect(M).toBeLessThan(0);
    expect(layersInductance_H([...w1.layerList, ...w2.layerList]) / (L1 + L2 + 2 * M)).toBeCloseTo(1, 12);
  });
});

describe('collinearStripGmd_m', () => {
  it('touching strips: g = 4·e^(−3/2)·w = 0.8925·w (Grover ch. 2, GMD of adjacent segments)', () => {
    expect(collinearStripGmd_m(1, 1)).toBeCloseTo(4 * Math.exp(-1.5), 12);
  });
  it('far strips: g/d → 1 − 1/(12δ²) (expansion of the same formula)', () => {
    expect(collinearStripGmd_m(1, 50) / 50).toBeCloseTo(1 - 1 / (12 * 2500), 8);
  });
});

describe('inductance against published values', () => {
  // Grover, Inductance Calculations, Table 36 (REFERENCES.md): Nagaoka's coefficient, 4 decimals.
  const table: [number, number][] = [
    [1, 0.6884],
    [2, 0.5255],
    [5, 0.3198],
    [10, 0.2033],
  ];
  for (const [x, kn] of table) {
    it(`current sheet D/ℓ = ${x}: 320 ribbons give Grover's K_N = ${kn} within half a unit of the 4th decimal (+1e-5 model)`, () => {
      const r = 0.05;
      const len = (2 * r) / x;
      const N = 100;
      const L = sheetInductance_H(r, len, N, 320);
      const KN = L / ((4e-7 * Math.PI * Math.PI * r * r * N * N) / len);
      expect(Math.abs(KN - kn)).toBeLessThan(0.00005 + 1e-5);
    });
  }

  it('the sheet sum converges as 1/nz² (error falls ≥ 12× per 4× refinement at D/ℓ = 1; convergence as filaments are refined)', () => {
    const ref = nagaokaInductance_H(0.05, 0.1, 100);
    const err = [10, 40, 160].map((n) => Math.abs(sheetInductance_H(0.05, 0.1, 100, n) / ref - 1));
    expect(err[0] / err[1]).toBeGreaterThan(12);
    expect(err[1] / err[2]).toBeGreaterThan(12);
    expect(err[2]).toBeLessThan(2e-5);
  });

  it('Brooks coil: uniform-density block converges to L = 1.6994e-6·a·N² (Grover) as 1/n², within 5e-5 at 32×32 (Grover prints 5 digits: ±3e-5)', () => {
    const c = 0.02;
    const a = 1.5 * c;
    const N = 100;
    const ref = brooksInductance_H(a, N);
    const err = [4, 8, 16, 32].map((n) => Math.abs(blockInductance_H(a - c / 2, a + c / 2, c, N, n, n) / ref - 1));
    for (let i = 1; i < err.length; i++) expect(err[i]).toBeLessThan(err[i - 1]);
    expect(err[1] / err[2]).toBeGreaterThan(3);
    expect(err[3]).toBeLessThan(5e-5);
  });

  it('Brooks coil wound of 20 × 20 square wires: per-turn sum equals the 20 × 20 block sum (same model) and Brooks within 2e-4', () => {
    const c = 0.02;
    const p = c / 20;
    const w = resolveWinding({ innerRadius_m: c, outerRadius_m: 2 * c, length_m: c, conductor: { shape: 'rectangular', width_m: p, height_m: p } });
    expect(w.turns).toBe(400);
    const L = layersInductance_H(w.layerList);
    expect(L / blockInductance_H(c, 2 * c, c, 400, 20, 20)).toBeCloseTo(1, 12);
    expect(Math.abs(L / brooksInductance_H(1.5 * c, 400) - 1)).toBeLessThan(2e-4);
  });

  it('Brooks coil of 400 round wires on the same grid: within 0.1 % of Brooks (round-wire self terms differ from square cells by Rosa-type corrections of order 1/N)', () => {
    const c = 0.02;
    const p = c / 20;
    const w = resolveWinding({ innerRadius_m: c, outerRadius_m: 2 * c, length_m: c, packingFactor: 0.95 ** 2, conductor: { shape: 'round', diameter_m: 0.95 * p } });
    expect(w.turns).toBe(400);
    expect(Math.abs(layersInductance_H(w.layerList) / brooksInductance_H(1.5 * c, 400) - 1)).toBeLessThan(1e-3);
  });

  for (const [r, len] of [
    [0.05, 0.1],
    [0.05, 0.05],
    [0.02, 0.3],
  ] as const) {
    it(`Wheeler single-layer (Proc. IRE 1928) agrees within its stated 1 % for ℓ > 0.8r: r = ${r}, ℓ = ${len}`, () => {
      const ours = sheetInductance_H(r, len, 60, 240);
      expect(Math.abs(wheelerSingleLayer_H(r, len, 60) / ours - 1)).toBeLessThan(0.01);
    });
  }

  it("Wheeler multilayer (Proc. IRE 1928) agrees within its stated 1 % when 6r ≈ 9ℓ ≈ 10c", () => {
    const r = 0.03;
    const len = 0.02;
    const c = 0.018;
    const ours = blockInductance_H(r - c / 2, r + c / 2, len, 500, 32, 32);
    expect(Math.abs(wheelerMultilayer_H(r, len, c, 500) / ours - 1)).toBeLessThan(0.01);
  });
});
