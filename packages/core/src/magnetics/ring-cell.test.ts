import { describe, expect, it } from 'vitest';
import { layersInductance_H, layersMutual_H, uniformBlockLayers } from './coil-inductance.js';
import { brooksInductance_H, thickSolenoidAxialField_ApmPerA } from './formulas.js';
import { cellField, cellMutual_H, cellSelf_H, type RingCell } from './ring-cell.js';

const cell = (x1: number, x2: number, y1: number, y2: number): RingCell => ({ x1, x2, y1, y2 });

/**
 * Independent reference: the cell as an n × m grid of midpoint filaments (coil-inductance.ts block
 * model, rectangle-GMD own terms), at two resolutions, Richardson-extrapolated for its O(1/n²) error.
 */
function blockRef(a: RingCell, b: RingCell | null, n: number, m: number): number {
  const blk = (q: RingCell, k: number) => uniformBlockLayers(q.x1, q.x2, q.y2 - q.y1, (q.y1 + q.y2) / 2, k, m * (k / n));
  const val = (k: number) => {
    const N = k * m * (k / n);
    return b === null ? layersInductance_H(blk(a, k)) / (N * N) : layersMutual_H(blk(a, k), blk(b, k)) / (N * N);
  };
  return (4 * val(2 * n) - val(n)) / 3;
}

describe('cellSelf_H / cellMutual_H: uniform-density rings', () => {
  it('Brooks section: N²·L_cell converges to 1.6994e-6·a·N² (Grover) as eps falls; within 0.4 % at the default eps = 0.25', () => {
    const c = 0.02;
    const ref = brooksInductance_H(1.5 * c, 1);
    const err = [0.5, 0.25, 0.125, 0.0625].map((eps) => Math.abs(cellSelf_H(cell(c, 2 * c, 0, c), { eps }) / ref - 1));
    expect(err[1]).toBeLessThan(4e-3);
    for (let i = 1; i < err.length; i++) expect(err[i]).toBeLessThan(err[i - 1]);
    expect(err[3]).toBeLessThan(1e-4); // Grover prints 5 digits (±3e-5)
  });

  const A = cell(0.01, 0.0103, 0, 0.005);
  const B = cell(0.0103, 0.0106, 0, 0.005); // touching A along r
  const C = cell(0.0103, 0.0106, 0.005, 0.01); // touching A at a corner
  const D = cell(0.012, 0.013, 0.002, 0.004); // apart
  const cases: [string, RingCell, RingCell | null][] = [
    ['self of a thin tall shell', A, null],
    ['mutual of radially touching shells', A, B],
    ['mutual of corner-touching cells', A, C],
    ['mutual of separated cells', A, D],
  ];
  for (const [what, a, b] of cases) {
    it(`${what}: within 0.25 % at eps = 0.25 and 0.03 % at eps = 0.1 of a Richardson-extrapolated filament grid`, () => {
      const ref = blockRef(a, b, 8, 64);
      const f = (eps: number) => (b === null ? cellSelf_H(a, { eps }) : cellMutual_H(a, b, { eps }));
      expect(Math.abs(f(0.25) / ref - 1)).toBeLessThan(2.5e-3);
      expect(Math.abs(f(0.1) / ref - 1)).toBeLessThan(3e-4);
    });
  }

  it('L − M of touching shells (what sets the eddy dynamics) is as accurate as L and M themselves (0.3 %)', () => {
    const ref = blockRef(A, null, 8, 64) - blockRef(A, B, 8, 64);
    expect(Math.abs((cellSelf_H(A) - cellMutual_H(A, B)) / ref - 1)).toBeLessThan(3e-3);
  });

  it('a solid core cell (r from 0) has a positive self inductance below that of the same section moved outward', () => {
    const core = cellSelf_H(cell(0, 0.001, 0, 0.02), { rFloor: 0.0025 });
    expect(core).toBeGreaterThan(0);
    expect(core).toBeLessThan(cellSelf_H(cell(0.001, 0.002, 0, 0.02), { rFloor: 0.0025 }));
  });

  it('is symmetric: M(a, b) = M(b, a)', () => {
    expect(cellMutual_H(A, D) / cellMutual_H(D, A)).toBeCloseTo(1, 12);
  });
});

describe('cellField(c, r, z)', () => {
  it('on the axis equals the thick-solenoid closed form (Montgomery 1969) for N = 1', () => {
    const c = cell(0.004, 0.009, -0.003, 0.005);
    const zc = 0.001;
    for (const z of [0, 0.004, -0.02]) {
      expect(cellField(c, 0, z).hz / thickSolenoidAxialField_ApmPerA(0.004, 0.009, 0.008, 1, z - zc)).toBeCloseTo(1, 12);
    }
  });

  // __reference__/cell_field.py: scipy dblquad of the filament field over the section (est. error ≤ 6e-5 A/m).
  const refs: [string, number, number, number][] = [
    ['inside the section', 0.0104, 0.0025, 58.7877072],
    ['on its outer edge', 0.0106, 0.0025, -69.7640297],
    ['inside, off-centre', 0.0101, 0.001, 112.076564],
    ['beside it', 0.012, 0.003, -40.5295379],
  ];
  for (const [where, r, z, ref] of refs) {
    it(`off the axis, ${where}: matches scipy's adaptive quadrature within 5e-5 relative`, () => {
      const c = cell(0.0103, 0.0106, 0, 0.005);
      expect(Math.abs(cellField(c, r, z).hz / ref - 1)).toBeLessThan(5e-5);
    });
  }
});
