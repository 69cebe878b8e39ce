import { describe, expect, it } from 'vitest';
import { isInputError } from '../design/errors.js';
import { isPositiveDefinite } from '../design/to-station.js';
import { DEFAULT_SOLVER, type Station } from '../model/station.js';
import { simulateShot } from '../solve/shot.js';
import { BODY_METALS, magnetBodyMaterial } from './body-materials.js';
import { layersField, volumeFieldStats } from './coil-field.js';
import { layersInductance_H } from './coil-inductance.js';
import { MU0_HpM } from './constants.js';
import { buildFixture, type FixtureGeometrySpec } from './fixture.js';
import { resolveWinding, type WindingSpec } from './winding.js';

const winding: WindingSpec = { innerRadius_m: 0.014, layers: 10, turnsPerLayer: 20, length_m: 0.032, conductor: { shape: 'round', diameter_m: 1.5e-3, insulationBuild_m: 0.1e-3 } };
const ndfeb = magnetBodyMaterial('ndfeb-sintered', 1.4e-6, 'sintered NdFeB');

describe('buildFixture(spec): coil only', () => {
  const f = buildFixture({ windings: [winding] });
  const w = resolveWinding(winding);

  it("the coil's L, R20, heat capacity and conductor come from the winding (coil-inductance.ts, winding.ts)", () => {
    expect(f.coil.inductance_H).toBe(layersInductance_H(w.layerList));
    expect(f.coil.resistance20_Ohm).toBe(w.resistance20_Ohm);
    expect(f.coil.heatCapacity_JpK).toBe(w.heatCapacity_JpK);
    expect(f.coil.conductor).toBe('copper');
    expect(f.coil.tempCoeff_perK).toBeCloseTo(0.00393, 12);
    expect(f.coupled).toEqual([]);
  });

  it('without a part, probe 0 is the centre of the winding, and a note says so', () => {
    expect(f.probes).toHaveLength(1);
    expect(f.probes[0].name).toBe('part');
    expect(f.probes[0].coil_ApmPerA).toBe(layersField(w.layerList, 0, 0).hz);
    expect(f.info.notes.some((n) => n.includes('No part geometry'))).toBe(true);
  });

  it('lists Wheeler multilayer and Montgomery beside ours; Montgomery agrees within 1 % (discrete turns vs uniform density)', () => {
    const names = f.info.estimates.map((e) => e.formula);
    expect(names).toContain('Wheeler multilayer');
    const m = f.info.estimates.find((e) => e.quantity === 'centreField_ApmPerA')!;
    expect(Math.abs(m.value / m.ours - 1)).toBeLessThan(0.01);
  });
});

