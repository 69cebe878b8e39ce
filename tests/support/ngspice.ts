/**
 * ngspice in batch mode, for the independent cross-checks (tests/reference/ngspice*.test.ts and bench/).
 *
 * ngspice (the Debian package, `ngspice -b deck.cir`) is a general-purpose circuit simulator that shares no
 * code with fluxkick; REFERENCES.md lists it as an independent tool. This module:
 *   - finds the executable (`NGSPICE` environment variable, /usr/bin/ngspice, then PATH),
 *   - runs one deck in a fresh temporary directory and returns its log and the files its `wrdata` wrote,
 *   - parses `wrdata` output (each vector written as a pair of columns: its scale, then its value),
 *   - builds the deck of a fluxkick Station (bank C, ESR, ESL; thyristor; freewheel diode; cable; coil; coupled loops).
 *
 * Device models used in the deck (see docs/reference-checks.md for the equivalence and its error):
 *   The thyristor and the freewheel diode are ngspice's XSPICE `sidiode` ("simple diode") code model with
 *   epsilon = 0: in forward conduction v = vfwd + ron·i exactly, i.e. V_T0 + r_T·i (or V_F0 + r_F·i); below vfwd it is
 *   a resistor roff (1e9 Ω here: 1.6 µA of leakage at 1.6 kV). It conducts forward only and stops at current zero,
 *   like a thyristor. Unlike a thyristor it would conduct again if its forward voltage later exceeded V_T0 without
 *   a new gate pulse; callers check the switch current stays zero after its first zero so that this never happened.
 *   sidiode needs ron > 0 (and with ron = 1 nΩ ngspice stops at the first step, "timestep too small"): a zero slope
 *   resistance is replaced by MIN_RON_OHM = 1 µΩ, a relative change of the loop resistance of 3e-5 for a 32 mΩ loop,
 *   which moves the peak current by about α·t_p·ΔR/R < 1e-5. Give the switch a real r_T when comparing tightly.
 *   RC snubbers (Cs = 1 nF, Rs = 2·√(L_loop/Cs), critical damping of the loop the device interrupts) sit across the
 *   switch and across the diode. Without them ngspice cannot turn a device off: at current zero the loop inductance
 *   meets roff (1e9 Ω), a time constant of femtoseconds, and the run stops with "timestep too small". Real
 *   thyristors and diodes carry such snubbers. Their error: a snubber across a device whose voltage changes at dv/dt
 *   carries Cs·dv/dt: the switch's a few volts per millisecond (pA), the diode's the coil voltage, up to V0 over
 *   the rise time, 1e-9·1.6 kV/1 ms = 1.6 mA (3e-7 of a 5 kA pulse). When the switch blocks, its snubber takes the
 *   charge Cs·|v_block| from the bank in a critically damped pulse of about √(L_loop·Cs) (sub-microsecond): the final
 *   capacitor voltage is v·C/(C + Cs) instead of v (5e-7 for a 2.2 mF bank, 1e-5 for 100 µF).
 */
import { spawnSync } from 'node:child_process';
import { existsSync, mkdtempSync, readFileSync, readdirSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, delimiter } from 'node:path';
import { performance } from 'node:perf_hooks';
import type { Station } from '../../packages/core/src/model/station.js';

/** Smallest `ron` given to sidiode, Ω (the model needs ron > 0). */
export const MIN_RON_OHM = 1e-6;
/** Off-state resistance of the switch and the diode in the deck, Ω. */
export const ROFF_OHM = 1e9;
/** Capacitance of the RC snubbers across the switch and the freewheel diode in the deck, F (needed at turn-off; see header). */
export const SNUBBER_C_F = 1e-9;

/** Path of the ngspice executable, or null when it is not installed. */
export function findNgspice(): string | null {
  const candidates: string[] = [];
  if (process.env.NGSPICE) candidates.push(process.env.NGSPICE);
  candidates.push('/usr/bin/ngspice', '/usr/local/bin/ngspice');
  for (const dir of (process.env.PATH ?? '').split(delimiter)) if (dir) candidates.push(join(dir, 'ngspice'));
  for (const c of candidates) if (existsSync(c)) return c;
  return null;
}

