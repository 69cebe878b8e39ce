/**
 * Magnetic field of a circular current filament (Biot–Savart, closed form).
 *
 * Filament of radius a in the plane z = z0, carrying 1 A counter-clockwise seen from +z.
 * At a point (r, z), with ζ = z − z0, S = (a + r)² + ζ², D = (a − r)² + ζ², m = 4ar/S:
 *
 *   H_z = 1/(2π·√S) · [ K(m) + (a² − r² − ζ²)/D · E(m) ]
 *   H_r = ζ/(2π·r·√S) · [ −K(m) + (a² + r² + ζ²)/D · E(m) ]
 *
 * (Smythe, Static and Dynamic Electricity, §7.10; Jackson, Classical Electrodynamics, §5.5;
 * with K, E of parameter m.) On the axis H_z = a²/(2(a² + ζ²)^{3/2}), H_r = 0.
 *
 * Near the axis the H_r bracket vanishes like m², and its two terms cancel; writing it as
 * G(m) = −K + E/2 + E/(2(1 − m)) and summing G's power series (from DLMF 19.5.1–2) below
 * m = 0.05 keeps full precision: G = (π/2)·(3/16·m² + …), which reproduces the near-axis form
 * H_r ≈ (3/4)·a²·ζ·r/(a² + ζ²)^{5/2}.
 *
 * Units: H in (A/m) per ampere of filament current; B = µ0·H. On the filament itself
 * (r = a, ζ = 0) the field is infinite; the function returns non-finite numbers there.
 */
import { ellipticE, ellipticK } from './elliptic.js';

/** Power-series coefficients of G(m) = −K + E/2 + E/(2(1 − m)) divided by π/2. */
const G_SERIES: number[] = (() => {
  const n = 40;
  const c: number[] = [1];
  for (let j = 1; j < n; j++) c.push(c[j - 1] * ((2 * j - 1) / (2 * j)) ** 2);
  const kc = c; // K = (π/2) Σ c_j m^j
  const ec = c.map((cj, j) => -cj / (2 * j - 1)); // E = (π/2) Σ −c_j/(2j−1) m^j
  const out: number[] = [];
  let cumE = 0; // coefficients of E/(1 − m) are the partial sums of E's
  for (let j = 0; j < n; j++) {
    cumE += ec[j];
    out.push(-kc[j] + ec[j] / 2 + cumE / 2);
  }
  return out;
})();

function gNearAxis(m: number): number {
  let sum = 0;
  let mp = m * m;
  for (let j = 2; j < G_SERIES.length; j++) {
    const term = G_SERIES[j] * mp;
    sum += term;
    if (Math.abs(term) < 1e-17 * Math.abs(sum)) break;
    mp *= m;
  }
  return (Math.PI / 2) * sum;
}

/** Axial and radial field per ampere, (A/m)/A. */
export interface FieldPerAmpere {
  hz: number;
  hr: number;
}

/**
 * Field per ampere at (r, z) of a filament of radius a (m) at axial position z0 (m).
 * r ≥ 0 is the distance from the axis.
 */
export function loopField(a_m: number, z0_m: number, r_m: number, z_m: number): FieldPerAmpere {
  const zeta = z_m - z0_m;
  const a2 = a_m * a_m;
  const z2 = zeta * zeta;
  if (r_m === 0) return { hz: a2 / (2 * (a2 + z2) ** 1.5), hr: 0 };
  const r2 = r_m * r_m;
  const S = (a_m + r_m) * (a_m + r_m) + z2;
  const D = (a_m - r_m) * (a_m - r_m) + z2;
  const m = (4 * a_m * r_m) / S;
  const sqrtS = Math.sqrt(S);
  const K = ellipticK(m);
  const E = ellipticE(m);
  const hz = (K + ((a2 - r2 - z2) / D) * E) / (2 * Math.PI * sqrtS);
  let hr: number;
  if (zeta === 0) hr = 0;
  else if (m < 0.05) hr = (zeta * gNearAxis(m)) / (2 * Math.PI * r_m * sqrtS);
  else hr = (zeta * (-K + ((a2 + r2 + z2) / D) * E)) / (2 * Math.PI * r_m * sqrtS);
  return { hz, hr };
}

/** Axial field per ampere on the axis of a filament of radius a at z0, at axial position z: a²/(2(a² + ζ²)^{3/2}). */
export function loopFieldOnAxis(a_m: number, z0_m: number, z_m: number): number {
  const zeta = z_m - z0_m;
  const a2 = a_m * a_m;
  return a2 / (2 * (a2 + zeta * zeta) ** 1.5);
}
