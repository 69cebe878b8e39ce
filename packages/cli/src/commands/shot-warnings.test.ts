import { mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { main } from '../main.js';
import { captureIo } from '../io.js';

const ROOT = fileURLToPath(new URL('../../../../', import.meta.url));

describe('fluxkick shot: warnings from how the station was built', () => {
  it('a yoke table that misses its tolerance is reported (yoke.table-tolerance)', async () => {
    // 1e-14 cannot be met within the knot cap, so the table reports ok: false
    const yaml = readFileSync(join(ROOT, 'examples/yoke-bench.yaml'), 'utf8').replace('\nyoke:\n', '\nyoke:\n  tableTolerance: 1e-14\n');
    const dir = mkdtempSync(join(tmpdir(), 'fk-yoke-'));
    writeFileSync(join(dir, 'yoke.yaml'), yaml);
    const io = captureIo({ cwd: dir });
    const code = await main(['shot', 'yoke.yaml', '--json'], io);
    expect(code).toBe(0);
    const js = JSON.parse(io.out) as { warnings: { code: string }[] };
    expect(js.warnings.map((w) => w.code)).toContain('yoke.table-tolerance');
  }, 60_000);
});
