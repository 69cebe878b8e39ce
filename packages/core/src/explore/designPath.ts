/**
 * Dotted paths into a plain design object (as read from a YAML or JSON design file):
 * `bank.capacitance`, `coil.geometry.turns`, `coupled[1].resistance` or `coupled.1.resistance`.
 *
 * `readDesignPath` finds the field and says clearly when it is not there (with the nearest
 * field name as a suggestion); `withDesignValues` returns a copy of the design with new
 * values at given paths, copying only the objects along each path (the rest is shared, so a
 * copy per sweep point is cheap). Neither mutates its input.
 */
import { distance } from 'fastest-levenshtein';
import { InputError, pathToString } from '../design/errors.js';

export type PathSegment = string | number;

/** A parsed path: its segments and its canonical spelling (`coupled[1].resistance`). */
export interface DesignPath {
  segments: PathSegment[];
  text: string;
}

/** Where a path came from, for error messages: the option name and the whole option value. */
export interface OptionSource {
  option: string;
  value: string;
  expected: string;
}

const SEGMENT_RE = /^[A-Za-z_][A-Za-z0-9_-]*$/;

function optionError(source: OptionSource, problem: string, suggestion?: string): InputError {
  return new InputError({
    code: 'option.invalid',
    path: source.option,
    value: source.value,
    expected: source.expected,
    problem: `${JSON.stringify(source.value)}: ${problem}`,
    ...(suggestion !== undefined ? { suggestion } : {}),
  });
}

/**
 * Parse `bank.capacitance`, `coupled[1].resistance` or `coupled.1.resistance` into segments.
 * Returns null when the text is not a path.
 */
export function parseDesignPath(text: string): DesignPath | null {
  const trimmed = text.trim();
  if (trimmed === '') return null;
  const segments: PathSegment[] = [];
  for (const raw of trimmed.replace(/\[(\d+)\]/g, '.$1').split('.')) {
    if (/^\d+$/.test(raw)) segments.push(Number(raw));
    else if (SEGMENT_RE.test(raw)) segments.push(raw);
    else return null;
  }
  return { segments, text: pathToString(segments) };
}

function describeKind(v: unknown): string {
  if (v === null) return 'null';
  if (Array.isArray(v)) return 'a list';
  return typeof v === 'object' ? 'a section' : typeof v;
}

/**
 * The value at a path of the design, checked to be a number or a quantity string.
 * Throws InputError (code `option.invalid`, naming the option and its value) when the path
 * does not exist, with the nearest existing field as a suggestion.
 */
export function readDesignPath(
  design: unknown,
  pathText: string,
  source: OptionSource,
  /** When given and true for the path, a missing last field is accepted (value undefined): e.g. an optional field the schema knows. */
  mayBeAbsent?: (path: DesignPath) => boolean,
): { path: DesignPath; value: number | string | undefined } {
  const path = parseDesignPath(pathText);
  if (!path) throw optionError(source, `"${pathText}" is not a dotted path`);
  let node: unknown = design;
  const walked: PathSegment[] = [];
  for (const seg of path.segments) {
    if (typeof seg === 'number') {
      if (!Array.isArray(node)) {
        throw optionError(source, `${pathToString(walked) || 'the design'} is ${describeKind(node)}, not a list, so [${seg}] does not apply`);
      }
      if (seg >= node.length) {
        throw optionError(source, `${pathToString(walked)} has ${node.length} entr${node.length === 1 ? 'y' : 'ies'}, so [${seg}] is not there`);
      }
      node = node[seg];
    } else {
      if (node === null || typeof node !== 'object' || Array.isArray(node)) {
        throw optionError(source, `${pathToString(walked) || 'the design'} is ${describeKind(node)}, so it has no field "${seg}"`);
      }
      const record = node as Record<string, unknown>;
      if (!Object.prototype.hasOwnProperty.call(record, seg) || record[seg] === undefined) {
        if (walked.length === path.segments.length - 1 && mayBeAbsent?.(path)) return { path, value: undefined };
        const keys = Object.keys(record);
        const nearest = keys.map((k) => ({ k, d: distance(k.toLowerCase(), seg.toLowerCase()) })).sort((a, b) => a.d - b.d)[0];
        const here = pathToString(walked);
        const stem = seg.toLowerCase().slice(0, 4);
        const close = nearest && (nearest.d <= Math.max(2, Math.floor(seg.length / 3)) || (stem.length >= 3 && nearest.k.toLowerCase().startsWith(stem)));
        const suggestion = close ? pathToString([...walked, nearest.k]) : undefined;
        const listing = keys.length > 0 ? ` (it has ${keys.join(', ')})` : '';
        throw optionError(source, `${here ? `${here} in the design` : 'the design'} has no field "${seg}"${listing}`, suggestion);
      }
      node = record[seg];
    }
    walked.push(seg);
  }
  if (typeof node !== 'number' && typeof node !== 'string') {
    throw optionError(source, `${path.text} is ${describeKind(node)}, not a number or a quantity`);
  }
  return { path, value: node };
}

/**
 * A copy of the design with `value` written at each path. Objects along each path are copied,
 * everything else is shared with the input (which is not modified). Paths must exist
 * (check them with `readDesignPath` first).
 */
export function withDesignValues<T>(design: T, assignments: readonly { path: DesignPath; value: unknown }[]): T {
  let out: unknown = design;
  for (const { path, value } of assignments) out = setAt(out, path.segments, 0, value);
  return out as T;
}

function setAt(node: unknown, segments: readonly PathSegment[], i: number, value: unknown): unknown {
  if (i === segments.length) return value;
  const seg = segments[i]!;
  if (Array.isArray(node)) {
    const copy = node.slice();
    copy[seg as number] = setAt(node[seg as number], segments, i + 1, value);
    return copy;
  }
  const record = (node ?? {}) as Record<string, unknown>;
  return { ...record, [seg]: setAt(record[seg as string], segments, i + 1, value) };
}
