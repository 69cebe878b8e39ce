/**
 * `fluxkick coil <spec>`: a coil (and any conductive bodies) from its dimensions. The spec is a
 * YAML or JSON file with the fields of a design's `fixture` section at the top level (windings,
 * part, bodies, points, and the part's `grade`), or a whole design file with a `fixture` section.
 * Prints turns, resistance, inductance, mass, field per ampere at the part, the published
 * estimates beside ours, and for conductive bodies their loops and the step response of the field
 * at the part's centre. `--json` prints the same in SI units.
 */
import type { Command } from 'commander';
import { coilSpecJson, formatQuantity, loadCoilSpec, type CoilSpecResult } from '@fluxkick/core';
import type { CliContext } from '../context.js';
import { renderSections, type RenderSection } from '../render.js';

const q = (v: number, unit: string, digits = 4) => formatQuantity(v, unit, { digits });
const pct = (x: number) => `${x >= 0 ? '+' : '−'}${Math.abs(100 * x).toFixed(2)} %`;

/** The human-readable report of a coil spec. */
export function coilReportText(r: CoilSpecResult, source: string): string {
  const b = r.build;
  const i = b.info;
  const sections: RenderSection[] = [];
  const conductor = i.windings
    .map((w) => `${w.metal}, ${w.wireDiameter_m !== undefined ? `⌀${q(w.wireDiameter_m, 'm')} round` : 'rectangular'}, ${q(w.conductorArea_m2, 'm²')}`)
    .filter((v, k, a) => a.indexOf(v) === k)
    .join('; ');
  sections.push({
    title: 'coil',
    rows: [
      { label: 'turns', text: `${i.turns} (${i.windings.map((w) => `${w.layers} layers × ${w.turnsPerLayer}`).join(' + ')})` },
      { label: 'conductor', text: conductor },
      { label: 'conductor length', text: q(i.conductorLength_m, 'm') },
      { label: 'resistance at 20 °C', text: q(i.resistance20_Ohm, 'Ω') },
      { label: 'inductance', text: q(i.inductance_H, 'H') },
      { label: 'conductor mass', text: q(i.mass_kg, 'kg') },
      { label: 'heat capacity', text: q(i.heatCapacity_JpK, 'J/K') },
    ],
  });
  if (i.windings.length > 1) {
    sections.push({
      title: 'windings (in series)',
      rows: i.windings.map((w, k) => ({
        label: w.name,
        text: `${w.turns} turns, r ${q(w.innerRadius_m, 'm', 3)}…${q(w.outerRadius_m, 'm', 3)}, centre ${q(w.centre_m, 'm', 3)}, ${w.sign > 0 ? 'aiding' : 'opposing'}, L alone ${q(i.windingInductances_H[k]!, 'H')}, R20 ${q(w.resistance20_Ohm, 'Ω')}`,
      })),
    });
  }
  const fieldRows = b.probes.map((p, k) => ({ label: p.name, text: `${q(p.coil_ApmPerA, '(A/m)/A')}  at r = ${q(i.probePoints[k]!.r_m, 'm', 3)}, z = ${q(i.probePoints[k]!.z_m, 'm', 3)}` }));
  if (i.partField) {
    fieldRows.push({ label: 'over the part: minimum', text: q(i.partField.min_ApmPerA, '(A/m)/A') });
    fieldRows.push({ label: 'over the part: mean', text: q(i.partField.mean_ApmPerA, '(A/m)/A') });
  }
  sections.push({ title: 'axial field per ampere of coil current (coil alone)', rows: fieldRows });
  sections.push({
    title: 'published estimates beside ours',
    rows: i.estimates.map((e) => {
      const unit = e.quantity === 'inductance_H' ? 'H' : '(A/m)/A';
      return {
        label: `${e.winding}: ${e.formula}`,
        text: `${q(e.value, unit)} vs ours ${q(e.ours, unit)}  ${pct(e.value / e.ours - 1)}  ${e.applies ? '' : '[outside its stated range] '}(${e.source}: ${e.accuracy})`,
      };
    }),
  });
  if (i.bodies.length) {
    const rows = i.bodies.map((bd) => ({
      label: bd.name,
      text: `${bd.material}, ${(bd.resistivity20_Ohm_m * 1e6).toPrecision(3)} µΩ·m; ${bd.loopCount} loops (${bd.radialShells} shells × ${bd.axialSlices} slices); heat capacity ${q(bd.heatCapacity_JpK, 'J/K', 3)}; diffusion time ${q(bd.diffusionTime_s, 's', 3)} (${bd.diffusionTimeBasis})`,
    }));
    if (r.stepResponse) {
      rows.push({ label: 'step of coil current', text: `the field at "${b.probes[0]!.name}" reaches 50 % in ${q(r.stepResponse.t50_s, 's', 3)} and 90 % in ${q(r.stepResponse.t90_s, 's', 3)}` });
    }
    sections.push({ title: 'conductive bodies (eddy-current loops)', rows });
  }
  if (r.notes.length) sections.push({ title: 'notes', rows: r.notes.map((n, k) => ({ label: `${k + 1}.`, text: n })) });
  return `${r.name} (${source})\n\n${renderSections(sections)}`;
}

export function registerCoil(program: Command, ctx: CliContext): Command {
  return program
    .command('coil')
    .description('a coil and its conductive bodies from their dimensions: turns, R, L, mass, field per ampere, published estimates beside ours')
    .argument('<spec>', 'coil spec (.yaml or .json): windings, part, bodies, points, grade; or a design file with a fixture section')
    .option('--json', 'print the figures in SI units as JSON')
    .addHelpText(
      'after',
      `
Example:
  $ fluxkick coil examples/coils/g7.yaml
  $ fluxkick coil examples/geometry-station.yaml --json

A spec file:
  windings:
    - { innerRadius: 14 mm, layers: 10, length: 32 mm, conductor: { shape: round, awg: 15 } }
  part: { outerRadius: 10 mm, length: 20 mm }
  grade: ndfeb-sh
  bodies:
    - { name: sleeve, innerRadius: 10.5 mm, outerRadius: 12 mm, length: 24 mm, material: stainless }
`,
    )
    .action((specPath: string, opts: { json?: boolean }) => {
      const r = loadCoilSpec(ctx.resolvePath(specPath));
      if (opts.json) {
        ctx.io.stdout(`${JSON.stringify(coilSpecJson(r), null, 2)}\n`);
        return;
      }
      ctx.io.stdout(coilReportText(r, specPath));
    });
}
