/**
 * Permanent-magnet grade families: the values the verdict needs about the part.
 *
 * LOW CONFIDENCE. Every value here is a typical figure for a family, marked with its source:
 * "REFERENCES.md" (the project's low-confidence magnet section: producers' tables and memory),
 * "DOMAIN.md" (the project's domain brief table), or "typical, from memory". None is a test
 * oracle. The grade's own datasheet wins: every value can be overridden in the design file
 * (part.overrides), and the overridden value is then marked "design file".
 *
 * Values (SI): saturation field H_sat (A/m, the applied field that drives a thermally
 * demagnetized part to practical saturation), intrinsic coercivity H_cJ (A/m), remanence B_r
 * (T), resistivity ρ (Ω·m), recoil permeability µ_rec (relative), Curie temperature and maximum
 * working temperature (°C), and the coercivity mechanism (nucleation, pinning or shape
 * anisotropy, typical, from memory), which selects the spread of the saturation model in
 * analysis/saturation.ts.
 */

/** A value with where it comes from. */
export interface SourcedValue {
  value: number;
  source: string;
}

export type MagnetFamily = 'ndfeb-sintered' | 'ndfeb-bonded' | 'smco5' | 'sm2co17' | 'ferrite' | 'alnico';

/** How coercivity arises; it shapes the initial magnetization curve (see analysis/saturation.ts). */
export type CoercivityMechanism = 'nucleation' | 'pinning' | 'shape';

export interface MagnetGrade {
  /** Stable id used in design files, e.g. `ndfeb-sh`. */
  id: string;
  family: MagnetFamily;
  /** Human name, e.g. "Sintered NdFeB, SH class". */
  name: string;
  mechanism: CoercivityMechanism;
  /** Applied field for practical saturation from the thermally demagnetized state, A/m. */
  saturationField_Apm: SourcedValue;
  /** Intrinsic coercivity H_cJ at 20 °C, A/m. */
  intrinsicCoercivity_Apm: SourcedValue;
  /** Remanence B_r at 20 °C, T. */
  remanence_T: SourcedValue;
  /** Electrical resistivity, Ω·m (eddy currents in the part). */
  resistivity_Ohm_m: SourcedValue;
  /** Recoil permeability, relative. */
  recoilPermeability: SourcedValue;
  curieTemperature_C: SourcedValue;
  /** Highest working temperature before irreversible loss, °C (depends on the part's load line). */
  maxWorkingTemperature_C: SourcedValue;
}

/** The keys of a grade that hold sourced values (the overridable ones). */
export type MagnetProperty =
  | 'saturationField_Apm'
  | 'intrinsicCoercivity_Apm'
  | 'remanence_T'
  | 'resistivity_Ohm_m'
  | 'recoilPermeability'
  | 'curieTemperature_C'
  | 'maxWorkingTemperature_C';

export const MAGNET_PROPERTIES: readonly MagnetProperty[] = [
  'saturationField_Apm',
  'intrinsicCoercivity_Apm',
  'remanence_T',
  'resistivity_Ohm_m',
  'recoilPermeability',
  'curieTemperature_C',
  'maxWorkingTemperature_C',
];

/** Overrides from the design file (the datasheet), SI units. */
export type MagnetOverrides = Partial<Record<MagnetProperty, number>>;

const REF = 'REFERENCES.md (low confidence)';
const DOM = 'DOMAIN.md table, typical, from memory';
const MEM = 'typical, from memory';

const v = (value: number, source: string): SourcedValue => ({ value, source });

/**
 * Sintered NdFeB coercivity classes as producers grade them (from memory): minimum H_cJ
 * 12/14/17/20/25/30/35 kOe (1 kOe = 79.577 kA/m) and the usual maximum working temperatures.
 */
function sinteredNdFeB(
  cls: string,
  hcj_kOe: number,
  br_T: number,
  hsat_MApm: number,
  hsatSource: string,
  tmax_C: number,
): MagnetGrade {
  return {
    id: `ndfeb-${cls.toLowerCase()}`,
    family: 'ndfeb-sintered',
    name: `Sintered NdFeB, ${cls} class`,
    mechanism: 'nucleation',
    saturationField_Apm: v(hsat_MApm * 1e6, hsatSource),
    intrinsicCoercivity_Apm: v(hcj_kOe * (1e6 / (4 * Math.PI)), `${MEM}, class minimum ${hcj_kOe} kOe`),
    remanence_T: v(br_T, MEM),
    resistivity_Ohm_m: v(1.4e-6, `${REF}: 1.2–1.6 µΩ·m`),
    recoilPermeability: v(1.05, `${MEM}; DOMAIN.md: near 1.05 for rare-earth magnets`),
    curieTemperature_C: v(310, `${REF}: 310–400 °C, lower end`),
    maxWorkingTemperature_C: v(tmax_C, MEM),
  };
}

