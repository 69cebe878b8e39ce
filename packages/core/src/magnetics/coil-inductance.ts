/**
 * Inductance of windings on a common axis by summing Maxwell's mutual inductance over their turns.
 *
 *   L = Σ_i Σ_j s_i·s_j·M_ij,   M_ij = Maxwell(r_i, r_j, z_i − z_j) for i ≠ j,
 *   M_ii = µ0·r_i·(ln(8r_i/g) − 2)                  (self term of one turn, conductor GMD g)
 *
 * (mutual.ts; this is the filament method of Grover, Inductance Calculations, with Rosa's
 * self-term for each turn; s = ±1 for aiding or opposing windings in series.)
 *
 * Speed: turns come in layers of equally spaced filaments. Between two layers of the same pitch p
 * the mutual inductance depends only on the offset index δ = p_i − q_j, so the T_A·T_B pairs need
 * only T_A + T_B − 1 evaluations of Maxwell's formula, each weighted by how many pairs share δ
 * (a Toeplitz sum). A 20-layer × 40-turn coil takes 20·21/2 layer pairs × ≤ 79 offsets ≈ 16 600
 * evaluations instead of 320 000. Layers of unequal pitch fall back to the direct double sum.
 *
 * The same sums give the inductance of a winding treated as a uniform current density block
 * (uniformBlockLayers): nr × nz sub-filaments of N/(nr·nz) turns each, with the sub-cell's
 * rectangle GMD for its self term. As nr, nz grow this converges to the block's exact
 * inductance, the quantity that Brooks' and Wheeler's multilayer formulas describe.
 */
import { filamentMutual_H, loopSelf_H, rectangleGmd_m } from './mutual.js';
import type { WindingLayer } from './winding.js';

const PITCH_RTOL = 1e-12;

/**
 * Mutual inductance between two layers of filaments, H per (A in each), signs included.
 * When `a === b` (the same layer) the result is the layer's self inductance, own-turn terms included.
 */
export function layerMutual_H(a: WindingLayer, b: WindingLayer): number {
  const sign = a.sign * b.sign;
  if (a === b) {
    const T = a.turns;
    let sum = T * loopSelf_H(a.radius_m, a.gmd_m);
    for (let d = 1; d < T; d++) sum += 2 * (T - d) * filamentMutual_H(a.radius_m, a.radius_m, d * a.pitch_m);
    return sign * sum;
  }
  const TA = a.turns;
  const TB = b.turns;
  const samePitch = Math.abs(a.pitch_m - b.pitch_m) <= PITCH_RTOL * Math.max(a.pitch_m, b.pitch_m) || TA === 1 || TB === 1;
  let sum = 0;
  if (samePitch) {
    const p = TA > 1 ? a.pitch_m : b.pitch_m;
    const dz0 = a.z0_m - b.z0_m;
    // z_A(i) − z_B(j) = dz0 + (i − j)·p; count of (i, j) with i − j = δ
    for (let delta = -(TB - 1); delta <= TA - 1; delta++) {
      const count = Math.min(TA - 1, TB - 1 + delta) - Math.max(0, delta) + 1;
      if (count <= 0) continue;
      const dz = dz0 + delta * p;
      if (dz === 0 && a.radius_m === b.radius_m) {
        // coincident filaments of two distinct layers: treat as one conductor's self term
        sum += count * loopSelf_H(a.radius_m, Math.max(a.gmd_m, b.gmd_m));
      } else {
        sum += count * filamentMutual_H(a.radius_m, b.radius_m, dz);
      }
    }
  } else {
    for (let i = 0; i < TA; i++) {
      const za = a.z0_m + i * a.pitch_m;
      for (let j = 0; j < TB; j++) sum += filamentMutual_H(a.radius_m, b.radius_m, za - (b.z0_m + j * b.pitch_m));
    }
  }
  return sign * sum;
}

/** Self inductance of a set of layers connected in series (each with its own sign), H. */
export function layersInductance_H(layers: readonly WindingLayer[]): number {
  let L = 0;
  for (let i = 0; i < layers.length; i++) {
    L += layerMutual_H(layers[i], layers[i]);
    for (let j = i + 1; j < layers.length; j++) L += 2 * layerMutual_H(layers[i], layers[j]);
  }
  return L;
}

/** Mutual inductance between two series-connected sets of layers (e.g. two windings), H. */
export function layersMutual_H(a: readonly WindingLayer[], b: readonly WindingLayer[]): number {
  let M = 0;
  for (const la of a) for (const lb of b) M += layerMutual_H(la, lb);
  return M;
}

/**
 * A uniform current density block (inner radius ri, outer ro, length len, centred at z = centre)
 * as nr × nz sub-filaments, each standing for 1/(nr·nz) of the ampere-turns and carrying its
 * sub-cell's rectangle GMD. Multiply the inductance of these layers by (N/(nr·nz))² for N turns.
 */
export function uniformBlockLayers(ri_m: number, ro_m: number, len_m: number, centre_m: number, nr: number, nz: number): WindingLayer[] {
  const dr = (ro_m - ri_m) / nr;
  const dz = len_m / nz;
  const g = rectangleGmd_m(dr, dz);
  const out: WindingLayer[] = [];
  for (let j = 0; j < nr; j++) {
    out.push({ radius_m: ri_m + (j + 0.5) * dr, z0_m: centre_m - len_m / 2 + dz / 2, pitch_m: dz, turns: nz, sign: 1, gmd_m: g });
  }
  return out;
}

/** Inductance of N turns spread uniformly over a rectangular winding section, by an nr × nz sub-filament sum, H. */
export function blockInductance_H(ri_m: number, ro_m: number, len_m: number, turns: number, nr: number, nz: number): number {
  const w = turns / (nr * nz);
  return w * w * layersInductance_H(uniformBlockLayers(ri_m, ro_m, len_m, 0, nr, nz));
}

/**
 * Geometric mean distance between two collinear strips of width w whose centres are δ·w apart
 * (δ ≥ 1), from the GMD of two segments of a line (Maxwell; Grover, Inductance Calculations, ch. 2):
 *
 *   ln(g/w) = [(δ + 1)²·ln(δ + 1) + (δ − 1)²·ln(δ − 1) − 2δ²·ln δ]/2 − 3/2
 *
 * Touching strips (δ = 1): g = 4·e^(−3/2)·w = 0.8925·w; far apart g → δ·w.
 */
export function collinearStripGmd_m(width_m: number, delta: number): number {
  const xl = (x: number) => (x > 0 ? x * x * Math.log(x) : 0);
  return width_m * Math.exp((xl(delta + 1) + xl(delta - 1) - 2 * xl(delta)) / 2 - 1.5);
}

/**
 * Inductance of N turns as a thin current sheet of radius r and length len (a single-layer
 * solenoid in Nagaoka's idealisation), H: nz coaxial ribbons of width len/nz, each carrying N/nz
 * of the ampere-turns. Own terms use the strip's GMD (e^(−3/2)·w) and ribbon pairs use Maxwell's
 * formula at the GMD of the two strips (collinearStripGmd_m), which makes the sum converge as
 * O(1/nz²) to the sheet's inductance instead of O(1/nz) with centre distances.
 */
export function sheetInductance_H(r_m: number, len_m: number, turns: number, nz: number): number {
  const dz = len_m / nz;
  const w = turns / nz;
  let sum = nz * loopSelf_H(r_m, rectangleGmd_m(dz, 0));
  for (let d = 1; d < nz; d++) sum += 2 * (nz - d) * filamentMutual_H(r_m, r_m, collinearStripGmd_m(dz, d));
  return w * w * sum;
}
