/**
 * Conductive bodies (coaxial cylinders and tubes: the part, a sleeve, a hub, a shaft, the fixture
 * housing) as coupled shorted loops: the eddy-current network of the discharge engine.
 *
 * Each body is split into cells: radial shells (equal by default; with `grading` q > 1 each shell
 * is q times thicker than the one outside it, to resolve a thin skin) times equal axial slices.
 * Equal shells suit the field at the centre best: the centre-field error of the step response
 * falls as 1/n² (about 1 % at 8 shells, 0.4 % at 16; eddy-step.test.ts). A cell
 * carries a uniform azimuthal current density (its own loop current spread over its section),
 * which gives, exactly for that current shape (Galerkin form):
 *
 *   resistance   R = ρ·2π·r_m/(Δr·Δz),  r_m = (r1 + r2)/2     (power ∫J²ρ dV with J = I/(Δr·Δz))
 *   heat capacity C = density·c_p·π·(r2² − r1²)·Δz
 *   inductances  self, cell–cell (ring-cell.ts), cell–coil (flux of the coil averaged over the
 *                cell's section, by lattice sums over the coil's turns: layer-lattice.ts)
 *
 * (The method is the axisymmetric partial-element or "circuit" model of eddy currents, as in
 * the magnetic-forming and induction-heating literature; it converges to the diffusion equation
 * as the cells shrink. Its check here is the step response of a long cylinder against Carslaw &
 * Jaeger's series, eddy-step.test.ts.) Every body is taken as non-magnetic (µ = µ0).
 *
 * Within a body all slices have the same height, so the mutual inductance between cells depends
 * only on the two shells and the slice offset: n_r(n_r + 1)/2 × n_z values are computed for the
 * n_r²·n_z²/2 pairs.
 *
 * Current sign convention: a loop's positive current circulates like the coil's positive
 * current (counter-clockwise seen from +z); induced currents come out negative.
 */
import { InputError } from '../design/errors.js';
import type { BodyMaterial } from './body-materials.js';
import type { Rect } from './gmd.js';
import { LayerLattice } from './layer-lattice.js';
import { filamentMutual_H } from './mutual.js';
import { gaussLegendreOn } from './quadrature.js';
import { cellField, cellMutual_H, cellSelf_H, type CellSplitOptions, type RingCell } from './ring-cell.js';
import type { WindingLayer } from './winding.js';

export interface BodySpec {
  /** Name for reports, e.g. "part", "sleeve", "housing"; unique. */
  name: string;
  /** 0 for a solid cylinder, m. */
  innerRadius_m: number;
  outerRadius_m: number;
  length_m: number;
  /** Axial position of the body's centre, m. Default 0. */
  centre_m?: number;
  material: BodyMaterial;
  /** Number of radial shells. Default: defaultRadialShells (10 for a solid body, fewer for a thin tube). */
  radialShells?: number;
  /** Number of equal axial slices. Default: length/outer radius, rounded, from 1 to 8. */
  axialSlices?: number;
  /** Thickness ratio of adjacent shells, inner/outer (≥ 1; 1 = equal shells). Default DEFAULT_GRADING. */
  grading?: number;
}

export const DEFAULT_RADIAL_SHELLS = 10;
export const DEFAULT_GRADING = 1;

/** Default radial shells: DEFAULT_RADIAL_SHELLS for a solid body; for a tube, 10 × wall/outer radius, from 2 to 10. */
export function defaultRadialShells(innerRadius_m: number, outerRadius_m: number): number {
  if (innerRadius_m === 0) return DEFAULT_RADIAL_SHELLS;
  return Math.min(DEFAULT_RADIAL_SHELLS, Math.max(2, Math.round((10 * (outerRadius_m - innerRadius_m)) / outerRadius_m)));
}

export function defaultAxialSlices(length_m: number, outerRadius_m: number): number {
  return Math.min(8, Math.max(1, Math.round(length_m / outerRadius_m)));
}

/** One cell of a body: its section, shell index (1 = outermost) and slice index (1 = lowest z). */
export interface BodyCell {
  cell: RingCell;
  shell: number;
  slice: number;
}

export interface BodyMesh {
  spec: BodySpec;
  centre_m: number;
  /** Radial edges, ascending (first = inner radius, last = outer radius). */
  radialEdges: number[];
  /** Axial edges, ascending. */
  axialEdges: number[];
  /** Cells ordered slice-major from the outermost shell: index = (slice − 1)·n_r + (shell − 1). */
  cells: BodyCell[];
}

function fail(path: string, value: unknown, expected: string, problem: string, code = 'design.out-of-range'): never {
  throw new InputError({ code, path, value, expected, problem });
}

