import { describe, expect, it } from 'vitest';
import { buildFixture } from '../../magnetics/fixture.js';
import { describeDesign } from '../describe.js';
import { InputError } from '../errors.js';
import { parseDesign, parseStation } from '../parse.js';
import { designToStation } from '../to-station.js';
import { describeFixture, fixtureBuildOf } from './fixture-geometry.js';

// Invented scenario: Orbell Servo, line 2, rotor fixture G-7.
const BASE = `name: Orbell Servo, line 2, rotor fixture G-7
bank: { capacitance: 3300 uF, voltage: 1.2 kV, esr: 3 mohm, esl: 0.15 uH }
switch: { kind: thyristor, thresholdVoltage: 1.2 V, slopeResistance: 0.4 mohm }
freewheel: { position: fixture, thresholdVoltage: 0.9 V, slopeResistance: 0.3 mohm }
cable: { resistance: 2 mohm, inductance: 1.2 uH }
`;
const FIXTURE = `fixture:
  windings:
    - innerRadius: 14 mm
      layers: 10
      length: 32 mm
      conductor: { shape: round, diameter: 1.5 mm, insulationBuild: 0.1 mm }
  part:
    outerRadius: 10 mm
    length: 20 mm
    radialShells: 4
    axialSlices: 2
  bodies:
    - { name: sleeve, innerRadius: 10.5 mm, outerRadius: 12 mm, length: 24 mm, material: stainless, radialShells: 2, axialSlices: 1 }
  points:
    - { name: coil end, z: 16 mm }
`;
const PART = `part: { grade: ndfeb-sh }
`;

