import { afterAll, describe, expect, it } from 'vitest';
import { chmodSync, linkSync, mkdirSync, mkdtempSync, readdirSync, readFileSync, rmSync, symlinkSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { writeOutputFile } from './write.js';
import { isInputError, type InputError } from '../design/errors.js';

const dir = mkdtempSync(join(tmpdir(), 'fluxkick-write-'));
afterAll(() => rmSync(dir, { recursive: true, force: true }));

function thrown(f: () => void): InputError {
  try {
    f();
  } catch (e) {
    if (isInputError(e)) return e;
    throw e;
  }
  throw new Error('expected an InputError');
}

describe('writeOutputFile(path, content, {inputs})', () => {
  it('writes the content and replaces an existing file whole', () => {
    const p = join(dir, 'a.txt');
    writeOutputFile(p, 'first version, longer than the second');
    writeOutputFile(p, 'second');
    expect(readFileSync(p, 'utf8')).toBe('second');
    expect(readdirSync(dir).filter((f) => f.endsWith('.tmp'))).toEqual([]);
  });

  it('refuses to write over an input file, by path, through a symlink and through a hard link', () => {
    const input = join(dir, 'station.yaml');
    writeFileSync(input, 'name: kept\n');
    const sym = join(dir, 'sym.yaml');
    const hard = join(dir, 'hard.yaml');
    symlinkSync(input, sym);
    linkSync(input, hard);
    for (const target of [input, join(dir, '.', 'station.yaml'), sym, hard]) {
      const e = thrown(() => writeOutputFile(target, 'overwritten', { inputs: [input], field: '--html' }));
      expect(e.code).toBe('output.is-input');
      expect(e.path).toBe('--html');
      expect(e.value).toBe(target);
      expect(e.message).toContain(target);
    }
    expect(readFileSync(input, 'utf8')).toBe('name: kept\n');
  });

  it('an unwritable path throws InputError naming the path and leaves no partial file', () => {
    const missingFolder = join(dir, 'no-such-folder', 'report.html');
    const e = thrown(() => writeOutputFile(missingFolder, 'x', { field: '--html' }));
    expect(e.code).toBe('output.unwritable');
    expect(e.message).toContain(missingFolder);

    // target is a directory: the temp file is written, the rename fails, and the temp file must go
    const sub = join(dir, 'is-a-dir');
    mkdirSync(sub);
    writeFileSync(join(sub, 'inside'), 'keep');
    const e2 = thrown(() => writeOutputFile(sub, 'x'.repeat(100_000)));
    expect(e2.code).toBe('output.unwritable');
    expect(readdirSync(dir).filter((f) => f.includes('is-a-dir') && f.endsWith('.tmp'))).toEqual([]);
    expect(readFileSync(join(sub, 'inside'), 'utf8')).toBe('keep');
  });

  // root ignores folder permissions, so this case can only be checked as an ordinary user
  it.skipIf(process.getuid?.() === 0)('a failed write keeps the previous file intact (no partial content)', () => {
    // a read-only folder makes the temp file impossible; the old file must stay as it was
    const ro = join(dir, 'ro');
    mkdirSync(ro);
    const q = join(ro, 'c.txt');
    writeFileSync(q, 'old');
    chmodSync(ro, 0o555);
    try {
      const e = thrown(() => writeOutputFile(q, 'new'));
      expect(e.code).toBe('output.unwritable');
      expect(readFileSync(q, 'utf8')).toBe('old');
    } finally {
      chmodSync(ro, 0o755);
    }
  });
});
