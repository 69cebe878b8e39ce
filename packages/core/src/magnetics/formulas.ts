/**
 * Published estimates of coil inductance and field, each with its source, to compare with (and
 * test) the filament sums. Inputs in SI; the formulas printed in inches or µH are converted here.
 */
import { ellipticE, ellipticK } from './elliptic.js';
import { MU0_HpM } from './constants.js';

const INCH_m = 0.0254;

/**
 * Nagaoka's coefficient K_N of a single-layer solenoid (uniform current sheet) of diameter D and
 * length ℓ, in closed form (Nagaoka 1909; Grover, Inductance Calculations, ch. 16):
 *
 *   K_N = 4/(3π·k′) · [ (k′²/k²)·(K(k) − E(k)) + E(k) − k ],   k² = D²/(D² + ℓ²), k′² = 1 − k²
 *
 * so that L = K_N·µ0·π·r²·N²/ℓ. Tabulated in Grover's Table 36 (REFERENCES.md).
 */
export function nagaokaCoefficient(diameterOverLength: number): number {
  const x = diameterOverLength;
  const m = (x * x) / (x * x + 1); // k²
  const k = Math.sqrt(m);
  const kp = Math.sqrt(1 - m);
  const K = ellipticK(m);
  const E = ellipticE(m);
  return (4 / (3 * Math.PI * kp)) * (((1 - m) / m) * (K - E) + E - k);
}

/** Nagaoka: L = K_N·µ0·π·r²·N²/ℓ of a current sheet of radius r, length ℓ, N turns, H. */
export function nagaokaInductance_H(radius_m: number, length_m: number, turns: number): number {
  return (nagaokaCoefficient((2 * radius_m) / length_m) * MU0_HpM * Math.PI * radius_m ** 2 * turns ** 2) / length_m;
}

/**
 * Wheeler's single-layer formula (Proc. IRE 16, 1928): L[µH] = r²N²/(9r + 10ℓ), r and ℓ in
 * inches; about 1 % for ℓ > 0.8·r (REFERENCES.md). Returns H.
 */
export function wheelerSingleLayer_H(radius_m: number, length_m: number, turns: number): number {
  const r = radius_m / INCH_m;
  const l = length_m / INCH_m;
  return ((r * r * turns * turns) / (9 * r + 10 * l)) * 1e-6;
}

/** True where Wheeler's single-layer formula claims about 1 %: ℓ > 0.8·r. */
export function wheelerSingleLayerApplies(radius_m: number, length_m: number): boolean {
  return length_m > 0.8 * radius_m;
}

/**
 * Wheeler's multilayer formula (Proc. IRE 16, 1928): L[µH] = 0.8·r²N²/(6r + 9ℓ + 10c), r the mean
 * radius, ℓ the length, c the depth of the winding, all in inches; about 1 % when the three
 * denominator terms are of similar size (REFERENCES.md). Returns H.
 */
export function wheelerMultilayer_H(meanRadius_m: number, length_m: number, depth_m: number, turns: number): number {
  const r = meanRadius_m / INCH_m;
  const l = length_m / INCH_m;
  const c = depth_m / INCH_m;
  return ((0.8 * r * r * turns * turns) / (6 * r + 9 * l + 10 * c)) * 1e-6;
}

/** True where Wheeler's multilayer formula claims about 1 %: no denominator term more than twice another (our reading of "similar"). */
export function wheelerMultilayerApplies(meanRadius_m: number, length_m: number, depth_m: number): boolean {
  const t = [6 * meanRadius_m, 9 * length_m, 10 * depth_m];
  return Math.max(...t) <= 2 * Math.min(...t);
}

/**
 * Brooks coil: square winding section of side c and mean radius a = 1.5·c, the shape of greatest
 * inductance for a given length of wire; L = 1.6994e-6·a·N² H, a in metres (Grover, Inductance
 * Calculations; REFERENCES.md).
 */
export function brooksInductance_H(meanRadius_m: number, turns: number): number {
  return 1.6994e-6 * meanRadius_m * turns * turns;
}

/** True when a winding section is a Brooks coil to within `tol` (relative) in both ratios. */
export function isBrooksShape(innerRadius_m: number, outerRadius_m: number, length_m: number, tol = 0.02): boolean {
  const c = outerRadius_m - innerRadius_m;
  const a = (innerRadius_m + outerRadius_m) / 2;
  return Math.abs(length_m / c - 1) <= tol && Math.abs(a / (1.5 * c) - 1) <= tol;
}

/**
 * Thick solenoid with uniform current density J (A/m²), inner radius a1, outer a2, length ℓ:
 * field on the axis at distance z from its centre (Montgomery, Solenoid Magnet Design, 1969):
 *
 *   H(z) = (J/2)·[ z₊·ln((a2 + √(a2² + z₊²))/(a1 + √(a1² + z₊²)))
 *                 − z₋·ln((a2 + √(a2² + z₋²))/(a1 + √(a1² + z₋²))) ],   z± = z ± ℓ/2
 *
 * At the centre this is J·a1·β·ln[(α + √(α² + β²))/(1 + √(1 + β²))], α = a2/a1, β = ℓ/(2a1).
 * Returns H in A/m per ampere of coil current for N turns (J = N·I/(ℓ·(a2 − a1))).
 */
export function thickSolenoidAxialField_ApmPerA(a1_m: number, a2_m: number, length_m: number, turns: number, z_m: number): number {
  const J = turns / (length_m * (a2_m - a1_m));
  const term = (u: number) => u * Math.log((a2_m + Math.hypot(a2_m, u)) / (a1_m + Math.hypot(a1_m, u)));
  return (J / 2) * (term(z_m + length_m / 2) - term(z_m - length_m / 2));
}

/** Montgomery's centre-field form J·a1·β·ln[(α + √(α² + β²))/(1 + √(1 + β²))], per ampere for N turns, A/m. */
export function thickSolenoidCentreField_ApmPerA(a1_m: number, a2_m: number, length_m: number, turns: number): number {
  const J = turns / (length_m * (a2_m - a1_m));
  const alpha = a2_m / a1_m;
  const beta = length_m / (2 * a1_m);
  return J * a1_m * beta * Math.log((alpha + Math.hypot(alpha, beta)) / (1 + Math.hypot(1, beta)));
}

/** Helmholtz pair (two N-turn loops of radius R, R apart): H = (4/5)^{3/2}·N/R per ampere at the centre. */
export function helmholtzCentreField_ApmPerA(radius_m: number, turnsPerCoil: number): number {
  return (4 / 5) ** 1.5 * (turnsPerCoil / radius_m);
}

/** Long solenoid: H = N/ℓ per ampere (Ampère's law, infinite length). */
export function longSolenoidField_ApmPerA(length_m: number, turns: number): number {
  return turns / length_m;
}
