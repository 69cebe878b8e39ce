/**
 * The suite-wide energy-balance check (energy-balance.setup.ts) is live: shots run through the
 * public entry (simulateShot and simulateDesign from '@fluxkick/core') are recorded with the
 * relative error the result reports, so a shot beyond 1e-6 cannot pass unnoticed.
 */
import { describe, expect, it } from 'vitest';
import { DEFAULT_SOLVER, loadDesign, simulateDesign, simulateShot, type Station } from '@fluxkick/core';
import { fileURLToPath } from 'node:url';
import { ENERGY_BALANCE_LIMIT, allowEnergyImbalance, shotRecords } from './energy-balance.js';

const DEMO = fileURLToPath(new URL('../../examples/demo-station.yaml', import.meta.url));

// Invented round values (not an oracle): 1 mF at 500 V into 100 µH, 20 mΩ, ideal thyristor.
function station(relTol: number): Station {
  return {
    name: `check station relTol ${relTol}`,
    bank: { capacitance_F: 1e-3, voltage_V: 500, esr_Ohm: 0, esl_H: 0 },
    switch: { kind: 'thyristor', thresholdVoltage_V: 0, slopeResistance_Ohm: 0 },
    freewheel: null,
    cable: { resistance_Ohm: 0, inductance_H: 0 },
    coil: { inductance_H: 100e-6, resistance20_Ohm: 0.02, tempCoeff_perK: 0, heatCapacity_JpK: 500, initialTemperature_C: 20 },
    coupled: [],
    loopMutual_H: [],
    probes: [{ name: 'part', coil_ApmPerA: 100, loops_ApmPerA: [] }],
    solver: { ...DEFAULT_SOLVER, relTol, absTol: relTol },
  };
}

describe('suite-wide energy balance check (tests/support/energy-balance.setup.ts)', () => {
  it('records every shot run through simulateShot and simulateDesign, with its reported balance', () => {
    const before = shotRecords().length;
    const r = simulateShot(station(1e-9));
    const d = simulateDesign(loadDesign(DEMO), 'demo');
    const recs = shotRecords().slice(before);
    expect(recs.map((x) => x.station)).toEqual(['check station relTol 1e-9', d.station.name]);
    expect(recs[0].relativeError).toBe(r.energy.relativeError);
    expect(recs[1].relativeError).toBe(d.result.energy.relativeError);
    // conservation of energy at the default tolerance (issue 2's limit)
    for (const x of recs) expect(x.relativeError).toBeLessThanOrEqual(ENERGY_BALANCE_LIMIT);
  });

  it('a test may opt out when it breaks the balance on purpose (a very loose tolerance)', () => {
    allowEnergyImbalance();
    const r = simulateShot(station(1e-2));
    // at relTol 1e-2 the balance is off (3.6e-3 when written), and the engine says so itself
    expect(r.energy.relativeError).toBeGreaterThan(ENERGY_BALANCE_LIMIT);
    expect(r.warnings.map((w) => w.code)).toContain('energy.balance');
    expect(shotRecords().at(-1)?.relativeError).toBe(r.energy.relativeError);
  });
});
