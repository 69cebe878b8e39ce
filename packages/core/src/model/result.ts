/**
 * The result of one simulated shot: the contract between the engine (solve/) and
 * everything that reads it (analysis/, report/, explore/, the CLI).
 * All values SI. JSON keys of `figures` are stable (docs/json-output.md); add, never rename.
 */

/** A warning carried in a result: stable code of our own, human message, severity. */
export interface Warning {
  /** Stable code, e.g. `solver.tolerance`, `solver.step-limit`, `energy.balance`, `part.not-penetrated`. */
  code: string;
  message: string;
  severity: 'info' | 'warning' | 'error';
}

export type PhaseName =
  /** switch on, diode off (or no diode): one mesh */
  | 'discharge'
  /** switch and diode both conducting: current commutating between the two meshes */
  | 'commutation'
  /** switch off, diode carrying the coil current */
  | 'freewheel'
  /** bidirectional switch conducting reverse current (ring-down) */
  | 'reverse'
  /** coil open (switch and diode off); only coupled loops still carry current */
  | 'loops-decay';

export interface PhaseRecord {
  name: PhaseName;
  start_s: number;
  end_s: number;
  /** Why the phase ended, e.g. `diode-on`, `switch-off`, `diode-off`, `current-zero`, `t-max`, `decayed`. */
  endReason: string;
}

/** Waveform samples; every array has the same length as t_s. */
export interface Waveform {
  t_s: number[];
  capacitorVoltage_V: number[];
  coilCurrent_A: number[];
  switchCurrent_A: number[];
  diodeCurrent_A: number[];
  /** loopCurrents_A[k][j]: loop k at sample j. */
  loopCurrents_A: number[][];
  /** field_Apm[p][j]: probe p at sample j (probe 0 = part). */
  field_Apm: number[][];
  coilTemperature_C: number[];
  /** loopTemperatures_C[k][j]. */
  loopTemperatures_C: number[][];
}

export interface EnergyBalance {
  /** ½·C·V0², J. */
  initial_J: number;
  /** ½·C·v_end², J. */
  capacitorFinal_J: number;
  /** Magnetic energy still stored at the end (all inductors, mutuals included), J. */
  inductorFinal_J: number;
  dissipated_J: {
    esr: number;
    switch: number;
    cable: number;
    coil: number;
    diode: number;
    /** per coupled loop */
    loops: number[];
  };
  /** |initial − (capacitorFinal + inductorFinal + Σ dissipated)| / initial. */
  relativeError: number;
}

export interface SolverStats {
  /** Which integrator ran: `odex` (Gragg–Bulirsch–Stoer extrapolation) or `stiff`. */
  method: string;
  steps: number;
  rejectedSteps: number;
  functionEvaluations: number;
  /** Number of located events. */
  events: number;
  relTol: number;
  absTol: number;
  /** Wall-clock time of the integration, s (informative only). */
  wallTime_s: number;
}

/** Figures of one shot. Keys are stable. */
export interface ShotFigures {
  peakCurrent_A: number;
  timeOfPeak_s: number;
  /** Full width at half maximum of the coil current, s. */
  pulseWidthHalfMax_s: number;
  /** Time the coil current stays above 90 % of its peak, s. */
  timeAbove90pct_s: number;
  /** When the coil current ended (current zero), or t_max, s. */
  endOfPulse_s: number;
  /** Peak field at the part (probe 0), A/m. */
  peakField_Apm: number;
  /** µ0·peakField, T. */
  peakFluxDensity_T: number;
  timeOfPeakField_s: number;
  finalCapacitorVoltage_V: number;
  /** Most negative capacitor voltage as % of the charge voltage (positive number; 0 if none). */
  reverseVoltage_pct: number;
  /** Most negative capacitor voltage, V (<= 0, or 0). */
  peakReverseVoltage_V: number;
  i2tSwitch_A2s: number;
  i2tDiode_A2s: number;
  peakSwitchCurrent_A: number;
  peakDiodeCurrent_A: number;
  /** Largest |di/dt| of the switch current, A/s. */
  peakDidt_Aps: number;
  coilTemperatureRise_K: number;
  coilFinalTemperature_C: number;
  /** ½·C·V0², J. */
  storedEnergy_J: number;
  energyBalanceRelativeError: number;
}

export interface ShotResult {
  figures: ShotFigures;
  phases: PhaseRecord[];
  energy: EnergyBalance;
  /** Per coupled loop: final temperature, °C, and peak |current|, A. */
  loops: { name: string; peakCurrent_A: number; temperatureRise_K: number; finalTemperature_C: number }[];
  /** Per probe: peak field and its time. */
  probes: { name: string; peakField_Apm: number; timeOfPeak_s: number }[];
  waveform: Waveform;
  solver: SolverStats;
  warnings: Warning[];
}
