/**
 * Sweep throughput: a 100 × 100 capacitance × voltage grid of the demo station
 * (examples/demo-station.yaml; bank.capacitance 1 to 5 mF, bank.voltage 1 to 3 kV, linear), every
 * point simulated and judged (explore/runSweep.ts: schema re-validation, Station, shot with
 * figures only, verdict), run three ways: in the main thread, on one worker thread, on two.
 *
 * A second, heavier case: the geometry example (examples/geometry-station.yaml), 13 winding-layer
 * counts × 12 voltages, where each point builds the fixture from its dimensions (filament-sum
 * inductances, eddy shells): there the work, not the start-up, dominates.
 *
 * Figures: wall-clock time of each run (what a user waits for, worker start-up included: from
 * source each worker loads the core through tsx), the speed-up of two workers over one
 * (wall time, one / two), points per wall-clock second, and the CPU time of the whole process
 * (all threads). The rows of the one- and two-worker runs are compared: they must be identical
 * (a mismatch makes the figure NaN, which fails the bench). The machine is shared, so wall
 * times include other people's work; the note gives the load average at the start.
 */
import { fileURLToPath } from 'node:url';
import { loadavg } from 'node:os';
import { isDeepStrictEqual } from 'node:util';
import { loadDesign, parseVarySpec, resolveVaryAxis, runSweep, type SweepResult } from '../packages/core/src/index.js';
import { cpuSeconds, defineBench, type BenchRow } from './harness.js';

const DEMO = fileURLToPath(new URL('../examples/demo-station.yaml', import.meta.url));
const GEOMETRY = fileURLToPath(new URL('../examples/geometry-station.yaml', import.meta.url));
const N = 100;
const DEMO_GRID = [`bank.capacitance=1m:5m:${N}`, `bank.voltage=1k:3k:${N}`];
/** Heavy points: the fixture from geometry (inductances by filament sums, eddy shells) at every point. */
const GEOMETRY_GRID = ['fixture.windings[0].layers=4:16:13', 'bank.voltage=0.9k:1.5k:12'];

type Timed = { result: SweepResult; wall_s: number; cpu_s: number; firstPoint_s: number };

async function timed(threads: number, file = DEMO, grid = DEMO_GRID): Promise<Timed> {
  const design = loadDesign(file);
  const axes = grid.map((g) => resolveVaryAxis(parseVarySpec(g), design));
  const cpu0 = cpuSeconds();
  const t0 = performance.now();
  let firstPoint_s = NaN;
  const result = await runSweep(design, axes, {
    threads,
    onProgress: () => {
      if (Number.isNaN(firstPoint_s)) firstPoint_s = (performance.now() - t0) / 1000;
    },
  });
  return { result, wall_s: (performance.now() - t0) / 1000, cpu_s: cpuSeconds() - cpu0, firstPoint_s };
}

export default defineBench({
  name: 'sweep 100 × 100',
  async run(): Promise<BenchRow[]> {
    const load = loadavg()[0]!.toFixed(1);
    const main = await timed(0);
    const one = await timed(1);
    const two = await timed(2);
    const failed = (r: SweepResult) => r.rows.filter((x) => !x.outcome.ok).length;
    const same = isDeepStrictEqual(one.result.rows, two.result.rows) && isDeepStrictEqual(main.result.rows, one.result.rows);
    const row = (label: string, t: Timed, what = `demo ${N} × ${N} grid`): BenchRow => ({
      name: `${what}, ${label}: wall-clock time`,
      value: t.result.completed === t.result.total ? t.wall_s : NaN,
      unit: 's',
      note: `${(t.result.total / t.wall_s).toFixed(t.result.total >= 1000 ? 0 : 2)} points per wall-clock second; CPU time of all threads ${t.cpu_s.toFixed(1)} s; first point after ${t.firstPoint_s.toFixed(1)} s (worker start-up); ${failed(t.result)} points failed; load average ${load} at the start`,
    });
    const g0 = await timed(0, GEOMETRY, GEOMETRY_GRID);
    const g1 = await timed(1, GEOMETRY, GEOMETRY_GRID);
    const g2 = await timed(2, GEOMETRY, GEOMETRY_GRID);
    const gSame = isDeepStrictEqual(g1.result.rows, g2.result.rows) && isDeepStrictEqual(g0.result.rows, g1.result.rows);
    const heavy = `geometry station 13 × 12 grid (layers × voltage)`;
    return [
      row('main thread', main),
      row('1 worker thread', one),
      row('2 worker threads', two),
      {
        name: `demo ${N} × ${N} grid: speed-up of the second worker (wall time 1 worker / 2 workers)`,
        value: same ? one.wall_s / two.wall_s : NaN,
        unit: 'x',
        note: `rows of the main-thread, 1-worker and 2-worker runs ${same ? 'identical' : 'DIFFER'}; 2 cores shared with other work`,
      },
      row('main thread', g0, heavy),
      row('1 worker thread', g1, heavy),
      row('2 worker threads', g2, heavy),
      {
        name: `${heavy}: speed-up of the second worker (wall time 1 worker / 2 workers)`,
        value: gSame ? g1.wall_s / g2.wall_s : NaN,
        unit: 'x',
        note: `rows ${gSame ? 'identical' : 'DIFFER'} across the three runs; each point builds the fixture from geometry (tens of CPU-milliseconds per point)`,
      },
    ];
  },
});
