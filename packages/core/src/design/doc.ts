/**
 * docs/design-file.md, generated from the schema so that the documented defaults are the
 * code's defaults (each defined once, in its section). Regenerate with
 * `pnpm tsx packages/core/scripts/design-doc.ts`; doc.test.ts fails when the file is stale.
 */
import { DIMENSIONS, type DimensionInfo } from '../units/quantity.js';
import { formatQuantity } from '../units/format.js';
import { defaultOf, quantityInfo, unwrapSchema } from './quantity-schema.js';
import { DESIGN_SECTIONS } from './schema.js';

type Def = {
  type: string;
  shape?: Record<string, unknown>;
  element?: unknown;
  innerType?: unknown;
  entries?: Record<string, string>;
  valueType?: unknown;
  options?: unknown[];
  values?: unknown[];
  in?: unknown;
  out?: unknown;
};

function def(s: unknown): Def | undefined {
  return (unwrapSchema(s) as { _zod?: { def: Def } } | undefined)?._zod?.def;
}

function descriptionOf(s: unknown): string {
  // zod keeps .meta() in the global registry; walk the wrappers until one has a description
  let cur = s as { description?: string; _zod?: { def: Def } } | undefined;
  for (let i = 0; i < 10 && cur; i++) {
    if (cur.description) return cur.description;
    cur = cur._zod?.def.innerType as typeof cur;
  }
  return '';
}

function isOptional(s: unknown): boolean {
  let cur = s as { _zod?: { def: Def } } | undefined;
  for (let i = 0; i < 10 && cur?._zod; i++) {
    const t = cur._zod.def.type;
    if (t === 'optional' || t === 'default' || t === 'prefault' || t === 'nullable') return true;
    cur = cur._zod.def.innerType as typeof cur;
  }
  return false;
}

function esc(s: string): string {
  return s.replace(/\|/g, '\\|').replace(/\n/g, ' ');
}

function showDefault(field: unknown): string {
  const d = defaultOf(field);
  if (!d) return isOptional(field) ? '(optional)' : '**required**';
  const q = quantityInfo(field);
  const v = d.value;
  if (q && typeof v === 'number') return q.unit ? formatQuantity(v, q.unit, { digits: 6 }) : String(v);
  if (Array.isArray(v)) return v.length ? JSON.stringify(v) : 'none';
  if (v !== null && typeof v === 'object') return Object.keys(v).length ? JSON.stringify(v) : def(field)?.type === 'record' ? 'none' : 'all defaults';
  return `\`${String(v)}\``;
}

function kindOf(field: unknown): string {
  const q = quantityInfo(field);
  if (q) {
    const info: DimensionInfo = DIMENSIONS[q.dimension];
    if (q.dimension === 'dimensionless') return q.range.integer ? 'whole number' : 'number';
    return `${info.label.replace(/^an? /, '')}, ${info.unit} (e.g. \`${info.example}\`)`;
  }
  const d = def(field);
  if (!d) return 'value';
  switch (d.type) {
    case 'enum':
      return `one of ${Object.values(d.entries ?? {}).map((v) => `\`${v}\``).join(', ')}`;
    case 'string':
      return 'text';
    case 'record': {
      const vq = quantityInfo(d.valueType);
      return vq ? `map of names to ${DIMENSIONS[vq.dimension].label.replace(/^an? /, '')} (${DIMENSIONS[vq.dimension].unit})` : 'map';
    }
    case 'array':
      return 'list';
    case 'object':
      return 'section';
    case 'boolean':
      return '`true` or `false`';
    case 'literal':
      return (d.values ?? []).map((v) => `\`${String(v)}\``).join(' or ');
    case 'union':
      return [...new Set((d.options ?? []).map(kindOf))].join(' or ');
    case 'pipe':
      // z.preprocess(f, inner) and z.x().pipe(inner): the user writes what the inner type accepts;
      // for x.transform(f) (out is a transform) the input type is the one to describe
      return kindOf(def(d.out)?.type === 'transform' ? d.in : d.out);
    default:
      return d.type;
  }
}

function fieldDescription(field: unknown): string {
  const q = quantityInfo(field);
  const base = q?.description ?? descriptionOf(field);
  const range = q ? rangeWords(q.range) : '';
  return [base, range].filter(Boolean).join('; ');
}

