/**
 * Plain-text summary of one shot for a terminal or a log: the safety notice, the station as
 * understood, the phases with their event times, the figures, where the energy went, the
 * warnings and, when given, the verdict table (item, value, limit, margin, status).
 *
 * Colour (ANSI escapes) only when `color` is true (the CLI passes true on a terminal); every
 * status is also written as a word (PASS/WARN/FAIL/info), so nothing depends on colour.
 */
import type { Station } from '../model/station.js';
import type { ShotResult } from '../model/result.js';
import type { Verdict, VerdictStatus } from '../model/verdict.js';
import { safetyNotice } from './safety.js';
import { type Table, shotTables } from './sections.js';

export interface ShotTextInput {
  station: Station;
  result: ShotResult;
  verdict?: Verdict | null;
  /** Name shown in the title; defaults to station.name. */
  designName?: string;
  /** ANSI colour for headings and statuses (default false). */
  color?: boolean;
  /** Include the table of the station as understood (default true). */
  showStation?: boolean;
}

const ANSI = { bold: '\x1b[1m', reset: '\x1b[0m', red: '\x1b[31m', yellow: '\x1b[33m', green: '\x1b[32m', dim: '\x1b[2m' };
const STATUS_COLOR: Record<VerdictStatus, string> = { pass: ANSI.green, warn: ANSI.yellow, fail: ANSI.red, info: ANSI.dim };

/** Render one table as aligned columns with a heading; `color` only adds escapes around words. */
export function renderTextTable(table: Table, color = false, maxLastColumn = 60): string {
  const head = color ? `${ANSI.bold}${table.title}${ANSI.reset}` : table.title;
  const lines = [head, '-'.repeat(table.title.length)];
  if (table.rows.length === 0) {
    lines.push('  (none)');
  } else {
    const cols = table.columns.length;
    // the last column (messages, notes) is wrapped rather than widening every row
    const wrapLast = table.columns[cols - 1].align === 'left' && cols > 2;
    const cells = table.rows.map((r) => r.cells.map((c) => c.replace(/\s+/g, ' ')));
    const widths = table.columns.map((c, i) =>
      Math.max(c.header.length, ...cells.map((r) => (wrapLast && i === cols - 1 ? Math.min(maxLastColumn, r[i].length) : r[i].length))),
    );
    const fmt = (cellsOfRow: string[], status?: VerdictStatus) =>
      '  ' +
      cellsOfRow
        .map((c, i) => {
          const padded = table.columns[i].align === 'right' ? c.padStart(widths[i]) : i === cols - 1 ? c : c.padEnd(widths[i]);
          if (color && status && table.columns[i].header === 'status') return STATUS_COLOR[status] + padded + ANSI.reset;
          return padded;
        })
        .join('  ')
        .trimEnd();
    lines.push(fmt(table.columns.map((c) => c.header)));
    lines.push(fmt(widths.map((w) => '-'.repeat(w))));
    const indent = 2 + widths.slice(0, cols - 1).reduce((a, w) => a + w + 2, 0);
    for (const [j, row] of table.rows.entries()) {
      const r = cells[j];
      if (wrapLast && r[cols - 1].length > maxLastColumn) {
        const parts = wrapWords(r[cols - 1], maxLastColumn);
        lines.push(fmt([...r.slice(0, cols - 1), parts[0]], row.status));
        for (const p of parts.slice(1)) lines.push(' '.repeat(indent) + p);
      } else {
        lines.push(fmt(r, row.status));
      }
    }
  }
  for (const n of table.notes ?? []) lines.push(`  ${n}`);
  return lines.join('\n');
}

function wrapWords(text: string, width: number): string[] {
  const out: string[] = [];
  let line = '';
  for (const w of text.split(' ')) {
    if (line && line.length + 1 + w.length > width) {
      out.push(line);
      line = w;
    } else line = line ? `${line} ${w}` : w;
  }
  if (line) out.push(line);
  return out;
}

/** The whole plain-text summary of a shot. */
export function formatShotText(input: ShotTextInput): string {
  const { station, result, verdict, color = false, showStation = true } = input;
  const name = input.designName ?? station.name;
  const title = `Shot of "${name}"`;
  const parts: string[] = [
    color ? `${ANSI.bold}${title}${ANSI.reset}` : title,
    '='.repeat(title.length),
    '',
    safetyNotice(station, 'text').trimEnd(),
  ];
  if (verdict) {
    const word = verdict.overall.toUpperCase();
    const shown = color ? `${STATUS_COLOR[verdict.overall]}${ANSI.bold}${word}${ANSI.reset}` : word;
    parts.push('', `Overall verdict: ${shown} (details at the end)`);
  }
  for (const t of shotTables(station, result, verdict)) {
    if (t.id === 'station' && !showStation) continue;
    parts.push('', renderTextTable(t, color));
  }
  parts.push('');
  return parts.join('\n');
}
