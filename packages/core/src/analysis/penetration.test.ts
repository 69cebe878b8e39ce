import { describe, expect, it } from 'vitest';
import { magnetBodyMaterial } from '../magnetics/body-materials.js';
import { buildFixture } from '../magnetics/fixture.js';
import { DEFAULT_SOLVER, type Station } from '../model/station.js';
import { simulateShot } from '../solve/shot.js';
import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { parseDesign } from '../design/parse.js';
import { simulateDesign } from './design-shot.js';
import { penetrationFigures, penetrationText, skinDepth_m } from './penetration.js';

describe('skinDepth_m(ρ, f)', () => {
  it('copper (ρ20 = 1.7241e-8 Ω·m): 9.35 mm at 50 Hz and 8.53 mm at 60 Hz (REFERENCES.md, printed to 0.01 mm)', () => {
    expect(skinDepth_m(1.7241e-8, 50) * 1e3).toBeCloseTo(9.35, 2);
    expect(skinDepth_m(1.7241e-8, 60) * 1e3).toBeCloseTo(8.53, 2);
  });
  it('falls as 1/√f and as 1/√µr', () => {
    expect(skinDepth_m(1e-7, 400) / skinDepth_m(1e-7, 100)).toBeCloseTo(0.5, 12);
    expect(skinDepth_m(1e-7, 100, 4) / skinDepth_m(1e-7, 100)).toBeCloseTo(0.5, 12);
  });
});

describe('penetrationFigures(station, fixture, result)', () => {
  // Invented scenario: a 24 mm Sm-Co rotor magnet (ρ = 0.55 µΩ·m) in an 8-layer coil.
  const f = buildFixture({
    windings: [{ innerRadius_m: 0.0135, layers: 8, turnsPerLayer: 15, length_m: 0.03, conductor: { shape: 'round', diameter_m: 1.8e-3, insulationBuild_m: 0.1e-3 } }],
    part: { innerRadius_m: 0, outerRadius_m: 0.012, length_m: 0.024, material: magnetBodyMaterial('smco5', 0.55e-6, 'SmCo5'), radialShells: 8, axialSlices: 2 },
  });
  const station = (capacitance_F: number): Station => ({
    name: 'Valdera rotor line (invented)',
    bank: { capacitance_F, voltage_V: 800, esr_Ohm: 3e-3, esl_H: 0.1e-6 },
    switch: { kind: 'thyristor', thresholdVoltage_V: 1.2, slopeResistance_Ohm: 0.4e-3 },
    freewheel: { position: 'fixture', thresholdVoltage_V: 0.9, slopeResistance_Ohm: 0.3e-3 },
    cable: { resistance_Ohm: 2e-3, inductance_H: 1e-6 },
    coil: { ...f.coil, initialTemperature_C: 20 },
    coupled: f.coupled,
    loopMutual_H: f.loopMutual_H,
    probes: f.probes,
    solver: { ...DEFAULT_SOLVER, samples: 1500 },
  });

  it('a short pulse (30 µF) does not get into the part: penetration < 0.95, the warning part.not-penetrated, and a skin depth below the radius', () => {
    const st = station(30e-6);
    const r = simulateShot(st);
    const p = penetrationFigures(st, f.info, r);
    expect(p.equivalentFrequency_Hz).toBeCloseTo(1 / (4 * r.figures.timeOfPeak_s), 9);
    expect(p.bodies[0].skinDepth_m).toBeCloseTo(skinDepth_m(0.55e-6, p.equivalentFrequency_Hz), 12);
    expect(p.bodies[0].skinDepth_m).toBeLessThan(0.012);
    expect(p.penetration!).toBeLessThan(0.95);
    expect(p.centreLag_s!).toBeGreaterThan(0);
    expect(p.centreToSurfaceAtPeak!).toBeLessThan(p.staticCentreToSurface!);
    expect(p.warnings.map((w) => w.code)).toEqual(['part.not-penetrated']);
  });

  it('a long pulse (20 mF) gets in: penetration above 0.95, no warning, rise much longer than the diffusion time', () => {
    const st = station(20e-3);
    const p = penetrationFigures(st, f.info, simulateShot(st));
    expect(p.penetration!).toBeGreaterThan(0.95);
    expect(p.bodies[0].riseOverDiffusion).toBeGreaterThan(3);
    expect(p.warnings).toEqual([]);
  });

  it('without fixture geometry there are no bodies, and without the two probes no ratios', () => {
    const st = station(1e-3);
    const r = simulateShot(st);
    const bare: Station = { ...st, probes: [st.probes[0]] };
    const p = penetrationFigures(bare, undefined, { ...r, probes: [r.probes[0]] });
    expect(p.bodies).toEqual([]);
    expect(p.penetration).toBeNull();
    expect(p.warnings).toEqual([]);
  });
});

describe('simulateDesign with a fixture given by geometry', () => {
  const text = readFileSync(fileURLToPath(new URL('../../../../examples/geometry-station.yaml', import.meta.url)), 'utf8');
  it('carries the penetration figures; a short pulse adds part.not-penetrated to the shot warnings', () => {
    const long = simulateDesign(parseDesign(text, 'g.yaml'));
    expect(long.penetration!.bodies.map((b) => b.name)).toEqual(['part', 'sleeve']);
    expect(long.result.warnings.some((w) => w.code === 'part.not-penetrated')).toBe(false);
    expect(penetrationText(long.penetration!)).toContain('equivalent frequency');
    // a short pulse with no freewheel diode: the thyristor ends it at the first current zero, before the field gets in
    const shortText = text.replace('capacitance: 3300 uF', 'capacitance: 1 uF').replace(/freewheel:.*\n/, '');
    const short = simulateDesign(parseDesign(shortText, 'g.yaml'));
    expect(short.penetration!.penetration!).toBeLessThan(0.95);
    expect(short.result.warnings.filter((w) => w.code === 'part.not-penetrated')).toHaveLength(1);
  });
});
