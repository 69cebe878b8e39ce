import { describe, expect, it } from 'vitest';
import { bleederGuidance, bleederPower_W, bleederTime_s, bleederVoltage_V } from './bleeder.js';

describe('bleeder', () => {
  // RC natural response (Nilsson & Riedel, Electric Circuits): v = V0·e^(−t/RC) → t = RC·ln(V0/V).
  // 10 kΩ, 2200 µF (RC = 22 s), 1600 V → 50 V: 22·ln(32) = 76.246 s.
  it('bleederTime_s = RC·ln(V0/V): 10 kΩ, 2.2 mF, 1.6 kV → 50 V in 76.25 s', () => {
    expect(bleederTime_s(10e3, 2.2e-3, 1600, 50)).toBeCloseTo(22 * Math.log(32), 9);
    expect(bleederTime_s(10e3, 2.2e-3, 1600, 50)).toBeCloseTo(76.246, 3);
  });

  it('bleederVoltage_V at the computed time returns the threshold (inverse pair)', () => {
    const t = bleederTime_s(4.7e3, 1e-3, 900, 75);
    expect(bleederVoltage_V(4.7e3, 1e-3, 900, t)).toBeCloseTo(75, 9);
    // one time constant: V0/e
    expect(bleederVoltage_V(1e3, 1e-3, 100, 1)).toBeCloseTo(100 / Math.E, 12);
  });

  it('bleederTime_s is 0 when the bank is already at or below the threshold; NaN on bad input', () => {
    expect(bleederTime_s(1e3, 1e-3, 40, 50)).toBe(0);
    expect(bleederTime_s(0, 1e-3, 400, 50)).toBeNaN();
    expect(bleederTime_s(1e3, 1e-3, 400, 0)).toBeNaN();
  });

  it('bleederPower_W = V²/R', () => {
    expect(bleederPower_W(10e3, 1600)).toBeCloseTo(256, 9);
  });

  // REFERENCES.md (from memory): NFPA 70 Art. 460: 50 V within 1 min (≤ 600 V), 5 min above; IEC 60831-1: 75 V within 3 min.
  it('bleederGuidance picks the NFPA 70 time by voltage class and always lists IEC 60831-1', () => {
    expect(bleederGuidance(480)[0]).toMatchObject({ voltage_V: 50, time_s: 60 });
    expect(bleederGuidance(600)[0].time_s).toBe(60);
    expect(bleederGuidance(1600)[0]).toMatchObject({ voltage_V: 50, time_s: 300 });
    expect(bleederGuidance(800)[1]).toMatchObject({ id: 'iec60831', voltage_V: 75, time_s: 180 });
    expect(bleederGuidance(1600)[1].scope).toMatch(/above its scope/);
    expect(bleederGuidance(1600)[0].source).toMatch(/from memory/);
  });
});