/** Radial edges with shells thinnest outside: t_k = t_0·q^k from the outer surface inward. */
export function gradedEdges(inner_m: number, outer_m: number, n: number, q: number): number[] {
  const total = outer_m - inner_m;
  const t0 = q === 1 ? total / n : (total * (q - 1)) / (q ** n - 1);
  const edges = [outer_m];
  let r = outer_m;
  for (let k = 0; k < n - 1; k++) {
    r -= t0 * q ** k;
    edges.push(r);
  }
  edges.push(inner_m);
  return edges.reverse();
}

/** Splits a body into cells (paths of errors are relative to the body). */
export function meshBody(spec: BodySpec): BodyMesh {
  const { innerRadius_m: ri, outerRadius_m: ro, length_m: len } = spec;
  if (!(ri >= 0)) fail('innerRadius', ri, 'an inner radius of 0 (solid) or more', 'negative');
  if (!(ro > ri)) fail('outerRadius', ro, `an outer radius greater than the inner radius (${ri} m)`, 'not greater');
  if (!(len > 0)) fail('length', len, 'a length greater than 0', 'not positive');
  const nr = spec.radialShells ?? defaultRadialShells(ri, ro);
  if (!(Number.isInteger(nr) && nr >= 1 && nr <= 64)) fail('radialShells', nr, 'a whole number from 1 to 64', 'out of range');
  const nz = spec.axialSlices ?? defaultAxialSlices(len, ro);
  if (!(Number.isInteger(nz) && nz >= 1 && nz <= 64)) fail('axialSlices', nz, 'a whole number from 1 to 64', 'out of range');
  const q = spec.grading ?? DEFAULT_GRADING;
  if (!(q >= 1 && q <= 3)) fail('grading', q, 'a thickness ratio from 1 to 3', 'out of range');
  const m = spec.material;
  if (!(m.resistivity20_Ohm_m > 0)) fail('material.resistivity', m.resistivity20_Ohm_m, 'a resistivity greater than 0', 'not positive');
  const zc = spec.centre_m ?? 0;
  const radialEdges = gradedEdges(ri, ro, nr, q);
  const axialEdges = Array.from({ length: nz + 1 }, (_, k) => zc - len / 2 + (len * k) / nz);
  const cells: BodyCell[] = [];
  for (let k = 0; k < nz; k++)
    for (let s = 0; s < nr; s++) {
      const i = nr - 1 - s; // shell s+1 counted from the outside
      cells.push({ cell: { x1: radialEdges[i], x2: radialEdges[i + 1], y1: axialEdges[k], y2: axialEdges[k + 1] }, shell: s + 1, slice: k + 1 });
    }
  return { spec, centre_m: zc, radialEdges, axialEdges, cells };
}

/** One loop of the eddy network. */
export interface ShellLoop {
  name: string;
  body: string;
  shell: number;
  slice: number;
  cell: RingCell;
  inductance_H: number;
  resistance20_Ohm: number;
  tempCoeff_perK: number;
  heatCapacity_JpK: number;
  /** Mutual inductance to the coil (all windings in series, with their senses), H. */
  mutualToCoil_H: number;
}

export interface ShellNetwork {
  loops: ShellLoop[];
  /** n × n loop inductance matrix: self on the diagonal, mutuals elsewhere, H. */
  L: number[][];
  meshes: BodyMesh[];
  /** Kernel evaluations spent on the coil coupling (for the benchmark). */
  coilCouplingEvaluations: number;
}

export interface ShellOptions extends CellSplitOptions {}

/** Sub-cells near the axis are sized relative to this fraction of the body's outer radius (ring-cell.ts rFloor). */
export const RFLOOR_FRACTION = 0.25;

function loopName(mesh: BodyMesh, c: BodyCell): string {
  const nr = mesh.radialEdges.length - 1;
  const nz = mesh.axialEdges.length - 1;
  if (nr === 1 && nz === 1) return mesh.spec.name;
  if (nz === 1) return `${mesh.spec.name} r${c.shell}`;
  if (nr === 1) return `${mesh.spec.name} z${c.slice}`;
  return `${mesh.spec.name} r${c.shell} z${c.slice}`;
}

/** Distance between the segment of a layer's turn centres and a rectangle. */
function layerRectDistance(L: WindingLayer, r: Rect): number {
  const za = L.z0_m;
  const zb = L.z0_m + (L.turns - 1) * L.pitch_m;
  const dr = L.radius_m < r.x1 ? r.x1 - L.radius_m : L.radius_m > r.x2 ? L.radius_m - r.x2 : 0;
  const dz = zb < r.y1 ? r.y1 - zb : za > r.y2 ? za - r.y2 : 0;
  return Math.hypot(dr, dz);
}

