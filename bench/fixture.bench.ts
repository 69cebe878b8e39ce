/**
 * Fixture from geometry: time to build the network (magnetics/fixture.ts buildFixture) of a 20-layer × 40-turn
 * coil around a conductive part cut into 16 shells, and the time of one shot with it (solve/shot.ts).
 *
 *   network ≤ 50 ms: coil inductance (800 turns: 20·21/2 layer pairs by Toeplitz sums instead of 320,000 filament
 *                    pairs), the part's 16 loops (cells, mutuals, coil coupling by lattice sums), the probes and
 *                    the field over the part's volume;
 *   shot ≤ 20 ms:    simulateShot of a station with that coil and the 16 loops, figures only (samples = 0).
 *
 * Also reported (no target): the same with the default axial slicing (32 loops), the pieces of the build, and
 * the energy balance of the shot. Times are CPU seconds of this process (bench/harness.ts timeIt).
 * Invented station (round numbers). Run: npx tsx bench/fixture.bench.ts   (or: pnpm bench fixture)
 */
import { pathToFileURL } from 'node:url';
import { buildFixture, type FixtureGeometrySpec } from '../packages/core/src/magnetics/fixture.js';
import { magnetBodyMaterial } from '../packages/core/src/magnetics/body-materials.js';
import { layersInductance_H } from '../packages/core/src/magnetics/coil-inductance.js';
import { buildShellNetwork, meshBody } from '../packages/core/src/magnetics/shells.js';
import { resolveWinding } from '../packages/core/src/magnetics/winding.js';
import { simulateShot } from '../packages/core/src/solve/shot.js';
import { DEFAULT_SOLVER, type Station } from '../packages/core/src/model/station.js';
import { defineBench, timeIt, type BenchRow } from './harness.js';

const ndfeb = magnetBodyMaterial('ndfeb-sintered', 1.4e-6, 'sintered NdFeB');

/** 20 layers × 40 turns of 0.95 mm wire (0.05 mm build) on a 14 mm bore; a 20 mm NdFeB part of 10 mm radius. */
export function benchSpec(axialSlices: number | 'default'): FixtureGeometrySpec {
  return {
    windings: [{ innerRadius_m: 0.014, layers: 20, turnsPerLayer: 40, length_m: 0.04, conductor: { shape: 'round', diameter_m: 0.95e-3, insulationBuild_m: 0.05e-3 } }],
    part: { innerRadius_m: 0, outerRadius_m: 0.01, length_m: 0.02, material: ndfeb, radialShells: 16, ...(axialSlices === 'default' ? {} : { axialSlices }) },
  };
}

export function benchStation(spec: FixtureGeometrySpec, method: Station['solver']['method'] = 'auto'): Station {
  const f = buildFixture(spec);
  return {
    name: 'Brightwater Actuators, bench fixture (invented)',
    bank: { capacitance_F: 1e-3, voltage_V: 2000, esr_Ohm: 5e-3, esl_H: 0.2e-6 },
    switch: { kind: 'thyristor', thresholdVoltage_V: 1.2, slopeResistance_Ohm: 0.4e-3 },
    freewheel: { position: 'fixture', thresholdVoltage_V: 0.9, slopeResistance_Ohm: 0.3e-3 },
    cable: { resistance_Ohm: 5e-3, inductance_H: 2e-6 },
    coil: { ...f.coil, initialTemperature_C: 25 },
    coupled: f.coupled,
    loopMutual_H: f.loopMutual_H,
    probes: f.probes,
    solver: { ...DEFAULT_SOLVER, samples: 0, method },
  };
}

const ms = (s: number) => s * 1e3;

