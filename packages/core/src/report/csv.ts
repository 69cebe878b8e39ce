/**
 * The sampled waveform of a shot as CSV (RFC 4180, except that lines end with "\n"; every reader we
 * know accepts that). Fields with a comma, quote or newline are quoted with
 * doubled quotes. One header line of column names that carry their SI unit, then one line
 * per sample. Numbers are written with `digits` significant figures (default 10), NaN as empty.
 *
 * Columns: t_s, capacitorVoltage_V, coilCurrent_A, switchCurrent_A, diodeCurrent_A,
 * field_Apm[<probe>] per probe, coilTemperature_C, loopCurrent_A[<loop>] and
 * loopTemperature_C[<loop>] per coupled loop.
 */
import type { ShotResult } from '../model/result.js';

export interface CsvOptions {
  /** Significant figures of each number (default 10). */
  digits?: number;
}

/** Quote a CSV field when it holds a comma, a quote or a line break (RFC 4180 §2). */
export function csvField(s: string): string {
  return /[",\r\n]/.test(s) ? `"${s.replace(/"/g, '""')}"` : s;
}

/** Column names and the arrays behind them, in output order. */
export function waveformColumns(result: ShotResult): { name: string; values: readonly number[] }[] {
  const w = result.waveform;
  const probeName = (p: number) => result.probes[p]?.name ?? `probe ${p}`;
  const loopName = (k: number) => result.loops[k]?.name ?? `loop ${k}`;
  return [
    { name: 't_s', values: w.t_s },
    { name: 'capacitorVoltage_V', values: w.capacitorVoltage_V },
    { name: 'coilCurrent_A', values: w.coilCurrent_A },
    { name: 'switchCurrent_A', values: w.switchCurrent_A },
    { name: 'diodeCurrent_A', values: w.diodeCurrent_A },
    ...w.field_Apm.map((values, p) => ({ name: `field_Apm[${probeName(p)}]`, values })),
    { name: 'coilTemperature_C', values: w.coilTemperature_C },
    ...w.loopCurrents_A.map((values, k) => ({ name: `loopCurrent_A[${loopName(k)}]`, values })),
    ...w.loopTemperatures_C.map((values, k) => ({ name: `loopTemperature_C[${loopName(k)}]`, values })),
  ];
}

function num(x: number, digits: number): string {
  if (!Number.isFinite(x)) return '';
  return String(Number(x.toPrecision(digits)));
}

/** The waveform as CSV text, ending with a newline. */
export function waveformToCsv(result: ShotResult, options: CsvOptions = {}): string {
  const digits = options.digits ?? 10;
  const cols = waveformColumns(result);
  const n = result.waveform.t_s.length;
  const lines = [cols.map((c) => csvField(c.name)).join(',')];
  for (let j = 0; j < n; j++) lines.push(cols.map((c) => num(c.values[j], digits)).join(','));
  return lines.join('\n') + '\n';
}
