/**
 * The mixture solvers (solvers/flash.ts, stability.ts, bubbleDew.ts, mixtureModel.ts) against
 * quantities computed outside them: Rachford–Rice on phases chosen by hand, the flash's mass
 * balance recomputed from its phases, equal fugacity from the fugacity function (`phaseAt`, not
 * the solver's own K), ln φ_i as the composition derivative of the residual Gibbs energy
 * (finite differences), and the GERG-2008 bubble pressures of test/reference/bubble.csv.
 */
import { describe, expect, it } from 'vitest';
import { compressibilityRoots, logTerm } from '../../thermo/eos/cubic.js';
import { resolveProduct } from '../../thermo/product.js';
import {
  flashPT,
  mixtureAtT,
  phaseAt,
  rachfordRice,
  saturationPressure,
  stabilityTest,
} from '../../thermo/solvers/mixture.js';
import { R_J_molK as R } from '../../thermo/constants.js';
import { checkClose } from '../helpers/check.js';
import { readTable } from '../reference/measure.js';

const GERG =
  'GERG-2008 (Kunz & Wagner 2012, J. Chem. Eng. Data 57, 3032) via test/reference/bubble.csv';
const bubbleRows = readTable('bubble.csv');
const gergBubble = (name: string, T: number) =>
  +bubbleRows.find((r) => r.mixture === name && Math.abs(+r.T_K! - T) < 0.01)!.p_bubble_Pa!;

const binary = resolveProduct({
  components: [
    { id: 'propane', moleFraction: 0.5 },
    { id: 'n-butane', moleFraction: 0.5 },
  ],
});
const ternary = resolveProduct({
  components: [
    { id: 'propane', moleFraction: 0.6 },
    { id: 'ethane', moleFraction: 0.1 },
    { id: 'n-butane', moleFraction: 0.3 },
  ],
});

/** Equal fugacity of every component, from the fugacity function at the returned phases. */
function expectEqualFugacity(
  mx: ReturnType<typeof mixtureAtT>,
  p: number,
  x: ArrayLike<number>,
  y: ArrayLike<number>,
  tol: number,
) {
  const L = phaseAt(mx, p, x, 'liquid');
  const V = phaseAt(mx, p, y, 'vapour');
  expect(V.Z - L.Z, 'distinct roots').toBeGreaterThan(0.05);
  for (let i = 0; i < mx.n; i++) {
    const d = Math.log(x[i]!) + L.lnPhi[i]! - Math.log(y[i]!) - V.lnPhi[i]!;
    expect(Math.abs(d), `Δ ln f_${i}`).toBeLessThan(tol);
  }
}

describe('rachfordRice', () => {
  it.each([
    ['binary', [0.3, 0.7], [0.8, 0.2], 0.35],
    ['ternary', [0.1, 0.3, 0.6], [0.5, 0.35, 0.15], 0.8],
    ['ternary, little vapour', [0.05, 0.25, 0.7], [0.4, 0.4, 0.2], 0.02],
  ] as const)('recovers the vapour fraction of phases chosen by hand (%s)', (_, x, y, beta) => {
    // z = (1 − β)x + βy and K = y/x define a problem whose root is β (mass balance).
    const z = x.map((xi, i) => (1 - beta) * xi + beta * y[i]!);
    const K = x.map((xi, i) => y[i]! / xi);
    checkClose({
      what: 'β',
      input: { x, y },
      actual: rachfordRice(z, K),
      expected: beta,
      atol: 1e-13,
      kind: 'identity',
      source: 'component mass balance z = (1 − β)x + βy',
    });
  });

  it('clips to one phase outside the two-phase window', () => {
    // Σz(K − 1) ≤ 0: the feed is at or below its bubble point (all liquid).
    expect(rachfordRice([0.5, 0.5], [0.5, 0.8])).toBe(0);
    expect(rachfordRice([0.5, 0.5], [1.5, 0.5])).toBe(0); // Σ z(K−1) = 0 exactly: bubble point
    // Σ z(1 − 1/K) ≥ 0: at or above its dew point (all vapour).
    expect(rachfordRice([0.5, 0.5], [2, 3])).toBe(1);
    // Σ z/K = 1 (dew point; 2/3 is not exact in binary, so β is 1 to rounding)
    expect(rachfordRice([0.5, 0.5], [2, 2 / 3])).toBeGreaterThan(1 - 1e-12);
  });
});

