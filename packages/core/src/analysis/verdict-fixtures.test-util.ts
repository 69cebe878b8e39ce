/**
 * Test fixtures for the verdict tests: a Station and a ShotResult-like object with figures set
 * directly (no engine). Invented numbers in an invented scenario; never oracles — every test
 * computes its expectation from the published formula it checks.
 */
import { DEFAULT_SOLVER, type Station } from '../model/station.js';
import type { ShotFigures, ShotResult } from '../model/result.js';
import type { VerdictItem } from '../model/verdict.js';

export function fixtureStation(over: Partial<Station> = {}): Station {
  return {
    name: 'Test rig, rotor segment fixture',
    bank: { capacitance_F: 2.2e-3, voltage_V: 1600, esr_Ohm: 4e-3, esl_H: 0.2e-6 },
    switch: { kind: 'thyristor', thresholdVoltage_V: 1.2, slopeResistance_Ohm: 0.4e-3 },
    freewheel: { position: 'fixture', thresholdVoltage_V: 0.9, slopeResistance_Ohm: 0.3e-3 },
    cable: { resistance_Ohm: 3e-3, inductance_H: 1.5e-6 },
    coil: {
      inductance_H: 180e-6,
      resistance20_Ohm: 25e-3,
      tempCoeff_perK: 0.00393,
      heatCapacity_JpK: 810,
      initialTemperature_C: 25,
      conductor: 'copper',
    },
    coupled: [],
    loopMutual_H: [],
    probes: [{ name: 'part', coil_ApmPerA: 95, loops_ApmPerA: [] }],
    solver: DEFAULT_SOLVER,
    ...over,
  };
}

export function fixtureFigures(over: Partial<ShotFigures> = {}): ShotFigures {
  return {
    peakCurrent_A: 30e3,
    timeOfPeak_s: 1.2e-3,
    pulseWidthHalfMax_s: 2.5e-3,
    timeAbove90pct_s: 0.8e-3,
    endOfPulse_s: 8e-3,
    peakField_Apm: 2.85e6,
    peakFluxDensity_T: 2.85e6 * 4e-7 * Math.PI,
    timeOfPeakField_s: 1.2e-3,
    finalCapacitorVoltage_V: 0,
    reverseVoltage_pct: 5,
    peakReverseVoltage_V: -80,
    i2tSwitch_A2s: 1.5e6,
    i2tDiode_A2s: 2.0e6,
    peakSwitchCurrent_A: 30e3,
    peakDiodeCurrent_A: 28e3,
    peakDidt_Aps: 40e6,
    coilTemperatureRise_K: 12,
    coilFinalTemperature_C: 37,
    storedEnergy_J: 2816,
    energyBalanceRelativeError: 1e-9,
    ...over,
  };
}

export function fixtureResult(over: Omit<Partial<ShotResult>, 'figures'> & { figures?: Partial<ShotFigures> } = {}): ShotResult {
  const { figures, ...rest } = over;
  const f = fixtureFigures(figures);
  return {
    figures: f,
    phases: [],
    energy: {
      initial_J: f.storedEnergy_J,
      capacitorFinal_J: 0,
      inductorFinal_J: 0,
      dissipated_J: { esr: 0, switch: 0, cable: 0, coil: 0, diode: 0, loops: [] },
      relativeError: 0,
    },
    loops: [],
    probes: [{ name: 'part', peakField_Apm: f.peakField_Apm, timeOfPeak_s: f.timeOfPeakField_s }],
    waveform: {
      t_s: [],
      capacitorVoltage_V: [],
      coilCurrent_A: [],
      switchCurrent_A: [],
      diodeCurrent_A: [],
      loopCurrents_A: [],
      field_Apm: [],
      coilTemperature_C: [],
      loopTemperatures_C: [],
    },
    solver: { method: 'odex', steps: 0, rejectedSteps: 0, functionEvaluations: 0, events: 0, relTol: 1e-9, absTol: 1e-9, wallTime_s: 0 },
    warnings: [],
    ...rest,
  };
}

/** Rank of a status for monotonicity properties: fail < warn < pass. */
export function rank(status: string): number {
  return status === 'fail' ? 0 : status === 'warn' ? 1 : status === 'pass' ? 2 : -1;
}

/** The item with this id; throws when there is none (use `hasId` to test for absence). */
export function byId(items: readonly VerdictItem[], id: string): VerdictItem {
  const it = items.find((i) => i.id === id);
  if (!it) throw new Error(`no verdict item ${id} in [${items.map((i) => i.id).join(', ')}]`);
  return it;
}

/** True when an item with this id is present. */
export function hasId(items: readonly VerdictItem[], id: string): boolean {
  return items.some((i) => i.id === id);
}
