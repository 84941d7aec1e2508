/**
 * The generic two-parameter cubic equation of state
 *
 *   p = R·T/(v − b) − a(T) / ((v + δ1·b)(v + δ2·b))
 *
 * Peng–Robinson (1976) is δ1 = 1 + √2, δ2 = 1 − √2; Soave–Redlich–Kwong (1972) is δ1 = 1, δ2 = 0.
 * In compressibility form, with A = a·p/(R·T)² and B = b·p/(R·T):
 *
 *   Z³ + ((u − 1)·B − 1)·Z² + (A + w·B² − u·B·(B + 1))·Z − (A·B + w·B²·(B + 1)) = 0,
 *   u = δ1 + δ2, w = δ1·δ2.
 *
 * Ωa and Ωb are not the rounded textbook figures: they are solved here from the critical
 * conditions (the cubic in Z has a triple root at the critical point), to machine precision.
 */
import { bracketedRoot } from '../solvers/root.js';

export interface CubicFamily {
  readonly name: 'PR' | 'SRK';
  readonly delta1: number;
  readonly delta2: number;
  /** Ωa: a_c = Ωa·R²·Tc²/pc. */
  readonly omegaA: number;
  /** Ωb: b = Ωb·R·Tc/pc. */
  readonly omegaB: number;
  /** Critical compressibility factor of the family, Zc = pc·vc/(R·Tc). */
  readonly Zc: number;
}

/**
 * Critical constants of a cubic family from the triple-root condition:
 *   −3Zc = (u − 1)·B − 1,  3Zc² = A + w·B² − u·B·(B + 1),  Zc³ = A·B + w·B²·(B + 1).
 * Eliminating Zc and A leaves one equation in B = Ωb, solved by `bracketedRoot` on (0, 1/3).
 */
export function criticalConstants(
  delta1: number,
  delta2: number,
): { omegaA: number; omegaB: number; Zc: number } {
  const u = delta1 + delta2;
  const w = delta1 * delta2;
  const parts = (B: number) => {
    const Zc = (1 - (u - 1) * B) / 3;
    const A = 3 * Zc * Zc - w * B * B + u * B * (B + 1);
    return { Zc, A, residual: A * B + w * B * B * (B + 1) - Zc * Zc * Zc };
  };
  const B = bracketedRoot((x) => parts(x).residual, 1e-6, 1 / 3, {
    name: 'cubic critical constants',
    xTol: 1e-16,
  }).x;
  const { Zc, A } = parts(B);
  return { omegaA: A, omegaB: B, Zc };
}

function family(name: 'PR' | 'SRK', delta1: number, delta2: number): CubicFamily {
  return Object.freeze({ name, delta1, delta2, ...criticalConstants(delta1, delta2) });
}

/** Peng & Robinson (1976), Ind. Eng. Chem. Fundam. 15, 59–64. */
export const PENG_ROBINSON: CubicFamily = family('PR', 1 + Math.SQRT2, 1 - Math.SQRT2);
/** Soave (1972), Chem. Eng. Sci. 27, 1197–1203 (Redlich–Kwong form). */
export const SOAVE_REDLICH_KWONG: CubicFamily = family('SRK', 1, 0);

/**
 * Real roots Z > B of the cubic in compressibility form, ascending. One or three roots.
 * Closed form (trigonometric or Cardano), each root polished by two Newton steps.
 */
export function compressibilityRoots(fam: CubicFamily, A: number, B: number): number[] {
  const u = fam.delta1 + fam.delta2;
  const w = fam.delta1 * fam.delta2;
  const c2 = (u - 1) * B - 1;
  const c1 = A + w * B * B - u * B * (B + 1);
  const c0 = -(A * B + w * B * B * (B + 1));
  return cubicRealRoots(c2, c1, c0).filter((z) => z > B);
}

/**
 * Real roots of x³ + c2·x² + c1·x + c0, ascending.
 * The root of largest magnitude comes from the closed form (trigonometric or Cardano), which
 * gives it to full relative precision; the other two come from the deflated quadratic solved
 * in its cancellation-free form. This keeps a liquid root of order 1e-9 (a liquid far below
 * its boiling point) accurate where the plain closed form would lose every digit. Each root
 * is then polished by Newton steps on the original cubic.
 */
