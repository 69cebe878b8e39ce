/**
 * A sweep's rows as CSV (every figure and every verdict item per point), JSON (the same, SI,
 * NaN as null), a plain-text table (the key figures with engineering units, the safety
 * notice), and the input of the map plot (report/plot-map.ts) over two varied fields.
 *
 * CSV columns: index; one per varied field, "<path> [<SI unit>]"; every shot figure by its
 * JSON key (unit in the name); overall; per verdict item "<id>.value [<unit>]", "<id>.limit
 * [<unit>]", "<id>.margin", "<id>.status"; warnings (codes, ";"-separated); error.
 */
import { DIMENSIONS } from '../units/quantity.js';
import type { Design } from '../design/schema.js';
import { FIGURE_KEYS } from '../report/figures.js';
import { csvField } from '../report/csv.js';
import { formatQuantity } from '../report/quantity.js';
import { safetyNotice } from '../report/safety.js';
import type { MapPlotInput } from '../report/plot-map.js';
import type { PointVerdictItem } from './evaluateDesign.js';
import { partField } from './solveVoltage.js';
import type { SweepResult, SweepRow } from './runSweep.js';
import type { SweepAxis } from './varySpec.js';

/** A varied field as the outputs need it (a sweep axis or a toleranced field). */
export type FieldColumn = Pick<SweepAxis, 'path' | 'dimension'>;

function axisUnit(a: FieldColumn): string {
  return DIMENSIONS[a.dimension].unit;
}

/** Verdict item ids in first-seen order, with their units. */
function itemIds(rows: readonly SweepRow[]): { id: string; unit: string }[] {
  const seen = new Map<string, string>();
  for (const r of rows) if (r.outcome.ok) for (const i of r.outcome.items) if (!seen.has(i.id)) seen.set(i.id, i.unit);
  return [...seen.entries()].map(([id, unit]) => ({ id, unit }));
}

const num = (x: number) => (Number.isFinite(x) ? String(x) : '');

/** The sweep as CSV text (header line, one line per completed point). */
export function sweepToCsv(result: { axes: readonly FieldColumn[]; rows: readonly SweepRow[] }): string {
  const items = itemIds(result.rows);
  const header = [
    'index',
    ...result.axes.map((a) => `${a.path.text} [${axisUnit(a)}]`),
    ...FIGURE_KEYS,
    'overall',
    ...items.flatMap(({ id, unit }) => [`${id}.value [${unit}]`, `${id}.limit [${unit}]`, `${id}.margin`, `${id}.status`]),
    'warnings',
    'error',
  ];
  const lines = [header.map(csvField).join(',')];
  for (const r of result.rows) {
    const o = r.outcome;
    const cells: string[] = [String(r.index), ...r.values.map(num)];
    if (o.ok) {
      cells.push(...FIGURE_KEYS.map((k) => num(o.figures[k])), o.overall);
      for (const { id } of items) {
        const i = o.items.find((x) => x.id === id);
        cells.push(...(i ? [num(i.value), num(i.limit), num(i.margin), i.status] : ['', '', '', '']));
      }
      cells.push(o.warnings.map((w) => w.code).join(';'), '');
    } else {
      cells.push(...FIGURE_KEYS.map(() => ''), '', ...items.flatMap(() => ['', '', '', '']), '', o.error);
    }
    lines.push(cells.map(csvField).join(','));
  }
  return `${lines.join('\n')}\n`;
}

/** JSON numbers: NaN and infinities become null. */
function clean<T>(value: T): T {
  return JSON.parse(JSON.stringify(value, (_k, v) => (typeof v === 'number' && !Number.isFinite(v) ? null : v))) as T;
}

/** The sweep as a JSON-ready object (SI units; NaN → null). */
export function sweepToJson(result: SweepResult, designName?: string): Record<string, unknown> {
  return clean({
    kind: 'sweep',
    ...(designName !== undefined ? { design: designName } : {}),
    axes: result.axes.map((a) => ({ path: a.path.text, dimension: a.dimension, unit: axisUnit(a), spacing: a.spacing, values: a.values, spec: a.spec })),
    total: result.total,
    completed: result.completed,
    interrupted: result.interrupted,
    threads: result.threads,
    wallTime_s: result.wallTime_s,
    rows: result.rows.map((r) => {
      const values = Object.fromEntries(result.axes.map((a, k) => [a.path.text, r.values[k]]));
      const o = r.outcome;
      return o.ok
        ? { index: r.index, values, figures: o.figures, overall: o.overall, verdict: o.items, warnings: o.warnings }
        : { index: r.index, values, error: o.error };
    }),
  });
}

function limitsText(items: readonly PointVerdictItem[]): string {
  const judged = items.filter((i) => i.status !== 'info');
  if (judged.length === 0) return 'no limits given';
  const fail = judged.filter((i) => i.status === 'fail').map((i) => i.id);
  if (fail.length) return `beyond: ${fail.join(', ')}`;
  const warn = judged.filter((i) => i.status === 'warn').map((i) => i.id);
  if (warn.length) return `short of margin: ${warn.join(', ')}`;
  return 'all within';
}

function padTable(rows: string[][], right: boolean[]): string {
  const widths = rows[0]!.map((_, c) => Math.max(...rows.map((r) => [...(r[c] ?? '')].length)));
  return rows
    .map((r) =>
      r
        .map((cell, c) => {
          const pad = widths[c]! - [...cell].length;
          return right[c] ? ' '.repeat(pad) + cell : cell + ' '.repeat(pad);
        })
        .join('  ')
        .trimEnd(),
    )
    .join('\n');
}

