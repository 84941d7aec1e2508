/**
 * Types of the container that the rules, the tank geometry and the check share. They sit here,
 * below all three, so the imports run one way: check → rules → types, check → tank → types.
 */

/** Where the container sits. A partly buried container counts as aboveground (29 CFR 1910.110(d)(7)(iv)(e)). */
export type Placement = 'aboveground' | 'underground';

/**
 * The class of container, which picks the filling-density rule:
 * - `storage`: a stationary (ASME) storage container, 29 CFR 1910.110 / 1910.111;
 * - `cylinder`: a DOT specification cylinder, 49 CFR 173.304a;
 * - `cargo`: a DOT cargo tank, 49 CFR 173.315;
 * - `portable`: a DOT portable tank, 49 CFR 173.315 (same tables as cargo tanks).
 */
export type ContainerClass = 'storage' | 'cylinder' | 'cargo' | 'portable';

/** Head shape of a cylindrical tank. `ellipsoidal` is the 2:1 semi-ellipsoidal head (depth = D/4). */
export type HeadKind = 'hemispherical' | 'ellipsoidal' | 'flat';

/** Inside dimensions, needed only to turn a level height into a volume. */
export type TankShape =
  | {
      kind: 'horizontal-cylinder';
      heads: HeadKind;
      /** Inside diameter, m. */
      diameter: number;
      /** Straight shell length between the head tangent lines, m (0 for a hemispherical-headed tank means a sphere). */
      shellLength: number;
    }
  | {
      kind: 'vertical-cylinder';
      heads: HeadKind;
      /** Inside diameter, m. */
      diameter: number;
      /** Straight shell height between the head tangent lines, m. */
      shellLength: number;
    }
  | {
      kind: 'sphere';
      /** Inside diameter, m. */
      diameter: number;
    };
