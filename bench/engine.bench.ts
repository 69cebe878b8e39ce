/**
 * Quick throughput check of the discharge engine (one thread): shots per second for a typical
 * station without loops (figures only, samples = 0) and with 8 coupled loops.
 * Run: npx tsx bench/engine.bench.ts
 * Invented stations (round numbers); the benchmark fails (exit 1) on a NaN figure.
 */
import { simulateShot } from '../packages/core/src/solve/shot.js';
import { DEFAULT_SOLVER, type Station } from '../packages/core/src/model/station.js';

function station(nLoops: number): Station {
  const coupled = Array.from({ length: nLoops }, (_, k) => ({
    name: `shell ${k + 1}`,
    inductance_H: 40e-9 * (1 + k * 0.3),
    mutualToCoil_H: 2.0e-6 * (1 + k * 0.25) * 0.6,
    resistance20_Ohm: 40e-6 * (1 + k * 0.2),
    tempCoeff_perK: 0.004,
    heatCapacity_JpK: 5,
    initialTemperature_C: 25,
  }));
  const loopMutual_H = coupled.map((a, j) =>
    coupled.map((b, k) => (j === k ? 0 : 0.6 * Math.sqrt(a.inductance_H * b.inductance_H) * Math.exp(-Math.abs(j - k) * 0.3))),
  );
  return {
    name: `bench ${nLoops} loops`,
    bank: { capacitance_F: 2.2e-3, voltage_V: 1600, esr_Ohm: 4e-3, esl_H: 0.2e-6 },
    switch: { kind: 'thyristor', thresholdVoltage_V: 1.2, slopeResistance_Ohm: 0.4e-3 },
    freewheel: { position: 'fixture', thresholdVoltage_V: 0.9, slopeResistance_Ohm: 0.3e-3 },
    cable: { resistance_Ohm: 3e-3, inductance_H: 1.5e-6 },
    coil: {
      inductance_H: 180e-6,
      resistance20_Ohm: 25e-3,
      tempCoeff_perK: 0.00393,
      heatCapacity_JpK: 800,
      initialTemperature_C: 25,
    },
    coupled,
    loopMutual_H,
    probes: [{ name: 'part', coil_ApmPerA: 95, loops_ApmPerA: coupled.map(() => -30) }],
    solver: { ...DEFAULT_SOLVER, samples: 0 },
  };
}

function bench(label: string, st: Station, seconds: number): void {
  const first = simulateShot(st);
  for (const [k, v] of Object.entries(first.figures)) {
    if (!Number.isFinite(v)) {
      console.error(`${label}: figure ${k} is not finite`);
      process.exit(1);
    }
  }
  // CPU time of this process (the machine may be shared): user + system, s
  const cpu = () => {
    const u = process.cpuUsage();
    return (u.user + u.system) / 1e6;
  };
  let n = 0;
  const t0 = cpu();
  while (cpu() - t0 < seconds) {
    for (let k = 0; k < 20; k++) simulateShot(st);
    n += 20;
  }
  const dt = cpu() - t0;
  const s = first.solver;
  console.log(
    `${label}: ${(n / dt).toFixed(0)} shots per CPU-second (${s.method}, ${s.steps} steps, ${s.functionEvaluations} evaluations, ` +
      `${s.events} events, peak ${first.figures.peakCurrent_A.toFixed(1)} A, balance ${first.energy.relativeError.toExponential(1)})`,
  );
}

// optional argument: which case to run (0, 1, 2); default all
const only = process.argv[2] === undefined ? -1 : Number(process.argv[2]);
const cases: [string, Station, number][] = [
  ['no loops, samples = 0', station(0), 3],
  ['8 coupled loops, samples = 0', station(8), 3],
  ['no loops, samples = 2000', { ...station(0), solver: { ...DEFAULT_SOLVER, samples: 2000 } }, 2],
];
cases.forEach(([label, st, sec], i) => {
  if (only < 0 || only === i) bench(label, st, sec);
});
