/**
 * Discharge-engine throughput, one thread: shots per CPU-second of simulateShot (bench/harness.ts timeIt) on
 *   (a) the demo station (examples/demo-station.yaml) with figures only (Station.solver.samples = 0),
 *       target >= 5,000 shots/s;
 *   (b) the same station with eight coupled eddy-current loops (a conductive part cut into eight shells,
 *       tests/reference/ngspice-circuits.ts), target >= 200 shots/s;
 * for each integrator (Station.solver.method 'odex', 'stiff', and 'auto', the default, which picks one by the
 * stiffness of the loop network; the note says which one actually ran), and the
 * accuracy of the linear case: the demo with zero device thresholds, no freewheel diode and constant coil
 * resistance is a series RLC whose thyristor stops at the first current zero, so the closed
 * form (Nilsson & Riedel, natural response of the series RLC circuit) is exact: relative error of the peak
 * current and of its time.
 */
import { fileURLToPath } from 'node:url';
import { designToStation, loadDesign, simulateShot, type Station } from '../packages/core/src/index.js';
import { eddyShellLoops, seriesRlc } from '../tests/reference/ngspice-circuits.js';
import { defineBench, timeIt, type BenchRow } from './harness.js';

const DEMO = fileURLToPath(new URL('../examples/demo-station.yaml', import.meta.url));
const METHODS = ['odex', 'stiff', 'auto'] as const;

export function demoStation(): Station {
  const st = designToStation(loadDesign(DEMO));
  return { ...st, solver: { ...st.solver, samples: 0 } };
}

/** The demo with `count` eddy shells in the part (constant loop resistances; the coil keeps its own). */
export function demoWithLoops(count = 8): Station {
  const st = demoStation();
  const shells = eddyShellLoops({ count, coilInductance_H: st.coil.inductance_H });
  return {
    ...st,
    coupled: shells.coupled,
    loopMutual_H: shells.loopMutual_H,
    probes: [{ ...st.probes[0], loops_ApmPerA: shells.loopField_ApmPerA }],
  };
}

/**
 * The demo reduced to a series RLC: no device thresholds, no freewheel diode, constant coil resistance. The
 * switch keeps its slope resistance r_T (a linear resistance in the loop; ngspice's switch model needs one).
 */
export function demoSeriesRlc(): Station {
  const st = demoStation();
  return {
    ...st,
    switch: { ...st.switch, kind: 'thyristor', thresholdVoltage_V: 0 },
    freewheel: null,
    coil: { ...st.coil, tempCoeff_perK: 0 },
  };
}

/** Closed-form peak of a series-RLC station (resistance at the initial temperature; tempCoeff must be 0). */
export function closedFormPeak(st: Station): { peakCurrent_A: number; timeOfPeak_s: number } {
  const R = st.bank.esr_Ohm + st.switch.slopeResistance_Ohm + st.cable.resistance_Ohm + st.coil.resistance20_Ohm;
  const L = st.bank.esl_H + st.cable.inductance_H + st.coil.inductance_H;
  return seriesRlc(st.bank.capacitance_F, st.bank.voltage_V, R, L);
}

export default defineBench({
  name: 'engine shots',
  run(): BenchRow[] {
    const rows: BenchRow[] = [];
    const plain = demoStation();
    const loops = demoWithLoops(8);
    const rlc = demoSeriesRlc();
    const cf = closedFormPeak(rlc);
    for (const method of METHODS) {
      const withMethod = (s: Station): Station => ({ ...s, solver: { ...s.solver, method } });
      const a = withMethod(plain);
      const ranA = simulateShot(a).solver.method;
      const tA = timeIt(() => simulateShot(a), { minTime_s: 2, minRuns: 5, batch: 5 });
      rows.push({
        name: `demo, figures only, method ${method}: shots per second`,
        value: tA.perSecond,
        unit: 'shots/s',
        target: { op: '>=', value: 5000 },
        note: `integrator that ran: ${ranA}; ${tA.runs} shots, median CPU time of batches of 5; ${tA.perWallSecond.toFixed(0)} per wall-clock second`,
      });
      const b = withMethod(loops);
      const ranB = simulateShot(b).solver.method;
      const tB = timeIt(() => simulateShot(b), { minTime_s: 2, minRuns: 3, warmup: 1 });
      rows.push({
        name: `demo + 8 coupled loops, method ${method}: shots per second`,
        value: tB.perSecond,
        unit: 'shots/s',
        target: { op: '>=', value: 200 },
        note: `integrator that ran: ${ranB}; ${tB.runs} shots, median CPU time; ${tB.perWallSecond.toFixed(1)} per wall-clock second`,
      });
      const r = simulateShot(withMethod(rlc));
      rows.push({
        name: `demo as series RLC, method ${method}: peak current relative error vs closed form`,
        value: Math.abs(r.figures.peakCurrent_A / cf.peakCurrent_A - 1),
        unit: 'relative',
        target: { op: '<=', value: 1e-6 },
        note: `closed form ${cf.peakCurrent_A.toFixed(3)} A (Nilsson & Riedel); integrator ${r.solver.method}`,
      });
      rows.push({
        name: `demo as series RLC, method ${method}: time of peak relative error vs closed form`,
        value: Math.abs(r.figures.timeOfPeak_s / cf.timeOfPeak_s - 1),
        unit: 'relative',
        target: { op: '<=', value: 1e-6 },
        note: `closed form ${(cf.timeOfPeak_s * 1e3).toFixed(6)} ms`,
      });
    }
    return rows;
  },
});
