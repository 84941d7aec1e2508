/**
 * The check of one tank: readings in, live results out (no compute button), the heating chart,
 * save to history, share and print. It runs `checkTank` through `runCheck` on every valid edit
 * (well under a millisecond for a pure product, a few for a blend; see the report in the
 * commit), and draws the chart a moment later so typing never waits for it.
 *
 * @fires check-save - `CustomEvent<{ check: CheckRecord }>` when the user saves the check.
 * @fires fill-start - `CustomEvent<{ draft: FillDraft }>`: a fill started from the readings on screen.
 * @fires tank-edit - `CustomEvent<{ id: string }>`
 * @fires readings-change - bubbles up from <check-form> (the shell keeps it as a draft).
 * @fires check-delete - bubbles up from <check-history>.
 *
 * The answer comes first: <key-bar> (stop-at percent, room left, peak headroom) sticks to the
 * top of the screen above the readings, so it stays in view while they are typed with the
 * on-screen keyboard up. Readings carry the time they were taken (`Readings.takenAt`, stamped
 * when a measured reading changes); old readings are marked with their age in the bar, and a
 * reopened tank with blank readings offers its last check (<last-check>) for one-tap reuse.
 *
 * The host carries `data-check-input`: the JSON of the `checkTank` input behind the figures
 * shown (absent while a reading is missing or invalid).
 *
 * data-testid: `check-screen`, `check-save`, `check-share`, `check-print`, `readings-clear`,
 * `check-status`, `tank-heading`, `fill-start` (fill-start.ts), plus those of <check-form>,
 * <check-results>, <check-chart>, <check-history> and <fill-history>.
 */
import { LitElement, html, nothing, type PropertyValues, type TemplateResult } from 'lit';
import type { TankCheckResult } from '../thermo/check/types.js';
import { checkScreenStyles } from './check-screen-styles.js';
import { baseStyles } from './styles.js';
import { DisplayUnits } from './display.js';
import './check-form.js';
import './key-bar.js';
import './last-check.js';
import './check-results.js';
import './check-chart.js';
import './check-history.js';
import './fill-history.js';
import { fillStartButton } from './fill-start.js';
import type { FillRecord } from './fill-types.js';
import type { ReadingsChange } from './check-form.js';
import { screenErrors, type ScreenErrors } from './check-errors.js';
import { minTemperatureFor, runCheck, summarize, type CheckOutcome } from './check-input.js';
import type { SiteRules } from './site-rules.js';
import type { HeatingCurve } from './chart-data.js';
import { curveFor } from './chart-client.js';
import { productFor, productLabel } from './products.js';
import { summaryText } from './summary.js';
import { shareText } from './share.js';
import {
  DEFAULT_SETTINGS,
  emptyReadings,
  newId,
  type CheckRecord,
  type Readings,
  type Settings,
  type TankRecord,
} from './types.js';
import { blankTank } from './blank-tank.js';
import {
  ageText,
  hasMeasured,
  isOld,
  lastReadings,
  measuredChanged,
  whenText,
  type LastReadings,
} from './reopen.js';

export interface CheckSaveDetail {
  check: CheckRecord;
}

/** Wait after the last edit before the chart is redrawn, ms. */
const CHART_DELAY_MS = 150;

