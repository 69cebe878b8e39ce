import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { main } from '../main.js';
import { captureIo } from '../io.js';

const DESIGN = `
name: CLI sizing bench
bank: { capacitance: 2200 uF, voltage: 1.6 kV, esr: 4 mohm, esl: 0.2 uH }
switch: { kind: thyristor, thresholdVoltage: 1.2 V, slopeResistance: 0.4 mohm }
freewheel: { position: fixture, thresholdVoltage: 0.9 V, slopeResistance: 0.3 mohm }
cable: { resistance: 3 mohm, inductance: 1.5 uH }
coil: { inductance: 180 uH, resistance: 25 mohm, conductor: copper, mass: 2.1 kg, initialTemperature: 25 degC, fieldPerAmpere: 600 A/m/A }
coupled: [{ name: sleeve, inductance: 2 uH, resistance: 0.2 mohm, mutual: 10 uH, fieldPerAmpere: -100 A/m/A, heatCapacity: 200 J/K }]
part: { grade: ndfeb-sh, requiredField: 2.2 MA/m, fieldMargin: 10 % }
ratings: { margin: 20 %, capacitor: { voltage: 1.1 kV } }
`;
const dir = mkdtempSync(join(tmpdir(), 'fk-size-'));
writeFileSync(join(dir, 'bench.yaml'), DESIGN);
writeFileSync(join(dir, 'nopart.yaml'), DESIGN.replace(/^part:.*$/m, ''));

async function run(args: string[]) {
  const io = captureIo({ cwd: dir });
  const code = await main(args, io);
  return { code, out: io.out, err: io.err };
}

describe('fluxkick size', () => {
  it('gives the voltage for one capacitance, meeting the target within the stated tolerance', async () => {
    const r = await run(['size', 'bench.yaml', '--capacitance', '2.2mF', '--json']);
    expect(r.code).toBe(0);
    const j = JSON.parse(r.out) as { ok: boolean; voltage_V: number; field_Apm: number; targetField_Apm: number };
    expect(j.ok).toBe(true);
    // the design's part section: required 2.2 MA/m with a 10 % margin → 2.42 MA/m (arithmetic)
    expect(j.targetField_Apm).toBeCloseTo(2.42e6, 3);
    expect(j.field_Apm).toBeGreaterThanOrEqual(j.targetField_Apm);
    expect(j.field_Apm).toBeLessThanOrEqual(j.targetField_Apm * (1 + 1e-5));
  });

  it('reads a bare SI prefix of the capacitance unit (2.2m = 2.2 mF), as --vary does', async () => {
    const a = JSON.parse((await run(['size', 'bench.yaml', '--capacitance', '2.2m', '--json'])).out) as { capacitance_F: number; voltage_V: number };
    const b = JSON.parse((await run(['size', 'bench.yaml', '--capacitance', '2.2mF', '--json'])).out) as { capacitance_F: number; voltage_V: number };
    expect(a.capacitance_F).toBeCloseTo(2.2e-3, 15);
    expect(a.voltage_V).toBe(b.voltage_V);
  });

  it('finds the least-energy bank from units and says what binds', async () => {
    const r = await run(['size', 'bench.yaml', '--threads', '0', '--capacitance', '0.3mF:1.2mF', '--unit', 'capacitance=470uF,voltage=450V,esr=20mohm,esl=40nH', '--max-series', '3']);
    expect(r.code).toBe(0);
    expect(r.out).toContain('C = p·C_u/s, V_rating = s·V_u, ESR = s·ESR_u/p, ESL = s·ESL_u/p');
    expect(r.out).toMatch(/Least-energy bank: \ds × \dp/);
    expect(r.out).toMatch(/Binding: /);
    expect(r.out).toMatch(/Neighbouring choices:/);
    expect(r.out).toMatch(/SAFETY/);
  });

  it('takes --target-field and --margin when the design has no part section', async () => {
    const r = await run(['size', 'nopart.yaml', '--target-field', '2MA/m', '--margin', '5%', '--capacitance', '2.2mF']);
    expect(r.code).toBe(0);
    expect(r.out).toContain('the part needs 2 MA/m + 5 % margin = 2.1 MA/m');
  });

  it.each([
    [['--target-field', '2.4 kV'], '--target-field', /voltage/],
    [['--capacitance', '1mF:0.5mF'], '--capacitance', /smaller to a larger/],
    [['--unit', 'capacitance=470uF'], '--unit', /capacitance and voltage are required/],
    [['--unit', 'capacitance=470uF,voltage=450V,esx=1'], '--unit', /not one of/],
    [['--margin', 'lots'], '--margin', /headroom/],
  ])('bad input %j: exit 2 naming the option', async (args, option, problem) => {
    const r = await run(['size', 'bench.yaml', ...args]);
    expect(r.code).toBe(2);
    expect(r.err).toContain(`fluxkick: ${option}`);
    expect(r.err).toMatch(problem);
  });

  it('says a target is needed when there is neither --target-field nor a part section', async () => {
    const r = await run(['size', 'nopart.yaml', '--capacitance', '2.2mF']);
    expect(r.code).toBe(2);
    expect(r.err).toMatch(/--target-field/);
  });
});
