/**
 * Shared helpers for commands: resolving paths against the Io's cwd, colour choice, the
 * exit code a command sets, and the exit-code convention.
 *
 * Exit codes: 0 success; 1 engineering failure under --strict; 2 bad input (InputError,
 * unknown option, missing argument); 3 internal error (a bug: the stack is printed).
 */
import { isAbsolute, resolve } from 'node:path';
import type { CliIo } from './io.js';

export const EXIT_OK = 0;
export const EXIT_ENGINEERING_FAIL = 1;
export const EXIT_BAD_INPUT = 2;
export const EXIT_BUG = 3;

export interface CliContext {
  io: CliIo;
  /** Set by a command's action; main() returns it. */
  exitCode: number;
  /** Absolute path of a user-given path (relative to io.cwd). */
  resolvePath(p: string): string;
  /** Colour on standard output: only on a terminal, never with NO_COLOR or --no-color. */
  useColor(optionColor?: boolean): boolean;
}

export function createContext(io: CliIo): CliContext {
  return {
    io,
    exitCode: EXIT_OK,
    resolvePath: (p) => (isAbsolute(p) ? p : resolve(io.cwd, p)),
    useColor: (optionColor) => optionColor !== false && io.stdoutIsTTY && !io.env.NO_COLOR,
  };
}
