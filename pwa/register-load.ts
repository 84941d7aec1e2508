/**
 * Loading a register of thousands of tanks: the list needs the tanks and only each tank's newest
 * check in brief (store `latestChecks`, schema v4), so those come first; every saved check (for a
 * tank's history, the site board, the CSV) is read after, in batches with a pause between them so
 * the page keeps answering taps and scrolls meanwhile. An older read overtaken by a newer one (a
 * save while the last read was still running) is dropped.
 */
import type { CheckBrief, CheckRecord, TankRecord } from '../components/types.js';
import { table } from './lookups.js';
import type { Store } from './storage.js';

const reads = new WeakMap<Store, number>();

/** Checks read per batch. */
const BATCH = 500;

export interface RegisterHead {
  tanks: TankRecord[];
  /** Newest check per tank id, in brief (a prototype-free table). */
  last: Record<string, CheckBrief | undefined>;
}

/** The tanks and each one's newest check. */
export async function loadRegisterHead(store: Store): Promise<RegisterHead> {
  const [tanks, latest] = await Promise.all([store.listTanks(), store.latestChecks()]);
  const last = table<CheckBrief>();
  for (const c of latest) last[c.tankId] = c;
  return { tanks, last };
}

const pause = () => new Promise<void>((done) => setTimeout(done, 0));

/**
 * Reads every check, newest first, and hands them to `done` unless a newer read started. With
 * `gently`, one batch at a time with a pause between (start-up: the list is on screen already).
 * Never rejects.
 */
export async function loadChecksLater(
  store: Store,
  done: (checks: CheckRecord[]) => void,
  gently = false,
): Promise<void> {
  const n = (reads.get(store) ?? 0) + 1;
  reads.set(store, n);
  let checks: CheckRecord[];
  try {
    if (!gently) checks = await store.listChecks();
    else {
      checks = [];
      for (let after: string | null = null; ;) {
        await pause();
        if (reads.get(store) !== n) return;
        const batch = await store.checksAfter(after, BATCH);
        checks.push(...batch);
        if (batch.length < BATCH) break;
        after = batch[batch.length - 1]!.id;
      }
      checks.sort((a, b) => (a.at < b.at ? 1 : a.at > b.at ? -1 : 0));
    }
  } catch {
    return; // the database closed meanwhile (another tab upgrading): keep what is shown
  }
  if (reads.get(store) === n) done(checks);
}