describe('flashPT', () => {
  const T = 300;
  const mx = mixtureAtT(ternary, T);
  const bub = saturationPressure(mx, ternary.z, 'bubble');
  const dew = saturationPressure(mx, ternary.z, 'dew');

  it.each([0.1, 0.5, 0.9])(
    'between dew and bubble (at dew + %f of the way) closes the mass balance with equal fugacities',
    (frac) => {
      const p = dew.p + frac * (bub.p - dew.p);
      const f = flashPT(mx, ternary.z, p);
      expect(f.converged).toBe(true);
      expect(f.residual).toBeLessThan(1e-10);
      expect(f.iterations).toBeGreaterThan(1);
      expect(f.beta).toBeGreaterThan(0);
      expect(f.beta).toBeLessThan(1);
      expectEqualFugacity(mx, p, f.x, f.y, 1e-8);
      let sx = 0;
      let sy = 0;
      ternary.z.forEach((zi, i) => {
        sx += f.x[i]!;
        sy += f.y[i]!;
        checkClose({
          what: 'component balance',
          input: { p, i },
          actual: (1 - f.beta) * f.x[i]! + f.beta * f.y[i]!,
          expected: zi,
          rtol: 1e-9,
          kind: 'identity',
          source: 'mass balance recomputed from the returned phases',
        });
      });
      expect(Math.abs(sx - 1)).toBeLessThan(1e-12);
      expect(Math.abs(sy - 1)).toBeLessThan(1e-12);
      // The volumes are those of the returned phases' own roots.
      checkClose({
        what: 'liquid volume',
        input: { p },
        actual: f.vL,
        expected: phaseAt(mx, p, f.x, 'liquid').v,
        rtol: 1e-12,
        kind: 'identity',
        source: 'phaseAt at the liquid composition',
      });
      checkClose({
        what: 'vapour volume',
        input: { p },
        actual: f.vV,
        expected: phaseAt(mx, p, f.y, 'vapour').v,
        rtol: 1e-12,
        kind: 'identity',
        source: 'phaseAt at the vapour composition',
      });
    },
  );

  it('β moves from 0 at the bubble point to 1 at the dew point (lever rule limits)', () => {
    const near = flashPT(mx, ternary.z, bub.p * (1 - 1e-4));
    const far = flashPT(mx, ternary.z, dew.p * (1 + 1e-4));
    expect(near.beta).toBeLessThan(0.01);
    expect(far.beta).toBeGreaterThan(0.99);
    // At the bubble point the vapour is the incipient phase of saturationPressure.
    near.y.forEach((yi, i) => expect(Math.abs(yi - bub.incipient[i]!)).toBeLessThan(2e-3));
  });

  it('gives the same phases from a start near the answer, in fewer steps', () => {
    const p = 0.5 * (bub.p + dew.p);
    const cold = flashPT(mx, ternary.z, p);
    const warm = flashPT(mx, ternary.z, p, cold.K);
    expect(warm.iterations).toBeLessThan(cold.iterations);
    expect(Math.abs(warm.beta - cold.beta)).toBeLessThan(1e-9);
  });
});

