/**
 * A blend's bubble or dew point at T that does not depend on a good start, with a memory of
 * the points already found per blend.
 *
 * A live form, a heating sweep or a bisection over temperature asks again and again at
 * temperatures near ones already solved. Each solution found is kept (up to MEMORY per blend
 * and kind, sorted by T) and the nearest one starts the next solve: the closer the start, the
 * fewer iterations. The answer does not depend on the start (same convergence test), only the
 * work does. Where a solve from the nearest start fails (near the blend's critical region a
 * far start lands on the trivial solution), the solve marches up from the nearest point found
 * below T, or from a cold start at a lower temperature, each step started from the last.
 */
import { ConvergenceError } from '../errors.js';
import type { ResolvedProduct } from '../product.js';
import { mixtureAtT } from './mixtureModel.js';
import { saturationPressure, type SaturationPoint } from './bubbleDew.js';
import { blendSeed } from './blendSeeds.js';

type Start = { p: number; K: Float64Array };
interface Known {
  T: number;
  start: Start;
}

/** Solutions kept per blend and kind. */
const MEMORY = 256;
/** A start further away than this, K, is not tried directly. */
const NEAR = 20;

const memory = new WeakMap<ResolvedProduct, Record<'bubble' | 'dew', Known[]>>();

function knownOf(product: ResolvedProduct, kind: 'bubble' | 'dew'): Known[] {
  let m = memory.get(product);
  if (!m) {
    // A blend the app offers starts with bubble points near the top of its curve (blendSeeds.ts).
    const seed = blendSeed(product)?.bubble ?? [];
    const bubble = seed.map(([T, p, ...K]) => ({
      T: T!,
      start: { p: p!, K: Float64Array.from(K) },
    }));
    m = { bubble: bubble.sort((a, b) => a.T - b.T), dew: [] };
    memory.set(product, m);
  }
  return m[kind];
}

/** Index of the first entry with T ≥ t (binary search). */
function lowerBound(list: readonly Known[], t: number): number {
  let lo = 0;
  let hi = list.length;
  while (lo < hi) {
    const mid = (lo + hi) >> 1;
    if (list[mid]!.T < t) lo = mid + 1;
    else hi = mid;
  }
  return lo;
}

function remember(list: Known[], k: Known): void {
  const i = lowerBound(list, k.T);
  if (list[i]?.T === k.T) list[i] = k;
  else list.splice(i, 0, k);
  // Thin evenly when full, so the memory keeps covering the whole range.
  if (list.length > MEMORY) for (let j = list.length - 2; j > 0; j -= 2) list.splice(j, 1);
}

/**
 * A start at T between the two known points either side of it, when both lie within NEAR: ln p
 * and ln K linear in 1/T (nearly straight along a saturation curve), so the start is off by the
 * curvature only, not by the slope — fewer steps to the same convergence test.
 */
function between(list: readonly Known[], T: number): Start | undefined {
  const i = lowerBound(list, T);
  const a = list[i - 1];
  const b = list[i];
  if (!a || !b || b.T === T || T - a.T >= NEAR || b.T - T >= NEAR) return undefined;
  const w = (1 / T - 1 / a.T) / (1 / b.T - 1 / a.T);
  const mix = (x: number, y: number) => Math.exp((1 - w) * Math.log(x) + w * Math.log(y));
  const K = new Float64Array(a.start.K.length);
  for (let j = 0; j < K.length; j++) K[j] = mix(a.start.K[j]!, b.start.K[j]!);
  return { p: mix(a.start.p, b.start.p), K };
}

function nearest(list: readonly Known[], T: number): Known | undefined {
  const i = lowerBound(list, T);
  const a = list[i - 1];
  const b = list[i];
  if (!a) return b;
  if (!b) return a;
  return T - a.T <= b.T - T ? a : b;
}

/**
 * Bubble or dew point at T (see the module note). Throws ConvergenceError when T lies beyond
 * the end of the bubble (dew) curve, i.e. above the blend's critical region.
 */
export function saturationPointAt(
  product: ResolvedProduct,
  T: number,
  kind: 'bubble' | 'dew',
  start?: Start,
): SaturationPoint {
  const list = knownOf(product, kind);
  const startOf = (s: SaturationPoint): Start => ({
    p: s.p,
    K: Float64Array.from(s.incipient, (w, i) =>
      kind === 'bubble' ? w / product.z[i]! : product.z[i]! / w,
    ),
  });
  const keep = (s: SaturationPoint, TT: number) => {
    remember(list, { T: TT, start: startOf(s) });
    return s;
  };
  const attempt = (TT: number, st?: Start) =>
    saturationPressure(mixtureAtT(product, TT), product.z, kind, st);
  const near = nearest(list, T);
  const nearStart = near && Math.abs(near.T - T) < NEAR ? near.start : undefined;
  // Tried in turn: the caller's start, else the one between known points, then the nearest.
  const starts = start ? [start] : [between(list, T), nearStart].filter((s) => s !== undefined);
  for (const st of starts.length ? starts : [undefined]) {
    try {
      return keep(attempt(T, st), T);
    } catch (e) {
      if (!(e instanceof ConvergenceError)) throw e;
    }
  }
  // March up from the nearest point found below T, else from a cold start lower down.
  const below = list[lowerBound(list, T) - 1];
  const base = below && T - below.T < 60 ? below : coldBelow(attempt, T, product, kind);
  return marchUp(attempt, keep, startOf, base, T, kind);
}

function coldBelow(
  attempt: (T: number, st?: Start) => SaturationPoint,
  T: number,
  product: ResolvedProduct,
  kind: 'bubble' | 'dew',
): { T: number; point: SaturationPoint } {
  try {
    return { T, point: attempt(T) };
  } catch (e) {
    if (!(e instanceof ConvergenceError)) throw e;
  }
  const Tfloor = Math.max(product.Tmin + 1, 0.5 * T);
  let T0 = T;
  for (let dT = 5; T0 > Tfloor; dT *= 2) {
    T0 = Math.max(Tfloor, T - dT);
    try {
      return { T: T0, point: attempt(T0) };
    } catch (e) {
      if (!(e instanceof ConvergenceError)) throw e;
    }
  }
  throw new ConvergenceError(
    `${kind} pressure`,
    `no ${kind} point found at or below T = ${T} K`,
    0,
    NaN,
  );
}

function marchUp(
  attempt: (T: number, st?: Start) => SaturationPoint,
  keep: (s: SaturationPoint, T: number) => SaturationPoint,
  startOf: (s: SaturationPoint) => Start,
  base: Known | { T: number; point: SaturationPoint },
  T: number,
  kind: 'bubble' | 'dew',
): SaturationPoint {
  if ('point' in base && base.T === T) return keep(base.point, T);
  let step = Math.min(2, T - base.T);
  let Tk = base.T;
  let st: Start = 'point' in base ? startOf(base.point) : base.start;
  let last: SaturationPoint | undefined;
  while (Tk < T) {
    const Tn = Math.min(T, Tk + step);
    try {
      last = keep(attempt(Tn, st), Tn);
      st = startOf(last);
      Tk = Tn;
      step = Math.min(step * 1.5, 5);
    } catch (e) {
      if (!(e instanceof ConvergenceError)) throw e;
      step /= 2;
      if (step < 0.01) {
        throw new ConvergenceError(
          `${kind} pressure`,
          `the ${kind} curve ends near ${Tk.toFixed(2)} K, below T = ${T} K`,
          0,
          NaN,
        );
      }
    }
  }
  return last!;
}