/** Whether ngspice is there, and whether its absence must fail the run (on CI it must). */
export interface NgspiceStatus {
  path: string | null;
  /** True when process.env.CI is set: a missing ngspice is then a failure, not a skip. */
  required: boolean;
  /** Human-readable explanation for a skip or a failure. */
  message: string;
}

export function ngspiceStatus(): NgspiceStatus {
  const path = findNgspice();
  const required = Boolean(process.env.CI);
  const message = path
    ? `ngspice found at ${path}`
    : 'ngspice not found (install the Debian package `ngspice`, or set NGSPICE=/path/to/ngspice); ' +
      (required ? 'CI is set, so the reference checks against ngspice FAIL.' : 'the reference checks against ngspice are SKIPPED.');
  return { path, required, message };
}

/** Result of one batch run. */
export interface NgspiceRun {
  /** Everything ngspice printed on standard output. */
  stdout: string;
  stderr: string;
  /** Files the deck wrote into its working directory (name → text), e.g. wrdata output. */
  files: Record<string, string>;
  /** Wall-clock time of the ngspice process, s. */
  wall_s: number;
  /** CPU time (user + system) of the ngspice process, s, when `measureCpu` was set (null otherwise). */
  cpu_s: number | null;
}

const TIMES_MARK = '@@fluxkick-times@@';

/** Children's user and system times from bash's `times` output (second line: "0m0.108s 0m0.047s"), s. */
export function parseBashTimes(text: string): number | null {
  const at = text.lastIndexOf(TIMES_MARK);
  if (at < 0) return null;
  const lines = text.slice(at + TIMES_MARK.length).trim().split('\n');
  const m = /^(\d+)m([\d.]+)s\s+(\d+)m([\d.]+)s/.exec(lines[1]?.trim() ?? '');
  if (!m) return null;
  return Number(m[1]) * 60 + Number(m[2]) + Number(m[3]) * 60 + Number(m[4]);
}

/** Error raised when ngspice fails or reports an aborted analysis. */
export class NgspiceError extends Error {
  constructor(message: string, readonly log: string) {
    super(`${message}\n--- ngspice log ---\n${log}`);
    this.name = 'NgspiceError';
  }
}

const FAILURE_PATTERNS = [/simulation\(s\) aborted/i, /timestep too small/i, /^\s*error/im, /singular matrix/i, /cannot recognize/i];

/**
 * Run `ngspice -b deck.cir` in a fresh temporary directory. The deck should end its `.control` block with `quit`.
 * Every file the deck writes there is returned in `files`; the directory is removed afterwards.
 */
export function runNgspice(deck: string, options: { timeout_ms?: number; executable?: string; measureCpu?: boolean } = {}): NgspiceRun {
  const exe = options.executable ?? findNgspice();
  if (!exe) throw new Error(ngspiceStatus().message);
  const dir = mkdtempSync(join(tmpdir(), 'fluxkick-ngspice-'));
  try {
    writeFileSync(join(dir, 'deck.cir'), deck);
    const t0 = performance.now();
    // With measureCpu, bash runs ngspice and then its `times` builtin reports the child's CPU time on stderr.
    const [cmd, args] = options.measureCpu
      ? ['bash', ['-c', `"$0" -b deck.cir; rc=$?; echo ${TIMES_MARK} >&2; times >&2; exit $rc`, exe]]
      : [exe, ['-b', 'deck.cir']];
    const proc = spawnSync(cmd, args as string[], {
      cwd: dir,
      encoding: 'utf8',
      timeout: options.timeout_ms ?? 120_000,
      maxBuffer: 64 * 1024 * 1024,
      stdio: ['ignore', 'pipe', 'pipe'],
    });
    const stdout = proc.stdout ?? '';
    const stderr = proc.stderr ?? '';
    if (proc.error || proc.status !== 0) {
      throw new NgspiceError(`ngspice failed (${proc.error?.message ?? `exit status ${proc.status}`})`, `${stdout}\n${stderr}`);
    }
    const wall_s = (performance.now() - t0) / 1000;
    const log = stdout + '\n' + stderr;
    for (const p of FAILURE_PATTERNS) if (p.test(log)) throw new NgspiceError(`ngspice reported a failure (${p})`, log);
    const files: Record<string, string> = {};
    for (const name of readdirSync(dir)) if (name !== 'deck.cir') files[name] = readFileSync(join(dir, name), 'utf8');
    const cpu_s = options.measureCpu ? parseBashTimes(stderr) : null;
    return { stdout, stderr: options.measureCpu ? stderr.slice(0, Math.max(0, stderr.lastIndexOf(TIMES_MARK))) : stderr, files, wall_s, cpu_s };
  } finally {
    rmSync(dir, { recursive: true, force: true });
  }
}

