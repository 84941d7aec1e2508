import { describe, it, expect } from 'vitest';
import type { TankShape } from '../../thermo/check/types.js';
import { InputError } from '../../thermo/errors.js';
import {
  fractionAtLevel,
  levelAtFraction,
  tankHeight,
  totalVolume,
  validateShape,
  volumeAtLevel,
} from '../../thermo/tank/geometry.js';
import { expectRel, expectWithin } from './check-helpers.js';

// Closed forms written independently of the code (angle form of the segment):
//   segment area = R²(θ − sin θ)/2, θ = 2·acos((R − h)/R); sphere cap = π h² (3R − h)/3.
// Source: elementary geometry (any calculus text); the code uses the acos/sqrt form.
const seg = (R: number, h: number) => {
  const th = 2 * Math.acos((R - h) / R);
  return (R * R * (th - Math.sin(th))) / 2;
};
const cap = (R: number, h: number) => (Math.PI * h * h * (3 * R - h)) / 3;
const GEOM = 'closed-form solid geometry (segment and cap volumes)';

describe('volumeAtLevel, horizontal cylinder', () => {
  const R = 1;
  const L = 5;
  for (const heads of ['hemispherical', 'ellipsoidal', 'flat'] as const) {
    const k = heads === 'hemispherical' ? 1 : heads === 'ellipsoidal' ? 0.5 : 0;
    const shape: TankShape = {
      kind: 'horizontal-cylinder',
      heads,
      diameter: 2 * R,
      shellLength: L,
    };
    for (const frac of [0.25, 0.5, 0.75]) {
      it(`volumeAtLevel matches the closed form at ${frac * 100} % height with ${heads} heads`, () => {
        const h = frac * 2 * R;
        const expected = L * seg(R, h) + k * cap(R, h);
        // published (closed form): exact formula, floating point only → rtol 1e-12
        expectRel(volumeAtLevel(shape, h), expected, 1e-12, {
          input: { heads, h },
          source: GEOM,
          kind: 'published',
        });
      });
    }
    it(`totalVolume is πR²L + k·4/3·πR³ with ${heads} heads`, () => {
      expectRel(totalVolume(shape), Math.PI * R * R * L + (k * 4 * Math.PI * R ** 3) / 3, 1e-12, {
        input: heads,
        source: GEOM,
        kind: 'published',
      });
    });
    it(`volumeAtLevel(h) + volumeAtLevel(H − h) = total with ${heads} heads`, () => {
      for (const h of [0.1, 0.37, 0.9]) {
        // identity: mirror symmetry of a horizontal tank → 1e-12 relative
        expectRel(
          volumeAtLevel(shape, h) + volumeAtLevel(shape, 2 * R - h),
          totalVolume(shape),
          1e-12,
          { input: { heads, h }, source: 'mirror symmetry', kind: 'identity' },
        );
      }
    });
  }

  it('fractionAtLevel of a flat-headed cylinder matches the circular-segment table', () => {
    // from memory: ratio of segment area to circle area vs h/D, printed to 4 decimals in the
    // usual handbook tables (e.g. Machinery's Handbook, "segments of circles") → atol 1e-4.
    const shape: TankShape = {
      kind: 'horizontal-cylinder',
      heads: 'flat',
      diameter: 1,
      shellLength: 3,
    };
    const table: [number, number][] = [
      [0.1, 0.052],
      [0.2, 0.1424],
      [0.3, 0.2523],
      [0.4, 0.3735],
    ];
    for (const [hd, f] of table) {
      expectWithin(fractionAtLevel(shape, hd), f, 1e-4, {
        input: `h/D ${hd}`,
        source: 'circular segment area table (from memory)',
        kind: 'published',
      });
    }
  });
});

