/**
 * The tank list's search, made for registers of thousands (DOM-free). Each tank's folded text
 * (name, site, product: components/tank-rows.ts `searchText`) is built once per register, a bit
 * at a time in idle moments (`prepare`) or at the first search; a query that only narrows the
 * last one (typing on: every word of the last query is inside a word of the new one) looks only
 * at the last one's matches. The same matches give back the same rows array, so the virtualised
 * list is not laid out again when a keystroke changes nothing.
 */
import { fold, groupBySite, searchText, type TankRow } from './tank-rows.js';
import type { TankRecord } from './types.js';

interface Found {
  words: string[];
  /** Indices into the flat list, ascending (so grouped by site, in the list's order). */
  hits: number[];
  rows: TankRow[];
}

/** Tanks looked at per slice of `prepare`. */
const SLICE = 100;

export class TankFinder {
  /** Tanks in the list's order, and each one's site heading. */
  private readonly flat: TankRecord[] = [];
  private readonly sites: string[] = [];
  private readonly texts: string[] = [];
  private all: Found | null = null;
  private last: Found | null = null;

  constructor(tanks: readonly TankRecord[]) {
    for (const [site, list] of groupBySite(tanks))
      for (const t of list) {
        this.flat.push(t);
        this.sites.push(site);
      }
  }

  /** Every tank is in the search already. */
  get prepared(): boolean {
    return this.texts.length === this.flat.length;
  }

  /** Builds the search texts of the next few tanks; false while some are left. */
  prepare(): boolean {
    const end = Math.min(this.flat.length, this.texts.length + SLICE);
    for (let i = this.texts.length; i < end; i++) this.texts.push(searchText(this.flat[i]!));
    return this.prepared;
  }

  /** The rows for `query` (sites with their matching tanks) and how many tanks match. */
  find(query: string): { rows: TankRow[]; shown: number } {
    const words = fold(query).split(/\s+/).filter(Boolean);
    const found = words.length ? this._filter(words) : this._all();
    return { rows: found.rows, shown: found.hits.length };
  }

  private _all(): Found {
    return (this.all ??= this._found([], [...this.flat.keys()]));
  }

  private _filter(words: string[]): Found {
    const last = this.last;
    if (last && same(last.words, words)) return last;
    const narrows = last !== null && last.words.every((w) => words.some((v) => v.includes(w)));
    const from = narrows ? last.hits : this._all().hits;
    while (!this.prepare());
    const hits = from.filter((i) => words.every((w) => this.texts[i]!.includes(w)));
    // Nothing dropped: the last rows stand (the list is not laid out again).
    this.last =
      narrows && hits.length === from.length ? { ...last, words } : this._found(words, hits);
    return this.last;
  }

  private _found(words: string[], hits: number[]): Found {
    const rows: TankRow[] = [];
    for (let k = 0; k < hits.length;) {
      const site = this.sites[hits[k]!]!;
      let end = k;
      while (end < hits.length && this.sites[hits[end]!] === site) end++;
      rows.push({ kind: 'site', site, count: end - k });
      for (; k < end; k++) rows.push({ kind: 'tank', tank: this.flat[hits[k]!]! });
    }
    return { words, hits, rows };
  }
}

const same = (a: readonly string[], b: readonly string[]) =>
  a.length === b.length && a.every((w, i) => w === b[i]);
