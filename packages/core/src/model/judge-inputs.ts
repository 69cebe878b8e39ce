/**
 * What the verdict needs beyond the Station and the ShotResult: the part's grade and the
 * required field, device and capacitor ratings, the production rate and cooling, the bleeder,
 * the winding's mechanics. Plain SI values. The contract between the design file's check
 * sections (design/sections/part, ratings, production, bleeder) and the verdict
 * (analysis/verdict.ts `judgeShot`); `judgeInputsFromDesign` (analysis/verdict-design.ts)
 * converts one to the other.
 *
 * Every default is defined once, in VERDICT_DEFAULTS; the design schema reuses them.
 * A group left out is not judged.
 */
import type { MagnetOverrides } from '../materials/magnet-grades.js';
import type { ConductorTemper } from '../materials/conductor-strength.js';

/** Half-sine bases of surge ratings: 10 ms (50 Hz) or 8.3 ms (60 Hz). */
export type SurgeBasis = '10ms' | '8.3ms';

/** The surge bases, for schemas. */
export const SURGE_BASES = ['10ms', '8.3ms'] as const satisfies readonly SurgeBasis[];

/** Defaults of the judge inputs (our own choices, documented as "user setting" in each note). */
export const VERDICT_DEFAULTS = {
  /** Required headroom of the peak field over the required field, fraction. */
  fieldMargin: 0.1,
  /** Required headroom of a temperature below its limit, K. */
  temperatureMargin_K: 10,
  /** Coupled loops whose name starts with this (case-insensitive) belong to the part. */
  partLoopPrefix: 'part',
  /** Required headroom of every device and capacitor rating, fraction (1 − value/rating). */
  ratingMargin: 0.2,
  /** Half-sine basis of surge ratings. */
  surgeBasis: '10ms' as SurgeBasis,
  /** Shortest pulse the equal-I²t surge rule is applied to, s (common practice: surge curves start at 1 ms). */
  surgeFloor_s: 1e-3,
  /** Ambient temperature of the station, °C. */
  ambient_C: 25,
  /** Account for R(T) in the per-shot rise at production rate. */
  resistanceRise: true,
  /** Winding conductor temper for the proof stress. */
  temper: 'annealed' as ConductorTemper,
  /** Safety factor on the conductor's proof stress. */
  safetyFactor: 2,
  /** Residual voltage the bleeder check reports, V (besides 50 V). */
  bleederThreshold_V: 50,
} as const;

export interface PartJudgeInput {
  /** Library grade id (materials/magnet-grades.ts), e.g. `ndfeb-sh`. */
  grade: string;
  /** Datasheet values that replace the library's (SI). */
  overrides?: MagnetOverrides;
  /** Field the part must see, A/m; default: the grade's saturation field. */
  requiredField_Apm?: number;
  /** Required headroom over the required field, fraction. */
  fieldMargin?: number;
  /** Required headroom of the part's temperature below its maximum working temperature, K. */
  temperatureMargin_K?: number;
  /** Prefix of the names of coupled loops that belong to the part. */
  loopPrefix?: string;
  /** Log-spread σ of the saturation model (analysis/saturation.ts); default by coercivity mechanism. */
  switchingSpread?: number;
}

export interface DeviceRatingInput {
  /** Non-repetitive surge current I_TSM / I_FSM, A. */
  surgeCurrent_A?: number;
  /** Half-sine basis of the surge rating. */
  surgeBasis?: SurgeBasis;
  /** Rated I²t, A²s; default from the surge rating by I²t = I_TSM²·t/2. */
  i2t_A2s?: number;
  /** Critical rate of rise of on-state current, A/s (thyristor). */
  didt_Aps?: number;
  /** Repetitive peak blocking voltage (V_DRM/V_RRM), V. */
  blockingVoltage_V?: number;
}

export interface CapacitorRatingInput {
  /** Rated voltage of the bank, V. */
  voltage_V?: number;
  /** Allowed voltage reversal, % of the charge voltage. */
  reverse_pct?: number;
  /** Rated peak current of ONE unit, A (the bank current is shared by `units`). */
  peakCurrent_A?: number;
  /** Units in parallel sharing the current equally. */
  units?: number;
}

export interface WindingMechanicsInput {
  /** Conductor temper; selects the proof stress. */
  temper?: ConductorTemper;
  /** Proof stress of the conductor, Pa; replaces the library's (materials/conductor-strength.ts). */
  proofStress_Pa?: number;
  /** Safety factor on the proof stress (required margin = 1 − 1/SF). */
  safetyFactor?: number;
  /** Mean radius of the winding, m. */
  windingRadius_m?: number;
  /** Radial build (thickness) of the winding, m. */
  windingThickness_m?: number;
  /** Field at the winding's inner face, A/m; default: the largest peak field in the result. */
  windingField_Apm?: number;
}

export interface RatingsJudgeInput {
  switch?: DeviceRatingInput;
  diode?: DeviceRatingInput;
  capacitor?: CapacitorRatingInput;
  winding?: WindingMechanicsInput;
  /** Required headroom of every rating, fraction. */
  margin?: number;
  /** Floor of the surge rule, s. */
  surgeFloor_s?: number;
}

export interface ProductionJudgeInput {
  /** Shots per minute; absent: only the single shot is checked against the insulation class. */
  shotsPerMinute?: number;
  /** Ambient temperature, °C. */
  ambient_C?: number;
  /** Thermal time constant of the winding, s; else estimated from surfaceArea and convection. */
  thermalTimeConstant_s?: number;
  /** Cooling surface of the winding, m². */
  surfaceArea_m2?: number;
  /** Convection coefficient h, W/(m²·K). */
  convection_WpM2K?: number;
  /** IEC 60085 class of the winding's insulation: 155 or "F", etc. */
  insulationClass?: number | string;
  /** Required headroom below the class temperature, K. */
  margin_K?: number;
  /** Account for R(T) in the per-shot rise. */
  resistanceRise?: boolean;
}

export interface BleederJudgeInput {
  /** Bleeder resistance across the bank, Ω. */
  resistance_Ohm: number;
  /** Residual voltage of interest, V. */
  threshold_V?: number;
  /** Time the bank must reach the threshold within, s (a user requirement; judged when given). */
  maxTime_s?: number;
}

export interface JudgeInputs {
  part?: PartJudgeInput;
  ratings?: RatingsJudgeInput;
  production?: ProductionJudgeInput;
  bleeder?: BleederJudgeInput;
}
