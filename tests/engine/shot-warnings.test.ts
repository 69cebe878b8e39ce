/**
 * The engine's numerical warnings (issue 2: "warnings (tolerance not met, step limit, energy
 * balance off)"), each provoked on purpose through the public entry and, for the errors, through
 * `fluxkick shot --strict`. Lives here, not beside solve/shot.ts, while that folder is being tuned
 * by another change; it tests only what solve/shot.ts promises in its result.
 *
 * The station is an invented round one (2 mF at 1 kV into 200 µH, 50 mΩ, ideal devices, a freewheel
 * diode at the bank): the numbers are not oracles, only the warning paths are checked.
 */
import { describe, expect, it } from 'vitest';
import { mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { DEFAULT_SOLVER, simulateShot, type Station } from '@fluxkick/core';
import { main } from '../../packages/cli/src/main.js';
import { captureIo } from '../../packages/cli/src/io.js';
import { allowEnergyImbalance } from '../support/energy-balance.js';

const ROOT = fileURLToPath(new URL('../../', import.meta.url));

function station(solver: Partial<Station['solver']>): Station {
  return {
    name: 'warning paths (invented)',
    bank: { capacitance_F: 2e-3, voltage_V: 1000, esr_Ohm: 0, esl_H: 0 },
    switch: { kind: 'thyristor', thresholdVoltage_V: 0, slopeResistance_Ohm: 0 },
    freewheel: { position: 'bank', thresholdVoltage_V: 0, slopeResistance_Ohm: 0 },
    cable: { resistance_Ohm: 0, inductance_H: 0 },
    coil: { inductance_H: 200e-6, resistance20_Ohm: 0.05, tempCoeff_perK: 0, heatCapacity_JpK: 1000, initialTemperature_C: 20 },
    coupled: [],
    loopMutual_H: [],
    probes: [{ name: 'part', coil_ApmPerA: 100, loops_ApmPerA: [] }],
    solver: { ...DEFAULT_SOLVER, ...solver },
  };
}

const codes = (s: Station) => {
  const r = simulateShot(s);
  return { r, found: r.warnings.map((w) => `${w.code}:${w.severity}`) };
};

describe('simulateShot: numerical warnings', () => {
  it('step limit: solver.step-limit (error); the incomplete shot still accounts its energy at the stop', () => {
    const { r, found } = codes(station({ maxSteps: 3 }));
    expect(found).toContain('solver.step-limit:error');
    expect(r.phases.at(-1)?.endReason).toBe('step-limit');
    // energy conservation holds at whatever state the shot stopped in (the suite-wide 1e-6 check applies)
    expect(r.energy.relativeError).toBeLessThanOrEqual(1e-6);
  });

  it('time limit reached with current flowing: solver.t-max (warning)', () => {
    // 0.1 ms against a quarter period (π/2)·√(LC) = 0.99 ms: the current is still rising
    const { r, found } = codes(station({ tMax_s: 1e-4 }));
    expect(found).toContain('solver.t-max:warning');
    expect(r.figures.endOfPulse_s).toBeCloseTo(1e-4, 12);
  });

  it('tolerance that cannot be met (relTol 1e-17, below double precision): solver.tolerance (error), for each integrator', () => {
    for (const method of ['odex', 'stiff'] as const) {
      const { found } = codes(station({ relTol: 1e-17, absTol: 1e-20, method }));
      expect(found, method).toContain('solver.tolerance:error');
    }
  });

  it('energy balance off (relTol 1e-2): energy.balance (warning) above 1e-6', () => {
    allowEnergyImbalance();
    const { r, found } = codes(station({ relTol: 1e-2, absTol: 1e-2, method: 'odex' }));
    expect(r.energy.relativeError).toBeGreaterThan(1e-6);
    expect(found).toContain('energy.balance:warning');
  });

  it('a clean shot at the default tolerances carries none of them', () => {
    const { found } = codes(station({}));
    for (const c of ['solver.step-limit', 'solver.t-max', 'solver.tolerance', 'energy.balance']) expect(found.join(' ')).not.toContain(c);
  });
});

describe('fluxkick shot --strict: an engine error fails the shot', () => {
  it('solver.maxSteps: 3 in the design file: the warning in --json, exit 1 with --strict and 0 without', async () => {
    const yaml = readFileSync(join(ROOT, 'examples/demo-station.yaml'), 'utf8') + '\nsolver:\n  maxSteps: 3\n';
    const dir = mkdtempSync(join(tmpdir(), 'fk-warn-'));
    writeFileSync(join(dir, 'd.yaml'), yaml);
    const plain = captureIo({ cwd: dir });
    expect(await main(['shot', 'd.yaml', '--json'], plain)).toBe(0);
    expect((JSON.parse(plain.out) as { warnings: { code: string }[] }).warnings.map((w) => w.code)).toContain('solver.step-limit');
    const strict = captureIo({ cwd: dir });
    expect(await main(['shot', 'd.yaml', '--strict'], strict)).toBe(1);
    expect(strict.out).toContain('solver.step-limit');
  });
});
