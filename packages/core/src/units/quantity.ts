/**
 * Physical quantities from design files: a plain number (already SI) or a string with
 * units ("2200 uF", "1.8 kV", "35 mohm", "40 degC"), parsed with mathjs and checked
 * against the dimension the field expects. The result is always an SI number, except
 * temperatures, which come out in °C (the unit every other layer uses for temperatures).
 *
 * Method: mathjs `unit()` parses the string into a value and exponents over the base
 * dimensions (kg, m, s, A, K); the exponents must equal the expected dimension's.
 * Values are rounded to 15 significant digits so that prefix arithmetic noise
 * (2200 × 1e-6 = 0.0021999999999999997) does not leak into reports.
 *
 * Accepted spellings beyond mathjs: Ω → ohm, µ/μ → u, °C/°F → degC/degF, "Ohm" → "ohm",
 * a trailing "%" for dimensionless values ("5 %" → 0.05).
 *
 * Temperatures: a plain number is °C; "313.15 K", "104 degF" are converted to °C.
 * Temperature differences (dimension `temperatureDifference`): K and degC count 1:1,
 * degF and degR count 5/9.
 */
import { createRequire } from 'node:module';
import type { Unit } from 'mathjs';

/**
 * mathjs is loaded on first use, not at import: loading it costs about a second of CPU, and most
 * programs that import the library (a worker thread of a sweep, a test file, `fluxkick schema`)
 * never parse a unit string. Same module, same results; only the time of loading moves.
 */
let mathjsUnit: ((s: string) => Unit) | undefined;
function mathUnit(s: string): Unit {
  mathjsUnit ??= (createRequire(import.meta.url)('mathjs') as typeof import('mathjs')).unit as (s: string) => Unit;
  return mathjsUnit(s);
}

/** Exponents over the base dimensions kg, m, s, A, K. */
export type Exponents = readonly [kg: number, m: number, s: number, A: number, K: number];

export interface DimensionInfo {
  /** Human name with article, e.g. "a capacitance". */
  label: string;
  /** The SI unit values come out in (display form), e.g. "F", "Ω", "°C". */
  unit: string;
  /** An example a designer could type, e.g. "2200 uF". */
  example: string;
  exponents: Exponents;
}

/**
 * Every dimension a design field may have. Add a line here for a new one
 * (label, SI unit, an example string that parses to it, exponents kg m s A K).
 */
