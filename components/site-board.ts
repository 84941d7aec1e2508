/**
 * The site board: the site's forecast (one or more days, the sun allowance, per-tank allowances
 * for shaded or insulated tanks), the site's fill rules (<site-rules-form>) and every tank of the site projected to it, worst first by the
 * rule in `RANK_RULE`, with the walk's start and the site's past walkdowns.
 *
 * Takes ranked rows from its host (which computes them off the input path) and shows how far the
 * computation got.
 *
 * @fires forecast-change - `CustomEvent<{ forecast: SiteForecast }>` (only with valid figures)
 * @fires board-open - `CustomEvent<{ id: string }>`: open this tank's readings with the forecast.
 * @fires walk-start - `CustomEvent<{ order: 'board' | 'route' }>`
 * @fires route-edit - `CustomEvent<Record<string, never>>`: open the route order.
 * @fires walk-resume - `CustomEvent<{ id: string }>`
 * @fires walk-open - `CustomEvent<{ id: string }>`: show a past walkdown's record.
 *
 * data-testid: `walkdown-forecast-air`, `walkdown-sun`, `walkdown-add-day`, `walkdown-row` (with
 * `data-tank-id`, `data-level`, `data-si-headroom-relief` (Pa), `data-si-peak-upper` (Pa gauge, the
 * raised peak the headrooms are measured from), `data-si-liquid-full-margin` (K,
 * empty when none)), `walkdown-row-pending` (a tank still being worked out, with
 * `data-tank-id`), `walkdown-board-unranked`, `walkdown-board-progress`, `walkdown-begin`,
 * `walkdown-begin-route` (when a route is set), `walkdown-route-edit`, `walkdown-resume`;
 * `walkdown-history-item` (in `walkdown-history`).
 */
import { LitElement, html, nothing, type TemplateResult } from 'lit';
import { repeat } from 'lit/directives/repeat.js';
import { siteBoardStyles } from './site-board-styles.js';
import { baseStyles, levelStyles } from './styles.js';
import { DisplayUnits } from './display.js';
import './number-field.js';
import type { NumberFieldChange } from './number-field.js';
import { DEFAULT_SETTINGS, type TankRecord } from './types.js';
import { T_RANGE_K } from './check-input.js';
import { READING_RANGES } from './check-form.js';
import { RANK_RULE, type BoardRow, type SiteForecast } from './walkdown-board.js';
import { progress, type WalkdownRecord } from './walkdown-types.js';
import './walkdown-history.js';
import {
  LEVEL_SHAPES,
  LEVEL_WORDS,
  STANDING_WALK,
  ageText,
  cautionText,
  resultLines,
} from './walkdown-words.js';
import { walkResult } from './walkdown-ops.js';
import './site-rules-form.js';
import { siteRulesOf, type SiteRules } from './site-rules.js';
import { formatDate } from './format-date.js';
import type { FillFlag } from './fill-flag.js';

export class SiteBoard extends LitElement {
  static override properties = {
    site: { type: String },
    forecast: { attribute: false },
    rows: { attribute: false },
    computing: { attribute: false },
    display: { attribute: false },
    tanks: { attribute: false },
    history: { attribute: false },
    staleDays: { attribute: false },
    fillFlags: { attribute: false },
    _ownOpen: { state: true },
  };

  declare site: string;
  declare forecast: SiteForecast;
  /** Ranked rows (those computed so far). */
  declare rows: BoardRow[];
  /** Progress of the computation, or null when done. */
  declare computing: { done: number; total: number } | null;
  declare display: DisplayUnits;
  declare tanks: TankRecord[];
  /** Tanks whose last fill found the float gauge reading low (until a later check clears it). */
  declare fillFlags: Map<string, FillFlag>;
  /** The site's walkdowns, newest first (an unfinished one can be resumed). */
  declare history: WalkdownRecord[];
  declare staleDays: number;
  /** The per-tank allowances are open (their fields are made only then: a site can have hundreds). */
  declare _ownOpen: boolean;

  constructor() {
    super();
    this.site = '';
    this.forecast = { site: '', days: [], sunAllowance: 5, tankAllowances: [], enteredAt: '' };
    this.rows = [];
    this.computing = null;
    this.display = DisplayUnits.fromSettings(DEFAULT_SETTINGS);
    this.tanks = [];
    this.history = [];
    this.staleDays = 7;
    this.fillFlags = new Map();
    this._ownOpen = false;
  }

  static override styles = [baseStyles, levelStyles, siteBoardStyles];

  private _fire<T>(type: string, detail: T): void {
    this.dispatchEvent(new CustomEvent<T>(type, { detail, bubbles: true, composed: true }));
  }

  private _change(next: Partial<SiteForecast>): void {
    const forecast = { ...this.forecast, ...next, enteredAt: new Date().toISOString() };
    this._fire('forecast-change', { forecast });
  }

  /** The site's rule set and own rule changed: stored with the forecast (its date unchanged). */
  private _rules(e: CustomEvent<SiteRules>): void {
    e.stopPropagation();
    const { ruleSet: _set, siteRule: _own, ...rest } = this.forecast;
    this._fire('forecast-change', { forecast: { ...rest, ...e.detail } });
  }

