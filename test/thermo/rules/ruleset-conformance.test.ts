/**
 * The pattern every registered rule set passes (DEVELOPERS.md, "How to add a rule set"): its id
 * finds it in the registry, its sources resolve in thermo/data/sources.ts, every filling density
 * is positive and at most the highest any rule prints, its specific-gravity tables run upward
 * without overlaps and never lower the figure for a denser liquid, its entries refer to tables and
 * columns that exist, its reference temperatures are warm-weather temperatures and its relief
 * ranges are ordered. These are identity checks on the data: no figure is asserted here (each
 * set's own test checks its figures against its published text).
 */
import { describe, it, expect } from 'vitest';
import { readFileSync, readdirSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { join } from 'node:path';
import { SOURCES } from '../../../thermo/data/sources.js';
import {
  RULE_SETS,
  RULE_SET_IDS,
  ruleSetById,
  DEFAULT_RULE_SET,
  DEFAULT_RULE_SET_ID,
} from '../../../thermo/rules/sets/index.js';
import type { RuleSet, SgBand } from '../../../thermo/rules/ruleset.js';

const ROOT = fileURLToPath(new URL('../../../', import.meta.url));

function checkTable(name: string, t: readonly SgBand[]): void {
  expect(t.length, name).toBeGreaterThan(0);
  const cols = t[0]!.length - 2;
  for (let i = 0; i < t.length; i++) {
    const [lo, hi, ...pct] = t[i]!;
    expect(pct.length, `${name} row ${i}: same columns`).toBe(cols);
    if (hi !== null) expect(hi, `${name} row ${i}: band upward`).toBeGreaterThanOrEqual(lo);
    else expect(i, `${name}: only the last band is open`).toBe(t.length - 1);
    for (const p of pct) expect(p, `${name} row ${i}`).toBeGreaterThan(0);
    if (i === 0) continue;
    const prev = t[i - 1]!;
    expect(lo, `${name} row ${i}: no overlap`).toBeGreaterThan(prev[1] as number);
    for (let c = 0; c < cols; c++)
      expect(
        pct[c]!,
        `${name} row ${i} col ${c}: denser liquid, no lower figure`,
      ).toBeGreaterThanOrEqual(prev[2 + c] as number);
  }
}

function conforms(set: RuleSet): void {
  expect(ruleSetById(set.id)).toBe(set);
  expect(set.title.length).toBeGreaterThan(0);
  expect(set.edition.length).toBeGreaterThan(0);
  expect(set.sources.length).toBeGreaterThan(0);
  for (const key of set.sources) expect(SOURCES[key], `source ${key}`).toBeDefined();
  expect(set.sizeSplitM3).toBeGreaterThan(0);
  expect(set.fillingDensities.length).toBeGreaterThan(0);
  for (const [name, t] of Object.entries(set.sgTables)) checkTable(`${set.id} ${name}`, t);
  for (const e of set.fillingDensities) {
    expect(e.classes.length, e.id).toBeGreaterThan(0);
    expect(e.citation.length, e.id).toBeGreaterThan(0);
    if (typeof e.percent === 'number') {
      expect(e.percent, e.id).toBeGreaterThan(0);
      expect(e.percent, e.id).toBeLessThanOrEqual(125);
    } else {
      const t = set.sgTables[e.percent.table];
      expect(t, `${e.id}: table ${e.percent.table}`).toBeDefined();
      expect(e.percent.column, e.id).toBeLessThan(t![0]!.length - 2);
    }
    if (e.fixedGauge) {
      expect(e.fixedGauge.factor, e.id).toBeGreaterThan(0);
      expect(e.fixedGauge.factor, e.id).toBeLessThanOrEqual(1);
    }
  }
  for (const r of set.referenceTemperatures) {
    // A not-liquid-full temperature is a hot-day figure: from 0 °C to 70 °C.
    expect(r.temperature, r.id).toBeGreaterThanOrEqual(273.15);
    expect(r.temperature, r.id).toBeLessThanOrEqual(343.15);
    expect(r.classes.length, r.id).toBeGreaterThan(0);
  }
  for (const r of set.relief.ranges) {
    expect(r.min).toBeGreaterThan(0);
    expect(r.max).toBeGreaterThanOrEqual(r.min);
  }
}

describe('every registered rule set conforms', () => {
  it('ids are unique and the default is registered', () => {
    const ids = RULE_SETS.map((s) => s.id);
    expect(new Set(ids).size).toBe(ids.length);
    expect(RULE_SETS).toContain(DEFAULT_RULE_SET);
    // The light list of ids the app shell checks stored choices against is the registry's.
    expect([...RULE_SET_IDS]).toEqual(ids);
    expect(DEFAULT_RULE_SET_ID).toBe(DEFAULT_RULE_SET.id);
    // Lookups are by Map: an Object built-in is never a rule set.
    expect(ruleSetById('constructor')).toBeUndefined();
    expect(ruleSetById('__proto__')).toBeUndefined();
  });
  for (const set of RULE_SETS)
    it(`${set.id}: limits positive, tables monotone, sources resolve`, () => conforms(set));

  it('each set folder is registered, and each registered set has its own test', () => {
    const dir = join(ROOT, 'thermo/rules/sets');
    const folders = readdirSync(dir, { withFileTypes: true })
      .filter((d) => d.isDirectory())
      .map((d) => d.name)
      .sort();
    expect(folders).toEqual(RULE_SETS.map((s) => s.id).sort());
    for (const id of folders)
      expect(() => readFileSync(join(ROOT, `test/thermo/rules/${id}.test.ts`))).not.toThrow();
  });
});

describe('imports run one way: check → rules → types', () => {
  it('nothing in thermo/rules or thermo/tank imports from thermo/check', () => {
    const offenders: string[] = [];
    const walk = (d: string): void => {
      for (const f of readdirSync(join(ROOT, d), { withFileTypes: true })) {
        const p = `${d}/${f.name}`;
        if (f.isDirectory()) walk(p);
        else if (
          p.endsWith('.ts') &&
          /from '[./]*\/check\//.test(readFileSync(join(ROOT, p), 'utf8'))
        )
          offenders.push(p);
      }
    };
    walk('thermo/rules');
    walk('thermo/tank');
    expect(offenders).toEqual([]);
  });
});