function rangeWords(r: { positive?: boolean; nonNegative?: boolean; min?: number; max?: number }): string {
  const w: string[] = [];
  if (r.positive) w.push('> 0');
  else if (r.nonNegative) w.push('>= 0');
  if (r.min !== undefined) w.push(`>= ${r.min}`);
  if (r.max !== undefined) w.push(`<= ${r.max}`);
  return w.join(', ');
}

function table(shape: Record<string, unknown>): string[] {
  const rows = ['| field | value | default | meaning |', '|---|---|---|---|'];
  for (const [key, field] of Object.entries(shape)) {
    rows.push(`| \`${key}\` | ${esc(kindOf(field))} | ${esc(showDefault(field))} | ${esc(fieldDescription(field))} |`);
  }
  return rows;
}

/**
 * The table of a section (an object, or the items of a list of objects) under a heading, then
 * the same for each of its fields that is itself a section or a list of sections, one heading
 * level deeper (e.g. `ratings.switch`, `yoke.members`).
 */
function sectionDoc(path: string, field: unknown, level: number, out: string[]): void {
  const d = def(field);
  let shape: Record<string, unknown> | undefined;
  let title = `\`${path}\``;
  if (d?.type === 'object' && d.shape) shape = d.shape;
  else if (d?.type === 'array') {
    const el = def(d.element);
    if (el?.type === 'object' && el.shape) {
      shape = el.shape;
      title += ' (list; each item)';
    }
  }
  if (d?.type === 'union') {
    // one table per form, named by its fixed fields, e.g. `fixture.windings.conductor` (shape: round)
    for (const o of d.options ?? []) {
      const od = def(o);
      if (od?.type !== 'object' || !od.shape) continue;
      const fixed = Object.entries(od.shape)
        .map(([k, f]) => [k, def(f)] as const)
        .filter(([, fd]) => fd?.type === 'literal' || (fd?.type === 'enum' && Object.keys(fd.entries ?? {}).length === 1))
        .map(([k, fd]) => `${k}: ${String(fd!.type === 'literal' ? fd!.values?.[0] : Object.values(fd!.entries ?? {})[0])}`);
      out.push(`${'#'.repeat(level)} \`${path}\`${fixed.length ? ` (${fixed.join(', ')})` : ''}`, '', descriptionOf(o) || descriptionOf(field), '', ...table(od.shape), '');
    }
    return;
  }
  if (!shape) return;
  out.push(`${'#'.repeat(level)} ${title}`, '', descriptionOf(field) || descriptionOf(unwrapSchema(field)), '', ...table(shape), '');
  for (const [key, sub] of Object.entries(shape)) sectionDoc(`${path}.${key}`, sub, Math.min(level + 1, 4), out);
}

/** The Markdown reference of the design file. */
export function designFileMarkdown(): string {
  const out: string[] = [
    '# The station design file',
    '',
    '<!-- generated by packages/core/scripts/design-doc.ts from packages/core/src/design/ — do not edit by hand -->',
    '',
    'A design file is YAML (`.yaml`, `.yml`) or JSON (`.json`). Every physical value is either a',
    'plain number in SI units (temperatures: °C) or a string with units, e.g. `2200 uF`, `1.6 kV`,',
    '`35 mohm`, `180 uH`, `40 degC`, `2.4 MA/m`, `95 A/m/A`, `2.1 kg`, `385 J/(kg K)`.',
    'Units are checked: a voltage where a capacitance belongs is an error naming the field.',
    'Accepted spellings include `µ` or `u` for micro, `Ω`/`ohm`, `°C`/`degC`, `K`, `degF`, and `%`',
    'for plain numbers. Unknown fields are errors (with the nearest known name suggested).',
    '',
    'Check a file with `fluxkick check <file>`; print the JSON Schema with `fluxkick schema`.',
    'Defaults below are the values used when a field is left out.',
    '',
  ];
  const top: string[] = ['## Top level', '', '| section | value | default | meaning |', '|---|---|---|---|'];
  const sections: string[] = [];
  for (const [key, field] of Object.entries(DESIGN_SECTIONS)) {
    const d = def(field);
    top.push(`| \`${key}\` | ${esc(kindOf(field))} | ${esc(showDefault(field))} | ${esc(d?.type === 'object' || d?.type === 'array' ? descriptionOf(field) || descriptionOf(unwrapSchema(field)) : fieldDescription(field))} |`);
    sectionDoc(key, field, 2, sections);
  }
  return [...out, ...top, '', ...sections].join('\n').replace(/\n+$/, '\n');
}
