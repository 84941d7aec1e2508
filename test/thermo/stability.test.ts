/**
 * thermo/solvers/stability.ts against quantities computed outside it: the bubble and dew
 * points of bubbleDew (saturationPressure) for the sign of the tangent-plane distance, the
 * stationarity of the returned trial phase recomputed with the fugacity function (`phaseAt`),
 * the first-order change of the tangent-plane distance with pressure from partial molar
 * compressibilities (finite differences of ln φ), and the incipient vapour of the bubble point.
 */
import { describe, expect, it } from 'vitest';
import { resolveProduct } from '../../thermo/product.js';
import {
  mixtureAtT,
  phaseAt,
  saturationPressure,
  stabilityTest,
} from '../../thermo/solvers/mixture.js';
import { checkClose } from '../helpers/check.js';

const MICHELSEN = 'Michelsen 1982, Fluid Phase Equilib. 9, 1 (stationarity of the tangent plane)';
const product = (name: string) =>
  name === 'binary'
    ? resolveProduct({
        components: [
          { id: 'propane', moleFraction: 0.5 },
          { id: 'n-butane', moleFraction: 0.5 },
        ],
      })
    : resolveProduct({
        components: [
          { id: 'propane', moleFraction: 0.6 },
          { id: 'ethane', moleFraction: 0.1 },
          { id: 'n-butane', moleFraction: 0.3 },
        ],
      });

type Mx = ReturnType<typeof mixtureAtT>;

/**
 * The trial phase behind K (vapour-like w = K·z or liquid-like w = z/K, whichever sums to 1),
 * checked for Michelsen's stationarity: ln w_i + ln φ_i(w) − ln z_i − ln φ_i(z) = −ln(1 − tm)
 * for every i, with φ from the fugacity function on the trial's own root.
 */
function expectStationaryTrial(
  mx: Mx,
  z: ArrayLike<number>,
  p: number,
  K: Float64Array,
  tm: number,
) {
  const wV = Array.from(K, (k, i) => k * z[i]!);
  const wL = Array.from(K, (k, i) => z[i]! / k);
  const sum = (w: number[]) => w.reduce((s, v) => s + v, 0);
  const vapourLike = Math.abs(sum(wV) - 1) < 1e-9;
  if (!vapourLike) expect(Math.abs(sum(wL) - 1), 'the trial phase sums to 1').toBeLessThan(1e-9);
  const w = vapourLike ? wV : wL;
  const trial = phaseAt(mx, p, w, vapourLike ? 'vapour' : 'liquid');
  const feed = phaseAt(mx, p, z, 'stable');
  for (let i = 0; i < mx.n; i++) {
    checkClose({
      what: `stationarity of component ${i}`,
      input: { T: mx.T, p, vapourLike },
      actual: Math.log(w[i]!) + trial.lnPhi[i]! - Math.log(z[i]!) - feed.lnPhi[i]!,
      expected: -Math.log(1 - tm),
      atol: 1e-8,
      kind: 'identity',
      source: MICHELSEN,
    });
  }
  return { w, vapourLike };
}

/** Z̄_i = 1 + ∂ln φ_i/∂ln p at fixed T and composition (central difference, h = 1e-6). */
function partialZ(mx: Mx, p: number, x: ArrayLike<number>, root: 'liquid' | 'vapour') {
  const h = 1e-6;
  const up = phaseAt(mx, p * Math.exp(h), x, root).lnPhi;
  const dn = phaseAt(mx, p * Math.exp(-h), x, root).lnPhi;
  return Array.from(up, (u, i) => 1 + (u - dn[i]!) / (2 * h));
}