/**
 * Average over r ∈ [a, b] of the cubic in s = r² through 4 (r, Φ) points. Interpolating in r²
 * keeps the flux's natural form near the axis (Φ = c·r² + d·r⁴ + …, exact up to r⁶); the
 * integrand is then a polynomial of degree 6 in r, integrated exactly by 4-point Gauss–Legendre.
 */
function cubicInR2Average(rs: number[], ys: number[], a: number, b: number): number {
  const ss = rs.map((r) => r * r);
  const lag = (r: number) => {
    const x = r * r;
    let v = 0;
    for (let i = 0; i < 4; i++) {
      let w = 1;
      for (let j = 0; j < 4; j++) if (j !== i) w *= (x - ss[j]) / (ss[i] - ss[j]);
      v += w * ys[i];
    }
    return v;
  };
  const g = gaussLegendreOn(4, a, b);
  let sum = 0;
  for (let i = 0; i < 4; i++) sum += g.w[i] * lag(g.x[i]);
  return sum / (b - a);
}

/**
 * Mutual inductance between the coil (its layers in series) and every cell of a body: the coil's
 * flux Φ(r, z) = Σ_turns Maxwell(r_turn, r, z − z_turn) averaged over each cell's section.
 * Φ is sampled at radial nodes (the shell edges, refined where the coil is near) on the coil's
 * turn lattice along z (layer-lattice.ts), and integrated with piecewise cubics in r² and z.
 */
export function coilBodyMutuals(layers: readonly WindingLayer[], mesh: BodyMesh): { mutual_H: number[]; evaluations: number } {
  const bodyRect: Rect = { x1: mesh.radialEdges[0], x2: mesh.radialEdges[mesh.radialEdges.length - 1], y1: mesh.axialEdges[0], y2: mesh.axialEdges[mesh.axialEdges.length - 1] };
  // radial nodes: shell edges, refined so that spacing ≤ half the distance to the nearest layer
  const distR = (a: number, b: number) => {
    let d = Infinity;
    for (const L of layers) d = Math.min(d, layerRectDistance(L, { x1: a, x2: b, y1: bodyRect.y1, y2: bodyRect.y2 }));
    return d;
  };
  const nodes: number[] = [mesh.radialEdges[0]];
  for (let i = 0; i + 1 < mesh.radialEdges.length; i++) {
    const a = mesh.radialEdges[i];
    const b = mesh.radialEdges[i + 1];
    const stack: [number, number][] = [[a, b]];
    const seg: number[] = [];
    while (stack.length) {
      const [x, y] = stack.pop()!;
      if (y - x > 0.5 * Math.max(distR(x, y), 1e-6 * y) && y - x > 1e-7) {
        const mid = (x + y) / 2;
        stack.push([mid, y], [x, mid]);
      } else seg.push(y);
    }
    nodes.push(...seg);
  }
  while (nodes.length < 4) {
    // at least four nodes for the cubic: split the widest gap
    let w = 0;
    for (let i = 1; i < nodes.length; i++) if (nodes[i] - nodes[i - 1] > nodes[w + 1] - nodes[w]) w = i - 1;
    nodes.splice(w + 1, 0, (nodes[w] + nodes[w + 1]) / 2);
  }
  const nz = mesh.axialEdges.length - 1;
  // zAvg[n][k]: coil flux at radial node n averaged over slice k
  const zAvg: number[][] = nodes.map(() => new Array<number>(nz).fill(0));
  let evaluations = 0;
  for (const L of layers) {
    const d = layerRectDistance(L, bodyRect);
    const hTarget = Math.max(d / 4, 1e-6);
    for (let n = 0; n < nodes.length; n++) {
      const r = nodes[n];
      if (r === 0) continue; // no flux through a loop of zero radius
      const lat = new LayerLattice(L, (zeta) => filamentMutual_H(L.radius_m, r, zeta), true, bodyRect.y1, bodyRect.y2, hTarget);
      evaluations += lat.evaluations;
      for (let k = 0; k < nz; k++) zAvg[n][k] += L.sign * lat.average(mesh.axialEdges[k], mesh.axialEdges[k + 1]);
    }
  }
  const mutual_H = new Array<number>(mesh.cells.length).fill(0);
  for (let ci = 0; ci < mesh.cells.length; ci++) {
    const { cell, slice } = mesh.cells[ci];
    const k = slice - 1;
    let sum = 0;
    for (let n = 0; n + 1 < nodes.length; n++) {
      const a = Math.max(nodes[n], cell.x1);
      const b = Math.min(nodes[n + 1], cell.x2);
      if (b <= a) continue;
      const j0 = Math.min(Math.max(n - 1, 0), nodes.length - 4);
      const xs = nodes.slice(j0, j0 + 4);
      const ys = xs.map((_, t) => zAvg[j0 + t][k]);
      sum += (b - a) * cubicInR2Average(xs, ys, a, b);
    }
    mutual_H[ci] = sum / (cell.x2 - cell.x1);
  }
  return { mutual_H, evaluations };
}

