/**
 * Runs every bench/*.bench.ts and prints one table (bench/README.md).
 *
 *   pnpm bench                     all bench files
 *   pnpm bench shots ngspice       only files whose name contains one of the words
 *   pnpm bench --strict            also exit non-zero when a figure misses its target
 *   pnpm bench --json out.json     write the rows as JSON (default: bench/out/results.json)
 *
 * Exit code: 0 when every figure is a finite number (and, with --strict, meets its target); 1 otherwise
 * (a NaN fails the benchmark, as does a bench that throws).
 */
import { mkdirSync, readdirSync, readFileSync, writeFileSync } from 'node:fs';
import { availableParallelism, cpus } from 'node:os';
import { dirname, join, resolve } from 'node:path';
import { fileURLToPath, pathToFileURL } from 'node:url';
import { meetsTarget, type BenchRow, type BenchSuite } from './harness.js';

const benchDir = dirname(fileURLToPath(import.meta.url));

interface Outcome {
  file: string;
  suite: string;
  rows: BenchRow[];
  error?: string;
  seconds: number;
}

function machine(): Record<string, string> {
  let cpu = cpus()[0]?.model ?? 'unknown';
  try {
    const m = /model name\s*:\s*(.+)/.exec(readFileSync('/proc/cpuinfo', 'utf8'));
    if (m) cpu = m[1].trim();
  } catch {
    /* not Linux: keep os.cpus() */
  }
  return {
    date: new Date().toISOString(),
    node: process.version,
    cores: String(availableParallelism()),
    cpu,
    platform: `${process.platform} ${process.arch}`,
  };
}

function isSuite(x: unknown): x is BenchSuite {
  return typeof x === 'object' && x !== null && typeof (x as BenchSuite).run === 'function' && typeof (x as BenchSuite).name === 'string';
}

/** What a bench module offers to run: suites, or a bare function, or nothing (side effects only). */
function suitesOf(mod: Record<string, unknown>, file: string): BenchSuite[] {
  const out: BenchSuite[] = [];
  for (const key of ['default', 'suite', 'suites', 'benches']) {
    const v = mod[key];
    if (isSuite(v)) out.push(v);
    else if (Array.isArray(v)) out.push(...v.filter(isSuite));
    else if (typeof v === 'function') out.push({ name: file.replace(/\.bench\.ts$/, ''), run: v as BenchSuite['run'] });
  }
  return out;
}

export function formatValue(x: number): string {
  if (!Number.isFinite(x)) return String(x);
  if (x === 0) return '0';
  const a = Math.abs(x);
  if (a >= 1e6 || a < 1e-3) return x.toExponential(2);
  if (a >= 1000) return x.toFixed(0);
  return x.toPrecision(4);
}

function table(outcomes: Outcome[]): string {
  const header = ['bench', 'figure', 'value', 'unit', 'target', 'status'];
  const body: string[][] = [];
  for (const o of outcomes) {
    if (o.error) body.push([o.suite, '(failed)', '', '', '', `ERROR: ${o.error.split('\n')[0]}`]);
    if (!o.error && o.rows.length === 0) body.push([o.suite, '(self-reporting: see output above)', '', '', '', 'ran']);
    for (const r of o.rows) {
      const status = !Number.isFinite(r.value) ? 'FAIL (not a number)' : meetsTarget(r) ? (r.target ? 'met' : '') : 'MISSED';
      body.push([o.suite, r.name, formatValue(r.value), r.unit, r.target ? `${r.target.op} ${formatValue(r.target.value)}` : '', status]);
    }
  }
  const widths = header.map((h, k) => Math.max(h.length, ...body.map((row) => row[k].length)));
  const line = (cells: string[]) => cells.map((c, k) => (k === 2 ? c.padStart(widths[k]) : c.padEnd(widths[k]))).join('  ').trimEnd();
  return [line(header), line(widths.map((w) => '-'.repeat(w))), ...body.map(line)].join('\n');
}

