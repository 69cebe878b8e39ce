/**
 * Generates docs/json-output.md from JSON_FIELDS (json.ts) and FIGURES (figures.ts), so the
 * document and the code have one source. Regenerate with
 *   UPDATE_DOCS=1 npx vitest run packages/core/src/report/json-doc.test.ts
 * (the test fails whenever the committed document differs from this output).
 */
import { JSON_FIELDS, SHOT_JSON_SCHEMA_VERSION } from './json.js';

function cell(s: string): string {
  return s.replace(/\|/g, '\\|');
}

export function jsonOutputMarkdown(): string {
  const top = JSON_FIELDS.filter((f) => !f.path.includes('.'));
  const section = (root: string) => JSON_FIELDS.filter((f) => f.path.startsWith(`${root}.`) || f.path.startsWith(`${root}[]`));
  const table = (rows: readonly { path: string; type: string; unit: string; description: string }[]) => [
    '| key | type | unit | meaning |',
    '|---|---|---|---|',
    ...rows.map((f) => `| \`${f.path}\` | ${cell(f.type)} | ${cell(f.unit || '–')} | ${cell(f.description)} |`),
  ];
  const lines: string[] = [
    '# JSON output of a shot',
    '',
    '<!-- Generated from packages/core/src/report/json.ts and figures.ts; do not edit by hand.',
    '     Regenerate: UPDATE_DOCS=1 npx vitest run packages/core/src/report/json-doc.test.ts -->',
    '',
    '`fluxkick shot <design> --json` prints one JSON object; add `--waveform` to include the',
    'sampled waveforms. The library gives the same object with `shotToJson(result, verdict, { waveform })`.',
    '',
    'Conventions:',
    '',
    '- Every number is in SI base units (A, V, s, H, F, Ω, T, A/m, J, K); temperatures named `_C` are in °C,',
    '  `_pct` are percentages, and a unit of `1` is a plain ratio.',
    '- JSON has no NaN or infinity: such values are written as `null` (for example the limit and margin of an',
    '  informative verdict item).',
    '- Keys are stable and appear in the order listed here. New keys may be added; a key is never renamed.',
    `  \`schemaVersion\` (now ${SHOT_JSON_SCHEMA_VERSION}) changes only if a key is removed or changes meaning.`,
    '- In the tables, `[]` marks the elements of an array.',
    '',
    '## Top level',
    '',
    ...table(top),
  ];
  for (const root of ['figures', 'verdict', 'warnings', 'phases', 'solver', 'energy', 'probes', 'loops', 'penetration', 'waveform']) {
    lines.push('', `## \`${root}\``, '', ...table(section(root)));
  }
  lines.push('');
  return lines.join('\n');
}
