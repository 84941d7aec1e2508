/// <reference types="mocha" />
// Site forecasts and walkdowns in the backup file (format 2) and in storage: a round trip keeps
// every record, a file of the previous format (1) still imports with all its data, and a bad
// walkdown is refused naming where. Kind: identity / behaviour; records are placeholders.
import { expect } from '@open-wc/testing';
import { oldSettings, oldTank } from './fixtures/old-names.js';
import { deleteDB } from 'idb';
import { BACKUP_VERSION, makeBackup, parseBackup } from '../../pwa/backup.js';
import { Store } from '../../pwa/storage.js';
import { href, parseRoute, type Route } from '../../pwa/router.js';
import { DEFAULT_SETTINGS, emptyReadings, type TankRecord } from '../../components/types.js';
import type { SiteForecast, WalkdownRecord } from '../../components/walkdown-types.js';

const names: string[] = [];
after(async () => {
  for (const n of names) await deleteDB(n);
});

function tank(id: string): TankRecord {
  return {
    id,
    site: 'S',
    name: `Tank ${id}`,
    notes: '',
    nameplate: { waterCapacity: 1, designPressureGauge: 1e6 },
    productId: 'propane',
    demo: false,
    createdAt: '2024-01-01T00:00:00.000Z',
    updatedAt: '2024-01-01T00:00:00.000Z',
  };
}

const FORECAST: SiteForecast = {
  site: 'S',
  days: [310, 312],
  sunAllowance: 5,
  tankAllowances: [{ tankId: 'a', sunAllowance: 0 }],
  enteredAt: '2024-06-01T00:00:00.000Z',
  route: ['a'],
};

function walk(id: string): WalkdownRecord {
  return {
    id,
    site: 'S',
    status: 'finished',
    startedAt: '2024-06-01T01:00:00.000Z',
    finishedAt: '2024-06-01T02:00:00.000Z',
    checkedBy: 'A. Person',
    forecast: FORECAST,
    entries: [
      {
        tankId: 'a',
        tankName: 'Tank a',
        status: 'unreached',
        readings: emptyReadings(5),
        note: 'note',
        reason: 'gate locked',
        at: '2024-06-01T01:30:00.000Z',
        result: null,
        problem: '',
      },
    ],
    current: 0,
    appVersion: 'test',
  };
}

/** A backup exactly as format 1 wrote it (no sites, no walkdowns). */
function versionOneFile(): string {
  return JSON.stringify({
    format: 'tankside-backup',
    version: 1,
    exportedAt: '2024-05-01T00:00:00.000Z',
    // As format 1 wrote them: the pressures under their old names.
    tanks: [oldTank(tank('a'))],
    checks: [],
    settings: oldSettings({ ...DEFAULT_SETTINGS, sunAllowance: 3 }),
  });
}

describe('walkdowns in the backup', () => {
  it('a backup with forecasts and walkdowns reads back unchanged', () => {
    expect(BACKUP_VERSION).to.equal(3);
    const data = {
      tanks: [tank('a')],
      checks: [],
      settings: null,
      sites: [FORECAST],
      walkdowns: [walk('w1')],
      fills: [],
    };
    const r = parseBackup(JSON.stringify(makeBackup(data)));
    expect(r.ok).to.equal(true);
    if (r.ok) expect(r.data).to.deep.equal(data);
  });

  it('a format-1 backup imports with all its data and no walkdowns', async () => {
    const r = parseBackup(versionOneFile());
    expect(r.ok).to.equal(true);
    if (!r.ok) return;
    const name = `test-${Math.random().toString(36).slice(2)}`;
    names.push(name);
    const store = await Store.open(name);
    await store.importAll(r.data);
    const back = await store.exportAll();
    expect(back.tanks).to.deep.equal([tank('a')]);
    expect(back.settings?.sunAllowance).to.equal(3);
    expect(back.walkdowns).to.deep.equal([]);
    // Exported again, it is a format-3 file that still holds everything.
    const again = parseBackup(JSON.stringify(makeBackup(back)));
    expect(again.ok && again.data.tanks.length).to.equal(1);
    store.close();
  });

  it('a bad walkdown is refused naming the walkdown and the field; nothing is read', () => {
    const bad = { ...walk('w1'), entries: [{ ...walk('w1').entries[0]!, status: 'maybe' }] };
    const r = parseBackup(
      JSON.stringify({
        ...makeBackup({ tanks: [], checks: [], settings: null }),
        walkdowns: [bad],
      }),
    );
    expect(r.ok).to.equal(false);
    if (!r.ok) expect(r.reason).to.contain('Walkdown 1, tank 1').and.contain('status');
    const nan = { ...walk('w2'), forecast: { ...FORECAST, days: [Number.NaN] } };
    const r2 = parseBackup(
      JSON.stringify({
        ...makeBackup({ tanks: [], checks: [], settings: null }),
        walkdowns: [nan],
      }),
    );
    expect(r2.ok).to.equal(false);
  });
});

describe('the site route in the backup', () => {
  it('a site record without a route (as written before routes) imports as it was', () => {
    const { route: _unused, ...old } = FORECAST;
    expect(_unused).to.deep.equal(['a']);
    const r = parseBackup(
      JSON.stringify({
        ...makeBackup({ tanks: [tank('a')], checks: [], settings: null }),
        sites: [old],
      }),
    );
    expect(r.ok).to.equal(true);
    if (r.ok) {
      expect(r.data.sites).to.deep.equal([old]);
      expect('route' in r.data.sites![0]!).to.equal(false);
    }
  });

  it('a route survives storage and a backup round trip in its order; a bad stop is refused', async () => {
    const name = `test-${Math.random().toString(36).slice(2)}`;
    names.push(name);
    const store = await Store.open(name);
    const site = { ...FORECAST, route: ['c', 'a', 'b'] };
    await store.putSite(site);
    expect((await store.getSite('S'))?.route).to.deep.equal(['c', 'a', 'b']);
    const back = await store.exportAll();
    store.close();
    const r = parseBackup(JSON.stringify(makeBackup(back)));
    expect(r.ok && r.data.sites).to.deep.equal([site]);
    const bad = parseBackup(
      JSON.stringify({
        ...makeBackup({ tanks: [], checks: [], settings: null }),
        sites: [{ ...FORECAST, route: ['a', 42] }],
      }),
    );
    expect(bad.ok).to.equal(false);
    if (!bad.ok) expect(bad.reason).to.contain('Site forecast 1').and.contain('route stop 2');
  });
});

describe('walkdown routes', () => {
  it('a site with a slash, a walk and a record read back from their links', () => {
    const routes: Route[] = [
      { name: 'site', site: 'Yard 2/North · Invented' },
      { name: 'walk', id: 'w-1' },
      { name: 'walkdown', id: 'w-1' },
    ];
    for (const r of routes) expect(parseRoute(href(r))).to.deep.equal(r);
  });
});
