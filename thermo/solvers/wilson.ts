/** Wilson's K-value estimate, the start of the mixture solvers and of pure saturation. */
import type { ResolvedProduct } from '../product.js';

/** The critical constants Wilson's estimate needs. */
export interface WilsonConstants {
  readonly Tc: number;
  readonly pc: number;
  readonly omega: number;
}

/**
 * Wilson's K-value of one component (Wilson 1968; Michelsen & Mollerup, Thermodynamic Models:
 * Fundamentals and Computational Aspects, ch. 9): K = (pc/p)·exp(5.373(1 + ω)(1 − Tc/T)).
 * With p = 1 Pa it is the estimate's vapour pressure in Pa.
 */
export function wilsonKOf(m: WilsonConstants, T: number, p: number): number {
  return (m.pc / p) * Math.exp(5.373 * (1 + m.omega) * (1 - m.Tc / T));
}

/** Wilson's K-values of every component of a product at (T, p). */
export function wilsonK(product: ResolvedProduct, T: number, p: number): Float64Array {
  return Float64Array.from(product.components, (m) => wilsonKOf(m, T, p));
}
