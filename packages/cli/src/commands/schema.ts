/** `fluxkick schema`: print the JSON Schema of the design file. */
import type { Command } from 'commander';
import { designJsonSchema } from '@fluxkick/core';
import type { CliContext } from '../context.js';

export function registerSchema(program: Command, ctx: CliContext): Command {
  return program
    .command('schema')
    .description("print the design file's JSON Schema (draft 2020-12)")
    .addHelpText('after', '\nExample:\n  $ fluxkick schema > fluxkick-design.schema.json\n')
    .action(() => {
      ctx.io.stdout(`${JSON.stringify(designJsonSchema(), null, 2)}\n`);
    });
}
