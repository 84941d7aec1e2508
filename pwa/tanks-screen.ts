/**
 * The list screen. Its <tank-list> is made once per shell and kept while the app runs, so going
 * back to the list from a tank puts the rows it drew last back on screen at once (the virtualiser
 * keeps its rows and their measured heights) instead of building the list again. Its data is set
 * on every render from the shell's state (a new array after any change), so it never shows an
 * older register than the shell holds; the search typed stays.
 */
import { html, type TemplateResult } from 'lit';
import { DisplayUnits } from '../components/display.js';
import type { TankIdDetail, TankList } from '../components/tank-list.js';
import type { Settings } from '../components/types.js';
import type { ScreenContext, ScreenHandlers } from './screens.js';
import '../components/tank-list.js';

/** The kept list of each shell (by its handlers, made once per shell) and the latest context. */
const kept = new WeakMap<ScreenHandlers, { list: TankList; c: ScreenContext }>();
/** Display units per settings object, so a render with the same settings changes nothing. */
const displays = new WeakMap<Settings, DisplayUnits>();

export function tanksScreen(c: ScreenContext): TemplateResult {
  let k = kept.get(c.on);
  if (!k) kept.set(c.on, (k = { list: makeList(() => k!.c), c }));
  k.c = c;
  let display = displays.get(c.settings);
  if (!display) displays.set(c.settings, (display = DisplayUnits.fromSettings(c.settings)));
  const list = k.list;
  list.tanks = c.first?.tanks ?? c.tanks;
  list.lastChecks = c.first?.last ?? c.lastChecks;
  list.partial = c.first !== null;
  list.display = display;
  return html`${list}`;
}

type Detail<T> = (e: Event) => T;
const idOf: Detail<string> = (e) => (e as CustomEvent<TankIdDetail>).detail.id;

/** The list with its events wired to whatever shell context is current. */
function makeList(now: () => ScreenContext): TankList {
  const list = document.createElement('tank-list');
  const on = (type: string, handle: (e: Event) => void) => list.addEventListener(type, handle);
  on('tank-open', (e) => now().navigate({ name: 'check', id: idOf(e) }));
  on('tank-edit', (e) => now().navigate({ name: 'edit', id: idOf(e) }));
  on('tank-add', () => now().navigate({ name: 'new' }));
  on('tank-duplicate', (e) => now().on.duplicate(e as CustomEvent<TankIdDetail>));
  on('tank-delete', (e) => now().on.deleteTank(e as CustomEvent<TankIdDetail>));
  on('demo-clear', () => now().on.clearDemo());
  on('site-walk', (e) =>
    now().navigate({ name: 'site', site: (e as CustomEvent<{ site: string }>).detail.site }),
  );
  return list;
}
