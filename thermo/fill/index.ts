/** The fill record: before and after a delivery, with a check that the gauge agrees with the meter. */
export { startFill } from './start.js';
export { reconcileFill, T_15C_K } from './reconcile.js';
export { FILL_ACCURACY_DEFAULTS, FILL_ACCURACY_LIMITS } from './defaults.js';
export { METER_BASES } from './validate.js';
export { makeFillRecord, validateFillRecord } from './record.js';
export type * from './types.js';
