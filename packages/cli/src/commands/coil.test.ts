import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { main } from '../main.js';
import { captureIo } from '../io.js';

const ROOT = fileURLToPath(new URL('../../../../', import.meta.url));

async function run(args: string[], cwd = ROOT) {
  const io = captureIo({ cwd });
  const code = await main(args, io);
  return { code, out: io.out, err: io.err };
}

describe('fluxkick coil', () => {
  it('prints turns, R, L, mass, field per ampere at the part and the published estimates beside ours; exit 0', async () => {
    const r = await run(['coil', 'examples/coils/g7.yaml']);
    expect(r.code).toBe(0);
    for (const want of ['turns', '190 (10 layers × 19)', 'resistance at 20 °C', 'inductance', 'conductor mass', 'part surface', 'Wheeler multilayer', 'Montgomery', 'diffusion time', 'reaches 50 %']) expect(r.out).toContain(want);
  });

  it('--json: SI numbers that agree with each other (R20 = ρ·ℓ/A for copper, IEC 60028)', async () => {
    const r = await run(['coil', 'examples/coils/g7.yaml', '--json']);
    expect(r.code).toBe(0);
    const j = JSON.parse(r.out) as { coil: { resistance20_Ohm: number; conductorLength_m: number; conductorArea_m2: number; inductance_H: number }; estimates: { formula: string; value: number; ours: number }[]; probes: { name: string }[] };
    expect(j.coil.resistance20_Ohm).toBeCloseTo((1.7241e-8 * j.coil.conductorLength_m) / j.coil.conductorArea_m2, 12);
    expect(j.probes[0].name).toBe('part');
    const m = j.estimates.find((e) => e.formula.startsWith('Montgomery'))!;
    expect(Math.abs(m.value / m.ours - 1)).toBeLessThan(0.01);
  });

  it('a single-layer coil shows Nagaoka and Wheeler single-layer', async () => {
    const dir = mkdtempSync(join(tmpdir(), 'fk-coil-'));
    const f = join(dir, 'solenoid.yaml');
    writeFileSync(f, 'windings:\n  - { innerRadius: 25 mm, layers: 1, length: 100 mm, conductor: { shape: round, awg: 18 } }\n');
    const r = await run(['coil', f, '--json']);
    expect(r.code).toBe(0);
    const j = JSON.parse(r.out) as { estimates: { formula: string; applies: boolean }[] };
    expect(j.estimates.map((e) => e.formula)).toEqual(expect.arrayContaining(["Nagaoka's coefficient (current sheet)", 'Wheeler single-layer']));
  });

  it('bad input: exit 2, the field path and no stack', async () => {
    const dir = mkdtempSync(join(tmpdir(), 'fk-coil-'));
    const f = join(dir, 'bad.yaml');
    writeFileSync(f, 'windings:\n  - { innerRadius: 25 mm, layers: 1, length: 10 mm, turnsPerLayer: 50, conductor: { shape: round, awg: 18 } }\n');
    const r = await run(['coil', f]);
    expect(r.code).toBe(2);
    expect(r.err).toContain('windings[0].turnsPerLayer');
    expect(r.err).not.toMatch(/\n\s+at .+:\d+:\d+/);
  });
});