  private _day(i: number) {
    return (e: CustomEvent<NumberFieldChange>) => {
      if (!e.detail.valid) return;
      const days = this.forecast.days.slice();
      if (e.detail.value === null) days.splice(i, 1);
      else days[i] = e.detail.value;
      this._change({ days });
    };
  }

  private _tankSun(id: string) {
    return (e: CustomEvent<NumberFieldChange>) => {
      if (!e.detail.valid) return;
      const rest = this.forecast.tankAllowances.filter((a) => a.tankId !== id);
      const v = e.detail.value;
      this._change({
        tankAllowances: v === null ? rest : [...rest, { tankId: id, sunAllowance: v }],
      });
    };
  }

  private _forecastForm() {
    const d = this.display;
    const f = this.forecast;
    const days = f.days.length ? f.days : [null];
    const range = { min: T_RANGE_K.min, max: T_RANGE_K.max - READING_RANGES.sunAllowance.max };
    return html`<fieldset>
      <legend>Site forecast</legend>
      <div class="days">
        ${days.map(
          (t, i) =>
            html`<number-field
              label=${i === 0 ? 'Peak air temperature' : `Day ${i + 1} peak air temperature`}
              name="day${i}"
              quantity="temperature"
              testid=${i === 0 ? 'walkdown-forecast-air' : `walkdown-forecast-day-${i + 1}`}
              hint=${i === 0 ? 'Every tank of the site uses this; add days to take the hottest' : ''}
              .display=${d}
              .value=${t}
              .min=${range.min}
              .max=${range.max}
              @value-change=${this._day(i)}
            ></number-field>`,
        )}
      </div>
      ${
        f.days.length > 0 && f.days.length < 14
          ? html`<button
              class="quiet"
              data-testid="walkdown-add-day"
              @click=${() => this._change({ days: [...f.days, f.days[f.days.length - 1]!] })}
            >
              Add another day
            </button>`
          : nothing
      }
      <number-field
        label="Sun allowance (rule of thumb)"
        name="sun"
        quantity="temperatureDifference"
        testid="walkdown-sun"
        hint="Added to the air temperature for the liquid of an unshaded, uninsulated tank"
        .display=${d}
        .value=${f.sunAllowance}
        .min=${READING_RANGES.sunAllowance.min}
        .max=${READING_RANGES.sunAllowance.max}
        @value-change=${(e: CustomEvent<NumberFieldChange>) =>
          e.detail.valid &&
          e.detail.value !== null &&
          this._change({ sunAllowance: e.detail.value })}
      ></number-field>
      <details @toggle=${(e: Event) => (this._ownOpen = (e.target as HTMLDetailsElement).open)}>
        <summary>Shaded or insulated tanks: their own allowance</summary>
        ${(this._ownOpen ? this.tanks : []).map(
          (t) =>
            html`<number-field
              label=${t.name}
              name="sun-${t.id}"
              quantity="temperatureDifference"
              hint="Empty: the site’s allowance"
              .display=${d}
              .value=${f.tankAllowances.find((a) => a.tankId === t.id)?.sunAllowance ?? null}
              .min=${READING_RANGES.sunAllowance.min}
              .max=${READING_RANGES.sunAllowance.max}
              @value-change=${this._tankSun(t.id)}
            ></number-field>`,
        )}
      </details>
      <p class="muted">
        ${f.enteredAt ? `Forecast entered ${formatDate(f.enteredAt)}.` : 'No forecast entered yet.'}
      </p>
    </fieldset>`;
  }

  /**
   * The rows. While the figures come in: every tank by name (as `tanks` is given), its figures in
   * place as they arrive, "working…" until then; nothing moves while the user reads. Ranked once,
   * when all are in (keyed by tank, so the ranking moves rows rather than drawing them again).
   */
  private _list(c: { total: number } | null) {
    const byId = new Map(this.rows.map((r) => [r.tank.id, r]));
    const list: (BoardRow | TankRecord)[] = c
      ? this.tanks.map((t) => byId.get(t.id) ?? t)
      : this.rows;
    return html`${
        c
          ? html`<p class="muted" data-testid="walkdown-board-unranked">
              Listed by name while the figures come in; ranked worst first once all ${c.total} are
              in.
            </p>`
          : nothing
      }
      <ol aria-label=${c ? 'Tanks by name, being worked out' : 'Tanks, worst first'}>
        ${repeat(
          list,
          (x) => ('tank' in x ? x.tank.id : x.id),
          (x, i) =>
            'tank' in x
              ? this._row(x, c ? null : i)
              : html`<li class="row" data-testid="walkdown-row-pending" data-tank-id=${x.id}>
                  <span class="open"
                    ><span class="name">${x.name}</span> <span>working…</span></span
                  >
                </li>`,
        )}
      </ol>`;
  }

  /** Each row's figures as drawn for the current display: a new batch or the ranking draws no row twice. */
  private _drawn = new WeakMap<BoardRow, TemplateResult>();

