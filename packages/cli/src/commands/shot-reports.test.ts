import { mkdtempSync, readFileSync, existsSync, readdirSync, copyFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { main } from '../main.js';
import { captureIo } from '../io.js';

const ROOT = fileURLToPath(new URL('../../../../', import.meta.url));

async function run(args: string[], cwd: string) {
  const io = captureIo({ cwd });
  const code = await main(args, io);
  return { code, out: io.out, err: io.err };
}

describe('fluxkick shot --svg / --html / --md', () => {
  const dir = mkdtempSync(join(tmpdir(), 'fk-reports-'));
  const design = join(dir, 'station.yaml');
  copyFileSync(join(ROOT, 'examples/demo-station.yaml'), design);

  it('writes the pulse plot, the HTML report and the Markdown report with its plot', async () => {
    const r = await run(['shot', 'station.yaml', '--svg', 'pulse.svg', '--html', 'report.html', '--md', 'report.md'], dir);
    expect(r.err).toBe('');
    expect(r.code).toBe(0);
    expect(readFileSync(join(dir, 'pulse.svg'), 'utf8')).toMatch(/^<svg xmlns="http:\/\/www.w3.org\/2000\/svg"/);
    const html = readFileSync(join(dir, 'report.html'), 'utf8');
    expect(html.startsWith('<!DOCTYPE html>')).toBe(true);
    expect(html).toContain('class="safety"');
    expect(readFileSync(join(dir, 'report.md'), 'utf8')).toContain('](report.pulse.svg)');
    expect(existsSync(join(dir, 'report.pulse.svg'))).toBe(true);
    expect(r.out).toContain('HTML report report.html written');
    expect(readdirSync(dir).filter((f) => f.endsWith('.tmp'))).toEqual([]);
  });

  it('refuses to write over the design file: exit 2, a clear message, the design untouched', async () => {
    const before = readFileSync(design, 'utf8');
    for (const flag of ['--svg', '--html', '--md']) {
      const r = await run(['shot', 'station.yaml', flag, 'station.yaml'], dir);
      expect(r.code, flag).toBe(2);
      expect(r.err, flag).toContain(flag);
      expect(r.err, flag).toContain('station.yaml');
      expect(r.err, flag).not.toMatch(/\n\s+at .+:\d+:\d+/);
    }
    expect(readFileSync(design, 'utf8')).toBe(before);
  });

  it('an unwritable path exits 2 naming the path', async () => {
    const target = join(dir, 'no-such-folder', 'report.html');
    const r = await run(['shot', 'station.yaml', '--html', target], dir);
    expect(r.code).toBe(2);
    expect(r.err).toContain(target);
  });
});
