/**
 * The site's walkdown screens with their data: the board (`view="board"`), the walk
 * (`view="walk"`) and one walkdown's record (`view="report"`). Loads and saves the site forecast
 * and the walkdowns through pwa/storage.ts; computes the board in time slices, so a site of
 * hundreds of tanks fills in while the page stays responsive. Loaded in its own chunk with the
 * check engine.
 */
import { LitElement, html } from 'lit';
import { baseStyles } from '../components/styles.js';
import { DisplayUnits } from '../components/display.js';
import '../components/site-board.js';
import '../components/walkdown-walk.js';
import '../components/walkdown-report.js';
import '../components/site-route.js';
import type { CheckRecord, Settings, TankRecord } from '../components/types.js';
import {
  allowanceFor,
  forecastPeakAir,
  rankRows,
  type BoardRow,
  type LatestReadings,
  type SiteForecast,
} from '../components/walkdown-board.js';
import { startWalk } from '../components/walkdown-ops.js';
import type { WalkdownRecord } from '../components/walkdown-types.js';
import { emptyReadings } from '../components/types.js';
import type { Store } from './storage.js';
import { latestReadingsFor, siteOf, staleDays } from './walkdown-data.js';
import { walkdownToCsv } from './walkdown-csv.js';
import { href } from './router.js';
import { BoardClient } from './board-client.js';
import { lastFillFlag, type FillFlag } from '../components/fill-flag.js';

export class SiteScreen extends LitElement {
  static override properties = {
    store: { attribute: false },
    view: { type: String },
    site: { type: String },
    walkId: { type: String, attribute: 'walk-id' },
    settings: { attribute: false },
    tanks: { attribute: false },
    checks: { attribute: false },
    _forecast: { state: true },
    _rows: { state: true },
    _computing: { state: true },
    _history: { state: true },
    _walk: { state: true },
    _lastWho: { state: true },
    _fillFlags: { state: true },
    _routeOpen: { state: true },
  };

  declare store: Store | null;
  declare view: 'board' | 'walk' | 'report';
  declare site: string;
  declare walkId: string;
  declare settings: Settings;
  declare tanks: TankRecord[];
  declare checks: CheckRecord[];
  declare _forecast: SiteForecast | null;
  declare _rows: BoardRow[];
  declare _computing: { done: number; total: number } | null;
  declare _history: WalkdownRecord[];
  declare _walk: WalkdownRecord | null | undefined;
  declare _lastWho: string;
  /** Tanks whose last fill found the gauge reading low, until a later check (components/fill-flag.ts). */
  declare _fillFlags: Map<string, FillFlag>;
  /** The route order is on screen in place of the board. */
  declare _routeOpen: boolean;

  private _latest = new Map<string, LatestReadings | null>();
  private readonly _board = new BoardClient();
  private _loadedKey = '';

  constructor() {
    super();
    this.store = null;
    this.view = 'board';
    this.site = '';
    this.walkId = '';
    this.tanks = [];
    this.checks = [];
    this._forecast = null;
    this._rows = [];
    this._computing = null;
    this._history = [];
    this._walk = undefined;
    this._lastWho = '';
    this._fillFlags = new Map();
    this._routeOpen = false;
  }

  static override styles = [baseStyles];

  protected override willUpdate(): void {
    const key = `${this.view}|${this.site}|${this.walkId}|${this.tanks.length}|${this.checks.length}`;
    if (this.store && key !== this._loadedKey) {
      this._loadedKey = key;
      void this._load();
    }
  }

  private _sorted: { from: TankRecord[]; site: string; tanks: TankRecord[] } | null = null;

  /** The site's tanks by name: the order the board fills in (and is computed in). */
  private _siteTanks(): TankRecord[] {
    const m = this._sorted;
    if (m && m.from === this.tanks && m.site === this.site) return m.tanks;
    const tanks = this.tanks.filter((t) => siteOf(t) === this.site).sort(byName);
    this._sorted = { from: this.tanks, site: this.site, tanks };
    return tanks;
  }

  /** The site's tanks for the route: in board order once ranked, by name before. */
  private _routeTanks(): TankRecord[] {
    return this._computing ? this._siteTanks() : this._rows.map((r) => r.tank);
  }

