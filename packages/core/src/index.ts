/** @fluxkick/core: the public API. A short list of exports; see docs/architecture.md. */
export type * from './model/station.js';
export type * from './model/result.js';
export type * from './model/verdict.js';
export { DEFAULT_SOLVER } from './model/station.js';
export { safetyNotice, safetyHeadline } from './report/safety.js';
