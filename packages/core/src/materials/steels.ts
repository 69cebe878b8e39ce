/**
 * Soft-magnetic steels for iron-yoke fixtures: tabulated initial magnetization (B–H) curves
 * and the interpolated curve used by the magnetic-circuit model (magnetics/magnetic-circuit.ts).
 *
 * Interpolation (named method): the tabulated points are turned into the magnetic
 * polarization J = B − µ0·H, which is interpolated in H by the Fritsch–Carlson monotone
 * piecewise cubic (Fritsch & Carlson, SIAM J. Numer. Anal. 17(2), 1980; see
 * magnetics/magnetic-circuit-spline.ts) with its slope set to 0 at the last point. Then
 *   B(H) = µ0·H + J(H),        H ≥ 0,
 *   B(H) = µ0·H + J_top,       H above the table (slope exactly µ0, C¹ at the table's end),
 *   B(−H) = −B(H)              (odd: the initial curve, no hysteresis).
 * Because J is monotone, dB/dH ≥ µ0 everywhere, as for any real soft-magnetic material on
 * its initial curve, and the co-energy density w'(H) = ∫0^H B dH' = µ0H²/2 + ∫0^H J dH' is
 * exact for the interpolant. A table whose J decreases somewhere (B rounded at high field) is
 * levelled to the running maximum of J and the number of levelled points is reported.
 *
 * The tables below are typical curves recalled from memory (annealed material, DC, initial
 * curve), not any maker's data: good to perhaps ±10 % in B below the knee and a few per cent
 * above it. Every one says so in its `source`. The user's measured curve overrides them
 * (design file: a table of points).
 */

import { cubicIntegral, cubicSlope, cubicValue, monotoneCubic, type MonotoneCubic } from '../magnetics/magnetic-circuit-spline.js';

/** Permeability of free space, H/m (4π·10⁻⁷; the 2019 SI value differs by 5·10⁻¹⁰ relative). */
export const MU0_HpM = 4e-7 * Math.PI;

/** A tabulated initial magnetization curve: field strength H (A/m) and flux density B (T). */
export interface BHTable {
  /** Identifier, e.g. `low-carbon-steel`. */
  name: string;
  /** Human description. */
  description: string;
  /** Where the numbers come from (a publication, a datasheet, or "typical, from memory"). */
  source: string;
  /** H values, A/m, strictly increasing, starting at 0. */
  field_Apm: readonly number[];
  /** B values, T, strictly increasing, starting at 0. */
  fluxDensity_T: readonly number[];
}

/** A material law B(H) as the magnetic-circuit solver uses it. All methods are odd/even as stated. */
export interface BHCurve {
  name: string;
  source: string;
  /** B(H), T (odd in H). */
  fluxDensity_T(field_Apm: number): number;
  /** dB/dH, H/m (even in H, ≥ µ0 for steels). */
  differentialPermeability_HpM(field_Apm: number): number;
  /** Co-energy density ∫0^H B dH', J/m³ (even in H). */
  coEnergyDensity_Jpm3(field_Apm: number): number;
  /** H(B), A/m: the inverse of fluxDensity_T (odd). */
  fieldStrength_Apm(fluxDensity_T: number): number;
  /** Polarization J = B − µ0H reached at the top of the table, T (Infinity for a linear law). */
  saturationPolarization_T: number;
  /** Largest tabulated H, A/m (0 for a linear law). */
  tableTopField_Apm: number;
  /** Points levelled because J = B − µ0H decreased there (0 for a clean table). */
  levelledPoints: number;
}

