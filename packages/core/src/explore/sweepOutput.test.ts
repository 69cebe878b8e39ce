import { describe, expect, it } from 'vitest';
import { mapPlotSvg } from '../report/plot-map.js';
import { SAFETY_TITLE } from '../report/safety.js';
import { runSweep } from './runSweep.js';
import { parseVarySpec, resolveVaryAxis } from './varySpec.js';
import { sweepMapInput, sweepToCsv, sweepToJson, sweepToText } from './sweepOutput.js';
import { sizingDesign } from './__fixtures__/sizingDesign.js';

const design = sizingDesign();
const axes = [resolveVaryAxis(parseVarySpec('bank.capacitance=0.5m,1m,2m'), design), resolveVaryAxis(parseVarySpec('bank.voltage=1.2k,0.8k'), design)];
const result = await runSweep(design, axes, { threads: 0 });
const bad = await runSweep(design, [resolveVaryAxis(parseVarySpec('bank.capacitance=-1m,1m'), design)], { threads: 0 });

/** Minimal RFC 4180 reader for the check (quoted fields with doubled quotes). */
function readCsv(text: string): string[][] {
  const rows: string[][] = [];
  let row: string[] = [];
  let field = '';
  let quoted = false;
  for (let i = 0; i < text.length; i++) {
    const ch = text[i]!;
    if (quoted) {
      if (ch === '"' && text[i + 1] === '"') (field += '"'), i++;
      else if (ch === '"') quoted = false;
      else field += ch;
    } else if (ch === '"') quoted = true;
    else if (ch === ',') row.push(field), (field = '');
    else if (ch === '\n') row.push(field), rows.push(row), (row = []), (field = '');
    else field += ch;
  }
  return rows;
}

describe('sweepToCsv(result)', () => {
  it('writes one line per point with every figure and verdict item, numbers that read back exactly', () => {
    const rows = readCsv(sweepToCsv(result));
    const header = rows[0]!;
    expect(header.slice(0, 3)).toEqual(['index', 'bank.capacitance [F]', 'bank.voltage [V]']);
    expect(header).toContain('peakField_Apm');
    expect(header).toContain('field.part.margin');
    expect(header).toContain('capacitor.voltage.status');
    expect(rows).toHaveLength(1 + 6);
    for (const r of rows) expect(r).toHaveLength(header.length);
    const col = header.indexOf('peakCurrent_A');
    result.rows.forEach((row, i) => {
      expect(Number(rows[i + 1]![1])).toBe(row.values[0]);
      expect(row.outcome.ok && Number(rows[i + 1]![col])).toBe(row.outcome.ok && row.outcome.figures.peakCurrent_A);
    });
  });

  it('keeps a failed point as a row with its error text', () => {
    const rows = readCsv(sweepToCsv(bad));
    const header = rows[0]!;
    expect(rows[1]![header.indexOf('error')]).toMatch(/bank\.capacitance/);
    expect(rows[1]!).toHaveLength(header.length);
  });
});

describe('sweepToJson(result)', () => {
  it('gives axes with units and rows keyed by path, NaN as null', () => {
    const json = sweepToJson(result, 'Fixture') as { axes: { path: string; unit: string }[]; rows: { values: Record<string, number>; figures: Record<string, unknown> }[] };
    expect(json.axes.map((a) => [a.path, a.unit])).toEqual([['bank.capacitance', 'F'], ['bank.voltage', 'V']]);
    expect(json.rows[0]!.values).toEqual({ 'bank.capacitance': 0.5e-3, 'bank.voltage': 1200 });
    expect(JSON.stringify(json)).not.toMatch(/NaN|Infinity/);
    const withError = sweepToJson(bad) as { rows: { error?: string }[] };
    expect(withError.rows[0]!.error).toMatch(/bank\.capacitance/);
  });
});

describe('sweepToText(result)', () => {
  it('lists every point with engineering units and ends with the safety notice', () => {
    const text = sweepToText(result, { designName: 'Fixture', design });
    expect(text).toContain('bank.capacitance');
    expect(text).toContain('500 µF');
    expect(text).toContain('1.2 kV');
    expect(text).toContain(SAFETY_TITLE.toUpperCase());
    // The notice names the most energetic point: 2 mF at 1.2 kV holds ½·C·V² = 1.44 kJ.
    expect(text).toContain('1.44 kJ');
  });
});

describe('sweepMapInput(result)', () => {
  it('lays the peak field on the grid (ascending axes), with the required field as the contour level and the feasible cells', () => {
    const m = sweepMapInput(result);
    expect(m.x.values).toEqual([0.5e-3, 1e-3, 2e-3]);
    expect(m.y.values).toEqual([800, 1200]);
    expect(m.value).toHaveLength(2);
    expect(m.value[0]).toHaveLength(3);
    const row = result.rows.find((r) => r.values[0] === 1e-3 && r.values[1] === 800)!;
    expect(m.value[0]![1]).toBe(row.outcome.ok ? row.outcome.items.find((i) => i.id === 'field.part')!.value : NaN);
    expect(m.level?.value).toBe(2.2e6);
    // 1.2 kV is beyond the 1.1 kV rating: never feasible.
    expect(m.feasible![1]!.every((f) => f === false)).toBe(true);
    expect(mapPlotSvg(m)).toMatch(/^<svg/);
  });
});
