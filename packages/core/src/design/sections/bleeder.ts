/**
 * Design section `bleeder`: the resistor that discharges the bank after use. Feeds the verdict
 * only (analysis/verdict-bleeder.ts): times to 50 V and to a threshold, the guidance of common
 * requirements (never a compliance statement), the resistor's power.
 *
 * ```yaml
 * bleeder: { resistance: 10 kohm, threshold: 30 V, maxTime: 2 min }
 * ```
 */
import type { z } from 'zod';
import type { BleederJudgeInput } from '../../model/judge-inputs.js';
import { VERDICT_DEFAULTS } from '../../model/judge-inputs.js';
import { qty, section } from '../quantity-schema.js';

export const bleederSection = section('Bleeder resistor across the bank. Used by the verdict only.', {
  resistance: qty('resistance', { positive: true, description: 'Bleeder resistance across the bank' }),
  threshold: qty('voltage', { positive: true, description: 'Residual voltage of interest' }).default(VERDICT_DEFAULTS.bleederThreshold_V),
  maxTime: qty('time', { positive: true, description: 'Time within which the bank must reach the threshold (your requirement; judged when given)' }).optional(),
});

export type BleederDesign = z.output<typeof bleederSection>;

/** The verdict's bleeder inputs from the parsed section. */
export function bleederToJudge(b: BleederDesign): BleederJudgeInput {
  const out: BleederJudgeInput = { resistance_Ohm: b.resistance, threshold_V: b.threshold };
  if (b.maxTime !== undefined) out.maxTime_s = b.maxTime;
  return out;
}
