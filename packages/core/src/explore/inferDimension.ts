/**
 * The dimension of a design field read from the value written in the design file: a string
 * with a unit ("2200 uF") names its dimension; a plain number does not (undefined).
 * Used when the design schema cannot say; the first dimension in units/quantity.ts's table
 * that accepts the value wins (so "25 degC" is a temperature, not a temperature difference).
 */
import { DIMENSIONS, tryParseQuantity, type Dimension } from '../units/quantity.js';

export function inferDimension(current: number | string): Dimension | undefined {
  if (typeof current !== 'string') return undefined;
  if (tryParseQuantity(current, 'dimensionless').ok && !current.trim().endsWith('%')) return undefined;
  for (const dimension of Object.keys(DIMENSIONS) as Dimension[]) {
    if (dimension === 'dimensionless') continue;
    if (tryParseQuantity(current, dimension).ok) return dimension;
  }
  return current.trim().endsWith('%') ? 'dimensionless' : undefined;
}