describe('buildFixture(spec): part, bodies, probes', () => {
  const spec: FixtureGeometrySpec = {
    windings: [winding],
    part: { innerRadius_m: 0, outerRadius_m: 0.01, length_m: 0.02, material: ndfeb, radialShells: 6, axialSlices: 2 },
    bodies: [{ name: 'sleeve', innerRadius_m: 0.0105, outerRadius_m: 0.012, length_m: 0.024, material: BODY_METALS.stainless, radialShells: 2, axialSlices: 2 }],
    points: [{ name: 'coil end', r_m: 0, z_m: 0.016 }],
    initialTemperature_C: 25,
  };
  const f = buildFixture(spec);
  const w = resolveWinding(winding);

  it('makes one loop per cell (part 6 × 2, sleeve 2 × 2) at the given temperature, with a symmetric positive definite matrix', () => {
    expect(f.coupled).toHaveLength(16);
    expect(f.coupled[0].name).toBe('part r1 z1');
    expect(f.coupled[12].name).toBe('sleeve r1 z1');
    expect(f.coupled.every((l) => l.initialTemperature_C === 25)).toBe(true);
    for (let i = 0; i < 16; i++) for (let j = 0; j < 16; j++) expect(f.loopMutual_H[i][j]).toBe(f.loopMutual_H[j][i]);
    const A = [[f.coil.inductance_H, ...f.coupled.map((l) => l.mutualToCoil_H)], ...f.coupled.map((l, k) => [l.mutualToCoil_H, ...f.loopMutual_H[k]])];
    expect(isPositiveDefinite(A)).toBe(true);
  });

  it('probes: part centre, part surface, the weakest point, then the named point; each with a field per ampere for every loop', () => {
    expect(f.probes.map((p) => p.name)).toEqual(['part', 'part surface', 'part weakest point', 'coil end']);
    for (const p of f.probes) expect(p.loops_ApmPerA).toHaveLength(16);
    expect(f.probes[0].coil_ApmPerA).toBe(layersField(w.layerList, 0, 0).hz);
  });

  it('the static field over the part (lattice sums) matches the direct per-turn sums within 1e-5', () => {
    const direct = volumeFieldStats((r, z) => layersField(w.layerList, r, z), f.info.part!);
    expect(f.info.partField!.mean_ApmPerA / direct.mean_ApmPerA).toBeCloseTo(1, 5);
    expect(f.info.partField!.min_ApmPerA / direct.min_ApmPerA).toBeCloseTo(1, 5);
  });

  it('reports each body: the part’s diffusion time is µ0·σ·a², the sleeve’s µ0·σ·t·r/2 (thin wall)', () => {
    const [part, sleeve] = f.info.bodies;
    expect(part.isPart).toBe(true);
    expect(part.diffusionTime_s).toBeCloseTo((MU0_HpM / 1.4e-6) * 0.01 ** 2, 15);
    expect(sleeve.diffusionTime_s).toBeCloseTo(((MU0_HpM / 7.2e-7) * 0.0015 * 0.01125) / 2, 15);
    expect(sleeve.firstLoop).toBe(12);
    expect(sleeve.loopCount).toBe(4);
  });

  it("sign convention: a loop current in the coil’s sense adds field at the centre and links the coil positively (induced currents then come out negative)", () => {
    // same convention as the coil: a loop's positive current makes a positive axial field at the centre
    expect(f.probes[0].loops_ApmPerA.every((h) => h > 0)).toBe(true);
    expect(f.coupled.every((l) => l.mutualToCoil_H > 0)).toBe(true);
  });
});

describe('buildFixture(spec): several windings', () => {
  const coilAt = (centre: number, sense: 'aiding' | 'opposing'): WindingSpec => ({ innerRadius_m: 0.05, layers: 2, turnsPerLayer: 5, length_m: 0.005, centre_m: centre, conductor: { shape: 'round', diameter_m: 0.9e-3 }, sense });

  it('a Helmholtz-spaced pair aiding: field at the centre within 1 % of (4/5)^{3/2}·N/R (thin-coil idealisation of REFERENCES.md)', () => {
    const R = 0.05 + 0.9e-3; // mean radius of the two layers
    const f = buildFixture({ windings: [coilAt(-R / 2, 'aiding'), coilAt(R / 2, 'aiding')] });
    expect(Math.abs(f.probes[0].coil_ApmPerA / ((4 / 5) ** 1.5 * (10 / R)) - 1)).toBeLessThan(0.01);
  });

  it('the same pair opposing: zero field at the centre (symmetry) and L = L1 + L2 − 2|M| < aiding', () => {
    const R = 0.05;
    const aid = buildFixture({ windings: [coilAt(-R / 2, 'aiding'), coilAt(R / 2, 'aiding')] });
    const opp = buildFixture({ windings: [coilAt(-R / 2, 'aiding'), coilAt(R / 2, 'opposing')] });
    expect(Math.abs(opp.probes[0].coil_ApmPerA)).toBeLessThan(1e-9 * aid.probes[0].coil_ApmPerA);
    const [L1, L2] = opp.info.windingInductances_H;
    const M = (aid.coil.inductance_H - L1 - L2) / 2;
    expect(opp.coil.inductance_H).toBeCloseTo(L1 + L2 - 2 * M, 15);
    expect(opp.coil.inductance_H).toBeLessThan(aid.coil.inductance_H);
  });
});

