import { mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { main } from '../main.js';
import { captureIo } from '../io.js';

// A small test station (invented values, never an oracle) with a part and ratings.
const DESIGN = `
name: CLI test bench
bank: { capacitance: 2200 uF, voltage: 1.6 kV, esr: 4 mohm, esl: 0.2 uH }
switch: { kind: thyristor, thresholdVoltage: 1.2 V, slopeResistance: 0.4 mohm }
freewheel: { position: fixture, thresholdVoltage: 0.9 V, slopeResistance: 0.3 mohm }
cable: { resistance: 3 mohm, inductance: 1.5 uH }
coil: { inductance: 180 uH, resistance: 25 mohm, conductor: copper, mass: 2.1 kg, initialTemperature: 25 degC, fieldPerAmpere: 600 A/m/A }
coupled: [{ name: sleeve, inductance: 2 uH, resistance: 0.2 mohm, mutual: 10 uH, fieldPerAmpere: -100 A/m/A, heatCapacity: 200 J/K }]
part: { grade: ndfeb-sh, requiredField: 2.2 MA/m, fieldMargin: 10 % }
ratings: { margin: 20 %, capacitor: { voltage: 1.1 kV } }
`;

const dir = mkdtempSync(join(tmpdir(), 'fk-sweep-'));
const design = join(dir, 'bench.yaml');
writeFileSync(design, DESIGN);

async function run(args: string[]) {
  const io = captureIo({ cwd: dir });
  const code = await main(args, io);
  return { code, out: io.out, err: io.err };
}

describe('fluxkick sweep', () => {
  it('prints a table of every point with the verdict and the safety notice', async () => {
    const r = await run(['sweep', 'bench.yaml', '--vary', 'bank.capacitance=1m:3m:3', '--vary', 'bank.voltage=0.8k,1.2k']);
    expect(r.code).toBe(0);
    expect(r.out).toContain('6 of 6 points');
    expect(r.out).toMatch(/3 mF\s+1\.2 kV/);
    expect(r.out).toContain('beyond: capacitor.voltage'); // 1.2 kV on a 1.1 kV bank
    expect(r.out).toMatch(/SAFETY/);
    expect(r.err).toBe(''); // no progress bar when standard error is not a terminal
  });

  it('shows a progress bar on standard error when it is a terminal, and none with --no-progress', async () => {
    const tty = captureIo({ cwd: dir, stderrIsTTY: true });
    expect(await main(['sweep', 'bench.yaml', '--vary', 'bank.voltage=0.8k:1.2k:6'], tty)).toBe(0);
    expect(tty.err).toMatch(/sweep \[.*\] \d+\/6 points/);
    const quiet = captureIo({ cwd: dir, stderrIsTTY: true });
    expect(await main(['sweep', 'bench.yaml', '--vary', 'bank.voltage=0.8k:1.2k:6', '--no-progress'], quiet)).toBe(0);
    expect(quiet.err).toBe('');
  });

  it('writes CSV to standard output with "-", JSON with --json, and an SVG map with --svg', async () => {
    const csv = await run(['sweep', 'bench.yaml', '--vary', 'bank.voltage=1k,1.5k', '--csv', '-']);
    expect(csv.code).toBe(0);
    const lines = csv.out.trimEnd().split('\n');
    expect(lines).toHaveLength(3);
    expect(lines[0]).toMatch(/^index,bank\.voltage \[V\],peakCurrent_A/);
    const json = await run(['sweep', 'bench.yaml', '--vary', 'bank.voltage=1k,1.5k', '--json']);
    const parsed = JSON.parse(json.out) as { rows: { values: Record<string, number> }[] };
    expect(parsed.rows.map((r) => r.values['bank.voltage'])).toEqual([1000, 1500]);
    const svg = await run(['sweep', 'bench.yaml', '--vary', 'bank.capacitance=1m,2m', '--vary', 'bank.voltage=0.9k,1k', '--svg', 'map.svg']);
    expect(svg.code).toBe(0);
    expect(readFileSync(join(dir, 'map.svg'), 'utf8')).toMatch(/^<svg/);
    expect(svg.out).toContain('map written to map.svg');
  });

  it.each([
    [['--vary', 'bank.capacitance'], '--vary', 'bank.capacitance', /no "="/],
    [['--vary', 'bank.capacitance=1m:5m'], '--vary', 'bank.capacitance=1m:5m', /start:stop:count/],
    [['--vary', 'bank.capacitance=1m:5m:x'], '--vary', 'bank.capacitance=1m:5m:x', /not a whole number/],
    [['--vary', 'bank.capacitence=1m:5m:3'], '--vary', 'bank.capacitence=1m:5m:3', /Did you mean "bank\.capacitance"/],
    [['--vary', 'bank.capacitance=1kV:2kV:3'], '--vary', 'bank.capacitance=1kV:2kV:3', /voltage/],
    [['--vary', 'a.b=1:2:2', '--vary', 'c.d=1:2:2', '--vary', 'e.f=1:2:2', '--vary', 'g.h=1:2:2'], '--vary', '', /one to three/],
    [['--tolerance', 'bank.capacitance=10%'], '--tolerance', 'bank.capacitance=10%', /no ± sign/],
    [['--tolerance', 'bank.capacitance=±x%'], '--tolerance', 'bank.capacitance=±x%', /PATH=±x%/],
    [['--tolerance', 'bank.capacitance=±5%', '--distribution', 'gauss'], '--distribution', 'gauss', /uniform .* or normal/],
    [['--vary', 'bank.voltage=1k,2k', '--tolerance', 'bank.capacitance=±5%'], '--tolerance', '', /either a sweep/],
    [[], '--vary', '', /nothing to vary/],
  ])('bad input %j: exit 2 and a message naming the option, the value and the expected form', async (args, option, value, expected) => {
    const r = await run(['sweep', 'bench.yaml', ...args]);
    expect(r.code).toBe(2);
    expect(r.err).toContain(`fluxkick: ${option}`);
    if (value) expect(r.err).toContain(`"${value}"`);
    expect(r.err).toMatch(/expected /);
    expect(r.err).toMatch(expected);
    expect(r.err).not.toMatch(/\n\s+at /); // no stack
  });

  it('an output path that cannot be written, or is the design, is refused before any shot: exit 2 at once', async () => {
    // a million-point grid would run for hours: a prompt exit 2 shows the check came first
    const huge = ['--vary', 'bank.capacitance=1m:5m:1000', '--vary', 'bank.voltage=1k:2k:1000'];
    const svg = await run(['sweep', 'bench.yaml', ...huge, '--svg', 'no-such-folder/map.svg']);
    expect(svg.code).toBe(2);
    expect(svg.err).toContain('--svg');
    expect(svg.err).toContain('no-such-folder');
    expect(svg.out).toBe('');
    const csv = await run(['sweep', 'bench.yaml', ...huge, '--csv', 'bench.yaml']);
    expect(csv.code).toBe(2);
    expect(csv.err).toMatch(/refusing to write over it/);
    const html = await run(['sweep', 'bench.yaml', '--tolerance', 'bank.voltage=±3%', '--samples', '1000000', '--html', 'no-such-folder/t.html']);
    expect(html.code).toBe(2);
    expect(html.err).toContain('--html');
    expect(readFileSync(join(dir, 'bench.yaml'), 'utf8')).toMatch(/bank/);
  }, 30_000);

  it('tolerance run: a fixed seed gives the identical run; --html and --svg carry the histogram', async () => {
    const args = ['sweep', 'bench.yaml', '--tolerance', 'bank.capacitance=±10%', '--tolerance', 'coil.resistance=+-5%', '--samples', '20', '--seed', '9', '--json'];
    const a = JSON.parse((await run(args)).out) as Record<string, unknown>;
    const b = JSON.parse((await run(args)).out) as Record<string, unknown>;
    delete a.wallTime_s;
    delete b.wallTime_s;
    expect(b).toEqual(a);
    expect((a.rows as unknown[]).length).toBe(20);
    const page = await run(['sweep', 'bench.yaml', '--tolerance', 'bank.voltage=±3%', '--samples', '12', '--html', 'spread.html', '--svg', 'hist.svg']);
    expect(page.code).toBe(0);
    expect(page.out).toMatch(/Shots reaching the required field/);
    expect(readFileSync(join(dir, 'spread.html'), 'utf8')).toMatch(/<svg/);
    expect(readFileSync(join(dir, 'hist.svg'), 'utf8')).toMatch(/^<svg/);
  });

  it('Ctrl-C stops cleanly: exit 130 and the rows already done are written', async () => {
    const io = captureIo({ cwd: dir });
    const timer = setTimeout(() => process.emit('SIGINT'), 1500);
    const code = await main(['sweep', 'bench.yaml', '--vary', 'bank.voltage=0.5k:1.5k:3000', '--threads', '0', '--csv', 'partial.csv'], io);
    clearTimeout(timer);
    expect(code).toBe(130);
    expect(io.err).toMatch(/interrupted after (\d+) of 3000 points/);
    const done = Number(/interrupted after (\d+)/.exec(io.err)![1]);
    expect(done).toBeLessThan(3000);
    const lines = readFileSync(join(dir, 'partial.csv'), 'utf8').trimEnd().split('\n');
    expect(lines).toHaveLength(1 + done);
    expect(io.out).toContain(`${done} of 3000 points (interrupted`);
  });
});
