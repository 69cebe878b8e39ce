import { mkdtempSync, readFileSync, writeFileSync, existsSync, readdirSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import type { Command } from 'commander';
import { main } from './main.js';
import { captureIo } from './io.js';
import { COMMANDS } from './commands/index.js';
import { VERSION } from './version.js';

const ROOT = fileURLToPath(new URL('../../../', import.meta.url));
const DEMO = join(ROOT, 'examples/demo-station.yaml');

async function run(args: string[], cwd = ROOT) {
  const io = captureIo({ cwd });
  const code = await main(args, io);
  return { code, out: io.out, err: io.err };
}

function tmp(): string {
  return mkdtempSync(join(tmpdir(), 'fk-cli-'));
}

const STACK = /\n\s+at .+\(.+:\d+:\d+\)/;

describe('fluxkick (in-process main)', () => {
  it('version equals package.json', async () => {
    const pkg = JSON.parse(readFileSync(join(ROOT, 'packages/cli/package.json'), 'utf8')) as { version: string };
    expect(VERSION).toBe(pkg.version);
    const r = await run(['--version']);
    expect(r.code).toBe(0);
    expect(r.out.trim()).toBe(VERSION);
  });

  it('no arguments prints help, exit 0; every command has --help with an example', async () => {
    const r = await run([]);
    expect(r.code).toBe(0);
    expect(r.out).toContain('Usage: fluxkick');
    const names = r.out.match(/^\s{2}(\w+)/gm)?.map((s) => s.trim()) ?? [];
    for (const name of ['demo', 'shot', 'check', 'schema']) expect(names).toContain(name);
    for (const name of names.filter((n) => n !== 'help')) {
      const h = await run([name, '--help']);
      expect(h.code, name).toBe(0);
      expect(h.out, name).toMatch(/Examples?:\n\s+\$ fluxkick/);
    }
  });

  it('schema prints valid JSON with the top-level sections', async () => {
    const r = await run(['schema']);
    expect(r.code).toBe(0);
    const js = JSON.parse(r.out) as { properties: Record<string, unknown>; required: string[] };
    expect(Object.keys(js.properties)).toEqual(expect.arrayContaining(['name', 'bank', 'switch', 'freewheel', 'cable', 'coil', 'coupled', 'solver']));
    expect(js.required).toEqual(expect.arrayContaining(['bank', 'coil']));
  });

  it('check prints what was understood in engineering units, and the safety notice', async () => {
    const r = await run(['check', 'examples/demo-station.yaml']);
    expect(r.code).toBe(0);
    for (const want of ['2.2 mF', '1.6 kV', '4 mΩ', '180 µH', '25 mΩ', '25 °C', '600 (A/m)/A', '12.5 mm²', 'stored energy ½CV²', '2.82 kJ']) {
      expect(r.out).toContain(want);
    }
    expect(r.out).toMatch(/SAFETY/);
    const j = await run(['check', DEMO, '--json']);
    expect(j.code).toBe(0);
    expect(JSON.parse(j.out)).toMatchObject({ bank: { capacitance_F: 2.2e-3, voltage_V: 1600 } });
  });

  it('check on a fixture given by geometry prints the derived numbers, the published estimates beside ours and the bodies', async () => {
    const r = await run(['check', 'examples/geometry-station.yaml']);
    expect(r.code, r.err).toBe(0);
    for (const want of [
      'fixture (derived from the geometry)',
      'turns',
      'resistance at 20 °C',
      'inductance',
      'field per ampere over the part, min',
      'field per ampere over the part, mean',
      'Wheeler multilayer',
      'Montgomery thick solenoid',
      'fixture body sleeve (derived)',
      'diffusion time',
    ]) expect(r.out).toContain(want);
    // the same numbers as `fluxkick coil` on the same file (one geometry code behind both commands)
    const coil = JSON.parse((await run(['coil', 'examples/geometry-station.yaml', '--json'])).out) as { coil: { turns: number } };
    expect(r.out).toMatch(new RegExp(`turns\\s+${coil.coil.turns}\\b`));
    expect(r.out).toMatch(/SAFETY/);
  });

  describe('bad input -> exit 2, short message naming path, value and expectation, no stack', () => {
    const d = tmp();
    const good = readFileSync(DEMO, 'utf8');
    const cases: [string, string, string[]][] = [
      ['wrong dimension', good.replace('capacitance: 2200 uF', 'capacitance: 2 kV'), ['bank.capacitance', '"2 kV"', 'a capacitance (F)', '2200 uF', 'line']],
      ['negative', good.replace('resistance: 25 mohm', 'resistance: -25 mohm'), ['coil.resistance', '"-25 mohm"', 'greater than 0']],
      ['NaN', good.replace('voltage: 1.6 kV', 'voltage: .nan'), ['bank.voltage', 'not a finite number']],
      ['zero', good.replace('capacitance: 2200 uF', 'capacitance: 0 uF'), ['bank.capacitance', '"0 uF" is zero', 'greater than 0']],
      ['Infinity', good.replace('inductance: 180 uH', 'inductance: .inf'), ['coil.inductance', 'Infinity is not a finite number']],
      ['Infinity with a unit', good.replace('voltage: 1.6 kV', 'voltage: Infinity kV'), ['bank.voltage', '"Infinity kV" is not a finite number']],
      ['unknown field', good.replace('esl: 0.2 uH', 'esll: 0.2 uH'), ['bank.esll', 'unknown field', 'Did you mean "esl"?']],
      ['wrong enum', good.replace('kind: thyristor', 'kind: triac'), ['switch.kind', '"triac"', 'one of: thyristor, bidirectional']],
      // the unclosed bracket sits on line 10 of the edited file (the demo's `bank:` is line 9)
      ['YAML syntax', good.replace('bank:\n', 'bank:\n capacitance: [1\n'), ['YAML syntax error', 'line 10, column']],
      ['YAML tab indent', good.replace('  esl: 0.2 uH\n', '  esl: 0.2 uH\n\tfoo: 1\n'), ['YAML syntax error', 'line 14, column 1', 'Tabs']],
    ];
    for (const [label, text, wants] of cases) {
      it(label, async () => {
        const f = join(d, `${label.replace(/\W+/g, '-')}.yaml`);
        writeFileSync(f, text);
        for (const cmd of ['check', 'shot']) {
          const r = await run([cmd, f]);
          expect(r.code, `${cmd} ${label}`).toBe(2);
          expect(r.out).toBe('');
          for (const w of wants) expect(r.err).toContain(w);
          expect(r.err).not.toMatch(STACK);
        }
      });
    }
    it('missing file, unknown option, missing argument', async () => {
      const m = await run(['check', 'no/such/station.yaml']);
      expect(m.code).toBe(2);
      expect(m.err).toContain('no/such/station.yaml');
      expect(m.err).not.toMatch(STACK);
      expect((await run(['shot', DEMO, '--bogus'])).code).toBe(2);
      expect((await run(['check'])).code).toBe(2);
      expect((await run(['no-such-command'])).code).toBe(2);
    });
  });

  it('an unexpected error is a bug: exit 3 with the stack', async () => {
    const boom = (program: Command) => program.command('boom').action(() => {
      throw new TypeError('deliberate');
    });
    COMMANDS.push(boom);
    try {
      const r = await run(['boom']);
      expect(r.code).toBe(3);
      expect(r.err).toContain('internal error');
      expect(r.err).toMatch(STACK);
    } finally {
      COMMANDS.pop();
    }
  });
});

describe('shot and demo', () => {
  it('demo: exit 0, safety notice, figures', async () => {
    const r = await run(['demo'], tmp());
    expect(r.code).toBe(0);
    expect(r.out).toContain('SAFETY');
    expect(r.out).toContain('2.82 kJ');
    expect(r.out).toMatch(/peak current/i);
    expect(r.err).toBe('');
  });

  it('shot --json has the DESIGN.md keys; waveform only with --waveform', async () => {
    const r = await run(['shot', DEMO, '--json']);
    expect(r.code).toBe(0);
    const j = JSON.parse(r.out) as Record<string, unknown>;
    for (const k of ['figures', 'verdict', 'warnings', 'phases', 'solver', 'energy']) expect(j).toHaveProperty(k);
    expect(j).not.toHaveProperty('waveform');
    const figures = j.figures as Record<string, number>;
    for (const k of ['peakCurrent_A', 'timeOfPeak_s', 'pulseWidthHalfMax_s', 'endOfPulse_s', 'peakField_Apm', 'timeOfPeakField_s', 'finalCapacitorVoltage_V', 'reverseVoltage_pct', 'i2tSwitch_A2s', 'i2tDiode_A2s', 'coilTemperatureRise_K', 'storedEnergy_J', 'energyBalanceRelativeError']) {
      expect(figures, k).toHaveProperty(k);
    }
    // ½·C·V0² of the demo bank (2.2 mF, 1.6 kV) = 2816 J, exact arithmetic
    expect(figures.storedEnergy_J).toBeCloseTo(2816, 6);
    const w = JSON.parse((await run(['demo', '--json', '--waveform'])).out) as { waveform: { t_s: number[] } };
    expect(w.waveform.t_s.length).toBeGreaterThan(10);
  });

  it('--csv writes the waveform atomically; refuses the input file; unwritable path -> exit 2 naming it', async () => {
    const d = tmp();
    const r = await run(['shot', DEMO, '--csv', 'wave.csv'], d);
    expect(r.code).toBe(0);
    const csv = readFileSync(join(d, 'wave.csv'), 'utf8');
    expect(csv.split('\n')[0]).toContain('t_s');
    expect(csv.split('\n').length).toBeGreaterThan(10);
    expect(readdirSync(d).filter((f) => f.endsWith('.tmp'))).toEqual([]);

    const copy = join(d, 'station.yaml');
    writeFileSync(copy, readFileSync(DEMO, 'utf8'));
    const same = await run(['shot', copy, '--csv', copy]);
    expect(same.code).toBe(2);
    expect(readFileSync(copy, 'utf8')).toBe(readFileSync(DEMO, 'utf8'));

    const bad = await run(['shot', DEMO, '--csv', join(d, 'no/such/dir/wave.csv')]);
    expect(bad.code).toBe(2);
    expect(bad.err).toContain('no/such/dir/wave.csv');
    expect(bad.err).not.toMatch(STACK);
    expect(existsSync(join(d, 'no'))).toBe(false);
  });

  it('a fixture with conductive bodies: penetration figures in --json, the HTML and the Markdown report', async () => {
    const d = tmp();
    const r = await run(['shot', join(ROOT, 'examples/geometry-station.yaml'), '--json', '--html', 'r.html', '--md', 'r.md'], d);
    expect(r.code, r.err).toBe(0);
    const p = (JSON.parse(r.out) as { penetration: { equivalentFrequency_Hz: number; riseTime_s: number; bodies: { name: string }[]; penetration: number } }).penetration;
    expect(p.bodies.map((b) => b.name)).toEqual(['part', 'sleeve']);
    // f_eq = 1/(4·t_rise) (analysis/penetration.ts), exact arithmetic on the two printed numbers
    expect(p.equivalentFrequency_Hz * 4 * p.riseTime_s).toBeCloseTo(1, 12);
    expect(p.penetration).toBeGreaterThan(0);
    expect(readFileSync(join(d, 'r.html'), 'utf8')).toContain('id="penetration-bodies"');
    expect(readFileSync(join(d, 'r.md'), 'utf8')).toContain('## Penetration of the field (eddy currents)');
    // no coupled loops, no penetration figures
    expect(JSON.parse((await run(['shot', DEMO, '--json'])).out).penetration).toBeNull();
  });

  it('every example runs as a shot', async () => {
    for (const f of readdirSync(join(ROOT, 'examples')).filter((x) => x.endsWith('.yaml'))) {
      const r = await run(['shot', join(ROOT, 'examples', f), '--json']);
      expect(r.code, `${f}: ${r.err}`).toBe(0);
    }
  });
});

describe('demoStationPath', () => {
  it('finds the repository example from src, and a copy beside dist/ when packaged', async () => {
    const { demoStationPath } = await import('./commands/demo.js');
    expect(demoStationPath()).toBe(DEMO);
    const pkg = tmp();
    const { mkdirSync } = await import('node:fs');
    mkdirSync(join(pkg, 'dist'));
    mkdirSync(join(pkg, 'examples'));
    writeFileSync(join(pkg, 'examples', 'demo-station.yaml'), 'x');
    expect(demoStationPath(join(pkg, 'dist'))).toBe(join(pkg, 'examples', 'demo-station.yaml'));
    expect(() => demoStationPath(tmp())).toThrow(/not found/);
  });
});
