/**
 * Resolve a field named on the command line (`--vary`, `--tolerance`) against a parsed design:
 * the path must be a numeric field of the design schema (design/schema.ts); its dimension
 * comes from the schema, its current value from the design (absent for an optional field not
 * set in the file). Errors are InputErrors naming the option and its value.
 */
import { InputError } from '../design/errors.js';
import type { Dimension } from '../units/quantity.js';
import { readDesignPath, type DesignPath, type OptionSource } from './designPath.js';
import { designFieldInfo, type DesignFieldInfo } from './designField.js';

export interface ResolvedField {
  path: DesignPath;
  dimension: Dimension;
  /** A whole-number field (turns, layers, units): values are rounded to integers. */
  integer: boolean;
  /** The design's value (SI, °C for temperatures); undefined when the optional field is not set. */
  current: number | undefined;
}

/**
 * Short names for the fields a designer varies every day (the bank's), so that
 * `--vary capacitance=1m:5m:9 --vary voltage=1k:3k:9` works as written in the design brief.
 * Any other field takes its full dotted path.
 */
export const SHORT_FIELD_NAMES: Readonly<Record<string, string>> = {
  capacitance: 'bank.capacitance',
  voltage: 'bank.voltage',
  esr: 'bank.esr',
  esl: 'bank.esl',
};

export function resolveField(
  design: unknown,
  pathText: string,
  source: OptionSource,
  fieldInfo: (segments: readonly (string | number)[]) => DesignFieldInfo = designFieldInfo,
): ResolvedField {
  const { path, value } = readDesignPath(design, SHORT_FIELD_NAMES[pathText.trim()] ?? pathText, source, (p) => fieldInfo(p.segments).known);
  const info = fieldInfo(path.segments);
  const fail = (problem: string) => new InputError({ code: 'option.invalid', path: source.option, value: source.value, expected: source.expected, problem: `${JSON.stringify(source.value)}: ${problem}` });
  if (!info.known) throw fail(`${path.text} is in the design file but not a field of the design schema`);
  if (!info.quantity) throw fail(`${path.text} is not a numeric field (it holds ${JSON.stringify(value)})`);
  if (value !== undefined && typeof value !== 'number') throw fail(`${path.text} holds ${JSON.stringify(value)}, not a number`);
  return { path, dimension: info.dimension, integer: info.integer, current: value };
}
