import { describe, expect, it } from 'vitest';
import { isInputError } from '../design/errors.js';
import { sizeBank } from './sizeBank.js';
import { solveVoltageAt } from './solveVoltage.js';
import { parseDesignPath } from './designPath.js';
import { logValues } from './varySpec.js';
import { unitBuild } from './unitBuild.js';
import { fixtureDesign } from './__fixtures__/design.js';
import { sizingDesign } from './__fixtures__/sizingDesign.js';

const design = sizingDesign();
const C = parseDesignPath('bank.capacitance')!;
const relTol = 1e-5;

/** Independent check of one capacitance: solve with the rated voltage as the ceiling, feasible when no judged item fails. */
function energyAt(capacitance: number): number {
  const r = solveVoltageAt(design, [C], [capacitance], { targetField_Apm: 2.2e6 * 1.1, relTol, maxVoltage_V: 1100 });
  if (!r.ok || r.result.items.some((i) => i.status === 'fail')) return NaN;
  return 0.5 * capacitance * r.voltage_V ** 2;
}

describe('sizeBank(design, options): continuous capacitance', () => {
  it('finds a least-energy bank that no point of a fine capacitance grid beats', async () => {
    const r = await sizeBank(design, { threads: 0, relTol });
    expect(r.targetField_Apm).toBeCloseTo(2.42e6, 6); // required 2.2 MA/m with the part's 10 % margin
    expect(r.best).toBeDefined();
    const grid = logValues(r.capacitanceRange[0], r.capacitanceRange[1], 60).map(energyAt).filter((e) => !Number.isNaN(e));
    expect(grid.length).toBeGreaterThan(10);
    // Tolerance: each grid energy carries up to +2·relTol from its voltage solve; the sizing's own
    // capacitance resolution (0.1 %) times |d ln E / d ln C| (< 1 here) adds below 1e-3.
    expect(r.best!.energy_J).toBeLessThanOrEqual(Math.min(...grid) * (1 + 2 * relTol + 1e-3));
    expect(r.best!.field_Apm).toBeGreaterThanOrEqual(r.targetField_Apm);
    expect(r.best!.field_Apm).toBeLessThanOrEqual(r.targetField_Apm * (1 + relTol));
  });

  it('says the capacitor’s rated voltage binds and why the smaller neighbour fails', async () => {
    const r = await sizeBank(design, { threads: 0 });
    expect(r.binding.kind).toBe('limit');
    expect(r.binding.ids).toContain('capacitor.voltage-rating');
    const smaller = r.neighbours.find((n) => n.candidate.capacitance_F < r.best!.capacitance_F)!;
    expect(smaller.candidate.feasible).toBe(false);
    expect(smaller.why).toMatch(/needs more than 1\.1 kV/);
    const larger = r.neighbours.find((n) => n.candidate.capacitance_F > r.best!.capacitance_F)!;
    expect(larger.candidate.energy_J).toBeGreaterThanOrEqual(r.best!.energy_J);
  });

  it('gives the same answer on worker threads as in this thread', async () => {
    const opts = { gridCount: 5, capacitanceTol: 0.05 };
    const here = await sizeBank(design, { ...opts, threads: 0 });
    const pooled = await sizeBank(design, { ...opts, threads: 2 });
    expect(pooled.best!.capacitance_F).toBe(here.best!.capacitance_F);
    expect(pooled.best!.voltage_V).toBe(here.best!.voltage_V);
  }, 300_000);

  it('needs a target: --target-field or a part section', async () => {
    let err: unknown;
    try {
      await sizeBank(fixtureDesign(), { threads: 0 });
    } catch (e) {
      err = e;
    }
    expect(isInputError(err) && err.path).toBe('--target-field');
  });
});

describe('sizeBank(design, { unit }): whole series and parallel counts', () => {
  const unit = { capacitance_F: 470e-6, voltage_V: 450, esr_Ohm: 0.02, esl_H: 40e-9 };

  it('picks the build of least energy among every build in the range (checked by brute force) and states its counts', async () => {
    const range: [number, number] = [300e-6, 1.2e-3];
    const r = await sizeBank(design, { threads: 0, unit, maxSeries: 3, capacitanceRange: range });
    const b = r.best!.build!;
    expect(r.best!.capacitance_F).toBeCloseTo((b.parallel * unit.capacitance_F) / b.series, 15);
    expect(r.best!.voltage_V).toBeLessThanOrEqual(b.series * unit.voltage_V);
    let least = Infinity;
    for (let s = 1; s <= 3; s++) {
      for (let p = 1; (p * unit.capacitance_F) / s <= range[1]; p++) {
        const u = unitBuild(unit, s, p);
        if (u.capacitance_F < range[0]) continue;
        const paths = ['bank.capacitance', 'bank.esr', 'bank.esl', 'ratings.capacitor.voltage', 'ratings.capacitor.units'].map((t) => parseDesignPath(t)!);
        const v = solveVoltageAt(design, paths, [u.capacitance_F, u.esr_Ohm, u.esl_H, u.ratedVoltage_V, p], { targetField_Apm: 2.42e6, relTol, maxVoltage_V: u.ratedVoltage_V });
        if (v.ok && !v.result.items.some((i) => i.status === 'fail')) least = Math.min(least, 0.5 * u.capacitance_F * v.voltage_V ** 2);
      }
    }
    expect(r.best!.energy_J).toBe(least);
    expect(r.neighbours.length).toBeGreaterThan(0);
    for (const n of r.neighbours) expect(n.candidate.feasible === false || n.candidate.energy_J >= r.best!.energy_J).toBe(true);
  });
});
