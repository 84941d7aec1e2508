/**
 * The one module that touches IndexedDB. Tanks, checks, drafts and settings, with a schema
 * version and one upgrade step per version.
 *
 * Schema history (each step in `UPGRADES` takes the database from version i to i + 1; a step,
 * once shipped, is never edited — a change is a new step):
 *   v1  stores `tanks` (key `id`, index `site`), `checks` (key `id`, index `tankId`),
 *       `drafts` (key `tankId`), `settings` (out-of-line keys: `settings`, `meta`).
 *   (v1) `Readings.takenAt`, an optional ISO time on a draft's or a check's readings, needs no
 *       step: records without it stay valid (components/reopen.ts uses `updatedAt` / `at`).
 *
 * Every write that must be all-or-nothing (delete a tank with its checks, import a backup,
 * clear) runs in a single transaction, so a failure leaves the stored data as it was.
 */
import {
  openDB,
  type DBSchema,
  type IDBPDatabase,
  type IDBPTransaction,
  type StoreNames,
} from 'idb';
import type { CheckRecord, DraftRecord, Settings, TankRecord } from '../components/types.js';
import { isClearableDemo } from './demo-own.js';

export const DB_NAME = 'tankside';
export const DB_VERSION = 1;

/** Bookkeeping that is not a user setting. */
export interface Meta {
  /** The demo site was created once; do not recreate it after the user clears it. */
  demoSeeded: boolean;
  /** The "works offline now" note was shown. */
  offlineNoteShown: boolean;
  /** Result of the last persistent-storage request, or null if never asked. */
  persisted: boolean | null;
}

export const DEFAULT_META: Meta = { demoSeeded: false, offlineNoteShown: false, persisted: null };

export interface TanksideDB extends DBSchema {
  tanks: { key: string; value: TankRecord; indexes: { site: string } };
  checks: { key: string; value: CheckRecord; indexes: { tankId: string } };
  drafts: { key: string; value: DraftRecord };
  settings: { key: string; value: unknown };
}

type UpgradeTx = IDBPTransaction<TanksideDB, StoreNames<TanksideDB>[], 'versionchange'>;
type UpgradeStep = (db: IDBPDatabase<TanksideDB>, tx: UpgradeTx) => void;

/** UPGRADES[i] upgrades a database at version i to version i + 1. */
export const UPGRADES: readonly UpgradeStep[] = [
  // 0 → 1: the first schema.
  (db) => {
    const tanks = db.createObjectStore('tanks', { keyPath: 'id' });
    tanks.createIndex('site', 'site');
    const checks = db.createObjectStore('checks', { keyPath: 'id' });
    checks.createIndex('tankId', 'tankId');
    db.createObjectStore('drafts', { keyPath: 'tankId' });
    db.createObjectStore('settings');
  },
];

if (UPGRADES.length !== DB_VERSION) throw new Error('storage: one upgrade step per schema version');

/**
 * Opens (and creates or upgrades) the database at `version`, running the steps from the stored
 * version up. Exported with a version argument so tests can build every earlier version.
 */
export async function openAtVersion(
  name: string,
  version: number,
): Promise<IDBPDatabase<TanksideDB>> {
  return openDB<TanksideDB>(name, version, {
    upgrade(db, oldVersion, newVersion, tx) {
      const to = newVersion ?? version;
      for (let v = oldVersion; v < to; v++) UPGRADES[v]!(db, tx);
    },
    blocked() {
      // Another tab holds an older version open; it closes itself on `versionchange` below.
    },
  });
}

/** All the user's data, as exported and imported. */
export interface DataSet {
  tanks: TankRecord[];
  checks: CheckRecord[];
  settings: Settings | null;
}

export class Store {
  private constructor(private readonly db: IDBPDatabase<TanksideDB>) {
    // A newer tab wants to upgrade: let it, rather than block it forever.
    db.addEventListener('versionchange', () => db.close());
  }

