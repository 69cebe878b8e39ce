/**
 * Adiabatic heating of a conductor by a short current pulse, IEC 60949 (also IEC 60364-5-54
 * Annex A): with the resistivity linear in temperature, ρ(θ) = ρ20·(β + θ)/(β + 20), and a
 * constant volumetric heat capacity σc, the heat balance σc·S²·dθ/dt = i²·ρ(θ) integrates to
 *
 *   I²t = K²·S²·ln((θf + β)/(θi + β)),   K = √(σc·(β + 20)/ρ20)
 *   θf  = (θi + β)·exp(I²t/(K²·S²)) − β
 *
 * (S the conductor cross-section, I²t = ∫i² dt). The engine's coil model
 * C_th·dT/dt = i²·R20·(1 + α20·(T − 20)) is the same equation when α20 = 1/(β + 20),
 * R20 = ρ20·ℓ/S and C_th = σc·S·ℓ, so a shot's coil temperature reproduces this formula.
 *
 * Units: SI throughout (S in m², K in A·s^½/m²); `kPerMm2` converts K to the standard's
 * A·s^½/mm² (copper 226, aluminium 148).
 */

/** K = √(σc·(β + 20)/ρ20), A·s^½/m². */
export function iec60949K(volumetricHeat_JpKm3: number, beta_K: number, resistivity20_Ohm_m: number): number {
  return Math.sqrt((volumetricHeat_JpKm3 * (beta_K + 20)) / resistivity20_Ohm_m);
}

/** K in the standard's unit A·s^½/mm² from K in A·s^½/m². */
export const kPerMm2 = (k_SI: number): number => k_SI * 1e-6;

/** Final temperature θf, °C, after I²t (A²s) through cross-section S (m²) from θi (°C). */
export function adiabaticFinalTemperature(i2t_A2s: number, area_m2: number, k_SI: number, beta_K: number, initial_C: number): number {
  return (initial_C + beta_K) * Math.exp(i2t_A2s / (k_SI * k_SI * area_m2 * area_m2)) - beta_K;
}

/** The I²t (A²s) that takes cross-section S (m²) from θi to θf (°C). */
export function adiabaticI2t(area_m2: number, k_SI: number, beta_K: number, initial_C: number, final_C: number): number {
  return k_SI * k_SI * area_m2 * area_m2 * Math.log((final_C + beta_K) / (initial_C + beta_K));
}
