/**
 * A notice bar at the bottom of the screen: a new version waiting (reload only when the user
 * taps it, never by itself, so a half-filled check is never lost), the one-time "works offline
 * now" note, or an undo offer after a delete.
 *
 * @fires notice-action - `CustomEvent<{ kind: NoticeKind }>` when the action button is tapped.
 * @fires notice-dismiss - `CustomEvent<{ kind: NoticeKind }>`
 *
 * data-testid: `notice` (with `data-kind`), `notice-action`, `notice-dismiss`.
 */
import { LitElement, html, css, nothing } from 'lit';
import { baseStyles } from './styles.js';

export type NoticeKind = 'update' | 'offline-ready' | 'undo' | 'info';

export interface NoticeDetail {
  kind: NoticeKind;
}

export class AppNotice extends LitElement {
  static override properties = {
    kind: { type: String },
    text: { type: String },
    action: { type: String },
  };

  /** What the notice is about; '' hides it. */
  declare kind: NoticeKind | '';
  /** The message. */
  declare text: string;
  /** Label of the action button ('' for none). */
  declare action: string;

  constructor() {
    super();
    this.kind = '';
    this.text = '';
    this.action = '';
  }

  static override styles = [
    baseStyles,
    css`
      .bar {
        display: flex;
        flex-wrap: wrap;
        align-items: center;
        gap: 0.5rem;
        padding: 0.6rem 0.75rem;
        background: var(--ink);
        color: var(--paper);
        border-radius: 0.6rem;
        box-shadow: 0 2px 10px rgb(0 0 0 / 0.3);
      }
      p {
        margin: 0;
        flex: 1 1 12rem;
        font-weight: 600;
      }
      button {
        background: var(--paper);
        color: var(--ink);
        border-color: var(--paper);
      }
      button.quiet {
        background: transparent;
        color: var(--paper);
      }
      @media print {
        :host {
          display: none;
        }
      }
    `,
  ];

  private _fire(type: string): void {
    if (!this.kind) return;
    this.dispatchEvent(
      new CustomEvent<NoticeDetail>(type, {
        detail: { kind: this.kind },
        bubbles: true,
        composed: true,
      }),
    );
  }

  override render() {
    if (!this.kind) return html`<div role="status" aria-live="polite"></div>`;
    return html`<div
      class="bar"
      role="status"
      aria-live="polite"
      data-testid="notice"
      data-kind=${this.kind}
    >
      <p>${this.text}</p>
      ${this.action ? html`<button data-testid="notice-action" @click=${() => this._fire('notice-action')}>${this.action}</button>` : nothing}
      <button
        class="quiet"
        data-testid="notice-dismiss"
        aria-label="Dismiss"
        @click=${() => this._fire('notice-dismiss')}
      >
        Dismiss
      </button>
    </div>`;
  }
}

customElements.define('app-notice', AppNotice);

declare global {
  interface HTMLElementTagNameMap {
    'app-notice': AppNotice;
  }
}
