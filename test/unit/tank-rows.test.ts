// The register's rows and search (components/tank-rows.ts): grouping by site in natural order
// and a search by name, site or product, checked against hand-made expectations on invented
// placeholder tanks (not demo data). Product labels come from the app's product list
// (components/products.ts): "Propane" and "Anhydrous ammonia" are how the trade names them
// (common practice).
import { describe, expect, it } from 'vitest';
import { groupBySite, rowsFor, searchText } from '../../components/tank-rows.js';
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
const memo = new Map(tanks.map((t) => [t, searchText(t)]));
const text = (t: TankRecord) => memo.get(t)!;
const ids = (q: string) =>
  rowsFor(groupBySite(tanks), q, text).map((r) => (r.kind === 'site' ? `[${r.site}]` : r.tank.id));

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
    const rows = rowsFor(groupBySite(tanks), 'tank 10 farm 2', text);
    expect(rows).toEqual([
      { kind: 'site', site: 'Farm 2', count: 1 },
      { kind: 'tank', tank: tanks[0] },
    ]);
  });
});
