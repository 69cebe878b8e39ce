/**
 * One self-contained HTML report of a shot: inline CSS and inline SVG, no scripts, no external
 * resource of any kind (a Content-Security-Policy of `default-src 'none'` makes the browser
 * refuse any load, so the file reads the same offline, from a mail attachment or an archive).
 *
 * Order: the safety notice first, then the overall verdict, the station as understood (with
 * units), the figures, the verdict table, the pulse plot, and the phases, probes, loops,
 * penetration of the field (when given), energy balance and warnings. The tables are the same as in the text and Markdown outputs
 * (sections.ts). Print-friendly: white ground, no colour needed to read a status.
 */
import type { Station } from '../model/station.js';
import type { ShotResult } from '../model/result.js';
import type { Verdict } from '../model/verdict.js';
import { safetyNotice, escapeHtml as esc } from './safety.js';
import { type Table, shotTables } from './sections.js';
import { pulsePlotSvg } from './plot-pulse.js';
import type { PenetrationFigures } from '../analysis/penetration.js';
import { penetrationTables } from './penetration-tables.js';

export interface ShotReportInput {
  station: Station;
  result: ShotResult;
  verdict?: Verdict | null;
  /** Name shown in the title; defaults to station.name. */
  designName?: string;
  /** Extra line under the title, e.g. the design file and the program version. */
  subtitle?: string;
  /** Penetration figures of a shot with coupled loops (simulateDesign's `penetration`): shown as tables after the loops. */
  penetration?: PenetrationFigures | null;
}

/** The report's style sheet (our own: plain, print-friendly). */
export const REPORT_CSS = `
:root { color-scheme: light; }
* { box-sizing: border-box; }
body { margin: 0 auto; max-width: 60rem; padding: 1.5rem 1.25rem 3rem; font: 15px/1.45 Helvetica, Arial, sans-serif; color: #1a1a1a; background: #fff; }
h1 { font-size: 1.5rem; margin: 0 0 .25rem; }
h2 { font-size: 1.15rem; margin: 2rem 0 .5rem; padding-bottom: .2rem; border-bottom: 1px solid #bbb; }
p.subtitle { margin: 0 0 1rem; color: #555; }
section.safety { border: 2px solid #1a1a1a; padding: .5rem 1rem .75rem; margin: 1rem 0; background: #fafafa; }
section.safety h2 { margin-top: .25rem; border: 0; font-size: 1.05rem; }
section.safety h2::before { content: "\\26A0\\FE0E  "; }
section.safety ul { margin: .25rem 0 .5rem; padding-left: 1.25rem; }
section.safety .deference { font-style: italic; margin-bottom: 0; }
table { border-collapse: collapse; width: 100%; margin: .25rem 0 .5rem; font-variant-numeric: tabular-nums; }
th, td { text-align: left; padding: .2rem .5rem; border-bottom: 1px solid #ddd; vertical-align: top; }
th { border-bottom: 2px solid #1a1a1a; font-weight: bold; }
td.num, th.num { text-align: right; white-space: nowrap; }
td.group { color: #555; }
table.t-figures, table.t-energy, table.t-probes, table.t-loops, table.t-phases, table.t-penetration { width: auto; min-width: 55%; }
tr.status-fail td { background: #fbe3dc; }
tr.status-warn td { background: #fdf3d6; }
td.status { font-weight: bold; white-space: nowrap; }
tr.status-fail td.status::before { content: "\\2716\\FE0E  "; }
tr.status-warn td.status::before { content: "\\25B2\\FE0E  "; }
tr.status-pass td.status::before { content: "\\2714\\FE0E  "; }
p.overall { font-size: 1.1rem; margin: 1rem 0; padding: .4rem .75rem; border-left: 6px solid #1a1a1a; }
p.overall.fail { background: #fbe3dc; } p.overall.warn { background: #fdf3d6; } p.overall.pass { background: #e3f1ea; }
p.note, p.empty { color: #444; margin: .25rem 0; }
figure { margin: .5rem 0; }
figure svg { max-width: 100%; height: auto; display: block; }
figcaption { color: #555; font-size: .9rem; }
footer { margin-top: 2.5rem; color: #555; font-size: .85rem; border-top: 1px solid #bbb; padding-top: .5rem; }
@media print {
  body { max-width: none; padding: 0; font-size: 11pt; }
  h2 { break-after: avoid; }
  table, figure, section.safety { break-inside: avoid; }
  tr.status-fail td, tr.status-warn td, p.overall { print-color-adjust: exact; -webkit-print-color-adjust: exact; }
}
`;

