/**
 * Fits the binary interaction parameters of the HFC/HFO pairs in the refrigerant blends and
 * writes thermo/data/kij-fitted.ts.
 *
 *   npm run fit   (after scripts/fit-fluids.ts: the pure-fluid parameters come first)
 *
 * Data: the bubble- and dew-pressure tables of test/reference/blends/ (multi-fluid mixture
 * models: Lemmon & Jacobsen 2004, J. Phys. Chem. Ref. Data 33, 593–620, for R-410A, R-404A,
 * R-407C, R-507A; Bell 2023, J. Phys. Chem. Ref. Data 52, 013101, for R-454B), every 5 K over
 * 233.15–333.15 K. Every third row (238.15, 253.15, … K) is held out of the fit and only
 * measured afterwards (test/thermo/refrigerant-blends.test.ts checks both sets).
 *
 * Model: k_ij(T) = k + k'·(T/298.15 K − 1), one straight line per pair (thermo/data/kij.ts).
 * Residuals: ln(p_model/p_ref) of every fitted bubble and dew point, all blends together,
 * by Levenberg–Marquardt; a small ridge term (0.01 per unit of k, 0.003 per unit of k') keeps
 * a pair that the data barely sees (R-125/R-134a is 4 % of R-404A's moles) near zero rather
 * than letting it chase rows.
 */
import { writeFileSync } from 'node:fs';
import { REFRIGERANT_BLENDS } from '../thermo/data/blends.js';
import { resolveProduct, type ResolvedProduct } from '../thermo/product.js';
import { mixtureAtT, phaseAt, saturationPointAt } from '../thermo/solvers/mixture.js';
import { levenbergMarquardt } from './lib/linalg.js';
import { readTable } from '../test/reference/measure.js';
import { isHeldOut, T_FIT_MAX, T_FIT_MIN } from '../test/reference/blend-rows.js';

/** The pairs, each with the blends that carry it. */
const PAIR_LIST: readonly [string, string, string][] = [
  ['r32', 'r125', 'R-410A, R-407C'],
  ['r125', 'r143a', 'R-507A, R-404A'],
  ['r125', 'r134a', 'R-404A, R-407C'],
  ['r134a', 'r143a', 'R-404A'],
  ['r32', 'r134a', 'R-407C'],
  ['r32', 'r1234yf', 'R-454B'],
];
const RIDGE_K = 0.01;
const RIDGE_SLOPE = 0.003;
const RIDGE_VOLUME = 0.001;
const RIDGE_CURVE = 0.003;

interface Row {
  T: number;
  pb: number;
  pd: number;
  rhoL: number;
  rhoV: number;
  /** Compressed liquid at p_bubble + 1 MPa (its own table). */
  pc?: number;
  rhoC?: number;
}
const data = REFRIGERANT_BLENDS.map((b) => ({
  blend: b,
  base: resolveProduct(b.id, { model: 'tuned' }),
  rows: readTable(`blends/${b.id}.csv`)
    .map((r): Row => {
      const liq = readTable(`blends/${b.id}-liquid.csv`).find((l) => +l.T_K! === +r.T_K!);
      return {
        T: +r.T_K!,
        pb: +r.p_bubble_Pa!,
        pd: +r.p_dew_Pa!,
        rhoL: +r.rhoL_bubble_kg_m3!,
        rhoV: +r.rhoV_dew_kg_m3!,
        pc: liq ? +liq.p_Pa! : undefined,
        rhoC: liq ? +liq.rho_kg_m3! : undefined,
      };
    })
    .filter((r) => r.T >= T_FIT_MIN - 1e-9 && r.T <= T_FIT_MAX + 1e-9),
}));

type Matrix = number[][];

/** Symmetric matrices over the blend's components, from one value per pair. */
function pairMatrix(base: ResolvedProduct, values: (k: number) => number): Matrix {
  const ids = base.components.map((c) => c.id);
  const m = ids.map(() => ids.map(() => 0));
  PAIR_LIST.forEach(([a, b], k) => {
    const i = ids.indexOf(a);
    const j = ids.indexOf(b);
    if (i >= 0 && j >= 0) m[i]![j] = m[j]![i] = values(k);
  });
  return m;
}

/** Stage-1 parameters per pair: k, k', k'' (k_ij(T) = k + k'·t + k''·t², t = T/T_REF − 1). */
const K_PER_PAIR = 3;

function withKij(base: ResolvedProduct, q: number[]): ResolvedProduct {
  return {
    ...base,
    kij: pairMatrix(base, (k) => q[K_PER_PAIR * k]!),
    kijSlope: pairMatrix(base, (k) => q[K_PER_PAIR * k + 1]!),
    kijCurve: pairMatrix(base, (k) => q[K_PER_PAIR * k + 2]!),
  };
}

/** Stage-2 parameters per pair: ξ, v^E and its slope v^E′. */
const V_PER_PAIR = 3;

/** Volume parameters scaled for the fit: ξ in units of 10 K, v^E in units of 1e-6 m³/mol. */
function withVolume(base: ResolvedProduct, q: number[]): ResolvedProduct {
  return {
    ...base,
    volumeMixing: {
      xi: pairMatrix(base, (k) => 10 * q[V_PER_PAIR * k]!),
      vE: pairMatrix(base, (k) => 1e-6 * q[V_PER_PAIR * k + 1]!),
      vESlope: pairMatrix(base, (k) => 1e-6 * q[V_PER_PAIR * k + 2]!),
    },
  };
}

interface Deviation {
  T: number;
  bubble: number;
  dew: number;
  rhoL: number;
  rhoV: number;
  rhoC: number | undefined;
}

