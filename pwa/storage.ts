/**
 * The one module that touches IndexedDB. Tanks, checks, drafts and settings, with a schema
 * version and one upgrade step per version.
 *
 * Schema history (each step in `UPGRADES` takes the database from version i to i + 1; a step,
 * once shipped, is never edited — a change is a new step):
 *   v1  stores `tanks` (key `id`, index `site`), `checks` (key `id`, index `tankId`),
 *       `drafts` (key `tankId`), `settings` (out-of-line keys: `settings`, `meta`).
 *   v2  adds `sites` (key `site`: the site forecast and route) and `walkdowns` (key `id`, index
 *       `site`); nothing else changes.
 *   v3  adds `fills` (key `id`, index `tankId`: saved fill records) and `fillDrafts` (key
 *       `tankId`: a fill under way); nothing else changes.
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
import type { SiteForecast, WalkdownRecord } from '../components/walkdown-types.js';
import type { FillDraft, FillRecord } from '../components/fill-types.js';
import { isClearableDemo } from './demo-own.js';

export const DB_NAME = 'tankside';
export const DB_VERSION = 3;

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
  sites: { key: string; value: SiteForecast };
  walkdowns: { key: string; value: WalkdownRecord; indexes: { site: string } };
  fills: { key: string; value: FillRecord; indexes: { tankId: string } };
  fillDrafts: { key: string; value: FillDraft };
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
  // 1 → 2: site forecasts and walkdowns (new stores only).
  (db) => {
    db.createObjectStore('sites', { keyPath: 'site' });
    const walks = db.createObjectStore('walkdowns', { keyPath: 'id' });
    walks.createIndex('site', 'site');
  },
  // 2 → 3: fill records and fills under way (new stores only).
  (db) => {
    const fills = db.createObjectStore('fills', { keyPath: 'id' });
    fills.createIndex('tankId', 'tankId');
    db.createObjectStore('fillDrafts', { keyPath: 'tankId' });
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
  /** Site forecasts (absent in a backup made before walkdowns). */
  sites?: SiteForecast[];
  /** Walkdowns, under way and finished (absent in a backup made before walkdowns). */
  walkdowns?: WalkdownRecord[];
  /** Fill records (absent in a backup made before fill records). */
  fills?: FillRecord[];
}

/** A record of a store the team sync shares (pwa/sync/), by kind and key. */
export interface SharedRecord {
  kind: SharedKind;
  key: string;
}
export type SharedKind = 'tank' | 'check' | 'fill' | 'walkdown' | 'site';
const SHARED_STORE = {
  tank: 'tanks',
  check: 'checks',
  fill: 'fills',
  walkdown: 'walkdowns',
  site: 'sites',
} as const;

/**
 * Told of writes to the shared stores (the team sync's outbox): `note` is awaited before the
 * write, so a crash between the two loses nothing (a noted record that did not change is
 * skipped later); `wrote` runs after the write committed.
 */
export interface StoreWatcher {
  note(records: SharedRecord[]): Promise<void>;
  wrote(records: SharedRecord[]): void;
}

export class Store {
  /** The team sync's outbox, when a team is set up (pwa/sync/). */
  watcher: StoreWatcher | null = null;

