/**
 * A question that must be answered before something is removed: the text, a button that does
 * it and one that keeps everything. It takes the keyboard focus when shown, so a screen reader
 * reads the question first.
 *
 * @fires confirm-yes - `CustomEvent<Record<string, never>>`
 * @fires confirm-no - `CustomEvent<Record<string, never>>`
 *
 * data-testid: `confirm-bar`, `confirm-yes`, `confirm-no`.
 */
import { LitElement, html, css } from 'lit';
import { baseStyles } from './styles.js';

export class ConfirmBar extends LitElement {
  static override properties = {
    text: { type: String },
    yes: { type: String },
    no: { type: String },
  };

  /** The question. */
  declare text: string;
  /** Label of the button that goes ahead. */
  declare yes: string;
  /** Label of the button that keeps everything. */
  declare no: string;

  constructor() {
    super();
    this.text = '';
    this.yes = 'Yes';
    this.no = 'Cancel';
  }

  static override styles = [
    baseStyles,
    css`
      .bar {
        border: var(--border-width) solid var(--danger);
        border-radius: 0.6rem;
        padding: 0.6rem 0.75rem;
        background: var(--paper);
        color: var(--ink);
        box-shadow: 0 2px 10px rgb(0 0 0 / 0.3);
      }
      p {
        margin: 0 0 0.5rem;
        font-weight: 600;
      }
      .buttons {
        display: flex;
        flex-wrap: wrap;
        gap: 0.5rem;
      }
      .buttons button {
        flex: 1 1 8rem;
      }
    `,
  ];

  protected override firstUpdated(): void {
    this.renderRoot.querySelector<HTMLElement>('[data-testid="confirm-no"]')?.focus();
  }

  private _fire(type: 'confirm-yes' | 'confirm-no'): void {
    this.dispatchEvent(new CustomEvent(type, { detail: {}, bubbles: true, composed: true }));
  }

  override render() {
    return html`<div class="bar" role="alertdialog" aria-labelledby="q" data-testid="confirm-bar">
      <p id="q">${this.text}</p>
      <div class="buttons">
        <button class="primary" data-testid="confirm-yes" @click=${() => this._fire('confirm-yes')}>
          ${this.yes}
        </button>
        <button data-testid="confirm-no" @click=${() => this._fire('confirm-no')}>
          ${this.no}
        </button>
      </div>
    </div>`;
  }
}

customElements.define('confirm-bar', ConfirmBar);

declare global {
  interface HTMLElementTagNameMap {
    'confirm-bar': ConfirmBar;
  }
}
