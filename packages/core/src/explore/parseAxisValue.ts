/**
 * One value written on the command line for a design field: a plain number (the design
 * file's own convention: SI, temperatures in °C), a number with units ("2.2 mF", "1.5kV",
 * "40 degC", parsed by units/quantity.ts and checked against the field's dimension), or a
 * number with a bare SI prefix ("2.2m", "1.5k", "10u") meaning that multiple of the field's
 * own unit.
 *
 * A bare prefix letter that is also a unit of the field's dimension is the unit: for a
 * length, "2m" is 2 metres; for a capacitance, "2m" is 2 mF. Prefixes: p n u µ m k M G
 * (BIPM SI Brochure, 9th ed., Table 7).
 */
import { tryParseQuantity, describeDimension, type Dimension } from '../units/quantity.js';

const PREFIXES: Record<string, number> = { p: 1e-12, n: 1e-9, u: 1e-6, µ: 1e-6, μ: 1e-6, m: 1e-3, k: 1e3, M: 1e6, G: 1e9 };
const PREFIXED_RE = /^([+-]?(?:\d+\.?\d*|\.\d+)(?:[eE][+-]?\d+)?)\s*([pnuµμmkMG])$/;

export type AxisValueParse = { ok: true; value: number } | { ok: false; reason: string; expected: string; suggestion?: string };

/** Round away float noise from prefix arithmetic (15 significant digits, as units/quantity.ts does). */
function clean(x: number): number {
  return x === 0 ? 0 : Number(x.toPrecision(15));
}

/**
 * Parse one value for a field of the given dimension (undefined: the field's dimension is not
 * known, so only plain and prefixed numbers are accepted). Never throws.
 */
export function parseAxisValue(token: string, dimension: Dimension | undefined): AxisValueParse {
  const text = token.trim();
  const expected = dimension ? describeDimension(dimension) : 'a plain number in the field’s SI unit, e.g. 0.0022 or 2.2m';
  if (text === '') return { ok: false, reason: 'an empty value', expected };
  if (dimension !== undefined) {
    const q = tryParseQuantity(text, dimension);
    if (q.ok) return { ok: true, value: q.value };
    const prefixed = PREFIXED_RE.exec(text);
    if (prefixed) return { ok: true, value: clean(Number(prefixed[1]) * PREFIXES[prefixed[2]!]!) };
    return q.suggestion !== undefined ? { ok: false, reason: q.reason, expected: q.expected, suggestion: q.suggestion } : { ok: false, reason: q.reason, expected: q.expected };
  }
  const plain = tryParseQuantity(text, 'dimensionless');
  if (plain.ok && !text.endsWith('%')) return { ok: true, value: plain.value };
  const prefixed = PREFIXED_RE.exec(text);
  if (prefixed) return { ok: true, value: clean(Number(prefixed[1]) * PREFIXES[prefixed[2]!]!) };
  return { ok: false, reason: `"${text}" has a unit, but the field's dimension is not known`, expected };
}
