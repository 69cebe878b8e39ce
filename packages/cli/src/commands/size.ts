/**
 * `fluxkick size <design>`: bank sizing.
 *
 * - `--capacitance C` (one value): the charge voltage at which that capacitance just reaches
 *   the target field (bracket + Brent), with the shot's verdict.
 * - otherwise (`--capacitance MIN:MAX`, default a quarter to four times the design's): the
 *   least-energy bank that meets every limit, continuous or built from `--unit` capacitors in
 *   whole series and parallel counts; says which limit binds and why the neighbours fail.
 *
 * The target: `--target-field` (else the part section's required field) with `--margin`
 * (else the part's field margin, else 0).
 */
import type { Command } from 'commander';
import {
  InputError,
  formatQuantity,
  loadDesign,
  safetyNotice,
  sizeBank,
  sizingTarget,
  sizeToJson,
  sizeToText,
  parseAxisValue,
  solveVoltage,
  tryParseQuantity,
  type CapacitorUnit,
  type Design,
  type Dimension,
} from '@fluxkick/core';
import type { CliContext } from '../context.js';
import { EXIT_INTERRUPTED, fieldOption, intOption, withRunControls } from './sweep.js';

export interface SizeOptions {
  targetField?: string;
  margin?: string;
  capacitance?: string;
  unit?: string;
  maxSeries?: string;
  requireMargins?: boolean;
  relTol?: string;
  threads?: string;
  json?: boolean;
  progress?: boolean;
}

const UNIT_EXPECTED = 'capacitance=…,voltage=…[,esr=…][,esl=…][,peakCurrent=…], e.g. capacitance=470uF,voltage=450V,esr=20mohm,esl=40nH';
const CAP_EXPECTED = 'one capacitance (e.g. 2.2mF) or a range MIN:MAX (e.g. 1mF:10mF)';

function optionError(option: string, value: unknown, problem: string, expected: string): InputError {
  const shown = value === undefined ? '' : `${JSON.stringify(Array.isArray(value) ? value.join(' ') : value)}: `;
  return new InputError({ code: 'option.invalid', path: option, value, problem: `${shown}${problem}`, expected });
}

function quantity(option: string, text: string, dimension: Dimension, expected: string): number {
  // Units ("2.2 mF") or a bare SI prefix of the field's own unit ("2.2m" = 2.2 mF), as in --vary.
  const r = parseAxisValue(text, dimension);
  if (!r.ok) throw optionError(option, text, r.reason, expected);
  return r.value;
}

/** `--unit capacitance=470uF,voltage=450V,esr=20mohm,esl=40nH[,peakCurrent=3kA]`. */
export function parseUnitOption(text: string): CapacitorUnit {
  const fields: Record<string, Dimension> = { capacitance: 'capacitance', voltage: 'voltage', esr: 'resistance', esl: 'inductance', peakCurrent: 'current' };
  const got: Record<string, number> = {};
  for (const part of text.split(',')) {
    const eq = part.indexOf('=');
    const key = part.slice(0, eq).trim();
    if (eq < 0 || !(key in fields)) throw optionError('--unit', text, `"${part.trim()}" is not one of ${Object.keys(fields).join(', ')} with "=" and a value`, UNIT_EXPECTED);
    got[key] = quantity('--unit', part.slice(eq + 1), fields[key]!, UNIT_EXPECTED);
  }
  if (got.capacitance === undefined || got.voltage === undefined) throw optionError('--unit', text, 'capacitance and voltage are required', UNIT_EXPECTED);
  if (!(got.capacitance > 0 && got.voltage > 0) || (got.esr ?? 0) < 0 || (got.esl ?? 0) < 0) throw optionError('--unit', text, 'capacitance and voltage must be above zero, esr and esl not below', UNIT_EXPECTED);
  return { capacitance_F: got.capacitance, voltage_V: got.voltage, esr_Ohm: got.esr ?? 0, esl_H: got.esl ?? 0, ...(got.peakCurrent !== undefined ? { peakCurrent_A: got.peakCurrent } : {}) };
}

