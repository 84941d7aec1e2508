/**
 * The sources registry (thermo/data/sources.ts): every fluid names a registered reference
 * equation, each reference equation is cited once, and no file reference in thermo/ dangles.
 */
import { readFileSync, readdirSync, existsSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { FLUIDS } from '../../thermo/data/fluids.js';
import { SOURCES, citation } from '../../thermo/data/sources.js';

const ROOT = join(import.meta.dirname, '../..');

function tsFiles(dir: string): string[] {
  return readdirSync(join(ROOT, dir), { withFileTypes: true }).flatMap((e) =>
    e.isDirectory()
      ? tsFiles(join(dir, e.name))
      : e.name.endsWith('.ts')
        ? [join(dir, e.name)]
        : [],
  );
}

describe('sources registry', () => {
  it.each(FLUIDS.map((f) => [f.id, f.source] as const))(
    '%s: its reference equation (%s) is in the registry',
    (_id, key) => {
      expect(citation(key)).toMatch(/\(\d{4}\)/);
    },
  );

  it('names the same reference equation for each fluid as the compiled constants table', () => {
    // test/reference/fluid-constants.csv: the bracketed key with a year is the equation's key.
    const lines = readFileSync(join(ROOT, 'test/reference/fluid-constants.csv'), 'utf8')
      .trim()
      .split('\n')
      .slice(1);
    const byCas = new Map(FLUIDS.map((f) => [f.cas, f.source]));
    for (const l of lines) {
      const cas = l.split(',')[2]!;
      const key = /\[([A-Za-z][^\]\s]*-\d{4}[^\]\s]*)\]/.exec(l)?.[1];
      expect(key, l.slice(0, 30)).toBeDefined();
      expect(byCas.get(cas), l.slice(0, 30)).toBe(key);
    }
  });

  it('cites each reference equation once: no two keys share a doi', () => {
    const dois = Object.values(SOURCES)
      .map((s) => /doi:(\S+)/.exec(s.citation)?.[1])
      .filter((d): d is string => d !== undefined);
    expect(new Set(dois).size).toBe(dois.length);
  });

  it('throws for a key that is not registered', () => {
    expect(() => citation('no-such-key')).toThrow(/no source with key no-such-key/);
  });

  it('leaves no dangling file reference in thermo/ (paths in comments and strings exist)', () => {
    const missing: string[] = [];
    for (const file of tsFiles('thermo')) {
      const text = readFileSync(join(ROOT, file), 'utf8');
      for (const m of text.matchAll(
        /\b((?:test|scripts|components|thermo)\/[\w./-]+\.(?:ts|csv|md))/g,
      )) {
        if (!existsSync(join(ROOT, m[1]!))) missing.push(`${file}: ${m[1]}`);
      }
    }
    expect(missing).toEqual([]);
  });

  it('every CFR part the rules cite is in the registry', () => {
    const text = tsFiles('thermo/rules')
      .map((f) => readFileSync(join(ROOT, f), 'utf8'))
      .join('\n');
    const cited = new Set(
      [...text.matchAll(/(29|49) CFR (\d+(?:\.\d+)?)/g)].map((m) => `${m[1]}-${m[2]}`),
    );
    expect(cited.size).toBeGreaterThan(0);
    const registered = Object.keys(SOURCES).filter((k) => k.startsWith('CFR-'));
    for (const c of cited) {
      const [title, part] = c.split('-') as [string, string];
      const ok = registered.some((k) => {
        const [, t, p] = k.split('-');
        return t === title && (part === p || part.startsWith(`${p}.`) || p!.startsWith(part));
      });
      expect(ok, `${title} CFR ${part}`).toBe(true);
    }
  });
});
