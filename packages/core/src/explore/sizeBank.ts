/**
 * Bank sizing: the least-energy bank that meets every limit while the part sees the required
 * field with its margin.
 *
 * For each candidate bank (a capacitance, or a whole build of s × p capacitor units,
 * unitBuild.ts) the charge voltage that just reaches the target field is solved
 * (solveVoltage.ts: bracket + Brent, field within [target, target·(1 + relTol)]); the shot at
 * that voltage is judged (analysis/verdict.ts). A candidate is feasible when no judged item is
 * beyond its limit (with `requirePass`, none short of its margin either) and the voltage stays
 * within the bank's rated voltage when one is known (the search stops there). Among feasible
 * candidates the one with the least stored energy ½·C·V² wins: at a fixed capacitance more
 * voltage than the root only adds energy, current, heat and stress, so the root is each
 * candidate's cheapest feasible operating point.
 *
 * Continuous capacitance: a log-spaced first pass over the range, then rounds that place four
 * more capacitances between the best candidate's neighbours (the bracket shrinks 2.5-fold per
 * round) until the neighbours are within the capacitance tolerance (default 0.1 %), which finds
 * both an interior energy minimum and the edge where a limit starts to fail. Assumes one
 * feasible interval of capacitance around the optimum (a first pass that steps over a narrow
 * feasible island can miss it; a denser first pass is the remedy).
 * Unit builds: every whole (s, p) whose capacitance lies in the range.
 *
 * The result says what binds: the limit that fails at the next cheaper candidate, or the energy
 * minimum itself (both neighbours need more energy), or the end of the searched range; and why
 * each neighbouring choice was not taken.
 */
import type { Design } from '../design/schema.js';
import { InputError } from '../design/errors.js';
import { parseDesignPath, type DesignPath } from './designPath.js';
import { evaluateDesign, type PointResult, type PointVerdictItem } from './evaluateDesign.js';
import type { VoltageTask } from './exploreTasks.js';
import type { TaskPool } from './runPool.js';
import { openExplorePool, type RunOptions, type RunStats } from './runSweep.js';
import { DEFAULT_FIELD_REL_TOL, type VoltageSolve } from './solveVoltage.js';
import { unitBuild, type CapacitorUnit, type UnitBuild } from './unitBuild.js';
import { logValues } from './varySpec.js';

export interface SizeBankOptions extends RunOptions {
  /** Field the part must see, A/m, before the margin. Default: the verdict's required field (part section). */
  requiredField_Apm?: number;
  /** Headroom over the required field, fraction. Default: the part section's fieldMargin, else 0. */
  margin?: number;
  /** Relative tolerance of each voltage solve on the field. Default 1e-5 (DEFAULT_FIELD_REL_TOL). */
  relTol?: number;
  /** Capacitances searched, F. Default [C/4, 4·C] around the design's capacitance. */
  capacitanceRange?: [number, number];
  /** Log-spaced capacitances of the first pass (continuous). Default 13. */
  gridCount?: number;
  /** Relative capacitance resolution of the refinement (continuous). Default 1e-3. */
  capacitanceTol?: number;
  /** Build the bank from whole capacitor units. */
  unit?: CapacitorUnit;
  /** Most units in series (unit builds). Default 4. */
  maxSeries?: number;
  /** Every judged item must pass, not only stay within its limit. */
  requirePass?: boolean;
}

export interface BankCandidate {
  capacitance_F: number;
  build?: UnitBuild;
  /** The solved charge voltage (or, when not reached, the highest voltage tried), V. */
  voltage_V: number;
  /** ½·C·V², J; NaN when the target was not reached. */
  energy_J: number;
  field_Apm: number;
  solveOk: boolean;
  feasible: boolean;
  /** Judged items beyond their limit (with requirePass also those short of their margin). */
  failing: PointVerdictItem[];
  /** The judged item with the least margin, other than the field at the part. */
  tightest?: PointVerdictItem;
  /** One line: why it is or is not acceptable. */
  why: string;
  result?: PointResult;
  evaluations: number;
}

