/**
 * Coaxial rings of rectangular cross-section carrying a uniform current density: the cells into
 * which conductive bodies are split (shells.ts). A cell is the rectangle [r1, r2] × [z1, z2] in
 * the (r, z) half-plane; one ampere through it means a current density 1/((r2 − r1)(z2 − z1)).
 *
 * Inductances are flux-linkage averages over both cross-sections (the Galerkin form that keeps
 * the energy ½·iᵀ·L·i exact for piecewise-uniform currents). Each cell is split into equal
 * pieces; the average over piece pairs is a sum over rows of pieces, and, because pieces of equal
 * height repeat along z, each row pair needs one kernel per axial offset (a Toeplitz sum). The
 * kernel for two pieces (w1 × h1 at r_a, w2 × h2 at r_b, dz apart):
 *
 *   gap ≥ size:   2 × 2 Gauss–Legendre points over each piece (16 Maxwell filaments; exact for
 *                 the r² flux of a uniform field, error O((size/gap)⁴))
 *   nearer:       M = Maxwell(r_a, r_b, dz) + µ0·√(r_a·r_b)·ln(ρ/g)    (ρ centre distance,
 *                 g the exact GMD of the two rectangles, gmd.ts)
 *   itself:       L = µ0·r·(ln(8r/g) − 2), split recursively while the piece is larger than eps·r
 *
 * The near-field form is Maxwell's GMD method (Grover, Inductance Calculations, ch. 2): close
 * thin rings link flux as µ0·√(ab)·(ln(8√(ab)/g) − 2), so replacing the centre distance by the
 * GMD corrects the filament formula to second order in section/radius. Piece sizes: for a cell's
 * own inductance and for touching cells, eps × max(mean radius, rFloor) (rFloor keeps the core
 * of a solid body from being cut into thousands of pieces; its own pieces are still split by the
 * recursion above); for separated cells, up to a third of the gap between them. Far pairs (centre
 * distance over 4 × the sum of sizes) take the 2 × 2 Gauss rule over each whole cell.
 *
 * Field of a cell at a point: on the axis, the closed form of a uniform-density winding
 * (Montgomery, Solenoid Magnet Design, 1969; formulas.ts); off the axis, Gauss–Legendre
 * quadrature of the filament field (loop-field.ts) with recursive splitting near the point.
 */
import { MU0_HpM } from './constants.js';
import { rectRectLogGmd, type Rect } from './gmd.js';
import { loopField, type FieldPerAmpere } from './loop-field.js';
import { filamentMutual_H, loopSelf_H, rectangleGmd_m } from './mutual.js';
import { gaussLegendre } from './quadrature.js';

/** Cross-section of a ring: x = r (m), y = z (m). */
export type RingCell = Rect;

export interface CellSplitOptions {
  /** Largest sub-cell size near another cell, as a fraction of the radius (see rFloor). Default 0.25. */
  eps?: number;
  /** Radius below which `eps` is taken relative to rFloor instead of the cell's own mean radius, m. Default 0. */
  rFloor?: number;
}

const DEFAULT_EPS = 0.25;

export function cellSize(c: RingCell): number {
  return Math.max(c.x2 - c.x1, c.y2 - c.y1);
}

/** A cell split into nr × nz equal sub-cells: rows at radii `rows`, width w, height h, first centre at z0. */
export interface SubGrid {
  rows: number[];
  w: number;
  h: number;
  nz: number;
  z0: number;
}

/** Sub-cell size wanted for near interactions of a cell: eps × max(mean radius, rFloor). */
export function pieceSize(c: RingCell, opt: CellSplitOptions = {}): number {
  return (opt.eps ?? DEFAULT_EPS) * Math.max((c.x1 + c.x2) / 2, opt.rFloor ?? 0);
}

