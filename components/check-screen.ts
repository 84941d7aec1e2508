/**
 * The check of one tank: readings in, live results out (no compute button), the heating chart,
 * save to history, share and print. It runs `checkTank` through `runCheck` on every valid edit
 * (well under a millisecond for a pure product, a few for a blend; see the report in the
 * commit), and draws the chart a moment later so typing never waits for it.
 *
 * @fires check-save - `CustomEvent<{ check: CheckRecord }>` when the user saves the check.
 * @fires tank-edit - `CustomEvent<{ id: string }>`
 * @fires readings-change - bubbles up from <check-form> (the shell keeps it as a draft).
 * @fires check-delete - bubbles up from <check-history>.
 *
 * The host carries `data-check-input`: the JSON of the `checkTank` input behind the figures
 * shown (absent while a reading is missing or invalid).
 *
 * data-testid: `check-screen`, `check-save`, `check-share`, `check-print`, `readings-clear`,
 * `check-status`, `tank-heading`, plus those of <check-form>, <check-results>, <check-chart>
 * and <check-history>.
 */
import { LitElement, html, css, nothing, type PropertyValues } from 'lit';
import { baseStyles } from './styles.js';
import { DisplayUnits, formatPercent } from './display.js';
import type { TankCheckResult } from '../thermo/check/types.js';
import './check-form.js';
import './check-results.js';
import './check-chart.js';
import './check-history.js';
import type { ReadingsChange } from './check-form.js';
import {
  errorText,
  minTemperatureFor,
  runCheck,
  summarize,
  type CheckOutcome,
} from './check-input.js';
import { heatingCurve, type HeatingCurve } from './chart-data.js';
import { productFor, productLabel } from './products.js';
import { summaryText } from './summary.js';
import {
  DEFAULT_SETTINGS,
  emptyReadings,
  newId,
  type CheckRecord,
  type Readings,
  type Settings,
  type TankRecord,
} from './types.js';
import { blankTank } from './tank-form.js';

export interface CheckSaveDetail {
  check: CheckRecord;
}

/** Wait after the last edit before the chart is redrawn, ms. */
const CHART_DELAY_MS = 150;

/** Engine field → reading name used by <check-form>. */
const FIELD_OF: Record<string, keyof Readings | 'peakTemperature'> = {
  liquidTemperature: 'liquidTemperature',
  'contents.gaugePercent': 'gaugePercent',
  'contents.netMass': 'netMass',
  'contents.levelHeight': 'levelHeight',
  gaugePressure: 'gaugePressure',
  peakTemperature: 'peakTemperature',
};

export class CheckScreen extends LitElement {
  static override properties = {
    tank: { attribute: false },
    settings: { attribute: false },
    readings: { attribute: false },
    checks: { attribute: false },
    _readings: { state: true },
    _valid: { state: true },
    _outcome: { state: true },
    _curve: { state: true },
    _status: { state: true },
    _shareText: { state: true },
  };

  /** The tank being checked. */
  declare tank: TankRecord;
  /** The user's settings (units, barometer, tolerances, sun allowance). */
  declare settings: Settings;
  /** Readings to start from (a draft, or empty). */
  declare readings: Readings;
  /** Saved checks of this tank. */
  declare checks: CheckRecord[];
  declare _readings: Readings;
  declare _valid: boolean;
  declare _outcome: CheckOutcome | null;
  declare _curve: HeatingCurve | null;
  declare _status: string;
  declare _shareText: string;

  private _chartTimer: ReturnType<typeof setTimeout> | undefined;
  private _display = DisplayUnits.fromSettings(DEFAULT_SETTINGS);

  constructor() {
    super();
    this.tank = blankTank('none');
    this.settings = DEFAULT_SETTINGS;
    this.readings = emptyReadings(DEFAULT_SETTINGS.sunAllowance);
    this.checks = [];
    this._readings = this.readings;
    this._valid = true;
    this._outcome = null;
    this._curve = null;
    this._status = '';
    this._shareText = '';
  }

