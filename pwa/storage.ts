/**
 * The one module that reads and writes IndexedDB (the schema and its upgrade steps are in
 * storage-schema.ts). Tanks, checks, drafts and settings, with a schema version and one upgrade
 * step per version.
 *
 * Schema history (each step in `UPGRADES` takes the database from version i to i + 1; a step,
 * once shipped, is never edited — a change is a new step):
 *   v1  stores `tanks` (key `id`, index `site`), `checks` (key `id`, index `tankId`),
 *       `drafts` (key `tankId`), `settings` (out-of-line keys: `settings`, `meta`).
 *   v2  adds `sites` (key `site`: the site forecast and route) and `walkdowns` (key `id`, index
 *       `site`); nothing else changes.
 *   v3  adds `fills` (key `id`, index `tankId`: saved fill records) and `fillDrafts` (key
 *       `tankId`: a fill under way); nothing else changes.
 *   v4  adds the index `tankAt` ([tankId, at]) on `checks` and the store `latestChecks` (key
 *       `tankId`, index `at`: each tank's newest check, filled from the saved checks by the
 *       step and kept by every write of checks here), so the list of a register of thousands
 *       reads one check per tank (pwa/storage-schema.ts, pwa/storage-latest.ts).
 *   (v1) `Readings.takenAt`, an optional ISO time on a draft's or a check's readings, needs no
 *       step: records without it stay valid (components/reopen.ts uses `updatedAt` / `at`).
 *
 * Every write that must be all-or-nothing (delete a tank with its checks, import a backup,
 * clear) runs in a single transaction, so a failure leaves the stored data as it was.
 */
import type { CheckRecord, DraftRecord, Settings, TankRecord } from '../components/types.js';
import type { SiteForecast, WalkdownRecord } from '../components/walkdown-types.js';
import type { FillRecord } from '../components/fill-types.js';
import { isClearableDemo } from './demo-own.js';
import { openAtVersion } from './storage-schema.js';
import { DB_NAME, DB_VERSION } from './storage-schema.js';
import { noteCheck, refreshTank } from './storage-latest.js';
import { SHARED_STORE, StoreBase, type SharedKind, type SharedRecord } from './storage-base.js';

export { DB_NAME, DB_VERSION, DEFAULT_META, UPGRADES, openAtVersion } from './storage-schema.js';
export type { Meta, TanksideDB } from './storage-schema.js';
export type { RemovedTank, SharedKind, SharedRecord, StoreWatcher } from './storage-base.js';

/** All the user's data, as exported and imported. */
export interface DataSet {
  tanks: TankRecord[];
  checks: CheckRecord[];
  settings: Settings | null;
  /** Site forecasts (absent in a backup made before walkdowns). */
  sites?: SiteForecast[];
  /** Walkdowns, under way and finished (absent in a backup made before walkdowns). */
  walkdowns?: WalkdownRecord[];
  /** Fill records (absent in a backup made before fill records). */
  fills?: FillRecord[];
}

export class Store extends StoreBase {
  static async open(name: string = DB_NAME): Promise<Store> {
    return new Store(await openAtVersion(name, DB_VERSION));
  }

  // ── whole data set ─────────────────────────────────────────────────────────────────────
  async exportAll(): Promise<DataSet> {
    const tx = this.db.transaction(
      ['tanks', 'checks', 'settings', 'sites', 'walkdowns', 'fills'],
      'readonly',
    );
    const [tanks, checks, settings, sites, walkdowns, fills] = await Promise.all([
      tx.objectStore('tanks').getAll(),
      tx.objectStore('checks').getAll(),
      tx.objectStore('settings').get('settings'),
      tx.objectStore('sites').getAll(),
      tx.objectStore('walkdowns').getAll(),
      tx.objectStore('fills').getAll(),
    ]);
    await tx.done;
    return {
      tanks,
      checks,
      settings: (settings as Settings | undefined) ?? null,
      sites,
      walkdowns,
      fills,
    };
  }

  /**
   * Adds a validated data set in one transaction: records with the same id are replaced,
   * everything else is kept. Settings are replaced when the set has them.
   */
  async importAll(data: DataSet): Promise<void> {
    const records: SharedRecord[] = [
      ...data.tanks.map((t): SharedRecord => ({ kind: 'tank', key: t.id })),
      ...data.checks.map((c): SharedRecord => ({ kind: 'check', key: c.id })),
      ...(data.sites ?? []).map((f): SharedRecord => ({ kind: 'site', key: f.site })),
      ...(data.walkdowns ?? []).map((w): SharedRecord => ({ kind: 'walkdown', key: w.id })),
      ...(data.fills ?? []).map((f): SharedRecord => ({ kind: 'fill', key: f.id })),
    ];
    await this.noted(records, () => this.importOnly(data));
  }