/** A plain-text table of the sweep with the key figures, the limits and the safety notice. */
/** The charge voltage of a row: the varied bank.voltage when it is an axis, else the design's. */
function chargeVoltage(result: Pick<SweepResult, 'axes'>, row: SweepRow, design: Design): number {
  const k = result.axes.findIndex((a) => a.path.text === 'bank.voltage');
  return k >= 0 ? row.values[k]! : design.bank.voltage;
}

export function sweepToText(result: SweepResult, options: { designName?: string; design?: Design } = {}): string {
  const header = [...result.axes.map((a) => a.path.text), 'peak current', 'field at part', 'coil temp.', 'energy', 'verdict', 'limits'];
  const table: string[][] = [header];
  for (const r of result.rows) {
    const vals = r.values.map((v, k) => formatQuantity(v, axisUnit(result.axes[k]!)));
    const o = r.outcome;
    if (o.ok) {
      table.push([
        ...vals,
        formatQuantity(o.figures.peakCurrent_A, 'A'),
        formatQuantity(partField(o), 'A/m'),
        formatQuantity(o.figures.coilFinalTemperature_C, '°C'),
        formatQuantity(o.figures.storedEnergy_J, 'J'),
        o.items.some((i) => i.status !== 'info') ? o.overall.toUpperCase() : '-',
        limitsText(o.items),
      ]);
    } else {
      table.push([...vals, 'error', '', '', '', '', o.error.split('\n')[0]!]);
    }
  }
  const right = header.map((_, c) => c < header.length - 2);
  const lines: string[] = [];
  lines.push(`Sweep${options.designName ? ` of "${options.designName}"` : ''}: ${result.axes.map((a) => `${a.path.text} over ${a.values.length} value${a.values.length === 1 ? '' : 's'}`).join(' × ')}`);
  const where = result.threads === 0 ? 'in the main thread' : `on ${result.threads} worker thread${result.threads === 1 ? '' : 's'}`;
  lines.push(`${result.completed} of ${result.total} points${result.interrupted ? ' (interrupted: the rows below are those completed)' : ''}, ${where}, ${result.wallTime_s.toFixed(1)} s`);
  lines.push('');
  lines.push(padTable(table, right));
  // The safety notice, for the most energetic point of the sweep.
  let worst: SweepRow | undefined;
  for (const r of result.rows) {
    if (r.outcome.ok && (!worst || (worst.outcome.ok && r.outcome.figures.storedEnergy_J > worst.outcome.figures.storedEnergy_J))) worst = r;
  }
  if (worst && worst.outcome.ok && options.design) {
    lines.push('');
    lines.push(safetyNotice({ storedEnergy_J: worst.outcome.figures.storedEnergy_J, voltage_V: chargeVoltage(result, worst, options.design) }, 'text').trimEnd());
  }
  return `${lines.join('\n')}\n`;
}

/**
 * The map plot's input over two varied fields (axes `x` and `y`, default the first two): each
 * cell coloured by the peak field at the part, the contour at the required field (from the
 * verdict, when judged), and the cells where no judged item is beyond its limit. With a third
 * axis, the map is drawn at one of its values (`at`, default its first).
 */
export function sweepMapInput(result: Pick<SweepResult, 'axes' | 'rows'>, options: { x?: number; y?: number; at?: number; title?: string } = {}): MapPlotInput {
  const xi = options.x ?? 0;
  const yi = options.y ?? 1;
  if (result.axes.length < 2 || xi === yi || !result.axes[xi] || !result.axes[yi]) throw new RangeError('a map needs two different varied fields');
  const zi = [0, 1, 2].find((k) => k !== xi && k !== yi && k < result.axes.length);
  const zValue = zi !== undefined ? (options.at ?? result.axes[zi]!.values[0]) : undefined;
  const xa = result.axes[xi]!;
  const ya = result.axes[yi]!;
  const xs = [...new Set(xa.values)].sort((a, b) => a - b);
  const ys = [...new Set(ya.values)].sort((a, b) => a - b);
  const value = ys.map(() => xs.map(() => NaN));
  const feasible = ys.map(() => xs.map(() => false));
  let level: number | undefined;
  for (const r of result.rows) {
    if (zi !== undefined && r.values[zi] !== zValue) continue;
    const ix = xs.indexOf(r.values[xi]!);
    const iy = ys.indexOf(r.values[yi]!);
    if (!r.outcome.ok) continue;
    value[iy]![ix] = partField(r.outcome);
    feasible[iy]![ix] = !r.outcome.items.some((i) => i.status === 'fail');
    const f = r.outcome.items.find((i) => i.id === 'field.part');
    if (f && level === undefined) level = f.limit;
  }
  const name = (a: SweepAxis) => a.path.text;
  const extra = zi !== undefined ? ` at ${result.axes[zi]!.path.text} = ${formatQuantity(zValue!, axisUnit(result.axes[zi]!))}` : '';
  return {
    x: { name: name(xa), unit: axisUnit(xa), values: xs },
    y: { name: name(ya), unit: axisUnit(ya), values: ys },
    value,
    valueName: 'peak field at the part',
    valueUnit: 'A/m',
    ...(level !== undefined ? { level: { value: level, label: 'required field' } } : {}),
    feasible,
    title: options.title ?? `Peak field at the part over ${name(xa)} and ${name(ya)}${extra}`,
  };
}
