/**
 * From zod issues to one `InputError`: every issue gets a code of ours, the dotted path,
 * the value received, what was expected, and (for typos) the nearest known name.
 * Never lets a zod message or stack reach the user.
 */
import { closest, distance } from 'fastest-levenshtein';
import type { z } from 'zod';
import { describeDimension } from '../units/quantity.js';
import { InputError, joinPath, pathToString, showValue, type InputIssue } from './errors.js';
import { quantityInfo, unwrapSchema, type IssueFacts } from './quantity-schema.js';

type AnyDef = {
  type: string;
  shape?: Record<string, unknown>;
  element?: unknown;
  valueType?: unknown;
  options?: unknown[];
  innerType?: unknown;
  in?: unknown;
  entries?: Record<string, string>;
};

function defOf(schema: unknown): AnyDef | undefined {
  return (unwrapSchema(schema) as { _zod?: { def: AnyDef } } | undefined)?._zod?.def;
}

/** Follow pipes to their input side (the form the user writes), and wrappers to their inner type. */
function inputSide(schema: unknown): unknown {
  let s = unwrapSchema(schema);
  for (let i = 0; i < 20; i++) {
    const def = defOf(s);
    if (def?.type === 'pipe' && !quantityInfo(s) && def.in) {
      s = unwrapSchema(def.in);
      continue;
    }
    break;
  }
  return s;
}

/** Known field names of an object schema (for unions: of every object option). */
export function knownKeys(schema: unknown): string[] {
  const s = inputSide(schema);
  const def = defOf(s);
  if (!def) return [];
  if (def.type === 'object' && def.shape) return Object.keys(def.shape);
  if (def.type === 'union' && def.options) return [...new Set(def.options.flatMap((o) => knownKeys(o)))];
  if (def.type === 'intersection') {
    const d = def as unknown as { left: unknown; right: unknown };
    return [...knownKeys(d.left), ...knownKeys(d.right)];
  }
  return [];
}

/** The schema of the field at `path` inside `schema` (input side), or undefined. */
export function schemaAt(schema: unknown, path: readonly PropertyKey[]): unknown {
  let s: unknown = schema;
  for (const key of path) {
    s = inputSide(s);
    const def = defOf(s);
    if (!def) return undefined;
    if (def.type === 'object' && def.shape) s = def.shape[String(key)];
    else if (def.type === 'array') s = def.element;
    else if (def.type === 'record') s = def.valueType;
    else if (def.type === 'union' && def.options) {
      s = def.options.map((o) => schemaAt(o, [key])).find((x) => x !== undefined);
    } else if (def.type === 'intersection') {
      const d = def as unknown as { left: unknown; right: unknown };
      s = schemaAt(d.left, [key]) ?? schemaAt(d.right, [key]);
    } else return undefined;
    if (s === undefined) return undefined;
  }
  return s;
}

/** The value at `path` inside plain data. */
export function valueAt(data: unknown, path: readonly PropertyKey[]): unknown {
  let v = data;
  for (const k of path) {
    if (v === null || typeof v !== 'object') return undefined;
    v = (v as Record<PropertyKey, unknown>)[k as string];
  }
  return v;
}

/** What a schema expects, in words: "a capacitance (F), e.g. 2200 uF", "one of: thyristor, bidirectional", ... */
export function describeExpected(schema: unknown): string {
  const q = quantityInfo(schema);
  if (q) return describeDimension(q.dimension);
  const s = inputSide(schema);
  const def = defOf(s);
  if (!def) return 'a value';
  switch (def.type) {
    case 'enum':
      return `one of: ${Object.values(def.entries ?? {}).join(', ')}`;
    case 'literal':
      return `exactly ${JSON.stringify((def as unknown as { values: unknown[] }).values[0])}`;
    case 'object':
      return `a section with the fields ${Object.keys(def.shape ?? {}).join(', ')}`;
    case 'array':
      return 'a list';
    case 'record':
      return 'a map of names to values';
    case 'string':
      return 'text';
    case 'number':
      return 'a number';
    case 'boolean':
      return 'true or false';
    case 'union':
      return (def.options ?? []).map(describeExpected).join(', or ');
    default:
      return 'a value';
  }
}

/** Nearest candidate when it is close enough to be a plausible typo. */
export function nearest(word: string, candidates: readonly string[]): string | undefined {
  if (candidates.length === 0) return undefined;
  const c = closest(word, candidates as string[]);
  const d = distance(word.toLowerCase(), c.toLowerCase());
  return d <= Math.max(2, Math.floor(word.length / 3)) ? c : undefined;
}

function kindOf(v: unknown): string {
  if (v === null) return 'null';
  if (Array.isArray(v)) return 'a list';
  if (typeof v === 'object') return 'a section';
  if (typeof v === 'string') return `text ${JSON.stringify(v)}`;
  return `${typeof v} ${String(v)}`;
}

