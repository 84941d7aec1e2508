/**
 * The tank register's rows, pure and DOM-free: tanks grouped by site (sites and names in a
 * natural order) and what a search looks in (name, site and product, folded). The flat list of
 * rows (a site's heading, then its tanks) that <tank-list> shows, virtualised when long, and the
 * search over it are components/tank-find.ts.
 */
import { productLabel } from './products.js';
import type { TankRecord } from './types.js';

export type TankRow =
  { kind: 'site'; site: string; count: number } | { kind: 'tank'; tank: TankRecord };

const collator = new Intl.Collator(undefined, { numeric: true, sensitivity: 'base' });

/** The order of sites and of names in the list (natural: "Site 2" before "Site 10"). */
export const compareNames = (a: string, b: string): number => collator.compare(a, b);

/** The heading a stored site is listed under. */
export const siteLabel = (site: string): string => site.trim() || 'No site';

/** The site a tank is listed under. */
export const siteOf = (t: TankRecord): string => siteLabel(t.site);

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
  // Plain ASCII (most names) has no accents to strip: only the case is folded.
  if (!/[\u0080-\uffff]/.test(text)) return text.toLowerCase();
  return text
    .normalize('NFD')
    .replace(/[\u0300-\u036f]/g, '')
    .toLowerCase();
}

/** What a search looks in: the tank's name, its site and its product's label, folded. */
export function searchText(t: TankRecord): string {
  return fold(`${t.name}\n${t.site}\n${productLabel(t.productId)}`);
}
