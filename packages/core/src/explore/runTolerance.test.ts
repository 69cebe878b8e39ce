import { describe, expect, it } from 'vitest';
import { runTolerance } from './runTolerance.js';
import { parseToleranceSpec, resolveTolerance } from './toleranceSpec.js';
import { evaluateDesign } from './evaluateDesign.js';
import { parseDesignPath, withDesignValues } from './designPath.js';
import { sizingDesign } from './__fixtures__/sizingDesign.js';
import { fixtureDesign } from './__fixtures__/design.js';

const design = sizingDesign();
const tol = (t: string, d = design) => resolveTolerance(parseToleranceSpec(t), d);

describe('runTolerance(design, fields, options)', () => {
  const fields = [tol('bank.capacitance=±10%'), tol('bank.voltage=±3%'), tol('coil.resistance=±5%')];

  it('gives identical runs for a fixed seed, and another run for another seed', async () => {
    const a = await runTolerance(design, fields, { threads: 0, samples: 40, seed: 7 });
    const b = await runTolerance(design, fields, { threads: 0, samples: 40, seed: 7 });
    const c = await runTolerance(design, fields, { threads: 0, samples: 40, seed: 8 });
    expect(b.rows).toEqual(a.rows);
    expect(b.peakField).toEqual(a.peakField);
    expect(c.rows).not.toEqual(a.rows);
  });

  it('gives the same run on two worker threads as in this thread', async () => {
    const here = await runTolerance(design, fields, { threads: 0, samples: 24, seed: 3, distribution: 'normal' });
    const pooled = await runTolerance(design, fields, { threads: 2, samples: 24, seed: 3, distribution: 'normal' });
    expect(pooled.rows).toEqual(here.rows);
  }, 300_000);

  it('counts the shots that reach the required field and summarizes what the rows hold', async () => {
    const r = await runTolerance(design, fields, { threads: 0, samples: 60, seed: 11 });
    expect(r.completed).toBe(60);
    expect(r.requiredField_Apm).toBe(2.2e6);
    const fieldOf = (row: (typeof r.rows)[number]) => (row.outcome.ok ? row.outcome.items.find((i) => i.id === 'field.part')!.value : NaN);
    const values = r.rows.map(fieldOf);
    expect(r.saturatedFraction).toBe(values.filter((h) => h >= 2.2e6).length / 60);
    expect(r.peakField.min).toBe(Math.min(...values));
    expect(r.peakField.max).toBe(Math.max(...values));
    expect(r.fieldHistogram.reduce((s, b) => s + b.count, 0)).toBe(60);
    expect(r.coilTemperature.percentiles.p5).toBeLessThanOrEqual(r.coilTemperature.percentiles.p95);
  });

  it('keeps the peak field between the shots at the tolerance’s ends when only the voltage varies (field rises with V)', async () => {
    const d = fixtureDesign();
    const r = await runTolerance(d, [tol('bank.voltage=±5%', d)], { threads: 0, samples: 30, seed: 5 });
    const V = parseDesignPath('bank.voltage')!;
    const at = (v: number) => Math.abs(evaluateDesign(withDesignValues(d, [{ path: V, value: v }])).figures.peakField_Apm);
    expect(r.peakField.min).toBeGreaterThanOrEqual(at(1600 * 0.95));
    expect(r.peakField.max).toBeLessThanOrEqual(at(1600 * 1.05));
    expect(r.saturatedFraction).toBeUndefined(); // no part section and no required field given
  });
});
