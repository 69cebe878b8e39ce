/**
 * The same 100-point capacitance sweep by ngspice and by fluxkick, both checked against the closed form.
 *
 * Circuit: the demo station (examples/demo-station.yaml) as a series RLC (no device thresholds, no freewheel
 * diode, constant coil resistance; the switch's slope resistance is a linear part of the loop resistance): the thyristor stops the current at its first zero,
 * so the closed form of the series RLC natural response (Nilsson & Riedel) is exact for peak current and time.
 * Capacitance 0.5 mF to 10.4 mF in 100 steps of 0.1 mF, 1.6 kV.
 *
 * ngspice: ONE process (`ngspice -b`) loops over the 100 values itself (.control `while` loop: alter C1, tran,
 * peak from its own samples refined by a parabola; tests/support/ngspice.ts capacitanceSweepDeck), RELTOL 1e-6,
 * largest step a 2000th of the half-wave; timed as a whole (process start to exit): CPU time of the ngspice process
 * (user + system, from bash's `times`), wall-clock time in the note.
 * fluxkick: 100 simulateShot calls in this process, figures only (samples = 0), default tolerances (relTol 1e-9);
 * CPU time of this process during the 100 calls.
 * Warm-up first (the JavaScript engine compiles the hot code; the OS caches ngspice and its code models). ngspice:
 * three timed runs, median CPU time; fluxkick: the sweep repeated for at least 2 CPU-seconds, median CPU time. Target: fluxkick at least 50× faster at equal or
 * better accuracy (largest relative error of the peak current and of its time over the 100 points).
 */
import { simulateShot, type Station } from '../packages/core/src/index.js';
import { capacitanceSweepDeck, ngspiceStatus, parseSweep, runNgspice } from '../tests/support/ngspice.js';
import { closedFormPeak, demoSeriesRlc } from './shots.bench.js';
import { defineBench, timeIt, type BenchRow } from './harness.js';

const POINTS = 100;
const REPEATS = 3;

const median = (xs: number[]) => {
  const s = [...xs].sort((a, b) => a - b);
  return s.length % 2 ? s[s.length >> 1] : (s[s.length / 2 - 1] + s[s.length / 2]) / 2;
};


interface SweepErrors {
  peak: number;
  time: number;
}

function errorsAgainstClosedForm(base: Station, points: { capacitance_F: number; peakCurrent_A: number; timeOfPeak_s: number }[]): SweepErrors {
  let peak = 0;
  let time = 0;
  for (const p of points) {
    const cf = closedFormPeak({ ...base, bank: { ...base.bank, capacitance_F: p.capacitance_F } });
    peak = Math.max(peak, Math.abs(p.peakCurrent_A / cf.peakCurrent_A - 1));
    time = Math.max(time, Math.abs(p.timeOfPeak_s / cf.timeOfPeak_s - 1));
  }
  return { peak, time };
}

export default defineBench({
  name: 'sweep: ngspice vs fluxkick',
  run(): BenchRow[] {
    const status = ngspiceStatus();
    if (!status.path) throw new Error(status.message);
    const base = demoSeriesRlc();
    const caps = Array.from({ length: POINTS }, (_, k) => Math.round((0.5e-3 + k * 0.1e-3) * 1e7) / 1e7);

    // ngspice: one process per sweep.
    const deck = capacitanceSweepDeck(base, caps);
    const ngTimes: number[] = [];
    let ngPoints: ReturnType<typeof parseSweep> = [];
    const ngWall: number[] = [];
    runNgspice(deck, { timeout_ms: 600_000 }); // warm-up
    for (let k = 0; k < REPEATS; k++) {
      const run = runNgspice(deck, { timeout_ms: 600_000, measureCpu: true });
      if (run.cpu_s === null) throw new Error('could not read the CPU time of ngspice (bash `times`)');
      ngTimes.push(run.cpu_s);
      ngWall.push(run.wall_s);
      ngPoints = parseSweep(run.stdout);
    }
    if (ngPoints.length !== POINTS || ngPoints.some((p) => !p || !Number.isFinite(p.peakCurrent_A))) {
      throw new Error(`ngspice returned ${ngPoints.filter(Boolean).length} of ${POINTS} sweep points`);
    }

    // fluxkick: 100 shots in-process, the sweep repeated (warm-up of 1 CPU-second first) for at least 2 CPU-seconds.
    let fkPoints: { capacitance_F: number; peakCurrent_A: number; timeOfPeak_s: number }[] = [];
    let method = '';
    const sweep = () => {
      fkPoints = caps.map((c) => {
        const r = simulateShot({ ...base, bank: { ...base.bank, capacitance_F: c } });
        method = r.solver.method;
        return { capacitance_F: c, peakCurrent_A: r.figures.peakCurrent_A, timeOfPeak_s: r.figures.timeOfPeak_s };
      });
    };
    const fk = timeIt(sweep, { minTime_s: 2, minRuns: 5, warmup: 1, warmup_s: 1 });

    const tNg = median(ngTimes);
    const tFk = fk.median_s;
    const eNg = errorsAgainstClosedForm(base, ngPoints);
    const eFk = errorsAgainstClosedForm(base, fkPoints);
    return [
      {
        name: `ngspice, ${POINTS}-point sweep in one process: CPU time`,
        value: tNg,
        unit: 's',
        note: `median of ${REPEATS} CPU times ${ngTimes.map((t) => t.toFixed(3)).join(', ')} s; wall ${ngWall.map((t) => t.toFixed(3)).join(', ')} s`,
      },
      {
        name: `fluxkick, ${POINTS} shots in-process: CPU time`,
        value: tFk,
        unit: 's',
        note: `median CPU time of ${fk.runs} sweeps; ${(fk.totalWall_s / fk.runs).toFixed(4)} s wall per sweep on average; integrator ${method}`,
      },
      { name: 'time ratio ngspice / fluxkick', value: tNg / tFk, unit: 'x', target: { op: '>=', value: 50 } },
      { name: 'ngspice: largest peak-current error vs closed form', value: eNg.peak, unit: 'relative' },
      { name: 'fluxkick: largest peak-current error vs closed form', value: eFk.peak, unit: 'relative', target: { op: '<=', value: eNg.peak } },
      { name: 'ngspice: largest time-of-peak error vs closed form', value: eNg.time, unit: 'relative' },
      { name: 'fluxkick: largest time-of-peak error vs closed form', value: eFk.time, unit: 'relative', target: { op: '<=', value: eNg.time } },
    ];
  },
});