/** The grade library. Ids are stable. */
export const MAGNET_GRADES: readonly MagnetGrade[] = [
  sinteredNdFeB('N', 12, 1.28, 2.4, `${REF}: 2.4–3.2 MA/m, lower end for the lowest-coercivity class`, 80),
  sinteredNdFeB('M', 14, 1.28, 2.5, `${MEM}; ${REF} gives 2.4–3.2 MA/m`, 100),
  sinteredNdFeB('H', 17, 1.25, 2.7, `${MEM}; ${REF} gives 2.4–3.2 MA/m`, 120),
  sinteredNdFeB('SH', 20, 1.22, 2.9, `${MEM}; ${REF} gives 2.4–3.2 MA/m`, 150),
  sinteredNdFeB('UH', 25, 1.18, 3.2, `${REF}: 2.4–3.2 MA/m, upper end`, 180),
  sinteredNdFeB('EH', 30, 1.15, 3.5, `${MEM}; ${REF} gives 2.4–3.2 MA/m, "higher for high-coercivity grades"`, 200),
  sinteredNdFeB('AH', 35, 1.1, 3.8, `${MEM}; ${REF} gives 2.4–3.2 MA/m, "higher for high-coercivity grades"`, 220),
  {
    id: 'ndfeb-bonded',
    family: 'ndfeb-bonded',
    name: 'Bonded NdFeB (isotropic, compression-bonded)',
    mechanism: 'pinning',
    saturationField_Apm: v(2.0e6, `${REF}: ≥ 2.0 MA/m`),
    intrinsicCoercivity_Apm: v(720e3, MEM),
    remanence_T: v(0.68, MEM),
    resistivity_Ohm_m: v(1e-4, `${MEM}; near insulating (DOMAIN.md)`),
    recoilPermeability: v(1.2, MEM),
    curieTemperature_C: v(310, `${REF}: NdFeB 310–400 °C, lower end`),
    maxWorkingTemperature_C: v(120, `${MEM}; limited by the binder`),
  },
  {
    id: 'smco5',
    family: 'smco5',
    name: 'SmCo5 (sintered)',
    mechanism: 'nucleation',
    saturationField_Apm: v(3.2e6, `${REF}: SmCo about 3.2 MA/m`),
    intrinsicCoercivity_Apm: v(1590e3, `${MEM}, about 20 kOe`),
    remanence_T: v(0.95, MEM),
    resistivity_Ohm_m: v(0.55e-6, `${REF}: 0.5–0.6 µΩ·m`),
    recoilPermeability: v(1.05, MEM),
    curieTemperature_C: v(720, `${REF}: 700–750 °C`),
    maxWorkingTemperature_C: v(250, MEM),
  },
  {
    id: 'sm2co17',
    family: 'sm2co17',
    name: 'Sm2Co17 (sintered)',
    mechanism: 'pinning',
    saturationField_Apm: v(4.0e6, `${DOM}: 3.2–4.0 MA/m, upper end (pinning type)`),
    intrinsicCoercivity_Apm: v(1990e3, `${MEM}, about 25 kOe`),
    remanence_T: v(1.08, MEM),
    resistivity_Ohm_m: v(0.85e-6, `${REF}: 0.8–0.9 µΩ·m`),
    recoilPermeability: v(1.05, MEM),
    curieTemperature_C: v(810, `${REF}: 800–825 °C`),
    maxWorkingTemperature_C: v(300, `${MEM}; 350 °C for high-temperature grades`),
  },
  {
    id: 'ferrite',
    family: 'ferrite',
    name: 'Hard ferrite (sintered, anisotropic Sr/Ba)',
    mechanism: 'nucleation',
    saturationField_Apm: v(1.1e6, `${REF}: 0.8–1.1 MA/m, upper end`),
    intrinsicCoercivity_Apm: v(250e3, MEM),
    remanence_T: v(0.39, MEM),
    resistivity_Ohm_m: v(1e4, `${DOM}: about 1e10 µΩ·m (insulating)`),
    recoilPermeability: v(1.1, MEM),
    curieTemperature_C: v(450, `${REF}: about 450 °C`),
    maxWorkingTemperature_C: v(250, MEM),
  },
  {
    id: 'alnico5',
    family: 'alnico',
    name: 'AlNiCo 5 (cast)',
    mechanism: 'shape',
    saturationField_Apm: v(0.4e6, `${DOM}: 250–400 kA/m, upper end; ${REF}: AlNiCo 0.24–0.64 MA/m`),
    intrinsicCoercivity_Apm: v(51e3, `${MEM}, about 640 Oe`),
    remanence_T: v(1.25, MEM),
    resistivity_Ohm_m: v(0.47e-6, `${REF}: about 0.5 µΩ·m`),
    recoilPermeability: v(3.0, `${MEM}; AlNiCo 5: about 3 to 4.5`),
    curieTemperature_C: v(860, `${REF}: 700–860 °C, AlNiCo 5 at the upper end`),
    maxWorkingTemperature_C: v(525, MEM),
  },
];

/** Every grade id, for schemas and error messages. */
export const MAGNET_GRADE_IDS: readonly string[] = MAGNET_GRADES.map((g) => g.id);

/** The library grade with this id (case-insensitive), or undefined. */
export function magnetGrade(id: string): MagnetGrade | undefined {
  const key = id.trim().toLowerCase();
  return MAGNET_GRADES.find((g) => g.id === key);
}

/**
 * A grade with the design file's overrides applied: each overridden value is marked
 * "design file (datasheet)". Overrides are SI and validated by the design schema.
 */
export function applyMagnetOverrides(grade: MagnetGrade, overrides: MagnetOverrides | undefined): MagnetGrade {
  if (!overrides) return grade;
  const out: MagnetGrade = { ...grade };
  for (const key of MAGNET_PROPERTIES) {
    const o = overrides[key];
    if (o !== undefined) out[key] = { value: o, source: 'design file (datasheet)' };
  }
  return out;
}
