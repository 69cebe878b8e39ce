/**
 * Engineering notation: an SI value with an SI prefix so the mantissa lies in [1, 1000),
 * e.g. formatQuantity(2.2e-3, 'F') -> "2.2 mF", formatQuantity(1.8e-4, 'H') -> "180 µH".
 *
 * Prefixes pico to giga (BIPM SI Brochure, 9th ed.). Units that engineers do not prefix
 * (°C, K, %, kg, compound units such as J/(kg·K) or (A/m)/A) print as plain numbers, in
 * exponent form outside [1e-3, 1e6). Areas and volumes take the prefix on the metre:
 * 2.5e-6 m² -> "2.5 mm²", 2.4e-4 m³ -> "240 cm³".
 */

const PREFIX: Record<number, string> = { [-12]: 'p', [-9]: 'n', [-6]: 'µ', [-3]: 'm', [0]: '', [3]: 'k', [6]: 'M', [9]: 'G' };

/** Units printed without a prefix. */
const PLAIN = new Set(['', '%', '°C', 'K', '1/K', 'kg', 'J/(kg·K)', '(A/m)/A', 'A²s', 'kg/m³', 'J/(K·m³)', 'Ω·m', 'J/K', 'rad', '°']);

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
 * Format an SI value with an engineering prefix.
 *
 * @example formatQuantity(2.2e-3, 'F')      // "2.2 mF"
 * @example formatQuantity(1600, 'V')        // "1.6 kV"
 * @example formatQuantity(0.035, 'Ω')       // "35 mΩ"
 * @example formatQuantity(2.4e6, 'A/m')     // "2.4 MA/m"
 * @example formatQuantity(40, '°C')         // "40 °C"
 * @example formatQuantity(2.5e-6, 'm²')     // "2.5 mm²"
 */
export function formatQuantity(value: number, unit: string, options: FormatOptions = {}): string {
  const digits = options.digits ?? 3;
  if (Number.isNaN(value)) return 'n/a';
  if (!Number.isFinite(value)) return withUnit(value > 0 ? '∞' : '−∞', unit);
  if (PLAIN.has(unit)) return withUnit(formatNumber(value, digits), unit);
  const power = unit === 'm²' ? 2 : unit === 'm³' ? 3 : 1;
  const base = power === 1 ? unit : 'm';
  const suffix = power === 2 ? '²' : power === 3 ? '³' : '';
  if (value === 0) return `0 ${unit}`;
  const abs = Math.abs(value);
  const sign = value < 0 ? '−' : '';
  // choose exponent (a multiple of 3) of the prefix so that the mantissa is in [1, 1000)
  const allowed = power === 1 ? [-12, -9, -6, -3, 0, 3, 6, 9] : power === 2 ? [-6, -3, 0] : [-3, -2, 0];
  let chosen = allowed[0]!;
  for (const e of allowed) if (abs / 10 ** (e * power) >= 1 - 1e-12) chosen = e;
  let mant = abs / 10 ** (chosen * power);
  const idx = allowed.indexOf(chosen);
  if (Number(mant.toPrecision(digits)) >= 1000 && idx < allowed.length - 1) {
    chosen = allowed[idx + 1]!;
    mant = abs / 10 ** (chosen * power);
  }
  const prefix = power === 3 && chosen === -2 ? 'c' : (PREFIX[chosen] ?? '');
  const text = mant >= 1e-3 && mant < 1e6 ? trimNumber(mant, digits) : formatNumber(mant, digits);
  return `${sign}${text} ${prefix}${base}${suffix}`;
}
