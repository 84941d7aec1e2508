/**
 * The mixture solvers in one import: the one-fluid model and phase properties
 * (mixtureModel.ts), Wilson's estimate (wilson.ts), bubble and dew pressures (bubbleDew.ts),
 * the PT flash (flash.ts), the stability test (stability.ts) and the cached saturation points
 * (saturationPoint.ts).
 */
export {
  mixtureAtT,
  mixtureModelVolume,
  phaseAt,
  type MixtureAtT,
  type PhaseState,
} from './mixtureModel.js';
export { wilsonK, wilsonKOf } from './wilson.js';
export { saturationPressure, type SaturationPoint } from './bubbleDew.js';
export { flashPT, rachfordRice, type FlashResult } from './flash.js';
export { stabilityTest } from './stability.js';
export { saturationPointAt } from './saturationPoint.js';