/** Splits a cell into equal sub-cells at most `target` in each direction. */
export function subGrid(c: RingCell, target: number): SubGrid {
  const nr = Math.max(1, Math.ceil((c.x2 - c.x1) / target - 1e-9));
  const nz = Math.max(1, Math.ceil((c.y2 - c.y1) / target - 1e-9));
  const w = (c.x2 - c.x1) / nr;
  const h = (c.y2 - c.y1) / nz;
  return { rows: Array.from({ length: nr }, (_, i) => c.x1 + (i + 0.5) * w), w, h, nz, z0: c.y1 + h / 2 };
}

const G2 = 1 / Math.sqrt(3);

/**
 * Mutual inductance of two small sections (w1×h1 centred at (ra, 0), w2×h2 at (rb, dz)):
 * separated by at least their size, the 2 × 2 Gauss–Legendre rule over each (exact for the r²
 * flux of a uniform field, error O((size/gap)⁴)), reduced to the two radial points of each at
 * the axial centres beyond 20 sizes (the axial midpoint error is then below (1/20)²/24 of the
 * axial curvature term); closer, the centre filament with Maxwell's GMD correction
 * µ0·√(ra·rb)·(ln ρ − ln g).
 */
function pairKernel(ra: number, rb: number, dz: number, w1: number, h1: number, w2: number, h2: number): number {
  const gapR = Math.max(0, Math.abs(ra - rb) - (w1 + w2) / 2);
  const gapZ = Math.max(0, Math.abs(dz) - (h1 + h2) / 2);
  const size = Math.max(w1, h1, w2, h2);
  const gap = Math.hypot(gapR, gapZ);
  if (gap >= 20 * size) {
    const a1 = ra - (G2 * w1) / 2;
    const a2 = ra + (G2 * w1) / 2;
    const b1 = rb - (G2 * w2) / 2;
    const b2 = rb + (G2 * w2) / 2;
    return (filamentMutual_H(a1, b1, dz) + filamentMutual_H(a1, b2, dz) + filamentMutual_H(a2, b1, dz) + filamentMutual_H(a2, b2, dz)) / 4;
  }
  if (gap >= size) {
    let s = 0;
    for (const u of [-G2, G2])
      for (const v of [-G2, G2])
        for (const p of [-G2, G2])
          for (const q of [-G2, G2]) s += filamentMutual_H(ra + (u * w1) / 2, rb + (p * w2) / 2, dz + (q * h2) / 2 - (v * h1) / 2);
    return s / 16;
  }
  const rho = Math.hypot(ra - rb, dz);
  const a = { x1: ra - w1 / 2, x2: ra + w1 / 2, y1: -h1 / 2, y2: h1 / 2 };
  const b = { x1: rb - w2 / 2, x2: rb + w2 / 2, y1: dz - h2 / 2, y2: dz + h2 / 2 };
  return filamentMutual_H(ra, rb, dz) + MU0_HpM * Math.sqrt(ra * rb) * (Math.log(rho) - rectRectLogGmd(a, b));
}

/**
 * Self inductance of a small section w × h at radius r: Rosa's thin-loop form with the section's
 * GMD when it is small against r (max(w, h) ≤ eps·r), otherwise the average over its halves
 * (split along the longer side, or both ways when square), recursively, at most 6 levels deep
 * (near the axis, where no split makes a section thin; the GMD is then held below r/2).
 * Results are remembered (the same pieces recur along every row).
 */
const selfMemo = new Map<string, number>();
function pieceSelf(r: number, w: number, h: number, depth = 0): number {
  if (Math.max(w, h) <= DEFAULT_EPS * r || depth >= 4) return loopSelf_H(r, Math.min(rectangleGmd_m(w, h), 0.5 * r));
  const key = `${r}|${w}|${h}`;
  const hit = selfMemo.get(key);
  if (hit !== undefined) return hit;
  if (selfMemo.size > 10000) selfMemo.clear();
  const nr = w >= 2 * h ? 2 : h >= 2 * w ? 1 : 2;
  const nz = h >= 2 * w ? 2 : w >= 2 * h ? 1 : 2;
  const sw = w / nr;
  const sh = h / nz;
  const subs: [number, number][] = [];
  for (let i = 0; i < nr; i++) for (let j = 0; j < nz; j++) subs.push([r - w / 2 + (i + 0.5) * sw, (j + 0.5) * sh]);
  let sum = 0;
  for (let a = 0; a < subs.length; a++) {
    sum += pieceSelf(subs[a][0], sw, sh, depth + 1);
    for (let b = a + 1; b < subs.length; b++) sum += 2 * pairKernel(subs[a][0], subs[b][0], subs[b][1] - subs[a][1], sw, sh, sw, sh);
  }
  const L = sum / (subs.length * subs.length);
  selfMemo.set(key, L);
  return L;
}

