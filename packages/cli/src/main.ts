/**
 * The fluxkick command line, runnable in-process: `main(argv, io)` parses the arguments
 * with commander, runs one command, and returns the exit code (see context.ts). It never
 * calls process.exit, so tests capture stdout/stderr through `captureIo()`.
 *
 * Bad input (InputError, unknown option, missing argument) -> a short message on stderr and
 * exit 2, no stack. Anything else is a bug: the stack is printed and the exit code is 3.
 */
import { Command, CommanderError } from 'commander';
import { formatInputError, isInputError } from '@fluxkick/core';
import { COMMANDS } from './commands/index.js';
import { createContext, EXIT_BAD_INPUT, EXIT_BUG, EXIT_OK } from './context.js';
import { processIo, type CliIo } from './io.js';
import { VERSION } from './version.js';

export function buildProgram(ctx: ReturnType<typeof createContext>): Command {
  const program = new Command();
  program
    .name('fluxkick')
    .description('Design capacitor-discharge impulse magnetizers: simulate a shot, judge it, size the bank.')
    .version(VERSION, '-V, --version')
    .showHelpAfterError('(run with --help for usage)')
    .exitOverride()
    .configureOutput({
      writeOut: (s) => ctx.io.stdout(s),
      writeErr: (s) => ctx.io.stderr(s),
      outputError: (s, write) => write(s),
    })
    .addHelpText(
      'after',
      `
Examples:
  $ fluxkick demo                              simulate the shipped example station
  $ fluxkick check examples/demo-station.yaml  show what the design file says, in engineering units
  $ fluxkick shot my-station.yaml --json       one discharge as JSON

Exit codes: 0 ok, 1 engineering failure (with --strict), 2 bad input, 3 internal error.`,
    );
  for (const register of COMMANDS) {
    const cmd = register(program, ctx);
    cmd.exitOverride().configureOutput({
      writeOut: (s) => ctx.io.stdout(s),
      writeErr: (s) => ctx.io.stderr(s),
    });
    cmd.showHelpAfterError('(run with --help for usage)');
  }
  return program;
}

/** Run the CLI with `argv` (arguments only, without node and the script). Returns the exit code. */
export async function main(argv: readonly string[], io: CliIo = processIo()): Promise<number> {
  const ctx = createContext(io);
  const program = buildProgram(ctx);
  try {
    if (argv.length === 0) {
      program.outputHelp();
      return EXIT_OK;
    }
    await program.parseAsync([...argv], { from: 'user' });
    return ctx.exitCode;
  } catch (e) {
    if (e instanceof CommanderError) {
      // --help and --version end here with exitCode 0; usage errors are bad input.
      if (e.exitCode === 0 || e.code === 'commander.helpDisplayed' || e.code === 'commander.version' || e.code === 'commander.help') return EXIT_OK;
      return EXIT_BAD_INPUT;
    }
    if (isInputError(e)) {
      io.stderr(`fluxkick: ${formatInputError(e)}\n`);
      return EXIT_BAD_INPUT;
    }
    const err = e instanceof Error ? e : new Error(String(e));
    io.stderr(`fluxkick: internal error (a bug, please report it with the design file):\n${err.stack ?? err.message}\n`);
    return EXIT_BUG;
  }
}