export interface Binding {
  kind: 'limit' | 'energy-minimum' | 'range-end' | 'none-feasible';
  /** Ids of the limits involved (verdict item ids, or `capacitor.voltage-rating`). */
  ids: string[];
  text: string;
}

export interface SizeResult extends RunStats {
  mode: 'continuous' | 'units';
  requiredField_Apm: number;
  margin: number;
  targetField_Apm: number;
  relTol: number;
  capacitanceRange: [number, number];
  unit?: CapacitorUnit;
  /** Every candidate tried, by capacitance (then series count). */
  candidates: BankCandidate[];
  best?: BankCandidate;
  binding: Binding;
  neighbours: { label: string; candidate: BankCandidate; why: string }[];
}

const P = {
  capacitance: parseDesignPath('bank.capacitance')!,
  esr: parseDesignPath('bank.esr')!,
  esl: parseDesignPath('bank.esl')!,
  ratedVoltage: parseDesignPath('ratings.capacitor.voltage')!,
  units: parseDesignPath('ratings.capacitor.units')!,
  unitPeak: parseDesignPath('ratings.capacitor.peakCurrent')!,
  requiredField: parseDesignPath('part.requiredField')!,
};

const RATING_ID = 'capacitor.voltage-rating';
/** Refinement rounds at most (each narrows the bracket 2.5-fold: 12 rounds reach 1e-5 of a 13-point first pass). */
const MAX_REFINE_ROUNDS = 12;

function fmt(x: number, unit: string): string {
  if (!Number.isFinite(x)) return `${x} ${unit}`;
  const prefixes: [number, string][] = [[1e9, 'G'], [1e6, 'M'], [1e3, 'k'], [1, ''], [1e-3, 'm'], [1e-6, 'µ'], [1e-9, 'n']];
  const a = Math.abs(x);
  const [scale, p] = prefixes.find(([s]) => a >= s) ?? [1e-9, 'n'];
  return `${Number((x / scale).toPrecision(4))} ${p}${unit}`;
}

/** The target: required field and margin from the options, else from the design's part section via one judged shot. */
export function sizingTarget(design: Design, options: Pick<SizeBankOptions, 'requiredField_Apm' | 'margin'>): { required: number; margin: number } {
  const margin = options.margin ?? design.part?.fieldMargin ?? 0;
  if (options.requiredField_Apm !== undefined) return { required: options.requiredField_Apm, margin };
  if (!design.part) {
    throw new InputError({
      code: 'option.invalid',
      path: '--target-field',
      value: undefined,
      problem: 'no target field: the option is missing and the design has no part section',
      expected: 'a field strength, e.g. --target-field 2.4MA/m, or a part section in the design',
    });
  }
  const item = evaluateDesign(design).items.find((i) => i.id === 'field.part');
  if (!item) throw new Error('sizingTarget: the verdict has no field.part item');
  return { required: item.limit, margin };
}

function judge(c: Omit<BankCandidate, 'feasible' | 'failing' | 'why'>, solve: VoltageSolve, requirePass: boolean, ratedVoltage?: number): BankCandidate {
  if (!solve.ok) {
    const why =
      solve.reason === 'unreachable'
        ? `the target needs more than ${fmt(solve.voltage_V, 'V')}${ratedVoltage !== undefined ? ' (the rated voltage)' : ''}: ${fmt(solve.field_Apm, 'A/m')} there`
        : solve.reason === 'below-min'
          ? `the target is exceeded even at ${fmt(solve.voltage_V, 'V')}`
          : `no solution: ${solve.error ?? 'the shot failed'}`;
    const failing: PointVerdictItem[] =
      solve.reason === 'unreachable' && ratedVoltage !== undefined ? [{ id: RATING_ID, value: NaN, limit: ratedVoltage, unit: 'V', margin: NaN, status: 'fail' }] : [];
    return { ...c, feasible: false, failing, why };
  }
  const judged = solve.result.items.filter((i) => i.status !== 'info');
  const failing = judged.filter((i) => i.status === 'fail' || (requirePass && i.status === 'warn' && i.id !== 'field.part'));
  const errors = solve.result.warnings.filter((w) => w.severity === 'error');
  const others = judged.filter((i) => i.id !== 'field.part' && Number.isFinite(i.margin)).sort((a, b) => a.margin - b.margin);
  const tightest = others[0];
  const feasible = failing.length === 0 && errors.length === 0;
  const why = feasible
    ? `meets every limit${tightest ? `; closest: ${tightest.id} (margin ${(tightest.margin * 100).toFixed(1)} %)` : ''}`
    : failing.length > 0
      ? failing.map((i) => `${i.id} ${i.status === 'fail' ? 'beyond its limit' : 'short of its margin'} (${fmt(i.value, i.unit)} vs ${fmt(i.limit, i.unit)})`).join('; ')
      : `numerical trouble: ${errors.map((w) => w.code).join(', ')}`;
  return { ...c, feasible, failing, ...(tightest ? { tightest } : {}), why };
}