export class CheckScreen extends LitElement {
  static override properties = {
    tank: { attribute: false },
    settings: { attribute: false },
    readings: { attribute: false },
    checks: { attribute: false },
    fills: { attribute: false },
    last: { attribute: false },
    siteRules: { attribute: false },
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
  /** Saved fills of this tank. */
  declare fills: FillRecord[];
  /** Old readings of this tank kept as a draft (offered for reuse with the saved checks), or null. */
  declare last: LastReadings | null;
  /** The rule set and own stricter rule of the tank's site (components/site-rules.ts). */
  declare siteRules: SiteRules;
  declare _readings: Readings;
  declare _valid: boolean;
  declare _outcome: CheckOutcome | null;
  declare _curve: HeatingCurve | null;
  declare _status: string;
  declare _shareText: string;

  private _chartTimer: ReturnType<typeof setTimeout> | undefined;
  private _chartTicket = 0;
  private _display = DisplayUnits.fromSettings(DEFAULT_SETTINGS);

  constructor() {
    super();
    this.tank = blankTank('none');
    this.settings = DEFAULT_SETTINGS;
    this.readings = emptyReadings(DEFAULT_SETTINGS.sunAllowance);
    this.checks = [];
    this.fills = [];
    this.last = null;
    this.siteRules = {};
    this._readings = this.readings;
    this._valid = true;
    this._outcome = null;
    this._curve = null;
    this._status = '';
    this._shareText = '';
  }

  static override styles = [baseStyles, checkScreenStyles];

  protected override willUpdate(changed: PropertyValues<this>): void {
    if (changed.has('settings')) this._display = DisplayUnits.fromSettings(this.settings);
    if (changed.has('readings')) {
      this._readings = this.readings;
      this._valid = true;
    }
    if (
      changed.has('readings') ||
      changed.has('tank') ||
      changed.has('settings') ||
      changed.has('siteRules')
    )
      this._recompute();
  }

  protected override updated(): void {
    // The engine input behind the figures on screen, for end-to-end tests and for anyone who
    // wants to re-run `checkTank` on exactly what the screen used (SI, as JSON).
    const input = this._outcome?.input;
    if (input && this._valid) this.dataset.checkInput = JSON.stringify(input);
    else delete this.dataset.checkInput;
  }

  override connectedCallback(): void {
    super.connectedCallback();
    const bar = this.renderRoot?.querySelector('.keybar');
    if (bar) this._barObserver.observe(bar);
  }

  protected override firstUpdated(): void {
    const bar = this.renderRoot.querySelector('.keybar');
    if (bar) this._barObserver.observe(bar);
  }

  override disconnectedCallback(): void {
    super.disconnectedCallback();
    clearTimeout(this._chartTimer);
    this._barObserver.disconnect();
    document.documentElement.style.removeProperty('scroll-padding-top');
  }

  /**
   * The page scrolls a focused field (and anything else brought into view) below the sticky key
   * bar, not under it: the bar's height becomes the page's scroll padding at the top.
   */
  private readonly _barObserver = new ResizeObserver(() => {
    const bar = this.renderRoot.querySelector<HTMLElement>('.keybar');
    if (bar)
      document.documentElement.style.setProperty('scroll-padding-top', `${bar.offsetHeight + 8}px`);
  });

  /** The current result (for tests and the shell). */
  get outcome(): CheckOutcome | null {
    return this._outcome;
  }

  private _recompute(): void {
    this._outcome = runCheck(this.tank, this._readings, this.settings, this.siteRules);
    clearTimeout(this._chartTimer);
    const ticket = ++this._chartTicket;
    const outcome = this._outcome;
    if (!outcome.result || !outcome.input) {
      this._curve = null;
      return;
    }
    this._chartTimer = setTimeout(() => {
      const product = productFor(this.tank.productId);
      if (product === undefined || !outcome.result || !outcome.input) return;
      const { peak, liquidFullTemperature, contents } = outcome.result;
      const req = { product, result: { peak, liquidFullTemperature, contents } };
      // Off the main thread (chart-client.ts); an answer for an older edit is dropped.
      void curveFor({ ...req, Tnow: outcome.input.liquidTemperature }).then((curve) => {
        if (ticket === this._chartTicket) this._curve = curve;
      });
    }, CHART_DELAY_MS);
  }

  private _onReadings(e: CustomEvent<ReadingsChange>): void {
    // The event goes on bubbling to the shell, which keeps the draft. A changed measured
    // reading is stamped with the time it was typed (the readings of the draft carry it).
    if (measuredChanged(this._readings, e.detail.readings))
      e.detail.readings = { ...e.detail.readings, takenAt: new Date().toISOString() };
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
    this._shareText = '';
    const done = await shareText(`Tank check — ${this.tank.name}`, text);
    if (done === null) return; // the user closed the share sheet
    this._status = done.status;
    this._shareText = done.byHand ? text : '';
  }

  private _print(): void {
    window.print();
  }

  private _clearReadings(): void {
    this._replaceReadings(emptyReadings(this.settings.sunAllowance));
    this._status = 'Readings cleared.';
  }

  /** One tap on <last-check>: its readings come back with their own (old) time. */
  private _reuse(e: CustomEvent<{ readings: Readings }>): void {
    e.stopPropagation();
    this._replaceReadings(e.detail.readings);
    this._status = '';
  }

  private _replaceReadings(next: Readings): void {
    const cleared = next;
    this._readings = cleared;
    this.readings = cleared;
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

  /** Engine refusals as per-field messages and one line for the results. */
  private _errors(): ScreenErrors {
    return screenErrors(this._outcome, this._valid, this._display);
  }

  /** "2 Dec 2026, 14:05, 4 days old" when the readings in use are old, else empty. */
  private _staleText(): string {
    const at = this._readings.takenAt;
    if (at === undefined || !hasMeasured(this._readings) || !isOld(at, new Date())) return '';
    return `${whenText(at)}, ${ageText(at)} old`;
  }

  private _head(): TemplateResult {
    const t = this.tank;
    const d = this._display;
    const np = t.nameplate;
    return html`<div class="head">
      <h2 data-testid="tank-heading">${t.name}${t.demo ? ' (demo, invented)' : ''}</h2>
      <button class="quiet no-print" @click=${this._editTank}>Edit tank</button>
      <p class="plate">
        ${t.site ? html`${t.site} · ` : nothing}${productLabel(t.productId)} · W.C.
        ${d.format('volume', np.waterCapacity)} · MAWP
        ${d.format('gaugePressure', np.designPressure)} ·
        ${
          np.reliefSetPressure === undefined
            ? html`<span data-testid="relief-assumed"
                >relief not entered (assumed at the design pressure)</span
              >`
            : html`relief ${d.format('gaugePressure', np.reliefSetPressure)}`
        }
      </p>
      <p class="print-only">Printed ${new Date().toLocaleString()} from the readings below.</p>
    </div>`;
  }

  /** The key bar: figures, or what is missing or wrong, and the standing caution in short. */
  private _bar(result: TankCheckResult | null, error: string, stale: string): TemplateResult {
    const o = this._outcome;
    const message = error
      ? 'No figures: fix the reading marked below.'
      : o?.missing.length
        ? `Enter ${o.missing.join(' and ')}: the stop-at percent and the room left show here.`
        : 'No figures yet.';
    return html`<div class="keybar">
      <key-bar
        .result=${result}
        .display=${this._display}
        .message=${message}
        .stale=${stale}
      ></key-bar>
    </div>`;
  }

  override render() {
    const t = this.tank;
    const d = this._display;
    const np = t.nameplate;
    const o = this._outcome;
    const { fieldErrors, error } = this._errors();
    const result = this._valid && !o?.error ? (o?.result ?? null) : null;
    const stale = this._staleText();
    const last = hasMeasured(this._readings) ? null : lastReadings(this.last, this.checks);
    return html`
      <div data-testid="check-screen">
        ${this._head()} ${this._bar(result, error, stale)}
        <last-check .last=${last} .display=${d} @readings-reuse=${this._reuse}></last-check>
        ${
          stale
            ? html`<p class="stale" data-testid="readings-age" role="note">
                These readings were taken ${stale}. The figures are for then, not now: type today’s
                readings.
              </p>`
            : nothing
        }
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
            ${this._actions(result)} ${this._chart(result)}
            <h3>History</h3>
            <check-history .checks=${this.checks} .display=${d}></check-history>
            <h3>Fills</h3>
            <fill-history .fills=${this.fills} .display=${d}></fill-history>
          </div>
        </div>
      </div>
    `;
  }

  private _actions(result: TankCheckResult | null): TemplateResult {
    return html`<div class="actions">
        <button class="primary" data-testid="check-save" ?disabled=${!result} @click=${this._save}>
          Save check
        </button>
        ${fillStartButton(this, this.tank.id, result ? (this._outcome ?? null) : null, this.settings)}
        <button data-testid="check-share" ?disabled=${!result} @click=${this._share}>
          Share summary
        </button>
        <button data-testid="check-print" ?disabled=${!result} @click=${this._print}>Print</button>
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
      }`;
  }

  private _chart(result: TankCheckResult | null): TemplateResult | typeof nothing {
    const np = this.tank.nameplate;
    if (!result || !this._curve) return nothing;
    return html`<h3>Heating</h3>
      <check-chart
        .curve=${this._curve}
        .display=${this._display}
        .designPressure=${np.designPressure}
        .reliefPressure=${np.reliefSetPressure ?? np.designPressure}
        .nowTemperature=${this._outcome?.input?.liquidTemperature ?? Number.NaN}
        .peakTemperature=${result.peak.temperature}
      ></check-chart>`;
  }
}

customElements.define('check-screen', CheckScreen);

declare global {
  interface HTMLElementTagNameMap {
    'check-screen': CheckScreen;
  }
}
