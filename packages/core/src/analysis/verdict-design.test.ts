import { describe, expect, it } from 'vitest';
import { parseDesign } from '../design/parse.js';
import { designToStation } from '../design/to-station.js';
import { simulateShot } from '../solve/shot.js';
import { judgeInputsFromDesign } from './verdict-design.js';
import { judgeShot } from './verdict.js';
import { steadyState } from './production-heating.js';
import { halfSineI2t_A2s } from './ratings.js';
import { bleederTime_s } from './bleeder.js';
import { byId, hasId } from './verdict-fixtures.test-util.js';

// Invented scenario: a hub fixture on a small test bank.
const DESIGN = `
name: Test rig, hub fixture H-2
bank: { capacitance: 2200 uF, voltage: 1.6 kV, esr: 4 mohm, esl: 0.2 uH }
switch: { kind: thyristor, thresholdVoltage: 1.2 V, slopeResistance: 0.4 mohm }
freewheel: { position: fixture, thresholdVoltage: 0.9 V, slopeResistance: 0.3 mohm }
cable: { resistance: 3 mohm, inductance: 1.5 uH }
coil: { inductance: 180 uH, resistance: 25 mohm, conductor: copper, mass: 2.1 kg, initialTemperature: 25 degC, fieldPerAmpere: 600 A/m/A }
solver: { samples: 0 }
part: { grade: ndfeb-h, fieldMargin: 10 % }
ratings:
  switch: { surgeCurrent: 30 kA, didt: 200 A/us }
  diode: { surgeCurrent: 30 kA }
  capacitor: { voltage: 2 kV, reverse: 20 % }
  winding: { radius: 25 mm, thickness: 12 mm }
production: { shotsPerMinute: 2, thermalTimeConstant: 15 min, insulationClass: H }
bleeder: { resistance: 10 kohm }
`;

describe('judgeInputsFromDesign + judgeShot (end to end with simulateShot)', () => {
  it('a design without check sections gives empty inputs', () => {
    const d = parseDesign('bank: { capacitance: 1 mF, voltage: 400 V }\ncoil: { inductance: 50 uH, resistance: 10 mohm, fieldPerAmpere: 100 A/m/A, mass: 1 kg }\n', 'x.yaml');
    expect(judgeInputsFromDesign(d)).toEqual({});
  });

  it('judges a simulated shot; every item reads the engine figures it claims to', () => {
    const design = parseDesign(DESIGN, 'rig.yaml');
    const station = designToStation(design);
    const result = simulateShot(station);
    const inputs = judgeInputsFromDesign(design);
    const v = judgeShot(station, inputs, result);
    const f = result.figures;

    expect(byId(v.items, 'field.part').value).toBeCloseTo(Math.abs(result.probes[0]!.peakField_Apm), 6);
    expect(byId(v.items, 'field.part').limit).toBe(2.7e6); // ndfeb-h library saturation field
    expect(byId(v.items, 'coil.temperature').value).toBeCloseTo(f.coilFinalTemperature_C, 9);
    expect(byId(v.items, 'switch.i2t').value).toBe(f.i2tSwitch_A2s);
    expect(byId(v.items, 'switch.i2t').limit).toBeCloseTo(halfSineI2t_A2s(30e3, 0.01), 3);
    expect(byId(v.items, 'diode.i2t').value).toBe(f.i2tDiode_A2s);
    expect(byId(v.items, 'capacitor.reverse').value).toBe(f.reverseVoltage_pct);
    const prod = byId(v.items, 'coil.temperature.production');
    const ss = steadyState({ shotRise_K: f.coilTemperatureRise_K, shotStart_C: 25, tempCoeff_perK: station.coil.tempCoeff_perK, ambient_C: 25, timeConstant_s: 900 }, 2);
    expect(prod.value).toBeCloseTo(ss.peak_C, 9);
    expect(byId(v.items, 'bleeder.time').value).toBeCloseTo(bleederTime_s(10e3, 2.2e-3, 1600, 50), 9);
    expect(hasId(v.items, 'winding.hoop-stress')).toBe(true);
    expect(['pass', 'warn', 'fail']).toContain(v.overall);
    // the peak current is physical for this bank: below V0·√(C/L_total) (lossless LC bound, Nilsson & Riedel)
    expect(f.peakCurrent_A).toBeLessThan(1600 * Math.sqrt(2.2e-3 / (180e-6 + 1.5e-6 + 0.2e-6)));
  });
});
