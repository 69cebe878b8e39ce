import { readdirSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { DEFAULT_SOLVER } from '../model/station.js';
import { COPPER } from '../materials/conductors.js';
import { InputError } from './errors.js';
import { loadStation, parseDesign, parseStation } from './parse.js';
import { designToStation, isPositiveDefinite } from './to-station.js';

const BASE = `
bank: { capacitance: 1 mF, voltage: 1 kV, esr: 2 mohm, esl: 0.1 uH }
switch: { kind: bidirectional, thresholdVoltage: 1.1 V, slopeResistance: 0.5 mohm }
freewheel: { position: bank, thresholdVoltage: 0.8 V }
cable: { resistance: 3 mohm, inductance: 1 uH }
coil: { inductance: 100 uH, resistance: 20 mohm, mass: 2 kg, fieldPerAmpere: 500 A/m/A, initialTemperature: 30 degC }
`;

function err(text: string): InputError {
  try {
    parseStation(text, 's.yaml');
  } catch (e) {
    if (e instanceof InputError) return e;
    throw e;
  }
  throw new Error('expected InputError');
}

describe('designToStation(design)', () => {
  it('maps every section to the SI Station fields', () => {
    const st = parseStation(BASE, 'line-7.yaml');
    expect(st.name).toBe('line-7');
    expect(st.bank).toEqual({ capacitance_F: 1e-3, voltage_V: 1000, esr_Ohm: 2e-3, esl_H: 1e-7 });
    expect(st.switch).toEqual({ kind: 'bidirectional', thresholdVoltage_V: 1.1, slopeResistance_Ohm: 5e-4 });
    expect(st.freewheel).toEqual({ position: 'bank', thresholdVoltage_V: 0.8, slopeResistance_Ohm: 0 });
    expect(st.cable).toEqual({ resistance_Ohm: 3e-3, inductance_H: 1e-6 });
    expect(st.coupled).toEqual([]);
    expect(st.loopMutual_H).toEqual([]);
    expect(st.probes).toEqual([{ name: 'part', coil_ApmPerA: 500, loops_ApmPerA: [] }]);
    expect(st.solver).toEqual(DEFAULT_SOLVER);
  });

  it('coil heat capacity = m·c_p with copper c_p 385 J/(kg·K) (CRC Handbook), α20 from IEC 60028', () => {
    const st = parseStation(BASE, 's.yaml');
    expect(st.coil.heatCapacity_JpK).toBeCloseTo(2 * COPPER.specificHeat_JpkgK, 12);
    expect(st.coil.tempCoeff_perK).toBe(COPPER.tempCoeff20_perK);
    expect(st.coil.initialTemperature_C).toBe(30);
    expect(st.coil.mass_kg).toBe(2);
  });

  it('volume gives mass through the IEC 60028 copper density (8890 kg/m³); heatCapacity is taken as given', () => {
    const v = parseStation(BASE.replace('mass: 2 kg', 'volume: 100 cm^3'), 's.yaml');
    expect(v.coil.mass_kg).toBeCloseTo(0.889, 12);
    expect(v.coil.heatCapacity_JpK).toBeCloseTo(0.889 * 385, 9);
    const h = parseStation(BASE.replace('mass: 2 kg', 'heatCapacity: 700 J/K, tempCoeff: 0.004 /K'), 's.yaml');
    expect(h.coil.heatCapacity_JpK).toBe(700);
    expect(h.coil.tempCoeff_perK).toBe(0.004);
  });

  it('coupled loops: mutual matrix symmetric, probes per loop', () => {
    const text = `${BASE}
coupled:
  - { name: a, inductance: 50 nH, resistance: 1 mohm, mutual: 1 uH, mutualTo: { b: 20 nH }, fieldPerAmpere: 10 A/m/A, heatCapacity: 30 J/K }
  - { name: b, inductance: 40 nH, resistance: 2 mohm, mutual: 0.8 uH, mass: 0.1 kg, specificHeat: 440 J/(kg K) }
probes:
  - { name: inner, fieldPerAmpere: 480 A/m/A, loops: { b: 7 A/m/A } }
`;
    const st = parseStation(text, 's.yaml');
    expect(st.loopMutual_H).toEqual([[0, 20e-9], [20e-9, 0]]);
    expect(st.coupled[1]).toMatchObject({ name: 'b', heatCapacity_JpK: 44, tempCoeff_perK: 0, mutualToCoil_H: 0.8e-6 });
    expect(st.probes).toEqual([
      { name: 'part', coil_ApmPerA: 500, loops_ApmPerA: [10, 0] },
      { name: 'inner', coil_ApmPerA: 480, loops_ApmPerA: [0, 7] },
    ]);
  });

  it('rejects a coupling coefficient of 1 or more (|M| < √(L1·Lk) for real inductors)', () => {
    // √(100 µH · 50 nH) = 2.236 µH
    const e = err(`${BASE}coupled: [{ name: a, inductance: 50 nH, resistance: 1 mohm, mutual: 2.3 uH, heatCapacity: 1 J/K }]\n`);
    expect(e).toMatchObject({ code: 'design.inconsistent', path: 'coupled[0].mutual' });
    expect(e.message).toContain('coupling coefficient');
  });

  it('rejects couplings that are each below 1 but impossible together (matrix not positive definite)', () => {
    // three loops with pairwise k = 0.9 to the coil and k = -0.9 among each other: not PSD
    const loop = (n: string, other: string) => `{ name: ${n}, inductance: 100 uH, resistance: 1 mohm, mutual: 90 uH, mutualTo: { ${other}: -90 uH }, heatCapacity: 1 J/K }`;
    const e = err(`${BASE}coupled: [${loop('a', 'b')}, ${loop('b', 'c')}, { name: c, inductance: 100 uH, resistance: 1 mohm, mutual: 90 uH, heatCapacity: 1 J/K }]\n`);
    expect(e).toMatchObject({ code: 'design.inconsistent', path: 'coupled' });
  });

  it('unknown loop names, duplicate names and conflicting mutuals are errors', () => {
    const l = (n: string, extra = '') => `{ name: ${n}, inductance: 50 nH, resistance: 1 mohm, mutual: 1 uH, heatCapacity: 1 J/K${extra} }`;
    const unknown = err(`${BASE}coupled: [${l('sleeve', ', mutualTo: { sleve2: 1 nH }')}, ${l('sleeve2')}]\n`);
    expect(unknown).toMatchObject({ code: 'design.unknown-field', path: 'coupled[0].mutualTo.sleve2', suggestion: 'sleeve2' });
    expect(err(`${BASE}coupled: [${l('a')}, ${l('a')}]\n`)).toMatchObject({ code: 'design.duplicate-name', path: 'coupled[1].name' });
    const conflict = err(`${BASE}coupled: [${l('a', ', mutualTo: { b: 1 nH }')}, ${l('b', ', mutualTo: { a: 2 nH }')}]\n`);
    expect(conflict).toMatchObject({ code: 'design.inconsistent', path: 'coupled[1].mutualTo.a' });
    expect(err(`${BASE}probes: [{ name: part, fieldPerAmpere: 1 }]\n`)).toMatchObject({ code: 'design.duplicate-name' });
  });

  it('isPositiveDefinite (Cholesky, Golub & Van Loan §4.2) on known matrices', () => {
    expect(isPositiveDefinite([[2, 1], [1, 2]])).toBe(true);
    expect(isPositiveDefinite([[1, 1], [1, 1]])).toBe(false); // singular
    expect(isPositiveDefinite([[1, 2], [2, 1]])).toBe(false); // eigenvalue −1
  });

  it('every example in examples/ converts to a Station', () => {
    const dir = fileURLToPath(new URL('../../../../examples/', import.meta.url));
    const files = readdirSync(dir).filter((f) => /\.(ya?ml|json)$/.test(f));
    expect(files.length).toBeGreaterThanOrEqual(3);
    for (const f of files) {
      const st = loadStation(dir + f);
      expect(st.probes.length, f).toBeGreaterThanOrEqual(1);
      expect(designToStation(parseDesign(`${'name: x\n'}${BASE}`, 'x.yaml')).name).toBe('x');
    }
  });
});
