/**
 * When an invented demo record becomes the user's own. A demo tank the user edited and saved,
 * or checked and saved a check on, is theirs: it loses its demo mark and "Clear the demo
 * tanks" never touches it. Plain functions, used by the shell and by storage.
 */
import type { CheckRecord, TankRecord } from '../components/types.js';

/** The tank as saved from the tank form: an edited demo tank is the user's own from now on. */
export function savedByUser(tank: TankRecord, now: string): TankRecord {
  return { ...tank, demo: false, updatedAt: now };
}

/**
 * A check the user saves, and the tank to store with it when the check makes a demo tank the
 * user's own (null when the tank needs no change).
 */
export function claimByCheck(
  tank: TankRecord | undefined,
  check: CheckRecord,
  now: string,
): { check: CheckRecord; tank: TankRecord | null } {
  if (!tank?.demo) return { check, tank: null };
  return { check: { ...check, demo: false }, tank: { ...tank, demo: false, updatedAt: now } };
}

/**
 * True for a demo tank the user has not made their own: still marked demo, never saved after
 * it was created (older versions kept the mark on edited demo tanks), and no check of the
 * user's on it.
 */
export function isClearableDemo(tank: TankRecord, checksOfTank: readonly CheckRecord[]): boolean {
  return tank.demo && tank.updatedAt === tank.createdAt && checksOfTank.every((c) => c.demo);
}