interface Variant {
  capacitance_F: number;
  build?: UnitBuild;
  paths: DesignPath[];
  values: number[];
  maxVoltage_V?: number;
}

async function solveVariants(pool: TaskPool<unknown>, design: Design, variants: Variant[], target: number, relTol: number, options: SizeBankOptions, progress: { done: number; total: number }): Promise<{ candidates: (BankCandidate | undefined)[]; interrupted: boolean }> {
  const tasks: VoltageTask[] = variants.map((v) => ({
    kind: 'voltage',
    design,
    paths: v.paths,
    values: v.values,
    options: { targetField_Apm: target, relTol, ...(v.maxVoltage_V !== undefined ? { maxVoltage_V: v.maxVoltage_V } : {}) },
  }));
  const run = await pool.run(tasks, {
    ...(options.signal ? { signal: options.signal } : {}),
    onProgress: () => {
      progress.done += 1;
      options.onProgress?.(progress.done, progress.total);
    },
  });
  const candidates = run.outcomes.map((o, i) => {
    if (!o) return undefined;
    const v = variants[i]!;
    const solve: VoltageSolve = o.ok ? (o.value as VoltageSolve) : { ok: false, reason: 'error', voltage_V: NaN, field_Apm: NaN, error: o.error, evaluations: 0 };
    const base = {
      capacitance_F: v.capacitance_F,
      ...(v.build ? { build: v.build } : {}),
      voltage_V: solve.voltage_V,
      energy_J: solve.ok ? 0.5 * v.capacitance_F * solve.voltage_V ** 2 : NaN,
      field_Apm: solve.field_Apm,
      solveOk: solve.ok,
      ...(solve.result ? { result: solve.result } : {}),
      evaluations: solve.evaluations,
    };
    return judge(base, solve, options.requirePass ?? false, v.maxVoltage_V);
  });
  return { candidates, interrupted: run.interrupted };
}

function better(a: BankCandidate, b: BankCandidate | undefined): boolean {
  if (!b) return true;
  if (a.energy_J !== b.energy_J) return a.energy_J < b.energy_J;
  const ua = a.build?.units ?? 0;
  const ub = b.build?.units ?? 0;
  if (ua !== ub) return ua < ub;
  return a.voltage_V < b.voltage_V;
}

function pickBest(candidates: readonly BankCandidate[]): BankCandidate | undefined {
  let best: BankCandidate | undefined;
  for (const c of candidates) if (c.feasible && better(c, best)) best = c;
  return best;
}

function neighbourWhy(n: BankCandidate, best: BankCandidate): string {
  if (!n.feasible) return n.why;
  const pct = (n.energy_J / best.energy_J - 1) * 100;
  return `meets every limit but needs ${pct < 1 ? pct.toPrecision(2) : pct.toFixed(1)} % more energy (${fmt(n.energy_J, 'J')})`;
}

function label(c: BankCandidate): string {
  return c.build ? `${c.build.series}s × ${c.build.parallel}p (${fmt(c.capacitance_F, 'F')})` : fmt(c.capacitance_F, 'F');
}