/** Rows of numbers of a `wrdata` file (whitespace-separated columns). Blank lines are skipped. */
export function parseWrdata(text: string): number[][] {
  const rows: number[][] = [];
  for (const line of text.split('\n')) {
    const s = line.trim();
    if (!s) continue;
    const row = s.split(/\s+/).map(Number);
    if (row.some((x) => Number.isNaN(x))) throw new Error(`wrdata: not a number in line "${s}"`);
    rows.push(row);
  }
  return rows;
}

/** A sampled signal. */
export interface Trace {
  t_s: number[];
  y: number[];
}

/**
 * Split `wrdata` output of several vectors (written as `wrdata file v1 v2 ...`) into traces.
 * `wrdata` writes, per vector, its scale column then its value column. With `set appendwrite`, successive
 * analyses append blocks; a block starts wherever the scale goes back to a smaller value, and each block
 * is returned as its own set of traces.
 */
export function wrdataTraces(text: string, names: string[]): Record<string, Trace>[] {
  const rows = parseWrdata(text);
  const blocks: Record<string, Trace>[] = [];
  let current: Record<string, Trace> | null = null;
  let lastT = Infinity;
  for (const row of rows) {
    if (row.length !== 2 * names.length) throw new Error(`wrdata: expected ${2 * names.length} columns, got ${row.length}`);
    const t = row[0];
    if (current === null || t < lastT) {
      current = Object.fromEntries(names.map((n) => [n, { t_s: [], y: [] }]));
      blocks.push(current);
    }
    names.forEach((n, k) => {
      current![n].t_s.push(row[2 * k]);
      current![n].y.push(row[2 * k + 1]);
    });
    lastT = t;
  }
  return blocks;
}

/**
 * Peak of a sampled signal, refined by the parabola through the largest sample and its two neighbours
 * (exact for a locally quadratic signal; for a smooth peak sampled at step h the error of the peak value is O(h^3)
 * relative to a plain sample maximum's O(h^2)).
 */
export function refinedPeak(trace: Trace): { peak: number; time_s: number; index: number } {
  const { t_s, y } = trace;
  if (y.length === 0) throw new Error('refinedPeak: empty trace');
  let k = 0;
  for (let j = 1; j < y.length; j++) if (y[j] > y[k]) k = j;
  if (k === 0 || k === y.length - 1) return { peak: y[k], time_s: t_s[k], index: k };
  const [t0, t1, t2] = [t_s[k - 1], t_s[k], t_s[k + 1]];
  const [y0, y1, y2] = [y[k - 1], y[k], y[k + 1]];
  // Parabola through three points (Lagrange form); vertex where its derivative is zero.
  const d01 = (y1 - y0) / (t1 - t0);
  const d12 = (y2 - y1) / (t2 - t1);
  const a = (d12 - d01) / (t2 - t0);
  if (!(a < 0)) return { peak: y1, time_s: t1, index: k };
  const b = d01 - a * (t0 + t1);
  const tv = -b / (2 * a);
  const yv = y0 + d01 * (tv - t0) + a * (tv - t0) * (tv - t1);
  return { peak: yv, time_s: tv, index: k };
}

/** Linear interpolation of a trace at time t (clamped to its ends). */
export function sampleAt(trace: Trace, t: number): number {
  const { t_s, y } = trace;
  if (t <= t_s[0]) return y[0];
  if (t >= t_s[t_s.length - 1]) return y[y.length - 1];
  let lo = 0;
  let hi = t_s.length - 1;
  while (hi - lo > 1) {
    const mid = (lo + hi) >> 1;
    if (t_s[mid] <= t) lo = mid;
    else hi = mid;
  }
  const f = (t - t_s[lo]) / (t_s[hi] - t_s[lo]);
  return y[lo] + f * (y[hi] - y[lo]);
}