export const DIMENSIONS = {
  dimensionless: { label: 'a plain number', unit: '', example: '0.8', exponents: [0, 0, 0, 0, 0] },
  capacitance: { label: 'a capacitance', unit: 'F', example: '2200 uF', exponents: [-1, -2, 4, 2, 0] },
  voltage: { label: 'a voltage', unit: 'V', example: '1.6 kV', exponents: [1, 2, -3, -1, 0] },
  resistance: { label: 'a resistance', unit: 'Ω', example: '35 mohm', exponents: [1, 2, -3, -2, 0] },
  inductance: { label: 'an inductance', unit: 'H', example: '180 uH', exponents: [1, 2, -2, -2, 0] },
  current: { label: 'a current', unit: 'A', example: '12 kA', exponents: [0, 0, 0, 1, 0] },
  time: { label: 'a time', unit: 's', example: '2 ms', exponents: [0, 0, 1, 0, 0] },
  frequency: { label: 'a frequency or rate', unit: 'Hz', example: '6 /min', exponents: [0, 0, -1, 0, 0] },
  length: { label: 'a length', unit: 'm', example: '1.5 mm', exponents: [0, 1, 0, 0, 0] },
  area: { label: 'an area', unit: 'm²', example: '2.5 mm^2', exponents: [0, 2, 0, 0, 0] },
  volume: { label: 'a volume', unit: 'm³', example: '240 cm^3', exponents: [0, 3, 0, 0, 0] },
  mass: { label: 'a mass', unit: 'kg', example: '2.1 kg', exponents: [1, 0, 0, 0, 0] },
  temperature: { label: 'a temperature', unit: '°C', example: '40 degC', exponents: [0, 0, 0, 0, 1] },
  temperatureDifference: { label: 'a temperature difference', unit: 'K', example: '60 K', exponents: [0, 0, 0, 0, 1] },
  fieldStrength: { label: 'a magnetic field strength', unit: 'A/m', example: '2.4 MA/m', exponents: [0, -1, 0, 1, 0] },
  fieldPerCurrent: { label: 'a field per ampere', unit: '(A/m)/A', example: '95 A/m/A', exponents: [0, -1, 0, 0, 0] },
  fluxDensity: { label: 'a flux density', unit: 'T', example: '1.2 T', exponents: [1, 0, -2, -1, 0] },
  specificHeat: { label: 'a specific heat', unit: 'J/(kg·K)', example: '385 J/(kg K)', exponents: [0, 2, -2, 0, -1] },
  heatCapacity: { label: 'a heat capacity', unit: 'J/K', example: '810 J/K', exponents: [1, 2, -2, 0, -1] },
  volumetricHeatCapacity: { label: 'a volumetric heat capacity', unit: 'J/(K·m³)', example: '3.45e6 J/(K m^3)', exponents: [1, -1, -2, 0, -1] },
  tempCoeff: { label: 'a temperature coefficient', unit: '1/K', example: '0.00393 /K', exponents: [0, 0, 0, 0, -1] },
  resistivity: { label: 'a resistivity', unit: 'Ω·m', example: '1.7241e-8 ohm m', exponents: [1, 3, -3, -2, 0] },
  density: { label: 'a density', unit: 'kg/m³', example: '8890 kg/m^3', exponents: [1, -3, 0, 0, 0] },
  energy: { label: 'an energy', unit: 'J', example: '2.8 kJ', exponents: [1, 2, -2, 0, 0] },
  power: { label: 'a power', unit: 'W', example: '5 kW', exponents: [1, 2, -3, 0, 0] },
  pressure: { label: 'a pressure or stress', unit: 'Pa', example: '50 MPa', exponents: [1, -1, -2, 0, 0] },
  currentRate: { label: 'a rate of current rise', unit: 'A/s', example: '200 A/us', exponents: [0, 0, -1, 1, 0] },
  i2t: { label: 'a current-squared time (I²t)', unit: 'A²s', example: '2e6 A^2 s', exponents: [0, 0, 1, 2, 0] },
  thermalResistance: { label: 'a thermal resistance', unit: 'K/W', example: '0.8 K/W', exponents: [-1, -2, 3, 0, 1] },
  heatTransferCoefficient: { label: 'a heat-transfer coefficient', unit: 'W/(m²·K)', example: '10 W/(m^2 K)', exponents: [1, 0, -3, 0, -1] },
} as const satisfies Record<string, DimensionInfo>;

export type Dimension = keyof typeof DIMENSIONS;

/** "a capacitance (F), e.g. 2200 uF" */
export function describeDimension(dimension: Dimension): string {
  const d: DimensionInfo = DIMENSIONS[dimension];
  return d.unit ? `${d.label} (${d.unit}), e.g. ${d.example}` : `${d.label}, e.g. ${d.example}`;
}

/** Why a quantity did not parse. */
export type QuantityErrorCode =
  | 'quantity.type' // not a number or a string
  | 'quantity.not-finite' // NaN, Infinity
  | 'quantity.syntax' // not a number followed by a unit
  | 'quantity.unknown-unit' // unit not known to mathjs
  | 'quantity.dimension'; // unit of the wrong dimension

export type QuantityParse =
  | { ok: true; value: number }
  | {
      ok: false;
      code: QuantityErrorCode;
      /** Short explanation of what was wrong, e.g. `"2 kV" is a voltage (V)`. */
      reason: string;
      /** What was expected, e.g. "a capacitance (F), e.g. 2200 uF". */
      expected: string;
      /** A corrected spelling when one is found, e.g. "1.8 kV" for "1.8 KV". */
      suggestion?: string;
    };

/** Thrown by `parseQuantity`; `tryParseQuantity` returns the same facts as data. */
export class QuantityError extends Error {
  override name = 'QuantityError';
  constructor(
    public readonly code: QuantityErrorCode,
    public readonly input: unknown,
    public readonly expected: string,
    public readonly reason: string,
    public readonly suggestion?: string,
  ) {
    super(`${reason}; expected ${expected}${suggestion ? ` (did you mean "${suggestion}"?)` : ''}`);
  }
}

