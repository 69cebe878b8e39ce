/**
 * A tolerance run's outputs: plain text (the drawn fields, percentiles of the peak field and the
 * coil temperature, the saturated and failed fractions, the safety notice), JSON (SI, NaN as
 * null), the per-shot CSV (sweepOutput.ts layout, one column per drawn field), the histogram
 * plot's input (report/plot-histogram.ts) and a self-contained HTML page with the histogram.
 */
import type { Design } from '../design/schema.js';
import { DIMENSIONS } from '../units/quantity.js';
import { formatQuantity } from '../report/quantity.js';
import { safetyNotice, type ChargedBank } from '../report/safety.js';
import { histogramSvg, type HistogramInput } from '../report/plot-histogram.js';
import { htmlPage, htmlTable } from '../report/html.js';
import type { Table } from '../report/sections.js';
import type { Distribution } from './summarize.js';
import type { ToleranceResult } from './runTolerance.js';
import { partField } from './solveVoltage.js';
import { sweepToCsv } from './sweepOutput.js';

const pct = (x: number | undefined) => (x === undefined || Number.isNaN(x) ? 'n/a' : `${(x * 100).toFixed(1)} %`);

function describeRun(r: ToleranceResult): string {
  const dist = r.distribution === 'uniform' ? 'uniform within ±x' : 'normal, σ = x/3, truncated at ±x';
  return `${r.completed} of ${r.samples} shots${r.interrupted ? ' (interrupted)' : ''}, seed ${r.seed}, ${dist}`;
}

function fieldLine(f: ToleranceResult['fields'][number]): string {
  return `${f.path.text} = ${formatQuantity(f.nominal, DIMENSIONS[f.dimension].unit)} ±${(f.fraction * 100).toPrecision(3).replace(/\.?0+$/, '')} %`;
}

function distributionTable(r: ToleranceResult): Table {
  const row = (label: string, d: Distribution, unit: string) => ({
    cells: [label, ...[d.min, d.percentiles.p1, d.percentiles.p5, d.percentiles.p50, d.percentiles.p95, d.percentiles.p99, d.max].map((v) => formatQuantity(v, unit))],
  });
  return {
    id: 'tolerance',
    title: 'Spread over the shots',
    columns: [{ header: 'figure', align: 'left' }, ...['min', 'p1', 'p5', 'median', 'p95', 'p99', 'max'].map((h) => ({ header: h, align: 'right' as const }))],
    rows: [row('Peak field at the part', r.peakField, 'A/m'), row('Coil temperature after the shot', r.coilTemperature, '°C'), row('Coil temperature rise', r.coilTemperatureRise, 'K')],
    notes: [
      r.requiredField_Apm !== undefined
        ? `Shots reaching the required field ${formatQuantity(r.requiredField_Apm, 'A/m')} (the part saturates): ${pct(r.saturatedFraction)}.`
        : 'No required field known (no part section, no --target-field): saturation not counted.',
      `Shots whose verdict fails: ${pct(r.failedFraction)}.${r.errors ? ` Shots that could not run: ${r.errors}.` : ''}`,
      'Percentiles by linear interpolation between order statistics (Hyndman & Fan definition 7).',
    ],
  };
}

/** The largest stored energy over the shots and the charge voltage there. */
function chargedBank(r: ToleranceResult, design: Design): ChargedBank | undefined {
  const vk = r.fields.findIndex((f) => f.path.text === 'bank.voltage');
  let best: ChargedBank | undefined;
  for (const row of r.rows) {
    if (!row.outcome.ok) continue;
    const E = row.outcome.figures.storedEnergy_J;
    if (!best || E > best.storedEnergy_J) best = { storedEnergy_J: E, voltage_V: vk >= 0 ? row.values[vk]! : design.bank.voltage };
  }
  return best;
}

