import { describe, expect, it } from 'vitest';
import { SAFETY_TITLE } from '../report/safety.js';
import { runTolerance } from './runTolerance.js';
import { parseToleranceSpec, resolveTolerance } from './toleranceSpec.js';
import { toleranceHistogramInput, toleranceReportHtml, toleranceToCsv, toleranceToJson, toleranceToText } from './toleranceOutput.js';
import { sizingDesign } from './__fixtures__/sizingDesign.js';

const design = sizingDesign();
const fields = ['bank.capacitance=±10%', 'bank.voltage=±5%'].map((t) => resolveTolerance(parseToleranceSpec(t), design));
const r = await runTolerance(design, fields, { threads: 0, samples: 30, seed: 4 });

describe('tolerance run outputs', () => {
  it('text: the drawn fields, the percentile table, the saturated fraction and the safety notice', () => {
    const t = toleranceToText(r, design, 'Fixture');
    expect(t).toContain('bank.capacitance = 2.2 mF ±10 %');
    expect(t).toContain('uniform within ±x');
    expect(t).toMatch(/Peak field at the part/);
    expect(t).toContain(`${(r.saturatedFraction! * 100).toFixed(1)} %`);
    expect(t).toContain(SAFETY_TITLE.toUpperCase());
  });

  it('JSON: percentiles and fractions, NaN as null', () => {
    const j = toleranceToJson(r) as { peakField_Apm: { percentiles: { p50: number } }; saturatedFraction: number; rows: unknown[] };
    expect(j.peakField_Apm.percentiles.p50).toBe(r.peakField.percentiles.p50);
    expect(j.saturatedFraction).toBe(r.saturatedFraction);
    expect(j.rows).toHaveLength(30);
    expect(JSON.stringify(j)).not.toMatch(/NaN|Infinity/);
  });

  it('CSV: one line per shot with the drawn values', () => {
    const lines = toleranceToCsv(r).trimEnd().split('\n');
    expect(lines).toHaveLength(31);
    expect(lines[0]!.startsWith('index,bank.capacitance [F],bank.voltage [V]')).toBe(true);
    expect(Number(lines[1]!.split(',')[2])).toBe(r.rows[0]!.values[1]);
  });

  it('histogram input carries every shot and the required field as a lower limit; the HTML page embeds the plot without scripts', () => {
    const h = toleranceHistogramInput(r);
    expect(h.values).toHaveLength(30);
    expect(h.limit).toEqual({ value: 2.2e6, label: 'required field', kind: 'min' });
    const html = toleranceReportHtml(r, design);
    expect(html).toMatch(/<svg/);
    expect(html).toContain('Safety');
    expect(html).not.toMatch(/<script/i);
  });
});