/** Number in SPICE input: plain exponent notation with 17 significant digits (no SPICE unit suffixes). */
export function spiceNumber(x: number): string {
  if (!Number.isFinite(x)) throw new Error(`spiceNumber: ${x} is not finite`);
  return x.toExponential(16);
}

/** Circuit settings of a station netlist. */
export interface NetlistOptions {
  /** ngspice RELTOL (default 1e-6). */
  relTol?: number;
  /** Snubber capacitance across switch and diode, F (default SNUBBER_C_F; 0: none, which fails at a device turn-off). */
  snubber_F?: number;
  /** Integration method (default ngspice's trapezoidal rule). */
  method?: 'trap' | 'gear';
}

/** Transient settings of a station deck. */
export interface DeckOptions extends NetlistOptions {
  /** Stop time, s. */
  tStop_s: number;
  /** Largest internal step and output step, s. */
  maxStep_s: number;
  /** Name of the wrdata file (default `out.txt`). */
  outFile?: string;
}

/** The vectors a station deck writes, in order: coil current, switch current, diode current, capacitor voltage. */
export const STATION_VECTORS = ['coil', 'switch', 'diode', 'vcap'] as const;

/**
 * ngspice netlist (title, elements, models, .options; no analysis) of a fluxkick Station, resistances taken at the
 * initial temperature and held constant
 * (ngspice has no conductor heating here; compare with tempCoeff_perK = 0 in the station).
 *
 * Topology (matches model/station.ts; snubbers not shown):
 *   C (IC = V0) — ESR — ESL — thyristor — Vsw (ammeter) — [bank-end diode] — R_w — L_w — [fixture-end diode]
 *   — Vcoil (ammeter) — L_1 — R_1 — back to C.
 * Coupled loops: L_k in series with R_k, each a closed loop; coupling by K elements, k = M/√(L_a·L_b).
 * Nonlinear (iron-yoke) coils are not supported.
 */
