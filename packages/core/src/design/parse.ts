/**
 * Reading design files: YAML or JSON (.json by extension; YAML otherwise, a JSON superset), parsed with the `yaml`
 * package (YAML 1.2; JSON is read with JSON.parse for strictness), validated by the zod
 * schema, with every problem reported as one `InputError` that names the file, the field
 * path, the line and column, the value and what was expected. Never a zod message or stack.
 */
import { readFileSync } from 'node:fs';
import { basename, extname } from 'node:path';
import { isMap, LineCounter, parseDocument, type Document } from 'yaml';
import { InputError, type InputIssue } from './errors.js';
import { parseWithSchema } from './issues.js';
import { designSchema, type Design } from './schema.js';
import { designToStation } from './to-station.js';
import type { Station } from '../model/station.js';

type Locate = (path: readonly PropertyKey[]) => { line: number; column: number } | undefined;

function fileIssue(code: InputIssue['code'], problem: string, expected: string, line?: number, column?: number): InputIssue {
  const i: InputIssue = { code, path: '', value: undefined, problem, expected };
  if (line !== undefined) i.line = line;
  if (column !== undefined) i.column = column;
  return i;
}

/** .json -> JSON; anything else -> YAML (YAML 1.2 reads JSON too, so content in JSON form still works). */
function detectFormat(fileName: string): 'json' | 'yaml' {
  return extname(fileName).toLowerCase() === '.json' ? 'json' : 'yaml';
}

function lineCol(text: string, offset: number): { line: number; column: number } {
  let line = 1;
  let last = -1;
  for (let i = 0; i < offset && i < text.length; i++) {
    if (text.charCodeAt(i) === 10) {
      line++;
      last = i;
    }
  }
  return { line, column: offset - last };
}

function parseJson(text: string, fileName: string): { data: unknown; locate: Locate } {
  try {
    return { data: JSON.parse(text), locate: () => undefined };
  } catch (e) {
    const msg = e instanceof Error ? e.message : String(e);
    const pos = /position (\d+)/.exec(msg);
    const lc = /line (\d+) column (\d+)/.exec(msg);
    const where = lc ? { line: Number(lc[1]), column: Number(lc[2]) } : pos ? lineCol(text, Number(pos[1])) : undefined;
    const short = msg.replace(/^JSON\.parse: /, '').replace(/ in JSON at position \d+.*$/, '').replace(/\s*\(line \d+ column \d+\)$/, '');
    throw new InputError(fileIssue('file.syntax', `JSON syntax error: ${short}`, 'valid JSON (or use a .yaml file)', where?.line, where?.column), fileName);
  }
}

function yamlLocator(doc: Document, lc: LineCounter): Locate {
  return (path) => {
    // The node at the path, else the key of an unknown field, else the nearest existing parent.
    for (let n = path.length; n >= 0; n--) {
      const sub = path.slice(0, n);
      const node = (sub.length ? doc.getIn(sub as unknown[], true) : doc.contents) as { range?: [number, number, number] } | undefined;
      if (n === path.length - 1 && node && isMap(node)) {
        const pair = node.items.find((p) => (p.key as { value?: unknown } | null)?.value === path[n]);
        const keyRange = (pair?.key as { range?: [number, number, number] } | undefined)?.range;
        if (keyRange) {
          const p = lc.linePos(keyRange[0]);
          return { line: p.line, column: p.col };
        }
      }
      if (node?.range) {
        const p = lc.linePos(node.range[0]);
        return { line: p.line, column: p.col };
      }
    }
    return undefined;
  };
}

function parseYaml(text: string, fileName: string): { data: unknown; locate: Locate } {
  const lineCounter = new LineCounter();
  const doc = parseDocument(text, { lineCounter, prettyErrors: true, uniqueKeys: true });
  if (doc.errors.length) {
    const issues = doc.errors.map((err) => {
      const pos = err.linePos?.[0];
      const first = err.message.split('\n')[0]!.replace(/ at line \d+, column \d+:?$/, '');
      return fileIssue('file.syntax', `YAML syntax error: ${first}`, 'valid YAML, e.g. "capacitance: 2200 uF" (two-space indents, no tabs)', pos?.line, pos?.col);
    });
    throw new InputError(issues, fileName);
  }
  return { data: doc.toJS({ maxAliasCount: 100 }), locate: yamlLocator(doc, lineCounter) };
}

/**
 * The data of a YAML or JSON text (format by the file's extension) with a locator of field
 * paths to line and column, for other input files read the same way (e.g. `fluxkick coil` specs).
 * Syntax errors throw InputError naming the file.
 */
export function readStructuredText(text: string, fileName: string): { data: unknown; locate: Locate } {
  return detectFormat(fileName) === 'json' ? parseJson(text, fileName) : parseYaml(text, fileName);
}

/**
 * Parse the text of a design file (YAML or JSON) into a `Design`: SI numbers, defaults applied.
 * Throws InputError (never anything else for bad input). `fileName` picks the format by its
 * extension and names the file in messages; a missing `name` becomes the file's base name.
 *
 * @example parseDesign('bank: { capacitance: 2200 uF, voltage: 1.6 kV }\ncoil: {...}', 'station.yaml')
 */
export function parseDesign(text: string, fileName = 'design.yaml'): Design {
  if (text.trim() === '') {
    throw new InputError(fileIssue('file.empty', 'the file is empty', 'a station design with at least the sections bank and coil (see `fluxkick schema`)'), fileName);
  }
  const { data, locate } = detectFormat(fileName) === 'json' ? parseJson(text, fileName) : parseYaml(text, fileName);
  if (data === null || typeof data !== 'object' || Array.isArray(data)) {
    throw new InputError(
      { code: 'design.wrong-type', path: '', value: data, problem: `the file holds ${Array.isArray(data) ? 'a list' : data === null ? 'nothing' : `a single ${typeof data}`}`, expected: 'a station design with the sections bank, coil, ... (see `fluxkick schema`)' },
      fileName,
    );
  }
  const design = parseWithSchema(designSchema, data, { file: fileName, locate });
  if (design.name === undefined) {
    const base = basename(fileName, extname(fileName));
    if (base) design.name = base;
  }
  return design;
}

/** Read and parse a design file. Throws InputError for a missing or unreadable file and for bad content. */
export function loadDesign(path: string): Design {
  return parseDesign(readDesignText(path), path);
}

/** Read a design file's text; missing or unreadable -> InputError naming the path. */
export function readDesignText(path: string): string {
  try {
    return readFileSync(path, 'utf8');
  } catch (e) {
    const code = (e as NodeJS.ErrnoException).code;
    if (code === 'ENOENT') throw new InputError(fileIssue('file.missing', `no such file: ${path}`, 'the path of a design file (.yaml, .yml or .json)'), path);
    if (code === 'EISDIR') throw new InputError(fileIssue('file.unreadable', `${path} is a directory`, 'the path of a design file (.yaml, .yml or .json)'), path);
    throw new InputError(fileIssue('file.unreadable', `cannot read ${path} (${code ?? 'error'})`, 'a readable design file'), path);
  }
}

/** Parse a design text and convert it to the engine's Station in one call. */
export function parseStation(text: string, fileName = 'design.yaml'): Station {
  return designToStation(parseDesign(text, fileName), fileName);
}

/** Load a design file and convert it to the engine's Station in one call. */
export function loadStation(path: string): Station {
  return designToStation(loadDesign(path), path);
}
