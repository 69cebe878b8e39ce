/**
 * The `--vary` option of a sweep: which design field to vary and over which values.
 *
 *   PATH=start:stop:count          linear spacing, both ends included (also `lin:start:stop:count`)
 *   PATH=log:start:stop:count      logarithmic (geometric) spacing, both ends included, ends > 0
 *   PATH=v1,v2,v3                  an explicit list, in the order given
 *
 * PATH is a dotted path into the design file (`bank.capacitance`, `coupled[0].resistance`), or one of
 * the short names of explore/resolveField.ts SHORT_FIELD_NAMES (`capacitance`, `voltage`, `esr`, `esl`).
 * Values take units ("1.5 kV", "2.2mF"), bare SI prefixes ("1.5k", "2.2m") or plain numbers in
 * the design file's convention (SI, temperatures in °C); units are checked against the
 * field's dimension in the design schema.
 *
 * Spacing: linear x_i = a + (b − a)·i/(n − 1); logarithmic x_i = a·(b/a)^(i/(n − 1)),
 * i = 0 … n − 1, with x_0 = a and x_(n−1) = b exactly. Whole-number fields (turns, layers,
 * units) take the spaced values rounded to integers, repeats dropped.
 */
import { InputError } from '../design/errors.js';
import type { Dimension } from '../units/quantity.js';
import type { DesignPath, OptionSource } from './designPath.js';
import type { DesignFieldInfo } from './designField.js';
import { parseAxisValue } from './parseAxisValue.js';
import { resolveField } from './resolveField.js';

export type Spacing = 'linear' | 'log' | 'list';

/** The syntax of one --vary value, before the design is consulted. */
export interface VarySpec {
  /** The option value as the user wrote it. */
  text: string;
  pathText: string;
  spacing: Spacing;
  /** linear/log: [start, stop]; list: the values. Still text. */
  tokens: string[];
  /** linear/log: number of points. */
  count?: number;
}

/** One resolved sweep axis: a design path and its values (the design file's numbers: SI, °C for temperatures). */
export interface SweepAxis {
  path: DesignPath;
  spacing: Spacing;
  values: number[];
  dimension: Dimension;
  /** The option value as the user wrote it. */
  spec: string;
}

export const VARY_EXPECTED = 'PATH=start:stop:count, PATH=log:start:stop:count or PATH=v1,v2,…, e.g. bank.capacitance=1m:5m:9 or bank.voltage=1k,1.5k,2k';
/** Most points on one axis. */
export const MAX_AXIS_POINTS = 10_000;

function varyError(text: string, problem: string, suggestion?: string): InputError {
  return new InputError({
    code: 'option.invalid',
    path: '--vary',
    value: text,
    expected: VARY_EXPECTED,
    problem: `${JSON.stringify(text)}: ${problem}`,
    ...(suggestion !== undefined ? { suggestion } : {}),
  });
}

/** Parse the syntax of one --vary value. Throws InputError (code `option.invalid`, path `--vary`). */
export function parseVarySpec(text: string): VarySpec {
  const eq = text.indexOf('=');
  if (eq < 0) throw varyError(text, 'there is no "=" between the field path and the values');
  const pathText = text.slice(0, eq).trim();
  const rest = text.slice(eq + 1).trim();
  if (pathText === '') throw varyError(text, 'the field path before "=" is empty');
  if (rest === '') throw varyError(text, 'there are no values after "="');
  if (rest.includes(':')) {
    const parts = rest.split(':').map((p) => p.trim());
    let spacing: Spacing = 'linear';
    if (parts[0] === 'log' || parts[0] === 'lin') {
      spacing = parts[0] === 'log' ? 'log' : 'linear';
      parts.shift();
    }
    if (parts.length !== 3) throw varyError(text, `a range needs start:stop:count, got ${parts.length} part${parts.length === 1 ? '' : 's'}`);
    const [start, stop, countText] = parts as [string, string, string];
    if (!/^\d+$/.test(countText)) throw varyError(text, `the count "${countText}" is not a whole number`);
    const count = Number(countText);
    if (count < 1 || count > MAX_AXIS_POINTS) throw varyError(text, `the count ${count} is outside 1…${MAX_AXIS_POINTS}`);
    if (start === '' || stop === '') throw varyError(text, 'the start or stop of the range is empty');
    return { text, pathText, spacing, tokens: [start, stop], count };
  }
  const tokens = rest.split(',').map((t) => t.trim());
  if (tokens.some((t) => t === '')) throw varyError(text, 'the list has an empty entry');
  if (tokens.length > MAX_AXIS_POINTS) throw varyError(text, `the list has more than ${MAX_AXIS_POINTS} values`);
  return { text, pathText, spacing: 'list', tokens };
}