/** Σ over the sub-cells of row i of grid A and row j of grid B (Toeplitz in the axial offset when heights match). */
function rowPairSum(A: SubGrid, i: number, B: SubGrid, j: number, sameRow: boolean): number {
  const ra = A.rows[i];
  const rb = B.rows[j];
  let sum = 0;
  if (Math.abs(A.h - B.h) <= 1e-12 * Math.max(A.h, B.h)) {
    for (let d = -(B.nz - 1); d <= A.nz - 1; d++) {
      const count = Math.min(A.nz - 1, B.nz - 1 + d) - Math.max(0, d) + 1;
      if (count <= 0) continue;
      if (sameRow && d === 0) sum += count * pieceSelf(ra, A.w, A.h);
      else if (sameRow && d < 0) continue; // counted with −d below (symmetric)
      else sum += (sameRow ? 2 : 1) * count * pairKernel(ra, rb, A.z0 - B.z0 + d * A.h, A.w, A.h, B.w, B.h);
    }
  } else {
    for (let p = 0; p < A.nz; p++)
      for (let q = 0; q < B.nz; q++) sum += pairKernel(ra, rb, A.z0 + p * A.h - (B.z0 + q * B.h), A.w, A.h, B.w, B.h);
  }
  return sum;
}

/** Self inductance of a cell with uniform current density, H. */
export function cellSelf_H(c: RingCell, opt: CellSplitOptions = {}): number {
  const G = subGrid(c, pieceSize(c, opt));
  const nr = G.rows.length;
  let sum = 0;
  for (let i = 0; i < nr; i++) {
    sum += rowPairSum(G, i, G, i, true);
    for (let j = i + 1; j < nr; j++) sum += 2 * rowPairSum(G, i, G, j, false);
  }
  const N = nr * G.nz;
  return sum / (N * N);
}

function gl2Points(c: RingCell): { r: number; z: number; w: number }[] {
  const { nodes, weights } = gaussLegendre(2);
  const out: { r: number; z: number; w: number }[] = [];
  for (let i = 0; i < 2; i++)
    for (let j = 0; j < 2; j++)
      out.push({
        r: (c.x1 + c.x2) / 2 + ((c.x2 - c.x1) / 2) * nodes[i],
        z: (c.y1 + c.y2) / 2 + ((c.y2 - c.y1) / 2) * nodes[j],
        w: (weights[i] * weights[j]) / 4,
      });
  return out;
}

/** Mutual inductance between two distinct (non-overlapping) cells with uniform current densities, H. */
export function cellMutual_H(a: RingCell, b: RingCell, opt: CellSplitOptions = {}): number {
  const D = Math.hypot((a.x1 + a.x2 - b.x1 - b.x2) / 2, (a.y1 + a.y2 - b.y1 - b.y2) / 2);
  if (D > 4 * (cellSize(a) + cellSize(b))) {
    const pa = gl2Points(a);
    const pb = gl2Points(b);
    let s = 0;
    for (const p of pa) for (const q of pb) s += p.w * q.w * filamentMutual_H(p.r, q.r, p.z - q.z);
    return s;
  }
  // pieces no larger than a third of the gap between the cells (then every piece pair is at
  // least three sizes apart and takes the Gauss rule), nor smaller than the near-field size
  const gap = rectGap(a, b);
  const target = Math.max(Math.min(pieceSize(a, opt), pieceSize(b, opt)), gap / 3);
  const A = subGrid(a, target);
  const B = subGrid(b, target);
  let s = 0;
  for (let i = 0; i < A.rows.length; i++) for (let j = 0; j < B.rows.length; j++) s += rowPairSum(A, i, B, j, false);
  return s / (A.rows.length * A.nz * B.rows.length * B.nz);
}