function bindingOf(best: BankCandidate | undefined, neighbours: { label: string; candidate: BankCandidate; why: string }[], all: readonly BankCandidate[], atRangeEnd: boolean): Binding {
  if (!best) {
    const counts = new Map<string, number>();
    for (const c of all) for (const i of c.failing) counts.set(i.id, (counts.get(i.id) ?? 0) + 1);
    const ids = [...counts.entries()].sort((a, b) => b[1] - a[1]).map(([id]) => id);
    return { kind: 'none-feasible', ids, text: `no candidate meets every limit; most often failing: ${ids.slice(0, 3).join(', ') || 'the field target'}` };
  }
  // Neighbours that fail and are not simply dearer: what stops a cheaper choice.
  const blocking = neighbours.filter((n) => !n.candidate.feasible && !(n.candidate.solveOk && n.candidate.energy_J > best.energy_J));
  const ids = [...new Set(blocking.flatMap((n) => n.candidate.failing.map((i) => i.id)))];
  if (atRangeEnd) {
    const also = ids.length ? `; on the other side ${ids.join(', ')} fails` : '';
    return { kind: 'range-end', ids, text: `the least energy found lies at the end of the searched capacitance range: widen the range to see past it${also}` };
  }
  if (blocking.length > 0) {
    return { kind: 'limit', ids, text: `${ids.join(', ') || 'the voltage solve'} binds: the next cheaper choice (${blocking.map((n) => n.label).join(', ')}) fails it` };
  }
  return { kind: 'energy-minimum', ids: ['field.part'], text: 'the field target binds: this is the energy minimum over capacitance (the neighbouring choices need more energy)' };
}