/** Builds the interpolated curve of a table. Throws RangeError on malformed tables (use validateBHTable for user input). */
export function bhCurveFromTable(table: BHTable): BHCurve {
  const problem = validateBHTable(table.field_Apm, table.fluxDensity_T);
  if (problem) throw new RangeError(`B–H table ${table.name}: ${problem}`);
  const H = table.field_Apm;
  const J: number[] = [];
  let levelledPoints = 0;
  for (let k = 0; k < H.length; k++) {
    const jk = table.fluxDensity_T[k] - MU0_HpM * H[k];
    const prev = k > 0 ? J[k - 1] : 0;
    if (jk < prev) levelledPoints++;
    J.push(Math.max(jk, prev));
  }
  const jCurve: MonotoneCubic = monotoneCubic(H, J, { endSlope: 0 });
  const top = H[H.length - 1];
  const jTop = J[J.length - 1];
  const b = (h: number): number => {
    const a = Math.abs(h);
    const v = MU0_HpM * a + (a >= top ? jTop : cubicValue(jCurve, a));
    return h < 0 ? -v : v;
  };
  const db = (h: number): number => {
    const a = Math.abs(h);
    return MU0_HpM + (a >= top ? 0 : cubicSlope(jCurve, a));
  };
  const w = (h: number): number => {
    const a = Math.abs(h);
    const jInt = a >= top ? cubicIntegral(jCurve, top) + jTop * (a - top) : cubicIntegral(jCurve, a);
    return 0.5 * MU0_HpM * a * a + jInt;
  };
  return {
    name: table.name,
    source: table.source,
    fluxDensity_T: b,
    differentialPermeability_HpM: db,
    coEnergyDensity_Jpm3: w,
    fieldStrength_Apm: (bT: number) => invertMonotone(b, db, bT),
    saturationPolarization_T: jTop,
    tableTopField_Apm: top,
    levelledPoints,
  };
}

/** A linear material B = µr·µ0·H (air gaps with µr = 1, a magnet part with its recoil permeability). */
export function linearMaterial(relativePermeability: number, name = `linear µr=${relativePermeability}`): BHCurve {
  if (!(relativePermeability > 0) || !Number.isFinite(relativePermeability)) throw new RangeError(`linearMaterial: µr must be > 0 (got ${relativePermeability})`);
  const mu = relativePermeability * MU0_HpM;
  return {
    name,
    source: 'linear law B = µr·µ0·H',
    fluxDensity_T: (h) => mu * h,
    differentialPermeability_HpM: () => mu,
    coEnergyDensity_Jpm3: (h) => 0.5 * mu * h * h,
    fieldStrength_Apm: (bT) => bT / mu,
    saturationPolarization_T: Infinity,
    tableTopField_Apm: 0,
    levelledPoints: 0,
  };
}

/**
 * Checks a B–H table; returns a description of the first problem, or null when it is usable.
 * Rules: equal lengths, at least 3 points, finite numbers, H and B strictly increasing,
 * starting at (0, 0).
 */
export function validateBHTable(field_Apm: readonly number[], fluxDensity_T: readonly number[]): string | null {
  if (field_Apm.length !== fluxDensity_T.length) return `H and B have different lengths (${field_Apm.length} and ${fluxDensity_T.length})`;
  if (field_Apm.length < 3) return `at least 3 points are needed (got ${field_Apm.length})`;
  for (let k = 0; k < field_Apm.length; k++) {
    if (!Number.isFinite(field_Apm[k]) || !Number.isFinite(fluxDensity_T[k])) return `point ${k} is not a finite number`;
  }
  if (field_Apm[0] !== 0 || fluxDensity_T[0] !== 0) return `the first point must be H = 0, B = 0 (got H = ${field_Apm[0]}, B = ${fluxDensity_T[0]})`;
  for (let k = 1; k < field_Apm.length; k++) {
    if (!(field_Apm[k] > field_Apm[k - 1])) return `H must increase strictly (point ${k}: ${field_Apm[k]} after ${field_Apm[k - 1]})`;
    if (!(fluxDensity_T[k] > fluxDensity_T[k - 1])) return `B must increase strictly (point ${k}: ${fluxDensity_T[k]} after ${fluxDensity_T[k - 1]})`;
  }
  return null;
}

