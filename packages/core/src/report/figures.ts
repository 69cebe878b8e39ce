/**
 * One description of every figure of a shot (key, SI unit, label, meaning). The text, Markdown
 * and HTML summaries, the JSON output and docs/json-output.md are all generated from this
 * table, so labels, units and documentation cannot drift apart. Typed as a record over
 * `keyof ShotFigures`: a figure added to model/result.ts without an entry here fails to compile.
 */
import type { ShotFigures } from '../model/result.js';

export interface FigureMeta {
  /** SI unit symbol of the value ('1' for a plain ratio). */
  unit: string;
  /** Short human label. */
  label: string;
  /** One sentence for the documentation. */
  description: string;
}

export const FIGURES: Record<keyof ShotFigures, FigureMeta> = {
  peakCurrent_A: { unit: 'A', label: 'Peak coil current', description: 'Largest coil current of the shot.' },
  timeOfPeak_s: { unit: 's', label: 'Time of peak current', description: 'Time from firing to the peak coil current.' },
  pulseWidthHalfMax_s: {
    unit: 's',
    label: 'Pulse width at half maximum',
    description: 'Time the coil current stays at or above half its peak (full width at half maximum).',
  },
  timeAbove90pct_s: {
    unit: 's',
    label: 'Time above 90 % of peak',
    description: 'Time the coil current stays at or above 90 % of its peak.',
  },
  endOfPulse_s: {
    unit: 's',
    label: 'End of pulse',
    description: 'When the coil current ended (current zero or decayed), or the time limit if it had not.',
  },
  peakField_Apm: {
    unit: 'A/m',
    label: 'Peak field at the part',
    description: 'Largest field at the part (probe 0), coil and coupled loops together.',
  },
  peakFluxDensity_T: { unit: 'T', label: 'Peak µ0·H at the part', description: 'µ0 times the peak field at the part.' },
  timeOfPeakField_s: { unit: 's', label: 'Time of peak field', description: 'Time from firing to the peak field at the part.' },
  finalCapacitorVoltage_V: {
    unit: 'V',
    label: 'Capacitor voltage at the end',
    description: 'Voltage left on the bank when the shot ended.',
  },
  reverseVoltage_pct: {
    unit: '%',
    label: 'Capacitor reverse voltage',
    description: 'Most negative bank voltage as a percentage of the charge voltage (positive number; 0 if it never reversed).',
  },
  peakReverseVoltage_V: {
    unit: 'V',
    label: 'Most negative capacitor voltage',
    description: 'Most negative bank voltage (0 or negative).',
  },
  i2tSwitch_A2s: { unit: 'A²s', label: 'Switch I²t', description: 'Integral of the square of the switch current over the shot.' },
  i2tDiode_A2s: {
    unit: 'A²s',
    label: 'Freewheel diode I²t',
    description: 'Integral of the square of the freewheel diode current over the shot (0 without a diode).',
  },
  peakSwitchCurrent_A: { unit: 'A', label: 'Peak switch current', description: 'Largest switch current.' },
  peakDiodeCurrent_A: { unit: 'A', label: 'Peak diode current', description: 'Largest freewheel diode current.' },
  peakDidt_Aps: { unit: 'A/s', label: 'Peak switch di/dt', description: 'Largest rate of change of the switch current.' },
  coilTemperatureRise_K: {
    unit: 'K',
    label: 'Coil temperature rise',
    description: 'Adiabatic temperature rise of the coil conductor over the shot.',
  },
  coilFinalTemperature_C: {
    unit: '°C',
    label: 'Coil temperature at the end',
    description: 'Coil conductor temperature when the shot ended.',
  },
  storedEnergy_J: { unit: 'J', label: 'Stored energy', description: 'Energy in the bank at firing, ½·C·V0².' },
  energyBalanceRelativeError: {
    unit: '1',
    label: 'Energy balance error',
    description:
      'Relative error of the energy balance: |stored − (left in C + left in inductors + all losses)| / stored.',
  },
};

/** The figure keys in display order. */
export const FIGURE_KEYS = Object.keys(FIGURES) as (keyof ShotFigures)[];
