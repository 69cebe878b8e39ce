/**
 * Engineering notation for reports: a value in SI with an SI prefix chosen so the mantissa
 * lies in [1, 1000), e.g. 2.82e3 J -> "2.82 kJ", 1.8e-4 H -> "180 µH".
 *
 * Method: exponent = 3·floor(log10(|x|)/3), clamped to the prefixes from pico to giga;
 * the mantissa is rounded to `digits` significant figures and, when rounding carries it to
 * 1000, the next prefix is used. Units that take no prefix in engineering writing (°C, %,
 * dimensionless ratios) are printed plain. Prefix names follow the SI brochure (BIPM, 9th ed.).
 *
 * Kept in report/ because units/ (the design helper's) had no formatter when this was written;
 * it has no dependency and can be replaced by a shared one without changing callers.
 */

const PREFIXES: Record<number, string> = {
  [-12]: 'p',
  [-9]: 'n',
  [-6]: 'µ',
  [-3]: 'm',
  [0]: '',
  [3]: 'k',
  [6]: 'M',
  [9]: 'G',
};

/** Units printed without an SI prefix. */
const UNPREFIXED = new Set(['°C', '%', '', '1', 'K']);

export interface FormatQuantityOptions {
  /** Significant figures, default 3. */
  digits?: number;
}

/** Round to `digits` significant figures and print without exponent (for mantissas in [1, 1000)). */
function roundSig(x: number, digits: number): string {
  if (x === 0) return '0';
  return Number(x.toPrecision(digits)).toString();
}

/**
 * Format `value` (SI, in `unit`) with an engineering prefix. NaN prints as "n/a",
 * infinities as "∞"/"−∞" with the unit.
 */
export function formatQuantity(value: number, unit: string, options: FormatQuantityOptions = {}): string {
  const digits = options.digits ?? 3;
  const sep = unit === '' || unit === '%' ? (unit === '%' ? ' ' : '') : ' ';
  if (Number.isNaN(value)) return 'n/a';
  if (!Number.isFinite(value)) return `${value > 0 ? '∞' : '−∞'}${sep}${unit}`.trimEnd();
  if (UNPREFIXED.has(unit)) return `${formatPlain(value, digits)}${sep}${unit}`.trimEnd();
  // a prefix on m² would square (1 mm² = 1e-6 m²): show small areas in mm², larger ones in m²
  if (unit === 'm²') {
    return Math.abs(value) < 1e-2 ? `${formatPlain(value * 1e6, digits)} mm²` : `${formatPlain(value, digits)} m²`;
  }
  if (value === 0) return `0 ${unit}`;
  const abs = Math.abs(value);
  let exp = 3 * Math.floor(Math.log10(abs) / 3);
  exp = Math.max(-12, Math.min(9, exp));
  let mant = abs / 10 ** exp;
  // rounding may carry 999.6 -> 1000: move to the next prefix
  if (Number(mant.toPrecision(digits)) >= 1000 && exp < 9) {
    exp += 3;
    mant = abs / 10 ** exp;
  }
  const sign = value < 0 ? '−' : '';
  return `${sign}${roundSig(mant, digits)} ${PREFIXES[exp]}${unit}`;
}

/**
 * The SI prefix that suits values up to `maxAbs` in `unit`, for a whole axis or column:
 * display value = SI value / factor, shown unit = symbol + unit. °C, K, % and ratios get factor 1.
 */
export function engineeringPrefix(maxAbs: number, unit: string): { factor: number; unit: string } {
  if (UNPREFIXED.has(unit) || unit === 'm²' || !(maxAbs > 0) || !Number.isFinite(maxAbs)) return { factor: 1, unit };
  const exp = Math.max(-12, Math.min(9, 3 * Math.floor(Math.log10(maxAbs) / 3)));
  return { factor: 10 ** exp, unit: `${PREFIXES[exp]}${unit}` };
}

/**
 * A plain number with `digits` significant figures (no prefix), switching to exponent
 * notation outside [1e-3, 1e6).
 */
export function formatPlain(value: number, digits = 3): string {
  if (Number.isNaN(value)) return 'n/a';
  if (!Number.isFinite(value)) return value > 0 ? '∞' : '−∞';
  if (value === 0) return '0';
  const abs = Math.abs(value);
  const sign = value < 0 ? '−' : '';
  if (abs >= 1e-3 && abs < 1e6) {
    // keep integers of more digits than `digits` intact (e.g. 1234 with 3 digits -> 1230)
    return sign + Number(abs.toPrecision(digits)).toString();
  }
  const [m, e] = abs.toExponential(digits - 1).split('e');
  return `${sign}${Number(m)}e${Number(e)}`;
}

/** A fraction as a signed percentage, e.g. 0.234 -> "+23.4 %". NaN -> "n/a". */
export function formatPercent(fraction: number, digits = 3): string {
  if (Number.isNaN(fraction)) return 'n/a';
  const pct = fraction * 100;
  const sign = pct > 0 ? '+' : pct < 0 ? '−' : '';
  return `${sign}${formatPlain(Math.abs(pct), digits)} %`;
}