  static async open(name: string = DB_NAME): Promise<Store> {
    return new Store(await openAtVersion(name, DB_VERSION));
  }

  close(): void {
    this.db.close();
  }

  // ── tanks ──────────────────────────────────────────────────────────────────────────────
  async listTanks(): Promise<TankRecord[]> {
    return this.db.getAll('tanks');
  }

  async getTank(id: string): Promise<TankRecord | undefined> {
    return this.db.get('tanks', id);
  }

  async putTank(tank: TankRecord): Promise<void> {
    await this.db.put('tanks', tank);
  }

  /** Deletes a tank with its checks and draft; returns what was removed so it can be restored (undo). */
  async deleteTank(
    id: string,
  ): Promise<{ tank: TankRecord; checks: CheckRecord[]; draft: DraftRecord | undefined } | null> {
    const tx = this.db.transaction(['tanks', 'checks', 'drafts'], 'readwrite');
    const tank = await tx.objectStore('tanks').get(id);
    if (!tank) {
      await tx.done;
      return null;
    }
    const checks = await tx.objectStore('checks').index('tankId').getAll(id);
    const draft = await tx.objectStore('drafts').get(id);
    await tx.objectStore('tanks').delete(id);
    for (const c of checks) await tx.objectStore('checks').delete(c.id);
    await tx.objectStore('drafts').delete(id);
    await tx.done;
    return { tank, checks, draft };
  }

  /** Puts back what `deleteTank` removed. */
  async restoreTank(removed: {
    tank: TankRecord;
    checks: CheckRecord[];
    draft: DraftRecord | undefined;
  }): Promise<void> {
    const tx = this.db.transaction(['tanks', 'checks', 'drafts'], 'readwrite');
    await tx.objectStore('tanks').put(removed.tank);
    for (const c of removed.checks) await tx.objectStore('checks').put(c);
    if (removed.draft) await tx.objectStore('drafts').put(removed.draft);
    await tx.done;
  }

  // ── checks ─────────────────────────────────────────────────────────────────────────────
  /** Checks of one tank (or all), newest first. */
  async listChecks(tankId?: string): Promise<CheckRecord[]> {
    const list =
      tankId === undefined
        ? await this.db.getAll('checks')
        : await this.db.getAllFromIndex('checks', 'tankId', tankId);
    return list.sort((a, b) => (a.at < b.at ? 1 : a.at > b.at ? -1 : 0));
  }

  async putCheck(check: CheckRecord): Promise<void> {
    await this.db.put('checks', check);
  }

  async deleteCheck(id: string): Promise<void> {
    await this.db.delete('checks', id);
  }

  // ── drafts ─────────────────────────────────────────────────────────────────────────────
  async getDraft(tankId: string): Promise<DraftRecord | undefined> {
    return this.db.get('drafts', tankId);
  }

  async putDraft(draft: DraftRecord): Promise<void> {
    await this.db.put('drafts', draft);
  }

  async deleteDraft(tankId: string): Promise<void> {
    await this.db.delete('drafts', tankId);
  }

  // ── settings and meta ──────────────────────────────────────────────────────────────────
  async getSettings(): Promise<Settings | null> {
    return ((await this.db.get('settings', 'settings')) as Settings | undefined) ?? null;
  }

  async putSettings(settings: Settings): Promise<void> {
    await this.db.put('settings', settings, 'settings');
  }

  async getMeta(): Promise<Meta> {
    const m = (await this.db.get('settings', 'meta')) as Partial<Meta> | undefined;
    return { ...DEFAULT_META, ...m };
  }

  async putMeta(meta: Meta): Promise<void> {
    await this.db.put('settings', meta, 'meta');
  }