  private async noted<T>(records: SharedRecord[], write: () => Promise<T>): Promise<T> {
    if (this.watcher) await this.watcher.note(records);
    const out = await write();
    this.watcher?.wrote(records);
    return out;
  }

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
    await this.noted([{ kind: 'tank', key: tank.id }], () => this.db.put('tanks', tank));
  }

  /**
   * Deletes a tank with its checks, fills and drafts; returns what was removed so it can be
   * restored (undo).
   */
  async deleteTank(id: string): Promise<RemovedTank | null> {
    const removed = await this.noted([{ kind: 'tank', key: id }], () => this.deleteTankOnly(id));
    if (removed && this.watcher) {
      const more = [
        ...removed.checks.map((c): SharedRecord => ({ kind: 'check', key: c.id })),
        ...(removed.fills ?? []).map((f): SharedRecord => ({ kind: 'fill', key: f.id })),
      ];
      await this.watcher.note(more);
      this.watcher.wrote(more);
    }
    return removed;
  }

  private async deleteTankOnly(id: string): Promise<RemovedTank | null> {
    const names = ['tanks', 'checks', 'drafts', 'fills', 'fillDrafts'] as const;
    const tx = this.db.transaction([...names], 'readwrite');
    const tank = await tx.objectStore('tanks').get(id);
    if (!tank) {
      await tx.done;
      return null;
    }
    const checks = await tx.objectStore('checks').index('tankId').getAll(id);
    const fills = await tx.objectStore('fills').index('tankId').getAll(id);
    const draft = await tx.objectStore('drafts').get(id);
    const fillDraft = await tx.objectStore('fillDrafts').get(id);
    await tx.objectStore('tanks').delete(id);
    for (const c of checks) await tx.objectStore('checks').delete(c.id);
    for (const f of fills) await tx.objectStore('fills').delete(f.id);
    await tx.objectStore('drafts').delete(id);
    await tx.objectStore('fillDrafts').delete(id);
    await tx.done;
    return { tank, checks, draft, fills, fillDraft };
  }

  /** Puts back what `deleteTank` removed. */
  async restoreTank(removed: RemovedTank): Promise<void> {
    const records: SharedRecord[] = [
      { kind: 'tank', key: removed.tank.id },
      ...removed.checks.map((c): SharedRecord => ({ kind: 'check', key: c.id })),
      ...(removed.fills ?? []).map((f): SharedRecord => ({ kind: 'fill', key: f.id })),
    ];
    await this.noted(records, () => this.restoreTankOnly(removed));
  }

  private async restoreTankOnly(removed: RemovedTank): Promise<void> {
    const names = ['tanks', 'checks', 'drafts', 'fills', 'fillDrafts'] as const;
    const tx = this.db.transaction([...names], 'readwrite');
    await tx.objectStore('tanks').put(removed.tank);
    for (const c of removed.checks) await tx.objectStore('checks').put(c);
    for (const f of removed.fills ?? []) await tx.objectStore('fills').put(f);
    if (removed.draft) await tx.objectStore('drafts').put(removed.draft);
    if (removed.fillDraft) await tx.objectStore('fillDrafts').put(removed.fillDraft);
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
    await this.noted([{ kind: 'check', key: check.id }], () => this.db.put('checks', check));
  }

  async deleteCheck(id: string): Promise<void> {
    await this.noted([{ kind: 'check', key: id }], () => this.db.delete('checks', id));
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

  // ── site forecasts and walkdowns ───────────────────────────────────────────────────────
  async getSite(site: string): Promise<SiteForecast | undefined> {
    return this.db.get('sites', site);
  }

  async putSite(forecast: SiteForecast): Promise<void> {
    await this.noted([{ kind: 'site', key: forecast.site }], () => this.db.put('sites', forecast));
  }

  /** Walkdowns of one site (or all), newest first. */
  async listWalkdowns(site?: string): Promise<WalkdownRecord[]> {
    const list =
      site === undefined
        ? await this.db.getAll('walkdowns')
        : await this.db.getAllFromIndex('walkdowns', 'site', site);
    return list.sort((a, b) =>
      a.startedAt < b.startedAt ? 1 : a.startedAt > b.startedAt ? -1 : 0,
    );
  }

  async getWalkdown(id: string): Promise<WalkdownRecord | undefined> {
    return this.db.get('walkdowns', id);
  }

  async putWalkdown(w: WalkdownRecord): Promise<void> {
    await this.noted([{ kind: 'walkdown', key: w.id }], () => this.db.put('walkdowns', w));
  }

  async deleteWalkdown(id: string): Promise<void> {
    await this.noted([{ kind: 'walkdown', key: id }], () => this.db.delete('walkdowns', id));
  }

  // ── fills ──────────────────────────────────────────────────────────────────────────────
  /** Fill records of one tank (or all), newest first (by the time the after-readings were saved). */
  async listFills(tankId?: string): Promise<FillRecord[]> {
    const list =
      tankId === undefined
        ? await this.db.getAll('fills')
        : await this.db.getAllFromIndex('fills', 'tankId', tankId);
    return list.sort((a, b) =>
      a.finishedAt < b.finishedAt ? 1 : a.finishedAt > b.finishedAt ? -1 : 0,
    );
  }

  /** Saves a fill record and removes the tank's fill under way, in one transaction. */
  async putFill(fill: FillRecord): Promise<void> {
    await this.noted([{ kind: 'fill', key: fill.id }], () => this.putFillOnly(fill));
  }

  private async putFillOnly(fill: FillRecord): Promise<void> {
    const tx = this.db.transaction(['fills', 'fillDrafts'], 'readwrite');
    await tx.objectStore('fills').put(fill);
    await tx.objectStore('fillDrafts').delete(fill.tankId);
    await tx.done;
  }

  async deleteFill(id: string): Promise<void> {
    await this.noted([{ kind: 'fill', key: id }], () => this.db.delete('fills', id));
  }

  async getFillDraft(tankId: string): Promise<FillDraft | undefined> {
    return this.db.get('fillDrafts', tankId);
  }

  async putFillDraft(draft: FillDraft): Promise<void> {
    await this.db.put('fillDrafts', draft);
  }

  async deleteFillDraft(tankId: string): Promise<void> {
    await this.db.delete('fillDrafts', tankId);
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
      ['tanks', 'checks', 'settings', 'sites', 'walkdowns', 'fills'],
      'readwrite',
    );
    try {
      for (const t of data.tanks) await tx.objectStore('tanks').put(t);
      for (const c of data.checks) await tx.objectStore('checks').put(c);
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
      'fills',
      'walkdowns',
      'sites',
      'drafts',
      'fillDrafts',
    ] as const;
    const tx = this.db.transaction([...names], 'readwrite');
    for (const p of puts) await tx.objectStore(SHARED_STORE[p.kind]).put(p.record as never);
    for (const d of dels) {
      await tx.objectStore(SHARED_STORE[d.kind]).delete(d.key);
      if (d.kind === 'tank') await tx.objectStore('drafts').delete(d.key);
      if (d.kind === 'tank') await tx.objectStore('fillDrafts').delete(d.key);
    }
    await tx.done;
  }

  /** Removes every tank, check, draft, site forecast, walkdown and fill (settings and meta stay). */
  async clearAll(): Promise<void> {
    const tx = this.db.transaction(
      ['tanks', 'checks', 'drafts', 'sites', 'walkdowns', 'fills', 'fillDrafts'],
      'readwrite',
    );
    await Promise.all([
      tx.objectStore('tanks').clear(),
      tx.objectStore('checks').clear(),
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

/** A tank taken out with everything of it, kept so it can be put back. */
export interface RemovedTank {
  tank: TankRecord;
  checks: CheckRecord[];
  draft: DraftRecord | undefined;
  fills?: FillRecord[];
  fillDraft?: FillDraft | undefined;
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
