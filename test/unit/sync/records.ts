/** Plainly invented records for the sync tests (not check values of any kind). */
export { check, tank } from '../../../scripts/sync/records.mjs';
