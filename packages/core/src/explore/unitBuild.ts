/**
 * A bank built from identical capacitor units: s units in series per string, p strings in
 * parallel (s·p units in all). Series connection divides capacitance and adds voltage ratings,
 * ESR and ESL; parallel strings multiply capacitance and divide ESR and ESL (equal sharing,
 * no bus impedance between strings):
 *
 *   C = p·C_u/s,   V_rating = s·V_u,   ESR = s·ESR_u/p,   ESL = s·ESL_u/p
 *
 * (series and parallel combination of impedances; any circuit-analysis text, e.g. Nilsson &
 * Riedel, ch. 6 for C and L, ch. 3 for R). Each unit carries 1/p of the bank current.
 */
export interface CapacitorUnit {
  capacitance_F: number;
  /** Rated voltage of one unit, V. */
  voltage_V: number;
  esr_Ohm: number;
  esl_H: number;
  /** Rated peak current of one unit, A (optional). */
  peakCurrent_A?: number;
}

export interface UnitBuild {
  series: number;
  parallel: number;
  capacitance_F: number;
  ratedVoltage_V: number;
  esr_Ohm: number;
  esl_H: number;
  units: number;
}

export function unitBuild(unit: CapacitorUnit, series: number, parallel: number): UnitBuild {
  return {
    series,
    parallel,
    capacitance_F: (parallel * unit.capacitance_F) / series,
    ratedVoltage_V: series * unit.voltage_V,
    esr_Ohm: (series * unit.esr_Ohm) / parallel,
    esl_H: (series * unit.esl_H) / parallel,
    units: series * parallel,
  };
}
