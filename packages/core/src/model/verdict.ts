/**
 * The engineering verdict on one shot: a list of checked items, each with its value, its
 * limit, the margin and a status. Produced by analysis/ (verdict), read by report/ and the CLI.
 */

export type VerdictStatus = 'pass' | 'warn' | 'fail' | 'info';

export interface VerdictItem {
  /** Stable id of our own, e.g. `field.part`, `coil.temperature`, `switch.surge`, `switch.i2t`, `capacitor.reverse`. */
  id: string;
  /** Human label, e.g. "Peak field at the part". */
  item: string;
  /** The value found, in SI (see `unit`). */
  value: number;
  /** The limit it is checked against, in SI (see `unit`); NaN when informative only. */
  limit: number;
  /** SI unit symbol of value and limit, e.g. "A/m", "°C", "A", "A²s", "%". */
  unit: string;
  /**
   * Margin as a fraction: positive means inside the limit (0.2 = 20 % headroom), negative means beyond it.
   * Defined per item in its doc; NaN when informative only.
   */
  margin: number;
  status: VerdictStatus;
  /** One short sentence: the basis of the limit (source or "user setting") and what to do if it fails. */
  note: string;
}

export interface Verdict {
  items: VerdictItem[];
  /** Worst status over the items ('info' items do not count). */
  overall: 'pass' | 'warn' | 'fail';
}