  private async importOnly(data: DataSet): Promise<void> {
    const tx = this.db.transaction(
      ['tanks', 'checks', 'latestChecks', 'settings', 'sites', 'walkdowns', 'fills'],
      'readwrite',
    );
    try {
      for (const t of data.tanks) await tx.objectStore('tanks').put(t);
      for (const c of data.checks) await tx.objectStore('checks').put(c);
      // A replaced check may have been a tank's latest: read those tanks' latest again.
      for (const id of new Set(data.checks.map((c) => c.tankId))) await refreshTank(tx, id);
      for (const f of data.sites ?? []) await tx.objectStore('sites').put(f);
      for (const w of data.walkdowns ?? []) await tx.objectStore('walkdowns').put(w);
      for (const f of data.fills ?? []) await tx.objectStore('fills').put(f);
      if (data.settings) await tx.objectStore('settings').put(data.settings, 'settings');
    } catch (error) {
      // A put that throws before it reaches IndexedDB (a bad key) would not abort by itself.
      tx.abort();
      await tx.done.catch(() => undefined);
      throw error;
    }
    await tx.done;
  }

  // ── team sync (pwa/sync/): reads and writes that do not go back to the outbox ─────────────
  async getShared(kind: SharedKind, key: string): Promise<unknown> {
    return this.db.get(SHARED_STORE[kind], key);
  }

  async getSharedMany(kind: SharedKind, keys: string[]): Promise<unknown[]> {
    if (keys.length === 0) return [];
    const tx = this.db.transaction(SHARED_STORE[kind], 'readonly');
    const out = await Promise.all(keys.map((k) => tx.store.get(k)));
    await tx.done;
    return out;
  }

  async listShared(kind: SharedKind): Promise<unknown[]> {
    return this.db.getAll(SHARED_STORE[kind]);
  }

  /**
   * Writes what the team sync brought, in one transaction, without telling the watcher. A
   * deleted tank takes its drafts along (its checks and fills arrive as deletions of their own).
   */
  async applyShared(puts: { kind: SharedKind; record: unknown }[], dels: SharedRecord[]) {
    const names = [
      'tanks',
      'checks',
      'latestChecks',
      'fills',
      'walkdowns',
      'sites',
      'drafts',
      'fillDrafts',
    ] as const;
    const tx = this.db.transaction([...names], 'readwrite');
    for (const p of puts) {
      await tx.objectStore(SHARED_STORE[p.kind]).put(p.record as never);
      // The list's newest check per tank follows every check that arrives.
      if (p.kind === 'check') await noteCheck(tx, p.record as CheckRecord);
    }
    for (const d of dels) {
      const gone = d.kind === 'check' ? await tx.objectStore('checks').get(d.key) : undefined;
      await tx.objectStore(SHARED_STORE[d.kind]).delete(d.key);
      if (gone) await refreshTank(tx, gone.tankId);
      if (d.kind === 'tank') {
        await tx.objectStore('drafts').delete(d.key);
        await tx.objectStore('fillDrafts').delete(d.key);
        await tx.objectStore('latestChecks').delete(d.key);
      }
    }
    await tx.done;
  }

  /** Removes every tank, check, draft, site forecast, walkdown and fill (settings and meta stay). */
  async clearAll(): Promise<void> {
    const tx = this.db.transaction(
      ['tanks', 'checks', 'latestChecks', 'drafts', 'sites', 'walkdowns', 'fills', 'fillDrafts'],
      'readwrite',
    );
    await Promise.all([
      tx.objectStore('tanks').clear(),
      tx.objectStore('checks').clear(),
      tx.objectStore('latestChecks').clear(),
      tx.objectStore('drafts').clear(),
      tx.objectStore('sites').clear(),
      tx.objectStore('walkdowns').clear(),
      tx.objectStore('fills').clear(),
      tx.objectStore('fillDrafts').clear(),
    ]);
    await tx.done;
  }

  /**
   * Removes the demo tanks the user has not made their own (see `isClearableDemo`) with their
   * checks and drafts, in one transaction. Returns what was removed, for undo.
   */
  async clearDemo(): Promise<RemovedRecords> {
    const tx = this.db.transaction(['tanks', 'checks', 'latestChecks', 'drafts'], 'readwrite');
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
      await tx.objectStore('latestChecks').delete(t.id);
    }
    await tx.done;
    return removed;
  }

  /** Puts back what `clearDemo` removed (undo), in one transaction. */
  async restoreRecords(removed: RemovedRecords): Promise<void> {
    const tx = this.db.transaction(['tanks', 'checks', 'latestChecks', 'drafts'], 'readwrite');
    for (const t of removed.tanks) await tx.objectStore('tanks').put(t);
    for (const c of removed.checks) await tx.objectStore('checks').put(c);
    for (const id of new Set(removed.checks.map((c) => c.tankId))) await refreshTank(tx, id);
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
