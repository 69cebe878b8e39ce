/**
 * The shot report in Markdown (GitHub-flavoured tables): the same content as the HTML report.
 * Markdown cannot hold an inline SVG portably, so the pulse plot is written as a separate SVG
 * file next to the Markdown file (`<name>.pulse.svg`) and linked by a relative path; without a
 * plot path the report says where to get the plot instead. `shotReportMarkdownFiles` returns
 * both files for the caller to write (e.g. with writeOutputFile).
 */
import { basename, dirname, extname, join } from 'node:path';
import type { Table } from './sections.js';
import { shotTables } from './sections.js';
import { safetyNotice } from './safety.js';
import { pulsePlotSvg } from './plot-pulse.js';
import type { ShotReportInput } from './html.js';
import { penetrationTables } from './penetration-tables.js';

function cell(s: string): string {
  return s.replace(/\|/g, '\\|').replace(/\s+/g, ' ');
}

/** A table as GitHub-flavoured Markdown. */
export function markdownTable(t: Table, title = t.title): string {
  const head = `## ${title}`;
  if (t.rows.length === 0) return `${head}\n\nNone.`;
  const header = `| ${t.columns.map((c) => cell(c.header)).join(' | ')} |`;
  const rule = `|${t.columns.map((c) => (c.align === 'right' ? '---:' : ':---')).join('|')}|`;
  const rows = t.rows.map((r) => `| ${r.cells.map((c) => cell(c) || ' ').join(' | ')} |`);
  return [head, '', header, rule, ...rows, ...(t.notes?.length ? ['', ...t.notes] : [])].join('\n');
}

export interface MarkdownOptions {
  /** Relative path of the pulse plot SVG to link; omitted: a note says how to get the plot. */
  pulsePlotPath?: string;
}

export function shotReportMarkdown(input: ShotReportInput, options: MarkdownOptions = {}): string {
  const { station, result, verdict } = input;
  const name = input.designName ?? station.name;
  const tables = new Map(shotTables(station, result, verdict).map((t) => [t.id, t]));
  const section = (id: string) => (tables.has(id) ? markdownTable(tables.get(id)!) : '');
  const overall = verdict
    ? `**Overall verdict: ${verdict.overall.toUpperCase()}**`
    : '_No verdict was computed for this shot (no limits given)._';
  const plot = options.pulsePlotPath
    ? `## Pulse plot\n\n![Coil current, capacitor voltage, field at the part and coil temperature against time](${encodeURI(options.pulsePlotPath)})`
    : '## Pulse plot\n\n_Not included in Markdown: write it with `--svg FILE`, or use the HTML report, which holds it inline._';
  return [
    `# Shot report: ${name}`,
    input.subtitle ? `\n${input.subtitle}` : '',
    '',
    safetyNotice(station, 'markdown').trimEnd(),
    '',
    overall,
    '',
    section('station'),
    '',
    section('figures'),
    '',
    verdict ? section('verdict') + '\n' : '',
    plot,
    '',
    section('phases'),
    '',
    ...(tables.has('probes') ? [section('probes'), ''] : []),
    ...(tables.has('loops') ? [section('loops'), ''] : []),
    ...(input.penetration ? penetrationTables(input.penetration).flatMap((t) => [markdownTable(t), '']) : []),
    section('energy'),
    '',
    section('warnings'),
    '',
  ]
    .join('\n')
    .replace(/\n{3,}/g, '\n\n');
}

/** The plot file written next to a Markdown report: `dir/name.md` -> `dir/name.pulse.svg`. */
export function pulsePlotPathFor(markdownPath: string): string {
  const ext = extname(markdownPath);
  const base = basename(markdownPath, ext);
  return join(dirname(markdownPath), `${base}.pulse.svg`);
}

/** The Markdown report and its plot as files to write: [markdown, svg]. */
export function shotReportMarkdownFiles(input: ShotReportInput, markdownPath: string): { path: string; content: string }[] {
  const svgPath = pulsePlotPathFor(markdownPath);
  const name = input.designName ?? input.station.name;
  return [
    { path: markdownPath, content: shotReportMarkdown(input, { pulsePlotPath: basename(svgPath) }) },
    { path: svgPath, content: pulsePlotSvg(input.result, { title: `Pulse of "${name}"` }) + '\n' },
  ];
}
