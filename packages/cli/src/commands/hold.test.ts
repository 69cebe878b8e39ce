import { mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { main } from '../main.js';
import { captureIo } from '../io.js';
import { HOLD_CAUTION } from './hold.js';

const ROOT = fileURLToPath(new URL('../../../../', import.meta.url));
const YOKE = 'examples/yoke-bench.yaml';

async function run(args: string[], cwd = ROOT) {
  const io = captureIo({ cwd });
  const code = await main(args, io);
  return { code, out: io.out, err: io.err };
}

describe('fluxkick hold', () => {
  it('prints the steady state, the yoke state and the target, with the caution; exit 0', async () => {
    const r = await run(['hold', YOKE]);
    expect(r.code).toBe(0);
    for (const want of ['Steady state', 'Yoke at the steady current', 'Target field 500 kA/m', 'on the current limit', 'leakage share', 'warm-up time constant']) expect(r.out).toContain(want);
    expect(r.out).toContain(HOLD_CAUTION);
  });

  it('--json gives SI numbers consistent with the physics: P = I²·R(T), T = T_amb + R_th·P (the steady heat balance)', async () => {
    const r = await run(['hold', YOKE, '--json']);
    expect(r.code).toBe(0);
    const j = JSON.parse(r.out) as {
      fixture: string;
      cooling: { ambient_C: number; thermalResistance_KpW: number };
      result: { mode: string; point: { current_A: number; coilResistance_Ohm: number; coilPower_W: number; coilTemperature_C: number; partField_Apm: number } };
    };
    expect(j.fixture).toBe('yoke');
    const p = j.result.point;
    expect(p.coilPower_W).toBeCloseTo(p.current_A ** 2 * p.coilResistance_Ohm, 9);
    expect(p.coilTemperature_C).toBeCloseTo(j.cooling.ambient_C + j.cooling.thermalResistance_KpW * p.coilPower_W, 6);
    // copper R(T) = R20·(1 + 0.00393·(T − 20)) with R20 = 0.3 Ω from the design (IEC 60028 α20)
    expect(p.coilResistance_Ohm).toBeCloseTo(0.3 * (1 + 0.00393 * (p.coilTemperature_C - 20)), 9);
  });

  it('options override the design: a higher current limit gives more field, an impossible target is named, --strict exits 1', async () => {
    const base = JSON.parse((await run(['hold', YOKE, '--json'])).out) as { result: { point: { partField_Apm: number } } };
    const more = JSON.parse((await run(['hold', YOKE, '--json', '--current-limit', '15 A'])).out) as { supply: { currentLimit_A: number }; result: { point: { partField_Apm: number } } };
    expect(more.supply.currentLimit_A).toBe(15);
    expect(more.result.point.partField_Apm).toBeGreaterThan(base.result.point.partField_Apm);
    const far = await run(['hold', YOKE, '--target-field', '3 MA/m', '--strict']);
    expect(far.code).toBe(1);
    expect(far.out).toMatch(/NOT reachable: .*current-limit/);
  });

  it('a bad option value is bad input (exit 2) naming the option and what was expected', async () => {
    const r = await run(['hold', YOKE, '--voltage', '30 A']);
    expect(r.code).toBe(2);
    expect(r.err).toContain('--voltage');
    expect(r.err).toMatch(/voltage \(V\)/);
  });

  it('a design without a steady section needs the supply and cooling as options', async () => {
    const dir = mkdtempSync(join(tmpdir(), 'fk-hold-'));
    const text = readFileSync(join(ROOT, YOKE), 'utf8').replace(/\nsteady:[\s\S]*$/, '\n');
    writeFileSync(join(dir, 'no-steady.yaml'), text);
    const r = await run(['hold', 'no-steady.yaml'], dir);
    expect(r.code).toBe(2);
    expect(r.err).toContain('steady.supply');
    expect(r.err).toContain('steady.cooling');
    const ok = await run(['hold', 'no-steady.yaml', '--current-limit', '5 A', '--thermal-resistance', '2 K/W'], dir);
    expect(ok.code).toBe(0);
    expect(ok.out).toContain('5 A limit');
  });
});

describe('fluxkick shot with a yoke fixture', () => {
  it('simulates the nonlinear fixture: energy balance closes, the field per ampere at the peak is below the small-current value', async () => {
    const r = await run(['shot', YOKE, '--json']);
    expect(r.code).toBe(0);
    const j = JSON.parse(r.out) as { figures: { peakCurrent_A: number; peakField_Apm: number; energyBalanceRelativeError: number } };
    expect(j.figures.energyBalanceRelativeError).toBeLessThan(1e-6);
    const check = JSON.parse((await run(['check', YOKE, '--json'])).out) as { probes: { coil_ApmPerA: number }[]; coil: { nonlinear?: unknown } };
    expect(check.coil.nonlinear).toBeDefined();
    expect(j.figures.peakField_Apm / j.figures.peakCurrent_A).toBeLessThan(check.probes[0].coil_ApmPerA);
  });
});