export function stationNetlist(station: Station, opts: NetlistOptions = {}): string[] {
  if (station.coil.nonlinear) throw new Error('stationNetlist: nonlinear coils are not supported');
  const n = spiceNumber;
  const resistanceAt = (r20: number, alpha: number, T: number) => r20 * (1 + alpha * (T - 20));
  const { bank, cable, coil } = station;
  const lines: string[] = [];
  lines.push(`* fluxkick station "${station.name.replace(/[^\x20-\x7e]/g, '?')}" as an ngspice deck`);
  lines.push(`C1 cap 0 ${n(bank.capacitance_F)} IC=${n(bank.voltage_V)}`);
  lines.push(`Resr cap b1 ${n(Math.max(bank.esr_Ohm, 0))}`);
  if (bank.esl_H > 0) lines.push(`Lesl b1 b2 ${n(bank.esl_H)} IC=0`);
  else lines.push(`Vesl b1 b2 0`);
  // Thyristor: forward-only, V_T0 + r_T·i (sidiode, anode b2, cathode b3).
  const sw = station.switch;
  const fw = station.freewheel;
  lines.push(`Athy b2 b3 thy`);
  lines.push(
    `.model thy sidiode(ron=${n(Math.max(sw.slopeResistance_Ohm, MIN_RON_OHM))} roff=${n(ROFF_OHM)} vfwd=${n(sw.thresholdVoltage_V)} vrev=1e12)`,
  );
  if (sw.kind === 'bidirectional') {
    // Antiparallel diode with the same on-state model: the circuit rings on.
    lines.push(`Aanti b3 b2 thy`);
  }
  lines.push(`Vsw b3 s1 0`);
  // Snubbers: Rs = 2·√(L_loop/Cs) damps critically the loop the device interrupts (at least 1 Ω).
  const Cs = opts.snubber_F ?? SNUBBER_C_F;
  const snubber = (name: string, a: string, b: string, loop_H: number) => {
    if (Cs <= 0) return;
    const Rs = Math.max(1, 2 * Math.sqrt(loop_H / Cs));
    lines.push(`Rsn${name} ${a} sn${name} ${n(Rs)}`, `Csn${name} sn${name} ${b} ${n(Cs)} IC=0`);
  };
  const switchLoop_H =
    bank.esl_H + (fw?.position === 'bank' ? 0 : cable.inductance_H) + (fw ? 0 : coil.inductance_H);
  snubber('sw', 'b2', 'b3', switchLoop_H);
  const diodeLoop_H = (fw?.position === 'bank' ? cable.inductance_H : 0) + coil.inductance_H;
  if (fw) {
    lines.push(
      `.model fwd sidiode(ron=${n(Math.max(fw.slopeResistance_Ohm, MIN_RON_OHM))} roff=${n(ROFF_OHM)} vfwd=${n(fw.thresholdVoltage_V)} vrev=1e12)`,
    );
  }
  if (fw && fw.position === 'bank') {
    lines.push(`Vdio 0 d1 0`, `Adio d1 s1 fwd`);
    snubber('dio', 'd1', 's1', diodeLoop_H);
  }
  lines.push(`Rcab s1 w1 ${n(cable.resistance_Ohm)}`);
  if (cable.inductance_H > 0) lines.push(`Lcab w1 w2 ${n(cable.inductance_H)} IC=0`);
  else lines.push(`Vcab w1 w2 0`);
  if (fw && fw.position === 'fixture') {
    lines.push(`Vdio 0 d1 0`, `Adio d1 w2 fwd`);
    snubber('dio', 'd1', 'w2', diodeLoop_H);
  }
  if (!fw) lines.push(`Vdio 0 d1 0`, `Rdio d1 0 1`); // keeps the `diode` vector defined (always zero)
  lines.push(`Vcoil w2 k1 0`);
  lines.push(`Lcoil k1 k2 ${n(coil.inductance_H)} IC=0`);
  lines.push(`Rcoil k2 0 ${n(resistanceAt(coil.resistance20_Ohm, coil.tempCoeff_perK, coil.initialTemperature_C))}`);
  station.coupled.forEach((loop, k) => {
    lines.push(`Lloop${k} m${k} 0 ${n(loop.inductance_H)} IC=0`);
    lines.push(`Rloop${k} m${k} 0 ${n(resistanceAt(loop.resistance20_Ohm, loop.tempCoeff_perK, loop.initialTemperature_C))}`);
    const kc = loop.mutualToCoil_H / Math.sqrt(coil.inductance_H * loop.inductance_H);
    if (kc !== 0) lines.push(`Kc${k} Lcoil Lloop${k} ${n(kc)}`);
  });
  for (let a = 0; a < station.coupled.length; a++) {
    for (let b = a + 1; b < station.coupled.length; b++) {
      const m = station.loopMutual_H[a]?.[b] ?? 0;
      if (m === 0) continue;
      const kc = m / Math.sqrt(station.coupled[a].inductance_H * station.coupled[b].inductance_H);
      lines.push(`Kl${a}_${b} Lloop${a} Lloop${b} ${n(kc)}`);
    }
  }
  // RELTOL 1e-6 (tight: the default is 1e-3). ABSTOL/VNTOL 1 µA / 1 µV: far below RELTOL of kA and kV signals;
  // tighter values (1e-9) make Newton fail at a diode turn-off ("timestep too small").
  const relTol = opts.relTol ?? 1e-6;
  lines.push(`.options reltol=${n(relTol)} abstol=1e-6 vntol=1e-6 chgtol=1e-16 trtol=1 method=${opts.method ?? 'trap'}`);
  return lines;
}

/**
 * Complete deck: the station netlist, one transient run from the charged state (`uic`), and `wrdata` of
 * STATION_VECTORS into `opts.outFile`.
 */
export function stationDeck(station: Station, opts: DeckOptions): string {
  const n = spiceNumber;
  const lines = stationNetlist(station, opts);
  lines.push(`.tran ${n(opts.maxStep_s)} ${n(opts.tStop_s)} 0 ${n(opts.maxStep_s)} uic`);
  lines.push('.control');
  lines.push('run');
  // Coil current i(Vcoil); switch current i(Vsw); diode current i(Vdio) (anode side, forward positive);
  // capacitor voltage v(cap).
  // Then the current of each coupled loop (branch current of Lloop<k>, in the coil's sign convention).
  const loopVectors = station.coupled.map((_, k) => `lloop${k}#branch`).join(' ');
  lines.push(`wrdata ${opts.outFile ?? 'out.txt'} i(Vcoil) i(Vsw) i(Vdio) v(cap) ${loopVectors}`.trimEnd());
  lines.push('quit');
  lines.push('.endc');
  lines.push('.end');
  return lines.join('\n') + '\n';
}

