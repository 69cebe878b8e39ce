/**
 * Test helpers of the discharge engine (not part of the library): a station builder with
 * round, invented values (never a test oracle by themselves), and `simulateChecked`, which runs a
 * shot and asserts what every shot of the suite must satisfy: energy balance ≤ 1e-6 relative
 * (conservation of energy, exact for the model), and finite figures and waveform.
 */
import { expect } from 'vitest';
import type { ShotResult } from '../model/result.js';
import { DEFAULT_SOLVER, type Station } from '../model/station.js';
import { simulateShot, type SimulateOptions } from './shot.js';

export interface StationParts {
  C?: number;
  V0?: number;
  esr?: number;
  esl?: number;
  sw?: Partial<Station['switch']>;
  diode?: Station['freewheel'];
  cableR?: number;
  cableL?: number;
  L1?: number;
  R1?: number;
  alpha?: number;
  cth?: number;
  T0?: number;
  coil?: Partial<Station['coil']>;
  coupled?: Station['coupled'];
  loopMutual?: number[][];
  probes?: Station['probes'];
  solver?: Partial<Station['solver']>;
}

/** A station from parts; defaults: 2 mF at 1 kV into 200 µH, 50 mΩ, ideal thyristor, no diode. */
export function makeStation(p: StationParts = {}): Station {
  const coupled = p.coupled ?? [];
  return {
    name: 'test station',
    bank: { capacitance_F: p.C ?? 2e-3, voltage_V: p.V0 ?? 1000, esr_Ohm: p.esr ?? 0, esl_H: p.esl ?? 0 },
    switch: { kind: 'thyristor', thresholdVoltage_V: 0, slopeResistance_Ohm: 0, ...p.sw },
    freewheel: p.diode ?? null,
    cable: { resistance_Ohm: p.cableR ?? 0, inductance_H: p.cableL ?? 0 },
    coil: {
      inductance_H: p.L1 ?? 200e-6,
      resistance20_Ohm: p.R1 ?? 0.05,
      tempCoeff_perK: p.alpha ?? 0,
      heatCapacity_JpK: p.cth ?? 1000,
      initialTemperature_C: p.T0 ?? 20,
      ...p.coil,
    },
    coupled,
    loopMutual_H: p.loopMutual ?? coupled.map(() => coupled.map(() => 0)),
    probes: p.probes ?? [{ name: 'part', coil_ApmPerA: 100, loops_ApmPerA: coupled.map(() => 0) }],
    solver: { ...DEFAULT_SOLVER, ...p.solver },
  };
}

function allFinite(r: ShotResult): boolean {
  for (const v of Object.values(r.figures)) if (!Number.isFinite(v)) return false;
  const w = r.waveform;
  const arrays: number[][] = [
    w.t_s,
    w.capacitorVoltage_V,
    w.coilCurrent_A,
    w.switchCurrent_A,
    w.diodeCurrent_A,
    w.coilTemperature_C,
    ...w.loopCurrents_A,
    ...w.field_Apm,
    ...w.loopTemperatures_C,
  ];
  for (const a of arrays) for (const v of a) if (!Number.isFinite(v)) return false;
  return true;
}

/** Simulate and assert energy balance ≤ 1e-6 (conservation, exact for the model) and no NaN. */
export function simulateChecked(station: Station, options?: SimulateOptions): ShotResult {
  const r = simulateShot(station, options);
  expect(r.energy.relativeError, `energy balance of ${station.name}`).toBeLessThanOrEqual(1e-6);
  expect(allFinite(r), 'all figures and samples finite').toBe(true);
  return r;
}
