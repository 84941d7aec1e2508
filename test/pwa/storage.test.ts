/// <reference types="mocha" />
// pwa/storage.ts in real Chromium IndexedDB. Each test uses a random database name so tests
// never share state. Kind: identity (what goes in comes back out; upgrades keep data).
import { expect } from '@open-wc/testing';
import { deleteDB } from 'idb';
import { DB_VERSION, Store, UPGRADES, openAtVersion } from '../../pwa/storage.js';
import { briefOf } from '../../pwa/storage-schema.js';
import type { CheckRecord, TankRecord } from '../../components/types.js';
import { DEFAULT_SETTINGS, emptyReadings } from '../../components/types.js';
import type { SiteForecast, WalkdownRecord } from '../../components/walkdown-types.js';
import type { FillDraft } from '../../components/fill-types.js';
import { makeFillRecord, startFill, type FillRecord } from '../../thermo/fill/index.js';
import {
  oldCheck,
  oldDraft,
  oldFill,
  oldFillDraft,
  oldSettings,
  oldTank,
  oldWalkdown,
} from './fixtures/old-names.js';
import {
  NAMED_CHECK,
  NAMED_DRAFT,
  NAMED_FILL,
  NAMED_FILL_DRAFT,
  NAMED_FORECAST,
  NAMED_SETTINGS,
  NAMED_TANK,
  NAMED_TANK_NO_RELIEF,
  NAMED_WALKDOWN,
} from './fixtures/named-records.js';

const names: string[] = [];
function dbName(): string {
  const n = `test-${Math.random().toString(36).slice(2)}`;
  names.push(n);
  return n;
}

after(async () => {
  for (const n of names) await deleteDB(n);
});

// Test records: plain placeholders, not tank data of any kind.
function tank(id: string, site = 'Site A', demo = false): TankRecord {
  return {
    id,
    site,
    name: `Tank ${id}`,
    notes: '',
    nameplate: { waterCapacity: 1, designPressureGauge: 1e6 },
    productId: 'propane',
    demo,
    createdAt: '2024-01-01T00:00:00.000Z',
    updatedAt: '2024-01-01T00:00:00.000Z',
  };
}

function check(id: string, tankId: string, at: string, demo = false): CheckRecord {
  return {
    id,
    tankId,
    at,
    demo,
    productLabel: 'x',
    readings: {
      liquidTemperature: 290,
      contentsMode: 'gaugePercent',
      gaugePercent: 50,
      levelHeight: null,
      netMass: null,
      pressureReadingGauge: null,
      peakAirTemperature: 300,
      sunAllowance: 5,
    },
    summary: {
      phase: 'two-phase',
      pGauge: 1,
      totalMass: 1,
      liquidVolume: 1,
      fillingDensity: 0.1,
      maxMass: 2,
      roomLeftMass: 1,
      stopAtGaugePercent: 80,
      binding: 'r',
      peakTemperature: 305,
      peakGauge: 2,
      peakLiquidFraction: 0.5,
      headroomToDesign: 1,
      headroomToRelief: 1,
      liquidFullTemperature: null,
      topLevel: null,
      cautions: [],
    },
  };
}

const DRAFT = {
  tankId: 't1',
  readings: check('x', 't1', '').readings,
  updatedAt: '2024-01-03T00:00:00.000Z',
};
const SETTINGS = { ...DEFAULT_SETTINGS, sunAllowance: 3 };

type OldDb = Awaited<ReturnType<typeof openAtVersion>>;
/** Puts a record as an older app stored it (its names are not today's type). */
const putOld = (
  db: OldDb,
  store: 'tanks' | 'checks' | 'drafts' | 'walkdowns' | 'fills' | 'fillDrafts',
  r: unknown,
) => db.put(store, r as never);

/**
 * Fixture data as each schema version could hold it, keyed by the version: before v5 every
 * pressure under its old name (fixtures/old-names.ts), so each upgrade also goes through v5.
 */
