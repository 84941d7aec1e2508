/**
 * thermo/solvers/flash.ts against quantities computed outside it: Rachford–Rice on phases
 * chosen by hand (mass balance), its step count against the bisection count of the same
 * bracket, the flash's phases checked with the fugacity function (`phaseAt`, not the flash's
 * own K), the mass balance recomputed from the phases, and the flash's step count against plain
 * successive substitution written out here.
 */
import { describe, expect, it } from 'vitest';
import { ConvergenceError } from '../../thermo/errors.js';
import { resolveProduct } from '../../thermo/product.js';
import { rachfordRiceSteps } from '../../thermo/solvers/flash.js';
import {
  flashPT,
  mixtureAtT,
  phaseAt,
  rachfordRice,
  saturationPressure,
  type FlashResult,
} from '../../thermo/solvers/mixture.js';
import { wilsonK } from '../../thermo/solvers/wilson.js';
import { checkClose } from '../helpers/check.js';
import { readTable } from '../reference/measure.js';

const GERG =
  'GERG-2008 (Kunz & Wagner 2012, J. Chem. Eng. Data 57, 3032) via test/reference/bubble.csv';
const gergBubble = (T: number) =>
  +readTable('bubble.csv').find(
    (r) => r.mixture === 'propane0.50+n-butane0.50' && Math.abs(+r.T_K! - T) < 0.01,
  )!.p_bubble_Pa!;

const binary = () =>
  resolveProduct({
    components: [
      { id: 'propane', moleFraction: 0.5 },
      { id: 'n-butane', moleFraction: 0.5 },
    ],
  });

/** Bisection count that shrinks [0, 1] below the solver's step tolerance 1e-15: ⌈log2 1e15⌉. */
const BISECTION_STEPS = Math.ceil(Math.log2(1e15));

/** Rachford–Rice by plain bisection (200 halvings), written out here. */
function rrBisection(z: ArrayLike<number>, K: ArrayLike<number>): number {
  const f = (b: number) => {
    let s = 0;
    for (let i = 0; i < z.length; i++) s += (z[i]! * (K[i]! - 1)) / (1 + b * (K[i]! - 1));
    return s;
  };
  if (f(0) <= 0) return 0;
  if (f(1) >= 0) return 1;
  let lo = 0;
  let hi = 1;
  for (let k = 0; k < 200; k++) {
    const m = 0.5 * (lo + hi);
    if (f(m) > 0) lo = m;
    else hi = m;
  }
  return 0.5 * (lo + hi);
}

/**
 * Plain successive substitution K ← φ^L(x)/φ^V(y) from Wilson's K, with the flash's own stop
 * (max |Δ ln K| < 1e-10) and no acceleration: the step count the acceleration must beat.
 */
function plainSubstitution(mx: ReturnType<typeof mixtureAtT>, z: number[], p: number) {
  const K = wilsonK(mx.product, mx.T, p);
  for (let it = 1; it <= 5000; it++) {
    const beta = rrBisection(z, K);
    const x = z.map((zi, i) => zi / (1 + beta * (K[i]! - 1)));
    const y = x.map((xi, i) => K[i]! * xi);
    const sx = x.reduce((s, v) => s + v, 0);
    const sy = y.reduce((s, v) => s + v, 0);
    const L = phaseAt(
      mx,
      p,
      x.map((v) => v / sx),
      'liquid',
    );
    const V = phaseAt(
      mx,
      p,
      y.map((v) => v / sy),
      'vapour',
    );
    let resid = 0;
    for (let i = 0; i < z.length; i++) {
      const lnK = L.lnPhi[i]! - V.lnPhi[i]!;
      resid = Math.max(resid, Math.abs(lnK - Math.log(K[i]!)));
      K[i] = Math.exp(lnK);
    }
    if (resid < 1e-10) return { iterations: it, beta };
  }
  throw new Error('plain substitution did not converge in 5000 steps');
}

/** Equal fugacities, the component balance and unit sums, all recomputed from the phases. */
function expectEquilibrium(
  mx: ReturnType<typeof mixtureAtT>,
  z: ArrayLike<number>,
  p: number,
  f: FlashResult,
) {
  const L = phaseAt(mx, p, f.x, 'liquid');
  const V = phaseAt(mx, p, f.y, 'vapour');
  let sx = 0;
  let sy = 0;
  for (let i = 0; i < mx.n; i++) {
    sx += f.x[i]!;
    sy += f.y[i]!;
    const d = Math.log(f.x[i]!) + L.lnPhi[i]! - Math.log(f.y[i]!) - V.lnPhi[i]!;
    expect(Math.abs(d), `Δ ln f_${i} at p = ${p}`).toBeLessThan(1e-8);
    checkClose({
      what: 'component balance',
      input: { p, i },
      actual: (1 - f.beta) * f.x[i]! + f.beta * f.y[i]!,
      expected: z[i]!,
      rtol: 1e-9,
      kind: 'identity',
      source: 'mass balance z = (1 − β)x + βy recomputed from the returned phases',
    });
  }
  expect(Math.abs(sx - 1)).toBeLessThan(1e-12);
  expect(Math.abs(sy - 1)).toBeLessThan(1e-12);
}

