/**
 * A fill of one tank: the before-readings kept when the fill was started from the tank's check,
 * the metered delivery and the readings after it, and the reconciliation of the after-gauge
 * with the meter, live on every valid edit. The standing caution stays on screen.
 *
 * @fires fill-draft-change - `CustomEvent<{ draft: FillDraft }>` on every edit (the shell keeps it).
 * @fires fill-save - `CustomEvent<{ record: FillRecord }>`
 * @fires fill-discard - `CustomEvent<{ tankId: string }>`
 *
 * data-testid: `fill-screen`, `fill-before`, `fill-delivered-volume`, `fill-meter-compensated`,
 * `fill-meter-temperature`, `fill-interrupted`, `fill-after-gauge`, `fill-after-temperature`,
 * `fill-after-pressure`, `fill-refusal-<field>`, `fill-missing`, `fill-verdict` (with
 * `data-verdict` and `data-expected-percent`), `fill-note`, `fill-save`, `fill-discard`,
 * `fill-standing`, and those of <fill-history>.
 */
import { LitElement, html, css, nothing, type PropertyValues } from 'lit';
import { baseStyles, levelStyles } from './styles.js';
import { DisplayUnits } from './display.js';
import './number-field.js';
import './fill-history.js';
import type { NumberFieldChange } from './number-field.js';
import { runFill, type FillField, type FillOutcome } from './fill-run.js';
import { renderBefore, renderVerdict } from './fill-view.js';
import { T_RANGE_K } from './check-input.js';
import { blankTank } from './blank-tank.js';
import { DEFAULT_SETTINGS, newId, type Settings, type TankRecord } from './types.js';
import type { FillDraft, FillRecord } from './fill-types.js';
import { makeFillRecord } from '../thermo/fill/index.js';
import { STANDING_CAUTION } from '../thermo/check/standing.js';

type NumKey =
  'volume' | 'meterTemperature' | 'afterGauge' | 'afterTemperature' | 'afterPressureGauge';

export class FillScreen extends LitElement {
  static override properties = {
    tank: { attribute: false },
    settings: { attribute: false },
    draft: { attribute: false },
    fills: { attribute: false },
    _draft: { state: true },
    _outcome: { state: true },
    _invalid: { state: true },
    _status: { state: true },
  };

  declare tank: TankRecord;
  declare settings: Settings;
  /** The fill under way (from the store), or null when none was started. */
  declare draft: FillDraft | null;
  /** Saved fills of this tank. */
  declare fills: FillRecord[];
  declare _draft: FillDraft | null;
  declare _outcome: FillOutcome | null;
  declare _invalid: ReadonlySet<NumKey>;
  declare _status: string;
  private _display = DisplayUnits.fromSettings(DEFAULT_SETTINGS);

  constructor() {
    super();
    this.tank = blankTank('none');
    this.settings = DEFAULT_SETTINGS;
    this.draft = null;
    this.fills = [];
    this._draft = null;
    this._outcome = null;
    this._invalid = new Set();
    this._status = '';
  }

  static override styles = [
    baseStyles,
    levelStyles,
    css`
      h2 {
        overflow-wrap: anywhere;
      }
      .box {
        border: var(--border-width) solid var(--line);
        border-radius: 0.5rem;
        padding: 0.6rem;
        margin: 0.75rem 0;
        background: var(--paper);
      }
      .verdict h3 {
        margin-top: 0;
      }
      .verdict.danger,
      .verdict.warning {
        border-width: 4px;
        border-color: var(--danger);
      }
      dl {
        display: grid;
        grid-template-columns: minmax(0, 1fr) auto;
        gap: 0.15rem 0.75rem;
        margin: 0.5rem 0 0;
      }
      dd {
        margin: 0;
        text-align: right;
        font-weight: 700;
      }
      .choice {
        display: flex;
        gap: 0.5rem;
        align-items: center;
        min-height: 48px;
      }
      .choice input {
        width: 1.5rem;
        height: 1.5rem;
      }
      .actions {
        display: flex;
        flex-wrap: wrap;
        gap: 0.5rem;
        margin: 0.75rem 0;
      }
      .actions button {
        flex: 1 1 8rem;
      }
      .status {
        min-height: 1.5em;
        font-weight: 700;
      }
      .standing {
        font-size: 0.9em;
      }
    `,
  ];