/** Safeguarded Newton for H with B(H) = target (B odd, increasing, slope ≥ µ0 or a constant µ). */
function invertMonotone(b: (h: number) => number, db: (h: number) => number, target: number): number {
  if (target === 0) return 0;
  const sign = target < 0 ? -1 : 1;
  const t = Math.abs(target);
  let lo = 0;
  // B(H) ≥ µ0·H for a steel (J ≥ 0), so H ≤ B/µ0; for a linear law B/µ0 ≥ H too when µr ≥ 1.
  let hi = t / MU0_HpM;
  while (b(hi) < t) hi *= 2;
  let h = t / db(0) < hi ? t / db(0) : 0.5 * hi;
  for (let it = 0; it < 200; it++) {
    const f = b(h) - t;
    if (f === 0) break;
    if (f > 0) hi = h;
    else lo = h;
    let next = h - f / db(h);
    if (!(next > lo && next < hi)) next = 0.5 * (lo + hi);
    if (Math.abs(next - h) <= 1e-14 * Math.max(h, 1e-300)) {
      h = next;
      break;
    }
    h = next;
  }
  return sign * h;
}

/**
 * Built-in tables. Typical curves from memory (not a maker's data), initial curve, annealed,
 * DC. Their polarizations at the table top stay below pure iron's saturation (about 2.15 T,
 * Bozorth, "Ferromagnetism", 1951; from memory).
 */
export const STEEL_TABLES: Readonly<Record<string, BHTable>> = {
  'low-carbon-steel': {
    name: 'low-carbon-steel',
    description: 'Low-carbon steel, about 0.1 % C (AISI 1008/1010 class), annealed: yokes and pole pieces',
    source: 'typical, from memory (not a maker’s data)',
    field_Apm: [0, 80, 160, 240, 320, 400, 560, 800, 1200, 1600, 2400, 4000, 8000, 16000, 32000, 64000, 128000, 256000],
    fluxDensity_T: [0, 0.2, 0.55, 0.85, 1.02, 1.12, 1.25, 1.36, 1.46, 1.52, 1.59, 1.67, 1.78, 1.9, 2.02, 2.12, 2.24, 2.42],
  },
  'silicon-steel': {
    name: 'silicon-steel',
    description: 'Non-oriented silicon electrical steel, about 3 % Si, laminated',
    source: 'typical, from memory (not a maker’s data)',
    field_Apm: [0, 20, 40, 60, 80, 100, 150, 200, 300, 500, 1000, 2500, 5000, 10000, 20000, 50000, 100000, 200000],
    fluxDensity_T: [0, 0.15, 0.55, 0.85, 1.0, 1.08, 1.2, 1.27, 1.34, 1.41, 1.49, 1.58, 1.66, 1.76, 1.86, 1.98, 2.06, 2.2],
  },
  'cast-steel': {
    name: 'cast-steel',
    description: 'Cast steel (low-carbon), as cast and annealed',
    source: 'typical, from memory (not a maker’s data)',
    field_Apm: [0, 200, 400, 600, 800, 1000, 1500, 2000, 3000, 5000, 10000, 20000, 50000, 100000, 200000],
    fluxDensity_T: [0, 0.2, 0.55, 0.8, 0.95, 1.05, 1.2, 1.3, 1.42, 1.55, 1.7, 1.83, 1.98, 2.1, 2.27],
  },
  'cast-iron': {
    name: 'cast-iron',
    description: 'Grey cast iron: low permeability, saturates early',
    source: 'typical, from memory (not a maker’s data)',
    field_Apm: [0, 250, 500, 1000, 1500, 2000, 3000, 4000, 6000, 8000, 12000, 20000, 40000, 80000, 160000, 320000],
    fluxDensity_T: [0, 0.1, 0.23, 0.42, 0.53, 0.6, 0.69, 0.75, 0.83, 0.89, 0.97, 1.07, 1.22, 1.38, 1.56, 1.8],
  },
};

/** Names of the built-in steels. */
export const STEEL_NAMES = Object.keys(STEEL_TABLES) as readonly string[];

const curveCache = new Map<string, BHCurve>();

/** The interpolated curve of a built-in steel, or undefined for an unknown name. */
export function steelCurve(name: string): BHCurve | undefined {
  const table = STEEL_TABLES[name];
  if (!table) return undefined;
  let curve = curveCache.get(name);
  if (!curve) {
    curve = bhCurveFromTable(table);
    curveCache.set(name, curve);
  }
  return curve;
}
