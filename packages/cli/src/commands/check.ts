/** `fluxkick check <design>`: validate a design file and print what was understood, with units. */
import type { Command } from 'commander';
import { describeDesign, describeFixture, describeOrientation, designToStation, loadDesign, safetyNotice } from '@fluxkick/core';
import type { CliContext } from '../context.js';
import { renderSections } from '../render.js';

export function registerCheck(program: Command, ctx: CliContext): Command {
  return program
    .command('check')
    .description('validate a design file and print what was understood, in engineering units')
    .argument('<design>', 'design file (.yaml, .yml or .json)')
    .option('--json', 'print the station as the engine receives it (SI units) as JSON')
    .addHelpText('after', '\nExample:\n  $ fluxkick check examples/demo-station.yaml\n  $ fluxkick check my-station.yaml --json\n')
    .action((designPath: string, opts: { json?: boolean }) => {
      const path = ctx.resolvePath(designPath);
      const design = loadDesign(path);
      const station = designToStation(design, designPath);
      if (opts.json) {
        ctx.io.stdout(`${JSON.stringify(station, null, 2)}\n`);
        return;
      }
      const sections = [...describeDesign(design), ...describeFixture(design), describeOrientation(station)];
      ctx.io.stdout(`${designPath}: OK, understood as:\n\n${renderSections(sections)}\n${safetyNotice(station, 'text')}\n`);
    });
}
