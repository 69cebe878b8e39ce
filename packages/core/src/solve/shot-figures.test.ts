import { describe, expect, it } from 'vitest';
import { MU0, assembleFigures, widthAtLevel } from './shot-figures.js';

describe('widthAtLevel(peak, fraction, crossing, tEnd)', () => {
  // i(t) = sin(πt) on [0, 1] (closed form): crosses level a at asin(a)/π and 1 − asin(a)/π
  const crossing = (level: number, side: 'rise' | 'fall') =>
    side === 'rise' ? Math.asin(level) / Math.PI : 1 - Math.asin(level) / Math.PI;

  it('gives the half-maximum width of a half sine: 2/3 of its duration (closed form)', () => {
    expect(widthAtLevel(1, 0.5, crossing, 1)).toBeCloseTo(2 / 3, 14);
  });

  it('gives the width above 90 % of a half sine: 1 − 2·asin(0.9)/π (closed form)', () => {
    expect(widthAtLevel(1, 0.9, crossing, 1)).toBeCloseTo(1 - (2 * Math.asin(0.9)) / Math.PI, 14);
  });

  it('runs to tEnd when the pulse never falls back below the level, and is 0 without a peak', () => {
    expect(widthAtLevel(1, 0.5, (l, s) => (s === 'rise' ? 0.25 : Number.NaN), 3)).toBe(2.75);
    expect(widthAtLevel(0, 0.5, crossing, 1)).toBe(0);
  });
});

describe('assembleFigures(inputs)', () => {
  const base = {
    peakCurrent_A: -1000,
    timeOfPeak_s: 1e-3,
    pulseWidthHalfMax_s: 2e-3,
    timeAbove90pct_s: 5e-4,
    endOfPulse_s: 4e-3,
    peakField_Apm: 2e6,
    timeOfPeakField_s: 1.1e-3,
    chargeVoltage_V: 1000,
    finalCapacitorVoltage_V: -50,
    minCapacitorVoltage_V: -200,
    i2tSwitch_A2s: 1,
    i2tDiode_A2s: 2,
    peakSwitchCurrent_A: 1000,
    peakDiodeCurrent_A: 900,
    peakDidt_Aps: -1e7,
    coilTemperatureRise_K: 10,
    coilInitialTemperature_C: 25,
    storedEnergy_J: 500,
    energyBalanceRelativeError: 1e-10,
  };

  it('reports magnitudes, the reverse voltage in % of the charge voltage and B = µ0·H (CODATA µ0)', () => {
    const { figures, nonFinite } = assembleFigures(base);
    expect(nonFinite).toEqual([]);
    expect(figures.peakCurrent_A).toBe(1000);
    expect(figures.reverseVoltage_pct).toBeCloseTo(20, 12);
    expect(figures.peakReverseVoltage_V).toBe(-200);
    expect(figures.peakFluxDensity_T).toBeCloseTo(2e6 * MU0, 12);
    expect(figures.peakDidt_Aps).toBe(1e7);
    expect(figures.coilFinalTemperature_C).toBe(35);
  });

  it('gives 0 % reverse voltage when the capacitor never reverses', () => {
    const { figures } = assembleFigures({ ...base, minCapacitorVoltage_V: 3 });
    expect(figures.reverseVoltage_pct).toBe(0);
    expect(figures.peakReverseVoltage_V).toBe(0);
  });

  it('replaces a non-finite value by 0 and names it', () => {
    const { figures, nonFinite } = assembleFigures({ ...base, i2tDiode_A2s: Number.NaN });
    expect(figures.i2tDiode_A2s).toBe(0);
    expect(nonFinite).toEqual(['i2tDiode_A2s']);
  });
});