export function cubicRealRoots(c2: number, c1: number, c0: number): number[] {
  const shift = c2 / 3;
  const p = c1 - c2 * shift;
  const q = 2 * shift * shift * shift - c1 * shift + c0;
  const disc = (q * q) / 4 + (p * p * p) / 27;
  let big: number;
  if (disc > 0) {
    const s = Math.sqrt(disc);
    const u = -q / 2 + (q > 0 ? -s : s); // same sign as −q/2, no cancellation
    const cu = Math.cbrt(u);
    big = cu === 0 ? -shift : cu - p / (3 * cu) - shift;
  } else if (p === 0) {
    big = -shift;
  } else {
    const m = 2 * Math.sqrt(-p / 3);
    const arg = Math.min(1, Math.max(-1, (3 * q) / (p * m)));
    const theta = Math.acos(arg) / 3;
    const cands = [0, 1, 2].map((k) => m * Math.cos(theta - (2 * Math.PI * k) / 3) - shift);
    big = cands.reduce((a, b) => (Math.abs(b) > Math.abs(a) ? b : a));
  }
  big = polish(big, c2, c1, c0);
  // Deflate: x³ + c2x² + c1x + c0 = (x − big)(x² + e1·x + e0).
  const e1 = c2 + big;
  const e0 = big !== 0 ? -c0 / big : c1 + big * e1;
  const dq = e1 * e1 - 4 * e0;
  const roots = [big];
  if (dq >= 0) {
    const qq = -0.5 * (e1 + (e1 >= 0 ? 1 : -1) * Math.sqrt(dq));
    if (qq !== 0) roots.push(polish(qq, c2, c1, c0), polish(e0 / qq, c2, c1, c0));
    else roots.push(0);
  }
  return roots.sort((x, y) => x - y);
}

function polish(x: number, c2: number, c1: number, c0: number): number {
  for (let i = 0; i < 3; i++) {
    const f = ((x + c2) * x + c1) * x + c0;
    const df = (3 * x + 2 * c2) * x + c1;
    if (df === 0 || f === 0) break;
    const step = f / df;
    if (!Number.isFinite(step) || Math.abs(step) > 0.5 * Math.abs(x) + 1e-300) break;
    x -= step;
  }
  return x;
}

/**
 * The shared logarithmic term of the cubic's residual functions:
 *   L = ln((Z + δ1·B)/(Z + δ2·B)) / (δ1 − δ2).
 */
export function logTerm(fam: CubicFamily, Z: number, B: number): number {
  return Math.log((Z + fam.delta1 * B) / (Z + fam.delta2 * B)) / (fam.delta1 - fam.delta2);
}

/** ln φ of a pure fluid: ln φ = Z − 1 − ln(Z − B) − (A/B)·L. */
export function lnPhiPure(fam: CubicFamily, Z: number, A: number, B: number): number {
  return Z - 1 - Math.log(Z - B) - (A / B) * logTerm(fam, Z, B);
}

/**
 * Pressure from the cubic at temperature T (K) and molar volume v (m³/mol), in Pa.
 * a in Pa·m⁶/mol², b in m³/mol.
 */
export function pressure(
  fam: CubicFamily,
  R: number,
  T: number,
  v: number,
  a: number,
  b: number,
): number {
  return (R * T) / (v - b) - a / ((v + fam.delta1 * b) * (v + fam.delta2 * b));
}

/** ∂p/∂v at constant T, Pa·mol/m³. */
export function dPdv(
  fam: CubicFamily,
  R: number,
  T: number,
  v: number,
  a: number,
  b: number,
): number {
  const d1 = v + fam.delta1 * b;
  const d2 = v + fam.delta2 * b;
  return (-R * T) / ((v - b) * (v - b)) + (a * (d1 + d2)) / (d1 * d1 * d2 * d2);
}
