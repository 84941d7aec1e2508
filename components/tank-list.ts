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
 * data-testid: `tank-add`, `tank-item` (with `data-tank-id` and `data-demo`), `tank-edit`,
 * `tank-duplicate`, `tank-delete`, `demo-clear`, `walkdown-start` (with `data-site`).
 */
import { LitElement, html, css, nothing } from 'lit';
import { baseStyles, levelStyles } from './styles.js';
import { DisplayUnits } from './display.js';
import { productLabel } from './products.js';
import { formatDate } from './format-date.js';
import { DEFAULT_SETTINGS, type CheckRecord, type TankRecord } from './types.js';

export interface TankIdDetail {
  id: string;
}

export class TankList extends LitElement {
  static override properties = {
    tanks: { attribute: false },
    lastChecks: { attribute: false },
    display: { attribute: false },
  };

  /** Every tank in the register. */
  declare tanks: TankRecord[];
  /** Newest saved check per tank id (optional; shows its date and top caution level). */
  declare lastChecks: Record<string, CheckRecord | undefined>;
  /** The user's display units. */
  declare display: DisplayUnits;

  constructor() {
    super();
    this.tanks = [];
    this.lastChecks = {};
    this.display = DisplayUnits.fromSettings(DEFAULT_SETTINGS);
  }

  static override styles = [
    baseStyles,
    levelStyles,
    css`
      ul {
        list-style: none;
        margin: 0;
        padding: 0;
      }
      li.tank {
        border: var(--border-width) solid var(--line);
        border-radius: 0.6rem;
        margin: 0 0 0.75rem;
        padding: 0.5rem;
        background: var(--paper);
      }
      .open {
        width: 100%;
        display: block;
        text-align: left;
        border: 0;
        padding: 0.5rem;
        min-height: 56px;
      }
      .name {
        font-size: 1.15em;
        font-weight: 800;
        display: block;
      }
      .meta {
        display: block;
        font-weight: 400;
        color: var(--muted);
        overflow-wrap: anywhere;
      }
      .actions {
        display: flex;
        flex-wrap: wrap;
        gap: 0.4rem;
        padding: 0 0.5rem 0.25rem;
      }
      .actions button {
        /* Each button at least as wide as its word: on a narrow phone a row wraps rather than
           cutting "Duplicate" off. */
        flex: 1 1 auto;
        min-width: max-content;
        padding: 0.5rem 0.4rem;
        font-size: 0.9em;
      }
      .walk {
        width: 100%;
        margin: 0 0 0.6rem;
      }
      .site {
        margin: 1.25rem 0 0.5rem;
        font-size: 1.2em;
        overflow-wrap: anywhere;
      }
      .demo-note {
        border: var(--border-width) dashed var(--ink);
        border-radius: 0.5rem;
        padding: 0.6rem;
        margin-bottom: 0.75rem;
      }
      .empty {
        padding: 1rem 0;
      }
      .head {
        display: flex;
        flex-wrap: wrap;
        gap: 0.5rem;
        justify-content: space-between;
        align-items: center;
      }
    `,
  ];

  private _fire<T>(type: string, detail: T): void {
    this.dispatchEvent(new CustomEvent<T>(type, { detail, bubbles: true, composed: true }));
  }

  /** Sites in alphabetical order, each with its tanks by name. */
  private _groups(): [string, TankRecord[]][] {
    const bySite = new Map<string, TankRecord[]>();
    for (const t of this.tanks) {
      const site = t.site.trim() || 'No site';
      const list = bySite.get(site) ?? [];
      list.push(t);
      bySite.set(site, list);
    }
    const collator = new Intl.Collator(undefined, { numeric: true, sensitivity: 'base' });
    return [...bySite.entries()]
      .sort(([a], [b]) => collator.compare(a, b))
      .map(([site, list]) => [site, list.sort((a, b) => collator.compare(a.name, b.name))]);
  }

  private _tank(t: TankRecord) {
    const d = this.display;
    const last = this.lastChecks[t.id];
    const np = t.nameplate;
    return html`<li
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
          ${d.format('gaugePressure', np.designPressure)}</span
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
    </li>`;
  }

  override render() {
    const groups = this._groups();
    const hasDemo = this.tanks.some((t) => t.demo);
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
      ${
        hasDemo
          ? html`<div class="demo-note" role="note">
              <p>
                <strong>Demo site.</strong> These tanks, names and readings are invented, so you can
                see real results at once. None of them is a real tank.
              </p>
              <button data-testid="demo-clear" @click=${() => this._fire('demo-clear', {})}>
                Clear the demo tanks
              </button>
            </div>`
          : nothing
      }
      ${groups.length === 0 ? html`<p class="empty">No tanks yet. Add one with its nameplate figures to start.</p>` : nothing}
      ${groups.map(
        ([site, list]) =>
          html`<section aria-label=${site}>
            <h3 class="site">${site}</h3>
            <button
              class="walk"
              data-testid="walkdown-start"
              data-site=${site}
              @click=${() => this._fire('site-walk', { site })}
            >
              Site board and walkdown (${list.length} tank${list.length === 1 ? '' : 's'})
            </button>
            <ul>
              ${list.map((t) => this._tank(t))}
            </ul>
          </section>`,
      )}
    `;
  }
}

customElements.define('tank-list', TankList);

declare global {
  interface HTMLElementTagNameMap {
    'tank-list': TankList;
  }
}