describe('volumeAtLevel, sphere and vertical cylinder', () => {
  it('volumeAtLevel of a sphere is the spherical cap at 25/50/75 % height', () => {
    const shape: TankShape = { kind: 'sphere', diameter: 4 };
    for (const frac of [0.25, 0.5, 0.75]) {
      const h = frac * 4;
      expectRel(volumeAtLevel(shape, h), cap(2, h), 1e-12, {
        input: { sphere: 4, h },
        source: GEOM,
        kind: 'published',
      });
    }
    // published: V(25 %) = π·1²·(6 − 1)/3 = 5π/3 of a 4 m sphere; exactly 5/32 of the total.
    expectRel(fractionAtLevel(shape, 1), 5 / 32, 1e-12, {
      input: '25 % height',
      source: GEOM,
      kind: 'published',
    });
  });

  it('a horizontal tank with hemispherical heads and no shell is a sphere', () => {
    const a: TankShape = {
      kind: 'horizontal-cylinder',
      heads: 'hemispherical',
      diameter: 3,
      shellLength: 0,
    };
    const b: TankShape = { kind: 'sphere', diameter: 3 };
    for (const h of [0.2, 1.5, 2.7])
      expectRel(volumeAtLevel(a, h), volumeAtLevel(b, h), 1e-12, {
        input: h,
        source: 'same solid',
        kind: 'identity',
      });
  });

  for (const heads of ['hemispherical', 'ellipsoidal', 'flat'] as const) {
    it(`volumeAtLevel of a vertical cylinder with ${heads} heads adds head, shell and head`, () => {
      const D = 2;
      const R = 1;
      const L = 4;
      const shape: TankShape = { kind: 'vertical-cylinder', heads, diameter: D, shellLength: L };
      const d = heads === 'hemispherical' ? R : heads === 'ellipsoidal' ? R / 2 : 0;
      const head = (2 / 3) * Math.PI * R * R * d;
      expect(tankHeight(shape)).toBeCloseTo(L + 2 * d, 12);
      // identity: level at the top of the bottom head holds one head; at the top of the shell, head + shell
      expectWithin(volumeAtLevel(shape, d), head, 1e-12, {
        input: { heads, h: d },
        source: GEOM,
        kind: 'identity',
      });
      expectRel(volumeAtLevel(shape, d + L), head + Math.PI * R * R * L, 1e-12, {
        input: { heads, h: d + L },
        source: GEOM,
        kind: 'identity',
      });
      expectRel(volumeAtLevel(shape, 2 * d + L), totalVolume(shape), 1e-12, {
        input: { heads, full: true },
        source: GEOM,
        kind: 'identity',
      });
      if (heads === 'hemispherical') {
        // published: a hemispherical bottom filled to h < R holds a spherical cap
        expectRel(volumeAtLevel(shape, 0.4), cap(R, 0.4), 1e-12, {
          input: { heads, h: 0.4 },
          source: GEOM,
          kind: 'published',
        });
      }
      // identity: mid-height of a symmetric vessel holds half
      expectRel(fractionAtLevel(shape, (2 * d + L) / 2), 0.5, 1e-12, {
        input: { heads, mid: true },
        source: 'symmetry',
        kind: 'identity',
      });
    });
  }
});

describe('levelAtFraction', () => {
  const shapes: TankShape[] = [
    { kind: 'horizontal-cylinder', heads: 'ellipsoidal', diameter: 1.2, shellLength: 4 },
    { kind: 'vertical-cylinder', heads: 'ellipsoidal', diameter: 1, shellLength: 2 },
    { kind: 'sphere', diameter: 10 },
  ];
  it('levelAtFraction inverts fractionAtLevel', () => {
    for (const s of shapes) {
      for (const f of [0, 0.01, 0.2, 0.5, 0.8, 0.99, 1]) {
        const h = levelAtFraction(s, f);
        // identity: inverse by bisection to 1e-9 of the height → fraction within 1e-8
        expectWithin(fractionAtLevel(s, h), f, 1e-8, {
          input: { s, f },
          source: 'inverse function',
          kind: 'identity',
        });
      }
    }
  });
  it('validateShape throws InputError naming the field', () => {
    expect(() => validateShape({ kind: 'cube' })).toThrow(/tank\.shape\.kind/);
    expect(() => validateShape({ kind: 'sphere', diameter: -1 })).toThrow(InputError);
    expect(() =>
      validateShape({ kind: 'horizontal-cylinder', heads: 'flat', diameter: 1, shellLength: 0 }),
    ).toThrow(/shellLength/);
  });
});
