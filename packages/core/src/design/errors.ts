/**
 * Errors in what the user gave us (design files, command-line values). Errors are data:
 * a stable code, the path to the offending field, the value received, what was expected,
 * and, when we can guess it, a suggestion. The wording of the message lives in
 * `formatInputError`, apart from the logic that detects the problem.
 *
 * The CLI maps an `InputError` to exit code 2 and prints `formatInputError(err)` without a stack.
 */

/** Stable codes of our own. Quantity codes (`quantity.*`) come from units/quantity.ts. */
export type InputErrorCode =
  | 'file.missing'
  | 'file.unreadable'
  | 'file.syntax'
  | 'file.empty'
  | 'design.unknown-field'
  | 'design.missing-field'
  | 'design.wrong-type'
  | 'design.not-one-of'
  | 'design.out-of-range'
  | 'design.inconsistent'
  | 'design.duplicate-name'
  | 'quantity.type'
  | 'quantity.not-finite'
  | 'quantity.syntax'
  | 'quantity.unknown-unit'
  | 'quantity.dimension'
  | 'option.invalid'
  | 'output.unwritable'
  | (string & {});

/** One problem found in the input. */
export interface InputIssue {
  code: InputErrorCode;
  /** Dotted path to the field, e.g. `bank.capacitance`, `coupled[1].mutual`; '' for the whole file. */
  path: string;
  /** The value received (as parsed from the file), or undefined when the field is missing. */
  value: unknown;
  /** What was expected, e.g. "a capacitance (F), e.g. 2200 uF". */
  expected: string;
  /** What was wrong, in a few words, e.g. `"2 kV" is a voltage (V)`. */
  problem: string;
  /** A likely fix, e.g. a field name or a unit spelling. */
  suggestion?: string;
  /** Line and column (1-based) in the source file, when known. */
  line?: number;
  column?: number;
}

/** Thrown for bad user input. `issues[0]` is the primary one; its facts are repeated on the error itself. */
export class InputError extends Error {
  override name = 'InputError';
  readonly code: InputErrorCode;
  readonly path: string;
  readonly value: unknown;
  readonly expected: string;
  readonly suggestion?: string;
  readonly issues: readonly InputIssue[];
  /** The file the input came from, when it came from one. */
  readonly file?: string;

  constructor(issues: InputIssue | readonly InputIssue[], file?: string) {
    const list = Array.isArray(issues) ? (issues as readonly InputIssue[]) : [issues as InputIssue];
    if (list.length === 0) throw new Error('InputError needs at least one issue');
    const first = list[0]!;
    super(formatIssues(list, file));
    this.code = first.code;
    this.path = first.path;
    this.value = first.value;
    this.expected = first.expected;
    if (first.suggestion !== undefined) this.suggestion = first.suggestion;
    this.issues = list;
    if (file !== undefined) this.file = file;
  }

  /** A copy whose paths are prefixed, e.g. `prefixed('coil')` turns `mass` into `coil.mass`. */
  prefixed(prefix: string): InputError {
    return new InputError(
      this.issues.map((i) => ({ ...i, path: joinPath(prefix, i.path) })),
      this.file,
    );
  }
}

export function isInputError(e: unknown): e is InputError {
  return e instanceof InputError || (e instanceof Error && e.name === 'InputError' && 'issues' in e);
}

/** Join path parts: joinPath('coupled', '[0]') -> 'coupled[0]', joinPath('bank', 'esr') -> 'bank.esr'. */
export function joinPath(a: string, b: string): string {
  if (!a) return b;
  if (!b) return a;
  return b.startsWith('[') ? `${a}${b}` : `${a}.${b}`;
}

/** Path segments to a dotted path: ['coupled', 0, 'mutual'] -> 'coupled[0].mutual'. */
export function pathToString(path: readonly PropertyKey[]): string {
  let out = '';
  for (const p of path) {
    if (typeof p === 'number') out += `[${p}]`;
    else out = joinPath(out, String(p));
  }
  return out;
}

/** Show a received value the way the user wrote it: strings quoted, objects as short JSON. */
export function showValue(value: unknown): string {
  if (value === undefined) return '(missing)';
  if (typeof value === 'string') return JSON.stringify(value);
  if (typeof value === 'number') return Number.isNaN(value) ? 'NaN' : String(value);
  try {
    const s = JSON.stringify(value);
    return s.length > 60 ? `${s.slice(0, 57)}...` : s;
  } catch {
    return String(value);
  }
}

/** One issue as one line: `bank.capacitance: "2 kV" is a voltage (V); expected a capacitance (F), e.g. 2200 uF`. */
export function formatIssue(issue: InputIssue): string {
  const pos = issue.line !== undefined ? `line ${issue.line}${issue.column !== undefined ? `, column ${issue.column}` : ''}` : '';
  const head = issue.path ? `${issue.path}${pos ? ` (${pos})` : ''}: ` : pos ? `${pos}: ` : '';
  let s = `${head}${issue.problem}; expected ${issue.expected}`;
  if (issue.suggestion !== undefined) s += `. Did you mean ${JSON.stringify(issue.suggestion)}?`;
  return s;
}

function formatIssues(issues: readonly InputIssue[], file?: string): string {
  const head = file ? `${file}: ` : '';
  if (issues.length === 1) return head + formatIssue(issues[0]!);
  return `${head}${issues.length} problems\n${issues.map((i) => `  - ${formatIssue(i)}`).join('\n')}`;
}

/**
 * The message shown to a user (no stack): one line per problem, prefixed by the file name.
 *
 * @example
 * station.yaml: bank.capacitance: "2 kV" is a voltage (V); expected a capacitance (F), e.g. 2200 uF
 */
export function formatInputError(err: InputError): string {
  return formatIssues(err.issues, err.file);
}
