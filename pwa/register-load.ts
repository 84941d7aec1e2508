/**
 * Loading a register of thousands of tanks: the list needs the tanks and only each tank's newest
 * check (store `latestChecks`, schema v4), so those come first; every saved check (for a tank's
 * history, the site board, the CSV) is read after, off the list's way. An older read overtaken by
 * a newer one (a save while the last read was still running) is dropped.
 */
import type { CheckRecord, TankRecord } from '../components/types.js';
import { lastCheckByTank } from './lookups.js';
import type { Store } from './storage.js';

const reads = new WeakMap<Store, number>();

export interface RegisterHead {
  tanks: TankRecord[];
  /** Newest check per tank id (a prototype-free table). */
  last: Record<string, CheckRecord | undefined>;
}

/** The tanks and each one's newest check. */
export async function loadRegisterHead(store: Store): Promise<RegisterHead> {
  const [tanks, latest] = await Promise.all([store.listTanks(), store.latestChecks()]);
  return { tanks, last: lastCheckByTank(latest) };
}

/**
 * Reads every check, newest first, and hands them to `done` unless a newer read started. Never
 * rejects.
 */
export async function loadChecksLater(
  store: Store,
  done: (checks: CheckRecord[]) => void,
): Promise<void> {
  const n = (reads.get(store) ?? 0) + 1;
  reads.set(store, n);
  let checks: CheckRecord[];
  try {
    checks = await store.listChecks();
  } catch {
    return; // the database closed meanwhile (another tab upgrading): keep what is shown
  }
  if (reads.get(store) === n) done(checks);
}
