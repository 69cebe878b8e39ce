/**
 * The station as the discharge engine consumes it: every quantity in SI units,
 * every default already applied, every geometry already reduced to circuit numbers.
 *
 * This is the contract between the layers:
 *   design file --(design/)--> Station --(solve/)--> ShotResult --(analysis/, report/)--> verdict, text, plots
 * Geometry (magnetics/) and magnetic circuits fill the `coil`, `coupled`, `loopMutual_H`
 * and `probes` fields; the engine never sees millimetres or turns.
 *
 * Circuit (see docs/model.md):
 *   bank (C, ESR, ESL) -> switch -> [diode at bank end] -> cable (R_w, L_w) -> [diode at fixture end] -> coil (L_1, R_1(T))
 *   coil magnetically coupled to n shorted loops (L_k, R_k(T_k), M_1k, M_jk).
 */

/** Capacitor bank. */
export interface Bank {
  /** Capacitance, F. */
  capacitance_F: number;
  /** Charge voltage at the moment of firing, V (> 0). */
  voltage_V: number;
  /** Equivalent series resistance, Ω (>= 0). */
  esr_Ohm: number;
  /** Equivalent series inductance, H (>= 0). */
  esl_H: number;
}

/** The firing switch. */
export interface Switch {
  /**
   * `thyristor`: conducts forward only, turns off at current zero and blocks reverse.
   * `bidirectional`: thyristor with antiparallel diode; the circuit rings on (demagnetizing pulse).
   */
  kind: 'thyristor' | 'bidirectional';
  /** On-state threshold voltage V_T0, V (>= 0). */
  thresholdVoltage_V: number;
  /** On-state slope resistance r_T, Ω (>= 0). */
  slopeResistance_Ohm: number;
}

/** Freewheel ("crowbar") diode across the load. */
export interface Freewheel {
  /** `bank`: across the bank+switch output, before the cable; `fixture`: across the coil terminals, after the cable. */
  position: 'bank' | 'fixture';
  /** Forward threshold voltage V_F0, V (>= 0). */
  thresholdVoltage_V: number;
  /** Forward slope resistance r_F, Ω (>= 0). */
  slopeResistance_Ohm: number;
}

/** Cable or bus bars between the bank and the fixture (both conductors, go and return). */
export interface Cable {
  /** Ω (>= 0). */
  resistance_Ohm: number;
  /** H (>= 0). */
  inductance_H: number;
}

/** Adiabatic thermal state of a conductor: R(T) = R20·(1 + α20·(T − 20 °C)), C_th·dT/dt = i²·R(T). */
export interface ThermalConductor {
  /** Resistance at 20 °C, Ω (> 0 for the coil, >= 0 for loops). */
  resistance20_Ohm: number;
  /** Temperature coefficient of resistance at 20 °C, 1/K. */
  tempCoeff_perK: number;
  /** Heat capacity of the conductor (mass × specific heat), J/K (> 0). */
  heatCapacity_JpK: number;
  /** Temperature at the moment of firing, °C. */
  initialTemperature_C: number;
}

/** Optional nonlinear flux linkage of the coil (iron-yoke fixtures). When present it replaces `inductance_H` for the coil's own flux. */
export interface NonlinearCoil {
  /** Flux linkage λ(i), Wb-turns, odd and monotone in i. */
  fluxLinkage_Wb(i_A: number): number;
  /** Incremental inductance dλ/di, H (> 0). */
  incrementalInductance_H(i_A: number): number;
  /** Field at the part as a function of coil current, A/m. */
  fieldAtPart_Apm(i_A: number): number;
  /** Magnetic co-energy ∫0^i λ di', J (for the energy balance). Magnetic energy is i·λ − co-energy. */
  coEnergy_J(i_A: number): number;
}

/** The fixture coil (the load). */
export interface Coil extends ThermalConductor {
  /** Self inductance L_1, H (> 0). Used for the linear model; for a yoke fixture, the small-current value. */
  inductance_H: number;
  /** Conductor material, when known (used by heating checks and reports). */
  conductor?: 'copper' | 'aluminium';
  /** Conductor mass, kg, when known. */
  mass_kg?: number;
  /** Conductor cross-section of one turn, m², when known (IEC 60949 check). */
  conductorArea_m2?: number;
  /** Conductor length, m, when known. */
  conductorLength_m?: number;
  /** Nonlinear flux linkage (iron yoke). Absent for air-core coils. */
  nonlinear?: NonlinearCoil;
}

/** A shorted loop magnetically coupled to the coil: a shell of a conductive body, a shorted winding, etc. */
export interface CoupledLoop extends ThermalConductor {
  /** Name for reports, e.g. "part shell 3", "sleeve". */
  name: string;
  /** Self inductance L_k, H (> 0). */
  inductance_H: number;
  /** Mutual inductance to the coil M_1k, H (sign by the same current convention as the coil). */
  mutualToCoil_H: number;
}

/** A point where the field is reported: field = coil_ApmPerA·i_coil + Σ loops_ApmPerA[k]·i_k. */
export interface FieldProbe {
  /** e.g. "part", "part centre", "part surface". probes[0] is the part's reference point. */
  name: string;
  /** Axial field per ampere of coil current, (A/m)/A. */
  coil_ApmPerA: number;
  /** Field per ampere of each coupled loop, (A/m)/A; length = coupled.length. */
  loops_ApmPerA: number[];
}

/** Integration settings. */
export interface SolverSettings {
  /** Relative tolerance of the integrator (default 1e-9). */
  relTol: number;
  /** Absolute tolerance, scaled per state by the engine (default 1e-9 relative to the state's scale). */
  absTol: number;
  /** Step limit per phase. */
  maxSteps: number;
  /** Hard stop, s: the shot ends here whatever the state. */
  tMax_s: number;
  /** Event location tolerance, s. */
  eventTol_s: number;
  /** Integrator choice: `auto` picks by stiffness. */
  method: 'auto' | 'odex' | 'stiff';
  /** Number of waveform samples stored (dense output on a uniform grid plus every event). 0: figures only. */
  samples: number;
}

/** A whole station in SI units. */
export interface Station {
  name: string;
  bank: Bank;
  switch: Switch;
  /** null: no freewheel diode. */
  freewheel: Freewheel | null;
  cable: Cable;
  coil: Coil;
  /** Shorted loops coupled to the coil (may be empty). */
  coupled: CoupledLoop[];
  /** Mutual inductances between loops, n×n symmetric; the diagonal is ignored (self is in CoupledLoop.inductance_H). Empty when n = 0. */
  loopMutual_H: number[][];
  /** Field probes; probes[0] is the part. At least one. */
  probes: FieldProbe[];
  solver: SolverSettings;
}

/** Defaults of the solver settings, defined once (the design schema reuses them). */
export const DEFAULT_SOLVER: SolverSettings = {
  relTol: 1e-9,
  absTol: 1e-9,
  maxSteps: 100_000,
  tMax_s: 1,
  eventTol_s: 1e-12,
  method: 'auto',
  samples: 2000,
};
