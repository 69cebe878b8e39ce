/**
 * The penetration figures of a shot with conductive bodies (analysis/penetration.ts) as report
 * tables, for the HTML and Markdown reports (the text summary prints `penetrationText`):
 *
 *   "penetration"         rise time, equivalent frequency 1/(4·t_rise), the centre/surface field
 *                         ratios and the penetration (1 = fully penetrated), the centre's lag;
 *   "penetration-bodies"  per body: skin depth δ = √(2ρ/(ω·µ0)) against its radius or wall,
 *                         diffusion time µ0·σ·a² (or the tube-wall form) and rise/diffusion.
 *
 * Values formatted by formatQuantity (units/format.ts), like the other report tables.
 */
import type { PenetrationFigures } from '../analysis/penetration.js';
import type { Table } from './sections.js';
import { formatPlain, formatQuantity as q } from './quantity.js';

const ratio = (x: number | null): string => (x === null || !Number.isFinite(x) ? 'n/a' : `${formatPlain(100 * x)} %`);

/** The summary table and, when the fixture's bodies are known, the table of bodies. */
export function penetrationTables(p: PenetrationFigures): Table[] {
  const rows = [
    ['rise time to peak current', q(p.riseTime_s, 's')],
    ['equivalent frequency 1/(4·t_rise)', q(p.equivalentFrequency_Hz, 'Hz')],
    ["field at the part's centre / at its surface, when the surface field peaks", ratio(p.centreToSurfaceAtPeak)],
    ['peak field at the centre / peak field at the surface', ratio(p.centreToSurfacePeaks)],
    ['the same ratio without eddy currents (coil alone)', ratio(p.staticCentreToSurface)],
    ['penetration (peak ratio / ratio without eddy currents; 100 % = fully in)', ratio(p.penetration)],
    ['the centre peaks after the surface by', p.centreLag_s === null ? 'n/a' : q(p.centreLag_s, 's')],
  ];
  const out: Table[] = [
    {
      id: 'penetration',
      title: 'Penetration of the field (eddy currents)',
      columns: [
        { header: 'figure', align: 'left' },
        { header: 'value', align: 'right' },
      ],
      rows: rows.map((cells) => ({ cells })),
      // the part.not-penetrated warning, when raised (it is also in the shot's warnings)
      notes: p.warnings.map((w) => `${w.code}: ${w.message}`),
    },
  ];
  if (p.bodies.length > 0) {
    out.push({
      id: 'penetration-bodies',
      title: 'Conductive bodies at the equivalent frequency',
      columns: [
        { header: 'body', align: 'left' },
        { header: 'skin depth', align: 'right' },
        { header: 'radius or wall', align: 'right' },
        { header: 'size / skin depth', align: 'right' },
        { header: 'diffusion time', align: 'right' },
        { header: 'rise / diffusion', align: 'right' },
        { header: 'diffusion time basis', align: 'left' },
      ],
      rows: p.bodies.map((b) => ({
        cells: [
          `${b.name}${b.isPart ? ' (the part)' : ''}`,
          q(b.skinDepth_m, 'm'),
          `${q(b.size_m, 'm')} ${b.solid ? '(radius)' : '(wall)'}`,
          formatPlain(b.sizeOverSkinDepth),
          q(b.diffusionTime_s, 's'),
          formatPlain(b.riseOverDiffusion),
          b.diffusionTimeBasis,
        ],
      })),
    });
  }
  return out;
}
