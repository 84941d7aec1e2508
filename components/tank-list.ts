/**
 * The tank register, grouped by site. Each tank is one large button that opens its check,
 * with its actions spelled out beside it (no hover, no swipe, no long-press).
 *
 * @fires tank-open - `CustomEvent<{ id: string }>`: open the tank's check screen.
 * @fires tank-edit - `CustomEvent<{ id: string }>`
 * @fires tank-duplicate - `CustomEvent<{ id: string }>`
 * @fires tank-delete - `CustomEvent<{ id: string }>` (the shell deletes and offers undo)
 * @fires tank-add - `CustomEvent<{ site: string }>`: add a tank (at this site, or '' for a new site).
 * @fires demo-clear - `CustomEvent<Record<string, never>>`: remove the invented demo tanks.
 * @fires site-walk - `CustomEvent<{ site: string }>`: open the site's board and walkdown.
 *
 * A search box (`tank-search`) keeps, as you type, the tanks whose name, site or product holds
 * every word typed (components/tank-rows.ts). A register longer than VIRTUAL_FROM tanks is
 * drawn with @lit-labs/virtualizer: only the rows near the screen are in the DOM, so a register
 * of thousands opens and scrolls as fast as a short one (a short one is drawn whole).
 *
 * data-testid: `tank-add`, `tank-search`, `tank-found`, `tank-item` (with `data-tank-id` and
 * `data-demo`), `tank-edit`, `tank-duplicate`, `tank-delete`, `demo-clear`, `walkdown-start`
 * (with `data-site`).
 */
import { LitElement, html, nothing, type TemplateResult } from 'lit';
import { virtualize } from '@lit-labs/virtualizer/virtualize.js';
import { baseStyles, levelStyles } from './styles.js';
import { tankListStyles } from './tank-list-styles.js';
import { DisplayUnits } from './display.js';
import { productLabel } from './products.js';
import { formatDate } from './format-date.js';
import type { TankRow } from './tank-rows.js';
import { TankFinder } from './tank-find.js';
import { whenIdle } from './idle.js';
import { DEFAULT_SETTINGS, type CheckBrief, type TankRecord } from './types.js';

/**
 * The sorted rows and the search per `tanks` array, kept across visits to the list (the shell
 * hands the same array until the register changes, and a new array after any change), so
 * reopening the list neither sorts it nor builds its search again.
 */
const finders = new WeakMap<readonly TankRecord[], TankFinder>();

/** From this many tanks on, the list is virtualised. */
export const VIRTUAL_FROM = 60;

export interface TankIdDetail {
  id: string;
}

export class TankList extends LitElement {
  static override properties = {
    tanks: { attribute: false },
    lastChecks: { attribute: false },
    display: { attribute: false },
    partial: { type: Boolean },
    _query: { state: true },
  };

  /** Every tank in the register. */
  declare tanks: TankRecord[];
  /** Newest saved check per tank id (optional; shows its date and top caution level). */
  declare lastChecks: Record<string, CheckBrief | undefined>;
  /** The user's display units. */
  declare display: DisplayUnits;
  /** Only the first sites of the register are read yet (the list's first screen, at start-up). */
  declare partial: boolean;
  declare _query: string;

  constructor() {
    super();
    this.tanks = [];
    this.lastChecks = {};
    this.display = DisplayUnits.fromSettings(DEFAULT_SETTINGS);
    this.partial = false;
    this._query = '';
  }

  static override styles = [baseStyles, levelStyles, tankListStyles];

  private _fire<T>(type: string, detail: T): void {
    this.dispatchEvent(new CustomEvent<T>(type, { detail, bubbles: true, composed: true }));
  }

  private _finder(): TankFinder {
    let f = finders.get(this.tanks);
    if (!f) finders.set(this.tanks, (f = new TankFinder(this.tanks)));
    return f;
  }

  /** A new register: its search is built in idle moments, so the first keystroke finds at once. */
  protected override updated(changed: Map<PropertyKey, unknown>): void {
    if (!changed.has('tanks') || this.partial) return;
    const f = this._finder();
    const more = () => {
      if (!f.prepare() && f === finders.get(this.tanks)) whenIdle(more);
    };
    if (!f.prepared) whenIdle(more);
  }

  private _site(site: string, count: number): TemplateResult {
    return html`<div class="site-row" role="listitem" aria-label=${site}>
      <h3 class="site">${site}</h3>
      <button
        class="walk"
        data-testid="walkdown-start"
        data-site=${site}
        @click=${() => this._fire('site-walk', { site })}
      >
        Site board and walkdown (${count} tank${count === 1 ? '' : 's'})
      </button>
    </div>`;
  }

