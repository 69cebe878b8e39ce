/**
 * `fluxkick hold <design>`: steady current. A DC supply holds a current in the fixture coil
 * (a yoke fixture used as a bench electromagnet, or any coil run on DC): where the supply
 * settles (constant voltage or constant current), the coil's steady temperature with its
 * cooling, the field at the part, and the current and supply a target field needs.
 * Supply and cooling come from the design's `steady` section; options override them.
 */
import type { Command } from 'commander';
import {
  formatQuantity,
  holdDesign,
  InputError,
  loadDesign,
  tryParseQuantity,
  type Dimension,
  type HoldOverrides,
  type HoldReport,
  type HoldYokeState,
  type SteadyPoint,
} from '@fluxkick/core';
import { EXIT_ENGINEERING_FAIL, type CliContext } from '../context.js';
import { renderSections, type RenderSection } from '../render.js';

export interface HoldOptions {
  voltage?: string;
  currentLimit?: string;
  seriesResistance?: string;
  ambient?: string;
  thermalResistance?: string;
  targetField?: string;
  maxTemperature?: string;
  json?: boolean;
  strict?: boolean;
  color?: boolean;
}

/** Caution of our own for DC electromagnets (no charged bank is involved here). */
export const HOLD_CAUTION =
  'Caution: switching off a DC electromagnet abruptly drives a high voltage across its winding; give the current a freewheel path or ramp it down. Energized yokes and magnetized parts pull hard and pinch; keep tools, implants and electronics away from the poles.';

const OPTIONS: { key: keyof HoldOptions; flag: string; dimension: Dimension; field: keyof HoldOverrides }[] = [
  { key: 'voltage', flag: '--voltage', dimension: 'voltage', field: 'voltage_V' },
  { key: 'currentLimit', flag: '--current-limit', dimension: 'current', field: 'currentLimit_A' },
  { key: 'seriesResistance', flag: '--series-resistance', dimension: 'resistance', field: 'seriesResistance_Ohm' },
  { key: 'ambient', flag: '--ambient', dimension: 'temperature', field: 'ambient_C' },
  { key: 'thermalResistance', flag: '--thermal-resistance', dimension: 'thermalResistance', field: 'thermalResistance_KpW' },
  { key: 'targetField', flag: '--target-field', dimension: 'fieldStrength', field: 'targetField_Apm' },
  { key: 'maxTemperature', flag: '--max-temperature', dimension: 'temperature', field: 'maxTemperature_C' },
];

/** Option strings → SI overrides; a bad value is an InputError naming the option. */
export function parseHoldOverrides(opts: HoldOptions): HoldOverrides {
  const out: HoldOverrides = {};
  for (const o of OPTIONS) {
    const raw = opts[o.key];
    if (raw === undefined || typeof raw !== 'string') continue;
    const r = tryParseQuantity(raw, o.dimension);
    const positive = o.dimension !== 'temperature' && o.dimension !== 'resistance';
    if (!r.ok || (positive && !(r.value > 0)) || (o.dimension === 'resistance' && r.value < 0)) {
      throw new InputError({
        code: 'option.invalid',
        path: o.flag,
        value: raw,
        problem: r.ok ? `${raw} is not ${positive ? 'greater than 0' : '0 or more'}` : r.reason,
        expected: r.ok ? `a value ${positive ? 'greater than 0' : '0 or more'}` : r.expected,
        ...(r.ok || r.suggestion === undefined ? {} : { suggestion: r.suggestion }),
      });
    }
    out[o.field] = r.value;
  }
  return out;
}

const q = (v: number, unit: string, digits = 3) => formatQuantity(v, unit, { digits });
const degC = (v: number) => `${v.toFixed(1)} °C`;

function duration(s: number): string {
  if (s < 120) return `${s.toFixed(0)} s`;
  if (s < 7200) return `${(s / 60).toFixed(1)} min`;
  return `${(s / 3600).toFixed(1)} h`;
}

function pointRows(p: SteadyPoint): RenderSection['rows'] {
  const rows = [
    { label: 'current', text: q(p.current_A, 'A') },
    { label: 'field at part', text: q(p.partField_Apm, 'A/m') },
    { label: 'coil temperature', text: `${degC(p.coilTemperature_C)} (rise ${p.temperatureRise_K.toFixed(1)} K)` },
    { label: 'coil resistance', text: `${q(p.coilResistance_Ohm, 'Ω')} hot` },
    { label: 'coil voltage, power', text: `${q(p.coilVoltage_V, 'V')}, ${q(p.coilPower_W, 'W')}` },
    { label: 'supply terminals', text: q(p.supplyVoltage_V, 'V') },
  ];
  if (p.thermalTimeConstant_s !== undefined) rows.push({ label: 'warm-up time constant', text: `${duration(p.thermalTimeConstant_s)} (95 % of the rise after ${duration(3 * p.thermalTimeConstant_s)})` });
  return rows;
}

function yokeRows(y: HoldYokeState): RenderSection['rows'] {
  return [
    { label: 'flux density in part', text: q(y.partFluxDensity_T, 'T') },
    { label: 'leakage share', text: `${(100 * y.leakageFraction).toFixed(1)} % of the yoke flux misses the part` },
    ...y.steel.map((s) => ({ label: s.name.replace(/^(yoke|pole):/, ''), text: `${q(s.fluxDensity_T, 'T')} (${(100 * s.saturation).toFixed(0)} % of its saturation polarization)` })),
    { label: 'incremental inductance', text: q(y.incrementalInductance_H, 'H') },
    { label: 'stored magnetic energy', text: q(y.magneticEnergy_J, 'J') },
  ];
}

