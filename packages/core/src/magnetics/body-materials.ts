/**
 * Materials of conductive fixture bodies (part, sleeve, hub, shaft, housing): resistivity,
 * its temperature coefficient, density and specific heat, each with its source.
 *
 * Copper and aluminium come from materials/conductors.ts (IEC 60028, CRC Handbook). The others
 * are typical values, from memory; the user's material certificate overrides them (a body may
 * give its own numbers instead of a name).
 *
 * Steel is ferromagnetic; the eddy-current model (magnetics/shells.ts) treats every body as
 * non-magnetic (µ = µ0). At the fields of a magnetizing pulse (MA/m) steel is driven deep into
 * saturation, where its differential permeability approaches µ0, but during the first rise it
 * is not: the model then under-estimates the shielding of a steel body. fixture.ts says so in
 * a note whenever a steel body is present.
 *
 * Magnets: the resistivity comes from the grade (materials/magnet-grades.ts); the density and
 * specific heat of each family here are typical, from memory.
 */
import { ALUMINIUM, COPPER } from '../materials/conductors.js';
import type { MagnetFamily } from '../materials/magnet-grades.js';

export interface BodyMaterial {
  /** Name for reports. */
  name: string;
  /** Resistivity at 20 °C, Ω·m. */
  resistivity20_Ohm_m: number;
  /** Temperature coefficient of resistivity at 20 °C, 1/K (0: held constant). */
  tempCoeff20_perK: number;
  /** kg/m³ */
  density_kgpm3: number;
  /** J/(kg·K) */
  specificHeat_JpkgK: number;
  /** True for ferromagnetic metals (the shells model treats them as µ0; see the header). */
  ferromagnetic: boolean;
  /** Where the numbers come from. */
  source: string;
}

const MEM = 'typical, from memory';

/** Named metals for bodies. */
export const BODY_METALS = {
  copper: {
    name: 'copper',
    resistivity20_Ohm_m: COPPER.resistivity20_Ohm_m,
    tempCoeff20_perK: COPPER.tempCoeff20_perK,
    density_kgpm3: COPPER.density_kgpm3,
    specificHeat_JpkgK: COPPER.specificHeat_JpkgK,
    ferromagnetic: false,
    source: 'IEC 60028; CRC Handbook (materials/conductors.ts)',
  },
  aluminium: {
    name: 'aluminium',
    resistivity20_Ohm_m: ALUMINIUM.resistivity20_Ohm_m,
    tempCoeff20_perK: ALUMINIUM.tempCoeff20_perK,
    density_kgpm3: ALUMINIUM.density_kgpm3,
    specificHeat_JpkgK: ALUMINIUM.specificHeat_JpkgK,
    ferromagnetic: false,
    source: 'IEC 60028 (61 % IACS); IEC 60889; CRC Handbook (materials/conductors.ts)',
  },
  brass: {
    name: 'brass',
    resistivity20_Ohm_m: 6.4e-8,
    tempCoeff20_perK: 0.0016,
    density_kgpm3: 8500,
    specificHeat_JpkgK: 380,
    ferromagnetic: false,
    source: `${MEM} (CuZn37 class, about 27 % IACS)`,
  },
  steel: {
    name: 'steel',
    resistivity20_Ohm_m: 1.6e-7,
    tempCoeff20_perK: 0.005,
    density_kgpm3: 7850,
    specificHeat_JpkgK: 470,
    ferromagnetic: true,
    source: `${MEM} (low-carbon structural steel)`,
  },
  stainless: {
    name: 'stainless steel',
    resistivity20_Ohm_m: 7.2e-7,
    tempCoeff20_perK: 0.001,
    density_kgpm3: 7900,
    specificHeat_JpkgK: 500,
    ferromagnetic: false,
    source: `${MEM} (austenitic, 1.4301 / 304)`,
  },
} as const satisfies Record<string, BodyMaterial>;

export type BodyMetal = keyof typeof BODY_METALS;
export const BODY_METAL_NAMES = Object.keys(BODY_METALS) as BodyMetal[];

/** Density and specific heat of magnet families (typical, from memory). */
export const MAGNET_FAMILY_THERMAL: Readonly<Record<MagnetFamily, { density_kgpm3: number; specificHeat_JpkgK: number }>> = {
  'ndfeb-sintered': { density_kgpm3: 7500, specificHeat_JpkgK: 440 },
  'ndfeb-bonded': { density_kgpm3: 6000, specificHeat_JpkgK: 450 },
  smco5: { density_kgpm3: 8400, specificHeat_JpkgK: 370 },
  sm2co17: { density_kgpm3: 8400, specificHeat_JpkgK: 350 },
  ferrite: { density_kgpm3: 4900, specificHeat_JpkgK: 800 },
  alnico: { density_kgpm3: 7300, specificHeat_JpkgK: 450 },
};

/**
 * A magnet body material: resistivity from the grade, density and specific heat from its family
 * (typical, from memory). The temperature coefficient of a magnet's resistivity is not well known;
 * it is taken as 0 (resistance held constant; the part's temperature rise is small).
 */
export function magnetBodyMaterial(family: MagnetFamily, resistivity_Ohm_m: number, gradeName: string): BodyMaterial {
  const t = MAGNET_FAMILY_THERMAL[family];
  return {
    name: gradeName,
    resistivity20_Ohm_m: resistivity_Ohm_m,
    tempCoeff20_perK: 0,
    density_kgpm3: t.density_kgpm3,
    specificHeat_JpkgK: t.specificHeat_JpkgK,
    ferromagnetic: false,
    source: `resistivity from the grade (materials/magnet-grades.ts); density and specific heat ${MEM}`,
  };
}
