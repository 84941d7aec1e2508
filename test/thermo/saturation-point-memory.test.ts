/**
 * How solvers/saturationPoint.ts starts each bubble or dew solve: from a remembered point, from
 * ln p and ln K interpolated linearly in 1/T between two remembered points (the form of the
 * Clausius–Clapeyron equation, ln p ≈ A − B/T, which a blend's saturation curve follows closely),
 * from a cold start lower down, or by marching up from below. The answers are start-independent
 * (saturation-point.test.ts); here the starts themselves are checked, by wrapping the
 * bubble/dew solver to record each call, and, where the strategy is for failures, to fail
 * deliberately where a real blend would (a cold start near the critical region, the end of the
 * curve). Every answer is checked for equal fugacity with the fugacity function (phaseAt).
 */
import { beforeEach, describe, expect, it, vi } from 'vitest';
import { ConvergenceError } from '../../thermo/errors.js';
import { resolveProduct, type ResolvedProduct } from '../../thermo/product.js';
import { blendSeed } from '../../thermo/solvers/blendSeeds.js';
import { mixtureAtT, phaseAt } from '../../thermo/solvers/mixtureModel.js';
import { saturationPointAt } from '../../thermo/solvers/saturationPoint.js';
import { checkClose } from '../helpers/check.js';

type Start = { p: number; K: Float64Array };
const spy = vi.hoisted(() => ({
  calls: [] as { T: number; start?: Start; p?: number; incipient?: Float64Array }[],
  /** Returns an error to throw instead of solving, for a deliberately failing solver. */
  fail: undefined as undefined | ((T: number, start: Start | undefined, n: number) => Error | void),
}));

vi.mock('../../thermo/solvers/bubbleDew.js', async (importOriginal) => {
  const real = await importOriginal<typeof import('../../thermo/solvers/bubbleDew.js')>();
  return {
    ...real,
    saturationPressure: (...args: Parameters<typeof real.saturationPressure>) => {
      const [mx, , , start] = args;
      const call: (typeof spy.calls)[number] = {
        T: mx.T,
        ...(start ? { start: { p: start.p, K: Float64Array.from(start.K) } } : {}),
      };
      spy.calls.push(call);
      const err = spy.fail?.(mx.T, start, spy.calls.length);
      if (err) throw err;
      const s = real.saturationPressure(...args);
      call.p = s.p;
      call.incipient = s.incipient;
      return s;
    },
  };
});

const { saturationPressure: coldSolve } = await vi.importActual<
  typeof import('../../thermo/solvers/bubbleDew.js')
>('../../thermo/solvers/bubbleDew.js');

beforeEach(() => {
  spy.calls.length = 0;
  spy.fail = undefined;
});

/** A product object nobody else holds (the resolver caches by value): an empty memory. */
const fresh = (): ResolvedProduct => ({
  ...resolveProduct({
    components: [
      { id: 'propane', moleFraction: 0.6 },
      { id: 'ethane', moleFraction: 0.1 },
      { id: 'n-butane', moleFraction: 0.3 },
    ],
  }),
});

const notFound = (T: number) =>
  new ConvergenceError('bubble pressure', `made to fail by the test at ${T} K`, 0, NaN);

function solve(r: ResolvedProduct, T: number, kind: 'bubble' | 'dew' = 'bubble') {
  spy.calls.length = 0;
  return saturationPointAt(r, T, kind);
}

/** Equal fugacity of every component between the feed and the incipient phase (phaseAt). */
function expectEqualFugacity(
  r: ResolvedProduct,
  T: number,
  s: { p: number; incipient: Float64Array },
) {
  const mx = mixtureAtT(r, T);
  const L = phaseAt(mx, s.p, r.z, 'liquid');
  const V = phaseAt(mx, s.p, s.incipient, 'vapour');
  for (let i = 0; i < r.z.length; i++)
    expect(
      Math.abs(Math.log(r.z[i]!) + L.lnPhi[i]! - Math.log(s.incipient[i]!) - V.lnPhi[i]!),
    ).toBeLessThan(1e-8);
}