describe('stabilityTest', () => {
  it('a pure fluid is always one phase to the test', () => {
    const r = resolveProduct('propane');
    expect(stabilityTest(mixtureAtT(r, 300), [1], 1e6).stable).toBe(true);
  });

  it.each([253.15, 293.15, 313.15])(
    'propane/n-butane at %f K: stable above the GERG bubble pressure and well below the dew, unstable between',
    (T) => {
      const mx = mixtureAtT(binary, T);
      const pb = gergBubble('propane0.50+n-butane0.50', T);
      expect(stabilityTest(mx, binary.z, pb * 1.05).stable, 'compressed liquid').toBe(true);
      expect(stabilityTest(mx, binary.z, pb * 0.2).stable, 'superheated vapour').toBe(true);
      const dew = saturationPressure(mx, binary.z, 'dew').p;
      const p = Math.sqrt(pb * dew);
      const s = stabilityTest(mx, binary.z, p);
      expect(s.stable, 'inside the envelope').toBe(false);
      // Its K start a flash that splits the feed: the lighter component goes to the vapour.
      const f = flashPT(mx, binary.z, p, s.K);
      expect(f.beta).toBeGreaterThan(0.01);
      expect(f.beta).toBeLessThan(0.99);
      expect(s.K![0]!).toBeGreaterThan(1);
      expect(s.K![1]!).toBeLessThan(1);
      expectEqualFugacity(mx, p, f.x, f.y, 1e-8);
    },
  );

  it('finds the instability just inside the bubble and the dew point', () => {
    const mx = mixtureAtT(ternary, 300);
    const bub = saturationPressure(mx, ternary.z, 'bubble').p;
    const dew = saturationPressure(mx, ternary.z, 'dew').p;
    expect(stabilityTest(mx, ternary.z, bub * 0.97).stable).toBe(false);
    expect(stabilityTest(mx, ternary.z, dew * 1.03).stable).toBe(false);
    expect(stabilityTest(mx, ternary.z, bub * 1.03).stable).toBe(true);
    expect(stabilityTest(mx, ternary.z, dew * 0.97).stable).toBe(true);
  });
});

describe('saturationPressure (bubble and dew)', () => {
  it.each([233.15, 273.15, 313.15, 333.15])(
    'propane/n-butane bubble pressure at %f K within 2 % of GERG-2008, with equal fugacities',
    (T) => {
      const mx = mixtureAtT(binary, T);
      const s = saturationPressure(mx, binary.z, 'bubble');
      checkClose({
        what: 'bubble pressure',
        input: { T },
        actual: s.p,
        expected: gergBubble('propane0.50+n-butane0.50', T),
        rtol: 0.02,
        kind: 'published',
        source: GERG,
      });
      expect(s.converged).toBe(true);
      expectEqualFugacity(mx, s.p, binary.z, s.incipient, 1e-8);
    },
  );

  it.each([250, 300, 340])(
    'dew point at %f K: equal fugacities, Σx = 1, below the bubble point',
    (T) => {
      const mx = mixtureAtT(ternary, T);
      const d = saturationPressure(mx, ternary.z, 'dew');
      const b = saturationPressure(mx, ternary.z, 'bubble');
      expect(d.p).toBeLessThan(b.p);
      expectEqualFugacity(mx, d.p, d.incipient, ternary.z, 1e-8);
      expect(Math.abs(d.incipient.reduce((s, v) => s + v, 0) - 1)).toBeLessThan(1e-12);
      // The incipient liquid is richer in the heaviest component than the feed.
      expect(d.incipient[2]!).toBeGreaterThan(ternary.z[2]!);
      checkClose({
        what: 'dew vapour volume',
        input: { T },
        actual: d.vBulk,
        expected: phaseAt(mx, d.p, ternary.z, 'vapour').v,
        rtol: 1e-12,
        kind: 'identity',
        source: 'phaseAt at the feed',
      });
      checkClose({
        what: 'dew liquid volume',
        input: { T },
        actual: d.vIncipient,
        expected: phaseAt(mx, d.p, d.incipient, 'liquid').v,
        rtol: 1e-12,
        kind: 'identity',
        source: 'phaseAt at the incipient composition',
      });
    },
  );

  it('a start at the answer returns it at once', () => {
    const mx = mixtureAtT(ternary, 300);
    const cold = saturationPressure(mx, ternary.z, 'bubble');
    const warm = saturationPressure(mx, ternary.z, 'bubble', {
      p: cold.p,
      K: Float64Array.from(cold.incipient, (y, i) => y / ternary.z[i]!),
    });
    expect(warm.iterations).toBeLessThanOrEqual(2);
    expect(Math.abs(warm.p / cold.p - 1)).toBeLessThan(1e-9);
  });

  it('above the cricondentherm there is no dew point: ConvergenceError', () => {
    // Propane-rich blend at 420 K: above every component's critical point except n-butane's
    // (425 K) and above the blend's critical region.
    const mx = mixtureAtT(binary, 420);
    expect(() => saturationPressure(mx, binary.z, 'dew')).toThrow(/dew pressure/);
    expect(() => saturationPressure(mx, binary.z, 'bubble')).toThrow(/bubble pressure/);
  });
});

