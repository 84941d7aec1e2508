/**
 * Fits the tuned model's per-fluid parameters and writes thermo/data/fitted.ts.
 *
 *   npm run fit
 *
 * 1. Mathias–Copeman c1, c2, c3 (Peng–Robinson family): least squares on ln p_sat against the
 *    reference saturation tables in test/reference/sat/ (computed from each fluid's published
 *    reference equation of state, see test/reference/README.md).
 * 2. The volume correction of eos/volumeCorrection.ts, linear in its parameters, by weighted
 *    least squares on relative volume error over: saturated liquid and vapour (the same
 *    tables), compressed liquid (test/reference/liquid/), and the closed-tank points of
 *    test/reference/liquid-full.csv (at a liquid-full transition the tank holds only saturated
 *    liquid, so ρ_L(T) equals the overall density; 2 K and 5 K above it the liquid is compressed
 *    at that density to the tabulated pressure). The critical density is held exact.
 * Chlorine has no reference table: its psat is fitted to the normal boiling point, the
 * acentric-factor point (Tr = 0.7) and the critical point, and its liquid density to the
 * Rackett equation with Z_RA from Hankinson & Thomson (1979); the checks then compare it with
 * values it was not fitted to (see test/thermo/chlorine.test.ts).
 */
import { writeFileSync } from 'node:fs';
import { R_J_molK } from '../thermo/constants.js';
import { FLUIDS, type FluidConstants } from '../thermo/data/fluids.js';
import { componentModel } from '../thermo/eos/model.js';
import {
  DISTANCE_KAPPA,
  NO_CORRECTION,
  SHIFT_EXPONENTS,
  vapourBump,
  type VolumeCorrectionParams,
} from '../thermo/eos/volumeCorrection.js';
import { mPengRobinson1976 } from '../thermo/eos/alpha.js';
import { dPdv, PENG_ROBINSON } from '../thermo/eos/cubic.js';
import { pureCoefficients, pureSaturation, pureZ } from '../thermo/solvers/pure.js';
import { readCsv } from './lib/csv.js';
import { leastSquares, levenbergMarquardt } from './lib/linalg.js';

const REF = new URL('../test/reference/', import.meta.url).pathname;
const R = R_J_molK;

interface Point {
  T: number;
  p?: number;
  rhoL?: number;
}

function referencePoints(f: FluidConstants): { points: Point[]; note: string } {
  if (f.id === 'chlorine') {
    const pts: Point[] = [];
    pts.push({ T: f.Tb!, p: 101_325 });
    pts.push({ T: 0.7 * f.Tc, p: f.pc * Math.pow(10, -1 - f.omega) });
    for (const Tr of [0.45, 0.5, 0.55, 0.6, 0.65, 0.7, 0.75, 0.8, 0.85, 0.9, 0.95]) {
      const T = Tr * f.Tc;
      const v = ((R * f.Tc) / f.pc) * Math.pow(f.zRA!, 1 + Math.pow(1 - Tr, 2 / 7));
      pts.push({ T, rhoL: f.molarMass / v });
    }
    return {
      points: pts,
      note: 'p_sat: normal boiling point, acentric-factor point and critical point (Thol et al. 2021 EOS constants); rho_L: Rackett equation with Z_RA (Hankinson & Thomson 1979)',
    };
  }
  const rows = readCsv(`${REF}sat/${f.id}.csv`);
  const points: Point[] = rows.map((r) => ({ T: +r.T_K!, p: +r.p_Pa!, rhoL: +r.rhoL_kg_m3! }));
  // Below the table (ethane, nitrous oxide) the normal boiling point of the same reference
  // equation anchors the vapour-pressure curve, so the alpha function does not wander there.
  if (f.Tb !== null && f.Tb < +rows[0]!.T_K! - 1) points.push({ T: f.Tb, p: 101_325 });
  for (const r of readCsv(`${REF}liquid-full.csv`)) {
    if (r.fluid === f.id && r.transition === 'liquid-full')
      points.push({ T: +r.T_transition_K!, rhoL: +r.rho_overall_kg_m3! });
  }
  return {
    points,
    note: `reference saturation table test/reference/sat/${f.id}.csv (${rows.length} points, ${rows[0]!.T_K}–${rows.at(-1)!.T_K} K) and liquid-full points of test/reference/liquid-full.csv`,
  };
}