const NUMBER_RE = /^[+-]?(\d+\.?\d*|\.\d+)([eE][+-]?\d+)?$/;
const PERCENT_RE = /^([+-]?(?:\d+\.?\d*|\.\d+)(?:[eE][+-]?\d+)?)\s*%$/;

/** Round away float noise from prefix arithmetic (15 significant digits, the double's safe decimal precision). */
function clean(x: number): number {
  return x === 0 ? 0 : Number(x.toPrecision(15));
}

/** Spellings mathjs does not know, mapped to ones it does. */
function normalizeSpelling(s: string): string {
  return s
    .trim()
    .replace(/[µμ]/g, 'u')
    .replace(/Ω/g, 'ohm')
    .replace(/°\s*C/g, 'degC')
    .replace(/°\s*F/g, 'degF')
    .replace(/(^|[^A-Za-z])([a-zA-Z]?)Ohms?\b/g, '$1$2ohm')
    .replace(/·/g, ' ')
    .replace(/\bohms\b/g, 'ohm');
}

function exponentsOf(u: Unit): number[] {
  // mathjs base order: MASS, LENGTH, TIME, CURRENT, TEMPERATURE, LUMINOUS_INTENSITY, AMOUNT_OF_SUBSTANCE, ANGLE, BIT
  const d = (u as unknown as { dimensions: number[] }).dimensions;
  return d;
}

function sameDimension(u: Unit, dim: Dimension): boolean {
  const d = exponentsOf(u);
  const want = DIMENSIONS[dim].exponents;
  for (let i = 0; i < d.length; i++) {
    const w = i < 5 ? want[i] : 0;
    if (Math.abs((d[i] ?? 0) - w) > 1e-12) return false;
  }
  return true;
}

/** Name the dimension a parsed unit has, for the error message ("a voltage (V)"). */
function nameDimensionOf(u: Unit): string {
  for (const key of Object.keys(DIMENSIONS) as Dimension[]) {
    if (key === 'temperatureDifference' || key === 'dimensionless') continue;
    if (sameDimension(u, key)) {
      const d: DimensionInfo = DIMENSIONS[key];
      return `${d.label} (${d.unit})`;
    }
  }
  if (exponentsOf(u).every((e) => e === 0)) return 'a plain number';
  return `a quantity in ${u.toSI().formatUnits() || 'no unit'}`;
}

function fail(
  code: QuantityErrorCode,
  reason: string,
  dimension: Dimension,
  suggestion?: string,
): QuantityParse {
  return suggestion === undefined
    ? { ok: false, code, reason, expected: describeDimension(dimension) }
    : { ok: false, code, reason, expected: describeDimension(dimension), suggestion };
}

function tryUnit(s: string): Unit | null {
  try {
    const u = mathUnit(s);
    return typeof u === 'object' && u !== null ? u : null;
  } catch {
    return null;
  }
}

/** SI value (°C for temperatures) of a unit already known to have the right dimension. */
function valueOf(u: Unit, dimension: Dimension): number {
  if (dimension === 'temperature') return clean(u.toNumber('degC'));
  if (dimension === 'temperatureDifference') {
    // A difference: the offset of degC/degF does not apply.
    const parts = (u as unknown as { units: { unit: { name: string }; prefix: { value: number }; power: number }[] }).units;
    if (parts.length === 1 && parts[0]!.power === 1) {
      const written = u.toNumber(u.formatUnits());
      const name = parts[0]!.unit.name;
      const scale = name === 'degF' || name === 'degR' ? 5 / 9 : 1;
      return clean(written * parts[0]!.prefix.value * scale);
    }
    return clean(u.toSI().toNumeric() as number);
  }
  return clean(u.toSI().toNumeric() as number);
}

