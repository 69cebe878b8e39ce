/**
 * The penetration figures (analysis/penetration.ts) reach the HTML and Markdown reports and the
 * shot JSON, for the example station whose fixture is given by geometry (a sintered NdFeB
 * magnet in a stainless sleeve: examples/geometry-station.yaml, invented scenario). The numbers
 * themselves are checked in analysis/penetration.test.ts (skin depth of copper against
 * REFERENCES.md, the short and long pulse); here each report shows the same values.
 */
import { describe, expect, it } from 'vitest';
import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { parseDesign } from '../design/parse.js';
import { simulateDesign } from '../analysis/design-shot.js';
import { penetrationTables } from './penetration-tables.js';
import { shotReportHtml } from './html.js';
import { shotReportMarkdown } from './markdown.js';
import { shotToJson } from './json.js';
import { formatQuantity } from './quantity.js';
import { allElements, parseXml, textOf } from './__fixtures__/xml.js';

const text = readFileSync(fileURLToPath(new URL('../../../../examples/geometry-station.yaml', import.meta.url)), 'utf8');
const shot = simulateDesign(parseDesign(text, 'geometry-station.yaml'), 'geometry-station.yaml');
const p = shot.penetration!;

describe('penetrationTables(figures)', () => {
  it('a summary table and a table of the bodies (part first, then the sleeve), values with units', () => {
    const [summary, bodies] = penetrationTables(p);
    expect(summary.id).toBe('penetration');
    const cells = summary.rows.map((r) => r.cells.join(' | '));
    expect(cells).toContain(`equivalent frequency 1/(4·t_rise) | ${formatQuantity(p.equivalentFrequency_Hz, 'Hz')}`);
    expect(cells.some((c) => c.startsWith('penetration') && c.endsWith(' %'))).toBe(true);
    expect(bodies.id).toBe('penetration-bodies');
    expect(bodies.rows.map((r) => r.cells[0])).toEqual(['part (the part)', 'sleeve']);
    expect(bodies.rows[0].cells[1]).toBe(formatQuantity(p.bodies[0].skinDepth_m, 'm'));
    expect(bodies.rows[1].cells[2]).toContain('(wall)');
  });

  it('without bodies (loops given as numbers) only the summary; the warning goes into its notes', () => {
    const bare = { ...p, bodies: [], warnings: [{ code: 'part.not-penetrated', severity: 'warning' as const, message: 'short pulse' }] };
    const t = penetrationTables(bare);
    expect(t.map((x) => x.id)).toEqual(['penetration']);
    expect(t[0].notes).toEqual(['part.not-penetrated: short pulse']);
    const none = penetrationTables({ ...bare, centreToSurfaceAtPeak: null, penetration: null, centreLag_s: null });
    expect(none[0].rows.filter((r) => r.cells[1] === 'n/a')).toHaveLength(3);
  });
});

describe('the reports with penetration figures', () => {
  const input = { station: shot.station, result: shot.result, verdict: shot.verdict, penetration: p };

  it('HTML: both tables, after the loops and before the energy balance; absent without figures', () => {
    const html = shotReportHtml(input);
    const els = allElements(parseXml(html, { voidElements: ['meta', 'br'] }));
    const ids = els.filter((e) => e.name === 'h2').map((e) => e.attrs.id);
    expect(ids.indexOf('penetration')).toBeGreaterThan(ids.indexOf('loops'));
    expect(ids.indexOf('penetration-bodies')).toBe(ids.indexOf('penetration') + 1);
    expect(ids.indexOf('energy')).toBeGreaterThan(ids.indexOf('penetration-bodies'));
    const table = els.find((e) => e.name === 'table' && e.attrs.class === 't-penetration-bodies')!;
    expect(textOf(table)).toContain(formatQuantity(p.bodies[1].diffusionTime_s, 's'));
    expect(shotReportHtml({ ...input, penetration: undefined })).not.toContain('id="penetration"');
  });

  it('Markdown: both tables with their headings; absent without figures', () => {
    const md = shotReportMarkdown(input);
    expect(md).toContain('## Penetration of the field (eddy currents)');
    expect(md).toContain('## Conductive bodies at the equivalent frequency');
    expect(md).toContain(`| equivalent frequency 1/(4·t_rise) | ${formatQuantity(p.equivalentFrequency_Hz, 'Hz')} |`);
    expect(md.indexOf('## Penetration')).toBeLessThan(md.indexOf('## Energy balance'));
    expect(shotReportMarkdown({ ...input, penetration: null })).not.toContain('Penetration of the field');
  });

  it('JSON: `penetration` holds the same SI numbers; null without figures', () => {
    const j = shotToJson(shot.result, shot.verdict, { waveform: false, penetration: p });
    expect(j.penetration!.equivalentFrequency_Hz).toBe(p.equivalentFrequency_Hz);
    expect(j.penetration!.penetration).toBe(p.penetration);
    expect(j.penetration!.bodies.map((b) => [b.name, b.skinDepth_m, b.diffusionTime_s])).toEqual(
      p.bodies.map((b) => [b.name, b.skinDepth_m, b.diffusionTime_s]),
    );
    expect(shotToJson(shot.result, shot.verdict, { waveform: false }).penetration).toBeNull();
  });
});