function fitAlpha(f: FluidConstants, pts: Point[]): [number, number, number] {
  const pp = pts.filter((x) => x.p !== undefined);
  const residuals = (c: number[]) =>
    pp.map((x) => {
      const m = componentModel(f, 'tuned', {
        mathiasCopeman: [c[0]!, c[1]!, c[2]!],
        volume: NO_CORRECTION,
      });
      return Math.log(pureSaturation(m, x.T, x.p).p / x.p!);
    });
  const start = [mPengRobinson1976(f.omega), 0, 0];
  // Few points (chlorine): fit c1 and c2 only, c3 = 0.
  if (pp.length < 6) {
    const r2 = (c: number[]) => residuals([c[0]!, c[1]!, 0]);
    const { params } = levenbergMarquardt(r2, start.slice(0, 2));
    return [params[0]!, params[1]!, 0];
  }
  const { params } = levenbergMarquardt(residuals, start);
  return [params[0]!, params[1]!, params[2]!];
}

interface VolumePoint {
  T: number;
  /** The cubic's molar volume at the state, m³/mol. */
  vCub: number;
  /** Reference molar volume, m³/mol. */
  vRef: number;
  /** Relative weight (the targets: 0.5 % liquid, 2 % vapour). */
  weight: number;
}

/** The states the volume correction is fitted to, each as (T, cubic volume, reference volume). */
function volumePoints(
  f: FluidConstants,
  mc: [number, number, number],
  pts: Point[],
): VolumePoint[] {
  const m = componentModel(f, 'tuned', { mathiasCopeman: mc, volume: NO_CORRECTION });
  const out: VolumePoint[] = [];
  const liquidAt = (T: number, p: number) =>
    (pureZ(m, pureCoefficients(m, T), T, p, 'liquid').Z * R * T) / p;
  for (const x of pts) {
    if (x.rhoL === undefined || x.T >= f.Tc) continue;
    out.push({ T: x.T, vCub: pureSaturation(m, x.T).vLCub, vRef: f.molarMass / x.rhoL, weight: 1 });
  }
  if (f.id === 'chlorine') return out;
  for (const r of readCsv(`${REF}sat/${f.id}.csv`)) {
    const T = +r.T_K!;
    out.push({
      T,
      vCub: pureSaturation(m, T).vVCub,
      vRef: f.molarMass / +r.rhoV_kg_m3!,
      weight: 0.1,
    });
  }
  for (const r of readCsv(`${REF}liquid/${f.id}.csv`)) {
    const T = +r.T_K!;
    out.push({ T, vCub: liquidAt(T, +r.p_Pa!), vRef: f.molarMass / +r.rho_kg_m3!, weight: 1 });
  }
  for (const r of readCsv(`${REF}liquid-full.csv`)) {
    if (r.fluid !== f.id) continue;
    const rho = +r.rho_overall_kg_m3!;
    const T0 = +r.T_transition_K!;
    if (r.transition === 'vapour-full' && T0 < f.Tc - 0.5) {
      out.push({ T: T0, vCub: pureSaturation(m, T0).vVCub, vRef: f.molarMass / rho, weight: 0.1 });
    }
    if (r.transition !== 'liquid-full') continue;
    for (const [dT, key] of [
      [2, 'p_T_plus_2K_Pa'],
      [5, 'p_T_plus_5K_Pa'],
    ] as const) {
      const T = T0 + dT;
      if (T >= f.Tc) continue;
      out.push({ T, vCub: liquidAt(T, +r[key]!), vRef: f.molarMass / rho, weight: 0.5 });
    }
  }
  return out;
}

/** Basis of the linear fit: y = v_cub − v_ref − K = Σ d_k τ^e_k + δ(g − 1) + v_cub·s(r)·(e0 + e1 τ + e2 τ²). */
function volumeBasis(
  f: FluidConstants,
  vcCub: number,
  x: VolumePoint,
  withDistance: boolean,
): number[] {
  const tau = Math.max(0, 1 - x.T / f.Tc);
  const row = SHIFT_EXPONENTS.map((e) => Math.pow(tau, e));
  if (!withDistance) return row;
  const s = vapourBump(vcCub / x.vCub);
  return [...row, distanceFunction(f, x) - 1, x.vCub * s, x.vCub * s * tau, x.vCub * s * tau * tau];
}

const mcCache = new Map<string, [number, number, number]>();
function distanceFunction(f: FluidConstants, x: VolumePoint): number {
  const mc = mcCache.get(f.id)!;
  const m = componentModel(f, 'tuned', { mathiasCopeman: mc, volume: NO_CORRECTION });
  const k = pureCoefficients(m, x.T);
  const d = -((x.vCub * x.vCub) / (R * x.T)) * dPdv(m.family, R, x.T, x.vCub, k.a, k.b);
  return DISTANCE_KAPPA / (DISTANCE_KAPPA + Math.max(d, 0));
}