/** A table as HTML. */
export function htmlTable(t: Table, headingLevel = 2, title = t.title): string {
  const head = `<h${headingLevel} id="${esc(t.id)}">${esc(title)}</h${headingLevel}>`;
  if (t.rows.length === 0) return `${head}\n<p class="empty">None.</p>`;
  const th = t.columns.map((c) => `<th${c.align === 'right' ? ' class="num"' : ''} scope="col">${esc(c.header)}</th>`).join('');
  const rows = t.rows.map((r, j) => {
    const cells = r.cells.map((c, i) => {
      const col = t.columns[i];
      const cls = [col.align === 'right' ? 'num' : '', col.header === 'status' ? 'status' : '', t.id === 'station' && i === 0 ? 'group' : '']
        .filter(Boolean)
        .join(' ');
      // the station table names each element once, on its first row
      const text = t.id === 'station' && i === 0 && j > 0 && t.rows[j - 1].cells[0] === c ? '' : c;
      return `<td${cls ? ` class="${cls}"` : ''}>${esc(text)}</td>`;
    });
    return `<tr${r.status ? ` class="status-${r.status}"` : ''}>${cells.join('')}</tr>`;
  });
  const notes = (t.notes ?? []).map((n) => `<p class="note">${esc(n)}</p>`).join('\n');
  return `${head}\n<table class="t-${esc(t.id)}">\n<thead><tr>${th}</tr></thead>\n<tbody>\n${rows.join('\n')}\n</tbody>\n</table>${notes ? '\n' + notes : ''}`;
}

/** "1 failed, 2 passed, 1 for information" (only the statuses present); "no limit checked" when none. */
export function verdictCounts(verdict: Verdict): string {
  const n = (st: string) => verdict.items.filter((i) => i.status === st).length;
  const parts = [
    [n('fail'), 'failed'],
    [n('warn'), 'with a warning'],
    [n('pass'), 'passed'],
    [n('info'), 'for information'],
  ]
    .filter(([k]) => (k as number) > 0)
    .map(([k, w]) => `${k} ${w}`);
  const checked = n('fail') + n('warn') + n('pass');
  return checked === 0 ? ['no limit checked', ...parts].join('; ') : parts.join(', ');
}

/** The whole report as one HTML document. */
export function shotReportHtml(input: ShotReportInput): string {
  const { station, result, verdict } = input;
  const name = input.designName ?? station.name;
  const tables = shotTables(station, result, verdict);
  const byId = new Map(tables.map((t) => [t.id, t]));
  const section = (id: string) => (byId.has(id) ? htmlTable(byId.get(id)!) : '');
  const overall = verdict
    ? `<p class="overall ${verdict.overall}">Overall verdict: <strong>${verdict.overall.toUpperCase()}</strong> (${esc(verdictCounts(verdict))}).</p>`
    : '<p class="overall">No verdict was computed for this shot (no limits given).</p>';
  const plot = pulsePlotSvg(result, { title: `Pulse of "${name}"`, id: 'pulse' });
  const body = [
    overall,
    section('station'),
    section('figures'),
    verdict ? section('verdict') : '',
    '<h2 id="plots">Pulse plot</h2>',
    `<figure>${plot}<figcaption>Coil current, capacitor voltage, field at the part and coil temperature against time since firing; numbered bands are the circuit phases, dashed rules their events, the dash-dot rule the end of the pulse.</figcaption></figure>`,
    section('phases'),
    section('probes'),
    section('loops'),
    ...(input.penetration ? penetrationTables(input.penetration).map((t) => htmlTable(t)) : []),
    section('energy'),
    section('warnings'),
    '<footer>Computed by fluxkick from the station values listed above. The figures are model results: check them against a low-voltage test shot before relying on them.</footer>',
  ];
  return htmlPage({ title: `Shot report: ${name}`, subtitle: input.subtitle, safety: safetyNotice(station, 'html'), body });
}

/**
 * One self-contained HTML page of ours: the content-security policy that forbids every external
 * resource, the inline stylesheet, the title as heading, then the safety notice (always first, above
 * any figure), then the body parts (already HTML; empty strings are dropped).
 */
export function htmlPage(page: { title: string; subtitle?: string; safety: string; body: readonly string[] }): string {
  const parts = [
    '<!DOCTYPE html>',
    '<html lang="en">',
    '<head>',
    '<meta charset="utf-8">',
    `<meta http-equiv="Content-Security-Policy" content="default-src 'none'; style-src 'unsafe-inline'; img-src data:">`,
    '<meta name="viewport" content="width=device-width, initial-scale=1">',
    `<title>${esc(page.title)}</title>`,
    `<style>${REPORT_CSS}</style>`,
    '</head>',
    '<body>',
    '<header>',
    `<h1>${esc(page.title)}</h1>`,
    page.subtitle ? `<p class="subtitle">${esc(page.subtitle)}</p>` : '',
    '</header>',
    page.safety.trimEnd(),
    ...page.body,
    '</body>',
    '</html>',
    '',
  ];
  return parts.filter((p, i) => p !== '' || i === parts.length - 1).join('\n');
}
