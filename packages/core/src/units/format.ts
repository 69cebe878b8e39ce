/**
 * Engineering notation: an SI value with an SI prefix so the mantissa lies in [1, 1000),
 * e.g. formatQuantity(2.2e-3, 'F') -> "2.2 mF", formatQuantity(1.8e-4, 'H') -> "180 µH".
 * The one quantity formatter of the project (reports, design descriptions, docs, explore
 * output); report/quantity.ts re-exports it.
 *
 * Method: the prefix exponent is the largest multiple of 3 (pico to giga, BIPM SI Brochure,
 * 9th ed.) that leaves a mantissa of at least 1; the mantissa is rounded to `digits`
 * significant figures and, when rounding carries it to 1000, the next prefix is used.
 * Areas and volumes take the prefix on the metre, with the centimetre allowed as engineers
 * write pole faces and bank volumes (2.5e-6 m² -> "2.5 mm²", 6e-4 m² -> "6 cm²",
 * 2.4e-4 m³ -> "240 cm³"); a prefix is never squared by mistake.
 * Units that engineers do not prefix print as plain numbers, in exponent form outside
 * [1e-3, 1e6): °C, K, %, kg, dimensionless '' and '1', compound units such as J/(kg·K) or
 * (A/m)/A, A²s (a prefix is raised with its unit: "kA²s" means 1e6 A²s, so a prefix would
 * mislead), and every reciprocal unit '1/…' (rates such as 1/min, coefficients such as 1/K):
 * "440 m1/min" would be unreadable, "0.44 1/min" is not.
 */

const PREFIX: Record<number, string> = { [-12]: 'p', [-9]: 'n', [-6]: 'µ', [-3]: 'm', [0]: '', [3]: 'k', [6]: 'M', [9]: 'G' };

/** Units printed without a prefix (besides every reciprocal unit '1/…'). */
const PLAIN = new Set(['', '1', '%', '°C', 'K', 'kg', 'J/(kg·K)', '(A/m)/A', 'A²s', 'kg/m³', 'J/(K·m³)', 'Ω·m', 'J/K', 'rad', '°']);

/** True when `unit` takes no SI prefix (see the header). */
export function isUnprefixedUnit(unit: string): boolean {
  return PLAIN.has(unit) || unit.startsWith('1/');
}

export interface FormatOptions {
  /** Significant figures, default 3. */
  digits?: number;
}

function trimNumber(x: number, digits: number): string {
  return Number(x.toPrecision(digits)).toString();
}

/** A plain number with `digits` significant figures; exponent form outside [1e-3, 1e6). */
export function formatNumber(value: number, digits = 3): string {
  if (Number.isNaN(value)) return 'n/a';
  if (!Number.isFinite(value)) return value > 0 ? '∞' : '−∞';
  if (value === 0) return '0';
  const abs = Math.abs(value);
  const sign = value < 0 ? '−' : '';
  if (abs >= 1e-3 && abs < 1e6) return sign + trimNumber(abs, digits);
  const [m, e] = abs.toExponential(digits - 1).split('e') as [string, string];
  return `${sign}${Number(m).toString()}e${Number(e)}`;
}

function withUnit(num: string, unit: string): string {
  if (!unit) return num;
  return `${num} ${unit}`;
}

/**
 * Format an SI value with an engineering prefix. NaN prints as "n/a", infinities as
 * "∞"/"−∞" with the unit.
 *
 * @example formatQuantity(2.2e-3, 'F')      // "2.2 mF"
 * @example formatQuantity(1600, 'V')        // "1.6 kV"
 * @example formatQuantity(0.035, 'Ω')       // "35 mΩ"
 * @example formatQuantity(2.4e6, 'A/m')     // "2.4 MA/m"
 * @example formatQuantity(40, '°C')         // "40 °C"
 * @example formatQuantity(2.5e-6, 'm²')     // "2.5 mm²"
 * @example formatQuantity(0.44, '1/min')    // "0.44 1/min"
 */
export function formatQuantity(value: number, unit: string, options: FormatOptions = {}): string {
  const digits = options.digits ?? 3;
  if (Number.isNaN(value)) return 'n/a';
  if (!Number.isFinite(value)) return withUnit(value > 0 ? '∞' : '−∞', unit);
  if (isUnprefixedUnit(unit)) return withUnit(formatNumber(value, digits), unit);
  const power = unit === 'm²' ? 2 : unit === 'm³' ? 3 : 1;
  const base = power === 1 ? unit : 'm';
  const suffix = power === 2 ? '²' : power === 3 ? '³' : '';
  if (value === 0) return `0 ${unit}`;
  const abs = Math.abs(value);
  const sign = value < 0 ? '−' : '';
  // choose exponent (a multiple of 3) of the prefix so that the mantissa is in [1, 1000)
  const allowed = power === 1 ? [-12, -9, -6, -3, 0, 3, 6, 9] : power === 2 ? [-6, -3, -2, 0] : [-3, -2, 0];
  let chosen = allowed[0]!;
  for (const e of allowed) if (abs / 10 ** (e * power) >= 1 - 1e-12) chosen = e;
  let mant = abs / 10 ** (chosen * power);
  const idx = allowed.indexOf(chosen);
  if (Number(mant.toPrecision(digits)) >= 1000 && idx < allowed.length - 1) {
    chosen = allowed[idx + 1]!;
    mant = abs / 10 ** (chosen * power);
  }
  const prefix = chosen === -2 ? 'c' : (PREFIX[chosen] ?? '');
  const text = mant >= 1e-3 && mant < 1e6 ? trimNumber(mant, digits) : formatNumber(mant, digits);
  return `${sign}${text} ${prefix}${base}${suffix}`;
}

/**
 * The SI prefix that suits values up to `maxAbs` in `unit`, for a whole axis or column:
 * display value = SI value / factor, shown unit = symbol + unit. Unprefixed units (see the
 * header), areas and volumes get factor 1.
 */
export function engineeringPrefix(maxAbs: number, unit: string): { factor: number; unit: string } {
  if (isUnprefixedUnit(unit) || unit === 'm²' || unit === 'm³' || !(maxAbs > 0) || !Number.isFinite(maxAbs)) return { factor: 1, unit };
  const exp = Math.max(-12, Math.min(9, 3 * Math.floor(Math.log10(maxAbs) / 3)));
  return { factor: 10 ** exp, unit: `${PREFIX[exp]}${unit}` };
}

/** A fraction as a signed percentage, e.g. 0.234 -> "+23.4 %". NaN -> "n/a". */
export function formatPercent(fraction: number, digits = 3): string {
  if (Number.isNaN(fraction)) return 'n/a';
  const pct = fraction * 100;
  const sign = pct > 0 ? '+' : pct < 0 ? '−' : '';
  return `${sign}${formatNumber(Math.abs(pct), digits)} %`;
}
