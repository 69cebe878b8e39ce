/** Test fixture: a small station design (invented values, never an oracle), parsed by design/parse.ts. */
import { parseDesign } from '../../design/parse.js';
import type { Design } from '../../design/schema.js';

export const FIXTURE_YAML = `
name: Fixture bench, test coil T-1
bank: { capacitance: 2200 uF, voltage: 1.6 kV, esr: 4 mohm, esl: 0.2 uH }
switch: { kind: thyristor, thresholdVoltage: 1.2 V, slopeResistance: 0.4 mohm }
freewheel: { position: fixture, thresholdVoltage: 0.9 V, slopeResistance: 0.3 mohm }
cable: { resistance: 3 mohm, inductance: 1.5 uH }
coil:
  inductance: 180 uH
  resistance: 25 mohm
  conductor: copper
  mass: 2.1 kg
  initialTemperature: 25 degC
  fieldPerAmpere: 600 A/m/A
coupled:
  - { name: sleeve, inductance: 2 uH, resistance: 0.2 mohm, mutual: 10 uH, fieldPerAmpere: -100 A/m/A, heatCapacity: 200 J/K }
`;

export function fixtureDesign(): Design {
  return parseDesign(FIXTURE_YAML, 'fixture.yaml');
}
