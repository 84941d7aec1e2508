/**
 * The check's temperature searches (thermo/check/search.ts) on a stand-in fluid whose answers
 * are known in closed form, so that each search can be held to its answer and to the few model
 * evaluations its header promises ("a handful of core evaluations suffice"):
 *
 * - vapour pressure: the integrated Clausius–Clapeyron equation ln p = A − B/T (constant heat of
 *   vaporisation; any physical chemistry text, e.g. Atkins, Physical Chemistry, the
 *   Clausius–Clapeyron section), whose saturation temperature is T = B/(A − ln p);
 * - saturated liquid density: ρL = ρc + a·(Tc − T)^(1/3), the critical scaling with β = 1/3 the
 *   search's header names, whose liquid-full temperature is Tc − ((ρ − ρc)/a)³.
 *
 * Constants are propane-like (Tc 370 K, pc 4.25 MPa, ρc 220 kg/m³) but invented: this is a test
 * fixture, not data. With functions this straight the secant lands on the root at once; the
 * evaluation budgets (8 per search, 16 where the search must leave the saturation curve) allow
 * for bracketing and the regula falsi's closing steps and sit a little above the counts measured
 * when they were written (kind: regression); a search that falls back to bisection over the
 * range needs several times more.
 */
import { describe, expect, it } from 'vitest';
import {
  liquidFullTemperature,
  reliefTemperature,
  saturationTemperature,
} from '../../thermo/check/search.js';
import type { ProductModel, State } from '../../thermo/check/model.js';
import { T_CHECK_MAX_K } from '../../thermo/limits.js';

const TC = 370;
const PC = 4.25e6;
const B = 2400;
const A = Math.log(PC) + B / TC;
const RHOC = 220;
const ALPHA = 60;
const TOP = TC - 0.5;

const psat = (T: number) => Math.exp(A - B / T);
const satT = (p: number) => B / (A - Math.log(p));
const rhoL = (T: number) => RHOC + ALPHA * Math.cbrt(TC - T);
const fullT = (rho: number) => TC - ((rho - RHOC) / ALPHA) ** 3;

interface Options {
  /** Pressure of the tank's state as a share of the saturation pressure (a blend's flash held below its bubble point). */
  floor?: number;
  phase?: State['phase'];
  /** Above this temperature the model cannot hold the fill (stateOrNull gives null). */
  heldUpTo?: number;
  top?: number;
  /** C in ln p = A − B/T − C·(1/T² − 1/Tc²), K²: a curved vapour-pressure line (0: straight). */
  curvature?: number;
  /** No saturation temperature is remembered between searches. */
  forget?: boolean;
}

/** A stand-in ProductModel counting its evaluations. */
function standIn(o: Options = {}) {
  const top = o.top ?? TOP;
  const C = o.curvature ?? 0;
  const pOf = (T: number) => psat(T) * Math.exp(-C * (1 / T ** 2 - 1 / TC ** 2));
  const remembered = new Map<number, number | null>();
  const m = {
    calls: 0,
    /** Tmin + 0.01 K (the check's margin above the triple point) = 230 K, the floor searched. */
    basics: { rhoc: RHOC, Tmin: 229.99 },
    satTop: () => top,
    /** As the real model: one search per pressure (o.forget: a new search each time). */
    satTemperature(pAbs: number, solve: () => number | null) {
      if (o.forget || !remembered.has(pAbs)) remembered.set(pAbs, solve());
      return remembered.get(pAbs)!;
    },
    sat(T: number) {
      m.calls++;
      return T <= top ? { pAbs: pOf(T), rhoL: rhoL(T), rhoV: 10 } : null;
    },
    stateOrNull(T: number, rho: number): State | null {
      m.calls++;
      if (T > (o.heldUpTo ?? Infinity)) return null;
      // Past the top of the curve the pressure keeps rising, 5 % per kelvin.
      const p = pOf(Math.min(T, top)) * (T > top ? 1 + 0.05 * (T - top) : 1);
      return {
        phase: o.phase ?? 'two-phase',
        pAbs: (o.floor ?? 1) * p,
        lf: 0.5,
        rhoL: rho,
        rhoV: null,
        approximate: false,
      };
    },
  };
  return m;
}
const model = (m: ReturnType<typeof standIn>) => m as unknown as ProductModel;
/** 0.5 % on a two-phase pressure, 10 % on a liquid-full one (README "Limits of validity"). */
const allowance = (s: State) => (s.phase === 'liquid-full' ? 0.1 : 0.005);