describe('phaseAt: ln φ_i = ∂(n·g_res)/∂n_i (finite differences of the residual Gibbs energy)', () => {
  /** g_res from the one-fluid rule written out here: a = ΣΣ x_i x_j √(a_i a_j)(1 − k_ij). */
  function gRes(
    mx: ReturnType<typeof mixtureAtT>,
    p: number,
    nv: number[],
    root: 'liquid' | 'vapour',
  ) {
    const r = mx.product;
    const sum = nv.reduce((s, v) => s + v, 0);
    const x = nv.map((v) => v / sum);
    const ai = r.components.map((m) => m.ac * m.alpha(mx.T).alpha);
    const t = mx.T / 298.15 - 1; // T_REF of data/kij.ts
    let a = 0;
    let b = 0;
    for (let i = 0; i < mx.n; i++) {
      b += x[i]! * r.components[i]!.b;
      for (let j = 0; j < mx.n; j++) {
        const k =
          (r.kij[i]?.[j] ?? 0) +
          t * (r.kijSlope?.[i]?.[j] ?? 0) +
          t * t * (r.kijCurve?.[i]?.[j] ?? 0);
        a += x[i]! * x[j]! * Math.sqrt(ai[i]! * ai[j]!) * (1 - k);
      }
    }
    const A = (a * p) / (R * R * mx.T * mx.T);
    const B = (b * p) / (R * mx.T);
    const fam = r.components[0]!.family;
    const roots = compressibilityRoots(fam, A, B);
    const Z = root === 'liquid' ? roots[0]! : roots.at(-1)!;
    return Z - 1 - Math.log(Z - B) - (A / B) * logTerm(fam, Z, B);
  }

  it.each([
    ['ternary liquid', ternary, 280, 2e6, 'liquid'],
    ['ternary vapour', ternary, 320, 3e5, 'vapour'],
    ['R-407C liquid (fitted k_ij(T))', resolveProduct('r407c'), 260, 2e6, 'liquid'],
  ] as const)('%s', (_, prod, T, p, root) => {
    const mx = mixtureAtT(prod, T);
    const x = [...prod.z];
    const ph = phaseAt(mx, p, x, root);
    for (let i = 0; i < mx.n; i++) {
      const h = 1e-5;
      const up = x.map((v, k) => (k === i ? v + h : v));
      const dn = x.map((v, k) => (k === i ? v - h : v));
      const fd =
        (up.reduce((s, v) => s + v, 0) * gRes(mx, p, up, root) -
          dn.reduce((s, v) => s + v, 0) * gRes(mx, p, dn, root)) /
        (2 * h);
      checkClose({
        what: `ln φ_${i}`,
        input: { T, p, root },
        actual: ph.lnPhi[i]!,
        expected: fd,
        atol: 1e-7,
        kind: 'identity',
        source: 'ln φ_i = ∂(n·G_res/RT)/∂n_i at constant T, p; central difference h = 1e-5 mol',
      });
    }
    expect(ph.v).toBeGreaterThan(0);
    checkClose({
      what: 'cubic volume',
      input: { T, p },
      actual: ph.vCub,
      expected: (ph.Z * R * T) / p,
      rtol: 1e-14,
      kind: 'identity',
      source: 'Z = p·v/(R·T)',
    });
  });

  it('`stable` picks the liquid root above the GERG bubble pressure and the vapour root well below', () => {
    const T = 273.15;
    const mx = mixtureAtT(binary, T);
    const pb = gergBubble('propane0.50+n-butane0.50', T);
    // Pressures where the cubic has three roots for this feed: check, then compare with the
    // liquid and vapour roots asked for by name.
    for (const [p, want] of [
      [pb * 1.1, 'liquid'],
      [pb * 0.45, 'vapour'],
    ] as const) {
      const st = phaseAt(mx, p, binary.z, 'stable');
      expect(st.nRoots, `three roots at ${p}`).toBe(3);
      expect(st.Z).toBe(phaseAt(mx, p, binary.z, want).Z);
    }
  });
});
