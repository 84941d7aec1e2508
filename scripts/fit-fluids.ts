/**
 * Fits the tuned model's per-fluid parameters and writes thermo/data/fitted.ts.
 *
 *   npm run fit
 *
 * 1. Mathias–Copeman c1, c2, c3 (Peng–Robinson family): least squares on ln p_sat against the
 *    reference saturation tables in test/reference/sat/ (computed from each fluid's published
 *    reference equation of state, see test/reference/README.md).
 * 2. Volume translation c(T) = c_c + Σ d_k τ^e_k: c_c from the reference critical density;
 *    d_k by weighted linear least squares on c_needed = v_L,cubic − M/ρ_L,ref over the same
 *    tables plus the liquid-full points of test/reference/liquid-full.csv (where the tank
 *    holds only saturated liquid, so ρ_L(T) equals the overall density).
 * Chlorine has no reference table: its psat is fitted to the normal boiling point, the
 * acentric-factor point (Tr = 0.7) and the critical point, and its liquid density to the
 * Rackett equation with Z_RA from Hankinson & Thomson (1979); the checks then compare it with
 * values it was not fitted to (see test/thermo/chlorine.test.ts).
 */
import { writeFileSync } from 'node:fs';
import { R_J_molK } from '../thermo/constants.js';
import { FLUIDS, type FluidConstants } from '../thermo/data/fluids.js';
import { componentModel } from '../thermo/eos/model.js';
import { SHIFT_EXPONENTS, type ShiftParams } from '../thermo/eos/translation.js';
import { mPengRobinson1976 } from '../thermo/eos/alpha.js';
import { PENG_ROBINSON } from '../thermo/eos/cubic.js';
import { pureSaturation } from '../thermo/solvers/pure.js';
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
  for (const r of readCsv(`${REF}liquid-full.csv`)) {
    if (r.fluid === f.id && r.transition === 'liquid-full') points.push({ T: +r.T_transition_K!, rhoL: +r.rho_overall_kg_m3! });
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
      const m = componentModel(f, 'tuned', { mathiasCopeman: [c[0]!, c[1]!, c[2]!], shift: { cc: 0, d: [] } });
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

function fitShift(f: FluidConstants, mc: [number, number, number], pts: Point[]): ShiftParams {
  const vcCubic = (PENG_ROBINSON.Zc * R * f.Tc) / f.pc;
  const cc = vcCubic - f.molarMass / f.rhoc;
  const m = componentModel(f, 'tuned', { mathiasCopeman: mc, shift: { cc: 0, d: [] } });
  const X: number[][] = [];
  const y: number[] = [];
  const w: number[] = [];
  for (const x of pts) {
    if (x.rhoL === undefined || x.T >= f.Tc) continue;
    const sat = pureSaturation(m, x.T);
    const vRef = f.molarMass / x.rhoL;
    const tau = 1 - x.T / f.Tc;
    X.push(SHIFT_EXPONENTS.map((e) => Math.pow(tau, e)));
    y.push(sat.vL - vRef - cc);
    // Relative error in density is what the targets measure: weight by 1/v².
    w.push(1 / (vRef * vRef));
  }
  const d = leastSquares(X, y, w, 1e-10);
  return { cc, d };
}

const out: string[] = [];
for (const f of FLUIDS) {
  const { points, note } = referencePoints(f);
  const mc = fitAlpha(f, points);
  const shift = fitShift(f, mc, points);
  out.push(
    `  '${f.id}': {\n    mathiasCopeman: [${mc.map((x) => x.toPrecision(10)).join(', ')}],\n    shift: { cc: ${shift.cc.toPrecision(10)}, d: [${shift.d.map((x) => x.toPrecision(10)).join(', ')}] },\n    fittedTo: '${note}',\n  },`,
  );
  console.error(`fitted ${f.id}`);
}

const file = `/**
 * Parameters of the tuned model, fitted per fluid. GENERATED by scripts/fit-fluids.ts
 * (\`npm run fit\`) — do not edit by hand; change the script or its data and run it again.
 * Each entry says what it was fitted to.
 */
import type { ShiftParams } from '../eos/translation.js';

export interface FittedParams {
  /** Mathias–Copeman c1, c2, c3 for the Peng–Robinson family. */
  readonly mathiasCopeman: readonly [number, number, number];
  /** Volume translation c(T); see eos/translation.ts. m³/mol. */
  readonly shift: ShiftParams;
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
