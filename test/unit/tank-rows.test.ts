// The register's rows and search (components/tank-rows.ts, components/tank-find.ts): grouping by
// site in natural order and a search by name, site or product, also as it is typed and deleted a
// letter at a time (the search narrows the last matches), checked against hand-made expectations on invented
// placeholder tanks (not demo data). Product labels come from the app's product list
// (components/products.ts): "Propane" and "Anhydrous ammonia" are how the trade names them
// (common practice).
import { describe, expect, it } from 'vitest';
import { TankFinder } from '../../components/tank-find.js';
import { productLabel } from '../../components/products.js';
import type { TankRecord } from '../../components/types.js';

function tank(id: string, name: string, site: string, productId: string): TankRecord {
  return {
    id,
    name,
    site,
    notes: '',
    nameplate: { waterCapacity: 1, designPressureGauge: 1.7e6 },
    productId,
    demo: false,
    createdAt: '2024-01-01T00:00:00.000Z',
    updatedAt: '2024-01-01T00:00:00.000Z',
  } as TankRecord;
}

const tanks = [
  tank('a', 'Tank 10', 'Farm 2', 'propane'),
  tank('b', 'Tank 9', 'Farm 2', 'propane'),
  tank('c', 'Nurse tank', 'Farm 10', 'ammonia'),
  tank('d', 'Barn', 'Pré-Alpes', 'propane'),
  tank('e', 'Loose', '', 'r134a'),
];
const shown = (finder: TankFinder, q: string) =>
  finder.find(q).rows.map((r) => (r.kind === 'site' ? `[${r.site}]` : r.tank.id));
// A fresh finder per query: nothing carried over from an earlier search.
const ids = (q: string) => shown(new TankFinder(tanks), q);

describe('tank rows', () => {
  it('groups by site in natural order (2 before 10), names in natural order, no site last-named', () => {
    expect(ids('')).toEqual([
      '[Farm 2]',
      'b',
      'a',
      '[Farm 10]',
      'c',
      '[No site]',
      'e',
      '[Pré-Alpes]',
      'd',
    ]);
  });

  it('finds a tank by its name, its site or its product, ignoring case and accents', () => {
    expect(productLabel('ammonia').toLowerCase()).toContain('ammonia');
    expect(ids('nurse')).toEqual(['[Farm 10]', 'c']);
    expect(ids('FARM 2')).toEqual(['[Farm 2]', 'b', 'a']);
    expect(ids('pre-alpes')).toEqual(['[Pré-Alpes]', 'd']);
    expect(ids('ammonia')).toEqual(['[Farm 10]', 'c']);
    expect(ids('propane farm')).toEqual(['[Farm 2]', 'b', 'a']);
    expect(ids('nothing like this')).toEqual([]);
  });

  it('counts the tanks a search keeps under each site heading', () => {
    const found = new TankFinder(tanks).find('tank 10 farm 2');
    expect(found.shown).toBe(1);
    expect(found.rows).toEqual([
      { kind: 'site', site: 'Farm 2', count: 1 },
      { kind: 'tank', tank: tanks[0] },
    ]);
  });

  it('finds the same as it is typed, deleted and retyped a letter at a time', () => {
    // One finder, as the list keeps it: each query after the first narrows or widens the last.
    const finder = new TankFinder(tanks);
    const expected: [string, string[]][] = [
      // "a" is in every text (R-134a too); "ar" in "farm" and "barn", not in "loose … r-134a".
      ['a', ['[Farm 2]', 'b', 'a', '[Farm 10]', 'c', '[No site]', 'e', '[Pré-Alpes]', 'd']],
      ['ar', ['[Farm 2]', 'b', 'a', '[Farm 10]', 'c', '[Pré-Alpes]', 'd']],
      ['tank 1', ['[Farm 2]', 'a', '[Farm 10]', 'c']], // "Tank 10"; "Nurse tank" at "Farm 10"
      ['tank 10', ['[Farm 2]', 'a', '[Farm 10]', 'c']],
      ['tank 10 f', ['[Farm 2]', 'a', '[Farm 10]', 'c']],
      ['tank 10 farm 2', ['[Farm 2]', 'a']],
      ['tank 10 farm', ['[Farm 2]', 'a', '[Farm 10]', 'c']], // a letter deleted: wider again
      ['tank', ['[Farm 2]', 'b', 'a', '[Farm 10]', 'c']],
      ['', ['[Farm 2]', 'b', 'a', '[Farm 10]', 'c', '[No site]', 'e', '[Pré-Alpes]', 'd']],
      ['alpes', ['[Pré-Alpes]', 'd']],
    ];
    for (const [q, want] of expected) expect(shown(finder, q), q).toEqual(want);
  });

  it('keeps the same rows when a keystroke drops no tank, so the list is not laid out again', () => {
    const finder = new TankFinder(tanks);
    const farm = finder.find('farm').rows;
    expect(finder.find('farm ').rows).toBe(farm); // a space: the same words
    expect(finder.find('farm t').rows).toBe(farm); // every Farm tank holds a "t"
    expect(finder.find('farm 9').rows).not.toBe(farm);
    expect(finder.find('').rows).toBe(finder.find('').rows);
  });

  it('builds its texts a slice at a time and finds the same before and after', () => {
    const finder = new TankFinder(tanks);
    expect(finder.prepared).toBe(false);
    while (!finder.prepare());
    expect(finder.prepared).toBe(true);
    expect(shown(finder, 'ammonia')).toEqual(['[Farm 10]', 'c']);
  });
});