/** Convert zod issues to our issues. `root` is the schema that was parsed, `data` the raw input. */
export function toInputIssues(issues: readonly z.core.$ZodIssue[], root: unknown, data: unknown): InputIssue[] {
  const out: InputIssue[] = [];
  for (const issue of issues) {
    const pathKeys = issue.path as PropertyKey[];
    const path = pathToString(pathKeys);
    const value = valueAt(data, pathKeys);
    const here = schemaAt(root, pathKeys);
    const facts = (issue as { params?: { fluxkick?: IssueFacts } }).params?.fluxkick;
    if (facts) {
      const i: InputIssue = { code: facts.code, path, value, expected: facts.expected, problem: facts.problem };
      if (facts.suggestion !== undefined) i.suggestion = facts.suggestion;
      out.push(i);
      continue;
    }
    switch (issue.code) {
      case 'unrecognized_keys': {
        const known = knownKeys(here);
        for (const key of issue.keys) {
          const i: InputIssue = {
            code: 'design.unknown-field',
            path: joinPath(path, key),
            value: valueAt(data, [...pathKeys, key]),
            problem: `unknown field "${key}"`,
            expected: known.length ? `one of the fields ${known.join(', ')}` : 'no extra fields here',
          };
          const near = nearest(key, known);
          if (near !== undefined) i.suggestion = near;
          out.push(i);
        }
        break;
      }
      case 'invalid_type': {
        const missing = value === undefined;
        out.push({
          code: missing ? 'design.missing-field' : 'design.wrong-type',
          path,
          value,
          problem: missing ? 'missing' : `got ${kindOf(value)}`,
          expected: here ? describeExpected(here) : `a ${issue.expected}`,
        });
        break;
      }
      case 'invalid_value': {
        const allowed = issue.values.map((v) => String(v));
        const i: InputIssue = {
          code: 'design.not-one-of',
          path,
          value,
          problem: `${showValue(value)} is not a known choice`,
          expected: `one of: ${allowed.join(', ')}`,
        };
        if (typeof value === 'string') {
          const near = nearest(value, allowed);
          if (near !== undefined) i.suggestion = near;
        }
        out.push(i);
        break;
      }
      case 'invalid_union': {
        // Report the errors of the closest option (fewest issues) so the message stays specific.
        const branches = (issue as unknown as { errors: z.core.$ZodIssue[][] }).errors;
        const unionDef = defOf(inputSide(here));
        if (branches.length && unionDef?.options && value !== null && typeof value === 'object') {
          let best = 0;
          for (let b = 1; b < branches.length; b++) if (branches[b]!.length < branches[best]!.length) best = b;
          const inner = branches[best]!.map((e) => ({ ...e, path: [...pathKeys, ...e.path] }) as z.core.$ZodIssue);
          out.push(...toInputIssues(inner, root, data));
        } else {
          out.push({
            code: 'design.wrong-type',
            path,
            value,
            problem: `${showValue(value)} does not fit`,
            expected: here ? describeExpected(here) : 'another form',
          });
        }
        break;
      }
      case 'too_small':
      case 'too_big': {
        const what = issue.origin === 'array' ? 'items' : issue.origin === 'string' ? 'characters' : '';
        const bound = `${issue.code === 'too_small' ? 'at least' : 'at most'} ${String(issue.code === 'too_small' ? issue.minimum : issue.maximum)}${what ? ` ${what}` : ''}`;
        out.push({
          code: 'design.out-of-range',
          path,
          value,
          problem: issue.origin === 'string' && value === '' ? 'is empty' : `${showValue(value)} is out of range`,
          expected: issue.origin === 'string' && issue.code === 'too_small' ? 'non-empty text' : bound,
        });
        break;
      }
      default:
        out.push({
          code: 'design.inconsistent',
          path,
          value,
          problem: issue.message,
          expected: here ? describeExpected(here) : 'a valid value',
        });
    }
  }
  return out;
}

function parentPath(p: string): string {
  const m = /^(.*)\.[^.[\]]+$/.exec(p);
  return m ? m[1]! : /^[^.[\]]+$/.test(p) ? '' : p;
}

/** Drop "missing X" when an unknown field in the same section is a typo of X (one problem, told once). */
function dropShadowedMissing(issues: InputIssue[]): InputIssue[] {
  const typoTargets = new Set(
    issues
      .filter((i) => i.code === 'design.unknown-field' && i.suggestion !== undefined)
      .map((i) => joinPath(parentPath(i.path), i.suggestion!)),
  );
  return issues.filter((i) => !(i.code === 'design.missing-field' && typoTargets.has(i.path)));
}

/**
 * Parse `data` with `schema`; return the output or throw one `InputError` naming every problem.
 * `pathPrefix` prefixes reported paths (for a section parsed on its own), `file` names the source.
 *
 * @example parseWithSchema(bankSection, { capacitance: '2 kV', ... }, { pathPrefix: 'bank' })
 *          // throws InputError: bank.capacitance: "2 kV" is a voltage (V); expected a capacitance (F) ...
 */
export function parseWithSchema<S extends z.ZodType>(
  schema: S,
  data: unknown,
  options: { file?: string; pathPrefix?: string; locate?: (path: readonly PropertyKey[]) => { line: number; column: number } | undefined } = {},
): z.output<S> {
  const r = schema.safeParse(data);
  if (r.success) return r.data;
  const issues = dropShadowedMissing(toInputIssues(r.error.issues, schema, data));
  if (options.locate) {
    for (const i of issues) {
      const pos = options.locate(pathFromString(i.path));
      if (pos) {
        i.line = pos.line;
        i.column = pos.column;
      }
    }
  }
  const err = new InputError(issues, options.file);
  throw options.pathPrefix ? err.prefixed(options.pathPrefix) : err;
}

/** 'coupled[0].mutual' -> ['coupled', 0, 'mutual'] */
export function pathFromString(path: string): PropertyKey[] {
  const out: PropertyKey[] = [];
  const re = /([^.[\]]+)|\[(\d+)\]/g;
  let m: RegExpExecArray | null;
  while ((m = re.exec(path))) out.push(m[2] !== undefined ? Number(m[2]) : m[1]!);
  return out;
}