describe('design section `fixture`', () => {
  it('a coil given only by geometry: L, R20, heat capacity, field per ampere come from the windings (magnetics/fixture.ts)', () => {
    const st = parseStation(`${BASE}coil: { initialTemperature: 25 degC }\n${FIXTURE}${PART}`);
    const d = parseDesign(`${BASE}coil: { initialTemperature: 25 degC }\n${FIXTURE}${PART}`);
    const b = fixtureBuildOf(d)!.build;
    expect(st.coil.inductance_H).toBe(b.coil.inductance_H);
    expect(st.coil.resistance20_Ohm).toBe(b.coil.resistance20_Ohm);
    expect(st.coil.heatCapacity_JpK).toBe(b.coil.heatCapacity_JpK);
    expect(st.coil.initialTemperature_C).toBe(25);
    expect(st.probes.map((p) => p.name)).toEqual(['part', 'part surface', 'part weakest point', 'coil end']);
    expect(st.probes[0].coil_ApmPerA).toBe(b.probes[0].coil_ApmPerA);
  });

  it('the part conducts with its grade’s resistivity (materials/magnet-grades.ts: sintered NdFeB 1.4 µΩ·m) and the loops start at the bodies’ temperature', () => {
    const st = parseStation(`${BASE}coil: { initialTemperature: 25 degC }\n${FIXTURE}${PART}`);
    expect(st.coupled).toHaveLength(4 * 2 + 2);
    expect(st.coupled[0].name).toBe('part r1 z1');
    expect(st.coupled.every((l) => l.initialTemperature_C === 25)).toBe(true);
    const direct = buildFixture({
      windings: [{ innerRadius_m: 0.014, layers: 10, length_m: 0.032, conductor: { shape: 'round', diameter_m: 1.5e-3, insulationBuild_m: 0.1e-3 } }],
      part: { innerRadius_m: 0, outerRadius_m: 0.01, length_m: 0.02, radialShells: 4, axialSlices: 2, material: { name: 'x', resistivity20_Ohm_m: 1.4e-6, tempCoeff20_perK: 0, density_kgpm3: 7500, specificHeat_JpkgK: 440, ferromagnetic: false, source: '' } },
    });
    expect(st.coupled[0].resistance20_Ohm).toBeCloseTo(direct.coupled[0].resistance20_Ohm, 12);
  });

  it('a datasheet resistivity overrides the grade’s; without any grade the part is insulating, with a note', () => {
    const withSheet = parseStation(`${BASE}coil: {}\n${FIXTURE}part: { grade: ndfeb-sh, datasheet: { resistivity: 2.8 uohm m } }\n`);
    const plain = parseStation(`${BASE}coil: {}\n${FIXTURE}${PART}`);
    expect(withSheet.coupled[0].resistance20_Ohm / plain.coupled[0].resistance20_Ohm).toBeCloseTo(2, 12);
    const d = parseDesign(`${BASE}coil: {}\n${FIXTURE}`);
    expect(designToStation(d).coupled.map((l) => l.name)).toEqual(['sleeve r1', 'sleeve r2']);
    expect(fixtureBuildOf(d)!.notes.some((n) => n.includes('insulating'))).toBe(true);
  });

  it('a ferrite grade is practically insulating: no loops in the part', () => {
    const st = parseStation(`${BASE}coil: {}\n${FIXTURE}part: { grade: ferrite }\n`);
    expect(st.coupled.some((l) => l.name.startsWith('part'))).toBe(false);
  });

  it('values given in the coil section win over the computed ones ("besides"), and check shows both', () => {
    const text = `${BASE}coil: { inductance: 400 uH, resistance: 50 mohm, mass: 1 kg, fieldPerAmpere: 3000 A/m/A }\n${FIXTURE}${PART}`;
    const st = parseStation(text);
    expect(st.coil.inductance_H).toBeCloseTo(400e-6, 15);
    expect(st.coil.resistance20_Ohm).toBeCloseTo(0.05, 15);
    expect(st.coil.heatCapacity_JpK).toBeCloseTo(385, 9); // 1 kg of copper (CRC 385 J/(kg·K))
    expect(st.probes[0].coil_ApmPerA).toBe(3000);
    const d = parseDesign(text);
    const rows = describeFixture(d).flatMap((s) => s.rows.map((r) => r.label));
    expect(rows).toContain('inductance');
    expect(rows).toContain('turns');
    expect(rows.some((r) => r.startsWith('Wheeler multilayer'))).toBe(true);
    expect(describeDesign(d).some((s) => s.title.startsWith('fixture'))).toBe(true);
  });

  it('loops of the coupled section stay, before the bodies’ loops, uncoupled to them', () => {
    const text = `${BASE}coil: {}\n${FIXTURE}${PART}coupled:\n  - { name: shorted turn, inductance: 1 uH, resistance: 1 mohm, mutual: 0.2 uH, fieldPerAmpere: 5 A/m/A, heatCapacity: 10 J/K }\n`;
    const st = parseStation(text);
    expect(st.coupled[0].name).toBe('shorted turn');
    expect(st.coupled).toHaveLength(11);
    expect(st.loopMutual_H[0][1]).toBe(0);
    expect(st.probes[0].loops_ApmPerA[0]).toBe(5);
    expect(st.probes[1].loops_ApmPerA[0]).toBe(0);
  });

  const failAt = (text: string): InputError => {
    try {
      parseStation(text);
    } catch (e) {
      if (e instanceof InputError) return e;
      throw e;
    }
    throw new Error('expected an InputError');
  };

  it('errors name the field: a winding without layers or outer radius, a body without a material, geometry that overlaps, a bad AWG', () => {
    expect(failAt(`${BASE}coil: {}\n${FIXTURE.replace('      layers: 10\n', '')}`).issues[0]).toMatchObject({ code: 'design.missing-field', path: 'fixture.windings[0].layers' });
    expect(failAt(`${BASE}coil: {}\n${FIXTURE.replace(', material: stainless', '')}`).issues[0]).toMatchObject({ path: 'fixture.bodies[0].resistivity' });
    expect(failAt(`${BASE}coil: {}\n${FIXTURE.replace('outerRadius: 12 mm', 'outerRadius: 15 mm')}`).issues[0]).toMatchObject({ code: 'design.inconsistent', path: 'fixture.bodies[0]' });
    expect(failAt(`${BASE}coil: {}\n${FIXTURE.replace('diameter: 1.5 mm', 'awg: 5/0')}`).issues[0]).toMatchObject({ path: 'fixture.windings[0].conductor.awg' });
    expect(failAt(`${BASE}coil: {}\n${FIXTURE.replace('layers: 10', 'layers: 10\n      turnsPerLayer: 99')}`).issues[0]).toMatchObject({ path: 'fixture.windings[0].turnsPerLayer' });
  });

  it('an AWG size as text ("14") and the aught sizes are read (ASTM B258: AWG 14 = 1.628 mm)', () => {
    const d = parseDesign(`${BASE}coil: {}\n${FIXTURE.replace('diameter: 1.5 mm', 'awg: "14"')}`);
    expect(fixtureBuildOf(d)!.build.info.windings[0].wireDiameter_m! * 1e3).toBeCloseTo(1.628, 3);
  });

  it('without a fixture section the coil section still needs its resistance', () => {
    expect(failAt(`${BASE}coil: { inductance: 100 uH, fieldPerAmpere: 100 A/m/A, mass: 1 kg }\n`).issues[0]).toMatchObject({ code: 'design.missing-field', path: 'coil.resistance' });
  });
});
