/**
 * The check of one tank: readings in, live results out (no compute button), the heating chart,
 * save to history, share and print. Every edit runs `checkTank` through `requestCheck`
 * (check-client.ts): in the built app in a Web Worker, so typing never waits for the engine.
 * The last figures stay until the new ones arrive, marked as updating (`aria-busy`,
 * "updating…") after a frame; an answer overtaken by a newer edit is dropped.
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
 * data-testid: `check-screen`, `check-updating`, `check-save`, `check-share`, `check-print`, `readings-clear`,
 * `check-status`, `tank-heading`, `fill-start` (fill-start.ts), plus those of <check-form>,
 * <check-results>, <check-chart>, <check-history> and <fill-history>.
 */
import { LitElement, html, nothing, type PropertyValues, type TemplateResult } from 'lit';
import { guard } from 'lit/directives/guard.js';
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
import { keptScreenErrors, type ScreenErrors } from './check-errors.js';
import { buildCheckInput, minTemperatureFor, runCheck, type CheckOutcome } from './check-input.js';
import { requestCheck } from './check-client.js';
import type { SiteRules } from './site-rules.js';
import {
  actionsPart,
  barPart,
  chartLater,
  chartPart,
  checkRecordOf,
  headPart,
  printedText,
  stalePart,
  type ShownCurve,
} from './check-screen-parts.js';
import { summaryText } from './summary.js';
import { shareText } from './share.js';
import {
  DEFAULT_SETTINGS,
  emptyReadings,
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

export type CheckSaveDetail = { check: CheckRecord };

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
    _updating: { state: true },
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
  /** The heating chart's series with the temperatures it was computed for. */
  declare _curve: ShownCurve | null;
  /** A check is under way and the figures shown are those of the previous readings. */
  declare _updating: boolean;
  declare _status: string;
  declare _shareText: string;

  /** Cancels the chart asked for last (its answer is for older readings). */
  private _cancelChart: () => void = () => {};
  /** Sequence number of the latest check asked for; older answers are dropped. */
  private _seq = 0;
  /** The check under way in the worker, until its answer (or a newer request's) arrives. */
  private _pending: Promise<void> | null = null;
  private _busyTimer: ReturnType<typeof setTimeout> | undefined;
  private _display = DisplayUnits.fromSettings(DEFAULT_SETTINGS);
  /** Lowest liquid temperature of the tank's product, K (changes only with the tank). */
  private _minT = minTemperatureFor('');
  /** Refusals worded for the outcome on screen (the same object while they stay the same). */
  private _errorsKept = keptScreenErrors();

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
    this._updating = false;
    this._status = '';
    this._shareText = '';
  }

  static override styles = [baseStyles, checkScreenStyles];

  static busyAfterMs = 16; // a check still under way after a frame (ms) is marked as updating

  protected override willUpdate(changed: PropertyValues<this>): void {
    if (changed.has('settings')) this._display = DisplayUnits.fromSettings(this.settings);
    if (changed.has('tank')) this._minT = minTemperatureFor(this.tank.productId);
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

  protected override updated(changed: PropertyValues<this>): void {
    // The engine input behind the figures on screen, for end-to-end tests and for anyone who
    // wants to re-run `checkTank` on exactly what the screen used (SI, as JSON).
    if (!changed.has('_outcome') && !changed.has('_valid')) return;
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
    this._cancelChart();
    clearTimeout(this._busyTimer);
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

  /** The current result. */
  get outcome(): CheckOutcome | null {
    return this._outcome;
  }

  private _recompute(): void {
    const seq = ++this._seq;
    clearTimeout(this._busyTimer);
    // A reading still missing needs no engine: say so at once, on this thread.
    const got = buildCheckInput(this.tank, this._readings, this.settings, this.siteRules).input
      ? requestCheck(this.tank, this._readings, this.settings, this.siteRules)
      : runCheck(this.tank, this._readings, this.settings, this.siteRules);
    if (!(got instanceof Promise)) {
      this._pending = null;
      this._show(got);
      return;
    }
    this._pending = got.then((o) => {
      if (seq !== this._seq) return; // overtaken by a newer edit: dropped
      this._pending = null;
      if (o) this._show(o);
    });
    // Marked as updating only when the answer takes longer than a frame.
    this._busyTimer = setTimeout(() => {
      if (seq === this._seq && this._pending) this._updating = true;
    }, CheckScreen.busyAfterMs);
  }

  /** Puts a check's outcome on screen and asks for its heating chart a moment later. */
  private _show(outcome: CheckOutcome): void {
    clearTimeout(this._busyTimer);
    this._updating = false;
    this._outcome = outcome;
    this._cancelChart();
    this._cancelChart = chartLater(this.tank.productId, outcome, (c) => (this._curve = c));
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
    // Saved with the figures of the readings on screen: wait for a check under way.
    const pending = this._pending;
    if (pending) {
      void pending.then(() => this._save());
      return;
    }
    const o = this._outcome;
    if (!o?.result || !this._valid) return;
    const check = checkRecordOf(this.tank, this._readings, o.result, this._display);
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
    if (this._pending) await this._pending;
    const o = this._outcome;
    if (!o?.result) return;
    const text = summaryText(this.tank, this._readings, o.result, this._display);
    this._shareText = '';
    const done = await shareText(`Tank check — ${this.tank.name}`, text);
    if (done === null) return; // the user closed the share sheet
    this._status = done.status;
    this._shareText = done.byHand ? text : '';
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
    this._readings = next;
    this.readings = next;
    this.dispatchEvent(
      new CustomEvent<ReadingsChange>('readings-change', {
        detail: { readings: next, valid: true },
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
    return this._errorsKept(this._outcome, this._valid, this._display);
  }

  /** "2 Dec 2026, 14:05, 4 days old" when the readings in use are old, else empty. */
  private _staleText(): string {
    const at = this._readings.takenAt;
    if (at === undefined || !hasMeasured(this._readings) || !isOld(at, new Date())) return '';
    return `${whenText(at)}, ${ageText(at)} old`;
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
        ${guard([t, d, printedText()], () => headPart(t, d, () => this._editTank()))}
        ${barPart({ result, display: d, outcome: o, error, stale, updating: this._updating })}
        <last-check .last=${last} .display=${d} @readings-reuse=${this._reuse}></last-check>
        ${stalePart(stale)}
        <div class="layout">
          <check-form
            .readings=${this.readings}
            .display=${d}
            .minTemperature=${this._minT}
            .hasShape=${np.shape !== undefined}
            .fieldErrors=${fieldErrors}
            @readings-change=${this._onReadings}
          ></check-form>
          <div aria-busy=${this._updating ? 'true' : 'false'}>
            <check-results
              .result=${result}
              .display=${d}
              .missing=${o?.missing ?? []}
              .error=${error}
              .thermometerTolerance=${this.settings.thermometerTolerance}
              ?peak-estimated=${o?.peakEstimated ?? false}
            ></check-results>
            ${this._actions(result)}
            ${result && this._curve ? chartPart(t, d, this._curve) : nothing}
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
    const o = result && !this._pending ? this._outcome : null;
    return actionsPart({
      ready: result !== null,
      fillStart: fillStartButton(this, this.tank.id, o, this.settings),
      save: () => this._save(),
      share: () => void this._share(),
      print: () => window.print(),
      clear: () => this._clearReadings(),
      status: this._status,
      shareText: this._shareText,
    });
  }
}

customElements.define('check-screen', CheckScreen);

declare global {
  interface HTMLElementTagNameMap {
    'check-screen': CheckScreen;
  }
}