const SEED: Record<number, (db: OldDb) => Promise<void>> = {
  1: async (db) => {
    await putOld(db, 'tanks', oldTank(tank('t1')));
    await putOld(db, 'checks', oldCheck(check('c1', 't1', '2024-01-02T00:00:00.000Z')));
    await putOld(db, 'drafts', oldDraft(DRAFT));
    await db.put('settings', oldSettings(SETTINGS), 'settings');
  },
  2: async (db) => {
    await SEED[1]!(db);
    await db.put('sites', FORECAST);
    await putOld(db, 'walkdowns', oldWalkdown(walk('w1')));
  },
  3: async (db) => {
    await SEED[2]!(db);
    await putOld(db, 'fills', oldFill(FILL));
    await putOld(db, 'fillDrafts', oldFillDraft(FILL_DRAFT));
  },
  4: async (db) => {
    await SEED[3]!(db);
    await db.put('latestChecks', briefOf(check('c1', 't1', '2024-01-02T00:00:00.000Z')));
  },
  // v5: the same records under today's names.
  5: async (db) => {
    await db.put('tanks', tank('t1'));
    await db.put('checks', check('c1', 't1', '2024-01-02T00:00:00.000Z'));
    await db.put('drafts', DRAFT);
    await db.put('settings', SETTINGS, 'settings');
    await db.put('sites', FORECAST);
    await db.put('walkdowns', walk('w1'));
    await db.put('fills', FILL);
    await db.put('fillDrafts', FILL_DRAFT);
    await db.put('latestChecks', briefOf(check('c1', 't1', '2024-01-02T00:00:00.000Z')));
  },
};

// A placeholder fill on the placeholder tank (1 m³ water capacity, propane): the engine's own
// record, so the stored shape is the real one.
const FILL_START = startFill(
  {
    tank: { waterCapacity: 1, designPressureGauge: 1.7e6 },
    product: 'propane',
    liquidTemperature: 290,
    contents: { gaugePercent: 20 },
    peakTemperature: 300,
  },
  undefined,
  new Date('2024-01-06T00:00:00.000Z'),
);
const FILL: FillRecord = makeFillRecord({
  id: 'f1',
  tankId: 't1',
  input: { start: FILL_START, delivered: { volume: 0.3 }, after: { gaugePercent: 50 } },
  note: 'placeholder',
  at: new Date('2024-01-06T00:30:00.000Z'),
});
const FILL_DRAFT: FillDraft = {
  tankId: 't1',
  start: FILL_START,
  volume: 0.1,
  compensated: true,
  meterTemperature: null,
  afterGauge: null,
  afterTemperature: null,
  afterPressureGauge: null,
  interrupted: false,
  note: '',
  updatedAt: '2024-01-07T00:00:00.000Z',
};

// Placeholder site forecast and walkdown (not tank data).
const FORECAST: SiteForecast = {
  site: 'Site A',
  days: [310],
  sunAllowance: 5,
  tankAllowances: [{ tankId: 't1', sunAllowance: 0 }],
  enteredAt: '2024-01-04T00:00:00.000Z',
};

function walk(id: string): WalkdownRecord {
  return {
    id,
    site: 'Site A',
    status: 'in-progress',
    startedAt: '2024-01-05T00:00:00.000Z',
    finishedAt: null,
    checkedBy: 'A. Person',
    forecast: FORECAST,
    entries: [
      {
        tankId: 't1',
        tankName: 'Tank t1',
        status: 'unreached',
        readings: check('x', 't1', '').readings,
        note: '',
        reason: 'gate locked',
        at: '2024-01-05T00:10:00.000Z',
        result: null,
        problem: '',
      },
    ],
    current: 0,
    appVersion: 'test',
  };
}