/** Human-readable report. */
export function formatHoldText(r: HoldReport): string {
  const s = r.result;
  const sections: RenderSection[] = [];
  const supplyText = [
    Number.isFinite(r.supply.voltage_V) ? `${q(r.supply.voltage_V, 'V')} set` : 'no voltage limit',
    Number.isFinite(r.supply.currentLimit_A) ? `${q(r.supply.currentLimit_A, 'A')} limit` : 'no current limit',
    `${q(r.supply.seriesResistance_Ohm, 'Ω')} in series`,
  ].join(', ');
  sections.push({
    title: `Steady current: ${r.name} (${r.fixture === 'yoke' ? 'yoke fixture, magnetic circuit' : 'coil, linear field per ampere'})`,
    rows: [
      { label: 'supply', text: supplyText },
      { label: 'cooling', text: `${q(r.cooling.thermalResistance_KpW, 'K/W')} to ${degC(r.cooling.ambient_C)} ambient` },
      { label: 'settles', text: s.mode === 'runaway' ? 'no steady state: thermal runaway' : s.mode === 'current-limited' ? 'on the current limit (constant current)' : 'on the set voltage (constant voltage)' },
    ],
  });
  sections.push({ title: 'Switched on cold', rows: [{ label: 'current', text: q(s.cold.current_A, 'A') }, { label: 'field at part', text: q(s.cold.partField_Apm, 'A/m') }, { label: 'coil power', text: q(s.cold.coilPower_W, 'W') }] });
  if (s.point) sections.push({ title: 'Steady state', rows: pointRows(s.point) });
  if (r.yoke) sections.push({ title: 'Yoke at the steady current', rows: yokeRows(r.yoke) });
  if (s.target) {
    const t = s.target;
    const rows: RenderSection['rows'] = [{ label: 'current needed', text: Number.isFinite(t.current_A) ? q(t.current_A, 'A') : 'none reaches it' }];
    if (t.point) rows.push(...pointRows(t.point).filter((row) => row.label !== 'current' && row.label !== 'field at part'));
    rows.push({ label: 'verdict', text: t.reachable ? 'reachable with this supply and cooling' : `NOT reachable: ${t.limits.join(', ') || 'no current gives it'}` });
    sections.push({ title: `Target field ${q(t.field_Apm, 'A/m')}`, rows });
    if (r.yokeAtTarget) sections.push({ title: 'Yoke at the target current', rows: yokeRows(r.yokeAtTarget) });
  }
  const warn = s.warnings.map((w) => `${w.severity}: ${w.message} [${w.code}]`);
  return `${renderSections(sections)}\n${warn.length ? `${warn.join('\n')}\n\n` : ''}${HOLD_CAUTION}\n`;
}

/** The report as JSON (SI units; unlimited supply settings print as null). */
export function holdToJson(r: HoldReport): string {
  return JSON.stringify(r, (_k, v: unknown) => (typeof v === 'number' && !Number.isFinite(v) ? null : v), 2);
}

export function runHold(ctx: CliContext, designPath: string, opts: HoldOptions): void {
  const overrides = parseHoldOverrides(opts);
  const design = loadDesign(ctx.resolvePath(designPath));
  const report = holdDesign(design, overrides, designPath);
  ctx.io.stdout(opts.json ? `${holdToJson(report)}\n` : formatHoldText(report));
  const failed = report.result.warnings.some((w) => w.severity === 'error') || (report.result.target !== undefined && !report.result.target.reachable);
  if (opts.strict && failed) ctx.exitCode = EXIT_ENGINEERING_FAIL;
}

export function registerHold(program: Command, ctx: CliContext): Command {
  return program
    .command('hold')
    .description('steady current: a DC supply holds the fixture coil (yoke or coil): field, coil temperature with cooling, current for a target field')
    .argument('<design>', 'design file (.yaml, .yml or .json) with a coil and, usually, yoke and steady sections')
    .option('--voltage <V>', 'supply set voltage, e.g. "30 V" (overrides steady.supply.voltage)')
    .option('--current-limit <A>', 'supply current limit, e.g. "10 A" (overrides steady.supply.currentLimit)')
    .option('--series-resistance <ohm>', 'source and lead resistance, e.g. "50 mohm"')
    .option('--ambient <T>', 'ambient temperature, e.g. "25 degC"')
    .option('--thermal-resistance <K/W>', 'coil-to-ambient thermal resistance, e.g. "1.5 K/W"')
    .option('--target-field <H>', 'field wanted at the part, e.g. "500 kA/m"')
    .option('--max-temperature <T>', 'highest allowed coil temperature, e.g. "130 degC"')
    .option('--json', 'print the result as JSON (SI units)')
    .option('--strict', 'exit with code 1 when the coil overheats, runs away, or the target is out of reach')
    .option('--no-color', 'no colour even on a terminal')
    .addHelpText(
      'after',
      '\nExamples:\n  $ fluxkick hold examples/yoke-bench.yaml\n  $ fluxkick hold examples/yoke-bench.yaml --current-limit 15A --target-field 700kA/m\n  $ fluxkick hold my-magnet.yaml --voltage 24V --thermal-resistance 0.8K/W --json\n',
    )
    .action((designPath: string, opts: HoldOptions) => runHold(ctx, designPath, opts));
}