  static override styles = [
    baseStyles,
    css`
      .head {
        margin-bottom: 0.75rem;
      }
      .head h2 {
        overflow-wrap: anywhere;
      }
      .plate {
        color: var(--muted);
        overflow-wrap: anywhere;
      }
      .layout {
        display: grid;
        gap: 1rem;
      }
      @media (min-width: 60rem) {
        .layout {
          grid-template-columns: minmax(18rem, 26rem) minmax(0, 1fr);
          align-items: start;
        }
      }
      .actions {
        display: flex;
        flex-wrap: wrap;
        gap: 0.5rem;
        margin: 0.5rem 0 1rem;
      }
      .actions button {
        flex: 1 1 8rem;
      }
      .status {
        min-height: 1.5em;
        font-weight: 700;
      }
      textarea {
        min-height: 10rem;
      }
      .keybar {
        position: sticky;
        bottom: 0;
        z-index: 5;
        margin: 0.75rem -0.75rem 0;
        padding: 0.4rem 0.75rem;
        background: var(--ink);
        color: var(--paper);
        font-weight: 700;
        font-size: 0.9em;
        line-height: 1.3;
      }
      .print-only {
        display: none;
      }
      @media print {
        .print-only {
          display: block;
        }
      }
      .keybar .small {
        font-weight: 400;
        font-size: 0.85em;
      }
      @media print {
        .layout {
          display: block;
        }
        check-form,
        check-history,
        .actions,
        .keybar {
          display: none;
        }
      }
    `,
  ];

  protected override willUpdate(changed: PropertyValues<this>): void {
    if (changed.has('settings')) this._display = DisplayUnits.fromSettings(this.settings);
    if (changed.has('readings')) {
      this._readings = this.readings;
      this._valid = true;
    }
    if (changed.has('readings') || changed.has('tank') || changed.has('settings'))
      this._recompute();
  }

  protected override updated(): void {
    // The engine input behind the figures on screen, for end-to-end tests and for anyone who
    // wants to re-run `checkTank` on exactly what the screen used (SI, as JSON).
    const input = this._outcome?.input;
    if (input && this._valid) this.dataset.checkInput = JSON.stringify(input);
    else delete this.dataset.checkInput;
  }

  override disconnectedCallback(): void {
    super.disconnectedCallback();
    clearTimeout(this._chartTimer);
  }

  /** The current result (for tests and the shell). */
  get outcome(): CheckOutcome | null {
    return this._outcome;
  }

  private _recompute(): void {
    this._outcome = runCheck(this.tank, this._readings, this.settings);
    clearTimeout(this._chartTimer);
    const outcome = this._outcome;
    if (!outcome.result || !outcome.input) {
      this._curve = null;
      return;
    }
    this._chartTimer = setTimeout(() => {
      const product = productFor(this.tank.productId);
      if (product === undefined || !outcome.result || !outcome.input) return;
      this._curve = heatingCurve(product, outcome.result, outcome.input.liquidTemperature);
    }, CHART_DELAY_MS);
  }

  private _onReadings(e: CustomEvent<ReadingsChange>): void {
    // The event goes on bubbling to the shell, which keeps the draft.
    this._readings = e.detail.readings;
    this._valid = e.detail.valid;
    this._status = '';
    this._recompute();
  }

  private _save(): void {
    const o = this._outcome;
    if (!o?.result || !this._valid) return;
    const check: CheckRecord = {
      id: newId(),
      tankId: this.tank.id,
      at: new Date().toISOString(),
      readings: this._readings,
      productLabel: o.result.product.label,
      summary: summarize(o.result, this._display),
      demo: this.tank.demo,
    };
    this.dispatchEvent(
      new CustomEvent<CheckSaveDetail>('check-save', {
        detail: { check },
        bubbles: true,
        composed: true,
      }),
    );
    this._status = `Check saved to this tank’s history (${new Date(check.at).toLocaleTimeString()}).`;
  }

  private async _share(): Promise<void> {
    const o = this._outcome;
    if (!o?.result) return;
    const text = summaryText(this.tank, this._readings, o.result, this._display);
    const title = `Tank check — ${this.tank.name}`;
    this._shareText = '';
    try {
      if (typeof navigator.share === 'function') {
        await navigator.share({ title, text });
        this._status = 'Summary shared.';
        return;
      }
    } catch (e) {
      if (e instanceof DOMException && e.name === 'AbortError') return; // the user closed the share sheet
    }
    try {
      await navigator.clipboard.writeText(text);
      this._status = 'Summary copied. Paste it into a message or a report.';
    } catch {
      // No share sheet and no clipboard: show the text to copy by hand.
      this._shareText = text;
      this._status = 'Copy the summary below.';
    }
  }

  private _print(): void {
    window.print();
  }

  private _clearReadings(): void {
    const cleared = emptyReadings(this.settings.sunAllowance);
    this._readings = cleared;
    this.readings = cleared;
    this._status = 'Readings cleared.';
    this.dispatchEvent(
      new CustomEvent<ReadingsChange>('readings-change', {
        detail: { readings: cleared, valid: true },
        bubbles: true,
        composed: true,
      }),
    );
  }

  private _editTank(): void {
    this.dispatchEvent(
      new CustomEvent('tank-edit', { detail: { id: this.tank.id }, bubbles: true, composed: true }),
    );
  }

