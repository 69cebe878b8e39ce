/** Plain aligned text for sections of label/value rows (check output). */
export interface RenderRow {
  label: string;
  text: string;
}
export interface RenderSection {
  title: string;
  rows: RenderRow[];
}

export function renderSections(sections: readonly RenderSection[]): string {
  const width = Math.max(0, ...sections.flatMap((s) => s.rows.map((r) => r.label.length)));
  const out: string[] = [];
  for (const s of sections) {
    out.push(s.title);
    for (const r of s.rows) out.push(`  ${r.label.padEnd(width)}  ${r.text}`);
    out.push('');
  }
  return out.join('\n');
}
