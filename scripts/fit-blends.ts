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
 * Stage 1: k_ij(T) = k + k'·t + k''·t², t = T/298.15 K − 1, per pair (thermo/data/kij.ts), to
 * ln(p_model/p_ref) of every fitted bubble and dew point, all blends together, by
 * Levenberg–Marquardt with a loss that leans on the worst rows (minimax below), and for
 * R-32/R-1234yf a constant asymmetric term m_ab (ASYMMETRIC below); a
 * small ridge term keeps a pair that the data barely sees (R-125/R-134a is 4 % of R-404A's
 * moles) near zero rather than letting it chase rows.
 * Stage 2: per pair ξ, v^E, v^E′ and δ^E of the blend volume rule (thermo/eos/blendVolume.ts)
 * to the bubble-liquid, compressed-liquid (+1 MPa) and dew-vapour densities.
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
const RIDGE_ASYM = 0.003;

/**
 * Pairs that also get the asymmetric term m_ab (thermo/eos/asymmetricMixing.ts): those that
 * form a blend on their own, where the symmetric k_ij cannot match both the bubble and the dew
 * pressure (R-32/R-1234yf: the best split of one k_ij leaves ±0.498 % at 233.15 K). Not used in
 * the ternaries, where that form is not invariant to splitting a component.
 */
const ASYMMETRIC: readonly string[] = ['r32/r1234yf'];
const asymIndex = PAIR_LIST.map(([a, b]) => ASYMMETRIC.indexOf(`${a}/${b}`));

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

/** Stage-1 parameter vector: K_PER_PAIR per pair, then m_ab of each ASYMMETRIC pair. */
const nK = PAIR_LIST.length * K_PER_PAIR + ASYMMETRIC.length;
const asymOf = (q: number[], k: number) =>
  asymIndex[k]! >= 0 ? q[PAIR_LIST.length * K_PER_PAIR + asymIndex[k]!]! : 0;

function withKij(base: ResolvedProduct, q: number[]): ResolvedProduct {
  const m = pairMatrix(base, (k) => asymOf(q, k));
  // m_ab is antisymmetric: the ordered pair (a, b) of PAIR_LIST gets +m.
  const ids = base.components.map((c) => c.id);
  m.forEach((row, i) =>
    row.forEach((_, j) => {
      const k = PAIR_LIST.findIndex(([a, b]) => a === ids[j] && b === ids[i]);
      if (k >= 0) row[j] = -row[j]!;
    }),
  );
  return {
    ...base,
    kij: pairMatrix(base, (k) => q[K_PER_PAIR * k]!),
    kijSlope: pairMatrix(base, (k) => q[K_PER_PAIR * k + 1]!),
    kijCurve: pairMatrix(base, (k) => q[K_PER_PAIR * k + 2]!),
    kijAsym: ASYMMETRIC.length > 0 && m.some((r) => r.some((v) => v !== 0)) ? m : undefined,
  };
}

/** Stage-2 parameters per pair: ξ, v^E, its slope v^E′ and δ^E. */
const V_PER_PAIR = 4;

/** Volume parameters scaled for the fit: ξ in units of 10 K, v^E and δ^E in units of 1e-6 m³/mol. */
function withVolume(base: ResolvedProduct, q: number[]): ResolvedProduct {
  return {
    ...base,
    volumeMixing: {
      xi: pairMatrix(base, (k) => 10 * q[V_PER_PAIR * k]!),
      vE: pairMatrix(base, (k) => 1e-6 * q[V_PER_PAIR * k + 1]!),
      vESlope: pairMatrix(base, (k) => 1e-6 * q[V_PER_PAIR * k + 2]!),
      deltaE: pairMatrix(base, (k) => 1e-6 * q[V_PER_PAIR * k + 3]!),
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
    ...q.map((x, k) =>
      k >= PAIR_LIST.length * K_PER_PAIR
        ? x * RIDGE_ASYM
        : x * [RIDGE_K, RIDGE_SLOPE, RIDGE_CURVE][k % K_PER_PAIR]!,
    ),
  ],
  new Array<number>(nK).fill(0),
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
    `  { a: '${a}', b: '${b}', k: ${num(kFit[K_PER_PAIR * k]!)}, slope: ${num(kFit[K_PER_PAIR * k + 1]!)}, curve: ${num(kFit[K_PER_PAIR * k + 2]!)}, asym: ${num(asymOf(kFit, k))}, xi: ${num(10 * vFit[V_PER_PAIR * k]!)}, vE: ${num(1e-6 * vFit[V_PER_PAIR * k + 1]!)}, vESlope: ${num(1e-6 * vFit[V_PER_PAIR * k + 2]!)}, deltaE: ${num(1e-6 * vFit[V_PER_PAIR * k + 3]!)}, source: 'fitted by scripts/fit-blends.ts: k, slope, curve${asymIndex[k]! >= 0 ? ', asym' : ''} to the bubble and dew pressures, xi, vE, vESlope, deltaE to the densities of ${blends} (${range})' },`,
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
  /** Asymmetric term: k_ab(x) = k_ab(T) + asym·(x_a − x_b) (eos/asymmetricMixing.ts); 0 = none. */
  readonly asym: number;
  /** Excess of the volume correction's pseudo-critical temperature, K (eos/blendVolume.ts). */
  readonly xi: number;
  /** Excess volume of the translation, m³/mol (eos/blendVolume.ts). */
  readonly vE: number;
  /** Slope of the excess volume: v^E(T) = vE + vESlope·(T/T_REF − 1), m³/mol. */
  readonly vESlope: number;
  /** Excess of the distance-function amplitude δ, m³/mol (eos/blendVolume.ts). */
  readonly deltaE: number;
  readonly source: string;
}

export const FITTED_PAIRS: readonly FittedPair[] = [
${entries.join('\n')}
];
`;
writeFileSync(new URL('../thermo/data/kij-fitted.ts', import.meta.url), file);
console.error('wrote thermo/data/kij-fitted.ts');
