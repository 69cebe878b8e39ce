/**
 * "What was understood": a parsed design as rows of engineering values with units
 * (for `fluxkick check`), walking the schema so that every section, including ones added
 * later, is shown without extra code; plus a few orientation figures of the series RLC
 * discharge derived from the Station.
 *
 * Orientation figures (series RLC natural response, Nilsson & Riedel, Electric Circuits):
 * L = ESL + L_cable + L_coil, R = ESR + r_T + R_cable + R_coil(T0), C the bank;
 * Z0 = √(L/C), f0 = 1/(2π√(LC)), ζ = (R/2)·√(C/L), quarter period (π/2)·√(LC),
 * lossless peak current V0/Z0 (an upper bound of the real peak). Stored energy ½·C·V0².
 *
 * Yoke fixtures (Coil.nonlinear): L_coil above is the small-current inductance, which
 * saturation lowers as the current rises, so V0/Z0 is no bound there. Instead, with
 * dλ/di ≥ L_sat at every current (magnetics/yoke.ts, yokeInductanceLimits) the magnetic energy
 * is at least ½·(L_ext + L_sat)·i², L_ext = ESL + L_cable, and energy conservation bounds the
 * peak: i ≤ V0·√(C/(L_ext + L_sat)). The field bound is H_part at that current (H_part rises
 * with i). Coupled loops are left out of both, as in the air-core figures.
 */
import type { NonlinearCoil, Station } from '../model/station.js';
import { DIMENSIONS } from '../units/quantity.js';
import { formatNumber, formatQuantity } from '../units/format.js';
import { quantityInfo, unwrapSchema } from './quantity-schema.js';
import { DESIGN_SECTIONS, type Design } from './schema.js';

export interface DescribedRow {
  /** Field path, e.g. `bank.capacitance`. */
  path: string;
  /** Field name, e.g. `capacitance`. */
  label: string;
  /** Formatted value with its unit, e.g. "2.2 mF". */
  text: string;
}

export interface DescribedSection {
  /** e.g. `bank`, `coupled[0] (sleeve)`. */
  title: string;
  rows: DescribedRow[];
}

type Def = { type: string; shape?: Record<string, unknown>; element?: unknown; valueType?: unknown; options?: unknown[] };
const defOf = (s: unknown) => (unwrapSchema(s) as { _zod?: { def: Def } } | undefined)?._zod?.def;

function formatLeaf(schema: unknown, value: unknown, digits: number): string {
  const q = quantityInfo(schema);
  if (q && typeof value === 'number') {
    if (q.dimension === 'dimensionless') return formatNumber(value, digits);
    return formatQuantity(value, DIMENSIONS[q.dimension].unit, { digits });
  }
  const d = defOf(schema);
  if (d?.type === 'record' && value && typeof value === 'object') {
    const entries = Object.entries(value as Record<string, unknown>);
    if (!entries.length) return 'none';
    return entries.map(([k, v]) => `${k}: ${formatLeaf(d.valueType, v, digits)}`).join(', ');
  }
  if (Array.isArray(value)) {
    if (!value.length) return 'none';
    return value.map((item) => formatLeaf(d?.type === 'array' ? d.element : undefined, item, digits)).join('; ');
  }
  if (value !== null && typeof value === 'object') {
    const sh = objectShape(schema, value);
    if (sh) {
      // "core: length 80 mm, area 600 mm², steel low-carbon-steel"
      const { name, ...rest } = value as Record<string, unknown>;
      const body = Object.entries(rest)
        .filter(([, v]) => v !== undefined)
        .map(([k, v]) => `${k} ${formatLeaf(sh[k], v, digits)}`)
        .join(', ');
      return typeof name === 'string' ? `${name}: ${body}` : body;
    }
  }
  if (value === null) return 'none';
  if (typeof value === 'string') return value.replace(/\s+/g, ' ').trim();
  if (typeof value === 'number') return formatNumber(value, digits);
  return JSON.stringify(value);
}

/** Schema of an object value; for unions, the option whose keys cover the value's. */
function objectShape(schema: unknown, value: object): Record<string, unknown> | undefined {
  const d = defOf(schema);
  if (!d) return undefined;
  if (d.type === 'object') return d.shape;
  if (d.type === 'pipe') return objectShape((d as unknown as { in: unknown }).in, value);
  if (d.type === 'union' && d.options) {
    for (const o of d.options) {
      const sh = objectShape(o, value);
      if (sh && Object.keys(value).every((k) => k in sh)) return sh;
    }
  }
  return undefined;
}