function deviations(make: (base: ResolvedProduct) => ResolvedProduct, sel: (r: Row) => boolean) {
  return data.map(({ blend, base, rows }) => {
    const product = make(base);
    const out: Deviation[] = rows.filter(sel).map((r) => {
      const b = saturationPointAt(product, r.T, 'bubble');
      const d = saturationPointAt(product, r.T, 'dew');
      const vC =
        r.pc === undefined ? NaN : phaseAt(mixtureAtT(product, r.T), r.pc, product.z, 'liquid').v;
      return {
        T: r.T,
        bubble: Math.log(b.p / r.pb),
        dew: Math.log(d.p / r.pd),
        rhoL: Math.log(product.molarMass / b.vBulk / r.rhoL),
        rhoV: Math.log(product.molarMass / d.vBulk / r.rhoV),
        rhoC: r.rhoC === undefined ? undefined : Math.log(product.molarMass / vC / r.rhoC),
      };
    });
    return { id: blend.id, out };
  });
}

const fitted = (r: Row) => !isHeldOut(r.T);

/**
 * r·(1 + (r/0.003)²): least squares on this leans toward the worst rows (its square grows
 * like r⁶ beyond 0.3 %), since the targets are worst-case bounds.
 */
const minimax = (r: number) => r * (1 + (r / 0.003) ** 2);
const nPar = PAIR_LIST.length * V_PER_PAIR;

// Stage 1: k_ij(T) on bubble and dew pressures.
const kFit = levenbergMarquardt(
  (q) => [
    ...deviations((b) => withKij(b, q), fitted).flatMap((d) =>
      d.out.flatMap((o) => [o.bubble, o.dew].map(minimax)),
    ),
    ...q.map((x, k) => x * [RIDGE_K, RIDGE_SLOPE, RIDGE_CURVE][k % K_PER_PAIR]!),
  ],
  new Array<number>(PAIR_LIST.length * K_PER_PAIR).fill(0),
  100,
).params;

// Stage 2: ξ_ij and v^E_ij on bubble-liquid, compressed-liquid and dew-vapour densities
// (vapour weighted by 1/4: its target is 2 % against 0.5 % for the liquid).
const volume = (b: ResolvedProduct, q: number[]) => withVolume(withKij(b, kFit), q);
const vFit = levenbergMarquardt(
  (q) => [
    ...deviations((b) => volume(b, q), fitted).flatMap((d) =>
      d.out.flatMap((o) => [o.rhoL, o.rhoC ?? 0, 0.25 * o.rhoV].map(minimax)),
    ),
    ...q.map((x) => x * RIDGE_VOLUME),
  ],
  new Array<number>(nPar).fill(0),
  100,
).params;

const report = (sel: (r: Row) => boolean) =>
  deviations((b) => volume(b, vFit), sel).map(({ id, out }) => {
    const m = (f: (o: Deviation) => number | undefined) =>
      `${(Math.max(...out.map((o) => Math.abs(Math.expm1(f(o) ?? 0)))) * 100).toFixed(3)} %`;
    return `${id}: p_bubble ${m((o) => o.bubble)}, p_dew ${m((o) => o.dew)}, rhoL ${m((o) => o.rhoL)}, rhoV ${m((o) => o.rhoV)}, +1 MPa ${m((o) => o.rhoC)}`;
  });
console.error('fitted rows:\n ', report(fitted).join('\n  '));
console.error('held-out rows:\n ', report((r) => isHeldOut(r.T)).join('\n  '));

const num = (x: number) => x.toPrecision(6);
const range = `test/reference/blends/, ${T_FIT_MIN}–${T_FIT_MAX} K, held-out rows excluded; Lemmon & Jacobsen 2004 / Bell 2023 mixture models`;
const entries = PAIR_LIST.map(
  ([a, b, blends], k) =>
    `  { a: '${a}', b: '${b}', k: ${num(kFit[K_PER_PAIR * k]!)}, slope: ${num(kFit[K_PER_PAIR * k + 1]!)}, curve: ${num(kFit[K_PER_PAIR * k + 2]!)}, xi: ${num(10 * vFit[V_PER_PAIR * k]!)}, vE: ${num(1e-6 * vFit[V_PER_PAIR * k + 1]!)}, vESlope: ${num(1e-6 * vFit[V_PER_PAIR * k + 2]!)}, source: 'fitted by scripts/fit-blends.ts: k, slope, curve to the bubble and dew pressures, xi, vE, vESlope to the densities of ${blends} (${range})' },`,
);
const file = `/**
 * Binary parameters of the HFC/HFO pairs in the refrigerant blends. GENERATED by
 * scripts/fit-blends.ts (\`npm run fit\`) — do not edit by hand; change the script or its data
 * and run it again. Each entry says what it was fitted to.
 */
export interface FittedPair {
  readonly a: string;
  readonly b: string;
  /** k_ij at T_REF = 298.15 K. */
  readonly k: number;
  /** Slope: k_ij(T) = k + slope·(T/T_REF − 1). */
  readonly slope: number;
  /** Curvature: k_ij(T) = k + slope·t + curve·t², t = T/T_REF − 1. */
  readonly curve: number;
  /** Excess of the volume correction's pseudo-critical temperature, K (solvers/mixture.ts). */
  readonly xi: number;
  /** Excess volume of the translation, m³/mol (solvers/mixture.ts). */
  readonly vE: number;
  /** Slope of the excess volume: v^E(T) = vE + vESlope·(T/T_REF − 1), m³/mol. */
  readonly vESlope: number;
  readonly source: string;
}

export const FITTED_PAIRS: readonly FittedPair[] = [
${entries.join('\n')}
];
`;
writeFileSync(new URL('../thermo/data/kij-fitted.ts', import.meta.url), file);
console.error('wrote thermo/data/kij-fitted.ts');