  override render() {
    const t = this.tank;
    const d = this._display;
    const np = t.nameplate;
    const o = this._outcome;
    const fieldErrors: Partial<Record<keyof Readings | 'peakTemperature', string>> = {};
    let error = '';
    if (!this._valid)
      error = 'A reading above is not valid: fix the marked field to see the figures.';
    else if (o?.error) {
      const key = FIELD_OF[o.error.field];
      // In the user's units when the engine gave the range as numbers.
      const message = errorText(o.error, d);
      if (key) fieldErrors[key] = `The check cannot use this value: ${message}.`;
      error = o.error.field.startsWith('tank')
        ? `The tank’s nameplate has a figure the check cannot use (${message}). Edit the tank to fix it.`
        : key
          ? 'The check cannot use a reading: see the message next to the field.'
          : message;
    }
    const result = this._valid && !o?.error ? (o?.result ?? null) : null;
    const relief = np.reliefSetPressure ?? np.designPressure;
    return html`
      <div data-testid="check-screen">
        <div class="head">
          <h2 data-testid="tank-heading">${t.name}${t.demo ? ' (demo, invented)' : ''}</h2>
          <p class="plate">
            ${t.site ? html`${t.site} · ` : nothing}${productLabel(t.productId)} · W.C.
            ${d.format('volume', np.waterCapacity)} · MAWP
            ${d.format('gaugePressure', np.designPressure)} ·
            ${
              np.reliefSetPressure === undefined
                ? html`<span data-testid="relief-assumed"
                    >relief not entered (assumed at the design pressure)</span
                  >`
                : html`relief ${d.format('gaugePressure', relief)}`
            }
          </p>
          <p class="print-only">Printed ${new Date().toLocaleString()} from the readings below.</p>
          <button class="quiet no-print" @click=${this._editTank}>Edit tank</button>
        </div>
        <div class="layout">
          <check-form
            .readings=${this.readings}
            .display=${d}
            .minTemperature=${minTemperatureFor(t.productId)}
            .hasShape=${np.shape !== undefined}
            .fieldErrors=${fieldErrors}
            @readings-change=${this._onReadings}
          ></check-form>
          <div>
            <check-results
              .result=${result}
              .display=${d}
              .missing=${o?.missing ?? []}
              .error=${error}
              .thermometerTolerance=${this.settings.thermometerTolerance}
              ?peak-estimated=${o?.peakEstimated ?? false}
            ></check-results>
            <div class="actions">
              <button
                class="primary"
                data-testid="check-save"
                ?disabled=${!result}
                @click=${this._save}
              >
                Save check
              </button>
              <button data-testid="check-share" ?disabled=${!result} @click=${this._share}>
                Share summary
              </button>
              <button data-testid="check-print" ?disabled=${!result} @click=${this._print}>
                Print
              </button>
              <button class="quiet" data-testid="readings-clear" @click=${this._clearReadings}>
                Clear readings
              </button>
            </div>
            <p class="status" role="status" data-testid="check-status">${this._status}</p>
            ${
              this._shareText
                ? html`<label for="share-text">Summary</label
                    ><textarea id="share-text" readonly .value=${this._shareText}></textarea>`
                : nothing
            }
            ${
              result && this._curve
                ? html`<h3>Heating</h3>
                    <check-chart
                      .curve=${this._curve}
                      .display=${d}
                      .designPressure=${np.designPressure}
                      .reliefPressure=${relief}
                      .nowTemperature=${o?.input?.liquidTemperature ?? Number.NaN}
                      .peakTemperature=${result.peak.temperature}
                    ></check-chart>`
                : nothing
            }
            <h3>History</h3>
            <check-history .checks=${this.checks} .display=${d}></check-history>
          </div>
        </div>
        <div class="keybar" data-testid="key-bar" aria-hidden="true">
          ${
            result
              ? html`Stop at ${formatPercent(result.fillLimit.stopAtGaugePercent, 'down')} · limit
                ${d.format('mass', result.fillLimit.maxMass, 'down')} · peak
                ${d.format('gaugePressure', result.peak.p, 'up')}
                ${topLevel(result) ? html` · ${topLevel(result)!.toUpperCase()}` : nothing}`
              : html`No figures yet`
          }
          <div class="small">Model figures: site procedures and the code come first.</div>
        </div>
      </div>
    `;
  }
}

/** The most severe caution level other than the standing caution, if any. */
function topLevel(r: TankCheckResult): string | null {
  return r.cautions.find((c) => c.code !== 'standing')?.level ?? null;
}

customElements.define('check-screen', CheckScreen);

declare global {
  interface HTMLElementTagNameMap {
    'check-screen': CheckScreen;
  }
}