/** `--capacitance C` or `--capacitance MIN:MAX`. */
export function parseCapacitanceOption(text: string): { single: number } | { range: [number, number] } {
  const parts = text.split(':');
  if (parts.length === 1) {
    const c = quantity('--capacitance', parts[0]!, 'capacitance', CAP_EXPECTED);
    if (!(c > 0)) throw optionError('--capacitance', text, 'the capacitance must be above zero', CAP_EXPECTED);
    return { single: c };
  }
  if (parts.length !== 2) throw optionError('--capacitance', text, 'more than one ":"', CAP_EXPECTED);
  const [a, b] = parts.map((p) => quantity('--capacitance', p, 'capacitance', CAP_EXPECTED)) as [number, number];
  if (!(a > 0 && b > a)) throw optionError('--capacitance', text, 'the range must go from a smaller to a larger capacitance above zero', CAP_EXPECTED);
  return { range: [a, b] };
}

function marginOption(text: string | undefined): number | undefined {
  if (text === undefined) return undefined;
  const r = tryParseQuantity(text.trim(), 'dimensionless');
  if (!r.ok || !(r.value >= 0 && r.value < 10)) throw optionError('--margin', text, r.ok ? `${r.value} is outside 0…10` : r.reason, 'a headroom such as 10% or 0.1');
  return r.value;
}

function relTolOption(text: string | undefined): number | undefined {
  if (text === undefined) return undefined;
  const v = Number(text);
  if (!(v > 0 && v <= 0.1)) throw optionError('--rel-tol', text, `"${text}" is not a number in (0, 0.1]`, 'a relative tolerance such as 1e-5');
  return v;
}

/** Voltage for one capacitance. */
async function voltageForCapacitance(ctx: CliContext, design: Design, name: string, C: number, opts: SizeOptions, target: { required?: number; margin?: number }): Promise<void> {
  const t = sizingTarget(design, { ...(target.required !== undefined ? { requiredField_Apm: target.required } : {}), ...(target.margin !== undefined ? { margin: target.margin } : {}) });
  const withC: Design = { ...design, bank: { ...design.bank, capacitance: C } };
  const work: Design = target.required !== undefined && withC.part ? { ...withC, part: { ...withC.part, requiredField: target.required } } : withC;
  const goal = t.required * (1 + t.margin);
  const relTol = relTolOption(opts.relTol);
  const rated = design.ratings?.capacitor?.voltage;
  const r = solveVoltage(work, { targetField_Apm: goal, ...(relTol !== undefined ? { relTol } : {}), ...(rated !== undefined ? { maxVoltage_V: rated } : {}) });
  if (opts.json) {
    const clean = JSON.parse(JSON.stringify({ kind: 'voltage', design: name, capacitance_F: C, requiredField_Apm: t.required, margin: t.margin, targetField_Apm: goal, ...r }, (_k, v) => (typeof v === 'number' && !Number.isFinite(v) ? null : v)));
    ctx.io.stdout(`${JSON.stringify(clean, null, 2)}\n`);
    return;
  }
  const lines = [`Charge voltage for ${formatQuantity(C, 'F')} in "${name}": the part needs ${formatQuantity(t.required, 'A/m')} + ${(t.margin * 100).toFixed(0)} % margin = ${formatQuantity(goal, 'A/m')}`];
  if (r.ok) {
    lines.push(`  ${formatQuantity(r.voltage_V, 'V', { digits: 5 })}: field ${formatQuantity(r.field_Apm, 'A/m', { digits: 5 })} (within +${((relTol ?? 1e-5) * 100).toPrecision(2)} % of the target), stored energy ${formatQuantity(0.5 * C * r.voltage_V ** 2, 'J')}, ${r.evaluations} shots`);
    const judged = r.result.items.filter((i) => i.status !== 'info');
    lines.push(`  verdict: ${judged.length ? r.result.overall.toUpperCase() : 'no limits given'}${judged.filter((i) => i.status !== 'pass').map((i) => `; ${i.id} ${i.status}`).join('')}`);
    lines.push('', safetyNotice({ storedEnergy_J: 0.5 * C * r.voltage_V ** 2, voltage_V: r.voltage_V }, 'text').trimEnd());
  } else if (r.reason === 'unreachable') {
    lines.push(`  not reachable: at ${formatQuantity(r.voltage_V, 'V')}${rated !== undefined ? ' (the rated voltage)' : ''} the field is only ${formatQuantity(r.field_Apm, 'A/m')}`);
  } else {
    lines.push(`  no solution: ${r.reason === 'below-min' ? `the field exceeds the target even at ${formatQuantity(r.voltage_V, 'V')}` : (r.error ?? 'the shot failed')}`);
  }
  ctx.io.stdout(`${lines.join('\n')}\n`);
}

