/**
 * Your data: export a JSON backup, import one back, export the checks as CSV, clear the demo
 * tanks (the shell asks once and offers undo), clear everything (two taps, with a last-chance
 * backup offer), and whether the browser keeps the data persistently.
 * It only asks: the shell does the work and reports back through `message`.
 *
 * @fires backup-export - `CustomEvent<Record<string, never>>`
 * @fires backup-import - `CustomEvent<{ file: File }>`
 * @fires csv-export - `CustomEvent<Record<string, never>>`
 * @fires fill-csv-export - `CustomEvent<Record<string, never>>`
 * @fires demo-clear - `CustomEvent<Record<string, never>>`
 * @fires data-clear - `CustomEvent<Record<string, never>>` after the second, confirming tap.
 *
 * data-testid: `backup-export`, `backup-import` (the file input), `csv-export`, `fill-csv-export`, `demo-clear`,
 * `data-clear`, `data-clear-confirm`, `data-clear-backup` (a last-chance backup while asking),
 * `data-clear-cancel`, `data-message`, `storage-persisted`.
 */
import { LitElement, html, css, nothing } from 'lit';
import { baseStyles } from './styles.js';

export interface BackupImportDetail {
  file: File;
}

export class BackupPanel extends LitElement {
  static override properties = {
    tankCount: { type: Number, attribute: 'tank-count' },
    checkCount: { type: Number, attribute: 'check-count' },
    demoCount: { type: Number, attribute: 'demo-count' },
    persisted: { attribute: false },
    message: { type: String },
    messageKind: { type: String, attribute: 'message-kind' },
    _confirming: { state: true },
  };

  /** Tanks in the register. */
  declare tankCount: number;
  /** Saved checks. */
  declare checkCount: number;
  /** Invented demo tanks still present. */
  declare demoCount: number;
  /** Persistent storage granted (true), refused (false) or unknown (null). */
  declare persisted: boolean | null;
  /** Result of the last action, from the shell. */
  declare message: string;
  /** `ok` or `error`. */
  declare messageKind: 'ok' | 'error';
  declare _confirming: boolean;

  constructor() {
    super();
    this.tankCount = 0;
    this.checkCount = 0;
    this.demoCount = 0;
    this.persisted = null;
    this.message = '';
    this.messageKind = 'ok';
    this._confirming = false;
  }

  static override styles = [
    baseStyles,
    css`
      .buttons {
        display: grid;
        grid-template-columns: repeat(auto-fit, minmax(14rem, 1fr));
        gap: 0.5rem;
        margin-bottom: 1rem;
      }
      .message {
        border: var(--border-width) solid var(--ink);
        border-radius: 0.4rem;
        padding: 0.6rem;
        font-weight: 600;
      }
      /* The file input is hidden; its label is the button, and shows the input's keyboard focus. */
      input[type='file']:focus-visible + label {
        outline: 3px solid var(--focus);
        outline-offset: 2px;
      }
      .message.error {
        border-color: var(--danger);
      }
    `,
  ];

  private _fire<T>(type: string, detail: T): void {
    this.dispatchEvent(new CustomEvent<T>(type, { detail, bubbles: true, composed: true }));
  }

  private _onFile(e: Event): void {
    const input = e.target as HTMLInputElement;
    const file = input.files?.[0];
    if (file) this._fire<BackupImportDetail>('backup-import', { file });
    input.value = ''; // the same file can be chosen again
  }

  /** Clearing the demo tanks, and deleting everything after a second tap. */
  private _clearPart() {
    return html`
      <h3>Clear</h3>
      <div class="buttons">
        ${
          this.demoCount > 0
            ? html`<button data-testid="demo-clear" @click=${() => this._fire('demo-clear', {})}>
                Clear the ${this.demoCount} demo tanks
              </button>`
            : nothing
        }
        ${
          this._confirming
            ? html`<button
                  class="primary"
                  data-testid="data-clear-confirm"
                  @click=${() => {
                    this._confirming = false;
                    this._fire('data-clear', {});
                  }}
                >
                  Yes, delete all tanks and checks
                </button>
                <button
                  data-testid="data-clear-backup"
                  @click=${() => this._fire('backup-export', {})}
                >
                  Export a backup first
                </button>
                <button data-testid="data-clear-cancel" @click=${() => (this._confirming = false)}>
                  Keep my data
                </button>`
            : html`<button data-testid="data-clear" @click=${() => (this._confirming = true)}>
                Delete all tanks and checks…
              </button>`
        }
      </div>
      ${this._confirming ? html`<p role="alert" class="error">This removes every tank and check from this device. Export a backup first if you may need them.</p>` : nothing}
    `;
  }

  override render() {
    return html`
      <h2>Your data</h2>
      <p>
        ${this.tankCount} tank${this.tankCount === 1 ? '' : 's'} and ${this.checkCount} saved
        check${this.checkCount === 1 ? '' : 's'}, kept on this device only.
      </p>
      <p data-testid="storage-persisted" class="muted">
        ${
          this.persisted === true
            ? 'The browser keeps this data even when space runs low.'
            : this.persisted === false
              ? 'The browser may clear this data when space runs low: export a backup now and then.'
              : 'Export a backup now and then: this data lives only in this browser.'
        }
      </p>
      ${
        this.message
          ? html`<p
              class="message ${this.messageKind === 'error' ? 'error' : ''}"
              role=${this.messageKind === 'error' ? 'alert' : 'status'}
              data-testid="data-message"
            >
              ${this.message}
            </p>`
          : nothing
      }
      <h3>Backup</h3>
      <div class="buttons">
        <button
          class="primary"
          data-testid="backup-export"
          @click=${() => this._fire('backup-export', {})}
        >
          Export a backup (JSON)
        </button>
        <input
          id="import"
          class="visually-hidden"
          type="file"
          accept=".json,application/json"
          data-testid="backup-import"
          @change=${this._onFile}
        />
        <label class="button" for="import">Import a backup…</label>
        <button data-testid="csv-export" @click=${() => this._fire('csv-export', {})}>
          Export checks (CSV)
        </button>
        <button data-testid="fill-csv-export" @click=${() => this._fire('fill-csv-export', {})}>
          Export fills (CSV)
        </button>
      </div>
      <p class="muted">
        An import adds the backup’s tanks, checks and fills and replaces those with the same id;
        nothing else is removed. A file that is not a valid backup changes nothing.
      </p>
      ${this._clearPart()}
    `;
  }
}

customElements.define('backup-panel', BackupPanel);

declare global {
  interface HTMLElementTagNameMap {
    'backup-panel': BackupPanel;
  }
}
