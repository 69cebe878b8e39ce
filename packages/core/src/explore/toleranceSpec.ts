/**
 * The `--tolerance` option of a sweep: `PATH=±x%` (also written `PATH=+-x%` or `PATH=+/-x%`),
 * a relative tolerance on one numeric design field, e.g. `bank.capacitance=±10%`.
 * In a tolerance run each shot draws the field as nominal·(1 + δ), δ within ±x (see monteCarlo.ts
 * for the distributions).
 */
import { InputError } from '../design/errors.js';
import type { Dimension } from '../units/quantity.js';
import type { DesignPath, OptionSource } from './designPath.js';
import type { DesignFieldInfo } from './designField.js';
import { resolveField } from './resolveField.js';

export interface ToleranceSpec {
  text: string;
  pathText: string;
  /** Relative half-width, e.g. 0.1 for ±10 %. */
  fraction: number;
}

/** A tolerance resolved against a design: the field, its nominal value (design-file number: SI, °C for temperatures). */
export interface ToleranceField {
  path: DesignPath;
  dimension: Dimension;
  /** A whole-number field: drawn values are rounded to integers. */
  integer: boolean;
  nominal: number;
  fraction: number;
  spec: string;
}

export const TOLERANCE_EXPECTED = 'PATH=±x% (or PATH=+-x%), e.g. bank.capacitance=±10%';

const TOL_RE = /^(?:±|\+-|\+\/-)\s*((?:\d+\.?\d*|\.\d+)(?:[eE][+-]?\d+)?)\s*%$/;

function tolError(text: string, problem: string, suggestion?: string): InputError {
  return new InputError({
    code: 'option.invalid',
    path: '--tolerance',
    value: text,
    expected: TOLERANCE_EXPECTED,
    problem: `${JSON.stringify(text)}: ${problem}`,
    ...(suggestion !== undefined ? { suggestion } : {}),
  });
}

/** Parse one --tolerance value. Throws InputError (code `option.invalid`, path `--tolerance`). */
export function parseToleranceSpec(text: string): ToleranceSpec {
  const eq = text.indexOf('=');
  if (eq < 0) throw tolError(text, 'there is no "=" between the field path and the tolerance');
  const pathText = text.slice(0, eq).trim();
  const rest = text.slice(eq + 1).trim();
  if (pathText === '') throw tolError(text, 'the field path before "=" is empty');
  const m = TOL_RE.exec(rest);
  if (!m) {
    const bare = /^((?:\d+\.?\d*|\.\d+))\s*%$/.exec(rest);
    if (bare) throw tolError(text, `"${rest}" has no ± sign`, `${pathText}=±${bare[1]}%`);
    throw tolError(text, `"${rest}" is not a relative tolerance ±x%`);
  }
  const fraction = Number(m[1]) / 100;
  if (!(fraction > 0 && fraction < 1)) throw tolError(text, `the tolerance ${m[1]} % is outside (0 %, 100 %)`);
  return { text, pathText, fraction };
}

/** Resolve a tolerance against a parsed design: the path must be a numeric field that is set. */
export function resolveTolerance(spec: ToleranceSpec, design: unknown, fieldInfo?: (segments: readonly (string | number)[]) => DesignFieldInfo): ToleranceField {
  const source: OptionSource = { option: '--tolerance', value: spec.text, expected: TOLERANCE_EXPECTED };
  const { path, current, dimension, integer } = resolveField(design, spec.pathText, source, fieldInfo);
  if (current === undefined) throw tolError(spec.text, `${path.text} is not set in the design, so it has no nominal value`);
  if (current === 0) throw tolError(spec.text, `${path.text} is 0 in the design, so a relative tolerance has no effect`);
  return { path, dimension, integer, nominal: current, fraction: spec.fraction, spec: spec.text };
}
