/** @fluxkick/core: the public API. A short list of exports; see docs/architecture.md. */
export type * from './model/station.js';
export type * from './model/result.js';
export type * from './model/verdict.js';
export { DEFAULT_SOLVER } from './model/station.js';
export { safetyNotice, safetyHeadline } from './report/safety.js';
export { parseQuantity, tryParseQuantity, describeDimension, DIMENSIONS, QuantityError } from './units/quantity.js';
export type { Dimension, QuantityParse } from './units/quantity.js';
export { InputError, isInputError, formatInputError } from './design/errors.js';
export type { InputIssue, InputErrorCode } from './design/errors.js';
