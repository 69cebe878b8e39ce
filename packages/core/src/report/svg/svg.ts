/**
 * Small helpers to build SVG markup as strings in Node (no DOM): escaping, elements with
 * attributes, rounding of coordinates, and a rough text-width estimate for label placement.
 */

/** Escape text content and attribute values. */
export function esc(s: string): string {
  return s.replace(/&/g, '&amp;').replace(/</g, '&lt;').replace(/>/g, '&gt;').replace(/"/g, '&quot;');
}

export type Attrs = Record<string, string | number | undefined | null | false>;

/** Round a coordinate to 0.1 px (keeps files small; invisible at any zoom a report is read at). */
export function px(x: number): number {
  return Math.round(x * 10) / 10;
}

function attrString(a: Attrs): string {
  let s = '';
  for (const [k, v] of Object.entries(a)) {
    if (v === undefined || v === null || v === false) continue;
    s += ` ${k}="${esc(typeof v === 'number' ? String(px(v)) : v)}"`;
  }
  return s;
}

/** An element; children are markup strings (already escaped). No children: self-closing. */
export function el(name: string, attrs: Attrs = {}, children?: string | readonly string[]): string {
  const inner = children === undefined ? undefined : Array.isArray(children) ? children.join('') : (children as string);
  if (inner === undefined || inner === '') return `<${name}${attrString(attrs)}/>`;
  return `<${name}${attrString(attrs)}>${inner}</${name}>`;
}

/** A <text> element with escaped content. */
export function text(x: number, y: number, content: string, attrs: Attrs = {}): string {
  return el('text', { x, y, ...attrs }, esc(content));
}

/**
 * Approximate rendered width of `s` at `fontSize` px in a sans-serif face: 0.56 em per
 * character (a mean over Latin text in common sans faces; good enough to keep labels apart).
 */
export function textWidth(s: string, fontSize: number): number {
  return s.length * fontSize * 0.56;
}

/** The root <svg> element of a standalone figure with a title and description for screen readers. */
export function svgRoot(width: number, height: number, title: string, desc: string, body: readonly string[], id = 'fk'): string {
  return el(
    'svg',
    {
      xmlns: 'http://www.w3.org/2000/svg',
      width,
      height,
      viewBox: `0 0 ${width} ${height}`,
      role: 'img',
      'aria-labelledby': `${id}-title ${id}-desc`,
      'font-family': 'Helvetica, Arial, sans-serif',
      'font-size': 11,
      class: 'fk-plot',
    },
    [el('title', { id: `${id}-title` }, esc(title)), el('desc', { id: `${id}-desc` }, esc(desc)), ...body],
  );
}