export async function runSizeCommand(ctx: CliContext, designPath: string, opts: SizeOptions): Promise<void> {
  const required = fieldOption(opts.targetField);
  const margin = marginOption(opts.margin);
  const cap = opts.capacitance !== undefined ? parseCapacitanceOption(opts.capacitance) : undefined;
  const unit = opts.unit !== undefined ? parseUnitOption(opts.unit) : undefined;
  if (unit && cap && 'single' in cap) throw optionError('--capacitance', opts.capacitance, 'one capacitance with --unit', 'a range MIN:MAX with --unit (the builds are chosen within it)');
  const maxSeries = intOption('--max-series', opts.maxSeries, 4, 1, 64);
  const threads = opts.threads !== undefined ? intOption('--threads', opts.threads, 0, 0, 256) : undefined;
  const relTol = relTolOption(opts.relTol);
  const design = loadDesign(ctx.resolvePath(designPath));
  const name = design.name ?? designPath;
  const target = { ...(required !== undefined ? { required } : {}), ...(margin !== undefined ? { margin } : {}) };
  if (cap && 'single' in cap) return voltageForCapacitance(ctx, design, name, cap.single, opts, target);
  const { value: result, interrupted } = await withRunControls(ctx, opts.progress !== false, 'sizing', (signal, onProgress) =>
    sizeBank(design, {
      signal,
      onProgress,
      ...(required !== undefined ? { requiredField_Apm: required } : {}),
      ...(margin !== undefined ? { margin } : {}),
      ...(cap && 'range' in cap ? { capacitanceRange: cap.range } : {}),
      ...(unit ? { unit, maxSeries } : {}),
      ...(opts.requireMargins ? { requirePass: true } : {}),
      ...(relTol !== undefined ? { relTol } : {}),
      ...(threads !== undefined ? { threads } : {}),
    }),
  );
  if (opts.json) ctx.io.stdout(`${JSON.stringify(sizeToJson(result, name), null, 2)}\n`);
  else ctx.io.stdout(sizeToText(result, name));
  if (interrupted || result.interrupted) {
    ctx.io.stderr(`fluxkick: interrupted after ${result.completed} candidates; the answer above is the best of those.\n`);
    ctx.exitCode = EXIT_INTERRUPTED;
  }
}

export function registerSize(program: Command, ctx: CliContext): Command {
  return program
    .command('size')
    .description('bank sizing: the voltage for a given capacitance, or the least-energy bank that meets every limit')
    .argument('<design>', 'design file (.yaml, .yml or .json)')
    .option('--target-field <H>', "field the part must see, e.g. 2.4MA/m (default: the part section's required field)")
    .option('--margin <m>', "headroom over the target field, e.g. 10% (default: the part's field margin, else 0)")
    .option('--capacitance <C|MIN:MAX>', "one capacitance: the voltage for it; a range: where to look for the least-energy bank (default: 1/4 to 4 × the design's)")
    .option('--unit <spec>', 'build from capacitor units: capacitance=…,voltage=…[,esr=…][,esl=…][,peakCurrent=…]')
    .option('--max-series <n>', 'most units in series with --unit (default 4)')
    .option('--require-margins', "every limit's margin must hold too, not only the limit")
    .option('--rel-tol <x>', 'relative tolerance of each voltage solve on the field (default 1e-5)')
    .option('--threads <n>', 'worker threads (0: this thread; default: the cores)')
    .option('--json', 'print the result as JSON (SI units)')
    .option('--no-progress', 'no progress bar (it only shows on a terminal anyway)')
    .addHelpText(
      'after',
      `
With --unit, s units in series per string and p strings in parallel give
C = p·C_u/s, V_rating = s·V_u, ESR = s·ESR_u/p, ESL = s·ESL_u/p.

Examples:
  $ fluxkick size station.yaml --target-field 2.4MA/m
  $ fluxkick size station.yaml --target-field 2.4MA/m --capacitance 2.2mF
  $ fluxkick size station.yaml --capacitance 0.5mF:8mF --unit capacitance=470uF,voltage=450V,esr=20mohm,esl=40nH --json`,
    )
    .action((designPath: string, opts: SizeOptions) => runSizeCommand(ctx, designPath, opts));
}