/** ln p and ln K linear in 1/T between (Ta, a) and (Tb, b), evaluated at T. */
function clausiusClapeyron(Ta: number, a: Start, Tb: number, b: Start, T: number): Start {
  const w = (1 / T - 1 / Ta) / (1 / Tb - 1 / Ta);
  const mix = (x: number, y: number) => Math.exp(Math.log(x) + w * (Math.log(y) - Math.log(x)));
  return { p: mix(a.p, b.p), K: Float64Array.from(a.K, (k, i) => mix(k, b.K[i]!)) };
}

function expectStart(actual: Start | undefined, expected: Start, rtol = 0) {
  expect(actual, 'a start was handed to the solver').toBeDefined();
  const close = (x: number, y: number) => Math.abs(x / y - 1) <= rtol;
  expect(close(actual!.p, expected.p), `start p ${actual!.p} vs ${expected.p}`).toBe(true);
  expect(actual!.K.length).toBe(expected.K.length);
  actual!.K.forEach((k, i) => expect(close(k, expected.K[i]!), `K_${i}`).toBe(true));
}

/** The start a solved point gives: K = y/z at a bubble point, z/x at a dew point. */
const startOf = (
  r: ResolvedProduct,
  kind: 'bubble' | 'dew',
  s: { p: number; incipient: Float64Array },
) => ({
  p: s.p,
  K: Float64Array.from(s.incipient, (w, i) => (kind === 'bubble' ? w / r.z[i]! : r.z[i]! / w)),
});

describe('remembered points as starts', () => {
  it.each(['bubble', 'dew'] as const)(
    '%s: the same T again starts from its own solution',
    (kind) => {
      const r = fresh();
      const first = solve(r, 300, kind);
      expect(spy.calls[0]!.start, 'nothing remembered yet: a cold start').toBeUndefined();
      const again = solve(r, 300, kind);
      expect(spy.calls).toHaveLength(1);
      expectStart(spy.calls[0]!.start, startOf(r, kind, first));
      expect(Math.abs(again.p / first.p - 1)).toBeLessThan(1e-9);
    },
  );

  it('between two points less than 20 K apart: ln p, ln K linear in 1/T; the start then lies close to the answer', () => {
    const r = fresh();
    const a = solve(r, 290);
    const b = solve(r, 310);
    const s = solve(r, 303);
    expectStart(
      spy.calls[0]!.start,
      clausiusClapeyron(290, startOf(r, 'bubble', a), 310, startOf(r, 'bubble', b), 303),
      1e-12,
    );
    // Clausius–Clapeyron over 20 K: the start is within 0.5 % of the answer.
    checkClose({
      what: 'interpolated start against the solved bubble pressure',
      input: { T: 303 },
      actual: spy.calls[0]!.start!.p,
      expected: s.p,
      rtol: 0.005,
      kind: 'identity',
      source: 'Clausius–Clapeyron: ln p nearly linear in 1/T along a saturation curve',
    });
    expectEqualFugacity(r, 303, s);
    // Both neighbours are still remembered after the point between them was added.
    solve(r, 310);
    expectStart(spy.calls[0]!.start, startOf(r, 'bubble', b));
    solve(r, 290);
    expectStart(spy.calls[0]!.start, startOf(r, 'bubble', a));
  });

  it('a neighbour 20 K or more away is neither interpolated from nor a start; otherwise the nearer one is', () => {
    const r = fresh();
    solve(r, 280);
    const at300 = solve(r, 300);
    expect(spy.calls[0]!.start, '280 K is 20 K away: cold').toBeUndefined();
    // Above every point remembered: the highest, 5 K below.
    solve(r, 305);
    expectStart(spy.calls[0]!.start, startOf(r, 'bubble', at300));
    // 280 K is 20 K below 300 K: no interpolation; the nearer point, 305 K, is the start.
    const r2 = fresh();
    solve(r2, 280);
    const at305 = solve(r2, 305);
    solve(r2, 300);
    expectStart(spy.calls[0]!.start, startOf(r2, 'bubble', at305));
    // 320 K is 20 K above 300 K: no interpolation; the nearer point, 295 K, is the start.
    const r3 = fresh();
    const at295 = solve(r3, 295);
    solve(r3, 320);
    solve(r3, 300);
    expectStart(spy.calls[0]!.start, startOf(r3, 'bubble', at295));
    // Below every point remembered: the lowest, 10 K above.
    const r4 = fresh();
    const at310 = solve(r4, 310);
    solve(r4, 300);
    expectStart(spy.calls[0]!.start, startOf(r4, 'bubble', at310));
  });

  it('a start handed in is the only one tried', () => {
    const r = fresh();
    solve(r, 295);
    solve(r, 305);
    const given = startOf(r, 'bubble', coldSolve(mixtureAtT(r, 280), r.z, 'bubble'));
    spy.calls.length = 0;
    const s = saturationPointAt(r, 300, 'bubble', given);
    expect(spy.calls).toHaveLength(1);
    expectStart(spy.calls[0]!.start, given);
    expectEqualFugacity(r, 300, s);
  });

  it('keeps every other point when full (256), the lowest and the highest among them', () => {
    const r = fresh();
    const Ts = Array.from({ length: 257 }, (_, k) => 250 + k * 0.2);
    const pts = Ts.map((T) => startOf(r, 'dew', solve(r, T, 'dew')));
    // Kept: even positions, including both ends; its own solution starts the solve again.
    for (const k of [0, 2, 128, 256]) {
      solve(r, Ts[k]!, 'dew');
      expectStart(spy.calls[0]!.start, pts[k]!);
    }
    // Dropped: odd positions; the start is interpolated between the two kept either side.
    for (const k of [1, 255]) {
      solve(r, Ts[k]!, 'dew');
      const want = clausiusClapeyron(Ts[k - 1]!, pts[k - 1]!, Ts[k + 1]!, pts[k + 1]!, Ts[k]!);
      expectStart(spy.calls[0]!.start, want, 1e-12);
      expect(spy.calls[0]!.start!.p).not.toBe(pts[k]!.p);
    }
  });
});

