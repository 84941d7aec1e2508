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
  }

  static override styles = [baseStyles];

  protected override willUpdate(): void {
    const key = `${this.view}|${this.site}|${this.walkId}|${this.tanks.length}|${this.checks.length}`;
    if (this.store && key !== this._loadedKey) {
      this._loadedKey = key;
      void this._load();
    }
  }

  private _siteTanks(): TankRecord[] {
    return this.tanks.filter((t) => siteOf(t) === this.site);
  }

  private async _load(): Promise<void> {
    const store = this.store!;
    const all = await store.listWalkdowns();
    this._lastWho = all.find((w) => w.status === 'finished' && w.checkedBy)?.checkedBy ?? '';
    if (this.view !== 'board') {
      this._walk = (await store.getWalkdown(this.walkId)) ?? null;
      return;
    }
    this._history = all.filter((w) => w.site === this.site);
    this._forecast = (await store.getSite(this.site)) ?? {
      site: this.site,
      days: [],
      sunAllowance: this.settings.sunAllowance,
      tankAllowances: [],
      enteredAt: '',
    };
    this._latest = await latestReadingsFor(store, this._siteTanks(), this.checks, all);
    this._fillFlags = await this._flags(store);
    void this._compute();
  }

  /** The gauge-low flag of each tank of the site whose last fill read low. */
  private async _flags(store: Store): Promise<Map<string, FillFlag>> {
    const flags = new Map<string, FillFlag>();
    for (const t of this._siteTanks()) {
      const fills = await store.listFills(t.id);
      if (!fills.length) continue;
      const flag = lastFillFlag(
        fills,
        this.checks.filter((c) => c.tankId === t.id),
      );
      if (flag) flags.set(t.id, flag);
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
      this._rows = rankRows(rows);
      this._computing = finished ? null : { done: rows.length, total: tanks.length };
      const name = finished ? 'board-ready' : first ? 'board-first' : '';
      first = false;
      if (name)
        void this.updateComplete.then(() =>
          this.dispatchEvent(
            new CustomEvent(name, {
              detail: { tanks: rows.length },
              bubbles: true,
              composed: true,
            }),
          ),
        );
    });
  }

  override disconnectedCallback(): void {
    super.disconnectedCallback();
    this._board.close();
  }

  private async _forecastChange(e: CustomEvent<{ forecast: SiteForecast }>): Promise<void> {
    this._forecast = e.detail.forecast;
    await this.store?.putSite(e.detail.forecast);
    void this._compute();
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

  private async _start(): Promise<void> {
    const store = this.store;
    if (!store || !this._forecast || this._computing) return;
    const walk = startWalk(
      this.site,
      this._rows,
      this._forecast,
      this._latest,
      this._lastWho,
      this.settings.sunAllowance,
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

  override render() {
    const display = DisplayUnits.fromSettings(this.settings);
    if (this.view === 'board') {
      if (!this._forecast) return html`<p>Loading…</p>`;
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

customElements.define('site-screen', SiteScreen);

declare global {
  interface HTMLElementTagNameMap {
    'site-screen': SiteScreen;
  }
}
