/**
 * The site's route: the order the walk follows when the user picks "route order". Every tank of
 * the site in one list with "Up" and "Down" buttons (48 px targets, usable with gloves and from
 * the keyboard: the moved tank keeps the focus and the new place is announced). Each move fires
 * `route-change` at once, so the host saves it with the site record; tanks added to the site
 * later join the end of the route.
 *
 * @fires route-change - `CustomEvent<{ route: string[] | null }>`: the new order (tank ids), or
 *   null to drop the route (the walk then follows the board).
 * @fires route-done - `CustomEvent<Record<string, never>>`: back to the board.
 *
 * data-testid: `route-item` (with `data-tank-id`, in route order), `route-up`, `route-down`,
 * `route-reset`, `route-done`, `route-status`.
 */
import { LitElement, html, css, nothing } from 'lit';
import { baseStyles } from './styles.js';
import type { TankRecord } from './types.js';
import { routeOrder, moveStop } from './walkdown-route.js';

export class SiteRoute extends LitElement {
  static override properties = {
    site: { type: String },
    tanks: { attribute: false },
    route: { attribute: false },
    _said: { state: true },
  };

  declare site: string;
  /** The site's tanks, in the order to show when no route is set (the board's, or by name). */
  declare tanks: TankRecord[];
  /** The stored route (tank ids), or undefined when none is set. */
  declare route: string[] | undefined;
  /** The last move, announced politely. */
  declare _said: string;

  constructor() {
    super();
    this.site = '';
    this.tanks = [];
    this.route = undefined;
    this._said = '';
  }

  static override styles = [
    baseStyles,
    css`
      ol {
        list-style: none;
        margin: 0 0 0.75rem;
        padding: 0;
      }
      li {
        display: flex;
        align-items: center;
        gap: 0.5rem;
        border: var(--border-width) solid var(--line);
        border-radius: 0.6rem;
        padding: 0.3rem 0.4rem;
        margin: 0 0 0.4rem;
        background: var(--paper);
      }
      .name {
        flex: 1;
        min-width: 0;
        overflow-wrap: break-word;
        font-weight: 700;
      }
      li button {
        padding: 0;
        width: 3.25rem;
        font-size: 1.25rem;
      }
      .actions {
        display: flex;
        flex-wrap: wrap;
        gap: 0.5rem;
      }
    `,
  ];

  private _fire<T>(type: string, detail: T): void {
    this.dispatchEvent(new CustomEvent<T>(type, { detail, bubbles: true, composed: true }));
  }

  private _ids(): string[] {
    return routeOrder(
      this.tanks.map((t) => t.id),
      this.route,
    );
  }

  private async _move(from: number, by: -1 | 1): Promise<void> {
    const ids = this._ids();
    const next = moveStop(ids, from, by);
    if (next === ids) return;
    const to = from + by;
    const name = this.tanks.find((t) => t.id === ids[from])?.name ?? '';
    this.route = next;
    this._said = `${name}: stop ${to + 1} of ${ids.length}.`;
    this._fire('route-change', { route: next });
    await this.updateComplete;
    // Keep the focus on the tank that moved: its same button, or the other at an end of the list.
    const li = this.renderRoot.querySelectorAll('li')[to];
    const same = li?.querySelector<HTMLButtonElement>(by < 0 ? '.up' : '.down');
    const other = li?.querySelector<HTMLButtonElement>(by < 0 ? '.down' : '.up');
    (same && !same.disabled ? same : other)?.focus();
  }

  override render() {
    const ids = this._ids();
    const byId = new Map(this.tanks.map((t) => [t.id, t]));
    return html`<h2>Route order: ${this.site}</h2>
      <p>
        The order you walk the tanks in: ▲ moves a tank one stop earlier, ▼ one stop later. Each
        move is saved at once. When you start the walk, pick “route order” to follow it, or “board
        order” to go worst first.
      </p>
      <p role="status" data-testid="route-status">
        ${this.route?.length ? this._said || 'Route set.' : 'No route set: shown in board order.'}
      </p>
      <ol aria-label="Route, first stop first">
        ${ids.map((id, i) => {
          const name = byId.get(id)?.name ?? id;
          return html`<li data-testid="route-item" data-tank-id=${id}>
            <span class="name">${i + 1}. ${name}</span>
            <button
              class="quiet up"
              data-testid="route-up"
              aria-label="Move ${name} up"
              title="Up"
              ?disabled=${i === 0}
              @click=${() => this._move(i, -1)}
            >
              ▲
            </button>
            <button
              class="quiet down"
              data-testid="route-down"
              aria-label="Move ${name} down"
              title="Down"
              ?disabled=${i === ids.length - 1}
              @click=${() => this._move(i, 1)}
            >
              ▼
            </button>
          </li>`;
        })}
      </ol>
      <div class="actions">
        <button
          class="primary"
          data-testid="route-done"
          @click=${() => this._fire('route-done', {})}
        >
          Done
        </button>
        ${
          this.route?.length
            ? html`<button
                class="quiet"
                data-testid="route-reset"
                @click=${() => {
                  this.route = undefined;
                  this._said = '';
                  this._fire('route-change', { route: null });
                }}
              >
                Clear the route
              </button>`
            : nothing
        }
      </div>`;
  }
}

customElements.define('site-route', SiteRoute);

declare global {
  interface HTMLElementTagNameMap {
    'site-route': SiteRoute;
  }
}
