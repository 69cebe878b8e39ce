/**
 * Winding and loop conductors: electrical and thermal constants of copper and aluminium.
 *
 * Sources (REFERENCES.md):
 * - IEC 60028 (international annealed copper standard): copper ρ20 = 1/58 Ω·mm²/m
 *   = 1.7241e-8 Ω·m, α20 = 0.00393 /K, density 8890 kg/m³; aluminium (61 % IACS)
 *   ρ20 = 2.8264e-8 Ω·m, α20 = 0.00403 /K.
 * - IEC 60949 (adiabatic short-circuit heating; also IEC 60364-5-54 Annex A):
 *   β = 234.5 K (Cu), 228 K (Al) — the reciprocal of the temperature coefficient at 0 °C —
 *   and volumetric heat capacity σc = 3.45e6 (Cu), 2.5e6 (Al) J/(K·m³);
 *   K = √(σc·(β + 20)/ρ20) ≈ 226 (Cu), 148 (Al) A·s^½/mm².
 * - CRC Handbook of Chemistry and Physics: specific heat near 25 °C, copper 385 J/(kg·K),
 *   aluminium 897 J/(kg·K).
 * - Aluminium density 2703 kg/m³: IEC 60889 (hard-drawn aluminium wire), from memory.
 *
 * Note: σc of IEC 60949 and density × specific heat differ by about 1 % (Cu: 8890·385
 * = 3.42e6) and 3 % (Al: 2703·897 = 2.42e6); the standard's σc is a value chosen over the
 * temperature range of a short circuit. The coil model uses mass × specific heat
 * (CRC), the IEC 60949 check uses σc, each with its own source.
 */

export type ConductorName = 'copper' | 'aluminium';

export interface ConductorMaterial {
  name: ConductorName;
  /** Resistivity at 20 °C, Ω·m (IEC 60028). */
  resistivity20_Ohm_m: number;
  /** Temperature coefficient of resistance at 20 °C, 1/K (IEC 60028). */
  tempCoeff20_perK: number;
  /** Density at 20 °C, kg/m³. */
  density_kgpm3: number;
  /** Specific heat near 25 °C, J/(kg·K) (CRC Handbook). */
  specificHeat_JpkgK: number;
  /** IEC 60949 β: reciprocal of the temperature coefficient of resistance at 0 °C, K. */
  iec60949Beta_K: number;
  /** IEC 60949 volumetric heat capacity σc, J/(K·m³). */
  iec60949VolumetricHeat_JpKm3: number;
  /** Source of each value, for reports. */
  sources: Readonly<Record<string, string>>;
}

export const COPPER: ConductorMaterial = {
  name: 'copper',
  resistivity20_Ohm_m: 1.7241e-8, // IEC 60028: 1/58 Ω·mm²/m
  tempCoeff20_perK: 0.00393, // IEC 60028
  density_kgpm3: 8890, // IEC 60028
  specificHeat_JpkgK: 385, // CRC Handbook of Chemistry and Physics, near 25 °C
  iec60949Beta_K: 234.5, // IEC 60949
  iec60949VolumetricHeat_JpKm3: 3.45e6, // IEC 60949
  sources: {
    resistivity20_Ohm_m: 'IEC 60028',
    tempCoeff20_perK: 'IEC 60028',
    density_kgpm3: 'IEC 60028',
    specificHeat_JpkgK: 'CRC Handbook of Chemistry and Physics',
    iec60949Beta_K: 'IEC 60949',
    iec60949VolumetricHeat_JpKm3: 'IEC 60949',
  },
};

export const ALUMINIUM: ConductorMaterial = {
  name: 'aluminium',
  resistivity20_Ohm_m: 2.8264e-8, // IEC 60028 reference (61 % IACS)
  tempCoeff20_perK: 0.00403, // 61 % IACS aluminium (REFERENCES.md, IEC 60028 family)
  density_kgpm3: 2703, // IEC 60889, from memory
  specificHeat_JpkgK: 897, // CRC Handbook of Chemistry and Physics, near 25 °C
  iec60949Beta_K: 228, // IEC 60949
  iec60949VolumetricHeat_JpKm3: 2.5e6, // IEC 60949
  sources: {
    resistivity20_Ohm_m: 'IEC 60028 (61 % IACS)',
    tempCoeff20_perK: 'IEC 60028 (61 % IACS)',
    density_kgpm3: 'IEC 60889 (from memory)',
    specificHeat_JpkgK: 'CRC Handbook of Chemistry and Physics',
    iec60949Beta_K: 'IEC 60949',
    iec60949VolumetricHeat_JpKm3: 'IEC 60949',
  },
};

export const CONDUCTORS: Readonly<Record<ConductorName, ConductorMaterial>> = { copper: COPPER, aluminium: ALUMINIUM };

/** The names accepted in design files. */
export const CONDUCTOR_NAMES = ['copper', 'aluminium'] as const satisfies readonly ConductorName[];

export function conductor(name: ConductorName): ConductorMaterial {
  return CONDUCTORS[name];
}

/**
 * IEC 60949 constant K = √(σc·(β + 20)/ρ20), in A·s^½/mm² (the unit the standard prints).
 * Copper ≈ 226, aluminium ≈ 148.
 */
export function iec60949K(m: ConductorMaterial): number {
  const K_SI = Math.sqrt((m.iec60949VolumetricHeat_JpKm3 * (m.iec60949Beta_K + 20)) / m.resistivity20_Ohm_m); // A·s^½/m²
  return K_SI * 1e-6; // per mm²
}

/** Resistance at temperature T (°C) from R20: R20·(1 + α20·(T − 20)) (IEC 60028 linear law). */
export function resistanceAt(resistance20_Ohm: number, tempCoeff20_perK: number, temperature_C: number): number {
  return resistance20_Ohm * (1 + tempCoeff20_perK * (temperature_C - 20));
}
