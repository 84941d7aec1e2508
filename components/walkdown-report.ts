/**
 * The record of one walkdown: who, when, the forecast used, a ranked table of every tank, then
 * each tank's cautions, notes and the tanks not reached with why, then the standing caution.
 * Laid out to print on one or two A4/Letter pages; shareable as text; CSV through the host.
 *
 * @fires walk-csv - `CustomEvent<{ id: string }>`: download this walkdown as CSV.
 *
 * data-testid: `walkdown-report`, `walkdown-report-row` (with `data-tank-id`), `walkdown-print`,
 * `walkdown-share`, `walkdown-csv`, `walkdown-share-done`.
 */
import { upperDiffers } from './peak-words.js';
import { LitElement, html, css, nothing } from 'lit';
import { baseStyles, levelStyles } from './styles.js';
import { DisplayUnits, formatPercent } from './display.js';
import { DEFAULT_SETTINGS } from './types.js';
import { progress, type WalkResult, type WalkdownRecord } from './walkdown-types.js';
import {
  LEVEL_SHAPES,
  LEVEL_WORDS,
  STANDING_WALK,
  cautionText,
  forecastText,
  rankedEntries,
  resultLines,
  upperOf,
  walkdownText,
} from './walkdown-words.js';
import { formatDate } from './format-date.js';

export class WalkdownReport extends LitElement {
  static override properties = {
    walk: { attribute: false },
    display: { attribute: false },
    _shared: { state: true },
  };

  declare walk: WalkdownRecord | null;
  declare display: DisplayUnits;
  declare _shared: string;

  constructor() {
    super();
    this.walk = null;
    this.display = DisplayUnits.fromSettings(DEFAULT_SETTINGS);
    this._shared = '';
  }

  static override styles = [
    baseStyles,
    levelStyles,
    css`
      .wrap {
        overflow-x: auto;
      }
      .line {
        display: block;
      }
      table {
        border-collapse: collapse;
        font-size: 0.78em;
        width: 100%;
      }
      th,
      td {
        border: 1px solid var(--line);
        padding: 0.15rem 0.2rem;
        text-align: left;
        vertical-align: top;
      }
      td.n {
        text-align: right;
        white-space: nowrap;
      }
      .actions {
        display: flex;
        flex-wrap: wrap;
        gap: 0.5rem;
        margin: 0.5rem 0;
      }
      .tank {
        break-inside: avoid;
        margin: 0.4rem 0;
      }
      .tank h4 {
        margin: 0.2rem 0;
      }
      dl {
        display: grid;
        grid-template-columns: auto 1fr;
        gap: 0.1rem 0.6rem;
        margin: 0;
      }
      dt {
        font-weight: 700;
      }
      dd {
        margin: 0;
        overflow-wrap: anywhere;
      }
      .standing {
        border: var(--border-width) solid var(--ink);
        padding: 0.4rem;
        border-radius: 0.4rem;
      }
      /* Print: one or two A4/Letter pages for a site of about six tanks (test/e2e/walkdown-print). */
      @media print {
        .actions {
          display: none;
        }
        :host {
          font-size: 9pt;
          line-height: 1.3;
        }
        .wrap {
          overflow: visible;
        }
        h2 {
          font-size: 13pt;
          margin: 0 0 0.3rem;
        }
        h3 {
          font-size: 10.5pt;
          margin: 0.5rem 0 0.2rem;
          break-after: avoid;
        }
        p,
        ul {
          margin: 0.1rem 0;
        }
        ul {
          padding-left: 1.1rem;
        }
        table {
          font-size: 8.5pt;
        }
        thead {
          display: table-header-group;
        }
        tr {
          break-inside: avoid;
        }
        .tank {
          margin: 0;
          padding: 0.25rem 0;
          border-top: 1px solid var(--line);
        }
        .tank h4 {
          margin: 0;
          break-after: avoid;
        }
        /* A tank's figures on one run of text, separated by a dot, to save lines. */
        .tank .line {
          display: inline;
        }
        .tank .line + .line::before {
          content: ' · ';
        }
        .level {
          padding: 0 0.2rem;
          border-width: 1px;
        }
        .standing {
          break-inside: avoid;
          margin-top: 0.4rem;
        }
      }
    `,
  ];

  private async _share(): Promise<void> {
    const w = this.walk;
    if (!w) return;
    const text = walkdownText(w, this.display);
    try {
      if (navigator.share) await navigator.share({ title: `Walkdown — ${w.site}`, text });
      else {
        await navigator.clipboard.writeText(text);
        this._shared = 'Copied to the clipboard.';
      }
    } catch {
      this._shared = 'Sharing did not finish; nothing was sent.';
    }
  }

