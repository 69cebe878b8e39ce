/**
 * Thermal classes of electrical insulation, IEC 60085 (Electrical insulation — Thermal
 * evaluation and designation): the class is the highest temperature, °C, at which the
 * insulation system is rated for its expected life. The letters are the classic designations
 * printed beside the numbers in the same standard.
 *
 * Used by the production-heating check: the winding's peak temperature stays below its class.
 */

export interface InsulationClass {
  /** Class temperature, °C. */
  temperature_C: number;
  /** Letter designation. */
  letter: string;
}

/** IEC 60085 thermal classes, ascending. */
export const INSULATION_CLASSES: readonly InsulationClass[] = [
  { temperature_C: 90, letter: 'Y' },
  { temperature_C: 105, letter: 'A' },
  { temperature_C: 120, letter: 'E' },
  { temperature_C: 130, letter: 'B' },
  { temperature_C: 155, letter: 'F' },
  { temperature_C: 180, letter: 'H' },
  { temperature_C: 200, letter: 'N' },
  { temperature_C: 220, letter: 'R' },
  { temperature_C: 250, letter: '' },
];

/** Accepted spellings of a class: the number (155, "155") or the letter ("F", case-insensitive). */
export type InsulationClassKey = number | string;

/**
 * The class named by a number or a letter, or undefined if the name is not an IEC 60085 class.
 * "250" has no letter in the standard's list.
 */
export function insulationClass(key: InsulationClassKey): InsulationClass | undefined {
  if (typeof key === 'number') return INSULATION_CLASSES.find((c) => c.temperature_C === key);
  const s = key.trim().toUpperCase();
  if (/^\d+$/.test(s)) return insulationClass(Number(s));
  if (s === '') return undefined;
  return INSULATION_CLASSES.find((c) => c.letter === s);
}

/** "155 °C (F)" style label. */
export function insulationClassLabel(c: InsulationClass): string {
  return c.letter ? `${c.temperature_C} °C (${c.letter})` : `${c.temperature_C} °C`;
}

/** Every accepted spelling, for error messages and schemas. */
export function insulationClassNames(): string[] {
  return INSULATION_CLASSES.flatMap((c) => (c.letter ? [String(c.temperature_C), c.letter] : [String(c.temperature_C)]));
}
