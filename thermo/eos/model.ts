/**
 * A model of one component: the cubic family, a_c and b from the critical point, an alpha
 * function and a volume correction. Built from fluid constants and a model id; the solvers see only
 * this record and never ask which fluid it came from.
 */
import { R_J_molK } from '../constants.js';
import { fittedParams, type FittedParams } from '../data/fitted.js';
import type { FluidConstants } from '../data/fluids.js';
import {
  mathiasCopemanAlpha,
  mPengRobinson1976,
  mSoave1972,
  soaveAlpha,
  type AlphaFunction,
} from './alpha.js';
import { PENG_ROBINSON, SOAVE_REDLICH_KWONG, type CubicFamily } from './cubic.js';
import { NO_CORRECTION, type VolumeCorrectionParams } from './volumeCorrection.js';

/**
 * - `tuned` (the default): Peng–Robinson with a Mathias–Copeman alpha and a
 *   temperature-dependent volume translation with distance-function and vapour-side terms,
 *   all fitted per fluid to reference data (see eos/volumeCorrection.ts).
 * - `PR`: Peng & Robinson (1976), untranslated.
 * - `SRK`: Soave (1972), untranslated.
 */
export type ModelId = 'tuned' | 'PR' | 'SRK';

export const MODEL_IDS: readonly ModelId[] = ['tuned', 'PR', 'SRK'];

export interface ComponentModel {
  readonly id: string;
  readonly family: CubicFamily;
  /** The model actually applied to this component (a custom fluid under `tuned` gets `PR`). */
  readonly model: ModelId;
  /** kg/mol */
  readonly molarMass: number;
  readonly Tc: number;
  readonly pc: number;
  readonly omega: number;
  /** a at the critical temperature, Pa·m⁶/mol². */
  readonly ac: number;
  /** Co-volume, m³/mol. */
  readonly b: number;
  readonly alpha: AlphaFunction;
  /** From the cubic's volume to the model's (see eos/volumeCorrection.ts). */
  readonly correction: VolumeCorrectionParams;
  /** Critical molar volume of the cubic, m³/mol. */
  readonly vcCub: number;
  /** Critical density of the model, kg/m³. */
  readonly rhoc: number;
}

export interface ComponentSpec {
  id: string;
  molarMass: number;
  Tc: number;
  pc: number;
  omega: number;
}

/**
 * Builds the component model. `override` supplies tuned parameters directly (used by the
 * fitting script); otherwise the tuned model takes them from data/fitted.ts.
 */
export function componentModel(
  spec: ComponentSpec | FluidConstants,
  model: ModelId,
  override?: Pick<FittedParams, 'mathiasCopeman' | 'volume'>,
): ComponentModel {
  const fitted = model === 'tuned' ? (override ?? fittedParams(spec.id)) : undefined;
  const applied: ModelId = model === 'tuned' && !fitted ? 'PR' : model;
  const family = applied === 'SRK' ? SOAVE_REDLICH_KWONG : PENG_ROBINSON;
  const R = R_J_molK;
  const ac = (family.omegaA * R * R * spec.Tc * spec.Tc) / spec.pc;
  const b = (family.omegaB * R * spec.Tc) / spec.pc;
  let alpha: AlphaFunction;
  let correction: VolumeCorrectionParams = NO_CORRECTION;
  if (applied === 'tuned' && fitted) {
    const [c1, c2, c3] = fitted.mathiasCopeman;
    alpha = mathiasCopemanAlpha(spec.Tc, c1, c2, c3);
    correction = fitted.volume;
  } else if (applied === 'SRK') {
    alpha = soaveAlpha(spec.Tc, mSoave1972(spec.omega));
  } else {
    alpha = soaveAlpha(spec.Tc, mPengRobinson1976(spec.omega));
  }
  const vcCubic = (family.Zc * R * spec.Tc) / spec.pc;
  const rhoc = spec.molarMass / (vcCubic - correction.cc - correction.delta);
  return {
    id: spec.id,
    family,
    model: applied,
    molarMass: spec.molarMass,
    Tc: spec.Tc,
    pc: spec.pc,
    omega: spec.omega,
    ac,
    b,
    alpha,
    correction,
    vcCub: vcCubic,
    rhoc,
  };
}
