/**
 * Magnetic pressure on the winding and an estimate of its hoop stress.
 *
 * PRESSURE. The field B at the winding pushes it outward with the magnetic pressure
 *   p = B²/(2·µ0)                        (397.9 kPa at 1 T; REFERENCES.md)
 *
 * HOOP STRESS (estimate, conservative). The winding is treated as a thin cylindrical shell of
 * radial build t loaded by the full pressure p on its inside, the thin-walled cylinder result
 * (Roark's Formulas for Stress and Strain, thin-walled pressure vessels):
 *   σ_θ = p·r/t
 * taken at the OUTER radius r_o = r_mean + t/2 rather than the mean radius, which raises the
 * figure by (r_mean + t/2)/r_mean. The same total load follows from the long-solenoid force
 * density J×B: with J = H0/t across the build and B falling linearly from B0 to 0 through it,
 * ∫J·B dr = J·t·B0/2 = B0²/(2µ0) = p, so the two forms agree for a long thin winding.
 *
 * ASSUMPTIONS: long solenoid (the field at the winding's inner face is the bore field, taken as
 * the largest peak field found anywhere in the result), the turns bonded so that they share the
 * load uniformly across the build (a loosely wound inner layer carries its own J·B·r and can see
 * up to about twice this), no support from a former, sleeve, banding or potting (all of which
 * reduce the conductor's stress), static loading (the pulse is long compared with the winding's
 * mechanical transit time, common practice), and room-temperature proof stress.
 */
import { MU0_HpM } from '../magnetics/constants.js';

/** p = B²/(2µ0), Pa. */
export function magneticPressure_Pa(fluxDensity_T: number): number {
  return (fluxDensity_T * fluxDensity_T) / (2 * MU0_HpM);
}

/** Thin-shell hoop stress σ = p·r/t, Pa (r and t in metres). NaN unless r and t are positive. */
export function thinShellHoopStress_Pa(pressure_Pa: number, radius_m: number, thickness_m: number): number {
  if (!(radius_m > 0) || !(thickness_m > 0)) return Number.NaN;
  return (pressure_Pa * radius_m) / thickness_m;
}

/**
 * Conservative hoop stress of a winding of mean radius r_mean and radial build t under a bore
 * field B0: σ = p·(r_mean + t/2)/t, p = B0²/(2µ0). Pa.
 */
export function windingHoopStress_Pa(boreFluxDensity_T: number, meanRadius_m: number, build_m: number): number {
  return thinShellHoopStress_Pa(magneticPressure_Pa(boreFluxDensity_T), meanRadius_m + build_m / 2, build_m);
}

/** One sentence stating the stress model, for verdict notes and reports. */
export const HOOP_STRESS_MODEL_NOTE =
  'Estimate: thin shell σ = p·r/t at the outer radius, p = B²/(2µ0) at the peak field, no support from former or potting.';