  // ── whole data set ─────────────────────────────────────────────────────────────────────
  async exportAll(): Promise<DataSet> {
    const tx = this.db.transaction(['tanks', 'checks', 'settings'], 'readonly');
    const [tanks, checks, settings] = await Promise.all([
      tx.objectStore('tanks').getAll(),
      tx.objectStore('checks').getAll(),
      tx.objectStore('settings').get('settings'),
    ]);
    await tx.done;
    return { tanks, checks, settings: (settings as Settings | undefined) ?? null };
  }

  /**
   * Adds a validated data set in one transaction: records with the same id are replaced,
   * everything else is kept. Settings are replaced when the set has them.
   */
  async importAll(data: DataSet): Promise<void> {
    const tx = this.db.transaction(['tanks', 'checks', 'settings'], 'readwrite');
    try {
      for (const t of data.tanks) await tx.objectStore('tanks').put(t);
      for (const c of data.checks) await tx.objectStore('checks').put(c);
      if (data.settings) await tx.objectStore('settings').put(data.settings, 'settings');
    } catch (error) {
      // A put that throws before it reaches IndexedDB (a bad key) would not abort by itself.
      tx.abort();
      await tx.done.catch(() => undefined);
      throw error;
    }
    await tx.done;
  }

  /** Removes every tank, check and draft (settings and meta stay). */
  async clearAll(): Promise<void> {
    const tx = this.db.transaction(['tanks', 'checks', 'drafts'], 'readwrite');
    await Promise.all([
      tx.objectStore('tanks').clear(),
      tx.objectStore('checks').clear(),
      tx.objectStore('drafts').clear(),
    ]);
    await tx.done;
  }

  /**
   * Removes the demo tanks the user has not made their own (see `isClearableDemo`) with their
   * checks and drafts, in one transaction. Returns what was removed, for undo.
   */
  async clearDemo(): Promise<RemovedRecords> {
    const tx = this.db.transaction(['tanks', 'checks', 'drafts'], 'readwrite');
    const tanks = await tx.objectStore('tanks').getAll();
    const checks = await tx.objectStore('checks').getAll();
    const byTank = new Map<string, CheckRecord[]>();
    for (const c of checks) byTank.set(c.tankId, [...(byTank.get(c.tankId) ?? []), c]);
    const removed: RemovedRecords = { tanks: [], checks: [], drafts: [] };
    for (const t of tanks) {
      const own = byTank.get(t.id) ?? [];
      if (!isClearableDemo(t, own)) continue;
      const draft = await tx.objectStore('drafts').get(t.id);
      if (draft) removed.drafts.push(draft);
      removed.tanks.push(t);
      removed.checks.push(...own);
      await tx.objectStore('tanks').delete(t.id);
      await tx.objectStore('drafts').delete(t.id);
      for (const c of own) await tx.objectStore('checks').delete(c.id);
    }
    await tx.done;
    return removed;
  }

  /** Puts back what `clearDemo` removed (undo), in one transaction. */
  async restoreRecords(removed: RemovedRecords): Promise<void> {
    const tx = this.db.transaction(['tanks', 'checks', 'drafts'], 'readwrite');
    for (const t of removed.tanks) await tx.objectStore('tanks').put(t);
    for (const c of removed.checks) await tx.objectStore('checks').put(c);
    for (const d of removed.drafts) await tx.objectStore('drafts').put(d);
    await tx.done;
  }
}

/** Records taken out together, kept so they can be put back. */
export interface RemovedRecords {
  tanks: TankRecord[];
  checks: CheckRecord[];
  drafts: DraftRecord[];
}

/**
 * Asks the browser to keep our data under storage pressure. Returns the answer, or null where
 * the API is missing. Never throws.
 */
export async function requestPersistentStorage(): Promise<boolean | null> {
  try {
    if (typeof navigator === 'undefined' || !navigator.storage?.persist) return null;
    if (await navigator.storage.persisted()) return true;
    return await navigator.storage.persist();
  } catch {
    return null;
  }
}

export { newId } from '../components/types.js';