function rowsOf(shape: Record<string, unknown>, value: Record<string, unknown>, path: string, digits: number, out: DescribedSection[], title: string): void {
  const rows: DescribedRow[] = [];
  const nested: [string, unknown, Record<string, unknown>][] = [];
  for (const [key, field] of Object.entries(shape)) {
    const v = value[key];
    if (v === undefined) continue;
    const sub = v !== null && typeof v === 'object' && !Array.isArray(v) ? objectShape(field, v) : undefined;
    if (sub) {
      nested.push([key, field, v as Record<string, unknown>]);
      continue;
    }
    if (Array.isArray(v) && v.length) {
      // one row per item, e.g. `members[0]  core: length 80 mm, area 600 mm², steel low-carbon-steel`
      const d = defOf(field);
      v.forEach((item, i) => rows.push({ path: `${path}.${key}[${i}]`, label: `${key}[${i}]`, text: formatLeaf(d?.type === 'array' ? d.element : undefined, item, digits) }));
      continue;
    }
    rows.push({ path: `${path}.${key}`, label: key, text: formatLeaf(field, v, digits) });
  }
  out.push({ title, rows });
  for (const [key, field, v] of nested) rowsOf(objectShape(field, v)!, v, `${path}.${key}`, digits, out, `${path}.${key}`);
}

/**
 * Rows of every section present in a parsed design, formatted with SI prefixes.
 * `digits`: significant figures (default 4).
 */
export function describeDesign(design: Design, digits = 4): DescribedSection[] {
  const out: DescribedSection[] = [];
  const top: DescribedRow[] = [];
  const d = design as unknown as Record<string, unknown>;
  const sections: [string, unknown][] = Object.entries(DESIGN_SECTIONS);
  for (const [key, schema] of sections) {
    const v = d[key];
    if (v === undefined) continue;
    const def = defOf(schema);
    if (v === null) {
      top.push({ path: key, label: key, text: 'none' });
    } else if (Array.isArray(v)) {
      const el = def?.type === 'array' ? def.element : undefined;
      if (v.length === 0) top.push({ path: key, label: key, text: 'none' });
      v.forEach((item, i) => {
        const sh = item && typeof item === 'object' ? objectShape(el, item as object) : undefined;
        const name = (item as { name?: unknown })?.name;
        if (sh) rowsOf(sh, item as Record<string, unknown>, `${key}[${i}]`, digits, out, `${key}[${i}]${typeof name === 'string' ? ` (${name})` : ''}`);
        else top.push({ path: `${key}[${i}]`, label: `${key}[${i}]`, text: formatLeaf(el, item, digits) });
      });
    } else if (typeof v === 'object') {
      const sh = objectShape(schema, v);
      if (sh) rowsOf(sh, v as Record<string, unknown>, key, digits, out, key);
      else top.push({ path: key, label: key, text: formatLeaf(schema, v, digits) });
    } else {
      top.push({ path: key, label: key, text: formatLeaf(schema, v, digits) });
    }
  }
  return top.length ? [{ title: 'station', rows: top }, ...out] : out;
}

export interface OrientationFigures {
  storedEnergy_J: number;
  /** ESL + L_cable + L_coil, H; for a yoke, with its small-current inductance. */
  seriesInductance_H: number;
  seriesResistance_Ohm: number;
  characteristicImpedance_Ohm: number;
  naturalFrequency_Hz: number;
  dampingRatio: number;
  quarterPeriod_s: number;
  /** Air core: V0/Z0. Yoke: V0·√(C/(L_ext + L_sat)). Both upper bounds of the real peak (see the header). */
  losslessPeakCurrent_A: number;
  /** Field at the part at losslessPeakCurrent_A, A/m (an upper bound as well). */
  losslessPeakField_Apm: number;
  coilHeatCapacity_JpK: number;
  /** True when the coil is nonlinear (a yoke fixture). */
  nonlinearCoil: boolean;
  /** ESL + L_cable + L_sat with the yoke saturated, H; NaN for an air-core coil or a nonlinear coil that does not state L_sat. */
  saturatedSeriesInductance_H: number;
}

/** L_sat of a nonlinear coil that states it (a YokeCoil does), else NaN. */
function saturatedInductance_H(coil: NonlinearCoil): number {
  const v = (coil as Partial<{ saturatedInductance_H: number }>).saturatedInductance_H;
  return typeof v === 'number' && v > 0 ? v : Number.NaN;
}

