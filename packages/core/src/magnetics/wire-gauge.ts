/**
 * American Wire Gauge diameters (ASTM B258).
 *
 *   d = 0.127 mm · 92^((36 − n)/39)
 *
 * n = 36 is 0.005 in (0.127 mm) and n = 0000 (written here as −3) is 0.46 in (11.684 mm); the
 * gauge steps geometrically between them, 39 steps for a ratio of 92. ASTM B258 rounds the
 * tabulated diameters to 0.0001 in; this is the defining formula, unrounded.
 * Gauges 00, 000, 0000 are n = −1, −2, −3 and may also be written "2/0", "3/0", "4/0".
 */

/** Diameter of bare round wire of AWG gauge n (n from −3 for 0000 up to 56), m. NaN outside that range. */
export function awgDiameter_m(gauge: number): number {
  if (!Number.isInteger(gauge) || gauge < -3 || gauge > 56) return NaN;
  return 0.127e-3 * 92 ** ((36 - gauge) / 39);
}

/**
 * Reads an AWG designation: a number (14), a string ("14", "AWG 14", "14 AWG"), or the aught
 * sizes ("0", "00", "000", "0000", "1/0" … "4/0"). Returns the gauge number n (0000 → −3), or
 * null when the text is not a gauge.
 */
export function parseAwg(text: string | number): number | null {
  if (typeof text === 'number') return Number.isInteger(text) && text >= -3 && text <= 56 ? text : null;
  const s = text.trim().toUpperCase().replace(/^AWG\s*/, '').replace(/\s*AWG$/, '');
  let n: number;
  if (/^0{1,4}$/.test(s)) n = 1 - s.length;
  else if (/^[1-4]\/0$/.test(s)) n = 1 - Number(s[0]);
  else if (/^\d{1,2}$/.test(s)) n = Number(s);
  else return null;
  return n >= -3 && n <= 56 ? n : null;
}
