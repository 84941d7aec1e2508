/**
 * What the team sync has to say about one tank: a conflict (edited on two phones while apart),
 * shown as the two versions side by side with a choice, or a tank kept although another phone
 * deleted it (because it was edited here or elsewhere at the same time). Renders nothing when
 * there is neither, and needs no team set up to be on the page.
 *
 * data-testid: `sync-conflict` (with `data-tank-id`), `sync-version` (one per version),
 * `sync-keep` (its button), `sync-kept` (the kept-after-delete note), `sync-kept-ok`.
 */
import { LitElement, html, css, nothing } from 'lit';
import { baseStyles } from './styles.js';
import type { DisplayUnits } from './display.js';
import type { TankRecord } from './types.js';
import { productLabel } from './products.js';
import { syncHub } from '../pwa/sync/hub.js';
import { SyncHubController } from './sync-hub-controller.js';

interface Version {
  rev: string;
  tank: TankRecord;
}

export class SyncConflict extends LitElement {
  static override properties = {
    tankId: { type: String, attribute: 'tank-id' },
    display: { attribute: false },
    _versions: { state: true },
    _tick: { state: true },
    _error: { state: true },
  };

  declare tankId: string;
  declare display: DisplayUnits | null;
  declare _versions: Version[];
  declare _tick: number;
  declare _error: string;
  private _loadedFor = '';

  constructor() {
    super();
    this.tankId = '';
    this.display = null;
    this._versions = [];
    this._tick = 0;
    this._error = '';
    new SyncHubController(this, () => {
      this._loadedFor = '';
      this._tick++;
    });
  }

  static override styles = [
    baseStyles,
    css`
      .box {
        border: var(--border-width) solid var(--warning);
        border-radius: 0.5rem;
        padding: 0.6rem;
        margin-bottom: 0.75rem;
      }
      .versions {
        display: grid;
        grid-template-columns: repeat(2, minmax(0, 1fr));
        gap: 0.5rem;
      }
      .version {
        border: 1px solid var(--line);
        border-radius: 0.4rem;
        padding: 0.4rem;
        display: grid;
        gap: 0.3rem;
        align-content: start;
        overflow-wrap: anywhere;
      }
      dl {
        margin: 0;
      }
      dt {
        font-size: 0.85em;
        color: var(--muted);
      }
      dd {
        margin: 0 0 0.25rem;
      }
      .differs {
        font-weight: 700;
      }
    `,
  ];

  override updated(): void {
    const conflicted = syncHub.marks.conflicts.includes(this.tankId);
    if (conflicted && this._loadedFor !== this.tankId) {
      this._loadedFor = this.tankId;
      void syncHub.versions(this.tankId).then((docs) => {
        this._versions = docs.map((d) => ({ rev: d._rev ?? '', tank: d.record as TankRecord }));
      });
    }
  }

  private async _keep(rev: string): Promise<void> {
    this._error = '';
    try {
      await syncHub.choose(this.tankId, rev);
    } catch (e) {
      this._error = e instanceof Error ? e.message : String(e);
    }
  }

  private _rows(t: TankRecord): [string, string][] {
    const d = this.display;
    const np = t.nameplate;
    const q = (kind: 'volume' | 'gaugePressure', v: number | undefined) =>
      v === undefined ? '—' : d ? d.format(kind, v) : String(v);
    return [
      ['Name', t.name],
      ['Site', t.site || '—'],
      ['Product', productLabel(t.productId)],
      ['Water capacity', q('volume', np.waterCapacity)],
      ['Design pressure', q('gaugePressure', np.designPressureGauge)],
      ['Relief setting', q('gaugePressure', np.reliefSetPressureGauge)],
      ['Notes', t.notes || '—'],
      ['Changed', new Date(t.updatedAt).toLocaleString()],
    ];
  }

  private _version(v: Version, i: number, other: Version | undefined) {
    const mine = this._rows(v.tank);
    const theirs = other ? this._rows(other.tank) : [];
    return html`<div class="version" data-testid="sync-version">
      <strong>${i === 0 ? 'Version shown now' : 'Other version'}</strong>
      <dl>
        ${mine.map(
          ([k, val], j) =>
            html`<dt>${k}</dt>
              <dd class=${theirs[j] && theirs[j][1] !== val ? 'differs' : ''}>${val}</dd>`,
        )}
      </dl>
      <button
        class=${i === 0 ? '' : 'primary'}
        data-testid="sync-keep"
        @click=${() => this._keep(v.rev)}
      >
        Keep this version
      </button>
    </div>`;
  }

  override render() {
    const conflicted = syncHub.marks.conflicts.includes(this.tankId);
    const kept = syncHub.marks.keptAfterDelete.includes(this.tankId);
    if (!conflicted && !kept) return nothing;
    const [first, ...rest] = this._versions;
    return html`
      ${
        kept
          ? html`<div class="box" role="status" data-testid="sync-kept">
              <p>
                Another phone deleted this tank while it was being edited. The edit is kept, with
                the tank's checks and fills; delete it again if it should go.
              </p>
              <button data-testid="sync-kept-ok" @click=${() => syncHub.dismissKept(this.tankId)}>
                OK
              </button>
            </div>`
          : nothing
      }
      ${
        conflicted
          ? html`<div
              class="box"
              role="alert"
              data-testid="sync-conflict"
              data-tank-id=${this.tankId}
            >
              <p>
                <strong>Changed on two phones.</strong> This tank was edited on two phones while
                they were apart. Both versions are kept until you choose one; the other is removed
                on every phone. Differences are in bold.
              </p>
              ${
                first
                  ? html`<div class="versions">
                      ${this._version(first, 0, rest[0])}
                      ${rest.map((v, i) => this._version(v, i + 1, first))}
                    </div>`
                  : html`<p class="muted">Loading both versions…</p>`
              }
              ${this._error ? html`<p class="error">${this._error}</p>` : nothing}
            </div>`
          : nothing
      }
    `;
  }
}

customElements.define('sync-conflict', SyncConflict);

declare global {
  interface HTMLElementTagNameMap {
    'sync-conflict': SyncConflict;
  }
}
