/**
 * The refrigerant blends in the app's product list and in a backup. Compositions are checked
 * against the reference tables' README (test/reference/blends/README.md, table "Blends",
 * nominal mass fractions of the ASHRAE 34 designations).
 */
import { describe, expect, it } from 'vitest';
import { productChoices, productFor, tripleTemperatures } from '../../components/products.js';
import { buildDemo } from '../../pwa/demo.js';
import { makeBackup, parseBackup } from '../../pwa/backup.js';
import { describeProduct } from '../../thermo/index.js';

/** test/reference/blends/README.md, "mass fractions" column, in percent. */
const NOMINAL: Record<string, { name: string; parts: number[] }> = {
  r410a: { name: 'R-410A', parts: [50, 50] },
  r404a: { name: 'R-404A', parts: [44, 4, 52] },
  r407c: { name: 'R-407C', parts: [23, 25, 52] },
  r507a: { name: 'R-507A', parts: [50, 50] },
  r454b: { name: 'R-454B', parts: [68.9, 31.1] },
};

describe('refrigerant blends in the product picker', () => {
  const choices = productChoices();

  it('lists each blend among the refrigerants, with its nominal composition', () => {
    for (const [id, ref] of Object.entries(NOMINAL)) {
      const c = choices.find((p) => p.id === id)!;
      expect(c, id).toBeDefined();
      expect(c.group).toBe('Refrigerant');
      expect(c.label.startsWith(ref.name)).toBe(true);
      const shown = /(\d[\d./]*) % by mass/
        .exec(c.composition ?? '')![1]!
        .split('/')
        .map(Number);
      expect(shown).toEqual(ref.parts);
      expect(c.source).toMatch(/ASHRAE/);
    }
  });

  it('keeps the refrigerants together in one group', () => {
    const groups = choices.map((c) => c.group);
    const first = groups.indexOf('Refrigerant');
    const last = groups.lastIndexOf('Refrigerant');
    expect(groups.slice(first, last + 1).every((g) => g === 'Refrigerant')).toBe(true);
  });

  it('gives the core a product it resolves, and the components’ triple points', () => {
    for (const id of Object.keys(NOMINAL)) {
      expect(describeProduct(productFor(id)!).label).toBe(NOMINAL[id]!.name);
      expect(tripleTemperatures(id).length).toBe(NOMINAL[id]!.parts.length);
    }
  });
});

describe('a backup with the refrigerant demo cylinders', () => {
  it('keeps the blend id and the recovery limit through export and import', () => {
    const demo = buildDemo();
    const parsed = parseBackup(
      JSON.stringify(makeBackup({ tanks: demo.tanks, checks: [], settings: null })),
    );
    expect(parsed.ok).toBe(true);
    if (!parsed.ok) return;
    const cyl = parsed.data.tanks.find((t) => t.productId === 'r410a')!;
    expect(cyl.nameplate.recovery?.fillFraction).toBe(0.8);
    expect(parsed.data.tanks.some((t) => t.productId === 'r454b')).toBe(true);
  });

  it('refuses a recovery limit out of range, naming the field, and changes nothing', () => {
    const demo = buildDemo();
    const bad = demo.tanks.map((t) =>
      t.productId === 'r410a'
        ? { ...t, nameplate: { ...t.nameplate, recovery: { fillFraction: 1.5 } } }
        : t,
    );
    const parsed = parseBackup(
      JSON.stringify(makeBackup({ tanks: bad, checks: [], settings: null })),
    );
    expect(parsed.ok).toBe(false);
    if (parsed.ok) return;
    expect(parsed.reason).toMatch(/recovery/);
    expect(parsed.reason).toMatch(/fillFraction/);
  });
});