  private _table(w: WalkdownRecord) {
    const d = this.display;
    return html`<div class="wrap">
      <table>
        <caption>
          Tanks, worst first at the forecast (liquid and degrees to liquid-full at the peak; the
          headroom is measured from the peak with the model's allowance, "up to" where it shows
          apart)
        </caption>
        <thead>
          <tr>
            <th>#</th>
            <th>Tank and level</th>
            <th>Peak (${d.label('gaugePressure')})</th>
            <th>To relief (${d.label('pressureDifference')})</th>
            <th>Liquid (%)</th>
            <th>To full (${d.label('temperatureDifference')})</th>
          </tr>
        </thead>
        <tbody>
          ${rankedEntries(w).map((e, i) => {
            const r = e.result;
            return html`<tr data-testid="walkdown-report-row" data-tank-id=${e.tankId}>
              <td>${i + 1}</td>
              <td>
                ${e.tankName}${r ? html`<br /><b>${LEVEL_SHAPES[r.level]} ${LEVEL_WORDS[r.level]}</b>` : nothing}
              </td>
              ${
                r
                  ? html` <td class="n">
                        ${d.number('gaugePressure', r.summary.peakGauge, 'up')}${upperCell(r, d)}
                      </td>
                      <td class="n">${shortHeadroom(r.summary.headroomToRelief, d)}</td>
                      <td class="n">
                        ${noLiquid(r.peakPhase) ? 'none' : formatPercent(r.peakLiquidPercent, 'up').replace(' %', '')}
                      </td>
                      <td class="n">${shortMargin(r.liquidFullMargin, d)}</td>`
                  : html`<td colspan="5">
                      ${
                        e.status === 'unreached'
                          ? `Could not reach: ${e.reason}`
                          : e.status === 'pending'
                            ? 'Not visited'
                            : `No result: ${e.problem}`
                      }
                    </td>`
              }
            </tr>`;
          })}
        </tbody>
      </table>
    </div>`;
  }

  private _tanks(w: WalkdownRecord) {
    const d = this.display;
    return rankedEntries(w).map((e) => {
      const r = e.result;
      const cautions = r?.cautions.filter((c) => c.code !== 'standing') ?? [];
      return html`<section class="tank">
        <h4>${e.tankName}</h4>
        ${
          r
            ? html`<p>
                  ${r.productLabel} · design ${d.format('gaugePressure', r.designPressureGauge)} ·
                  relief ${d.format('gaugePressure', r.reliefSetPressureGauge)}
                </p>
                ${resultLines(r, d).map((l) => html`<span class="line">${l}</span>`)}`
            : nothing
        }
        ${
          cautions.length
            ? html`<ul>
                ${cautions.map(
                  (c) =>
                    html`<li>
                      <span class="level ${c.level}">${c.level}</span> ${cautionText(c, d)}
                    </li>`,
                )}
              </ul>`
            : r
              ? html`<p>No further cautions from these figures.</p>`
              : nothing
        }
        ${e.status === 'unreached' ? html`<p>Could not reach: ${e.reason}</p>` : nothing}
        ${e.note ? html`<p>Note: ${e.note}</p>` : nothing}
      </section>`;
    });
  }

  override render() {
    const w = this.walk;
    if (!w) return html`<p data-testid="not-found">This walkdown is not on this device.</p>`;
    const d = this.display;
    const p = progress(w);
    return html`<article data-testid="walkdown-report" data-id=${w.id}>
      <h2>Walkdown record: ${w.site}</h2>
      <div class="actions">
        <button data-testid="walkdown-print" @click=${() => window.print()}>Print</button>
        <button data-testid="walkdown-share" @click=${this._share}>Share as text</button>
        <button
          data-testid="walkdown-csv"
          @click=${() =>
            this.dispatchEvent(
              new CustomEvent('walk-csv', { detail: { id: w.id }, bubbles: true, composed: true }),
            )}
        >
          Download CSV
        </button>
      </div>
      ${this._shared ? html`<p role="status" data-testid="walkdown-share-done">${this._shared}</p>` : nothing}
      <dl>
        <dt>Started</dt>
        <dd>${formatDate(w.startedAt)}</dd>
        <dt>Finished</dt>
        <dd>${w.finishedAt ? formatDate(w.finishedAt) : 'under way'}</dd>
        <dt>Checked by</dt>
        <dd>${w.checkedBy || 'not given'}</dd>
        <dt>Forecast</dt>
        <dd>${forecastText(w, d)}</dd>
        <dt>Done</dt>
        <dd>${p.done} of ${p.total} tanks</dd>
        <dt>App version</dt>
        <dd>${w.appVersion}</dd>
      </dl>
      ${this._table(w)}
      <h3>Each tank</h3>
      ${this._tanks(w)}
      <p class="standing" role="note">${STANDING_WALK}</p>
    </article>`;
  }
}

/** No liquid surface at the peak: the liquid percent means nothing there. */
function noLiquid(phase: string | undefined): boolean {
  return phase === 'supercritical' || phase === 'vapour-only';
}

/** "up to N" under the peak when the raised figure the headroom is taken from shows apart. */
function upperCell(r: WalkResult, d: DisplayUnits) {
  const u = upperOf(r);
  if (!upperDiffers(u, d)) return nothing;
  return html`<br /><span data-testid="report-peak-upper" data-si=${String(u.upper)}
      >up to ${d.number('gaugePressure', u.upper!, 'up')}</span
    >`;
}

/** A headroom as a bare number (rounded down), or "over N" (rounded up) when exceeded. */
function shortHeadroom(pa: number, d: DisplayUnits): string {
  return pa < 0
    ? `over ${d.number('pressureDifference', -pa, 'up')}`
    : d.number('pressureDifference', pa, 'down');
}

/** Degrees to liquid-full (rounded down); "full" when reached at the peak; "–" when never. */
function shortMargin(k: number | null, d: DisplayUnits): string {
  if (k === null) return '–';
  return k <= 0 ? 'full' : d.number('temperatureDifference', k, 'down');
}

customElements.define('walkdown-report', WalkdownReport);

declare global {
  interface HTMLElementTagNameMap {
    'walkdown-report': WalkdownReport;
  }
}