describe('saturation temperature on the Clausius–Clapeyron stand-in', () => {
  const hintSets: number[][] = [
    [300, 320], // one hint on each side of 305 K
    [320], // above only
    [280], // below only
    [], // none: from the lowest temperature searched
    [200, 380], // outside the range searched (below Tlo, past the curve)
    [290, 310, 330],
  ];
  for (const hints of hintSets)
    it(`305 K from hints ${JSON.stringify(hints)}`, () => {
      const m = standIn();
      const T = saturationTemperature(model(m), psat(305), hints, 230)!;
      expect(Math.abs(T - 305)).toBeLessThan(0.002);
      expect(m.calls).toBeLessThanOrEqual(8);
    });

  it('anywhere on the curve, from one hint', () => {
    for (const Tstar of [231, 250, 299.5, 350, 369]) {
      const m = standIn();
      const T = saturationTemperature(model(m), psat(Tstar), [300], 230)!;
      expect(Math.abs(T - satT(psat(Tstar))), `${Tstar} K`).toBeLessThan(0.002);
      expect(m.calls, `${Tstar} K`).toBeLessThanOrEqual(8);
    }
  });

  it('one search per pressure: a later ask with other hints or a higher Tlo costs nothing', () => {
    const m = standIn();
    const T = saturationTemperature(model(m), psat(305), [280], 230)!;
    expect(Math.abs(T - 305)).toBeLessThan(0.002);
    const calls = m.calls;
    expect(saturationTemperature(model(m), psat(305), [320, 340], 300)).toBe(T);
    // The one root lies below a Tlo of 310 K: none at or above it.
    expect(saturationTemperature(model(m), psat(305), [320], 310)).toBeNull();
    expect(m.calls).toBe(calls);
  });

  it('a first ask above the root does not hide the root from a later ask below it', () => {
    const m = standIn();
    expect(saturationTemperature(model(m), psat(305), [320], 310)).toBeNull();
    const T = saturationTemperature(model(m), psat(305), [280], 230)!;
    expect(Math.abs(T - 305)).toBeLessThan(0.002);
  });

  it('none past either end of the curve', () => {
    expect(saturationTemperature(model(standIn()), psat(TOP) * 1.01, [300], 230)).toBeNull();
    expect(saturationTemperature(model(standIn()), psat(230) * 0.99, [300], 230)).toBeNull();
    expect(saturationTemperature(model(standIn()), psat(300), [300], TOP)).toBeNull();
  });
});

describe('liquid-full temperature on the critical-scaling stand-in', () => {
  for (const hints of [[300], [340], [], [250, 360], [200, 380]])
    it(`330 K from hints ${JSON.stringify(hints)}`, () => {
      const m = standIn();
      const T = liquidFullTemperature(model(m), rhoL(330), hints, 230)!;
      expect(Math.abs(T - 330)).toBeLessThan(0.002);
      expect(m.calls).toBeLessThanOrEqual(8);
    });

  it('anywhere on the curve, from one hint', () => {
    for (const Tstar of [240, 290, 345, 365, 369.3]) {
      const m = standIn();
      const T = liquidFullTemperature(model(m), rhoL(Tstar), [300], 230)!;
      expect(Math.abs(T - fullT(rhoL(Tstar))), `${Tstar} K`).toBeLessThan(0.002);
      expect(m.calls, `${Tstar} K`).toBeLessThanOrEqual(8);
    }
  });

  it('the end of the curve for contents denser than critical that the liquid has not reached there', () => {
    // ρL at the top (369.5 K) is ρc + 60·0.5^(1/3) = 267.6 kg/m³: 250 kg/m³ would fill at 369.875 K.
    const m = standIn();
    expect(liquidFullTemperature(model(m), 250, [300], 230)).toBe(TOP);
    // One look at the top of the curve settles it; no search.
    expect(m.calls).toBeLessThanOrEqual(2);
  });

  it('hints outside the range searched are not evaluated', () => {
    // Below the lowest temperature searched (200 K) and past the curve (380 K): the same
    // evaluations as with no hint at all.
    const cost = (f: (m: ProductModel) => unknown) => {
      const m = standIn();
      f(model(m));
      return m.calls;
    };
    expect(cost((m) => saturationTemperature(m, psat(305), [200, 380], 230))).toBe(
      cost((m) => saturationTemperature(m, psat(305), [], 230)),
    );
    expect(cost((m) => liquidFullTemperature(m, rhoL(330), [200, 380], 230))).toBe(
      cost((m) => liquidFullTemperature(m, rhoL(330), [], 230)),
    );
  });

  it('nothing to search, nothing evaluated, when the range is empty', () => {
    const a = standIn();
    expect(liquidFullTemperature(model(a), rhoL(330), [300], TOP)).toBeNull();
    const b = standIn();
    expect(saturationTemperature(model(b), psat(305), [300], TOP)).toBeNull();
    expect(a.calls + b.calls).toBe(0);
  });
});

