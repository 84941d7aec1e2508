export { checkTank } from './checkTank.js';
export { STANDING_CAUTION } from './standing.js';
export { CO2_TRIPLE_POINT_PA } from './cautions.js';
export type * from './types.js';