  protected override willUpdate(changed: PropertyValues<this>): void {
    if (changed.has('settings')) this._display = DisplayUnits.fromSettings(this.settings);
    if (changed.has('draft')) this._draft = this.draft;
    if (changed.has('draft') || changed.has('settings')) this._recompute();
  }

  private _recompute(): void {
    this._outcome = this._draft ? runFill(this._draft, this.settings, this._display) : null;
  }

  private _edit(patch: Partial<FillDraft>): void {
    if (!this._draft) return;
    this._draft = { ...this._draft, ...patch, updatedAt: new Date().toISOString() };
    this._status = '';
    this._recompute();
    this._fire('fill-draft-change', { draft: this._draft });
  }

  private _num(key: NumKey) {
    return (e: CustomEvent<NumberFieldChange>) => {
      const invalid = new Set(this._invalid);
      if (e.detail.valid) invalid.delete(key);
      else invalid.add(key);
      this._invalid = invalid;
      if (e.detail.valid) this._edit({ [key]: e.detail.value });
    };
  }

  private _fire(name: string, detail: unknown): void {
    this.dispatchEvent(new CustomEvent(name, { detail, bubbles: true, composed: true }));
  }

  private _save(): void {
    const o = this._outcome;
    if (!this._draft || !o?.input || !o.result || this._invalid.size > 0) return;
    const record = makeFillRecord({
      id: newId(),
      tankId: this.tank.id,
      input: o.input,
      note: this._draft.note,
    });
    this._fire('fill-save', { record });
    this._status = 'Fill saved to this tank’s history.';
  }

  private _refusal(field: FillField) {
    const r = this._outcome?.refusal;
    return r && r.field === field
      ? html`<p class="error" role="alert" data-testid="fill-refusal-${field}">${r.message}</p>`
      : nothing;
  }

  override render() {
    const d = this._display;
    const f = this._draft;
    const standing = html`<p class="box standing" data-testid="fill-standing">
      ${STANDING_CAUTION}
    </p>`;
    if (!f)
      return html`<div data-testid="fill-screen">
        <h2>Fill — ${this.tank.name}</h2>
        <p>
          No fill is under way for this tank. Start one from the tank’s check, with the readings
          taken before the delivery.
        </p>
        <p>
          <a class="button" href="#/tank/${encodeURIComponent(this.tank.id)}">Go to the check</a>
        </p>
        <h3>Saved fills</h3>
        <fill-history .fills=${this.fills} .display=${d}></fill-history>
        ${standing}
      </div>`;
    return html`<div data-testid="fill-screen">
      <h2>Fill — ${this.tank.name}${this.tank.demo ? ' (demo, invented)' : ''}</h2>
      ${renderBefore(f, d)} ${this._renderDelivery(f, d)} ${this._renderAfter(f, d)}
      ${
        this._outcome?.refusal && !this._outcome.refusal.field
          ? html`<p class="error" role="alert" data-testid="fill-refusal-other">
              ${this._outcome.refusal.message}
            </p>`
          : nothing
      }
      ${renderVerdict(this._outcome, d, this._invalid.size > 0)}
      <label for="fill-note">Note (ticket number, what was verified…)</label>
      <textarea
        id="fill-note"
        data-testid="fill-note"
        maxlength="2000"
        .value=${f.note}
        @input=${(e: Event) => this._edit({ note: (e.target as HTMLTextAreaElement).value })}
      ></textarea>
      <div class="actions">
        <button
          class="primary"
          data-testid="fill-save"
          ?disabled=${!this._outcome?.result || this._invalid.size > 0}
          @click=${this._save}
        >
          Save fill
        </button>
        <button
          class="quiet"
          data-testid="fill-discard"
          @click=${() => this._fire('fill-discard', { tankId: this.tank.id })}
        >
          Discard this fill
        </button>
      </div>
      <p class="status" role="status" data-testid="fill-status">${this._status}</p>
      ${standing}
      <h3>Saved fills</h3>
      <fill-history .fills=${this.fills} .display=${d}></fill-history>
    </div>`;
  }