/** Evenly spaced values a…b (both included), cleaned to 15 significant digits. */
export function linearValues(a: number, b: number, count: number): number[] {
  if (count === 1) return [a];
  return Array.from({ length: count }, (_, i) => (i === 0 ? a : i === count - 1 ? b : clean(a + ((b - a) * i) / (count - 1))));
}

/** Geometrically spaced values a…b (both included, a, b > 0), cleaned to 15 significant digits. */
export function logValues(a: number, b: number, count: number): number[] {
  if (count === 1) return [a];
  const la = Math.log(a);
  const lb = Math.log(b);
  return Array.from({ length: count }, (_, i) => (i === 0 ? a : i === count - 1 ? b : clean(Math.exp(la + ((lb - la) * i) / (count - 1)))));
}

function clean(x: number): number {
  return x === 0 ? 0 : Number(x.toPrecision(15));
}

/**
 * Resolve a --vary spec against a parsed design (design/parse.ts): the path must be a numeric
 * field of the design schema; values are parsed with the field's dimension. Throws InputError
 * naming `--vary` and the value.
 */
export function resolveVaryAxis(spec: VarySpec, design: unknown, fieldInfo?: (segments: readonly (string | number)[]) => DesignFieldInfo): SweepAxis {
  const source: OptionSource = { option: '--vary', value: spec.text, expected: VARY_EXPECTED };
  const { path, dimension, integer } = resolveField(design, spec.pathText, source, fieldInfo);
  const parsed = spec.tokens.map((token) => {
    const r = parseAxisValue(token, dimension);
    if (!r.ok) {
      throw new InputError({
        code: 'option.invalid',
        path: '--vary',
        value: spec.text,
        expected: `${r.expected} for ${path.text}`,
        problem: `${JSON.stringify(spec.text)}: ${r.reason} (value "${token}" for ${path.text})`,
        ...(r.suggestion !== undefined ? { suggestion: spec.text.replace(token, r.suggestion) } : {}),
      });
    }
    return r.value;
  });
  let values: number[];
  if (spec.spacing === 'list') {
    const fraction = integer ? parsed.find((v) => !Number.isInteger(v)) : undefined;
    if (fraction !== undefined) throw varyError(spec.text, `${path.text} takes whole numbers, got ${fraction}`);
    values = parsed;
  }
  else {
    const [a, b] = parsed as [number, number];
    const count = spec.count ?? 2;
    if (count > 1 && a === b) throw varyError(spec.text, `start and stop are equal (${a}) but the count is ${count}`);
    if (spec.spacing === 'log') {
      if (!(a > 0 && b > 0)) throw varyError(spec.text, `logarithmic spacing needs start and stop above zero, got ${a} and ${b}`);
      values = logValues(a, b, count);
    } else values = linearValues(a, b, count);
  }
  // A whole-number field (turns, layers): round the spaced values and drop repeats.
  if (integer) values = [...new Set(values.map((v) => Math.round(v)))];
  return { path, spacing: spec.spacing, values, dimension, spec: spec.text };
}