/** Builds the eddy-current network of the bodies around the coil. */
export function buildShellNetwork(meshes: readonly BodyMesh[], coilLayers: readonly WindingLayer[], opt: ShellOptions = {}): ShellNetwork {
  const loops: ShellLoop[] = [];
  const owner: { body: number; local: number }[] = [];
  let coilCouplingEvaluations = 0;
  meshes.forEach((mesh, b) => {
    const m = mesh.spec.material;
    const { mutual_H, evaluations } = coilBodyMutuals(coilLayers, mesh);
    coilCouplingEvaluations += evaluations;
    mesh.cells.forEach((c, local) => {
      const { x1, x2, y1, y2 } = c.cell;
      const dr = x2 - x1;
      const dz = y2 - y1;
      loops.push({
        name: loopName(mesh, c),
        body: mesh.spec.name,
        shell: c.shell,
        slice: c.slice,
        cell: c.cell,
        inductance_H: 0,
        resistance20_Ohm: (m.resistivity20_Ohm_m * 2 * Math.PI * ((x1 + x2) / 2)) / (dr * dz),
        tempCoeff_perK: m.tempCoeff20_perK,
        heatCapacity_JpK: m.density_kgpm3 * m.specificHeat_JpkgK * Math.PI * (x2 * x2 - x1 * x1) * dz,
        mutualToCoil_H: mutual_H[local],
      });
      owner.push({ body: b, local });
    });
  });
  const n = loops.length;
  const L: number[][] = Array.from({ length: n }, () => new Array<number>(n).fill(0));
  // within each body: Toeplitz in the slice offset
  let base = 0;
  const bases: number[] = [];
  for (const mesh of meshes) {
    bases.push(base);
    const nr = mesh.radialEdges.length - 1;
    const nz = mesh.axialEdges.length - 1;
    const at = (shell: number, slice: number) => base + (slice - 1) * nr + (shell - 1);
    const bodyOpt: CellSplitOptions = { rFloor: RFLOOR_FRACTION * mesh.radialEdges[nr], ...opt };
    const selfByShell: number[] = [];
    for (let s = 1; s <= nr; s++) selfByShell.push(cellSelf_H(mesh.cells[s - 1].cell, bodyOpt));
    for (let s = 1; s <= nr; s++)
      for (let t = s; t <= nr; t++)
        for (let d = 0; d < nz; d++) {
          if (s === t && d === 0) continue;
          const A = mesh.cells[s - 1].cell; // slice 1
          const B = mesh.cells[d * nr + (t - 1)].cell; // slice 1 + d
          const M = cellMutual_H(A, B, bodyOpt);
          for (let k = 1; k + d <= nz; k++) {
            const i = at(s, k);
            const j = at(t, k + d);
            L[i][j] = L[j][i] = M;
            const i2 = at(t, k);
            const j2 = at(s, k + d);
            L[i2][j2] = L[j2][i2] = M;
          }
        }
    for (let k = 1; k <= nz; k++) for (let s = 1; s <= nr; s++) L[at(s, k)][at(s, k)] = selfByShell[s - 1];
    base += mesh.cells.length;
  }
  // between bodies
  for (let a = 0; a < n; a++)
    for (let b = a + 1; b < n; b++) {
      if (owner[a].body === owner[b].body) continue;
      L[a][b] = L[b][a] = cellMutual_H(loops[a].cell, loops[b].cell, { rFloor: RFLOOR_FRACTION * Math.min(meshes[owner[a].body].radialEdges.at(-1)!, meshes[owner[b].body].radialEdges.at(-1)!), ...opt });
    }
  for (let i = 0; i < n; i++) loops[i].inductance_H = L[i][i];
  return { loops, L, meshes: [...meshes], coilCouplingEvaluations };
}

/** Axial field per ampere of each loop at (r, z), (A/m)/A (same current convention as the coil). */
export function loopFieldsAt(network: ShellNetwork, r_m: number, z_m: number): number[] {
  return network.loops.map((l) => cellField(l.cell, r_m, z_m).hz);
}