describe('stabilityTest near the bubble and dew points of bubbleDew', () => {
  it.each([
    ['binary', 253.15],
    ['binary', 293.15],
    ['binary', 313.15],
    ['ternary', 300],
  ] as const)('%s at %f K: the sign of tm follows the bubble point', (name, T) => {
    const r = product(name);
    const mx = mixtureAtT(r, T);
    const bub = saturationPressure(mx, r.z, 'bubble');
    const delta = 1e-5;
    const p = bub.p * (1 - delta);
    const s = stabilityTest(mx, r.z, p);
    expect(s.stable, 'just below the bubble point').toBe(false);
    const { w, vapourLike } = expectStationaryTrial(mx, r.z, p, s.K!, s.tm);
    expect(vapourLike, 'the incipient phase is a vapour').toBe(true);
    // The trial vapour is the bubble point's incipient vapour, moved by O(δ).
    w.forEach((wi, i) => expect(Math.abs(wi - bub.incipient[i]!)).toBeLessThan(1e-3));
    // First order in δ: tm = −δ·(Z^V(y) − Σ y_i Z̄_i^L(z)), with y the incipient vapour and
    // Z̄ the partial molar compressibilities (d tm/d ln p at a stationary point; the shift of
    // the trial composition drops out there).
    const zL = partialZ(mx, bub.p, r.z, 'liquid');
    const ZV = phaseAt(mx, bub.p, bub.incipient, 'vapour').Z;
    const dZ = ZV - bub.incipient.reduce((s2, y, i) => s2 + y * zL[i]!, 0);
    checkClose({
      what: 'tangent-plane distance',
      input: { name, T, p },
      actual: s.tm,
      expected: -delta * dZ,
      rtol: 0.01,
      kind: 'identity',
      source: `${MICHELSEN}; ∂ln φ_i/∂ln p = Z̄_i − 1 (finite differences of phaseAt)`,
      why: 'second order in δ = 1e-5 and the 1e-10 stop of the trial iteration',
    });
    expect(s.iterations).toBeGreaterThanOrEqual(2);
    // Both trial searches end before their 200-step caps (linear convergence, far from Tc).
    expect(s.iterations).toBeLessThan(400);

    const above = stabilityTest(mx, r.z, bub.p * (1 + delta));
    expect(above.stable, 'just above the bubble point').toBe(true);
    expect(above.K).toBeUndefined();
    expect(above.tm).toBeGreaterThan(-1e-8);
    // 5e-9 above: the vapour-like stationary point lies just above the tangent plane
    // (tm ≈ +5e-9·ΔZ, inside the solver's 1e-8 band), which must not read as a split.
    expect(stabilityTest(mx, r.z, bub.p * (1 + 5e-9)).stable).toBe(true);
  });

  it.each([
    ['binary', 253.15],
    ['binary', 313.15],
    ['ternary', 300],
  ] as const)('%s at %f K: the sign of tm follows the dew point', (name, T) => {
    const r = product(name);
    const mx = mixtureAtT(r, T);
    const dew = saturationPressure(mx, r.z, 'dew');
    const delta = 1e-5;
    const p = dew.p * (1 + delta);
    const s = stabilityTest(mx, r.z, p);
    expect(s.stable, 'just above the dew point').toBe(false);
    const { w, vapourLike } = expectStationaryTrial(mx, r.z, p, s.K!, s.tm);
    expect(vapourLike, 'the incipient phase is a liquid').toBe(false);
    w.forEach((wi, i) => expect(Math.abs(wi - dew.incipient[i]!)).toBeLessThan(1e-3));
    // tm = −δ·(Σ x_i Z̄_i^V(z) − Z^L(x)), x the incipient liquid (as at the bubble point).
    const zV = partialZ(mx, dew.p, r.z, 'vapour');
    const ZL = phaseAt(mx, dew.p, dew.incipient, 'liquid').Z;
    const dZ = dew.incipient.reduce((s2, x, i) => s2 + x * zV[i]!, 0) - ZL;
    checkClose({
      what: 'tangent-plane distance',
      input: { name, T, p },
      actual: s.tm,
      expected: -delta * dZ,
      rtol: 0.01,
      kind: 'identity',
      source: `${MICHELSEN}; ∂ln φ_i/∂ln p = Z̄_i − 1 (finite differences of phaseAt)`,
      why: 'second order in δ = 1e-5 and the 1e-10 stop of the trial iteration',
    });
    expect(s.iterations).toBeGreaterThanOrEqual(2);
    expect(s.iterations).toBeLessThan(400);

    const below = stabilityTest(mx, r.z, dew.p * (1 - delta));
    expect(below.stable, 'just below the dew point').toBe(true);
    expect(below.tm).toBeGreaterThan(-1e-8);
    expect(stabilityTest(mx, r.z, dew.p * (1 - 5e-9)).stable).toBe(true);
  });
});

describe('stabilityTest where both trial phases split the feed', () => {
  // Propane/n-butane 50/50 at 400 K, a few kelvin below its critical point: between about 4.10
  // and 4.14 MPa both the vapour-like and the liquid-like trial end below the tangent plane.
  it.each([4.1e6, 4.12e6])('at 400 K, %f Pa the K are those of the lower stationary point', (p) => {
    const r = product('binary');
    const mx = mixtureAtT(r, 400);
    const s = stabilityTest(mx, r.z, p);
    expect(s.stable).toBe(false);
    expect(s.tm).toBeLessThan(-1e-8);
    // The returned K belong to the reported (lowest) tm: stationarity with that tm.
    expectStationaryTrial(mx, r.z, p, s.K!, s.tm);
  });
});

describe('stabilityTest where a trial phase converges slowly', () => {
  it('at 401 K, 4.20 MPa (near the critical point) each trial stops at its 200-step cap', () => {
    // Substitution converges linearly with a ratio that tends to 1 at the critical point; the
    // documented cap bounds the work at 2 × 200 steps, and the finished trial still decides.
    const r = product('binary');
    const p = 4.2e6;
    const mx = mixtureAtT(r, 401);
    const s = stabilityTest(mx, r.z, p);
    expect(s.iterations).toBeLessThanOrEqual(400);
    expect(s.stable).toBe(false);
    expectStationaryTrial(mx, r.z, p, s.K!, s.tm);
  });
});

describe('stabilityTest mid-envelope and for a pure fluid', () => {
  it.each([
    ['binary', 300, 0.2],
    ['binary', 300, 0.8],
    ['ternary', 250, 0.5],
  ] as const)('%s at %f K, %f of the way from dew to bubble: a stationary split', (name, T, f) => {
    const r = product(name);
    const mx = mixtureAtT(r, T);
    const bub = saturationPressure(mx, r.z, 'bubble').p;
    const dew = saturationPressure(mx, r.z, 'dew').p;
    const p = dew + f * (bub - dew);
    const s = stabilityTest(mx, r.z, p);
    expect(s.stable).toBe(false);
    expect(s.tm).toBeLessThan(-1e-3);
    expectStationaryTrial(mx, r.z, p, s.K!, s.tm);
    // The lightest component (propane, or ethane in the ternary) leans to the vapour side,
    // the heaviest (n-butane, last) to the liquid side.
    expect(s.K![name === 'binary' ? 0 : 1]!).toBeGreaterThan(1);
    expect(s.K![mx.n - 1]!).toBeLessThan(1);
  });

  it('a pure fluid has no other stationary point: stable, tm = 0, no steps', () => {
    const r = resolveProduct('propane');
    expect(stabilityTest(mixtureAtT(r, 300), [1], 1e6)).toEqual({
      stable: true,
      tm: 0,
      iterations: 0,
    });
  });
});
