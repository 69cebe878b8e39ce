import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { InputError } from './errors.js';
import { loadDesign, parseDesign, parseStation } from './parse.js';

const GOOD = `
name: test fixture
bank: { capacitance: 2200 uF, voltage: 1.6 kV }
coil:
  inductance: 180 uH
  resistance: 25 mohm
  mass: 2.1 kg
  fieldPerAmpere: 95 A/m/A
`;

function fail(text: string, file = 'station.yaml'): InputError {
  try {
    parseDesign(text, file);
  } catch (e) {
    if (e instanceof InputError) return e;
    throw e;
  }
  throw new Error('expected an InputError');
}

describe('parseDesign(text, fileName)', () => {
  it('reads YAML with units and applies defaults (SI out; conversions per BIPM prefixes)', () => {
    const d = parseDesign(GOOD, 'station.yaml');
    expect(d.bank).toEqual({ capacitance: 2.2e-3, voltage: 1600, esr: 0, esl: 0 });
    expect(d.switch).toEqual({ kind: 'thyristor', thresholdVoltage: 0, slopeResistance: 0 });
    expect(d.freewheel).toBeUndefined();
    expect(d.cable).toEqual({ resistance: 0, inductance: 0 });
    expect(d.coil).toMatchObject({ inductance: 180e-6, resistance: 0.025, conductor: 'copper', initialTemperature: 20 });
    expect(d.coupled).toEqual([]);
    expect(d.probes).toEqual([]);
  });

  it('reads the same design as JSON', () => {
    const json = JSON.stringify({
      bank: { capacitance: '2200 uF', voltage: 1600 },
      coil: { inductance: 1.8e-4, resistance: '25 mohm', mass: 2.1, fieldPerAmpere: 95 },
    });
    const d = parseDesign(json, 'station.json');
    expect(d.bank.capacitance).toBe(2.2e-3);
    expect(d.name).toBe('station'); // default: the file's base name
  });

  it('wrong dimension: message names the path, the value and the expectation, with line and column', () => {
    const e = fail(GOOD.replace('2200 uF', '2 kV'));
    expect(e.code).toBe('quantity.dimension');
    expect(e.path).toBe('bank.capacitance');
    expect(e.message).toContain('station.yaml');
    expect(e.message).toContain('bank.capacitance');
    expect(e.message).toContain('"2 kV"');
    expect(e.message).toContain('a capacitance (F)');
    expect(e.message).toContain('2200 uF');
    expect(e.issues[0]).toMatchObject({ line: 3 });
  });

  it('YAML syntax error gives its line and column', () => {
    const e = fail('bank:\n  capacitance: 2200 uF\n   voltage: [1.6 kV\ncoil: {}\n');
    expect(e.code).toBe('file.syntax');
    expect(e.issues[0]!.line).toBeGreaterThanOrEqual(2);
    expect(e.message).toMatch(/line \d+, column \d+/);
    expect(e.message).toContain('YAML syntax error');
  });

  it('JSON syntax error gives its line', () => {
    const e = fail('{\n  "bank": {\n    "capacitance": 1,,\n  }\n}', 'x.json');
    expect(e.code).toBe('file.syntax');
    expect(e.issues[0]!.line).toBe(3);
  });

  it('zero or negative where physics forbids', () => {
    expect(fail(GOOD.replace('2200 uF', '0 uF'))).toMatchObject({ code: 'design.out-of-range', path: 'bank.capacitance' });
    const e = fail(GOOD.replace('25 mohm', '-25 mohm'));
    expect(e).toMatchObject({ code: 'design.out-of-range', path: 'coil.resistance' });
    expect(e.message).toContain('"-25 mohm"');
    expect(e.message).toContain('greater than 0');
  });

  it('NaN and Infinity are rejected (.nan and .inf in YAML)', () => {
    expect(fail(GOOD.replace('1.6 kV', '.nan'))).toMatchObject({ code: 'quantity.not-finite', path: 'bank.voltage' });
    expect(fail(GOOD.replace('1.6 kV', '.inf'))).toMatchObject({ code: 'quantity.not-finite', path: 'bank.voltage' });
    expect(fail(GOOD.replace('1.6 kV', 'Infinity V'))).toMatchObject({ code: 'quantity.not-finite', path: 'bank.voltage' });
  });

  it('unknown field suggests the nearest name and points at the key', () => {
    const e = fail(GOOD.replace('capacitance', 'capacitence'));
    const unknown = e.issues.find((i) => i.code === 'design.unknown-field')!;
    expect(unknown).toMatchObject({ path: 'bank.capacitence', suggestion: 'capacitance', line: 3 });
    expect(e.message).toContain('Did you mean "capacitance"?');
    const top = fail(`${GOOD}\ncabel: { resistance: 3 mohm }\n`);
    expect(top.issues[0]).toMatchObject({ code: 'design.unknown-field', path: 'cabel', suggestion: 'cable' });
  });

  it('wrong enum lists the choices and suggests the nearest', () => {
    const e = fail(`${GOOD}switch: { kind: thyristr }\n`);
    expect(e).toMatchObject({ code: 'design.not-one-of', path: 'switch.kind', suggestion: 'thyristor' });
    expect(e.message).toContain('one of: thyristor, bidirectional');
  });

  it('missing section and missing heat-capacity data', () => {
    expect(fail('bank: { capacitance: 1 mF, voltage: 1 kV }\n')).toMatchObject({ code: 'design.missing-field', path: 'coil' });
    // the amount of conductor may come from a fixture section, so it is required when the design becomes a Station
    let e: InputError | undefined;
    try {
      parseStation(GOOD.replace('  mass: 2.1 kg\n', ''), 'station.yaml');
    } catch (err) {
      e = err as InputError;
    }
    expect(e).toMatchObject({ code: 'design.missing-field', path: 'coil.mass' });
    expect(e!.message).toContain('heatCapacity');
  });

  it('a section of the wrong type, an empty file, a list at the top', () => {
    expect(fail(`${GOOD}cable: 3 mohm\n`)).toMatchObject({ code: 'design.wrong-type', path: 'cable' });
    expect(fail('   \n')).toMatchObject({ code: 'file.empty' });
    expect(fail('- a\n- b\n')).toMatchObject({ code: 'design.wrong-type', path: '' });
  });

  it('duplicate YAML keys are a syntax error', () => {
    expect(fail(`${GOOD}bank: { capacitance: 1 mF, voltage: 1 kV }\n`)).toMatchObject({ code: 'file.syntax' });
  });
});

describe('loadDesign(path)', () => {
  it('missing file -> InputError file.missing naming the path', () => {
    try {
      loadDesign('/nonexistent/dir/station.yaml');
      expect.unreachable();
    } catch (e) {
      expect(e).toBeInstanceOf(InputError);
      expect((e as InputError).code).toBe('file.missing');
      expect((e as InputError).message).toContain('/nonexistent/dir/station.yaml');
    }
  });
  it('a directory -> file.unreadable; a real file parses', () => {
    const dir = mkdtempSync(join(tmpdir(), 'fk-design-'));
    expect(() => loadDesign(dir)).toThrow(InputError);
    const f = join(dir, 'ok.yml');
    writeFileSync(f, GOOD);
    expect(loadDesign(f).name).toBe('test fixture');
  });
});