/** Traces of a station deck's run: STATION_VECTORS, then one trace per coupled loop. */
export type StationTraces = Record<(typeof STATION_VECTORS)[number], Trace> & { loops: Trace[] };

/** Traces of a station deck's run (`loopCount`: number of coupled loops in the station). */
export function stationTraces(run: NgspiceRun, loopCount = 0, outFile = 'out.txt'): StationTraces {
  const text = run.files[outFile];
  if (text === undefined) throw new NgspiceError(`ngspice wrote no ${outFile}`, run.stdout + run.stderr);
  const loopNames = Array.from({ length: loopCount }, (_, k) => `loop${k}`);
  const blocks = wrdataTraces(text, [...STATION_VECTORS, ...loopNames]);
  if (blocks.length !== 1) throw new Error(`expected one analysis in ${outFile}, found ${blocks.length}`);
  const b = blocks[0];
  return { coil: b.coil, switch: b.switch, diode: b.diode, vcap: b.vcap, loops: loopNames.map((n) => b[n]) };
}

/** One point of a capacitance sweep as ngspice computed it. */
export interface SweepPoint {
  capacitance_F: number;
  peakCurrent_A: number;
  timeOfPeak_s: number;
}

/**
 * One deck that sweeps the bank capacitance inside ngspice: a `.control` loop over `capacitances_F` that, for each
 * value, alters C1, runs a transient of `stopFactor`·π·√(L_loop·C) (past the first current zero of the series loop)
 * with a largest step of that time / `pointsPerPulse`, and finds the peak of the coil current from its own samples:
 * the largest sample and the parabola through it and its two neighbours (vector arithmetic in ngspice's control
 * language, full double precision; `meas` would round to 7 digits). All results are printed at the end
 * (parseSweep reads them).
 */
export function capacitanceSweepDeck(
  station: Station,
  capacitances_F: number[],
  opts: NetlistOptions & { pointsPerPulse?: number; stopFactor?: number } = {},
): string {
  const n = spiceNumber;
  const count = capacitances_F.length;
  if (count === 0) throw new Error('capacitanceSweepDeck: no capacitances');
  const loop_H = station.bank.esl_H + station.cable.inductance_H + station.coil.inductance_H;
  const lines = stationNetlist(station, opts);
  const points = opts.pointsPerPulse ?? 2000;
  const stop = opts.stopFactor ?? 1.05;
  lines.push('.control');
  lines.push('set noaskquit');
  lines.push('set numdgt=15');
  lines.push(`let cvals = vector(${count})`);
  capacitances_F.forEach((c, k) => lines.push(`let cvals[${k}] = ${n(c)}`));
  lines.push(`let ipks = vector(${count})`, `let tpks = vector(${count})`, 'let k = 0');
  lines.push(`while k < ${count}`);
  lines.push('  let cval = cvals[k]');
  lines.push('  alter C1 = $&cval');
  lines.push(`  let tstop = ${n(stop)}*pi*sqrt(${n(loop_H)}*cval)`);
  lines.push(`  let tstep = tstop/${points}`);
  lines.push('  tran $&tstep $&tstop 0 $&tstep uic');
  // Peak: sample triples (a, b, c); the mask picks the triple whose middle is the largest sample.
  lines.push('  let y = i(vcoil)', '  let t = time', '  let m = length(y)');
  lines.push('  let ya = y[0,m-3]', '  let yb = y[1,m-2]', '  let yc = y[2,m-1]');
  lines.push('  let ta = t[0,m-3]', '  let tb = t[1,m-2]', '  let tc = t[2,m-1]');
  lines.push('  let mask = (yb ge ya) and (yb gt yc) and (yb eq vecmax(y))');
  lines.push('  let w = length(mask)/(mean(mask)*length(mask))');
  lines.push('  let a0 = mean(mask*ya)*w', '  let b0 = mean(mask*yb)*w', '  let c0 = mean(mask*yc)*w');
  lines.push('  let t0 = mean(mask*ta)*w', '  let t1 = mean(mask*tb)*w', '  let t2 = mean(mask*tc)*w');
  lines.push('  let d01 = (b0-a0)/(t1-t0)', '  let d12 = (c0-b0)/(t2-t1)', '  let qa = (d12-d01)/(t2-t0)');
  lines.push('  let qb = d01 - qa*(t0+t1)', '  let tv = -qb/(2*qa)');
  lines.push('  let ipks[k] = a0 + d01*(tv-t0) + qa*(tv-t0)*(tv-t1)', '  let tpks[k] = tv');
  lines.push('  destroy $curplot', '  let k = k + 1');
  lines.push('end');
  // `print` honours numdgt (15 digits); `echo` would round to 6.
  lines.push('set width=200', 'set height=100000', 'print cvals ipks tpks');
  lines.push('quit', '.endc', '.end');
  return lines.join('\n') + '\n';
}

