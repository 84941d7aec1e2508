/**
 * Keeps store `latestChecks` (the newest saved check of each tank, schema v4) true inside the
 * transaction that writes the checks, so the tank list can read 5,000 tanks' last checks without
 * reading every check.
 */
import type { IDBPTransaction, StoreNames } from 'idb';
import type { CheckRecord } from '../components/types.js';
import { briefOf, isNewer, type TanksideDB } from './storage-schema.js';

type Tx = IDBPTransaction<TanksideDB, StoreNames<TanksideDB>[], 'readwrite'>;

/** A check was written: it becomes its tank's latest if it is newer than the one kept. */
export async function noteCheck(tx: Tx, c: CheckRecord): Promise<void> {
  const latest = tx.objectStore('latestChecks');
  const had = await latest.get(c.tankId);
  if (!had || had.id === c.id || isNewer(c, had)) await latest.put(briefOf(c));
}

/** Checks of a tank were removed (or put back): its latest is read again from the checks. */
export async function refreshTank(tx: Tx, tankId: string): Promise<void> {
  const range = IDBKeyRange.bound([tankId, ''], [tankId, '\uffff']);
  const cursor = await tx.objectStore('checks').index('tankAt').openCursor(range, 'prev');
  if (cursor) await tx.objectStore('latestChecks').put(briefOf(cursor.value));
  else await tx.objectStore('latestChecks').delete(tankId);
}
