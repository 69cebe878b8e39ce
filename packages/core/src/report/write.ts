/**
 * Atomic writing of output files (reports, plots, CSV, JSON).
 *
 * Method: the content goes to a temporary file in the target's own folder (same file system),
 * which is then renamed over the target; rename within one file system replaces the name in one
 * step (POSIX rename(2)), so a reader sees either the old file or the complete new one, never a
 * partial one. On any failure the temporary file is removed.
 *
 * Guard: a target that is one of the given input files (same resolved path, or the same file
 * through a link: same device and inode) is refused, so `--html station.yaml` cannot destroy
 * the design. Failures become an InputError with code `output.unwritable` or `output.is-input`
 * naming the path (the CLI exits 2).
 */
import { closeSync, existsSync, fsyncSync, openSync, renameSync, statSync, unlinkSync, writeSync } from 'node:fs';
import { basename, dirname, join, resolve } from 'node:path';
import { randomBytes } from 'node:crypto';
import { InputError } from '../design/errors.js';

export interface WriteOutputOptions {
  /** Input files that must never be overwritten (e.g. the design file). */
  inputs?: readonly string[];
  /** Name of the option or field the path came from, for the error (default `output`). */
  field?: string;
}

function sameFile(a: string, b: string): boolean {
  if (resolve(a) === resolve(b)) return true;
  try {
    const sa = statSync(a);
    const sb = statSync(b);
    return sa.dev === sb.dev && sa.ino === sb.ino;
  } catch {
    return false;
  }
}

/** The cause of a failed write in a few words, without the temporary file's name. */
function plainReason(err: unknown, folder: string): string {
  const code = (err as { code?: string } | null)?.code;
  switch (code) {
    case 'ENOENT':
      return `the folder ${folder} does not exist`;
    case 'ENOTDIR':
      return `part of the path is not a folder`;
    case 'EACCES':
    case 'EPERM':
      return 'permission denied';
    case 'EISDIR':
      return 'it is a folder';
    case 'EROFS':
      return 'read-only file system';
    case 'ENOSPC':
      return 'no space left on the device';
    default:
      return err instanceof Error ? err.message : String(err);
  }
}

function unwritable(path: string, field: string, err: unknown, folder: string): InputError {
  return new InputError({
    code: 'output.unwritable',
    path: field,
    value: path,
    expected: 'a writable file path in an existing folder',
    problem: `cannot write "${path}" (${plainReason(err, folder)})`,
  });
}

const tempNameFor = (target: string) => join(dirname(target), `.${basename(target)}.${process.pid}.${randomBytes(4).toString('hex')}.tmp`);

/**
 * Check, before a long run, that `path` can be written later: not an input file, not a folder,
 * and a temporary file can be created (and is removed again) in its folder. Throws the same
 * InputError as writeOutputFile; leaves nothing behind.
 */
export function checkOutputPath(path: string, options: WriteOutputOptions = {}): void {
  const field = options.field ?? 'output';
  refuseInputs(path, field, options.inputs ?? []);
  const target = resolve(path);
  const tmp = tempNameFor(target);
  try {
    if (existsSync(target) && statSync(target).isDirectory()) throw Object.assign(new Error('is a folder'), { code: 'EISDIR' });
    closeSync(openSync(tmp, 'wx', 0o644));
    unlinkSync(tmp);
  } catch (err) {
    try {
      unlinkSync(tmp);
    } catch {
      /* never created */
    }
    throw unwritable(path, field, err, dirname(target));
  }
}

function refuseInputs(path: string, field: string, inputs: readonly string[]): void {
  for (const input of inputs) {
    if (sameFile(path, input)) {
      throw new InputError({
        code: 'output.is-input',
        path: field,
        value: path,
        expected: 'an output path different from the input files',
        problem: `"${path}" is the input file ${JSON.stringify(input)}; refusing to write over it`,
      });
    }
  }
}

/** Write `content` to `path` atomically; throws InputError when the path is an input or cannot be written. */
export function writeOutputFile(path: string, content: string | Uint8Array, options: WriteOutputOptions = {}): void {
  const field = options.field ?? 'output';
  refuseInputs(path, field, options.inputs ?? []);
  const target = resolve(path);
  const tmp = tempNameFor(target);
  let fd: number | undefined;
  try {
    fd = openSync(tmp, 'wx', 0o644);
    const buf = typeof content === 'string' ? Buffer.from(content, 'utf8') : content;
    let off = 0;
    while (off < buf.length) off += writeSync(fd, buf, off, buf.length - off);
    fsyncSync(fd);
    closeSync(fd);
    fd = undefined;
    renameSync(tmp, target);
  } catch (err) {
    if (fd !== undefined) {
      try {
        closeSync(fd);
      } catch {
        /* already closed */
      }
    }
    try {
      unlinkSync(tmp);
    } catch {
      /* never created, or already renamed */
    }
    throw unwritable(path, field, err, dirname(target));
  }
}
