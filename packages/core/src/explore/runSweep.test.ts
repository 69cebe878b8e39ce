import { describe, expect, it } from 'vitest';
import { runSweep } from './runSweep.js';
import { parseVarySpec, resolveVaryAxis } from './varySpec.js';
import { fixtureDesign } from './__fixtures__/design.js';

const design = fixtureDesign();
const axis = (text: string) => resolveVaryAxis(parseVarySpec(text), design);

describe('runSweep(design, axes, options)', () => {
  const axes = [axis('bank.capacitance=1m:3m:3'), axis('bank.voltage=1k,1.4k')];

  it('gives identical rows with one worker, two workers and in this thread', async () => {
    const one = await runSweep(design, axes, { threads: 1, batchSize: 1 });
    const two = await runSweep(design, axes, { threads: 2, batchSize: 1 });
    const here = await runSweep(design, axes, { threads: 0 });
    expect(one.completed).toBe(6);
    expect(one.interrupted).toBe(false);
    expect(two.rows).toEqual(one.rows);
    expect(here.rows).toEqual(one.rows);
    expect(one.rows.map((r) => r.index)).toEqual([0, 1, 2, 3, 4, 5]);
  }, 300_000); // each worker thread loads the core from source (mathjs alone takes seconds on a busy machine)

  it('writes each point’s values into the station: stored energy = ½·C·V0² at every point (definition)', async () => {
    const run = await runSweep(design, axes, { threads: 0 });
    for (const row of run.rows) {
      expect(row.outcome.ok).toBe(true);
      if (!row.outcome.ok) continue;
      const [C, V] = row.values as [number, number];
      expect(row.outcome.figures.storedEnergy_J).toBeCloseTo(0.5 * C * V * V, 9);
    }
    // At fixed capacitance the peak field rises with the charge voltage (every current scales with V0 in a linear circuit).
    const at = (c: number, v: number) => run.rows.find((r) => r.values[0] === c && r.values[1] === v)!.outcome;
    const lo = at(2e-3, 1000);
    const hi = at(2e-3, 1400);
    expect(lo.ok && hi.ok && hi.figures.peakField_Apm > lo.figures.peakField_Apm).toBe(true);
  });

  it('reports a point the design schema refuses as that row’s error, naming the field, and runs the others', async () => {
    const run = await runSweep(design, [axis('bank.capacitance=-1m,2m')], { threads: 0 });
    expect(run.rows[0]!.outcome.ok).toBe(false);
    expect(run.rows[0]!.outcome.ok ? '' : run.rows[0]!.outcome.error).toMatch(/bank\.capacitance/);
    expect(run.rows[1]!.outcome.ok).toBe(true);
  });

  it('keeps the rows already done when interrupted', async () => {
    const controller = new AbortController();
    const run = await runSweep(design, [axis('bank.voltage=1k:2k:12')], {
      threads: 0,
      batchSize: 1,
      signal: controller.signal,
      onProgress: (done) => done === 3 && controller.abort(),
    });
    expect(run).toMatchObject({ interrupted: true, completed: 3, total: 12 });
    expect(run.rows.map((r) => r.values[0])).toEqual(axis('bank.voltage=1k:2k:12').values.slice(0, 3));
  });
});