describe('rachfordRiceSteps', () => {
  it.each([
    ['binary', [0.3, 0.7], [0.8, 0.2], 0.35],
    ['ternary, mostly vapour', [0.1, 0.3, 0.6], [0.5, 0.35, 0.15], 0.8],
    ['ternary, little vapour', [0.05, 0.25, 0.7], [0.4, 0.4, 0.2], 0.02],
    ['wide K (900 and 0.1), a trace of vapour', [0.001, 0.999], [0.9, 0.1], 0.001],
    ['ternary, a trace of liquid', [0.001, 0.009, 0.99], [0.9, 0.09, 0.01], 0.999],
    ['K of 99 and 0.01, a trace of liquid', [0.01, 0.99], [0.99, 0.01], 0.9995],
    ['K of 1.5 and 0.1, mostly vapour', [9 / 14, 5 / 14], [27 / 28, 1 / 28], 0.9],
  ] as const)('recovers β of phases chosen by hand in few steps (%s)', (_, x, y, beta) => {
    // z = (1 − β)x + βy and K = y/x define a problem whose root is β (mass balance).
    const z = x.map((xi, i) => (1 - beta) * xi + beta * y[i]!);
    const K = x.map((xi, i) => y[i]! / xi);
    const r = rachfordRiceSteps(z, K);
    checkClose({
      what: 'β',
      input: { x, y },
      actual: r.beta,
      expected: beta,
      atol: 1e-13,
      kind: 'identity',
      source: 'component mass balance z = (1 − β)x + βy',
    });
    expect(rachfordRice(z, K)).toBe(r.beta);
    // Newton converges quadratically near the root; kept inside the bracket it must take
    // well under the 50 halvings bisection alone needs to shrink [0, 1] below 1e-15.
    expect(r.iterations).toBeGreaterThanOrEqual(1);
    expect(r.iterations).toBeLessThanOrEqual(BISECTION_STEPS / 2);
  });

  it('outside the two-phase window it clips without stepping', () => {
    // Σz(K − 1) ≤ 0: all liquid; Σz(1 − 1/K) ≥ 0: all vapour (the two limits of the sum).
    expect(rachfordRiceSteps([0.5, 0.5], [0.5, 0.8])).toEqual({ beta: 0, iterations: 0 });
    expect(rachfordRiceSteps([0.5, 0.5], [2, 3])).toEqual({ beta: 1, iterations: 0 });
    // Exactly at the limits (sums exact in binary): Σz(K − 1) = 0.5·0.5 − 0.5·0.5 = 0 is the
    // bubble point, Σz(1 − 1/K) = 0.5·0.5 − 0.25·1 + 0 = 0 the dew point.
    expect(rachfordRiceSteps([0.5, 0.5], [1.5, 0.5])).toEqual({ beta: 0, iterations: 0 });
    expect(rachfordRiceSteps([0.5, 0.25, 0.25], [2, 0.5, 1])).toEqual({
      beta: 1,
      iterations: 0,
    });
  });
});

describe('flashPT near the critical point of propane/n-butane 50/50', () => {
  it.each([
    [400, 4.16e6],
    [401, 4.16e6],
    [401, 4.18e6],
  ])('at %f K, %f Pa: equilibrium phases, in at most half the plain steps', (T, p) => {
    const r = binary();
    const mx = mixtureAtT(r, T);
    const f = flashPT(mx, r.z, p);
    expect(f.converged).toBe(true);
    expect(f.reason).toBe('converged');
    expect(f.residual).toBeLessThan(1e-10);
    expect(f.beta).toBeGreaterThan(0.01);
    expect(f.beta).toBeLessThan(0.99);
    expectEquilibrium(mx, r.z, p, f);
    // Plain substitution converges linearly with a ratio that tends to 1 at the critical
    // point; the dominant-eigenvalue step is there to cut that count at least in half.
    const plain = plainSubstitution(mx, [...r.z], p);
    // The same split: both stop at a step below 1e-10 in ln K, which near the critical point
    // leaves an error of that over (1 − ratio), magnified in β by 1/(K − 1).
    expect(Math.abs(f.beta - plain.beta), 'the same split').toBeLessThan(1e-6);
    expect(f.iterations).toBeLessThanOrEqual(plain.iterations / 2);
  });

  it('where substitution stalls it throws a ConvergenceError naming the flash, never a bare answer', () => {
    const r = binary();
    const T = 401.5;
    const p = 4.22e6;
    const mx = mixtureAtT(r, T);
    let f: FlashResult | undefined;
    try {
      f = flashPT(mx, r.z, p);
    } catch (e) {
      expect(e).toBeInstanceOf(ConvergenceError);
      expect((e as Error).message).toMatch(/^PT flash did not converge: /);
      expect((e as Error).message).toContain(`T = ${T} K, p = ${p} Pa`);
      expect((e as ConvergenceError).iterations).toBe(500);
    }
    if (f) expectEquilibrium(mx, r.z, p, f);
  });
});

