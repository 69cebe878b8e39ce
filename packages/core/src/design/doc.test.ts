import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { designFileMarkdown } from './doc.js';
import { designJsonSchema } from './schema.js';
import { DEFAULT_SOLVER } from '../model/station.js';

describe('generated design documentation', () => {
  it('docs/design-file.md is up to date (regenerate: pnpm tsx packages/core/scripts/design-doc.ts)', () => {
    const path = fileURLToPath(new URL('../../../../docs/design-file.md', import.meta.url));
    expect(readFileSync(path, 'utf8')).toBe(designFileMarkdown());
  });
  it('documents the solver defaults from DEFAULT_SOLVER (defined once)', () => {
    const md = designFileMarkdown();
    expect(md).toContain(`| \`maxSteps\` | whole number | ${DEFAULT_SOLVER.maxSteps} |`);
    expect(md).toContain('| `initialTemperature` | temperature, °C (e.g. `40 degC`) | 20 °C |');
  });
  it('JSON Schema: top-level properties, required sections, defaults', () => {
    const js = designJsonSchema() as { properties: Record<string, { properties?: Record<string, { default?: unknown }> }>; required: string[]; additionalProperties: boolean };
    expect(Object.keys(js.properties)).toEqual(expect.arrayContaining(['name', 'bank', 'switch', 'freewheel', 'cable', 'coil', 'coupled', 'probes', 'solver']));
    expect(js.required).toEqual(['bank', 'coil']);
    expect(js.additionalProperties).toBe(false);
    expect(js.properties.solver!.properties!.relTol!.default).toBe(DEFAULT_SOLVER.relTol);
    expect(JSON.parse(JSON.stringify(js))).toEqual(js);
  });
});

describe('designFileMarkdown() value column', () => {
  // zod's internal type names (pipe, transform, ...) mean nothing to a user writing a design file
  const internal = ['pipe', 'transform', 'union', 'literal', 'preprocess', 'custom', 'any', 'unknown', 'lazy', 'boolean'];
  const kinds = designFileMarkdown()
    .split('\n')
    .filter((l) => l.startsWith('| `'))
    .map((l) => l.split(' | ')[1]!.trim());
  it('never shows a zod type name', () => {
    expect(kinds.length).toBeGreaterThan(50);
    for (const k of kinds) expect(internal).not.toContain(k);
  });
  it('describes production.insulationClass by the classes it accepts', () => {
    const row = designFileMarkdown().split('\n').find((l) => l.startsWith('| `insulationClass` |'));
    expect(row).toMatch(/\| one of .*`F`.*`H`/);
  });
});

describe('designFileMarkdown() nested sections', () => {
  const md = designFileMarkdown();
  it('documents every nested section and list of sections under its own heading', () => {
    for (const h of ['### `ratings.switch`', '### `ratings.capacitor`', '### `part.datasheet`', '### `yoke.members` (list; each item)', '### `steady.supply`']) {
      expect(md).toContain(`\n${h}\n`);
    }
    // fields only reachable through a nested section
    expect(md).toMatch(/\| `surgeBasis` \| one of `10ms`, `8.3ms` \| `10ms` \|/);
    expect(md).toMatch(/\| `reverse` \| number \|/);
  });
  it('documents each form of a union under its fixed fields', () => {
    expect(md).toContain('#### `fixture.windings.conductor` (shape: round)');
    expect(md).toContain('#### `fixture.windings.conductor` (shape: rectangular)');
    expect(md).not.toMatch(/section or section/);
  });
});
