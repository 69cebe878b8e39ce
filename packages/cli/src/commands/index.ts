/**
 * The command registry: one line per command, in the order `fluxkick --help` lists them.
 * A command module exports `register(program, ctx)`, which adds its subcommand (with an
 * example in its --help) and returns it; its action sets `ctx.exitCode` when not 0.
 */
import type { Command } from 'commander';
import type { CliContext } from '../context.js';
import { registerDemo } from './demo.js';
import { registerShot } from './shot.js';
import { registerCheck } from './check.js';
import { registerSchema } from './schema.js';
import { registerHold } from './hold.js';
import { registerSweep } from './sweep.js';
import { registerSize } from './size.js';
import { registerCoil } from './coil.js';

export type RegisterCommand = (program: Command, ctx: CliContext) => Command;

export const COMMANDS: RegisterCommand[] = [
  registerDemo,
  registerShot,
  registerCheck,
  registerSchema,
  registerHold,
  registerSweep,
  registerSize,
  registerCoil,
];