/** Size the bank. */
export async function sizeBank(design: Design, options: SizeBankOptions = {}): Promise<SizeResult> {
  const started = performance.now();
  const { required, margin } = sizingTarget(design, options);
  const work: Design = options.requiredField_Apm !== undefined && design.part ? { ...design, part: { ...design.part, requiredField: required } } : design;
  const target = required * (1 + margin);
  const relTol = options.relTol ?? DEFAULT_FIELD_REL_TOL;
  const C0 = design.bank.capacitance;
  const range: [number, number] = options.capacitanceRange ?? [C0 / 4, C0 * 4];
  if (!(range[0] > 0 && range[1] > range[0])) {
    throw new InputError({ code: 'option.invalid', path: '--capacitance', value: range, problem: 'the range must be two increasing positive capacitances', expected: 'MIN:MAX, e.g. 1m:10m' });
  }
  const ratedVoltage = design.ratings?.capacitor?.voltage;
  const progress = { done: 0, total: 0 };
  const candidates: BankCandidate[] = [];
  let interrupted = false;
  const pool = options.pool ?? (await openExplorePool(options.threads));
  const threads = pool.threads;
  const run = async (variants: Variant[]) => {
    if (variants.length === 0 || interrupted) return;
    progress.total += variants.length;
    const r = await solveVariants(pool, work, variants, target, relTol, options, progress);
    interrupted ||= r.interrupted;
    for (const c of r.candidates) if (c) candidates.push(c);
  };
  let best: BankCandidate | undefined;
  const neighbours: { label: string; candidate: BankCandidate; why: string }[] = [];
  let atRangeEnd = false;

  try {
    if (options.unit) {
      const unit = options.unit;
      const maxSeries = options.maxSeries ?? 4;
      const variants: Variant[] = [];
      for (let s = 1; s <= maxSeries; s++) {
        const pMin = Math.max(1, Math.ceil((range[0] * s) / unit.capacitance_F - 1e-9));
        const pMax = Math.floor((range[1] * s) / unit.capacitance_F + 1e-9);
        for (let p = pMin; p <= pMax; p++) {
          const b = unitBuild(unit, s, p);
          const paths = [P.capacitance, P.esr, P.esl, P.ratedVoltage, P.units];
          const values = [b.capacitance_F, b.esr_Ohm, b.esl_H, b.ratedVoltage_V, p];
          if (unit.peakCurrent_A !== undefined) {
            paths.push(P.unitPeak);
            values.push(unit.peakCurrent_A);
          }
          variants.push({ capacitance_F: b.capacitance_F, build: b, paths, values, maxVoltage_V: b.ratedVoltage_V });
        }
      }
      if (variants.length === 0) {
        throw new InputError({ code: 'option.invalid', path: '--capacitance', value: range, problem: `no whole build of the unit (${fmt(unit.capacitance_F, 'F')}) falls in the range`, expected: 'a range that holds at least one p·C_u/s' });
      }
      await run(variants);
      candidates.sort((a, b) => a.capacitance_F - b.capacitance_F || a.build!.series - b.build!.series);
      best = pickBest(candidates);
      if (best) {
        const { series: s, parallel: p } = best.build!;
        const find = (ss: number, pp: number) => candidates.find((c) => c.build!.series === ss && c.build!.parallel === pp);
        const nearestC = (ss: number) =>
          candidates.filter((c) => c.build!.series === ss).sort((a, b) => Math.abs(Math.log(a.capacitance_F / best!.capacitance_F)) - Math.abs(Math.log(b.capacitance_F / best!.capacitance_F)))[0];
        const add = (l: string, c: BankCandidate | undefined) => c && neighbours.push({ label: `${l}: ${label(c)}`, candidate: c, why: neighbourWhy(c, best!) });
        add('one string fewer', find(s, p - 1));
        add('one string more', find(s, p + 1));
        add('one unit fewer in series', nearestC(s - 1));
        add('one unit more in series', nearestC(s + 1));
        // A neighbouring string count left out only because it falls outside the range.
        atRangeEnd = (p > 1 && find(s, p - 1) === undefined) || find(s, p + 1) === undefined;
      }
    } else {
      const firstPass = logValues(range[0], range[1], Math.max(3, options.gridCount ?? 13));
      const variant = (C: number): Variant => ({ capacitance_F: C, paths: [P.capacitance], values: [C], ...(ratedVoltage !== undefined ? { maxVoltage_V: ratedVoltage } : {}) });
      await run(firstPass.map(variant));
      const capTol = options.capacitanceTol ?? 1e-3;
      for (let round = 0; round < MAX_REFINE_ROUNDS && !interrupted; round++) {
        candidates.sort((a, b) => a.capacitance_F - b.capacitance_F);
        const b = pickBest(candidates);
        if (!b) break;
        const i = candidates.indexOf(b);
        const lo = candidates[Math.max(0, i - 1)]!.capacitance_F;
        const hi = candidates[Math.min(candidates.length - 1, i + 1)]!.capacitance_F;
        if (hi / lo - 1 < 2 * capTol) break;
        const inner = logValues(lo, hi, 6).slice(1, -1).filter((C) => !candidates.some((c) => Math.abs(c.capacitance_F / C - 1) < 1e-9));
        await run(inner.map(variant));
      }
      candidates.sort((a, b) => a.capacitance_F - b.capacitance_F);
      best = pickBest(candidates);
      if (best) {
        const i = candidates.indexOf(best);
        const below = candidates[i - 1];
        const above = candidates[i + 1];
        if (below) neighbours.push({ label: `smaller: ${label(below)}`, candidate: below, why: neighbourWhy(below, best) });
        if (above) neighbours.push({ label: `larger: ${label(above)}`, candidate: above, why: neighbourWhy(above, best) });
        atRangeEnd = !below || !above;
      }
    }
  } finally {
    if (!options.pool) await pool.close();
  }

  return {
    mode: options.unit ? 'units' : 'continuous',
    requiredField_Apm: required,
    margin,
    targetField_Apm: target,
    relTol,
    capacitanceRange: range,
    ...(options.unit ? { unit: options.unit } : {}),
    candidates,
    ...(best ? { best } : {}),
    binding: bindingOf(best, neighbours, candidates, atRangeEnd),
    neighbours,
    total: progress.total,
    completed: candidates.length,
    interrupted,
    threads,
    wallTime_s: (performance.now() - started) / 1000,
  };
}