/** Orientation figures of the series RLC discharge (see the header); not a simulation. */
export function orientationFigures(st: Station): OrientationFigures {
  const C = st.bank.capacitance_F;
  const V0 = st.bank.voltage_V;
  const Lext = st.bank.esl_H + st.cable.inductance_H;
  const L = Lext + st.coil.inductance_H;
  const Rcoil = st.coil.resistance20_Ohm * (1 + st.coil.tempCoeff_perK * (st.coil.initialTemperature_C - 20));
  const R = st.bank.esr_Ohm + st.switch.slopeResistance_Ohm + st.cable.resistance_Ohm + Rcoil;
  const Z0 = Math.sqrt(L / C);
  const nl = st.coil.nonlinear;
  const Lsat = nl ? Lext + saturatedInductance_H(nl) : Number.NaN;
  const I = nl ? Math.abs(V0) * Math.sqrt(C / Lsat) : V0 / Z0;
  return {
    storedEnergy_J: 0.5 * C * V0 ** 2,
    seriesInductance_H: L,
    seriesResistance_Ohm: R,
    characteristicImpedance_Ohm: Z0,
    naturalFrequency_Hz: 1 / (2 * Math.PI * Math.sqrt(L * C)),
    dampingRatio: (R / 2) * Math.sqrt(C / L),
    quarterPeriod_s: (Math.PI / 2) * Math.sqrt(L * C),
    losslessPeakCurrent_A: I,
    losslessPeakField_Apm: nl ? (Number.isFinite(I) ? nl.fieldAtPart_Apm(I) : Number.NaN) : I * (st.probes[0]?.coil_ApmPerA ?? 0),
    coilHeatCapacity_JpK: st.coil.heatCapacity_JpK,
    nonlinearCoil: Boolean(nl),
    saturatedSeriesInductance_H: Lsat,
  };
}

/** Orientation figures as formatted rows. */
export function describeOrientation(st: Station, digits = 3): DescribedSection {
  const f = orientationFigures(st);
  const row = (label: string, text: string): DescribedRow => ({ path: label, label, text });
  const q = (v: number, unit: string) => formatQuantity(v, unit, { digits });
  if (!f.nonlinearCoil) {
    return {
      title: 'derived (series RLC, no losses in the peak; orientation only, run `shot` for the waveform)',
      rows: [
        row('stored energy ½CV²', q(f.storedEnergy_J, 'J')),
        row('loop inductance', q(f.seriesInductance_H, 'H')),
        row('loop resistance at start', q(f.seriesResistance_Ohm, 'Ω')),
        row('characteristic impedance √(L/C)', q(f.characteristicImpedance_Ohm, 'Ω')),
        row('natural frequency', q(f.naturalFrequency_Hz, 'Hz')),
        row('damping ratio', formatNumber(f.dampingRatio, digits)),
        row('quarter period (π/2)√(LC)', q(f.quarterPeriod_s, 's')),
        row('lossless peak current V/√(L/C)', q(f.losslessPeakCurrent_A, 'A')),
        row('lossless peak field at the part', q(f.losslessPeakField_Apm, 'A/m')),
        row('coil heat capacity', q(f.coilHeatCapacity_JpK, 'J/K')),
      ],
    };
  }
  return {
    title:
      'derived (yoke fixture: the coil is nonlinear; RLC figures use its small-current inductance, the peak bounds its saturated one; orientation only, run `shot` for the waveform)',
    rows: [
      row('stored energy ½CV²', q(f.storedEnergy_J, 'J')),
      row('loop inductance, small current', q(f.seriesInductance_H, 'H')),
      row('loop inductance, yoke saturated', q(f.saturatedSeriesInductance_H, 'H')),
      row('loop resistance at start', q(f.seriesResistance_Ohm, 'Ω')),
      row('characteristic impedance, small current', q(f.characteristicImpedance_Ohm, 'Ω')),
      row('natural frequency, small current', q(f.naturalFrequency_Hz, 'Hz')),
      row('damping ratio, small current', formatNumber(f.dampingRatio, digits)),
      row('quarter period, small current', q(f.quarterPeriod_s, 's')),
      row('peak current at most V·√(C/L_sat)', q(f.losslessPeakCurrent_A, 'A')),
      row('peak field at the part at most', q(f.losslessPeakField_Apm, 'A/m')),
      row('coil heat capacity', q(f.coilHeatCapacity_JpK, 'J/K')),
    ],
  };
}
