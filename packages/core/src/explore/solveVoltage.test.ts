import { describe, expect, it } from 'vitest';
import { solveVoltage } from './solveVoltage.js';
import { evaluateDesign } from './evaluateDesign.js';
import { withDesignValues, parseDesignPath } from './designPath.js';
import { fixtureDesign } from './__fixtures__/design.js';
import { RLC, rlcDesign, rlcPeakCurrentPerVolt } from './__fixtures__/rlcDesign.js';

describe('solveVoltage(design, { targetField_Apm })', () => {
  it('returns a voltage whose own shot meets the target within the stated tolerance [target, target·(1 + relTol)]', () => {
    const design = fixtureDesign();
    const target = 2.5e6;
    const relTol = 1e-3;
    const r = solveVoltage(design, { targetField_Apm: target, relTol });
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    // Re-simulate independently at the returned voltage.
    const again = evaluateDesign(withDesignValues(design, [{ path: parseDesignPath('bank.voltage')!, value: r.voltage_V }]));
    const field = Math.abs(again.figures.peakField_Apm);
    expect(field).toBeGreaterThanOrEqual(target);
    expect(field).toBeLessThanOrEqual(target * (1 + relTol));
    expect(r.field_Apm).toBe(field);
  });

  it('agrees with the closed-form series RLC peak current (Nilsson & Riedel): V = I_target / (i_peak per volt)', () => {
    const target = 1.2e6; // A/m = 12 kA × 100 (A/m)/A
    const exact = target / RLC.fieldPerAmpere / rlcPeakCurrentPerVolt();
    const relTol = 1e-4;
    const r = solveVoltage(rlcDesign(500), { targetField_Apm: target, relTol });
    expect(r.ok).toBe(true);
    // The answer lies at or above the root by at most relTol (field ∝ V here); the engine's own
    // error (relTol 1e-9 integration, event location 1e-12 s) adds far less than 1e-6.
    expect(r.voltage_V / exact - 1).toBeGreaterThanOrEqual(-1e-6);
    expect(r.voltage_V / exact - 1).toBeLessThanOrEqual(relTol + 1e-6);
  });

  it('says the target is unreachable below a voltage limit, with the field found there', () => {
    const r = solveVoltage(rlcDesign(500), { targetField_Apm: 1.2e6, maxVoltage_V: 800 });
    expect(r.ok).toBe(false);
    if (r.ok) return;
    expect(r.reason).toBe('unreachable');
    expect(r.voltage_V).toBe(800);
    // Field at 800 V from the same closed form, to the engine's accuracy.
    expect(Math.abs(r.field_Apm / (800 * rlcPeakCurrentPerVolt() * RLC.fieldPerAmpere) - 1)).toBeLessThan(1e-6);
  });
});
