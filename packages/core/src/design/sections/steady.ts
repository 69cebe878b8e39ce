/**
 * Design section `steady`: a DC supply holding a current in the fixture coil, and the coil's
 * cooling, for the steady-current analysis (analysis/steady-current.ts, `fluxkick hold`).
 *
 * ```yaml
 * steady:
 *   supply: { voltage: 48 V, currentLimit: 20 A, seriesResistance: 60 mohm }
 *   cooling: { ambient: 25 degC, thermalResistance: 0.8 K/W }   # or heatTransferCoefficient + area
 *   targetField: 400 kA/m
 *   maxTemperature: 155 degC
 * ```
 * Cooling: R_th = 1/(h·A) when given as a heat-transfer coefficient h over the cooled surface A.
 * Natural convection from a coil in still air is of the order of 5–15 W/(m²·K) with radiation
 * (typical, from memory); measure R_th on the real coil when it matters.
 */
import type { z } from 'zod';
import { qty, section, type IssueFacts } from '../quantity-schema.js';

/** Ambient temperature when none is given, °C (a room; common practice for bench ratings). */
export const DEFAULT_AMBIENT_C = 25;

const supply = section('The DC supply: set voltage and/or current limit, and the resistance in series (source and leads).', {
  voltage: qty('voltage', { positive: true, description: 'Set (open-circuit) voltage; omit for a pure current source' }).optional(),
  currentLimit: qty('current', { positive: true, description: 'Current limit (constant-current setting); omit for a pure voltage source' }).optional(),
  seriesResistance: qty('resistance', { nonNegative: true, description: 'Source and lead resistance in series with the coil' }).default(0),
}).superRefine((s, ctx) => {
  if (s.voltage === undefined && s.currentLimit === undefined) {
    const facts: IssueFacts = { code: 'design.missing-field', problem: 'missing: a supply needs a voltage, a current limit, or both', expected: 'voltage (e.g. 48 V) and/or currentLimit (e.g. 20 A)' };
    ctx.addIssue({ code: 'custom', path: ['voltage'], message: `${facts.problem}; expected ${facts.expected}`, params: { fluxkick: facts } });
  }
});

const cooling = section('Cooling of the coil to ambient: a thermal resistance, or a heat-transfer coefficient over the cooled area.', {
  ambient: qty('temperature', { min: -273.15, description: 'Ambient temperature' }).default(DEFAULT_AMBIENT_C),
  thermalResistance: qty('thermalResistance', { positive: true, description: 'Coil-to-ambient thermal resistance R_th' }).optional(),
  heatTransferCoefficient: qty('heatTransferCoefficient', { positive: true, description: 'Heat-transfer coefficient h (with area)' }).optional(),
  area: qty('area', { positive: true, description: 'Cooled surface A (with heatTransferCoefficient)' }).optional(),
}).superRefine((c, ctx) => {
  const add = (path: string, facts: IssueFacts) => ctx.addIssue({ code: 'custom', path: [path], message: `${facts.problem}; expected ${facts.expected}`, params: { fluxkick: facts } });
  const hasR = c.thermalResistance !== undefined;
  const hasH = c.heatTransferCoefficient !== undefined || c.area !== undefined;
  if (hasR && hasH) add('heatTransferCoefficient', { code: 'design.inconsistent', problem: 'both thermalResistance and heatTransferCoefficient/area are given', expected: 'one of them' });
  else if (!hasR && !hasH) add('thermalResistance', { code: 'design.missing-field', problem: 'missing: the cooling of the coil', expected: 'thermalResistance (e.g. 0.8 K/W), or heatTransferCoefficient (e.g. 10 W/(m^2 K)) with area (e.g. 0.05 m^2)' });
  else if (hasH && (c.heatTransferCoefficient === undefined || c.area === undefined)) {
    add(c.area === undefined ? 'area' : 'heatTransferCoefficient', { code: 'design.missing-field', problem: 'missing: a heat-transfer coefficient needs the cooled area and the other way round', expected: 'both heatTransferCoefficient and area' });
  }
});

export const steadySection = section('Steady current (`fluxkick hold`): a DC supply holds a current in the fixture coil; its cooling; what field is wanted.', {
  supply,
  cooling,
  targetField: qty('fieldStrength', { positive: true, description: 'Field wanted at the part' }).optional(),
  maxTemperature: qty('temperature', { description: 'Highest allowed coil temperature (e.g. its IEC 60085 class)' }).optional(),
});

export type SteadyDesign = z.output<typeof steadySection>;

/** The steady-current inputs of a checked `steady` section, SI (the shapes of analysis/steady-current.ts). */
export interface SteadyInputs {
  supply: { voltage_V: number; currentLimit_A: number; seriesResistance_Ohm: number };
  cooling: { ambient_C: number; thermalResistance_KpW: number };
  options: { targetField_Apm?: number; maxTemperature_C?: number };
}

/** The analysis inputs of a checked `steady` section. */
export function steadyFromDesign(s: SteadyDesign): SteadyInputs {
  const thermalResistance_KpW = s.cooling.thermalResistance ?? 1 / (s.cooling.heatTransferCoefficient! * s.cooling.area!);
  const options: SteadyInputs['options'] = {};
  if (s.targetField !== undefined) options.targetField_Apm = s.targetField;
  if (s.maxTemperature !== undefined) options.maxTemperature_C = s.maxTemperature;
  return {
    supply: { voltage_V: s.supply.voltage ?? Infinity, currentLimit_A: s.supply.currentLimit ?? Infinity, seriesResistance_Ohm: s.supply.seriesResistance },
    cooling: { ambient_C: s.cooling.ambient, thermalResistance_KpW },
    options,
  };
}
