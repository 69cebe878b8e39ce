import { describe, expect, it } from 'vitest';
import { parseDesign } from '../parse.js';
import { designToStation } from '../to-station.js';
import { InputError } from '../errors.js';
import { yokeCoilForBank, yokeToSpec } from './yoke.js';
import { yokeInductanceLimits, yokeOperatingPoint } from '../../magnetics/yoke.js';
import { steadyFromDesign } from './steady.js';

// Invented bench station (never an oracle).
const BASE = `
name: test yoke station
bank: { capacitance: 2200 uF, voltage: 450 V, esr: 10 mohm, esl: 0.2 uH }
switch: { kind: thyristor, thresholdVoltage: 1.2 V, slopeResistance: 0.5 mohm }
freewheel: { position: fixture, thresholdVoltage: 0.9 V, slopeResistance: 0.5 mohm }
cable: { resistance: 5 mohm, inductance: 1 uH }
coil: { resistance: 0.3 ohm, conductor: copper, mass: 1.2 kg }
`;
const YOKE = `
yoke:
  turns: 300
  members:
    - { name: core, length: 80 mm, area: 6 cm^2 }
    - { name: frame, length: 220 mm, area: 6 cm^2, steel: cast-steel }
  poles:
    - { name: tips, length: 20 mm, area: 1.2 cm^2 }
  gaps:
    - { name: clearance, length: 0.2 mm, area: 1.2 cm^2 }
  part: { length: 5 mm, area: 1 cm^2 }
  leakage:
    - { name: sides, length: 25 mm, area: 12 cm^2 }
`;

function inputError(text: string): InputError {
  try {
    designToStation(parseDesign(text, 't.yaml'));
  } catch (e) {
    if (e instanceof InputError) return e;
    throw e;
  }
  throw new Error('expected an InputError');
}

describe('design section yoke', () => {
  it('turns a yoke section into a station coil with its nonlinear λ(i), small-current L and part field per ampere', () => {
    const design = parseDesign(BASE + YOKE, 't.yaml');
    const st = designToStation(design);
    const spec = yokeToSpec(design.yoke!);
    const lim = yokeInductanceLimits(spec);
    expect(st.coil.nonlinear).toBeDefined();
    expect(st.coil.inductance_H).toBeCloseTo(lim.smallCurrent_H, 12);
    expect(st.probes[0].coil_ApmPerA).toBeCloseTo(lim.partFieldPerAmpereSmall_ApmPerA, 6);
    // the nonlinear coil agrees with a direct solve of the circuit (table tolerance 1e-7 → check 1e-6)
    const op = yokeOperatingPoint(spec, 120);
    expect(Math.abs(st.coil.nonlinear!.fluxLinkage_Wb(120) / op.fluxLinkage_Wb - 1)).toBeLessThan(1e-6);
    // defaults: steel low-carbon-steel, µ_rec 1.05
    expect(spec.yoke[0].material.name).toBe('low-carbon-steel');
    expect(spec.yoke[1].material.name).toBe('cast-steel');
    expect(spec.part.recoilPermeability).toBe(1.05);
    // the table covers every current the bank can drive: V0·√(C/L_sat), with margin
    const bound = 450 * Math.sqrt(2200e-6 / lim.saturated_H);
    expect((st.coil.nonlinear as unknown as { table: { maxCurrent_A: number } }).table.maxCurrent_A).toBeGreaterThanOrEqual(bound);
  });

  it('reuses a cached table for the same yoke and a bank that needs no more current', () => {
    const design = parseDesign(BASE + YOKE, 't.yaml');
    const a = yokeCoilForBank(design.yoke!, 2200e-6, 450);
    const b = yokeCoilForBank(design.yoke!, 2200e-6, 420);
    expect(b).toBe(a);
    const c = yokeCoilForBank(design.yoke!, 2200e-6, 900);
    expect(c).not.toBe(a);
  });

  it('uses a measured B–H table given under yoke.steels', () => {
    const text = BASE + YOKE.replace('steel: cast-steel', 'steel: mill-cert') + `  steels:\n    mill-cert: { field: [0, 100 A/m, 1 kA/m, 10 kA/m], fluxDensity: [0, 0.5 T, 1.3 T, 1.8 T], source: "certificate 42" }\n`;
    const design = parseDesign(text, 't.yaml');
    const spec = yokeToSpec(design.yoke!);
    expect(spec.yoke[1].material.source).toBe('certificate 42');
    expect(spec.yoke[1].material.fluxDensity_T(1000)).toBeCloseTo(1.3, 12);
  });

  it('names an unknown steel with the nearest spelling', () => {
    const e = inputError(BASE + YOKE.replace('steel: cast-steel', 'steel: cast-stel'));
    expect(e.issues[0].path).toBe('yoke.members[1].steel');
    expect(e.issues[0].code).toBe('design.not-one-of');
    expect(e.issues[0].suggestion).toBe('cast-steel');
  });

  it('rejects a leakage path with both a permeance and an air path, and a broken B–H table', () => {
    const e = inputError(BASE + YOKE.replace('{ name: sides, length: 25 mm, area: 12 cm^2 }', '{ name: sides, length: 25 mm, area: 12 cm^2, permeance: 1 uH }'));
    expect(e.issues[0].path).toBe('yoke.leakage[0]');
    expect(e.issues[0].code).toBe('design.inconsistent');
    const t = inputError(BASE + YOKE + `  steels:\n    bad: { field: [0, 100, 50], fluxDensity: [0, 1, 1.2] }\n`);
    expect(t.issues[0].path).toBe('yoke.steels.bad.fluxDensity');
    expect(t.issues[0].problem).toMatch(/H must increase/);
  });

  it('refuses coil.inductance given together with a yoke, and asks for it without one', () => {
    const both = inputError(BASE.replace('coil: {', 'coil: { inductance: 2 mH,') + YOKE);
    expect(both.issues[0].path).toBe('coil.inductance');
    expect(both.issues[0].code).toBe('design.inconsistent');
    const none = inputError(BASE);
    expect(none.issues.map((i) => i.path)).toEqual(['coil.inductance', 'coil.fieldPerAmpere']);
    expect(none.issues[0].code).toBe('design.missing-field');
  });
});

describe('design section steady', () => {
  it('reads a supply and a cooling given as h·A (R_th = 1/(h·A))', () => {
    const d = parseDesign(BASE + YOKE + `steady:\n  supply: { voltage: 48 V, currentLimit: 20 A }\n  cooling: { heatTransferCoefficient: 12 W/(m^2 K), area: 0.05 m^2 }\n  targetField: 1.5 MA/m\n`, 't.yaml');
    const s = steadyFromDesign(d.steady!);
    expect(s.cooling.thermalResistance_KpW).toBeCloseTo(1 / (12 * 0.05), 12);
    expect(s.cooling.ambient_C).toBe(25);
    expect(s.supply).toEqual({ voltage_V: 48, currentLimit_A: 20, seriesResistance_Ohm: 0 });
    expect(s.options.targetField_Apm).toBe(1.5e6);
  });

  it('asks for the cooling and for a supply setting', () => {
    const e = inputError(BASE + YOKE + `steady:\n  supply: { seriesResistance: 0.1 ohm }\n  cooling: { ambient: 30 degC }\n`);
    expect(e.issues.map((i) => i.path).sort()).toEqual(['steady.cooling.thermalResistance', 'steady.supply.voltage']);
  });
});
