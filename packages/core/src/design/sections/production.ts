/**
 * Design section `production`: how fast the station fires and how the winding cools, and the
 * winding's insulation class. Feeds the verdict only (analysis/verdict-heating.ts).
 *
 * ```yaml
 * production:
 *   shotsPerMinute: 4
 *   ambient: 30 degC
 *   thermalTimeConstant: 20 min       # or surfaceArea + convection: τ = C_th/(h·A)
 *   insulationClass: F                # IEC 60085: Y A E B F H N R, or 90 ... 250
 *   margin: 10 K
 * ```
 */
import { z } from 'zod';
import type { ProductionJudgeInput } from '../../model/judge-inputs.js';
import { VERDICT_DEFAULTS } from '../../model/judge-inputs.js';
import { INSULATION_CLASSES, insulationClassNames } from '../../materials/insulation-classes.js';
import { num, qty, section, type IssueFacts } from '../quantity-schema.js';

const CLASS_NAMES = insulationClassNames() as [string, ...string[]];

/** The class as a number (155) or a letter ("F"); numbers are read as their text. */
const classField = z
  .preprocess((v) => (typeof v === 'number' ? String(v) : typeof v === 'string' ? v.trim().toUpperCase() : v), z.enum(CLASS_NAMES))
  .meta({
    type: ['string', 'number'],
    enum: [...INSULATION_CLASSES.map((c) => c.temperature_C), ...CLASS_NAMES],
    description: `IEC 60085 thermal class of the winding insulation: ${CLASS_NAMES.join(', ')}`,
  } as Record<string, unknown>);

export const productionSection = section('Production rate, cooling between shots and the insulation class of the winding. Used by the verdict only.', {
  shotsPerMinute: num({ positive: true, description: 'Shots per minute (a plain number); leave out to check one shot only' }).optional(),
  ambient: qty('temperature', { description: 'Ambient temperature the winding cools to' }).default(VERDICT_DEFAULTS.ambient_C),
  thermalTimeConstant: qty('time', { positive: true, description: 'Thermal time constant of the winding (measured); else estimated from surfaceArea and convection' }).optional(),
  surfaceArea: qty('area', { positive: true, description: 'Cooling surface of the winding' }).optional(),
  convection: qty('heatTransferCoefficient', { positive: true, description: 'Convection coefficient h at that surface' }).optional(),
  insulationClass: classField.optional(),
  margin: qty('temperatureDifference', { nonNegative: true, description: 'Headroom wanted below the class temperature' }).default(VERDICT_DEFAULTS.temperatureMargin_K),
  resistanceRise: z.boolean().meta({ description: 'Let the per-shot rise grow with the starting temperature through R(T)' }).default(VERDICT_DEFAULTS.resistanceRise),
}).superRefine((p, ctx) => {
  const add = (path: string, facts: IssueFacts) =>
    ctx.addIssue({ code: 'custom', path: [path], message: `${facts.problem}; expected ${facts.expected}`, params: { fluxkick: facts } });
  if (p.shotsPerMinute !== undefined && p.thermalTimeConstant === undefined && (p.surfaceArea === undefined) !== (p.convection === undefined)) {
    add(p.surfaceArea === undefined ? 'surfaceArea' : 'convection', {
      code: 'design.missing-field',
      problem: 'missing: the cooling estimate τ = C_th/(h·A) needs both surfaceArea and convection',
      expected: p.surfaceArea === undefined ? 'a surfaceArea, e.g. 0.05 m^2 (or give thermalTimeConstant)' : 'a convection coefficient, e.g. 10 W/(m^2 K) (or give thermalTimeConstant)',
    });
  }
  if (p.shotsPerMinute !== undefined && p.thermalTimeConstant === undefined && p.surfaceArea === undefined && p.convection === undefined) {
    add('thermalTimeConstant', {
      code: 'design.missing-field',
      problem: 'missing: a production rate needs the cooling between shots',
      expected: 'a thermalTimeConstant (e.g. 20 min), or surfaceArea and convection',
    });
  }
});

export type ProductionDesign = z.output<typeof productionSection>;

/** The verdict's production inputs from the parsed section. */
export function productionToJudge(p: ProductionDesign): ProductionJudgeInput {
  const out: ProductionJudgeInput = { ambient_C: p.ambient, margin_K: p.margin, resistanceRise: p.resistanceRise };
  if (p.shotsPerMinute !== undefined) out.shotsPerMinute = p.shotsPerMinute;
  if (p.thermalTimeConstant !== undefined) out.thermalTimeConstant_s = p.thermalTimeConstant;
  if (p.surfaceArea !== undefined) out.surfaceArea_m2 = p.surfaceArea;
  if (p.convection !== undefined) out.convection_WpM2K = p.convection;
  if (p.insulationClass !== undefined) out.insulationClass = p.insulationClass;
  return out;
}
