/** @fluxkick/core: the public API. A short list of exports; see docs/architecture.md. */
export type * from './model/station.js';
export type * from './model/result.js';
export type * from './model/verdict.js';
export { DEFAULT_SOLVER } from './model/station.js';
export { safetyNotice, safetyHeadline } from './report/safety.js';
export { formatShotText } from './report/text.js';
export { shotToJson, shotToJsonString, JSON_FIELDS } from './report/json.js';
export { waveformToCsv } from './report/csv.js';
export { writeOutputFile } from './report/write.js';
export { formatQuantity } from './report/quantity.js';
export { parseQuantity, tryParseQuantity, describeDimension, DIMENSIONS, QuantityError } from './units/quantity.js';
export type { Dimension, QuantityParse } from './units/quantity.js';
export { InputError, isInputError, formatInputError } from './design/errors.js';
export type { InputIssue, InputErrorCode } from './design/errors.js';