const suite = defineBench({
  name: 'fixture from geometry',
  run(): BenchRow[] {
    const rows: BenchRow[] = [];
    const spec = benchSpec(1);
    const f = buildFixture(spec);
    if (!Number.isFinite(f.coil.inductance_H) || f.coupled.some((l) => !Number.isFinite(l.mutualToCoil_H))) return [{ name: 'network', value: NaN, unit: 'ms' }];
    const tNet = timeIt(() => buildFixture(spec), { minTime_s: 2, minRuns: 5, warmup: 2 });
    rows.push({
      name: 'build network: 20 × 40-turn coil + part in 16 shells (16 loops)',
      value: ms(tNet.median_s),
      unit: 'ms',
      target: { op: '<=', value: 50 },
      note: `L = ${(f.coil.inductance_H * 1e3).toFixed(3)} mH, ${f.coupled.length} loops, ${f.probes.length} probes, ${f.info.couplingEvaluations} coupling kernel calls; ${tNet.runs} builds, median CPU time`,
    });
    const w = resolveWinding(spec.windings[0]!);
    const tL = timeIt(() => layersInductance_H(w.layerList), { minTime_s: 1, minRuns: 5 });
    rows.push({ name: '  of which: coil inductance, 800 turns', value: ms(tL.median_s), unit: 'ms', note: '20·21/2 layer pairs, ≤ 79 Maxwell evaluations each (Toeplitz sums)' });
    const mesh = meshBody({ name: 'part', innerRadius_m: 0, outerRadius_m: 0.01, length_m: 0.02, material: ndfeb, radialShells: 16, axialSlices: 1 });
    const tS = timeIt(() => buildShellNetwork([mesh], w.layerList), { minTime_s: 1, minRuns: 5 });
    rows.push({ name: '  of which: eddy network (cells, mutuals, coil coupling)', value: ms(tS.median_s), unit: 'ms' });

    const spec2 = benchSpec('default');
    const f2 = buildFixture(spec2);
    const tNet2 = timeIt(() => buildFixture(spec2), { minTime_s: 1, minRuns: 3, warmup: 1 });
    rows.push({ name: 'build network: same, default axial slicing', value: ms(tNet2.median_s), unit: 'ms', note: `${f2.coupled.length} loops (16 shells × ${f2.info.bodies[0]!.axialSlices} slices)` });

    // 'auto' (the engine picks its stiff integrator for eddy networks); the explicit odex takes seconds here
    for (const method of ['auto'] as const) {
      const st = benchStation(spec, method);
      const first = simulateShot(st);
      const bad = Object.entries(first.figures).find(([, v]) => !Number.isFinite(v));
      if (bad) {
        rows.push({ name: `shot (${method}): figure ${bad[0]}`, value: NaN, unit: 'ms' });
        continue;
      }
      const tShot = timeIt(() => simulateShot(st), { minTime_s: 2, minRuns: 3, warmup: 1 });
      rows.push({
        name: `one shot with the 16-loop network, method ${method}`,
        value: ms(tShot.median_s),
        unit: 'ms',
        ...(method === 'auto' ? { target: { op: '<=' as const, value: 20 } } : {}),
        note: `integrator that ran: ${first.solver.method}, ${first.solver.steps} steps; peak ${first.figures.peakCurrent_A.toFixed(0)} A, field at the part ${(first.figures.peakField_Apm / 1e6).toFixed(2)} MA/m; energy balance ${first.energy.relativeError.toExponential(1)}`,
      });
    }
    return rows;
  },
});
export default suite;

// standalone: npx tsx bench/fixture.bench.ts
if (process.argv[1] && import.meta.url === pathToFileURL(process.argv[1]).href) {
  const rows = await suite.run();
  let failed = false;
  for (const r of rows) {
    const ok = Number.isFinite(r.value) && (!r.target || (r.target.op === '<=' ? r.value <= r.target.value : r.value >= r.target.value));
    if (!Number.isFinite(r.value)) failed = true;
    const target = r.target ? `  (target ${r.target.op} ${r.target.value} ${r.unit}: ${ok ? 'met' : 'MISSED'})` : '';
    console.log(`${r.name}: ${Number.isFinite(r.value) ? r.value.toFixed(2) : 'NaN'} ${r.unit}${target}${r.note ? `\n    ${r.note}` : ''}`);
  }
  if (failed) process.exit(1);
}
