/** The EOS core's public surface. SI units: K, Pa (absolute), kg, m³, mol. */
export {
  listFluids,
  saturation,
  liquidDensity,
  closedTank,
  criticalTemperature,
  maxDensity,
  dewPoint,
  flash,
  describeProduct,
} from './api.js';
export type {
  FluidSummary,
  SaturationState,
  ClosedTankResult,
  DewState,
  FlashState,
  ProductDescription,
} from './api.js';
export type { Product, CustomFluid, BlendComponent, ModelOptions } from './product.js';
export type { Phase } from './solvers/closedTank.js';
export type { ModelId } from './eos/model.js';
export { InputError, ConvergenceError } from './errors.js';
export type { InputLimits, InputErrorCode } from './errors.js';
export { R_J_molK, P_ATM_Pa, T_60F_K } from './constants.js';
export * from './check/index.js';
export * from './fill/index.js';