  private _renderDelivery(f: FillDraft, d: DisplayUnits) {
    const base = d.units.temperature === 'F' ? '60 °F' : '15 °C';
    return html`<fieldset>
      <legend>Delivery</legend>
      <number-field
        label="Metered volume (as the meter reads it)"
        name="volume"
        quantity="volume"
        testid="fill-delivered-volume"
        required
        .display=${d}
        .value=${f.volume}
        .min=${0}
        .max=${1e5}
        @value-change=${this._num('volume')}
      ></number-field>
      ${this._refusal('volume')}
      <label class="choice">
        <input
          type="checkbox"
          data-testid="fill-meter-compensated"
          .checked=${f.compensated}
          @change=${(e: Event) =>
            this._edit({ compensated: (e.target as HTMLInputElement).checked })}
        />
        The meter reads temperature-compensated (to ${base})
      </label>
      ${this._refusal('compensated')}
      ${
        f.compensated
          ? nothing
          : html`<number-field
                label="Product temperature at the meter"
                name="meterTemperature"
                quantity="temperature"
                testid="fill-meter-temperature"
                hint="Leave empty to take the liquid temperature after the delivery"
                .display=${d}
                .value=${f.meterTemperature}
                .min=${T_RANGE_K.min}
                .max=${T_RANGE_K.max}
                @value-change=${this._num('meterTemperature')}
              ></number-field>
              ${this._refusal('meterTemperature')}`
      }
      <label class="choice">
        <input
          type="checkbox"
          data-testid="fill-interrupted"
          .checked=${f.interrupted}
          @change=${(e: Event) =>
            this._edit({ interrupted: (e.target as HTMLInputElement).checked })}
        />
        The delivery was stopped before the intended amount
      </label>
    </fieldset>`;
  }

  private _renderAfter(f: FillDraft, d: DisplayUnits) {
    return html`<fieldset>
      <legend>After the delivery</legend>
      <number-field
        label="Float gauge after"
        name="afterGauge"
        unit-text="%"
        testid="fill-after-gauge"
        required
        .display=${d}
        .value=${f.afterGauge}
        .min=${0}
        .max=${100}
        @value-change=${this._num('afterGauge')}
      ></number-field>
      ${this._refusal('afterGauge')}
      <number-field
        label="Liquid temperature after (optional)"
        name="afterTemperature"
        quantity="temperature"
        testid="fill-after-temperature"
        hint=${`Leave empty to take the temperature before: ${d.format('temperature', f.start.before.liquidTemperature)}`}
        .display=${d}
        .value=${f.afterTemperature}
        .min=${T_RANGE_K.min}
        .max=${T_RANGE_K.max}
        @value-change=${this._num('afterTemperature')}
      ></number-field>
      ${this._refusal('afterTemperature')}
      <number-field
        label="Pressure gauge after (optional)"
        name="afterPressureGauge"
        quantity="gaugePressure"
        testid="fill-after-pressure"
        hint="Compares the pressure with the product on record"
        .display=${d}
        .value=${f.afterPressureGauge}
        .min=${-120_000}
        .max=${1e8}
        @value-change=${this._num('afterPressureGauge')}
      ></number-field>
      ${this._refusal('afterPressureGauge')}
    </fieldset>`;
  }
}

customElements.define('fill-screen', FillScreen);

declare global {
  interface HTMLElementTagNameMap {
    'fill-screen': FillScreen;
  }
}