/** Points printed by a capacitanceSweepDeck run (the `print cvals ipks tpks` table: index, C, ipk, tpk). */
export function parseSweep(stdout: string): SweepPoint[] {
  const out: SweepPoint[] = [];
  for (const line of stdout.split('\n')) {
    const m = /^(\d+)\s+(\S+)\s+(\S+)\s+(\S+)\s*$/.exec(line);
    if (!m) continue;
    const [c, i, t] = [Number(m[2]), Number(m[3]), Number(m[4])];
    if ([c, i, t].some((x) => Number.isNaN(x))) continue;
    out[Number(m[1])] = { capacitance_F: c, peakCurrent_A: i, timeOfPeak_s: t };
  }
  return out;
}

/**
 * Settings tried in turn by runStation. The sidiode's sharp knee can make Newton fail at a device turn-off with
 * RELTOL 1e-6 in some circuits ("timestep too small"); RELTOL 1e-5, then Gear's method, get through. With a
 * largest step of a 2000th of the pulse the step size, not RELTOL, sets the accuracy: in the checks the peak
 * current moved by less than 1e-6 between these settings (docs/reference-checks.md).
 */
export const FALLBACK_SETTINGS: readonly { relTol: number; method: 'trap' | 'gear' }[] = [
  { relTol: 1e-6, method: 'trap' },
  { relTol: 1e-5, method: 'trap' },
  { relTol: 1e-6, method: 'gear' },
];

/** Run a station deck with the first of FALLBACK_SETTINGS that completes; returns the traces and the settings used. */
export function runStation(
  station: Station,
  opts: Omit<DeckOptions, 'relTol' | 'method'>,
): { traces: StationTraces; run: NgspiceRun; settings: { relTol: number; method: 'trap' | 'gear' } } {
  let last: unknown;
  for (const settings of FALLBACK_SETTINGS) {
    try {
      const run = runNgspice(stationDeck(station, { ...opts, ...settings }));
      return { traces: stationTraces(run, station.coupled.length, opts.outFile), run, settings };
    } catch (e) {
      if (!(e instanceof NgspiceError) || !/timestep too small/i.test(e.log)) throw e;
      last = e;
    }
  }
  throw last;
}

/** Times where a trace crosses `level` (linear interpolation between samples); `dir` picks falling or rising crossings. */
export function crossings(trace: Trace, level: number, dir: 'falling' | 'rising' | 'both' = 'both'): number[] {
  const out: number[] = [];
  const { t_s, y } = trace;
  for (let j = 1; j < y.length; j++) {
    const a = y[j - 1] - level;
    const b = y[j] - level;
    const falling = a > 0 && b <= 0;
    const rising = a < 0 && b >= 0;
    if ((falling && dir !== 'rising') || (rising && dir !== 'falling')) {
      out.push(t_s[j - 1] + ((t_s[j] - t_s[j - 1]) * a) / (a - b));
    }
  }
  return out;
}

/** ∫ f(y) dt over a trace by the trapezoidal rule. */
export function integrate(trace: Trace, f: (y: number) => number = (y) => y): number {
  let s = 0;
  for (let j = 1; j < trace.t_s.length; j++) s += 0.5 * (f(trace.y[j]) + f(trace.y[j - 1])) * (trace.t_s[j] - trace.t_s[j - 1]);
  return s;
}
