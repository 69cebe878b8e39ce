/**
 * Report-side names for the shared quantity formatter (units/format.ts): one implementation,
 * kept importable from here so report and explore modules need not change their imports.
 */
export { formatQuantity, engineeringPrefix, formatPercent, formatNumber as formatPlain } from '../units/format.js';
export type { FormatOptions as FormatQuantityOptions } from '../units/format.js';
