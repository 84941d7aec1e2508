/**
 * Loading a register of thousands of tanks. Reading a record out of IndexedDB costs about the
 * same whatever its size, so at start-up the list's first screen comes first: the sites are read
 * from the tanks' site index (no tank read), then only the tanks of the first sites in the list's
 * order with their newest checks. Then every tank and each one's newest check in brief (store
 * `latestChecks`, schema v4), in batches, each read when the page is idle, so it keeps answering
 * taps and scrolls; then every saved check (for a tank's history, the site board, the CSV) the
 * same way. Nothing is kept between reads: each read is of the database as it is. A read
 * overtaken by a newer one (a save while the last read was still running) is dropped.
 */
import type { CheckBrief, CheckRecord, TankRecord } from '../components/types.js';
import { compareNames, siteLabel } from '../components/tank-rows.js';
import { idle } from '../components/idle.js';
import { table } from './lookups.js';
import type { Store } from './storage.js';

/** The latest read of the tanks and of the checks, per store. */
const heads = new WeakMap<Store, number>();
const reads = new WeakMap<Store, number>();

/** Records read per batch (a batch of checks is a few tens of ms on a slow phone). */
const BATCH = 200;
/** Tanks the first screen reads at least (a phone screen shows six to eight). */
export const FIRST_SCREEN = 24;

export interface RegisterHead {
  tanks: TankRecord[];
  /** Newest check per tank id, in brief (a prototype-free table). */
  last: Record<string, CheckBrief | undefined>;
}

/** Where a read puts what it found (the shell's state). */
export interface RegisterSink {
  /** The list's first screen (start-up only), before the whole register. */
  gotFirst(head: RegisterHead): void;
  gotHead(head: RegisterHead): void;
  gotChecks(checks: CheckRecord[]): void;
}

const headOf = (tanks: TankRecord[], latest: readonly CheckBrief[]): RegisterHead => {
  const last = table<CheckBrief>();
  for (const c of latest) last[c.tankId] = c;
  return { tanks, last };
};

/**
 * The tanks of the first sites in the list's order (every tank of each, so a site's count is
 * true) until there are at least `min`, with their newest checks: the list's first rows.
 */
export async function loadFirstScreen(store: Store, min = FIRST_SCREEN): Promise<RegisterHead> {
  const stored = new Map<string, string[]>(); // site heading → the sites stored under it
  for (const s of await store.tankSites()) {
    const list = stored.get(siteLabel(s));
    if (list) list.push(s);
    else stored.set(siteLabel(s), [s]);
  }
  const order = [...stored.keys()].sort(compareNames);
  const tanks: TankRecord[] = [];
  const latest: CheckBrief[] = [];
  for (let i = 0, n = 1; i < order.length && tanks.length < min; i += n, n *= 2) {
    const got = await store.tanksAt(order.slice(i, i + n).flatMap((h) => stored.get(h)!));
    tanks.push(...got.tanks);
    latest.push(...got.latest);
  }
  return headOf(tanks, latest);
}

/** The tanks and each one's newest check (in batches with pauses when `gently`). */
export async function loadRegisterHead(store: Store, gently = false): Promise<RegisterHead> {
  if (!gently) {
    const [tanks, latest] = await Promise.all([store.listTanks(), store.latestChecks()]);
    return headOf(tanks, latest);
  }
  const tanks = await inBatches((after) => store.recordsAfter('tanks', after, BATCH), idOf);
  const latest = await inBatches(
    (after) => store.recordsAfter('latestChecks', after, BATCH),
    tankOf,
  );
  return headOf(tanks, latest);
}

const idOf = (r: { id: string }) => r.id;
const tankOf = (r: { tankId: string }) => r.tankId;

/**
 * Reads a store whole, BATCH records at a time in key order, each when the page is idle (or
 * after a second at the latest), so a tap, a scroll or a new screen goes first.
 */
async function inBatches<T>(
  read: (after: string | null) => Promise<T[]>,
  keyOf: (r: T) => string,
): Promise<T[]> {
  const all: T[] = [];
  for (let after: string | null = null; ;) {
    await idle(1000);
    const batch = await read(after);
    all.push(...batch);
    if (batch.length < BATCH) return all;
    after = keyOf(batch[batch.length - 1]!);
  }
}

/**
 * Reads the register into `sink`. At start-up (`startUp`): the first screen, then (once it is
 * painted) the tanks gently, resolving with them; the checks follow. Otherwise the tanks and
 * every check at once, resolving when both are in. Never rejects; an overtaken read is dropped.
 */
export async function loadRegister(store: Store, sink: RegisterSink, startUp = false) {
  const n = (heads.get(store) ?? 0) + 1;
  heads.set(store, n);
  const current = () => heads.get(store) === n;
  try {
    const checks = startUp ? null : loadChecksLater(store, (c) => sink.gotChecks(c));
    if (startUp) {
      const first = await loadFirstScreen(store);
      if (!current()) return;
      sink.gotFirst(first);
      await idle(500); // the first rows are painted before the rest is read
    }
    const head = await loadRegisterHead(store, startUp);
    if (current()) sink.gotHead(head);
    if (checks) await checks;
    else void idle().then(() => loadChecksLater(store, (c) => sink.gotChecks(c), true));
  } catch {
    // the database closed meanwhile (another tab upgrading): keep what is shown
  }
}

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
      checks = await inBatches(async (after) => {
        if (reads.get(store) !== n) return [];
        return store.checksAfter(after, BATCH);
      }, idOf);
      checks.sort((a, b) => (a.at < b.at ? 1 : a.at > b.at ? -1 : 0));
    }
  } catch {
    return; // the database closed meanwhile (another tab upgrading): keep what is shown
  }
  if (reads.get(store) === n) done(checks);
}
