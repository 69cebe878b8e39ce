import { afterAll, describe, expect, it, vi } from 'vitest';
import { linkSync, mkdirSync, mkdtempSync, readdirSync, readFileSync, rmSync, symlinkSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { checkOutputPath, writeOutputFile } from './write.js';
import { isInputError, type InputError } from '../design/errors.js';

/** Failure injection: writeSync writes `failAfter_bytes` bytes, then fails as a full disk would (-1: off). */
const inject = vi.hoisted(() => ({ failAfter_bytes: -1, written_bytes: 0 }));
vi.mock('node:fs', async (importOriginal) => {
  const fs = await importOriginal<typeof import('node:fs')>();
  const writeSync = ((fd: number, buffer: Uint8Array, offset?: number, length?: number) => {
    if (inject.failAfter_bytes < 0) return fs.writeSync(fd, buffer, offset, length);
    const n = fs.writeSync(fd, buffer, offset, Math.min(length ?? buffer.length, inject.failAfter_bytes));
    inject.written_bytes += n;
    throw Object.assign(new Error('ENOSPC: no space left on device, write'), { code: 'ENOSPC' });
  }) as typeof fs.writeSync;
  return { ...fs, default: { ...fs, writeSync }, writeSync };
});

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

  // Disk full halfway through the temp file (ENOSPC injected into writeSync, see the mock above):
  // a failure after part of the new content was written, which file permissions cannot give
  // as root (CI runs as root), so this runs for every user.
  it('a failed write keeps the previous file intact (no partial content)', () => {
    const q = join(dir, 'c.txt');
    writeFileSync(q, 'old');
    inject.failAfter_bytes = 10;
    inject.written_bytes = 0;
    try {
      const e = thrown(() => writeOutputFile(q, 'new content, much longer than ten bytes', { field: '--csv' }));
      expect(e.code).toBe('output.unwritable');
      expect(e.message).toContain('no space left on the device');
    } finally {
      inject.failAfter_bytes = -1;
    }
    expect(inject.written_bytes).toBe(10); // the failure came after part of the content was written
    expect(readFileSync(q, 'utf8')).toBe('old');
    expect(readdirSync(dir).filter((f) => f.startsWith('.c.txt.') && f.endsWith('.tmp'))).toEqual([]);
  });

  it('checkOutputPath refuses what writeOutputFile would refuse, before any work, and leaves the folder as it was', () => {
    const design = join(dir, 'check-design.yaml');
    writeFileSync(design, 'name: x\n');
    const before = readdirSync(dir).sort();
    expect(thrown(() => checkOutputPath(design, { inputs: [design], field: '--svg' })).code).toBe('output.is-input');
    const missing = thrown(() => checkOutputPath(join(dir, 'no-such-folder', 'map.svg'), { field: '--svg' }));
    expect(missing.code).toBe('output.unwritable');
    expect(missing.message).toContain('--svg');
    expect(thrown(() => checkOutputPath(dir)).code).toBe('output.unwritable'); // a folder
    checkOutputPath(join(dir, 'fine.svg'), { inputs: [design] }); // writable: no throw, nothing created
    expect(readdirSync(dir).sort()).toEqual(before);
  });
});
