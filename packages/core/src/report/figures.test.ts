import { describe, expect, it } from 'vitest';
import { FIGURES, FIGURE_KEYS } from './figures.js';

describe('FIGURES (the one description of every figure)', () => {
  it('holds the keys DESIGN.md requires in the JSON output', () => {
    for (const k of ['peakCurrent_A', 'timeOfPeak_s', 'pulseWidthHalfMax_s', 'endOfPulse_s', 'peakField_Apm', 'timeOfPeakField_s', 'finalCapacitorVoltage_V', 'reverseVoltage_pct', 'i2tSwitch_A2s', 'i2tDiode_A2s', 'coilTemperatureRise_K', 'storedEnergy_J', 'energyBalanceRelativeError']) {
      expect(FIGURE_KEYS).toContain(k);
    }
  });

  it('gives each key a unit that matches the suffix of its name, a label and a description', () => {
    const suffixUnit: Record<string, string> = { A: 'A', s: 's', Apm: 'A/m', T: 'T', V: 'V', pct: '%', A2s: 'A²s', Aps: 'A/s', K: 'K', C: '°C', J: 'J' };
    for (const k of FIGURE_KEYS) {
      const m = FIGURES[k];
      const suffix = k.includes('_') ? k.slice(k.lastIndexOf('_') + 1) : '';
      expect(m.unit, k).toBe(suffix ? suffixUnit[suffix] : '1');
      expect(m.label.length, k).toBeGreaterThan(3);
      expect(m.description.endsWith('.'), k).toBe(true);
    }
    expect(new Set(FIGURE_KEYS.map((k) => FIGURES[k].label)).size).toBe(FIGURE_KEYS.length);
  });
});