export function toleranceToText(r: ToleranceResult, design: Design, designName?: string): string {
  const t = distributionTable(r);
  const cells = [t.columns.map((c) => c.header), ...t.rows.map((x) => x.cells)];
  const widths = cells[0]!.map((_, c) => Math.max(...cells.map((x) => [...x[c]!].length)));
  const lines = [
    `Tolerance run${designName ? ` of "${designName}"` : ''}: ${describeRun(r)}`,
    ...r.fields.map((f) => `  ${fieldLine(f)}`),
    '',
    ...cells.map((x) => x.map((cell, c) => (c === 0 ? cell.padEnd(widths[c]!) : cell.padStart(widths[c]!))).join('  ')),
    '',
    ...(t.notes ?? []),
  ];
  const bank = chargedBank(r, design);
  if (bank) lines.push('', safetyNotice(bank, 'text').trimEnd());
  return `${lines.join('\n')}\n`;
}

export function toleranceToJson(r: ToleranceResult, designName?: string): Record<string, unknown> {
  const value = {
    kind: 'tolerance',
    ...(designName !== undefined ? { design: designName } : {}),
    samples: r.samples,
    seed: r.seed,
    distribution: r.distribution,
    fields: r.fields.map((f) => ({ path: f.path.text, dimension: f.dimension, unit: DIMENSIONS[f.dimension].unit, nominal: f.nominal, tolerance: f.fraction })),
    completed: r.completed,
    interrupted: r.interrupted,
    threads: r.threads,
    wallTime_s: r.wallTime_s,
    peakField_Apm: r.peakField,
    coilTemperature_C: r.coilTemperature,
    coilTemperatureRise_K: r.coilTemperatureRise,
    requiredField_Apm: r.requiredField_Apm,
    saturatedFraction: r.saturatedFraction,
    failedFraction: r.failedFraction,
    errors: r.errors,
    fieldHistogram: r.fieldHistogram,
    rows: r.rows.map((row) => {
      const values = Object.fromEntries(r.fields.map((f, k) => [f.path.text, row.values[k]]));
      const o = row.outcome;
      return o.ok ? { index: row.index, values, figures: o.figures, overall: o.overall, verdict: o.items, warnings: o.warnings } : { index: row.index, values, error: o.error };
    }),
  };
  return JSON.parse(JSON.stringify(value, (_k, v) => (typeof v === 'number' && !Number.isFinite(v) ? null : v))) as Record<string, unknown>;
}

export function toleranceToCsv(r: ToleranceResult): string {
  return sweepToCsv({ axes: r.fields, rows: r.rows });
}

/** Input of report/plot-histogram.ts: the peak field of every shot, with the required field as a lower limit. */
export function toleranceHistogramInput(r: ToleranceResult, designName?: string): HistogramInput {
  return {
    values: r.rows.map((row) => (row.outcome.ok ? partField(row.outcome) : NaN)),
    name: 'peak field at the part',
    unit: 'A/m',
    ...(r.requiredField_Apm !== undefined ? { limit: { value: r.requiredField_Apm, label: 'required field', kind: 'min' as const } } : {}),
    title: `Peak field at the part over ${r.completed} shots${designName ? ` of "${designName}"` : ''}`,
  };
}

/** A self-contained HTML page of the run: safety notice, the spread table, the histogram, the drawn fields. */
export function toleranceReportHtml(r: ToleranceResult, design: Design, designName?: string): string {
  const name = designName ?? design.name ?? 'design';
  const bank = chargedBank(r, design) ?? { storedEnergy_J: 0.5 * design.bank.capacitance * design.bank.voltage ** 2, voltage_V: design.bank.voltage };
  const fields: Table = {
    id: 'fields',
    title: 'Drawn fields',
    columns: [{ header: 'field', align: 'left' }, { header: 'nominal', align: 'right' }, { header: 'tolerance', align: 'right' }],
    rows: r.fields.map((f) => ({ cells: [f.path.text, formatQuantity(f.nominal, DIMENSIONS[f.dimension].unit), `±${(f.fraction * 100).toPrecision(3).replace(/\.?0+$/, '')} %`] })),
    notes: [describeRun(r)],
  };
  return htmlPage({
    title: `Tolerance run: ${name}`,
    safety: safetyNotice(bank, 'html'),
    body: [
      htmlTable(fields),
      htmlTable(distributionTable(r)),
      '<h2 id="histogram">Histogram</h2>',
      `<figure>${histogramSvg(toleranceHistogramInput(r, name), { id: 'hist' })}<figcaption>Peak field at the part over the shots; the rule marks the required field, hatched bars fall short of it.</figcaption></figure>`,
    ],
  });
}
