import { mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { main } from '../main.js';
import { captureIo } from '../io.js';

const ROOT = fileURLToPath(new URL('../../../../', import.meta.url));
/** The demo station without its own check sections (each test appends the ones it needs). */
const CHECKS_MARKER = '\n# The sections below feed the verdict only';
const DEMO_FULL = readFileSync(join(ROOT, 'examples/demo-station.yaml'), 'utf8');
const DEMO = DEMO_FULL.slice(0, DEMO_FULL.indexOf(CHECKS_MARKER));

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
  it('the demo station carries every check section, and this test strips them', async () => {
    expect(DEMO_FULL.indexOf(CHECKS_MARKER)).toBeGreaterThan(0);
    for (const s of ['part:', 'ratings:', 'production:', 'bleeder:']) {
      expect(DEMO_FULL).toMatch(new RegExp(`^${s}`, 'm'));
      expect(DEMO).not.toMatch(new RegExp(`^${s}`, 'm'));
    }
  });

  it('demo: a verdict with every section judged, at most two warnings and no fail', async () => {
    const r = await run(['demo', '--json'], mkdtempSync(join(tmpdir(), 'fk-demo-')));
    const js = JSON.parse(r.out) as { verdict: { overall: string; items: { id: string; status: string }[] } };
    const ids = js.verdict.items.map((i) => i.id);
    for (const id of ['field.part', 'coil.temperature.production', 'switch.surge', 'diode.surge', 'capacitor.voltage', 'winding.hoop-stress', 'bleeder.time']) {
      expect(ids).toContain(id);
    }
    const statuses = js.verdict.items.map((i) => i.status);
    expect(statuses).not.toContain('fail');
    expect(statuses.filter((s) => s === 'warn').length).toBeLessThanOrEqual(2);
    expect(statuses.filter((s) => s === 'pass').length).toBeGreaterThanOrEqual(10);
  });

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
