/**
 * Grading rules shared by every verdict item (model/verdict.ts).
 *
 * Every judged item has a HARD limit (beyond it: `fail`) and a REQUIRED margin set by the
 * user (inside the limit but with less headroom than required: `warn`; otherwise `pass`).
 * The margin is a fraction, positive inside the limit:
 *   - "at most" items (currents, I²t, di/dt, voltages, stress):  margin = 1 − value/limit
 *   - "at least" items (field at the part):                     margin = value/limit − 1
 *   - temperatures:  margin = (limit − value)/(limit − start), the share of the allowed rise left unused
 * A value that could not be computed (NaN) is never guessed: the item becomes `warn` with a note.
 */
import type { Verdict, VerdictItem, VerdictStatus } from '../model/verdict.js';

/**
 * Rounding allowance when comparing margins: a value exactly at a user's margin (1600 V on a
 * 2000 V rating with 20 % wanted gives 0.19999999999999996) counts as meeting it.
 */
export const MARGIN_TOLERANCE = 1e-12;

/** Status from a computed margin and the required one: fail < 0 ≤ warn < required ≤ pass (to MARGIN_TOLERANCE). */
export function statusFromMargin(margin: number, requiredMargin: number): VerdictStatus {
  if (Number.isNaN(margin)) return 'warn';
  if (margin < -MARGIN_TOLERANCE) return 'fail';
  if (margin < requiredMargin - MARGIN_TOLERANCE) return 'warn';
  return 'pass';
}

/** Margin of an "at most" item: 1 − value/limit (NaN when the limit is not positive or the value is not finite). */
export function marginAtMost(value: number, limit: number): number {
  if (!Number.isFinite(value) || !(limit > 0)) return Number.NaN;
  return 1 - value / limit;
}

/** Margin of an "at least" item: value/limit − 1. */
export function marginAtLeast(value: number, limit: number): number {
  if (!Number.isFinite(value) || !(limit > 0)) return Number.NaN;
  return value / limit - 1;
}

/** Margin of a temperature: (limit − value)/(limit − start); NaN when the limit does not exceed the start. */
export function marginTemperature(value_C: number, limit_C: number, start_C: number): number {
  if (!Number.isFinite(value_C) || !(limit_C > start_C)) return Number.NaN;
  return (limit_C - value_C) / (limit_C - start_C);
}

/** Build a judged item; a non-finite value becomes `warn` with "not computed" in the note. */
export function judgedItem(
  fields: Omit<VerdictItem, 'status'>,
  requiredMargin: number,
): VerdictItem {
  if (!Number.isFinite(fields.value)) {
    return { ...fields, status: 'warn', note: `Not computed (value unavailable); ${fields.note}` };
  }
  return { ...fields, status: statusFromMargin(fields.margin, requiredMargin) };
}

/** An informative item: no limit, no margin. */
export function infoItem(id: string, item: string, value: number, unit: string, note: string, limit = Number.NaN): VerdictItem {
  return { id, item, value, limit, unit, margin: Number.NaN, status: 'info', note };
}

/** Worst status over the items; `info` items do not count; an empty list passes. */
export function overallStatus(items: readonly VerdictItem[]): Verdict['overall'] {
  let worst: Verdict['overall'] = 'pass';
  for (const it of items) {
    if (it.status === 'fail') return 'fail';
    if (it.status === 'warn') worst = 'warn';
  }
  return worst;
}