describe('the starts of the blends the app offers (blend seeds)', () => {
  it('at a seeded temperature the seed row is the start; between two rows, the interpolation', () => {
    const r = { ...resolveProduct('r410a') };
    const rows = blendSeed(r)!.bubble;
    const row = (j: number) => ({
      T: rows[j]![0]!,
      p: rows[j]![1]!,
      K: Float64Array.from(rows[j]!.slice(2)),
    });
    const j = Math.floor(rows.length / 2);
    const s = solve(r, row(j).T);
    expectStart(spy.calls[0]!.start, row(j));
    expectEqualFugacity(r, row(j).T, s);
    const [lo, hi] = [row(j + 1), row(j + 2)].sort((x, y) => x.T - y.T) as [
      ReturnType<typeof row>,
      ReturnType<typeof row>,
    ];
    const T = 0.5 * (lo.T + hi.T);
    solve({ ...r }, T);
    expectStart(spy.calls[0]!.start, clausiusClapeyron(lo.T, lo, hi.T, hi, T), 1e-12);
  });
});

describe('when a solve fails (a deliberately failing solver)', () => {
  it('a cold start failing near the top: cold starts 5, 10, 20 K lower, then a march up from each point found', () => {
    const r = fresh();
    // Cold starts fail above 330 K, as a real blend's do near its critical region.
    spy.fail = (T, start) => (start || T <= 330 ? undefined : notFound(T));
    const s = solve(r, 345);
    const cold = spy.calls.filter((c) => !c.start).map((c) => c.T);
    expect([...new Set(cold)]).toEqual([345, 340, 335, 325]);
    const march = spy.calls.filter((c) => c.start);
    expect(march.map((c) => c.T)).toEqual([327, 330, 334.5, 339.5, 344.5, 345]);
    // Each step starts from the point found at the step before.
    const found = spy.calls.filter((c) => c.p !== undefined);
    for (let i = 1; i < found.length; i++)
      expectStart(
        found[i]!.start,
        startOf(r, 'bubble', { p: found[i - 1]!.p!, incipient: found[i - 1]!.incipient! }),
      );
    expectEqualFugacity(r, 345, s);
    const real = coldSolve(mixtureAtT(r, 345), r.z, 'bubble');
    expect(Math.abs(s.p / real.p - 1)).toBeLessThan(1e-9);
  });

  it('cold starts go no lower than T/2 (above the triple points), and say so when all fail', () => {
    const r = fresh();
    spy.fail = (T, start) => (start || T <= 180 ? undefined : notFound(T));
    solve(r, 345);
    const coldOk = spy.calls.find((c) => !c.start && c.p !== undefined)!;
    expect(coldOk.T).toBe(172.5);
    // Near the triple point the floor is Tmin + 1 K; everything above Tmin failing is reported.
    const r2 = fresh();
    spy.fail = (T, start) => (start || T < r2.Tmin ? undefined : notFound(T));
    const T = 2 * r2.Tmin - 10;
    expect(() => solve(r2, T)).toThrow(
      new RegExp(`^bubble pressure did not converge: no bubble point found at or below T = ${T} K`),
    );
    const colds = spy.calls.map((c) => c.T);
    expect(Math.min(...colds)).toBe(r2.Tmin + 1);
  });

  it('a remembered start that fails, with nothing below to march from: a cold start at T itself', () => {
    const r = fresh();
    solve(r, 330);
    // Every solve from a start fails; a cold one works.
    spy.fail = (T, start) => (start ? notFound(T) : undefined);
    const s = solve(r, 315);
    expect(spy.calls.map((c) => [c.T, c.start !== undefined])).toEqual([
      [315, true],
      [315, false],
    ]);
    expectEqualFugacity(r, 315, s);
  });

  it('the end of the curve: marched up from the remembered point to within 0.02 K of the end, then reported', () => {
    const r = fresh();
    const known = solve(r, 340);
    spy.fail = (T) => (T > 350.3 ? notFound(T) : undefined);
    spy.calls.length = 0;
    expect(() => saturationPointAt(r, 355, 'bubble')).toThrow(
      /^bubble pressure did not converge: the bubble curve ends near 350\.(2[89]|30) K, below T = 355 K/,
    );
    // The remembered point 15 K below was tried directly, then marched from.
    expect(spy.calls[0]!.T).toBe(355);
    expect(spy.calls[1]!.T).toBe(342);
    expectStart(spy.calls[1]!.start, startOf(r, 'bubble', known));
    expect(spy.calls.length).toBeLessThan(40);
  });

  it('a remembered point 60 K or more below is not marched from: a cold start nearer is tried', () => {
    const r = fresh();
    solve(r, 285);
    spy.fail = (T, start) => (start || T <= 340 ? undefined : notFound(T));
    const s = solve(r, 345);
    expect(spy.calls.some((c) => c.T < 340 && c.T > 285 && c.start && c.T < 300)).toBe(false);
    expect(spy.calls.find((c) => !c.start && c.p !== undefined)!.T).toBe(340);
    expectEqualFugacity(r, 345, s);
  });

  it.each([1, 2, 3])('an error other than non-convergence (at call %i) is passed on', (n) => {
    const r = fresh();
    spy.fail = (T, start, k) =>
      k === n
        ? new RangeError('not a convergence failure')
        : start || T <= 330
          ? undefined
          : notFound(T);
    expect(() => solve(r, 345)).toThrow(RangeError);
  });

  it('an error other than non-convergence while marching is passed on', () => {
    const r = fresh();
    spy.fail = (T, start) =>
      start ? new RangeError('not a convergence failure') : T <= 330 ? undefined : notFound(T);
    expect(() => solve(r, 345)).toThrow(RangeError);
  });
});
