/**
 * A site's past walkdowns, newest first: a finished one opens its record, one under way resumes.
 *
 * @fires walk-open - `CustomEvent<{ id: string }>`: show a past walkdown's record.
 * @fires walk-resume - `CustomEvent<{ id: string }>`
 *
 * data-testid: `walkdown-history-item` (with `data-id`).
 */
import { LitElement, html, nothing } from 'lit';
import { baseStyles } from './styles.js';
import { progress, type WalkdownRecord } from './walkdown-types.js';
import { formatDate } from './format-date.js';

export class WalkdownHistory extends LitElement {
  static override properties = { history: { attribute: false } };

  /** The site's walkdowns, newest first. */
  declare history: WalkdownRecord[];

  constructor() {
    super();
    this.history = [];
  }

  static override styles = [baseStyles];

  private _open(w: WalkdownRecord): void {
    const type = w.status === 'finished' ? 'walk-open' : 'walk-resume';
    this.dispatchEvent(
      new CustomEvent(type, { detail: { id: w.id }, bubbles: true, composed: true }),
    );
  }

  override render() {
    if (!this.history.length) return nothing;
    return html`<section aria-labelledby="h-hist">
      <h3 id="h-hist">Walkdowns of this site</h3>
      <ol style="list-style: none; margin: 0; padding: 0">
        ${this.history.map((w) => {
          const p = progress(w);
          return html`<li>
            <button
              class="quiet"
              data-testid="walkdown-history-item"
              data-id=${w.id}
              @click=${() => this._open(w)}
            >
              ${formatDate(w.startedAt)} · ${p.done} of ${p.total} done ·
              ${w.status === 'finished' ? `by ${w.checkedBy || 'not given'}` : 'under way'}
            </button>
          </li>`;
        })}
      </ol>
    </section>`;
  }
}

customElements.define('walkdown-history', WalkdownHistory);

declare global {
  interface HTMLElementTagNameMap {
    'walkdown-history': WalkdownHistory;
  }
}