function rectGap(a: RingCell, b: RingCell): number {
  const dx = Math.max(0, a.x1 - b.x2, b.x1 - a.x2);
  const dy = Math.max(0, a.y1 - b.y2, b.y1 - a.y2);
  return Math.hypot(dx, dy);
}

/** Distance from a point to a rectangle (0 inside). */
function pointRectDistance(r: number, z: number, c: RingCell): number {
  const dx = r < c.x1 ? c.x1 - r : r > c.x2 ? r - c.x2 : 0;
  const dy = z < c.y1 ? c.y1 - z : z > c.y2 ? z - c.y2 : 0;
  return Math.hypot(dx, dy);
}

/** Axial field on the axis of a uniform-density ring, per ampere of its total current (Montgomery 1969). */
function cellFieldOnAxis(c: RingCell, z: number): number {
  const J = 1 / ((c.x2 - c.x1) * (c.y2 - c.y1));
  const term = (u: number) => (u === 0 ? 0 : u * Math.log((c.x2 + Math.hypot(c.x2, u)) / (c.x1 + Math.hypot(c.x1, u))));
  return (J / 2) * (term(z - c.y1) - term(z - c.y2));
}

function glField(c: RingCell, r: number, z: number, n: number, weight: number, acc: FieldPerAmpere): void {
  const { nodes, weights } = gaussLegendre(n);
  const hr = (c.x2 - c.x1) / 2;
  const hz = (c.y2 - c.y1) / 2;
  const cr = (c.x1 + c.x2) / 2;
  const cz = (c.y1 + c.y2) / 2;
  for (let i = 0; i < n; i++)
    for (let j = 0; j < n; j++) {
      const f = loopField(cr + hr * nodes[i], cz + hz * nodes[j], r, z);
      if (!Number.isFinite(f.hz) || !Number.isFinite(f.hr)) continue;
      const w = (weight * weights[i] * weights[j]) / 4;
      acc.hz += w * f.hz;
      acc.hr += w * f.hr;
    }
}

function adaptiveField(c: RingCell, r: number, z: number, weight: number, minSize: number, acc: FieldPerAmpere): void {
  const d = pointRectDistance(r, z, c);
  const s = cellSize(c);
  if (d > 3 * s) return glField(c, r, z, 2, weight, acc);
  if (d > 1.2 * s) return glField(c, r, z, 4, weight, acc);
  if (s < minSize) return glField(c, r, z, 2, weight, acc);
  // split into near-square pieces: along the long side first, then 2 × 2
  const w = c.x2 - c.x1;
  const h = c.y2 - c.y1;
  const nr = w >= 2 * h ? Math.ceil(w / h) : h >= 2 * w ? 1 : 2;
  const nz = h >= 2 * w ? Math.ceil(h / w) : w >= 2 * h ? 1 : 2;
  const pw = weight / (nr * nz);
  for (let i = 0; i < nr; i++)
    for (let j = 0; j < nz; j++)
      adaptiveField({ x1: c.x1 + (i * w) / nr, x2: c.x1 + ((i + 1) * w) / nr, y1: c.y1 + (j * h) / nz, y2: c.y1 + ((j + 1) * h) / nz }, r, z, pw, minSize, acc);
}

/** Field at (r, z) per ampere of the cell's total current (uniform density over its section), (A/m)/A. */
export function cellField(c: RingCell, r_m: number, z_m: number): FieldPerAmpere {
  if (r_m === 0) return { hz: cellFieldOnAxis(c, z_m), hr: 0 };
  const acc = { hz: 0, hr: 0 };
  adaptiveField(c, r_m, z_m, 1, 1e-4 * Math.min(c.x2 - c.x1, c.y2 - c.y1), acc);
  return acc;
}
