import { mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { main } from '../main.js';
import { captureIo } from '../io.js';

const ROOT = fileURLToPath(new URL('../../../../', import.meta.url));
const DEMO = readFileSync(join(ROOT, 'examples/demo-station.yaml'), 'utf8');

async function run(args: string[], cwd: string) {
  const io = captureIo({ cwd });
  const code = await main(args, io);
  return { code, out: io.out, err: io.err };
}

/** The demo station with check sections appended, written to a temporary file. */
function designWith(sections: string): { dir: string; file: string } {
  const dir = mkdtempSync(join(tmpdir(), 'fk-verdict-'));
  const file = join(dir, 'station.yaml');
  writeFileSync(file, `${DEMO}\n${sections}`);
  return { dir, file };
}

describe('fluxkick shot: the verdict', () => {
  it('--json carries the verdict items under `verdict`', async () => {
    const { dir } = designWith('part: { grade: ndfeb-h }\nratings: { capacitor: { voltage: 2.5 kV } }\nbleeder: { resistance: 10 kohm }\n');
    const r = await run(['shot', 'station.yaml', '--json'], dir);
    expect(r.code).toBe(0);
    const js = JSON.parse(r.out) as { verdict: { overall: string; items: { id: string; status: string; value: number | null }[] } };
    const ids = js.verdict.items.map((i) => i.id);
    for (const id of ['field.part', 'part.saturation', 'winding.pressure', 'capacitor.voltage', 'bleeder.time']) expect(ids).toContain(id);
    expect(['pass', 'warn', 'fail']).toContain(js.verdict.overall);
  });

  it('the text output shows the verdict table; --strict exits 1 on a fail and 0 without', async () => {
    // a 1.5 kV capacitor rating under a 1.6 kV charge: a certain fail
    const { dir } = designWith('ratings: { capacitor: { voltage: 1.5 kV } }\n');
    const plain = await run(['shot', 'station.yaml'], dir);
    expect(plain.code).toBe(0);
    expect(plain.out).toMatch(/Capacitor charge voltage/);
    expect(plain.out).toMatch(/FAIL/i);
    const strict = await run(['shot', 'station.yaml', '--strict'], dir);
    expect(strict.code).toBe(1);
  });

  it('--strict exits 0 when every judged item passes', async () => {
    const { dir } = designWith('ratings: { capacitor: { voltage: 3 kV } }\n');
    const strict = await run(['shot', 'station.yaml', '--strict', '--json'], dir);
    const js = JSON.parse(strict.out) as { verdict: { overall: string } };
    expect(js.verdict.overall).toBe('pass');
    expect(strict.code).toBe(0);
  });
});
