/**
 * Refrigerated CO2 and N2O in DOT-4L cylinders (thermo/rules/refrigerated.ts), called directly:
 * every column of 49 CFR 173.304a(e)(2) (CFR 2015 ed.) as copied in
 * test/reference/trade/filling_density_other.csv, at its relief setting and just above it (a
 * setting between two columns takes the next higher one, the cautious reading stated in the
 * module), and the ends of the table. 1 psi = 6.894757 kPa (FACTS.md, units).
 */
import { describe, it, expect } from 'vitest';
import { fileURLToPath } from 'node:url';
import { readCsv } from '../../../scripts/lib/csv.js';
import { dot4lRule } from '../../../thermo/rules/refrigerated.js';
import { expectWithin } from '../check-helpers.js';

const psig = (x: number) => x * 6894.757293168;
const OTHER = readCsv(
  fileURLToPath(new URL('../../reference/trade/filling_density_other.csv', import.meta.url)),
);
/** [relief setting psig, percent] of the row for `gas`, as printed. */
function columns(gas: string): [number, number][] {
  const row = OTHER.find((r) => r.gas === gas && r.regulation === '49 CFR 173.304a(e)(2)')!;
  const settings = row.container_or_packaging!.match(/relief set ([\d/]+) psig/)![1]!.split('/');
  const pcts = row.max_filling_density_pct_by_weight!.split('/');
  return settings.map((s, i) => [Number(s), Number(pcts[i])]);
}
const PRODUCTS = [
  ['carbon-dioxide', 'carbon dioxide, refrigerated liquid', 'Carbon dioxide', '0 °F'],
  ['nitrous-oxide', 'nitrous oxide, refrigerated liquid', 'Nitrous oxide', '+4 °F'],
] as const;
const SRC = '49 CFR 173.304a(e)(2) (filling_density_other.csv)';

describe('DOT-4L cylinders: 49 CFR 173.304a(e)(2)', () => {
  it('at each printed setting, that column’s percent', () => {
    for (const [id, gas, name, offered] of PRODUCTS) {
      const cols = columns(gas);
      expect(cols.length).toBe(8);
      for (const [set, pct] of cols) {
        const r = dot4lRule(id, psig(set))!;
        expect(r, `${id} ${set}`).not.toBeNull();
        expectWithin(r.fillingDensity * 100, pct, 1e-9, {
          input: { id, set },
          source: SRC,
          kind: 'published',
        });
        expect(r.id).toBe('dot-4l');
        expect(r.citation).toBe('49 CFR 173.304a(e)(2) (CFR 2015 ed.)');
        expect(r.description).toBe(
          `${name}, refrigerated liquid, in a DOT-4L cylinder with its relief set at ${set} psig (column ${set} psig): ${pct} % of water weight; offered at ${offered} or colder and 290 psig or less`,
        );
      }
    }
  });
  it('between two settings, the next higher column; the setting shown rounded up', () => {
    for (const [id, gas] of PRODUCTS) {
      const cols = columns(gas);
      for (let i = 1; i < cols.length; i++) {
        const [lower] = cols[i - 1]!;
        const [set, pct] = cols[i]!;
        const r = dot4lRule(id, psig(lower + 0.3))!;
        expectWithin(r.fillingDensity * 100, pct, 1e-9, {
          input: { id, relief: lower + 0.3 },
          source: SRC,
          kind: 'published',
        });
        expect(r.description).toContain(`relief set at ${lower + 1} psig (column ${set} psig)`);
      }
      // below the lowest setting: the 105 psig column
      expect(dot4lRule(id, psig(50))!.fillingDensity * 100).toBeCloseTo(cols[0]![1], 12);
    }
  });
  it('above 625 psig, or another product, or a blend: not a DOT-4L rule', () => {
    expect(dot4lRule('carbon-dioxide', psig(625.01))).toBeNull();
    expect(dot4lRule('nitrous-oxide', psig(1800))).toBeNull();
    expect(dot4lRule('ammonia', psig(230))).toBeNull();
    expect(dot4lRule('propane', psig(230))).toBeNull();
    const blend = {
      components: [
        { id: 'carbon-dioxide', moleFraction: 0.5 },
        { id: 'nitrous-oxide', moleFraction: 0.5 },
      ],
    };
    expect(dot4lRule(blend, psig(230))).toBeNull();
    const custom = { custom: { name: 'X', molarMass: 0.044, Tc: 304, Pc: 7.4e6, omega: 0.22 } };
    expect(dot4lRule(custom, psig(230))).toBeNull();
  });
});