async function main(argv: string[]): Promise<number> {
  const strict = argv.includes('--strict');
  const jsonAt = argv.indexOf('--json');
  const jsonPath = jsonAt >= 0 ? resolve(argv[jsonAt + 1]) : join(benchDir, 'out', 'results.json');
  const filters = argv.filter((a, k) => !a.startsWith('--') && !(jsonAt >= 0 && k === jsonAt + 1));
  const files = readdirSync(benchDir)
    .filter((f) => f.endsWith('.bench.ts'))
    .filter((f) => filters.length === 0 || filters.some((w) => f.includes(w)))
    .sort();
  const env = machine();
  console.log(`fluxkick benchmarks — ${env.date}, node ${env.node}, ${env.cores} cores, ${env.cpu}, ${env.platform}`);
  if (files.length === 0) {
    console.log('no bench files matched');
    return 1;
  }
  const outcomes: Outcome[] = [];
  for (const file of files) {
    const t0 = performance.now();
    console.error(`running ${file} ...`);
    let mod: Record<string, unknown>;
    // A self-reporting bench file may read process.argv itself: give it its own name only, not our filters.
    const savedArgv = process.argv;
    process.argv = [savedArgv[0], join(benchDir, file)];
    try {
      mod = (await import(pathToFileURL(join(benchDir, file)).href)) as Record<string, unknown>;
    } catch (e) {
      outcomes.push({ file, suite: file, rows: [], error: (e as Error).stack ?? String(e), seconds: (performance.now() - t0) / 1000 });
      continue;
    } finally {
      process.argv = savedArgv;
    }
    const suites = suitesOf(mod, file);
    if (suites.length === 0) {
      outcomes.push({ file, suite: file, rows: [], seconds: (performance.now() - t0) / 1000 });
      continue;
    }
    for (const s of suites) {
      const t1 = performance.now();
      try {
        const rows = (await s.run()) ?? [];
        outcomes.push({ file, suite: s.name, rows: Array.isArray(rows) ? rows : [], seconds: (performance.now() - t1) / 1000 });
      } catch (e) {
        outcomes.push({ file, suite: s.name, rows: [], error: (e as Error).stack ?? String(e), seconds: (performance.now() - t1) / 1000 });
      }
    }
  }
  console.log('');
  console.log(table(outcomes));
  const notes = outcomes.flatMap((o) => o.rows.filter((r) => r.note).map((r) => `  ${o.suite} / ${r.name}: ${r.note}`));
  if (notes.length) console.log(`\nnotes:\n${notes.join('\n')}`);
  for (const o of outcomes) if (o.error) console.log(`\n${o.suite} failed:\n${o.error}`);

  const nan = outcomes.flatMap((o) => o.rows.filter((r) => !Number.isFinite(r.value)));
  const missed = outcomes.flatMap((o) => o.rows.filter((r) => Number.isFinite(r.value) && !meetsTarget(r)));
  const errors = outcomes.filter((o) => o.error);
  mkdirSync(dirname(jsonPath), { recursive: true });
  writeFileSync(jsonPath, JSON.stringify({ machine: env, outcomes }, null, 2) + '\n');
  console.log(`\nrows written to ${jsonPath}`);
  console.log(
    `${outcomes.reduce((n, o) => n + o.rows.length, 0)} figures; ${nan.length} not a number; ${errors.length} benches failed; ` +
      `${missed.length} targets missed${missed.length && !strict ? ' (reported; --strict fails on them)' : ''}`,
  );
  return nan.length || errors.length || (strict && missed.length) ? 1 : 0;
}

const isMain = process.argv[1] && resolve(process.argv[1]) === fileURLToPath(import.meta.url);
if (isMain) {
  main(process.argv.slice(2)).then(
    (code) => process.exit(code),
    (e) => {
      console.error(e);
      process.exit(1);
    },
  );
}