describe('flashPT outside the two-phase region', () => {
  it('above the bubble point: β = 0, x = z, and y is the stationary trial vapour', () => {
    const r = binary();
    const T = 293.15;
    const mx = mixtureAtT(r, T);
    // 20 % above the GERG bubble pressure: above the model's too (within 2 %, mixture-solvers).
    const p = 1.2 * gergBubble(T);
    expect(p, `1.2 × the bubble pressure of ${GERG}`).toBeGreaterThan(
      saturationPressure(mx, r.z, 'bubble').p,
    );
    const f = flashPT(mx, r.z, p);
    expect(f.beta).toBe(0);
    f.x.forEach((xi, i) => expect(xi).toBe(r.z[i]));
    expect(Math.abs(f.y.reduce((s, v) => s + v, 0) - 1)).toBeLessThan(1e-12);
    // At the fixed point y_i = K_i z_i / S with ln K_i = ln φ_i^L(z) − ln φ_i^V(y), so
    // ln y_i + ln φ_i^V(y) − ln z_i − ln φ_i^L(z) = −ln S for every i (Michelsen's stationary
    // point of the tangent-plane distance), and S = Σ K_i z_i < 1: the feed is stable there.
    const S = f.K.reduce((s, k, i) => s + k * r.z[i]!, 0);
    expect(S).toBeLessThan(1);
    const L = phaseAt(mx, p, r.z, 'liquid');
    const V = phaseAt(mx, p, f.y, 'vapour');
    for (let i = 0; i < mx.n; i++) {
      checkClose({
        what: `stationarity of component ${i}`,
        input: { T, p },
        actual: Math.log(f.y[i]!) + V.lnPhi[i]! - Math.log(r.z[i]!) - L.lnPhi[i]!,
        expected: -Math.log(S),
        atol: 1e-9,
        kind: 'identity',
        source: 'fugacity function phaseAt; Michelsen 1982, Fluid Phase Equilib. 9, 1',
      });
    }
    // The trial vapour is richer in propane than the feed (the lighter component).
    expect(f.y[0]!).toBeGreaterThan(r.z[0]!);
  });

  it('below the dew point: β = 1, y = z, and x is the stationary trial liquid', () => {
    const r = binary();
    const T = 300;
    const mx = mixtureAtT(r, T);
    const p = 0.8 * saturationPressure(mx, r.z, 'dew').p;
    const f = flashPT(mx, r.z, p);
    expect(f.beta).toBe(1);
    f.y.forEach((yi, i) => expect(yi).toBe(r.z[i]));
    expect(Math.abs(f.x.reduce((s, v) => s + v, 0) - 1)).toBeLessThan(1e-12);
    // x_i = (z_i/K_i)/S′ with S′ = Σ z_i/K_i < 1, the same stationarity as above.
    const S = f.K.reduce((s, k, i) => s + r.z[i]! / k, 0);
    expect(S).toBeLessThan(1);
    const L = phaseAt(mx, p, f.x, 'liquid');
    const V = phaseAt(mx, p, r.z, 'vapour');
    for (let i = 0; i < mx.n; i++) {
      checkClose({
        what: `stationarity of component ${i}`,
        input: { T, p },
        actual: Math.log(f.x[i]!) + L.lnPhi[i]! - Math.log(r.z[i]!) - V.lnPhi[i]!,
        expected: -Math.log(S),
        atol: 1e-9,
        kind: 'identity',
        source: 'fugacity function phaseAt; Michelsen 1982, Fluid Phase Equilib. 9, 1',
      });
    }
    expect(f.x[1]!).toBeGreaterThan(r.z[1]!);
  });
});

describe('Rachford–Rice with a K that underflowed to 0', () => {
  it('keeps β below 1, so every phase fraction stays finite (found by the api property test)', () => {
    // z and K as met by a closed-tank flash of propane with traces of n-butane and ethane at
    // 233.15 K: n-butane's K underflowed to 0, so 1 + β(K − 1) = 1 − β is 0 at β = 1. The root
    // lies within 1e-17 of 1, closer than a double can show.
    const z = [1, 1e-323, 1.0607557663309708e-306];
    const K = [1, 0, 6.236604331249904];
    const { beta } = rachfordRiceSteps(z, K);
    expect(beta).toBeGreaterThan(0);
    expect(beta).toBeLessThan(1);
    const x = z.map((zi, i) => zi / (1 + beta * (K[i]! - 1)));
    expect(x.every(Number.isFinite)).toBe(true);
  });
});
