/**
 * The saved fills of one tank, newest first: before, delivered, after, the verdict, the time
 * and the note, and the findings on demand, in the user's units.
 *
 * data-testid: `fill-history`, `fill-record-item` (with `data-fill-id` and `data-verdict`),
 * `fill-history-empty`.
 */
import { LitElement, html } from 'lit';
import { baseStyles, levelStyles } from './styles.js';
import { DisplayUnits, formatPercent } from './display.js';
import { formatDate } from './format-date.js';
import { historyStyles, newestFirst } from './history-list.js';
import { fillFindingText } from './messages.js';
import { DEFAULT_SETTINGS } from './types.js';
import type { FillRecord } from './fill-types.js';

/** The verdict in a few words (the heading of a fill). */
export const VERDICT_WORDS: Record<FillRecord['result']['verdict'], string> = {
  consistent: 'Gauge agrees with the meter',
  'gauge-low': 'Gauge reads low',
  'gauge-high': 'Gauge reads high',
  'over-limit': 'Over the fill limit',
};

const BASIS_WORDS = {
  'compensated-60F': 'compensated to 60 °F',
  'compensated-15C': 'compensated to 15 °C',
  gross: 'gross, at the product temperature',
} as const;

export class FillHistory extends LitElement {
  static override properties = {
    fills: { attribute: false },
    display: { attribute: false },
  };

  declare fills: FillRecord[];
  declare display: DisplayUnits;

  constructor() {
    super();
    this.fills = [];
    this.display = DisplayUnits.fromSettings(DEFAULT_SETTINGS);
  }

  static override styles = [baseStyles, levelStyles, historyStyles('li.fill')];

  override render() {
    const d = this.display;
    const list = newestFirst(this.fills, (f) => f.finishedAt);
    if (list.length === 0)
      return html`<p data-testid="fill-history-empty" class="muted">No saved fills yet.</p>`;
    return html`<ol data-testid="fill-history" aria-label="Saved fills, newest first">
      ${list.map((f) => {
        const r = f.result;
        const b = f.start.before;
        return html`<li
          class="fill"
          data-testid="fill-record-item"
          data-fill-id=${f.id}
          data-verdict=${r.verdict}
        >
          <div class="when">
            Fill ${formatDate(f.finishedAt)} <span class="level ${r.level}">${r.level}</span>
            ${VERDICT_WORDS[r.verdict]}
          </div>
          <div class="figs">
            Before
            ${b.gaugePercent === null ? d.format('mass', b.totalMass) : formatPercent(b.gaugePercent)}
            · delivered ${d.format('volume', f.delivered.volume)}
            (${BASIS_WORDS[f.delivered.basis ?? 'compensated-60F']}${f.delivered.interrupted ? ', stopped early' : ''})
            · after ${formatPercent(f.after.gaugePercent)}, expected
            ${formatPercent(r.expectedGaugePercent)}
            (±${formatPercent(r.band.halfWidth, 'down').replace(' %', '')} points)
          </div>
          ${f.note ? html`<div class="figs">Note: ${f.note}</div>` : ''}
          <details>
            <summary>Findings</summary>
            <ul>
              ${r.findings.map((x) => html`<li><span class="level ${x.level}">${x.level}</span> ${fillFindingText(x, d)}</li>`)}
            </ul>
          </details>
        </li>`;
      })}
    </ol>`;
  }
}

customElements.define('fill-history', FillHistory);

declare global {
  interface HTMLElementTagNameMap {
    'fill-history': FillHistory;
  }
}