describe('storage', () => {
  it('UPGRADES has one step per schema version', () => {
    expect(UPGRADES.length).to.equal(DB_VERSION);
  });

  // For every earlier version v (0 = no database yet): build the database at v with the
  // upgrade steps, put data a user of v would have, then open the current version.
  for (let v = 0; v < DB_VERSION + 1; v++) {
    it(`Store.open upgrades from version ${v} and keeps the data`, async () => {
      const name = dbName();
      if (v > 0) {
        const old = await openAtVersion(name, v);
        await SEED[v]!(old);
        old.close();
      }
      const store = await Store.open(name);
      const tanks = await store.listTanks();
      if (v === 0) {
        expect(tanks).to.deep.equal([]);
        expect(await store.getSettings()).to.equal(null);
      } else {
        // Under today's names with the same values (stored under the old ones before v5).
        expect(tanks).to.deep.equal([tank('t1')]);
        expect(await store.listChecks('t1')).to.deep.equal([
          check('c1', 't1', '2024-01-02T00:00:00.000Z'),
        ]);
        expect(await store.getDraft('t1')).to.deep.equal(DRAFT);
        expect(await store.getSettings()).to.deep.equal(SETTINGS);
      }
      if (v >= 2) {
        expect(await store.getSite('Site A')).to.deep.equal(FORECAST);
        expect(await store.listWalkdowns('Site A')).to.deep.equal([walk('w1')]);
      }
      if (v >= 3) {
        expect(await store.listFills('t1')).to.deep.equal([FILL]);
        expect(await store.getFillDraft('t1')).to.deep.equal(FILL_DRAFT);
      } else {
        expect(await store.listFills()).to.deep.equal([]);
      }
      // Each tank's newest check is there for the list (none before a check was saved).
      expect((await store.latestChecks()).map((c) => c.id)).to.deep.equal(v === 0 ? [] : ['c1']);
      // The current schema is fully usable after the upgrade.
      await store.putTank(tank('t2'));
      expect((await store.listTanks()).length).to.equal(v === 0 ? 1 : 2);
      await store.putWalkdown(walk('w2'));
      expect((await store.listWalkdowns()).map((w) => w.id)).to.include('w2');
      await store.putFill({ ...FILL, id: 'f2', tankId: 't2' });
      expect((await store.listFills('t2')).map((f) => f.id)).to.deep.equal(['f2']);
      store.close();
    });
  }

  it('a v3 database with several tanks and checks upgrades to v4 with every record intact and each tank’s newest check', async () => {
    const name = dbName();
    const old = await openAtVersion(name, 3);
    await SEED[3]!(old);
    // Hand-picked newest per tank: t1 → c3 (Jan 5), t2 → c5 (Feb 1), t3 → none.
    const extra = [
      check('c2', 't1', '2024-01-04T00:00:00.000Z'),
      check('c3', 't1', '2024-01-05T00:00:00.000Z'),
      check('c4', 't2', '2024-01-01T00:00:00.000Z'),
      check('c5', 't2', '2024-02-01T00:00:00.000Z'),
    ];
    for (const t of ['t2', 't3']) await putOld(old, 'tanks', oldTank(tank(t)));
    for (const c of extra) await putOld(old, 'checks', oldCheck(c));
    old.close();
    const store = await Store.open(name);
    const all = await store.exportAll();
    // Every record is there, under today's names (v5) with the values it was stored with.
    expect(all.tanks).to.deep.equal(['t1', 't2', 't3'].map((t) => tank(t)));
    expect(all.checks).to.deep.equal([check('c1', 't1', '2024-01-02T00:00:00.000Z'), ...extra]);
    expect(all.fills).to.deep.equal([FILL]);
    expect(all.walkdowns).to.deep.equal([walk('w1')]);
    expect(await store.getDraft('t1')).to.deep.equal(DRAFT);
    const latest = (await store.latestChecks()).map((c) => `${c.tankId}:${c.id}`).sort();
    expect(latest).to.deep.equal(['t1:c3', 't2:c5']);
    // Kept by later writes: an older check does not replace the newest; deleting the newest
    // falls back to the next; deleting the tank removes its entry.
    await store.putCheck(check('c6', 't2', '2024-01-15T00:00:00.000Z'));
    await store.deleteCheck('c5');
    await store.deleteTank('t1');
    expect((await store.latestChecks()).map((c) => `${c.tankId}:${c.id}`)).to.deep.equal(['t2:c6']);
    store.close();
  });

  it('a v4 database with every pressure under its old name upgrades to v5: same records, same values, today’s names', async () => {
    const name = dbName();
    const old = await openAtVersion(name, 4);
    await putOld(old, 'tanks', oldTank(NAMED_TANK));
    await putOld(old, 'tanks', oldTank(NAMED_TANK_NO_RELIEF));
    await putOld(old, 'checks', oldCheck(NAMED_CHECK));
    await old.put('latestChecks', briefOf(NAMED_CHECK));
    await putOld(old, 'drafts', oldDraft(NAMED_DRAFT));
    await old.put('settings', oldSettings(NAMED_SETTINGS), 'settings');
    await old.put('sites', NAMED_FORECAST);
    await putOld(old, 'walkdowns', oldWalkdown(NAMED_WALKDOWN));
    await putOld(old, 'fills', oldFill(NAMED_FILL));
    await putOld(old, 'fills', oldFill(FILL)); // no pressure after: its comparison is null
    await putOld(old, 'fillDrafts', oldFillDraft(NAMED_FILL_DRAFT));
    // A record stored already under today's names (none should be, but it must stay valid).
    await old.put('tanks', tank('t9'));
    old.close();

    const store = await Store.open(name);
    const all = await store.exportAll();
    expect(all.tanks).to.deep.equal([NAMED_TANK, NAMED_TANK_NO_RELIEF, tank('t9')]);
    expect(all.checks).to.deep.equal([NAMED_CHECK]);
    expect(all.settings).to.deep.equal(NAMED_SETTINGS);
    expect(all.sites).to.deep.equal([NAMED_FORECAST]);
    expect(all.walkdowns).to.deep.equal([NAMED_WALKDOWN]);
    const fills = all.fills ?? [];
    expect(fills).to.have.length(2);
    expect(fills.find((f) => f.id === NAMED_FILL.id)).to.deep.equal(NAMED_FILL);
    expect(fills.find((f) => f.id === FILL.id)).to.deep.equal(FILL);
    expect(await store.getDraft('n-t1')).to.deep.equal(NAMED_DRAFT);
    expect(await store.getFillDraft('n-t1')).to.deep.equal(NAMED_FILL_DRAFT);
    expect((await store.latestChecks()).map((c) => c.id)).to.deep.equal([NAMED_CHECK.id]);
    // Spot checks of the values under the new names (against the fixtures' literal figures).
    expect(all.tanks[0]!.nameplate.designPressureGauge).to.equal(1.7e6);
    expect(all.tanks[0]!.nameplate.reliefSetPressureGauge).to.equal(1.6e6);
    expect('reliefSetPressureGauge' in all.tanks[1]!.nameplate).to.equal(false);
    expect(all.checks[0]!.readings.pressureReadingGauge).to.equal(7.1e5);
    expect(all.checks[0]!.summary.pGauge).to.equal(7.05e5);
    expect(all.checks[0]!.summary.peakGauge).to.equal(1.02e6);
    expect(all.settings!.barometer.pressureAbs).to.equal(95_500);
    expect(all.settings!.gaugeFullScaleGauge).to.equal(2.1e6);
    const fill = fills.find((f) => f.id === NAMED_FILL.id)!;
    expect(fill.start.check.pressureReadingGauge).to.equal(6.5e5);
    expect(fill.start.check.barometricPressureAbs).to.equal(96_000);
    expect(fill.start.check.pressureGauge?.fullScaleGauge).to.equal(2.1e6);
    expect(fill.after.pressureReadingGauge).to.equal(6.6e5);
    expect(fill.result.pressure?.readingGauge).to.equal(6.6e5);
    store.close();
  });

  it('Store.listChecks returns one tank’s checks, newest first', async () => {
    const store = await Store.open(dbName());
    await store.putTank(tank('a'));
    await store.putTank(tank('b'));
    await store.putCheck(check('c1', 'a', '2024-01-01T00:00:00.000Z'));
    await store.putCheck(check('c2', 'a', '2024-03-01T00:00:00.000Z'));
    await store.putCheck(check('c3', 'b', '2024-02-01T00:00:00.000Z'));
    expect((await store.listChecks('a')).map((c) => c.id)).to.deep.equal(['c2', 'c1']);
    expect((await store.listChecks()).map((c) => c.id)).to.deep.equal(['c2', 'c3', 'c1']);
    store.close();
  });

  it('Store.deleteTank removes the tank with its checks and draft; restoreTank puts them back', async () => {
    const store = await Store.open(dbName());
    await store.putTank(tank('a'));
    await store.putCheck(check('c1', 'a', '2024-01-01T00:00:00.000Z'));
    await store.putDraft({ tankId: 'a', readings: check('x', 'a', '').readings, updatedAt: 'now' });
    await store.putFill({ ...FILL, tankId: 'a' });
    await store.putFillDraft({ ...FILL_DRAFT, tankId: 'a' });
    const removed = await store.deleteTank('a');
    expect(removed?.checks.length).to.equal(1);
    expect(await store.listFills()).to.deep.equal([]);
    expect(await store.getFillDraft('a')).to.equal(undefined);
    expect(await store.listTanks()).to.deep.equal([]);
    expect(await store.listChecks()).to.deep.equal([]);
    expect(await store.getDraft('a')).to.equal(undefined);
    await store.restoreTank(removed!);
    expect((await store.listTanks()).map((t) => t.id)).to.deep.equal(['a']);
    expect((await store.listChecks('a')).map((c) => c.id)).to.deep.equal(['c1']);
    expect((await store.getDraft('a'))?.updatedAt).to.equal('now');
    expect((await store.listFills('a')).map((f) => f.id)).to.deep.equal(['f1']);
    expect((await store.getFillDraft('a'))?.volume).to.equal(0.1);
    expect(await store.deleteTank('missing')).to.equal(null);
    store.close();
  });

  it('Store.exportAll then clearAll then importAll brings everything back', async () => {
    const store = await Store.open(dbName());
    await store.putTank(tank('a'));
    await store.putCheck(check('c1', 'a', '2024-01-01T00:00:00.000Z'));
    await store.putSettings({ ...DEFAULT_SETTINGS, theme: 'standard' });
    await store.putSite(FORECAST);
    await store.putWalkdown(walk('w1'));
    await store.putFill({ ...FILL, tankId: 'a' });
    const data = await store.exportAll();
    expect(data.walkdowns?.length).to.equal(1);
    expect(data.fills?.length).to.equal(1);
    await store.clearAll();
    expect(await store.listTanks()).to.deep.equal([]);
    expect(await store.listWalkdowns()).to.deep.equal([]);
    expect(await store.listFills()).to.deep.equal([]);
    await store.importAll(data);
    expect(await store.exportAll()).to.deep.equal(data);
    store.close();
  });

  it('Store.clearDemo removes only demo tanks and demo checks', async () => {
    const store = await Store.open(dbName());
    await store.putTank(tank('demo1', 'D', true));
    await store.putTank(tank('mine'));
    await store.putCheck(check('c1', 'demo1', '2024-01-01T00:00:00.000Z', true));
    await store.putCheck(check('c2', 'mine', '2024-01-01T00:00:00.000Z'));
    const removed = await store.clearDemo();
    expect(removed.tanks.map((t) => t.id)).to.deep.equal(['demo1']);
    expect((await store.listTanks()).map((t) => t.id)).to.deep.equal(['mine']);
    expect((await store.listChecks()).map((c) => c.id)).to.deep.equal(['c2']);
    store.close();
  });

  it('Store.clearDemo keeps a demo tank the user edited or saved a check on, and undo restores the rest', async () => {
    const store = await Store.open(dbName());
    const edited = { ...tank('demo-edited', 'D', true), updatedAt: '2024-02-01T00:00:00.000Z' };
    await store.putTank(tank('demo-plain', 'D', true));
    await store.putTank(edited);
    await store.putTank(tank('demo-checked', 'D', true));
    await store.putCheck(check('mine', 'demo-checked', '2024-03-01T00:00:00.000Z', false));
    await store.putDraft({
      tankId: 'demo-plain',
      readings: { ...emptyReadings(5), gaugePercent: 40 },
      updatedAt: '2024-01-01T00:00:00.000Z',
    });
    const before = await store.exportAll();
    const removed = await store.clearDemo();
    expect(removed.tanks.map((t) => t.id)).to.deep.equal(['demo-plain']);
    expect((await store.listTanks()).map((t) => t.id).sort()).to.deep.equal([
      'demo-checked',
      'demo-edited',
    ]);
    expect((await store.listChecks()).map((c) => c.id)).to.deep.equal(['mine']);
    expect(await store.getDraft('demo-plain')).to.equal(undefined);
    await store.restoreRecords(removed);
    const after = await store.exportAll();
    const byId = (a: { id: string }, b: { id: string }) => (a.id < b.id ? -1 : 1);
    expect(after.tanks.sort(byId)).to.deep.equal(before.tanks.sort(byId));
    expect((await store.getDraft('demo-plain'))?.readings.gaugePercent).to.equal(40);
    store.close();
  });

  it('Store.putFill saves the record and ends the fill under way; listFills is newest first', async () => {
    const store = await Store.open(dbName());
    await store.putFillDraft(FILL_DRAFT);
    await store.putFill(FILL);
    const later = { ...FILL, id: 'f9', finishedAt: '2024-02-01T00:00:00.000Z' };
    await store.putFill(later);
    expect(await store.getFillDraft('t1')).to.equal(undefined);
    expect((await store.listFills('t1')).map((f) => f.id)).to.deep.equal(['f9', 'f1']);
    await store.deleteFill('f9');
    expect((await store.listFills()).map((f) => f.id)).to.deep.equal(['f1']);
    store.close();
  });

  it('Store.getMeta fills defaults and putMeta keeps changes', async () => {
    const store = await Store.open(dbName());
    expect(await store.getMeta()).to.deep.equal({
      demoSeeded: false,
      offlineNoteShown: false,
      persisted: null,
    });
    await store.putMeta({ demoSeeded: true, offlineNoteShown: false, persisted: true });
    expect((await store.getMeta()).demoSeeded).to.equal(true);
    store.close();
  });

  it('Store.importAll is all or nothing: a failing record leaves the data as it was', async () => {
    const store = await Store.open(dbName());
    await store.putTank(tank('keep'));
    // A check without its key path makes the put throw inside the transaction.
    const bad = { ...check('c', 'keep', 'x'), id: undefined } as unknown as CheckRecord;
    let threw = false;
    try {
      await store.importAll({ tanks: [tank('new')], checks: [bad], settings: null });
    } catch {
      threw = true;
    }
    expect(threw).to.equal(true);
    expect((await store.listTanks()).map((t) => t.id)).to.deep.equal(['keep']);
    store.close();
  });
});