  private async _load(): Promise<void> {
    const store = this.store!;
    if (this.view !== 'board') {
      const all = await store.listWalkdowns();
      this._lastWho = lastWho(all);
      this._walk = (await store.getWalkdown(this.walkId)) ?? null;
      return;
    }
    // The board shows at once, every tank by name with "working…", from the stored forecast;
    // the figures follow from the worker.
    this._rows = [];
    this._routeOpen = false;
    this._computing = { done: 0, total: this._siteTanks().length };
    this._forecast = (await store.getSite(this.site)) ?? {
      site: this.site,
      days: [],
      sunAllowance: this.settings.sunAllowance,
      tankAllowances: [],
      enteredAt: '',
    };
    void this.updateComplete.then(() => this._event('board-shown', 0));
    const all = await store.listWalkdowns();
    this._lastWho = lastWho(all);
    this._history = all.filter((w) => w.site === this.site);
    [this._latest, this._fillFlags] = await Promise.all([
      latestReadingsFor(store, this._siteTanks(), this.checks, all),
      this._flags(store),
    ]);
    void this._compute();
  }

  private _event(name: string, tanks: number): void {
    this.dispatchEvent(new CustomEvent(name, { detail: { tanks }, bubbles: true, composed: true }));
  }

  /** The gauge-low flag of each tank of the site whose last fill read low. */
  private async _flags(store: Store): Promise<Map<string, FillFlag>> {
    const flags = new Map<string, FillFlag>();
    const fills = await store.listFills();
    const ids = new Set(this._siteTanks().map((t) => t.id));
    for (const id of new Set(fills.map((f) => f.tankId))) {
      if (!ids.has(id)) continue;
      const flag = lastFillFlag(
        fills.filter((f) => f.tankId === id),
        this.checks.filter((c) => c.tankId === id),
      );
      if (flag) flags.set(id, flag);
    }
    return flags;
  }

  /** Projects every tank off the input path; the board fills in batch by batch. */
  private _compute(): void {
    const f = this._forecast;
    if (!f) return;
    const tanks = this._siteTanks();
    let rows: BoardRow[] = [];
    let first = true;
    this._rows = [];
    this._computing = { done: 0, total: tanks.length };
    const input = {
      tanks,
      latest: [...this._latest.entries()],
      forecast: f,
      settings: this.settings,
      now: Date.now(),
      staleDays: staleDays(this.settings),
    };
    this._board.run(structuredClone(input), (batch, finished) => {
      rows = rows.concat(batch);
      // Ranked once, when all are in: until then the board keeps the tanks by name.
      this._rows = finished ? rankRows(rows) : rows;
      this._computing = finished ? null : { done: rows.length, total: tanks.length };
      const name = finished ? 'board-ready' : first ? 'board-first' : '';
      first = false;
      if (name) void this.updateComplete.then(() => this._event(name, rows.length));
    });
  }

  override connectedCallback(): void {
    super.connectedCallback();
    // Start the worker (and its engine) while the stored data loads.
    this._board.warm();
  }

  override disconnectedCallback(): void {
    super.disconnectedCallback();
    this._board.close();
  }

  private async _forecastChange(e: CustomEvent<{ forecast: SiteForecast }>): Promise<void> {
    this._forecast = e.detail.forecast;
    // At once: the board says it is working from this event on, never shows the old figures.
    this._compute();
    await this.store?.putSite(e.detail.forecast);
  }

  /** Opens the tank's readings with the site forecast in place (written into its draft). */
  private async _open(e: CustomEvent<{ id: string }>): Promise<void> {
    const store = this.store;
    const f = this._forecast;
    if (!store || !f) return;
    const id = e.detail.id;
    const base =
      (await store.getDraft(id))?.readings ??
      this._latest.get(id)?.readings ??
      emptyReadings(this.settings.sunAllowance);
    const air = forecastPeakAir(f);
    const readings =
      air === null ? base : { ...base, peakAirTemperature: air, sunAllowance: allowanceFor(f, id) };
    await store.putDraft({ tankId: id, readings, updatedAt: new Date().toISOString() });
    location.hash = href({ name: 'check', id });
  }

  /** Saves the site's route with its record (null drops it) at every move. */
  private async _route(e: CustomEvent<{ route: string[] | null }>): Promise<void> {
    const f = this._forecast;
    if (!f) return;
    const next: SiteForecast = { ...f, route: e.detail.route ?? [] };
    if (!e.detail.route) delete next.route;
    this._forecast = next;
    await this.store?.putSite(next);
  }

