/**
 * The IndexedDB schema of the `tankside` database: its stores, and one upgrade step per
 * version (pwa/storage.ts opens it; the history of versions is in its note). A step, once
 * shipped, is never edited: a change is a new step, with a test that upgrades from every earlier
 * version without losing a record.
 */
import {
  openDB,
  type DBSchema,
  type IDBPDatabase,
  type IDBPTransaction,
  type StoreNames,
} from 'idb';
import type { CheckBrief, CheckRecord, DraftRecord, TankRecord } from '../components/types.js';
import type { SiteForecast, WalkdownRecord } from '../components/walkdown-types.js';
import type { FillDraft, FillRecord } from '../components/fill-types.js';
import {
  upgradeCheck,
  upgradeDraft,
  upgradeFill,
  upgradeFillDraft,
  upgradeSettings,
  upgradeTank,
  upgradeWalkdown,
} from './legacy-names.js';

export const DB_NAME = 'tankside';
export const DB_VERSION = 5;

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
  checks: {
    key: string;
    value: CheckRecord;
    indexes: { tankId: string; tankAt: [string, string] };
  };
  /** v4: the newest saved check of each tank in brief (key `tankId`), kept with every check written. */
  latestChecks: { key: string; value: CheckBrief; indexes: { at: string } };
  drafts: { key: string; value: DraftRecord };
  settings: { key: string; value: unknown };
  sites: { key: string; value: SiteForecast };
  walkdowns: { key: string; value: WalkdownRecord; indexes: { site: string } };
  fills: { key: string; value: FillRecord; indexes: { tankId: string } };
  fillDrafts: { key: string; value: FillDraft };
}

export type UpgradeTx = IDBPTransaction<TanksideDB, StoreNames<TanksideDB>[], 'versionchange'>;
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
  // 3 → 4: for a register of thousands, the list reads only each tank's newest check: checks
  // get an index by tank and time, and a new store keeps the newest check per tank (filled here
  // from the checks already saved; no record is changed or removed).
  (db, tx) => {
    tx.objectStore('checks').createIndex('tankAt', ['tankId', 'at']);
    const latest = db.createObjectStore('latestChecks', { keyPath: 'tankId' });
    latest.createIndex('at', 'at');
    void tx
      .objectStore('checks')
      .getAll()
      .then((all) => {
        for (const c of newestPerTank(all)) void latest.put(briefOf(c));
      });
  },
  // 4 → 5: every stored pressure says gauge or absolute in its name (pwa/legacy-names.ts):
  // each record is rewritten in place with the same values under the new names; a record
  // without such a field is left as it is; none is added or removed.
  (_db, tx) => {
    renameAll(tx, 'tanks', upgradeTank);
    renameAll(tx, 'checks', upgradeCheck);
    renameAll(tx, 'drafts', upgradeDraft);
    renameAll(tx, 'walkdowns', upgradeWalkdown);
    renameAll(tx, 'fills', upgradeFill);
    renameAll(tx, 'fillDrafts', upgradeFillDraft);
    const settings = tx.objectStore('settings');
    void settings.get('settings').then((s) => {
      const now = upgradeSettings(s);
      if (now !== s) void settings.put(now, 'settings');
    });
  },
];

type RenamedStore = 'tanks' | 'checks' | 'drafts' | 'walkdowns' | 'fills' | 'fillDrafts';

/** Puts back each record of `store` that `upgrade` changed (stores keyed by a key path). */
function renameAll(tx: UpgradeTx, store: RenamedStore, upgrade: (r: unknown) => unknown): void {
  const os = tx.objectStore(store);
  void os.getAll().then((all) => {
    for (const r of all as unknown[]) {
      const now = upgrade(r);
      if (now !== r) void os.put(now as never);
    }
  });
}

if (UPGRADES.length !== DB_VERSION) throw new Error('storage: one upgrade step per schema version');

/** What the tank list shows of a tank's newest check (a few dozen bytes, not the whole check). */
export function briefOf(c: CheckRecord): CheckBrief {
  return { tankId: c.tankId, id: c.id, at: c.at, summary: { topLevel: c.summary.topLevel } };
}

/** The newest check of each tank among `checks` (by `at`; the later of equal times by id). */
export function newestPerTank(checks: readonly CheckRecord[]): CheckRecord[] {
  const newest = new Map<string, CheckRecord>();
  for (const c of checks) {
    const had = newest.get(c.tankId);
    if (!had || isNewer(c, had)) newest.set(c.tankId, c);
  }
  return [...newest.values()];
}

/** `a` was saved after `b` (ISO times compare as text; ties broken by id, so the order is total). */
export function isNewer(a: CheckBrief, b: CheckBrief): boolean {
  return a.at > b.at || (a.at === b.at && a.id > b.id);
}

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
