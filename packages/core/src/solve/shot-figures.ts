/**
 * Waveform figures of one shot (model/result.ts ShotFigures), assembled from what the engine
 * tracked on the dense output:
 *
 * - peaks (coil, switch, diode current, field at the part, switch |di/dt|) are located where the
 *   derivative changes sign, by root finding on the dense output (solve/extrema.ts), not read
 *   off samples;
 * - the pulse width at half maximum and the time above 90 % come from level crossings of the coil
 *   current, located by root finding on the dense output around the peak: the last crossing of
 *   the level before the peak and the first one after it (`widthAtLevel`);
 * - I²t of switch and diode are integrals carried as ODE states;
 * - the reverse voltage is the most negative capacitor voltage (0 if it never reverses).
 *
 * Every figure is finite: a value that is not (a bug or a degenerate station) is replaced by 0
 * and reported in `nonFinite`, so the caller can attach a warning rather than emit NaN.
 */
import type { ShotFigures } from '../model/result.js';

/** µ0, H/m (CODATA 2018: 1.25663706212e-6). */
export const MU0 = 1.25663706212e-6;

/**
 * Width of the pulse at a fraction of its peak, from a crossing finder.
 * @param crossing returns the time the pulse crosses `level` on the rising side ('rise': the last
 *   crossing before the peak) or falling side ('fall': the first after it), or NaN if none
 * @param tEnd used when the pulse never falls below the level before the end
 */
export function widthAtLevel(
  peakAbs: number,
  fraction: number,
  crossing: (level: number, side: 'rise' | 'fall') => number,
  tEnd: number,
): number {
  if (!(peakAbs > 0)) return 0;
  const level = fraction * peakAbs;
  const rise = crossing(level, 'rise');
  let fall = crossing(level, 'fall');
  if (!Number.isFinite(fall)) fall = tEnd;
  if (!Number.isFinite(rise)) return 0;
  return Math.max(0, fall - rise);
}

export interface FigureInputs {
  /** Coil current where |i_L| is largest (signed), A, and its time, s. */
  peakCurrent_A: number;
  timeOfPeak_s: number;
  pulseWidthHalfMax_s: number;
  timeAbove90pct_s: number;
  endOfPulse_s: number;
  /** Part field where |H| is largest (signed), A/m, and its time. */
  peakField_Apm: number;
  timeOfPeakField_s: number;
  chargeVoltage_V: number;
  finalCapacitorVoltage_V: number;
  /** Most negative capacitor voltage seen, V (may be positive if it never reversed). */
  minCapacitorVoltage_V: number;
  i2tSwitch_A2s: number;
  i2tDiode_A2s: number;
  peakSwitchCurrent_A: number;
  peakDiodeCurrent_A: number;
  peakDidt_Aps: number;
  coilTemperatureRise_K: number;
  coilInitialTemperature_C: number;
  storedEnergy_J: number;
  energyBalanceRelativeError: number;
}

export function assembleFigures(f: FigureInputs): { figures: ShotFigures; nonFinite: string[] } {
  const reverse_V = f.minCapacitorVoltage_V < 0 ? f.minCapacitorVoltage_V : 0;
  const peakField = Math.abs(f.peakField_Apm);
  const figures: ShotFigures = {
    peakCurrent_A: Math.abs(f.peakCurrent_A),
    timeOfPeak_s: f.timeOfPeak_s,
    pulseWidthHalfMax_s: f.pulseWidthHalfMax_s,
    timeAbove90pct_s: f.timeAbove90pct_s,
    endOfPulse_s: f.endOfPulse_s,
    peakField_Apm: peakField,
    peakFluxDensity_T: MU0 * peakField,
    timeOfPeakField_s: f.timeOfPeakField_s,
    finalCapacitorVoltage_V: f.finalCapacitorVoltage_V,
    reverseVoltage_pct: f.chargeVoltage_V > 0 && reverse_V < 0 ? (-reverse_V / f.chargeVoltage_V) * 100 : 0,
    peakReverseVoltage_V: reverse_V,
    i2tSwitch_A2s: f.i2tSwitch_A2s,
    i2tDiode_A2s: f.i2tDiode_A2s,
    peakSwitchCurrent_A: Math.abs(f.peakSwitchCurrent_A),
    peakDiodeCurrent_A: Math.abs(f.peakDiodeCurrent_A),
    peakDidt_Aps: Math.abs(f.peakDidt_Aps),
    coilTemperatureRise_K: f.coilTemperatureRise_K,
    coilFinalTemperature_C: f.coilInitialTemperature_C + f.coilTemperatureRise_K,
    storedEnergy_J: f.storedEnergy_J,
    energyBalanceRelativeError: f.energyBalanceRelativeError,
  };
  const nonFinite: string[] = [];
  const rec = figures as unknown as Record<string, number>;
  for (const key of Object.keys(rec)) {
    if (!Number.isFinite(rec[key])) {
      nonFinite.push(key);
      rec[key] = 0;
    }
  }
  return { figures, nonFinite };
}
