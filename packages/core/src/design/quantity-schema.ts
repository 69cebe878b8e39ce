/**
 * zod builders for design-file fields. Every physical field accepts a number (SI; °C for
 * temperatures) or a string with units, and outputs an SI number; a bad value becomes a
 * zod issue carrying the facts of an `InputError` (code, problem, expected, suggestion),
 * which `parseWithSchema` (design/issues.ts) turns into one clear message.
 *
 * Use these to define a design section in design/sections/<name>.ts:
 *
 * ```ts
 * import { z } from 'zod';
 * import { qty, num, count, choice, text, section } from '../quantity-schema.js';
 *
 * export const ratingsSection = section('Ratings of the switch and the bank.', {
 *   surgeCurrent: qty('current', { positive: true, description: 'Thyristor I_TSM (10 ms half-sine)' }),
 *   fusingIntegral: qty('i2t', { positive: true }).optional(),
 *   insulationClass: choice(['B', 'F', 'H'], 'IEC 60085 thermal class').default('F'),
 *   maxTemperature: qty('temperature').default(155),          // defaults are SI (°C for temperatures)
 *   margin: num({ min: 0, max: 1, description: 'required margin' }).default(0.2), // "20 %" also accepted
 *   shotsPerMinute: qty('frequency', { positive: true }).optional(),  // "6 /min" -> 0.1 (1/s)
 *   units: count({ min: 1 }).default(1),
 *   label: text('free text').optional(),
 * });
 * export type RatingsDesign = z.output<typeof ratingsSection>;
 * ```
 *
 * Values users may write: `capacitance: 2200 uF`, `capacitance: 0.0022`, `voltage: "1.6 kV"`,
 * `initialTemperature: 40 degC` (or 313.15 K, 104 degF), `fieldPerAmpere: 95 A/m/A`,
 * `specificHeat: 385 J/(kg K)`, `margin: 20 %`.
 *
 * Defaults (`.default(x)`) take the OUTPUT value (SI). They appear in `fluxkick schema` and
 * in docs/design-file.md, both generated from the schema: define each default once, here.
 */
import { z } from 'zod';
import { DIMENSIONS, describeDimension, tryParseQuantity, type Dimension, type DimensionInfo, type QuantityErrorCode } from '../units/quantity.js';
import { showValue, type InputErrorCode } from './errors.js';

/** Facts carried in a zod custom issue's `params.fluxkick`. */
export interface IssueFacts {
  code: InputErrorCode;
  problem: string;
  expected: string;
  suggestion?: string;
}

export interface RangeOptions {
  /** Must be > 0. */
  positive?: boolean;
  /** Must be >= 0. */
  nonNegative?: boolean;
  /** Inclusive lower bound (SI). */
  min?: number;
  /** Inclusive upper bound (SI). */
  max?: number;
  /** One sentence for the documentation and the JSON Schema. */
  description?: string;
}

export interface QtyOptions extends RangeOptions {}

export interface NumOptions extends RangeOptions {
  integer?: boolean;
}

/** What a quantity field holds, for documentation and `fluxkick check` printing. */
export interface QuantityFieldInfo {
  dimension: Dimension;
  /** SI output unit, e.g. "F", "°C". */
  unit: string;
  range: RangeOptions & { integer?: boolean };
  description?: string;
}

const FIELD_INFO = new WeakMap<object, QuantityFieldInfo>();

function rangeText(o: RangeOptions & { integer?: boolean }, unit: string): string {
  const u = unit ? ` ${unit}` : '';
  const parts: string[] = [];
  if (o.integer) parts.push('a whole number');
  if (o.positive) parts.push('greater than 0');
  else if (o.nonNegative) parts.push('0 or more');
  if (o.min !== undefined) parts.push(`at least ${o.min}${u}`);
  if (o.max !== undefined) parts.push(`at most ${o.max}${u}`);
  return parts.join(', ');
}

/** Why a value fails the range, or null when it is inside. */
function rangeProblem(v: number, o: RangeOptions & { integer?: boolean }): string | null {
  if (o.integer && !Number.isInteger(v)) return 'is not a whole number';
  if (o.positive && !(v > 0)) return v === 0 ? 'is zero' : 'is negative';
  if (o.nonNegative && v < 0) return 'is negative';
  if (o.min !== undefined && v < o.min) return `is below ${o.min}`;
  if (o.max !== undefined && v > o.max) return `is above ${o.max}`;
  return null;
}

function addFacts(ctx: z.RefinementCtx, facts: IssueFacts): void {
  ctx.addIssue({ code: 'custom', message: `${facts.problem}; expected ${facts.expected}`, params: { fluxkick: facts } });
}

function jsonDescription(info: DimensionInfo, dimension: Dimension, o: RangeOptions & { integer?: boolean }): string {
  const head = o.description ? `${o.description.replace(/\.$/, '')}. ` : '';
  const what =
    dimension === 'dimensionless'
      ? 'A plain number (a percentage such as "20 %" is accepted)'
      : dimension === 'temperature'
        ? `A temperature: a number in °C or a string with units, e.g. "${info.example}" (K and degF accepted)`
        : `${cap(info.label)}: a number in ${info.unit} or a string with units, e.g. "${info.example}"`;
  const range = rangeText(o, info.unit);
  return `${head}${what}${range ? `; ${range}` : ''}.`;
}

