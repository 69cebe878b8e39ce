import { describe, expect, it } from 'vitest';
import { shotToJson, shotToJsonString } from './json.js';
import { FIGURE_KEYS } from './figures.js';
import { rlcShot } from './__fixtures__/rlc.js';
import type { Verdict } from '../model/verdict.js';

// Required figure keys (DESIGN.md, "Machine-readable output of one shot"): never renamed.
const REQUIRED_FIGURES = [
  'peakCurrent_A',
  'timeOfPeak_s',
  'pulseWidthHalfMax_s',
  'endOfPulse_s',
  'peakField_Apm',
  'timeOfPeakField_s',
  'finalCapacitorVoltage_V',
  'reverseVoltage_pct',
  'i2tSwitch_A2s',
  'i2tDiode_A2s',
  'coilTemperatureRise_K',
  'storedEnergy_J',
  'energyBalanceRelativeError',
];

const verdict: Verdict = {
  items: [
    { id: 'field.part', item: 'Peak field at the part', value: 2.5e6, limit: 2.4e6, unit: 'A/m', margin: 2.5 / 2.4 - 1, status: 'pass', note: 'user setting' },
    { id: 'info.x', item: 'Informative', value: 3, limit: NaN, unit: 'A', margin: NaN, status: 'info', note: '' },
  ],
  overall: 'pass',
};

describe('shotToJson(result, verdict, {waveform})', () => {
  const { result } = rlcShot({ freewheel: true });

  it('has the DESIGN.md top level in a stable order, waveform only when asked', () => {
    expect(Object.keys(shotToJson(result, null, { waveform: false }))).toEqual([
      'schemaVersion', 'figures', 'verdict', 'warnings', 'phases', 'solver', 'energy', 'probes', 'loops', 'penetration',
    ]);
    expect(Object.keys(shotToJson(result, verdict, { waveform: true }))).toContain('waveform');
  });

  it('keeps every required figure key with the SI value of the result', () => {
    const j = shotToJson(result, null, { waveform: false });
    for (const k of REQUIRED_FIGURES) expect(j.figures[k], k).toBe((result.figures as unknown as Record<string, number>)[k]);
    expect(Object.keys(j.figures)).toEqual(FIGURE_KEYS);
  });

  it('writes NaN limits and margins as null (JSON has no NaN) and survives a round trip', () => {
    const s = shotToJsonString(result, verdict, { waveform: true });
    const back = JSON.parse(s);
    expect(back.verdict.items[1].limit).toBeNull();
    expect(back.verdict.items[1].margin).toBeNull();
    expect(back.verdict.items[0].margin).toBeCloseTo(2.5 / 2.4 - 1, 15);
    expect(back.waveform.t_s).toHaveLength(result.waveform.t_s.length);
    expect(back.waveform.coilCurrent_A[10]).toBe(result.waveform.coilCurrent_A[10]);
    expect(back.phases.map((p: { name: string }) => p.name)).toEqual(['discharge', 'freewheel']);
    expect(s.endsWith('\n')).toBe(true);
  });

  it('the energy of the closed-form fixture balances (series RLC + RL decay, conservation)', () => {
    // The fixture integrates i²R phase by phase with composite Simpson (2000 panels, error
    // O(h⁴) on the smooth closed forms), so the balance closes far below 1e-9; a wrong closed
    // form or a lost loss term would leave an error of order 1e-2 or more.
    expect(shotToJson(result, null, { waveform: false }).energy.relativeError).toBeLessThan(1e-9);
  });
});