/** Generalised δ/v_c,cub and ε for a fluid with no vapour or compressed-liquid data (chlorine). */
const generalised = { deltaOverVc: [] as number[], eps: [] as number[][] };

function fitVolume(
  f: FluidConstants,
  mc: [number, number, number],
  pts: Point[],
): VolumeCorrectionParams {
  mcCache.set(f.id, mc);
  const vcCub = (PENG_ROBINSON.Zc * R * f.Tc) / f.pc;
  const K = vcCub - f.molarMass / f.rhoc;
  const data = volumePoints(f, mc, pts);
  // States past 0.97·Tc count less: the cubic cannot follow the critical region closely, and
  // letting it try there costs accuracy where tanks actually operate.
  const w = data.map((x) => (x.weight * (x.T > 0.97 * f.Tc ? 0.2 : 1)) / (x.vRef * x.vRef));
  if (f.id === 'chlorine') {
    // No data for the distance and vapour terms: take the mean of the fitted fluids, scaled by v_c.
    const mean = (a: number[]) => a.reduce((s, x) => s + x, 0) / a.length;
    const delta = mean(generalised.deltaOverVc) * vcCub;
    const eps = [0, 1, 2].map((k) => mean(generalised.eps.map((e) => e[k]!)));
    const y = data.map((x) => {
      const tau = Math.max(0, 1 - x.T / f.Tc);
      const s = vapourBump(vcCub / x.vCub);
      return (
        x.vCub -
        x.vRef -
        K -
        delta * (distanceFunction(f, x) - 1) -
        x.vCub * s * (eps[0]! + eps[1]! * tau + eps[2]! * tau * tau)
      );
    });
    const d = leastSquares(
      data.map((x) => volumeBasis(f, vcCub, x, false)),
      y,
      w,
      1e-10,
    );
    return { cc: K - delta, d, delta, eps };
  }
  const X = data.map((x) => volumeBasis(f, vcCub, x, true));
  const y = data.map((x) => x.vCub - x.vRef - K);
  const beta = leastSquares(X, y, w, 1e-10);
  const nd = SHIFT_EXPONENTS.length;
  const delta = beta[nd]!;
  const eps = beta.slice(nd + 1);
  generalised.deltaOverVc.push(delta / vcCub);
  generalised.eps.push(eps);
  return { cc: K - delta, d: beta.slice(0, nd), delta, eps };
}

const out: string[] = [];
// Chlorine last: its distance and vapour terms are the mean of the others.
const ordered = [
  ...FLUIDS.filter((f) => f.id !== 'chlorine'),
  ...FLUIDS.filter((f) => f.id === 'chlorine'),
];
for (const f of ordered) {
  const { points, note } = referencePoints(f);
  const mc = fitAlpha(f, points);
  const vol = fitVolume(f, mc, points);
  const num = (x: number) => x.toPrecision(10);
  out.push(
    `  '${f.id}': {\n    mathiasCopeman: [${mc.map(num).join(', ')}],\n    volume: { cc: ${num(vol.cc)}, d: [${vol.d.map(num).join(', ')}], delta: ${num(vol.delta)}, eps: [${vol.eps.map(num).join(', ')}] },\n    fittedTo: '${note}',\n  },`,
  );
  console.error(`fitted ${f.id}`);
}

const file = `/**
 * Parameters of the tuned model, fitted per fluid. GENERATED by scripts/fit-fluids.ts
 * (\`npm run fit\`) — do not edit by hand; change the script or its data and run it again.
 * Each entry says what it was fitted to.
 */
import type { VolumeCorrectionParams } from '../eos/volumeCorrection.js';

export interface FittedParams {
  /** Mathias–Copeman c1, c2, c3 for the Peng–Robinson family. */
  readonly mathiasCopeman: readonly [number, number, number];
  /** Volume correction; see eos/volumeCorrection.ts. Volumes in m³/mol. */
  readonly volume: VolumeCorrectionParams;
  /** What the parameters were fitted to. */
  readonly fittedTo: string;
}

export const FITTED: Readonly<Record<string, FittedParams>> = {
${out.join('\n')}
};

export function fittedParams(id: string): FittedParams | undefined {
  return FITTED[id];
}
`;
writeFileSync(new URL('../thermo/data/fitted.ts', import.meta.url), file);