function cap(s: string): string {
  return s.charAt(0).toUpperCase() + s.slice(1);
}

function build(dimension: Dimension, o: RangeOptions & { integer?: boolean }) {
  const info: DimensionInfo = DIMENSIONS[dimension];
  const range = rangeText(o, info.unit);
  const expected = describeDimension(dimension).replace(/, e\.g\./, range ? ` ${range}, e.g.` : ', e.g.');
  const transform = z.transform((input: unknown, ctx) => {
    if (input === undefined) {
      addFacts(ctx, { code: 'design.missing-field', problem: 'missing', expected });
      return z.NEVER;
    }
    const r = tryParseQuantity(input, dimension);
    if (!r.ok) {
      const facts: IssueFacts = { code: r.code as QuantityErrorCode, problem: r.reason, expected };
      if (r.suggestion !== undefined) facts.suggestion = r.suggestion;
      addFacts(ctx, facts);
      return z.NEVER;
    }
    const bad = rangeProblem(r.value, o);
    if (bad) {
      addFacts(ctx, { code: 'design.out-of-range', problem: `${showValue(input)} ${bad}`, expected });
      return z.NEVER;
    }
    return r.value;
  });
  const fieldInfo: QuantityFieldInfo = { dimension, unit: info.unit, range: { ...o } };
  if (o.description !== undefined) fieldInfo.description = o.description;
  FIELD_INFO.set(transform, fieldInfo);
  return z
    .unknown()
    .pipe(transform)
    .meta({
      type: o.integer ? ['integer', 'string'] : ['number', 'string'],
      description: jsonDescription(info, dimension, o),
      'x-unit': info.unit || undefined,
      'x-dimension': dimension,
    } as Record<string, unknown>);
}

/**
 * A physical quantity of the given dimension: number (SI) or string with units -> SI number
 * (temperatures -> °C).
 *
 * @example qty('capacitance', { positive: true })   // "2200 uF" -> 0.0022
 * @example qty('temperature').default(20)            // "40 degC" -> 40; missing -> 20
 * @example qty('inductance')                         // mutual inductance, may be negative
 */
export function qty(dimension: Dimension, options: QtyOptions = {}) {
  return build(dimension, options);
}

/** A dimensionless number; accepts "20 %" (-> 0.2). @example num({ min: 0, max: 1 }).default(0.2) */
export function num(options: NumOptions = {}) {
  return build('dimensionless', options);
}

/** A whole number >= 0 (or >= min). @example count({ min: 1 }).default(1) */
export function count(options: Omit<NumOptions, 'integer'> = {}) {
  return build('dimensionless', { ...(options.min === undefined ? { nonNegative: true } : {}), ...options, integer: true });
}

/** One of a fixed list of words. @example choice(['copper', 'aluminium'], 'conductor material').default('copper') */
export function choice<const T extends readonly [string, ...string[]]>(values: T, description?: string) {
  const e = z.enum(values);
  return description ? e.meta({ description }) : e;
}

/** Free text (a name, a note). Must not be empty. */
export function text(description?: string) {
  const s = z.string().trim().min(1);
  return description ? s.meta({ description }) : s;
}

/** A design section: a strict object (unknown fields are errors, with the nearest known name suggested). */
export function section<const S extends z.ZodRawShape>(description: string, shape: S) {
  return z.strictObject(shape).meta({ description });
}

/** Unwrap optional/default/nullable/etc. wrappers down to the schema that holds the value. */
export function unwrapSchema(schema: unknown): unknown {
  let s = schema as { _zod?: { def: Record<string, unknown> } } | undefined;
  for (let i = 0; i < 20 && s?._zod; i++) {
    const def = s._zod.def as { type: string; innerType?: unknown; in?: unknown };
    if (def.innerType && ['optional', 'default', 'prefault', 'nullable', 'readonly', 'catch', 'nonoptional'].includes(def.type)) {
      s = def.innerType as typeof s;
      continue;
    }
    break;
  }
  return s;
}

/** The quantity facts of a field built with qty/num/count (through optional/default wrappers), else undefined. */
export function quantityInfo(schema: unknown): QuantityFieldInfo | undefined {
  const s = unwrapSchema(schema) as { _zod?: { def: { type: string; out?: object } } } | undefined;
  if (s?._zod?.def.type === 'pipe' && s._zod.def.out) return FIELD_INFO.get(s._zod.def.out);
  return undefined;
}

/** The default value of a field (SI), when it has one. */
export function defaultOf(schema: unknown): { value: unknown } | undefined {
  let s = schema as { _zod?: { def: { type: string; innerType?: unknown; defaultValue?: unknown } } } | undefined;
  for (let i = 0; i < 20 && s?._zod; i++) {
    const def = s._zod.def;
    if (def.type === 'default' || def.type === 'prefault') return { value: def.defaultValue };
    if (!def.innerType) return undefined;
    s = def.innerType as typeof s;
  }
  return undefined;
}