/** Try a few common mis-spellings (wrong letter case of prefix or unit) and keep one that fits. */
function suggestSpelling(s: string, dimension: Dimension): string | undefined {
  const m = /^([+-]?(?:\d+\.?\d*|\.\d+)(?:[eE][+-]?\d+)?)\s*(.+)$/.exec(s);
  if (!m) return undefined;
  const [, num, unitPart] = m as unknown as [string, string, string];
  const variants = new Set<string>([
    unitPart.charAt(0).toLowerCase() + unitPart.slice(1),
    unitPart.charAt(0).toLowerCase() + unitPart.slice(1, 2).toUpperCase() + unitPart.slice(2),
    unitPart.slice(0, 1) + unitPart.slice(1).toUpperCase(),
    unitPart.toLowerCase(),
    unitPart.charAt(0) + unitPart.slice(1).toLowerCase(),
    unitPart.replace(/^M(?=ohm|Ohm)/, 'm'),
  ]);
  for (const v of variants) {
    if (v === unitPart) continue;
    const u = tryUnit(`${num} ${v}`);
    if (u && sameDimension(u, dimension)) return `${num} ${v}`;
  }
  return undefined;
}

/**
 * Parse a number or a string with units, checking its dimension. Never throws.
 *
 * @example tryParseQuantity('2200 uF', 'capacitance')   // { ok: true, value: 0.0022 }
 * @example tryParseQuantity('40 degC', 'temperature')   // { ok: true, value: 40 }  (°C)
 * @example tryParseQuantity('2 kV', 'capacitance')      // { ok: false, code: 'quantity.dimension', ... }
 */
export function tryParseQuantity(input: unknown, dimension: Dimension): QuantityParse {
  if (typeof input === 'number') {
    if (!Number.isFinite(input)) return fail('quantity.not-finite', `${String(input)} is not a finite number`, dimension);
    return { ok: true, value: input };
  }
  if (typeof input !== 'string') {
    const kind = input === null ? 'null' : Array.isArray(input) ? 'a list' : typeof input === 'object' ? 'an object' : typeof input;
    return fail('quantity.type', `got ${kind}, not a number or a string with a unit`, dimension);
  }
  const s = normalizeSpelling(input);
  if (s === '') return fail('quantity.syntax', 'the value is empty', dimension);
  if (/^[+-]?(nan|inf(inity)?|\.inf|\.nan)\b/i.test(s)) {
    return fail('quantity.not-finite', `"${input}" is not a finite number`, dimension);
  }
  if (NUMBER_RE.test(s)) {
    const v = Number(s);
    if (!Number.isFinite(v)) return fail('quantity.not-finite', `"${input}" is not a finite number`, dimension);
    return { ok: true, value: v };
  }
  const pct = PERCENT_RE.exec(s);
  if (pct) {
    if (dimension !== 'dimensionless') {
      return fail('quantity.dimension', `"${input}" is a percentage (a plain number)`, dimension);
    }
    const v = Number(pct[1]) / 100;
    if (!Number.isFinite(v)) return fail('quantity.not-finite', `"${input}" is not a finite number`, dimension);
    return { ok: true, value: clean(v) };
  }
  if (!/^[+-]?(\d|\.\d)/.test(s)) {
    return fail('quantity.syntax', `"${input}" does not start with a number`, dimension);
  }
  let u: Unit;
  try {
    u = mathUnit(s);
  } catch (e) {
    const msg = e instanceof Error ? e.message : String(e);
    const unknown = /Unit "([^"]+)" not found/.exec(msg);
    const suggestion = suggestSpelling(s, dimension);
    if (unknown) return fail('quantity.unknown-unit', `"${input}": unknown unit "${unknown[1]}"`, dimension, suggestion);
    return fail('quantity.syntax', `"${input}" is not a number followed by a unit`, dimension, suggestion);
  }
  if (!sameDimension(u, dimension)) {
    return fail('quantity.dimension', `"${input}" is ${nameDimensionOf(u)}`, dimension, suggestSpelling(s, dimension));
  }
  const value = valueOf(u, dimension);
  if (!Number.isFinite(value)) return fail('quantity.not-finite', `"${input}" is not a finite number`, dimension);
  return { ok: true, value };
}

/**
 * Parse a number or a string with units to SI (°C for temperatures); throws `QuantityError`.
 *
 * @example parseQuantity('1.8 kV', 'voltage')          // 1800
 * @example parseQuantity('35 mohm', 'resistance')      // 0.035
 * @example parseQuantity('95 A/m/A', 'fieldPerCurrent') // 95
 */
export function parseQuantity(input: unknown, dimension: Dimension): number {
  const r = tryParseQuantity(input, dimension);
  if (r.ok) return r.value;
  throw new QuantityError(r.code, input, r.expected, r.reason, r.suggestion);
}
