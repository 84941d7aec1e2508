/**
 * The stores one by one (pwa/storage.ts adds the whole-data-set operations, the team sync's
 * reads and writes, and clearing): tanks, checks, drafts, site forecasts, walkdowns, fills,
 * settings and meta. Split from storage.ts only for size; import `Store` from there.
 */
import type { IDBPDatabase } from 'idb';
import type {
  CheckBrief,
  CheckRecord,
  DraftRecord,
  Settings,
  TankRecord,
} from '../components/types.js';
import type { SiteForecast, WalkdownRecord } from '../components/walkdown-types.js';
import type { FillDraft, FillRecord } from '../components/fill-types.js';
import { DEFAULT_META, type Meta, type TanksideDB } from './storage-schema.js';
import { noteCheck, refreshTank } from './storage-latest.js';

/** A record of a store the team sync shares (pwa/sync/), by kind and key. */
export interface SharedRecord {
  kind: SharedKind;
  key: string;
}
export type SharedKind = 'tank' | 'check' | 'fill' | 'walkdown' | 'site';
export const SHARED_STORE = {
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

/** A tank taken out with everything of it, kept so it can be put back. */
export interface RemovedTank {
  tank: TankRecord;
  checks: CheckRecord[];
  draft: DraftRecord | undefined;
  fills?: FillRecord[];
  fillDraft?: FillDraft | undefined;
}

export class StoreBase {
  /** The team sync's outbox, when a team is set up (pwa/sync/). */
  watcher: StoreWatcher | null = null;

  protected async noted<T>(records: SharedRecord[], write: () => Promise<T>): Promise<T> {
    if (this.watcher) await this.watcher.note(records);
    const out = await write();
    this.watcher?.wrote(records);
    return out;
  }

  protected constructor(protected readonly db: IDBPDatabase<TanksideDB>) {
    // A newer tab wants to upgrade: let it, rather than block it forever.
    db.addEventListener('versionchange', () => db.close());
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

  /** Every site tanks are filed under, as stored, in key order: read from the index, no tank read. */
  async tankSites(): Promise<string[]> {
    const sites: string[] = [];
    const index = this.db.transaction('tanks').store.index('site');
    for (let c = await index.openKeyCursor(null, 'nextunique'); c; c = await c.continue())
      sites.push(c.key);
    return sites;
  }

  /** The tanks filed under these sites (as stored) and each one's newest check in brief. */
  async tanksAt(sites: string[]): Promise<{ tanks: TankRecord[]; latest: CheckBrief[] }> {
    const tx = this.db.transaction(['tanks', 'latestChecks']);
    const index = tx.objectStore('tanks').index('site');
    const tanks = (await Promise.all(sites.map((s) => index.getAll(s)))).flat();
    const found = await Promise.all(tanks.map((t) => tx.objectStore('latestChecks').get(t.id)));
    return { tanks, latest: found.filter((b): b is CheckBrief => b !== undefined) };
  }

  /** Up to `count` records of `store` in key order after the key `after` (from the first if null). */
  async recordsAfter<S extends 'tanks' | 'latestChecks'>(
    store: S,
    after: string | null,
    count: number,
  ): Promise<TanksideDB[S]['value'][]> {
    const range = after === null ? null : IDBKeyRange.lowerBound(after, true);
    return this.db.getAll(store, range, count);
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
    const names = ['tanks', 'checks', 'latestChecks', 'drafts', 'fills', 'fillDrafts'] as const;
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
    await tx.objectStore('latestChecks').delete(id);
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
    const names = ['tanks', 'checks', 'latestChecks', 'drafts', 'fills', 'fillDrafts'] as const;
    const tx = this.db.transaction([...names], 'readwrite');
    await tx.objectStore('tanks').put(removed.tank);
    for (const c of removed.checks) await tx.objectStore('checks').put(c);
    await refreshTank(tx, removed.tank.id);
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

  /** The newest saved check of every tank, in brief (one per tank, in no particular order). */
  async latestChecks(): Promise<CheckBrief[]> {
    return this.db.getAll('latestChecks');
  }

  /** Up to `count` checks in key order after the key `after` (all from the first if null). */
  async checksAfter(after: string | null, count: number): Promise<CheckRecord[]> {
    const range = after === null ? null : IDBKeyRange.lowerBound(after, true);
    return this.db.getAll('checks', range, count);
  }

  async putCheck(check: CheckRecord): Promise<void> {
    await this.noted([{ kind: 'check', key: check.id }], async () => {
      const tx = this.db.transaction(['checks', 'latestChecks'], 'readwrite');
      await tx.objectStore('checks').put(check);
      await noteCheck(tx, check);
      await tx.done;
    });
  }

  async deleteCheck(id: string): Promise<void> {
    await this.noted([{ kind: 'check', key: id }], async () => {
      const tx = this.db.transaction(['checks', 'latestChecks'], 'readwrite');
      const check = await tx.objectStore('checks').get(id);
      await tx.objectStore('checks').delete(id);
      if (check) await refreshTank(tx, check.tankId);
      await tx.done;
    });
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
}
