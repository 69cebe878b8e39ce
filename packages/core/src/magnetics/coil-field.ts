/**
 * Field of windings at any point (r, z), and its minimum and mean over a cylindrical part.
 *
 *   H(r, z) = Σ_turns s·H_loop(r_turn, z_turn; r, z)        per ampere of coil current
 *
 * with H_loop the closed-form Biot–Savart field of a circular filament (loop-field.ts). Each turn
 * is one filament at its conductor's centre; the field is exact outside the conductors.
 *
 * Over a part (inner radius r_i ≥ 0, outer r_o, length ℓ, centred at z_c), the axial field is
 * sampled on a grid that includes the part's edges and corners (minimum and maximum, with where
 * the minimum lies), and averaged over the volume with Gauss–Legendre quadrature in r (weight
 * 2πr) and z (mean = ∫∫ H_z·2πr dr dz / V).
 */
import { loopField, type FieldPerAmpere } from './loop-field.js';
import { gaussLegendreOn } from './quadrature.js';
import type { WindingLayer } from './winding.js';

/** Field per ampere of coil current at (r, z) from all turns of the layers, (A/m)/A. */
export function layersField(layers: readonly WindingLayer[], r_m: number, z_m: number): FieldPerAmpere {
  let hz = 0;
  let hr = 0;
  for (const L of layers) {
    let lz = 0;
    let lr = 0;
    for (let i = 0; i < L.turns; i++) {
      const f = loopField(L.radius_m, L.z0_m + i * L.pitch_m, r_m, z_m);
      lz += f.hz;
      lr += f.hr;
    }
    hz += L.sign * lz;
    hr += L.sign * lr;
  }
  return { hz, hr };
}

/** A coaxial cylindrical part (solid when innerRadius is 0). */
export interface PartVolume {
  innerRadius_m: number;
  outerRadius_m: number;
  length_m: number;
  /** Axial position of the part's centre, m. */
  centre_m: number;
}

export interface VolumeFieldStats {
  /** Smallest axial field per ampere on the sampling grid, (A/m)/A. */
  min_ApmPerA: number;
  /** Where it lies. */
  minAt: { r_m: number; z_m: number };
  max_ApmPerA: number;
  /** Volume mean of the axial field per ampere, (A/m)/A. */
  mean_ApmPerA: number;
  /** Axial field per ampere at the centre of the part (on the axis, or at the inner radius of a ring). */
  centre_ApmPerA: number;
  /** Largest |H_r|/|H_z| on the grid: how far the field strays from the axis inside the part. */
  maxRadialRatio: number;
}

export interface VolumeSampling {
  /** Grid points across the radius (edges included). Default 5. */
  gridR?: number;
  /** Grid points along the length (edges included). Default 7. */
  gridZ?: number;
  /** Gauss–Legendre points per direction for the mean. Default 4. */
  gauss?: number;
}

/**
 * Minimum, maximum and mean of the axial field H_z(r, z) over a part's volume, for any field
 * function (per ampere). Points exactly on a conductor are the caller's concern.
 */
export function volumeFieldStats(field: (r_m: number, z_m: number) => FieldPerAmpere, part: PartVolume, sampling: VolumeSampling = {}): VolumeFieldStats {
  const nr = Math.max(2, sampling.gridR ?? 5);
  const nz = Math.max(2, sampling.gridZ ?? 7);
  const ng = Math.max(1, sampling.gauss ?? 4);
  const { innerRadius_m: ri, outerRadius_m: ro, length_m: len, centre_m: zc } = part;
  let min = Infinity;
  let max = -Infinity;
  let minAt = { r_m: ri, z_m: zc };
  let maxRadialRatio = 0;
  // the grid is symmetric about z_c; fields need not be
  for (let i = 0; i < nr; i++) {
    const r = ri + ((ro - ri) * i) / (nr - 1);
    for (let j = 0; j < nz; j++) {
      const z = zc - len / 2 + (len * j) / (nz - 1);
      const f = field(r, z);
      if (f.hz < min) {
        min = f.hz;
        minAt = { r_m: r, z_m: z };
      }
      if (f.hz > max) max = f.hz;
      if (f.hz !== 0) maxRadialRatio = Math.max(maxRadialRatio, Math.abs(f.hr / f.hz));
    }
  }
  const gr = gaussLegendreOn(ng, ri, ro);
  const gz = gaussLegendreOn(ng, zc - len / 2, zc + len / 2);
  let integral = 0;
  for (let i = 0; i < ng; i++) for (let j = 0; j < ng; j++) integral += gr.w[i] * gz.w[j] * 2 * Math.PI * gr.x[i] * field(gr.x[i], gz.x[j]).hz;
  const volume = Math.PI * (ro * ro - ri * ri) * len;
  return {
    min_ApmPerA: min,
    minAt,
    max_ApmPerA: max,
    mean_ApmPerA: integral / volume,
    centre_ApmPerA: field(ri, zc).hz,
    maxRadialRatio,
  };
}