describe('buildFixture(spec): bad geometry', () => {
  const expectInputError = (spec: FixtureGeometrySpec, path: string) => {
    let err: unknown;
    try {
      buildFixture(spec);
    } catch (e) {
      err = e;
    }
    expect(isInputError(err)).toBe(true);
    expect((err as { path: string }).path).toBe(path);
  };
  it('a body overlapping the winding', () => {
    expectInputError({ windings: [winding], bodies: [{ name: 'housing', innerRadius_m: 0.02, outerRadius_m: 0.04, length_m: 0.01, material: BODY_METALS.aluminium }] }, 'bodies[0]');
  });
  it('an insulating part overlapping the winding', () => {
    expectInputError({ windings: [winding], part: { innerRadius_m: 0, outerRadius_m: 0.02, length_m: 0.01 } }, 'part');
  });
  it('two bodies with one name', () => {
    const b = { name: 'hub', innerRadius_m: 0.001, outerRadius_m: 0.002, length_m: 0.01, material: BODY_METALS.aluminium };
    expectInputError({ windings: [winding], bodies: [b, { ...b, innerRadius_m: 0.003, outerRadius_m: 0.004 }] }, 'bodies[1].name');
  });
  it('a winding error carries the winding’s path', () => {
    expectInputError({ windings: [{ ...winding, turnsPerLayer: 99 }] }, 'windings[0].turnsPerLayer');
  });
  it('no winding', () => {
    expectInputError({ windings: [] }, 'windings');
  });
  it('a steel body is accepted with a note about its permeability', () => {
    const f = buildFixture({ windings: [winding], bodies: [{ name: 'shaft', innerRadius_m: 0, outerRadius_m: 0.004, length_m: 0.05, material: BODY_METALS.steel, radialShells: 2 }] });
    expect(f.info.notes.some((n) => n.includes('ferromagnetic'))).toBe(true);
  });
});

describe('a shot with conductive bodies (through the engine, solve/shot.ts)', () => {
  const f = buildFixture({
    windings: [winding],
    part: { innerRadius_m: 0, outerRadius_m: 0.01, length_m: 0.02, material: ndfeb, radialShells: 6, axialSlices: 2 },
    bodies: [{ name: 'sleeve', innerRadius_m: 0.0105, outerRadius_m: 0.012, length_m: 0.024, material: BODY_METALS.copper, radialShells: 2, axialSlices: 1 }],
  });
  const station = (withLoops: boolean): Station => ({
    name: 'Tessaro Motori rotor station (invented)',
    bank: { capacitance_F: 2200e-6, voltage_V: 1000, esr_Ohm: 4e-3, esl_H: 0.2e-6 },
    switch: { kind: 'thyristor', thresholdVoltage_V: 1.2, slopeResistance_Ohm: 0.4e-3 },
    freewheel: { position: 'fixture', thresholdVoltage_V: 0.9, slopeResistance_Ohm: 0.3e-3 },
    cable: { resistance_Ohm: 3e-3, inductance_H: 1.5e-6 },
    coil: { ...f.coil, initialTemperature_C: 20 },
    coupled: withLoops ? f.coupled : [],
    loopMutual_H: withLoops ? f.loopMutual_H : [],
    probes: f.probes.map((p) => ({ ...p, loops_ApmPerA: withLoops ? p.loops_ApmPerA : [] })),
    solver: { ...DEFAULT_SOLVER, samples: 400 },
  });
  const shot = simulateShot(station(true));
  const bare = simulateShot(station(false));

  it('closes the energy balance with the loops’ losses included (conservation; the engine’s own tolerance 1e-6)', () => {
    expect(shot.energy.relativeError).toBeLessThan(1e-6);
    expect(shot.energy.dissipated_J.loops).toHaveLength(f.coupled.length);
    expect(shot.energy.dissipated_J.loops.every((e) => e >= 0)).toBe(true);
    expect(shot.energy.dissipated_J.loops.reduce((a, b) => a + b, 0)).toBeGreaterThan(0);
  });

  it("the bodies shield the part: the centre field peaks later and lower than the surface field (lag and shortfall)", () => {
    const centre = shot.probes[0];
    const surface = shot.probes[1];
    expect(centre.peakField_Apm).toBeLessThan(surface.peakField_Apm);
    expect(centre.timeOfPeak_s).toBeGreaterThan(surface.timeOfPeak_s);
    // without bodies, the same coil gives the static ratio of centre to surface field per ampere
    expect(bare.probes[0].peakField_Apm / bare.probes[1].peakField_Apm).toBeCloseTo(f.probes[0].coil_ApmPerA / f.probes[1].coil_ApmPerA, 6);
  });

  it('each body heats: every loop ends warmer than it started', () => {
    expect(shot.loops.every((l) => l.temperatureRise_K > 0)).toBe(true);
  });
});