describe('relief temperature on the stand-in', () => {
  it('two-phase: the saturation answer, with few evaluations', () => {
    const m = standIn();
    const relief = psat(330) * 1.005;
    const T = reliefTemperature(model(m), 300, relief, allowance, 300, null, [300])!;
    expect(Math.abs(T - 330)).toBeLessThan(0.002);
    expect(m.calls).toBeLessThanOrEqual(8);
  });

  it('two-phase until a liquid-full temperature past the answer', () => {
    const m = standIn();
    const T = reliefTemperature(model(m), 300, psat(330) * 1.005, allowance, 300, 340, [300])!;
    expect(Math.abs(T - 330)).toBeLessThan(0.002);
    expect(m.calls).toBeLessThanOrEqual(8);
  });

  it('on the curve, costs the saturation search plus the state now and at the answer', () => {
    // The shortcut the search documents: while two-phase, the saturation answer stands once the
    // state there is checked. Any further search would cost more evaluations.
    // On a curved vapour-pressure line (C = 20 000 K²), so that the saturation answer is not
    // exact to the last digit and a further search would have something left to do.
    const relief = psat(330) * 1.005;
    for (const Tfull of [null, 340]) {
      const s = standIn({ curvature: 2e4 });
      saturationTemperature(model(s), relief / 1.005, [300], 300);
      const m = standIn({ curvature: 2e4 });
      reliefTemperature(model(m), 300, relief, allowance, 300, Tfull, [300]);
      expect(m.calls, `Tfull ${Tfull}`).toBeLessThanOrEqual(s.calls + 2);
    }
  });

  it('a blend held below its bubble pressure: where its own pressure reaches the setting, not the bubble curve', () => {
    // p = 0.9·psat: 0.9·psat(T)·1.005 = relief at T = satT(relief/(0.9·1.005)), later than 330 K.
    const m = standIn({ floor: 0.9 });
    const relief = psat(330) * 1.005;
    const T = reliefTemperature(model(m), 300, relief, allowance, 300, null, [300])!;
    expect(Math.abs(T - satT(relief / (0.9 * 1.005)))).toBeLessThan(0.002);
    expect(m.calls).toBeLessThanOrEqual(16);
  });

  it('not on the saturation curve when the state there is not two-phase', () => {
    // Liquid-full states carry the 10 % allowance: 1.1·psat(T) = relief earlier than 330 K.
    const m = standIn({ phase: 'liquid-full' });
    const relief = psat(330) * 1.005;
    const T = reliefTemperature(model(m), 300, relief, allowance, 300, null, [300])!;
    expect(Math.abs(T - satT(relief / 1.1))).toBeLessThan(0.002);
    expect(m.calls).toBeLessThanOrEqual(16);
  });

  it('past the end of the curve: on the single-phase branch beyond it', () => {
    // 5 % per kelvin past 369.5 K: psat(369.5)·(1 + 0.05·5)·1.005 is reached at 374.5 K.
    const m = standIn();
    const relief = psat(TOP) * 1.25 * 1.005;
    const T = reliefTemperature(model(m), 300, relief, allowance, 300, null, [300])!;
    expect(Math.abs(T - (TOP + 5))).toBeLessThan(0.002);
    expect(m.calls).toBeLessThanOrEqual(16);
  });

  it('where the model stops holding the fill first: the last temperature it holds (the earlier, cautious answer)', () => {
    // Held up to 340 K; the relief pressure would come only at 350 K.
    const m = standIn({ heldUpTo: 340 });
    const T = reliefTemperature(model(m), 300, psat(350) * 1.005, allowance, 300, null, [300])!;
    expect(T).toBeLessThanOrEqual(340);
    expect(340 - T).toBeLessThan(0.002);
  });

  it('none when the setting is not reached below the highest temperature searched', () => {
    const relief = psat(TOP) * (1 + 0.05 * (T_CHECK_MAX_K - TOP)) * 1.005 * 1.01;
    expect(
      reliefTemperature(model(standIn()), 300, relief, allowance, 300, null, [300]),
    ).toBeNull();
  });
});
