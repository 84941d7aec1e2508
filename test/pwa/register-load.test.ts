/// <reference types="mocha" />
// pwa/register-load.ts in real Chromium IndexedDB: at start-up the list's first screen is read
// first (the first sites in the list's natural order, every tank of each, with their newest
// checks), then the whole register, then every check; a read overtaken by a newer one never
// lands after it. Invented placeholder tanks and checks; the expected screens are worked out by
// hand from how the sites are filled below.
import { expect, waitUntil } from '@open-wc/testing';
import { deleteDB } from 'idb';
import { Store } from '../../pwa/storage.js';
import { loadFirstScreen, loadRegister, type RegisterSink } from '../../pwa/register-load.js';
import type { CheckRecord, TankRecord } from '../../components/types.js';

const names: string[] = [];
after(async () => {
  for (const n of names) await deleteDB(n);
});

function tank(id: string, site: string): TankRecord {
  return {
    id,
    site,
    name: `Tank ${id}`,
    notes: '',
    nameplate: { waterCapacity: 1, designPressureGauge: 1e6 },
    productId: 'propane',
    demo: false,
    createdAt: '2024-01-01T00:00:00.000Z',
    updatedAt: '2024-01-01T00:00:00.000Z',
  };
}

// Only what the list and its loading read of a check (id, tank, time, top level).
const check = (id: string, tankId: string, at: string, topLevel: string) =>
  ({ id, tankId, at, demo: false, summary: { topLevel } }) as unknown as CheckRecord;

/**
 * Sites as stored, and their tanks: "No site" (3 tanks stored under "" and "  "), "Site 1" (25),
 * "Site 2" (12: 10 stored as "Site 2", 2 as "Site 2 "), "Site 3" (5), "Site 10" (10): 55 tanks.
 * The list's order (natural, compareNames): No site, Site 1, Site 2, Site 3, Site 10. The index's
 * own order is by code unit ("" < "  " < "Site 1" < "Site 10" < "Site 2" < "Site 2 " < "Site 3"),
 * so a first screen read in key order would bring "Site 10" in before "Site 2".
 */
const SITES: [string, number][] = [
  ['', 2],
  ['  ', 1],
  ['Site 1', 25],
  ['Site 2', 10],
  ['Site 2 ', 2],
  ['Site 3', 5],
  ['Site 10', 10],
];

async function register(): Promise<Store> {
  const name = `test-${Math.random().toString(36).slice(2)}`;
  names.push(name);
  const store = await Store.open(name);
  const tanks = SITES.flatMap(([site, n]) =>
    Array.from({ length: n }, (_, i) => tank(`${site.trim() || 'none'}-${i}${site}`, site)),
  );
  for (const t of tanks) await store.putTank(t);
  // Two checks of the first tank of Site 1 (the later one is its newest), one of a Site 10 tank.
  await store.putCheck(check('c1', 'Site 1-0Site 1', '2025-01-01T00:00:00.000Z', 'caution'));
  await store.putCheck(check('c2', 'Site 1-0Site 1', '2025-02-01T00:00:00.000Z', 'danger'));
  await store.putCheck(check('c3', 'Site 10-0Site 10', '2025-03-01T00:00:00.000Z', 'note'));
  return store;
}

const sitesOf = (tanks: TankRecord[]) => [...new Set(tanks.map((t) => t.site))].sort();

describe('register loading', () => {
  it('reads the first sites in the list’s order, whole, with their newest checks', async () => {
    const store = await register();
    // At least 8 tanks: "No site" (3) is not enough; the next two sites of the list come whole.
    const first = await loadFirstScreen(store, 8);
    expect(sitesOf(first.tanks)).to.deep.equal(['', '  ', 'Site 1', 'Site 2', 'Site 2 ']);
    expect(first.tanks.length).to.equal(3 + 25 + 12);
    expect(first.last['Site 1-0Site 1']?.id).to.equal('c2');
    expect(first.last['Site 10-0Site 10']).to.equal(undefined); // not on the first screen
    // At least 2 tanks: "No site" alone (both stored spellings).
    expect(sitesOf((await loadFirstScreen(store, 2)).tanks)).to.deep.equal(['', '  ']);
    store.close();
  });

  it('at start-up shows the first screen, then the whole register, then every check', async () => {
    const store = await register();
    const log: string[] = [];
    let tanks = 0;
    let checks: CheckRecord[] = [];
    const sink: RegisterSink = {
      gotFirst: (h) => log.push(`first ${h.tanks.length}`),
      gotHead: (h) => {
        log.push(`head ${h.tanks.length}`);
        tanks = h.tanks.length;
        expect(h.last['Site 10-0Site 10']?.id).to.equal('c3');
      },
      gotChecks: (c) => {
        log.push(`checks ${c.length}`);
        checks = c;
      },
    };
    await loadRegister(store, sink, true);
    await waitUntil(() => checks.length === 3, 'every check read', { timeout: 30_000 });
    // First screen: No site (3), then Site 1 and Site 2 together (37): 40 ≥ 24.
    expect(log).to.deep.equal(['first 40', 'head 55', 'checks 3']);
    expect(tanks).to.equal(55);
    expect(checks.map((c) => c.id)).to.deep.equal(['c3', 'c2', 'c1']); // newest first
    store.close();
  });

  it('drops a start-up read overtaken by a newer one, so a tank added meanwhile stays listed', async () => {
    const store = await register();
    const log: string[] = [];
    let after: Promise<void> | null = null;
    const sink = (tag: string): RegisterSink => ({
      gotFirst: () => {
        log.push(`${tag} first`);
        // The first screen is shown and the rest is still to be read when a tank is added.
        after = store
          .putTank(tank('added', 'Site 3'))
          .then(() => loadRegister(store, sink('after')));
      },
      gotHead: (h) => log.push(`${tag} head ${h.tanks.length}`),
      gotChecks: (c) => log.push(`${tag} checks ${c.length}`),
    });
    await loadRegister(store, sink('start'), true);
    await waitUntil(() => after !== null);
    await after;
    const heads = log.filter((l) => l.includes('head'));
    // Whatever the start-up read managed before, nothing of it comes after the newer read's.
    expect(heads.at(-1)).to.equal('after head 56');
    const later = log.slice(log.indexOf('after head 56') + 1);
    expect(later.filter((l) => !l.includes('checks'))).to.deep.equal([]);
    store.close();
  });
});
