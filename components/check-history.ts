/**
 * The saved checks of one tank, newest first, each with its key figures as they were when it
 * was saved and the full list of its cautions on demand.
 *
 * @fires check-delete - `CustomEvent<{ id: string }>` (the shell deletes and offers undo)
 *
 * data-testid: `history`, `history-item` (with `data-check-id`), `history-empty`, `check-delete`.
 */
import { LitElement, html, nothing } from 'lit';
import { baseStyles, levelStyles } from './styles.js';
import { DisplayUnits, formatPercent } from './display.js';
import { formatDate } from './format-date.js';
import { historyStyles, newestFirst } from './history-list.js';
import { PHASE_WORDS } from './phase-words.js';
import { DEFAULT_SETTINGS, type CheckRecord } from './types.js';

export class CheckHistory extends LitElement {
  static override properties = {
    checks: { attribute: false },
    display: { attribute: false },
  };

  /** Saved checks of the tank (any order; shown newest first). */
  declare checks: CheckRecord[];
  /** The user's display units. */
  declare display: DisplayUnits;

  constructor() {
    super();
    this.checks = [];
    this.display = DisplayUnits.fromSettings(DEFAULT_SETTINGS);
  }

  static override styles = [baseStyles, levelStyles, historyStyles('li')];

  override render() {
    const d = this.display;
    const list = newestFirst(this.checks, (c) => c.at);
    if (list.length === 0)
      return html`<p data-testid="history-empty" class="muted">
        No saved checks for this tank yet.
      </p>`;
    return html`<ol data-testid="history" aria-label="Saved checks, newest first">
      ${list.map((c) => {
        const s = c.summary;
        const r = c.readings;
        return html`<li data-testid="history-item" data-check-id=${c.id}>
          <div class="when">
            ${formatDate(c.at)}
            ${s.topLevel ? html`<span class="level ${s.topLevel}">${s.topLevel}</span>` : nothing}
          </div>
          <div class="figs">
            Liquid ${d.format('temperature', r.liquidTemperature)} ·
            ${r.contentsMode === 'gaugePercent' ? html`gauge ${formatPercent(r.gaugePercent)}` : r.contentsMode === 'netMass' ? html`scale ${d.format('mass', r.netMass)}` : html`level ${d.format('length', r.levelHeight)}`}
            · ${PHASE_WORDS[s.phase]}
          </div>
          <div class="figs">
            Fill limit ${d.format('mass', s.maxMass, 'down')} (stop at
            ${formatPercent(s.stopAtGaugePercent, 'down')}) · contents
            ${d.format('mass', s.totalMass)} · peak ${d.format('gaugePressure', s.peakGauge, 'up')}
          </div>
          <details>
            <summary>Cautions and readings</summary>
            <ul>
              ${s.cautions.map((x) => html`<li><span class="level ${x.level}">${x.level}</span> ${x.message}</li>`)}
            </ul>
            <p>
              Product: ${c.productLabel}. Pressure gauge:
              ${r.pressureReadingGauge === null ? 'not read' : d.format('gaugePressure', r.pressureReadingGauge)}.
              Peak liquid temperature: ${d.format('temperature', s.peakTemperature)}.
            </p>
            <button
              class="quiet"
              data-testid="check-delete"
              @click=${() => this.dispatchEvent(new CustomEvent('check-delete', { detail: { id: c.id }, bubbles: true, composed: true }))}
            >
              Delete this check
            </button>
          </details>
        </li>`;
      })}
    </ol>`;
  }
}

customElements.define('check-history', CheckHistory);

declare global {
  interface HTMLElementTagNameMap {
    'check-history': CheckHistory;
  }
}
