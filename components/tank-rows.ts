/**
 * The tank register's rows, pure and DOM-free: tanks grouped by site (sites and names in a
 * natural order), a search over name, site and product, and the flat list of rows (a site's
 * heading, then its tanks) that <tank-list> shows, virtualised when long.
 */
import { productLabel } from './products.js';
import type { TankRecord } from './types.js';

export type TankRow =
  { kind: 'site'; site: string; count: number } | { kind: 'tank'; tank: TankRecord };

const collator = new Intl.Collator(undefined, { numeric: true, sensitivity: 'base' });

/** The site a tank is listed under. */
export const siteOf = (t: TankRecord): string => t.site.trim() || 'No site';

/** Sites in natural order, each with its tanks by name. */
export function groupBySite(tanks: readonly TankRecord[]): [string, TankRecord[]][] {
  const bySite = new Map<string, TankRecord[]>();
  for (const t of tanks) {
    const site = siteOf(t);
    const list = bySite.get(site);
    if (list) list.push(t);
    else bySite.set(site, [t]);
  }
  return [...bySite.entries()]
    .sort(([a], [b]) => collator.compare(a, b))
    .map(([site, list]) => [site, list.sort((a, b) => collator.compare(a.name, b.name))]);
}

/** Folds case and accents, so "pre" finds "Pré-Alpes" and "PROPANE" finds "Propane". */
export function fold(text: string): string {
  return text
    .normalize('NFD')
    .replace(/[\u0300-\u036f]/g, '')
    .toLowerCase();
}

/** What a search looks in: the tank's name, its site and its product's label, folded. */
export function searchText(t: TankRecord): string {
  return fold(`${t.name}\n${t.site}\n${productLabel(t.productId)}`);
}

/**
 * Rows for the groups, keeping only tanks whose search text holds every word of `query`
 * (words separated by spaces; an empty query keeps all). A site with no tank left is dropped.
 */
export function rowsFor(
  groups: readonly [string, TankRecord[]][],
  query: string,
  textOf: (t: TankRecord) => string,
): TankRow[] {
  const words = fold(query).split(/\s+/).filter(Boolean);
  const rows: TankRow[] = [];
  for (const [site, list] of groups) {
    const kept = words.length
      ? list.filter((t) => words.every((w) => textOf(t).includes(w)))
      : list;
    if (kept.length === 0) continue;
    rows.push({ kind: 'site', site, count: kept.length });
    for (const tank of kept) rows.push({ kind: 'tank', tank });
  }
  return rows;
}
