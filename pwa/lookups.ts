/**
 * Look-ups keyed by record ids. Ids come from stored data and imported files, so a look-up must
 * never reach an object built-in: an id such as `constructor`, `toString` or `__proto__` in a
 * plain `{}` would find Object.prototype's members and break the screen. These tables have no
 * prototype.
 */
import type { CheckRecord } from '../components/types.js';

/** A prototype-free table: only the keys put in it are there. */
export function table<V>(): Record<string, V | undefined> {
  return Object.create(null) as Record<string, V | undefined>;
}

/** The newest check of each tank (checks come newest first). */
export function lastCheckByTank(
  checks: readonly CheckRecord[],
): Record<string, CheckRecord | undefined> {
  const last = table<CheckRecord>();
  for (const c of checks) if (last[c.tankId] === undefined) last[c.tankId] = c;
  return last;
}