  protected override willUpdate(changed: Map<PropertyKey, unknown>): void {
    if (changed.has('display') || changed.has('fillFlags') || changed.has('staleDays'))
      this._drawn = new WeakMap();
  }

  /** One tank's row; `i` is its rank, or null before the list is ranked. */
  private _row(row: BoardRow, i: number | null) {
    const n = i === null ? '' : `${i + 1}. `;
    const relief = row.summary ? String(row.summary.headroomToRelief) : '';
    const full = row.liquidFullMargin === null ? '' : String(row.liquidFullMargin);
    let body = this._drawn.get(row);
    if (!body) this._drawn.set(row, (body = this._body(row)));
    return html`<li
      class="row"
      data-testid="walkdown-row"
      data-tank-id=${row.tank.id}
      data-level=${row.level}
      data-si-headroom-relief=${relief}
      data-si-peak-upper=${String(row.summary?.peakGaugeUpper ?? '')}
      data-si-liquid-full-margin=${full}
    >
      <button
        class="open"
        @click=${() => this._fire('board-open', { id: row.tank.id })}
        aria-label="${n}${row.tank.name}: ${LEVEL_WORDS[row.level]}. Open its readings"
      >
        <span class="line"
          ><span class="name">${n}${row.tank.name}</span>
          <span class="level ${row.level}"
            >${LEVEL_SHAPES[row.level]} ${LEVEL_WORDS[row.level]}</span
          ></span
        >
        ${body}
      </button>
    </li>`;
  }

  /** A row's figures, flag and age. */
  private _body(row: BoardRow) {
    const d = this.display;
    const res = walkResult(row);
    return html` ${
        res
          ? html`${resultLines(res, d).map((l) => html`<span class="line">${l}</span>`)}
            ${
              row.result?.cautions[0] && row.summary?.topLevel
                ? html`<span class="line">Worst: ${cautionText(row.result.cautions[0], d)}</span>`
                : nothing
            }`
          : html`<span class="line">${row.reason}: not projected</span>`
      }
      ${
        this.fillFlags?.get(row.tank.id)
          ? html`<span class="line" data-testid="walkdown-fill-flag"
              ><strong>▲ Gauge read low at the last fill</strong> (${formatDate(
                this.fillFlags.get(row.tank.id)!.at,
              )}):
              the tank may hold more than its float gauge shows. Check the contents another way (by
              weight, or with the fixed maximum-level gauge) as site procedures require before going
              by that gauge.</span
            >`
          : nothing
      }
      <span class="line muted"
        >Readings ${row.ageMs === null ? 'none' : `${ageText(row.ageMs)} old`} (limit
        ${this.staleDays} days)</span
      >`;
  }

  /** One start, or two when the site has a route: worst first, or the route's order. */
  private _startButtons(disabled: boolean) {
    const start = (order: 'board' | 'route') => () => this._fire('walk-start', { order });
    if (!this.forecast.route?.length)
      return html`<button
        class="primary"
        data-testid="walkdown-begin"
        ?disabled=${disabled}
        @click=${start('board')}
      >
        Start the walk
      </button>`;
    return html`<button
        class="primary"
        data-testid="walkdown-begin-route"
        ?disabled=${disabled}
        @click=${start('route')}
      >
        Start in route order
      </button>
      <button data-testid="walkdown-begin" ?disabled=${disabled} @click=${start('board')}>
        Start in board order (worst first)
      </button>`;
  }

  override render() {
    const active = this.history.find((w) => w.status === 'in-progress');
    const c = this.computing;
    return html`
      <h2>Site board: ${this.site}</h2>
      ${this._forecastForm()}
      <site-rules-form
        .rules=${siteRulesOf(this.forecast)}
        .display=${this.display}
        @site-rules-change=${this._rules}
      ></site-rules-form>
      <div class="actions">
        ${
          active
            ? html`<button
                class="primary"
                data-testid="walkdown-resume"
                @click=${() => this._fire('walk-resume', { id: active.id })}
              >
                Go on with the walk (${progress(active).done} of ${progress(active).total} done)
              </button>`
            : this._startButtons(c !== null || this.rows.length === 0)
        }
        <button
          class="quiet"
          data-testid="walkdown-route-edit"
          @click=${() => this._fire('route-edit', {})}
        >
          ${this.forecast.route?.length ? 'Change the route order' : 'Set a route order'}
        </button>
      </div>
      <p class="rule">${RANK_RULE}</p>
      ${
        c
          ? html`<p role="status" data-testid="walkdown-board-progress">
              Working out ${c.done} of ${c.total} tanks…
              <progress max=${c.total} value=${c.done}></progress>
            </p>`
          : nothing
      }
      ${this._list(c)}
      <p class="standing" role="note">${STANDING_WALK}</p>
      <walkdown-history .history=${this.history}></walkdown-history>
    `;
  }
}

customElements.define('site-board', SiteBoard);

declare global {
  interface HTMLElementTagNameMap {
    'site-board': SiteBoard;
  }
}
