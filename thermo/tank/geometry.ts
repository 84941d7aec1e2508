/**
 * Liquid volume in a tank as a function of the level height, and the inverse. Inside
 * dimensions in m, volumes in m³. Closed forms (any calculus text; e.g. Perry's Chemical
 * Engineers' Handbook, "tank volumes" — from memory):
 *
 * - Circular segment area at depth h in a circle of radius R:
 *     A(h) = R²·acos((R − h)/R) − (R − h)·√(2Rh − h²)
 * - Horizontal cylinder, shell length L: V = L·A(h), plus both heads, which together form a
 *   sphere (hemispherical heads) or a spheroid with semi-axes R, R, R/2 (2:1 ellipsoidal heads,
 *   depth R/2). A solid scaled by k along the (horizontal) tank axis holds k times the liquid of
 *   the unscaled one at the same level, so the heads hold k·π·h²·(3R − h)/3 with k = 1 or 1/2.
 * - Vertical cylinder: a head of depth d (R, R/2 or 0) at each end; the part of a spheroid
 *   of semi-axes R, R, d below a height t measured from its pole:
 *     Vcap(t) = π·R²·(t − ((t − d)³ + d³)/(3d²)),  0 ≤ t ≤ d.
 * - Sphere: V = π·h²·(3R − h)/3.
 * Valid for 0 ≤ h ≤ total inside height.
 */
import type { HeadKind, TankShape } from '../types.js';
import { InputError } from '../errors.js';

/** Depth of one head, m. */
export function headDepth(heads: HeadKind, diameter: number): number {
  if (heads === 'hemispherical') return diameter / 2;
  if (heads === 'ellipsoidal') return diameter / 4;
  return 0;
}

/** Checks a shape's fields; throws `InputError` naming `field.…`. */
export function validateShape(shape: unknown, field = 'tank.shape'): asserts shape is TankShape {
  if (!shape || typeof shape !== 'object')
    throw new InputError(field, 'an object { kind, diameter, … }', shape);
  const s = shape as Record<string, unknown>;
  const positive = (name: string, lo: number, hi: number) => {
    const x = s[name];
    if (typeof x !== 'number' || !Number.isFinite(x) || x < lo || x > hi) {
      throw new InputError(`${field}.${name}`, `a length from ${lo} to ${hi} m`, x, {
        min: lo,
        max: hi,
        quantity: 'length',
      });
    }
  };
  if (s.kind === 'sphere') {
    positive('diameter', 0.05, 50);
    return;
  }
  if (s.kind !== 'horizontal-cylinder' && s.kind !== 'vertical-cylinder') {
    throw new InputError(
      `${field}.kind`,
      "'horizontal-cylinder', 'vertical-cylinder' or 'sphere'",
      s.kind,
    );
  }
  if (s.heads !== 'hemispherical' && s.heads !== 'ellipsoidal' && s.heads !== 'flat') {
    throw new InputError(`${field}.heads`, "'hemispherical', 'ellipsoidal' or 'flat'", s.heads);
  }
  positive('diameter', 0.05, 20);
  positive('shellLength', 0, 200);
  if (s.heads === 'flat' && (s.shellLength as number) <= 0) {
    throw new InputError(`${field}.shellLength`, 'above 0 m for flat heads', s.shellLength, {
      min: 0,
      minExclusive: true,
      max: 200,
      quantity: 'length',
      note: 'for flat heads',
    });
  }
}

/** Total inside height of the tank (the span of the level gauge), m. */
export function tankHeight(shape: TankShape): number {
  if (shape.kind === 'vertical-cylinder')
    return shape.shellLength + 2 * headDepth(shape.heads, shape.diameter);
  return shape.diameter;
}

/** Total inside volume, m³. */
export function totalVolume(shape: TankShape): number {
  const R = shape.diameter / 2;
  if (shape.kind === 'sphere') return (4 / 3) * Math.PI * R ** 3;
  const d = headDepth(shape.heads, shape.diameter);
  return Math.PI * R * R * shape.shellLength + (4 / 3) * Math.PI * R * R * d;
}

function segmentArea(R: number, h: number): number {
  const t = Math.min(Math.max(h, 0), 2 * R);
  return (
    R * R * Math.acos(Math.min(1, Math.max(-1, (R - t) / R))) -
    (R - t) * Math.sqrt(Math.max(0, 2 * R * t - t * t))
  );
}

function sphereCap(R: number, h: number): number {
  const t = Math.min(Math.max(h, 0), 2 * R);
  return (Math.PI * t * t * (3 * R - t)) / 3;
}

/** Volume of a spheroid head (semi-axes R, R, d along the vertical) below height t from its pole. */
function headCap(R: number, d: number, t: number): number {
  if (d <= 0) return 0;
  const s = Math.min(Math.max(t, 0), d);
  return Math.PI * R * R * (s - ((s - d) ** 3 + d ** 3) / (3 * d * d));
}

/** Liquid volume at level height h (m above the inside bottom), m³. */
export function volumeAtLevel(shape: TankShape, h: number): number {
  const R = shape.diameter / 2;
  const H = tankHeight(shape);
  const level = Math.min(Math.max(h, 0), H);
  if (shape.kind === 'sphere') return sphereCap(R, level);
  const d = headDepth(shape.heads, shape.diameter);
  if (shape.kind === 'horizontal-cylinder') {
    const k = d / R; // 1 (hemispherical), 1/2 (2:1 ellipsoidal), 0 (flat)
    return shape.shellLength * segmentArea(R, level) + k * sphereCap(R, level);
  }
  const L = shape.shellLength;
  const bottom = headCap(R, d, level);
  const shell = Math.PI * R * R * Math.min(Math.max(level - d, 0), L);
  const halfHead = (2 / 3) * Math.PI * R * R * d;
  const top = level > d + L ? halfHead - headCap(R, d, d - (level - d - L)) : 0;
  return bottom + shell + top;
}

/** Liquid volume ÷ total volume at level h, fraction 0…1. */
export function fractionAtLevel(shape: TankShape, h: number): number {
  return volumeAtLevel(shape, h) / totalVolume(shape);
}

/** Level height, m, at which the tank holds `fraction` (0…1) of its volume. Bisection to 1e-9 of the height. */
export function levelAtFraction(shape: TankShape, fraction: number): number {
  const H = tankHeight(shape);
  const f = Math.min(Math.max(fraction, 0), 1);
  if (f === 0) return 0;
  if (f === 1) return H;
  const target = f * totalVolume(shape);
  let lo = 0;
  let hi = H;
  for (let i = 0; i < 80 && hi - lo > 1e-9 * H; i++) {
    const mid = 0.5 * (lo + hi);
    if (volumeAtLevel(shape, mid) < target) lo = mid;
    else hi = mid;
  }
  return 0.5 * (lo + hi);
}