  private async _start(e: CustomEvent<{ order?: 'board' | 'route' }>): Promise<void> {
    const store = this.store;
    if (!store || !this._forecast || this._computing) return;
    const walk = startWalk(
      this.site,
      this._rows,
      this._forecast,
      this._latest,
      this._lastWho,
      this.settings.sunAllowance,
      new Date(),
      e.detail?.order ?? 'board',
    );
    await store.putWalkdown(walk);
    location.hash = href({ name: 'walk', id: walk.id });
  }

  private async _save(e: CustomEvent<{ walk: WalkdownRecord }>): Promise<void> {
    this._walk = e.detail.walk;
    await this.store?.putWalkdown(e.detail.walk);
  }

  private async _finish(e: CustomEvent<{ walk: WalkdownRecord }>): Promise<void> {
    await this.store?.putWalkdown(e.detail.walk);
    location.hash = href({ name: 'walkdown', id: e.detail.walk.id });
  }

  private _csv(): void {
    const w = this._walk;
    if (!w) return;
    const text = walkdownToCsv(w, DisplayUnits.fromSettings(this.settings));
    const url = URL.createObjectURL(new Blob([text], { type: 'text/csv' }));
    const a = document.createElement('a');
    a.href = url;
    a.download = `tankside-walkdown-${w.startedAt.slice(0, 10)}.csv`;
    a.rel = 'noopener';
    document.body.append(a);
    a.click();
    a.remove();
    setTimeout(() => URL.revokeObjectURL(url), 10_000);
  }

  private _display: { from: Settings; display: DisplayUnits } | null = null;

  /** The display units, made again only when the settings change (the board redraws on a new one). */
  private _units(): DisplayUnits {
    if (this._display?.from !== this.settings)
      this._display = { from: this.settings, display: DisplayUnits.fromSettings(this.settings) };
    return this._display.display;
  }

  override render() {
    const display = this._units();
    if (this.view === 'board') {
      if (!this._forecast) return html`<p>Loading…</p>`;
      if (this._routeOpen)
        return html`<site-route
          .site=${this.site}
          .tanks=${this._routeTanks()}
          .route=${this._forecast.route}
          @route-change=${this._route}
          @route-done=${() => (this._routeOpen = false)}
        ></site-route>`;
      return html`<site-board
        .site=${this.site}
        .forecast=${this._forecast}
        .rows=${this._rows}
        .computing=${this._computing}
        .display=${display}
        .tanks=${this._siteTanks()}
        .history=${this._history}
        .staleDays=${staleDays(this.settings)}
        .fillFlags=${this._fillFlags}
        @forecast-change=${this._forecastChange}
        @board-open=${this._open}
        @walk-start=${this._start}
        @route-edit=${() => {
          this._routeOpen = true;
          window.scrollTo(0, 0);
        }}
        @walk-resume=${(e: CustomEvent<{ id: string }>) =>
          (location.hash = href({ name: 'walk', id: e.detail.id }))}
        @walk-open=${(e: CustomEvent<{ id: string }>) =>
          (location.hash = href({ name: 'walkdown', id: e.detail.id }))}
      ></site-board>`;
    }
    if (this._walk === undefined) return html`<p>Loading…</p>`;
    if (this.view === 'walk' && this._walk?.status !== 'finished')
      return html`<walkdown-walk
        .walk=${this._walk}
        .tanks=${this.tanks}
        .settings=${this.settings}
        .display=${display}
        checked-by=${this._lastWho}
        @walk-change=${this._save}
        @walk-finish=${this._finish}
      ></walkdown-walk>`;
    return html`<walkdown-report
      .walk=${this._walk}
      .display=${display}
      @walk-csv=${this._csv}
    ></walkdown-report>`;
  }
}

const collator = new Intl.Collator(undefined, { numeric: true, sensitivity: 'base' });

function byName(a: TankRecord, b: TankRecord): number {
  return collator.compare(a.name, b.name);
}

/** Who checked the newest finished walkdown (remembered for the next). */
function lastWho(all: readonly WalkdownRecord[]): string {
  return all.find((w) => w.status === 'finished' && w.checkedBy)?.checkedBy ?? '';
}

customElements.define('site-screen', SiteScreen);

declare global {
  interface HTMLElementTagNameMap {
    'site-screen': SiteScreen;
  }
}
