export { checkTank } from './checkTank.js';
export { STANDING_CAUTION } from './standing.js';
export { CO2_TRIPLE_POINT_PA } from './cautions.js';
export type * from './types.js';
export * as rules from '../rules/index.js';
export * as tankGeometry from '../tank/index.js';
export { LPG_PRESETS } from '../rules/presets.js';
export type { LpgPreset } from '../rules/presets.js';
