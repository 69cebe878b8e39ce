/**
 * Test fixture: a bare series RLC discharge (ideal switch, no diode, no cable, no loops,
 * R independent of temperature), whose peak current has the textbook closed form
 * (Nilsson & Riedel, natural response of the series RLC circuit).
 */
import { parseDesign } from '../../design/parse.js';
import type { Design } from '../../design/schema.js';

export const RLC = { C: 2.2e-3, L: 200e-6, R: 0.05, fieldPerAmpere: 100 };

export function rlcDesign(voltage = 1000): Design {
  return parseDesign(
    `
bank: { capacitance: ${RLC.C}, voltage: ${voltage} }
switch: { kind: thyristor, thresholdVoltage: 0, slopeResistance: 0 }
cable: { resistance: 0, inductance: 0 }
coil: { inductance: ${RLC.L}, resistance: ${RLC.R}, tempCoeff: 0, heatCapacity: 1e6, fieldPerAmpere: ${RLC.fieldPerAmpere} }
`,
    'rlc.yaml',
  );
}

/** Peak current per volt of charge: i(t) = V0/(ωd·L)·e^(−αt)·sin(ωd·t), peak at t_p = atan(ωd/α)/ωd. */
export function rlcPeakCurrentPerVolt(C = RLC.C, L = RLC.L, R = RLC.R): number {
  const alpha = R / (2 * L);
  const wd = Math.sqrt(1 / (L * C) - alpha * alpha);
  const tp = Math.atan(wd / alpha) / wd;
  return (Math.exp(-alpha * tp) * Math.sin(wd * tp)) / (wd * L);
}