  /**
   * One row. The virtualiser can ask once more for a row of its last range after the rows got
   * fewer (a search that no longer matches once a tank is deleted): nothing is drawn for it.
   */
  private _row = (r: TankRow | undefined): TemplateResult =>
    r === undefined ? html`` : r.kind === 'site' ? this._site(r.site, r.count) : this._tank(r.tank);

  private _tank(t: TankRecord) {
    const d = this.display;
    const last = this.lastChecks[t.id];
    const np = t.nameplate;
    return html`<div
      role="listitem"
      class="tank"
      data-testid="tank-item"
      data-tank-id=${t.id}
      data-demo=${t.demo ? 'true' : 'false'}
    >
      <button
        class="open"
        @click=${() => this._fire<TankIdDetail>('tank-open', { id: t.id })}
        aria-label="Check ${t.name}, ${productLabel(t.productId)}"
      >
        <span class="name">${t.name}</span>
        <span class="meta"
          >${productLabel(t.productId)} · W.C. ${d.format('volume', np.waterCapacity)} · MAWP
          ${d.format('gaugePressure', np.designPressureGauge)}</span
        >
        <span class="meta">
          ${
            last
              ? html`Last check
                ${formatDate(last.at)}${
                  last.summary.topLevel
                    ? html` ·
                        <span class="level ${last.summary.topLevel}"
                          >${last.summary.topLevel}</span
                        >`
                    : nothing
                }`
              : 'No saved check yet'
          }
        </span>
      </button>
      <div class="actions">
        <button
          class="quiet"
          data-testid="tank-edit"
          @click=${() => this._fire<TankIdDetail>('tank-edit', { id: t.id })}
          aria-label="Edit ${t.name}"
        >
          Edit
        </button>
        <button
          class="quiet"
          data-testid="tank-duplicate"
          @click=${() => this._fire<TankIdDetail>('tank-duplicate', { id: t.id })}
          aria-label="Duplicate ${t.name}"
        >
          Duplicate
        </button>
        <button
          class="quiet"
          data-testid="tank-delete"
          @click=${() => this._fire<TankIdDetail>('tank-delete', { id: t.id })}
          aria-label="Delete ${t.name}"
        >
          Delete
        </button>
      </div>
    </div>`;
  }

  override render() {
    const hasDemo = this.tanks.some((t) => t.demo);
    const { rows, shown } = this._finder().find(this._query);
    const virtual = this.tanks.length >= VIRTUAL_FROM;
    return html`
      <div class="head">
        <h2>Tanks</h2>
        <button
          class="primary"
          data-testid="tank-add"
          @click=${() => this._fire('tank-add', { site: '' })}
        >
          Add a tank
        </button>
      </div>
      ${hasDemo ? this._demoNote() : nothing}
      ${
        this.tanks.length === 0
          ? html`<p class="empty">No tanks yet. Add one with its nameplate figures to start.</p>`
          : this._search(shown)
      }
      <div class="rows" role="list" aria-label="Tanks by site">
        ${
          virtual
            ? virtualize({ items: rows, renderItem: this._row, keyFunction: rowKey })
            : rows.map(this._row)
        }
      </div>
    `;
  }

  private _search(shown: number): TemplateResult {
    const q = this._query.trim();
    return html`<div class="search">
        <label for="tank-search">Find a tank (name, site or product)</label>
        <input
          id="tank-search"
          type="search"
          data-testid="tank-search"
          autocomplete="off"
          .value=${this._query}
          @input=${(e: Event) => (this._query = (e.target as HTMLInputElement).value)}
        />
      </div>
      <p class="found" data-testid="tank-found" role="status">
        ${
          this.partial
            ? 'Reading the rest of the register…'
            : q
              ? `${shown} of ${this.tanks.length} tanks match “${q}”.`
              : `${this.tanks.length} tanks.`
        }
      </p>`;
  }

  private _demoNote(): TemplateResult {
    return html`<div class="demo-note" role="note">
      <p>
        <strong>Demo site.</strong> These tanks, names and readings are invented, so you can see
        real results at once. None of them is a real tank.
      </p>
      <button data-testid="demo-clear" @click=${() => this._fire('demo-clear', {})}>
        Clear the demo tanks
      </button>
    </div>`;
  }
}

const rowKey = (r: TankRow | undefined, i: number): string =>
  r === undefined ? `gone:${i}` : r.kind === 'site' ? `site:${r.site}` : r.tank.id;

customElements.define('tank-list', TankList);

declare global {
  interface HTMLElementTagNameMap {
    'tank-list': TankList;
  }
}
