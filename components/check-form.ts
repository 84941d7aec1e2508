/**
 * The readings of a check: liquid temperature, one contents reading (float gauge, level height
 * or scale mass), an optional pressure-gauge reading, and the forecast (peak air temperature
 * plus a sun allowance, which is a rule of thumb). SI in and out.
 *
 * @fires readings-change - `CustomEvent<{ readings: Readings; valid: boolean }>` on every edit;
 *   `readings` keeps the last valid value of a field whose text is bad, and `valid` says so.
 *
 * data-testid: `liquid-temperature`, `contents-mode-gaugePercent`, `contents-mode-levelHeight`,
 * `contents-mode-netMass`, `gauge-percent`, `level-height`, `net-mass`, `gauge-pressure`,
 * `peak-air-temperature`, `sun-allowance`, `peak-liquid-temperature`.
 */
import { LitElement, html, css, nothing, type PropertyValues } from 'lit';
import { baseStyles } from './styles.js';
import { DisplayUnits } from './display.js';
import './number-field.js';
import type { NumberFieldChange } from './number-field.js';
import { T_RANGE_K } from './check-input.js';
import { PLAUSIBLE_LIQUID_TEMPERATURE } from './plausible.js';
import { DEFAULT_SETTINGS, emptyReadings, type ContentsMode, type Readings } from './types.js';

export interface ReadingsChange {
  readings: Readings;
  valid: boolean;
}

/** Ranges of the readings, SI (those of thermo/check/validate.ts, except the sun allowance). */
export const READING_RANGES = {
  gaugePercent: { min: 0, max: 100 },
  netMass: { min: 0, max: 1e8 },
  levelHeight: { min: 0, max: 1e3 },
  pressureReadingGaugeMax: 1e8,
  /** A sun allowance beyond 40 K (72 °F) is not a forecast any more. */
  sunAllowance: { min: 0, max: 40 },
} as const;

const MODES: { mode: ContentsMode; text: string }[] = [
  { mode: 'gaugePercent', text: 'Float gauge' },
  { mode: 'levelHeight', text: 'Level height' },
  { mode: 'netMass', text: 'Scale' },
];

export class CheckForm extends LitElement {
  static override properties = {
    readings: { attribute: false },
    display: { attribute: false },
    minTemperature: { type: Number, attribute: 'min-temperature' },
    hasShape: { type: Boolean, attribute: 'has-shape' },
    fieldErrors: { attribute: false },
    _readings: { state: true },
  };

  /** The readings to show (SI). */
  declare readings: Readings;
  /** The user's display units. */
  declare display: DisplayUnits;
  /** Lowest liquid temperature the check takes for this product, K. */
  declare minTemperature: number;
  /** The tank has a shape, so a level height can be used. */
  declare hasShape: boolean;
  /** Messages from the check engine, keyed by reading name (`liquidTemperature`, `netMass`…). */
  declare fieldErrors: Partial<Record<keyof Readings | 'peakTemperature', string>>;
  declare _readings: Readings;

  private _bad = new Set<string>();

  constructor() {
    super();
    this.readings = emptyReadings(DEFAULT_SETTINGS.sunAllowance);
    this.display = DisplayUnits.fromSettings(DEFAULT_SETTINGS);
    this.minTemperature = T_RANGE_K.min;
    this.hasShape = false;
    this.fieldErrors = {};
    this._readings = this.readings;
  }

  static override styles = [
    baseStyles,
    css`
      .modes {
        display: grid;
        grid-template-columns: repeat(3, minmax(0, 1fr));
        gap: 0.35rem;
        margin-bottom: 0.75rem;
      }
      .modes label {
        position: relative;
        display: flex;
        align-items: center;
        justify-content: center;
        text-align: center;
        min-height: 48px;
        padding: 0.25rem;
        border: var(--border-width) solid var(--ink);
        border-radius: 0.4rem;
        cursor: pointer;
        background: var(--paper);
      }
      .modes input {
        position: absolute;
        opacity: 0;
        inset: 0;
        width: 100%;
        height: 100%;
        margin: 0;
        cursor: pointer;
      }
      .modes label:has(input:checked) {
        background: var(--ink);
        color: var(--paper);
      }
      .modes label:has(input:focus-visible) {
        outline: 3px solid var(--focus);
        outline-offset: 2px;
      }
      .modes label:has(input:disabled) {
        opacity: 0.5;
        cursor: not-allowed;
      }
      .peak {
        font-weight: 700;
        margin: 0;
      }
      .note {
        font-size: 0.92em;
      }
    `,
  ];

  protected override willUpdate(changed: PropertyValues<this>): void {
    if (changed.has('readings')) {
      this._readings = this.readings;
      this._bad = new Set();
    }
  }

  private _emit(): void {
    this.dispatchEvent(
      new CustomEvent<ReadingsChange>('readings-change', {
        detail: { readings: this._readings, valid: this._bad.size === 0 },
        bubbles: true,
        composed: true,
      }),
    );
  }

  private _field(key: keyof Readings) {
    return (e: CustomEvent<NumberFieldChange>) => {
      e.stopPropagation();
      if (e.detail.valid) {
        this._bad.delete(key);
        this._readings = { ...this._readings, [key]: e.detail.value };
      } else this._bad.add(key);
      this._emit();
    };
  }

  private _mode(mode: ContentsMode): void {
    this._readings = { ...this._readings, contentsMode: mode };
    this._emit();
  }

  private _engineError(key: keyof Readings | 'peakTemperature') {
    const m = this.fieldErrors[key];
    return m
      ? html`<p class="error" role="alert" data-testid="engine-error-${key}">${m}</p>`
      : nothing;
  }

  /** The contents reading: its kind, then the one field of that kind. */
  private _contents(r: Readings) {
    const d = this.display;
    return html`
      <div role="radiogroup" aria-label="Contents reading" class="modes">
        ${MODES.map(
          (m) =>
            html`<label>
              <input
                type="radio"
                name="mode"
                value=${m.mode}
                data-testid="contents-mode-${m.mode}"
                .checked=${r.contentsMode === m.mode}
                ?disabled=${m.mode === 'levelHeight' && !this.hasShape}
                @change=${() => this._mode(m.mode)}
              />
              ${m.text}
            </label>`,
        )}
      </div>
      ${!this.hasShape ? html`<p class="muted note">A level height needs the tank’s shape (edit the tank to add it).</p>` : nothing}
      ${
        r.contentsMode === 'gaugePercent'
          ? html`<number-field
              label="Float gauge"
              name="gaugePercent"
              unit-text="%"
              required
              testid="gauge-percent"
              hint="Percent of the tank volume, as the dial reads"
              .decimals=${1}
              .value=${r.gaugePercent}
              .min=${READING_RANGES.gaugePercent.min}
              .max=${READING_RANGES.gaugePercent.max}
              @value-change=${this._field('gaugePercent')}
            ></number-field>`
          : nothing
      }
      ${
        r.contentsMode === 'levelHeight'
          ? html`<number-field
              label="Liquid level height"
              name="levelHeight"
              quantity="length"
              required
              testid="level-height"
              hint="Above the inside bottom of the tank"
              .display=${d}
              .value=${r.levelHeight}
              .min=${READING_RANGES.levelHeight.min}
              .max=${READING_RANGES.levelHeight.max}
              @value-change=${this._field('levelHeight')}
            ></number-field>`
          : nothing
      }
      ${
        r.contentsMode === 'netMass'
          ? html`<number-field
              label="Net product mass"
              name="netMass"
              quantity="mass"
              required
              testid="net-mass"
              hint="Scale reading less the tare"
              .display=${d}
              .value=${r.netMass}
              .min=${READING_RANGES.netMass.min}
              .max=${READING_RANGES.netMass.max}
              @value-change=${this._field('netMass')}
            ></number-field>`
          : nothing
      }
      ${this._engineError(r.contentsMode)}
    `;
  }

  /** The forecast: peak air temperature plus the sun allowance, and the liquid peak they make. */
  private _forecast(r: Readings) {
    const d = this.display;
    const peak =
      r.peakAirTemperature !== null ? r.peakAirTemperature + (r.sunAllowance ?? 0) : null;
    return html`
      <fieldset>
        <legend>Forecast</legend>
        <number-field
          label="Peak air temperature"
          name="peakAirTemperature"
          quantity="temperature"
          testid="peak-air-temperature"
          hint="The hottest forecast this week; leave empty to see today’s figures only"
          .display=${d}
          .value=${r.peakAirTemperature}
          .min=${T_RANGE_K.min}
          .max=${T_RANGE_K.max - READING_RANGES.sunAllowance.max}
          @value-change=${this._field('peakAirTemperature')}
        ></number-field>
        <number-field
          label="Sun allowance (rule of thumb)"
          name="sunAllowance"
          quantity="temperatureDifference"
          testid="sun-allowance"
          hint="Added to the air temperature for the liquid. A common rule of thumb for an unshaded, uninsulated tank, not a rule from a code: follow site procedures."
          .display=${d}
          .value=${r.sunAllowance}
          .min=${READING_RANGES.sunAllowance.min}
          .max=${READING_RANGES.sunAllowance.max}
          @value-change=${this._field('sunAllowance')}
        ></number-field>
        <p
          class="peak"
          data-testid="peak-liquid-temperature"
          data-si=${peak === null ? '' : String(peak)}
        >
          Peak liquid temperature used:
          ${peak === null ? 'today’s liquid temperature (no forecast entered)' : d.format('temperature', peak)}
        </p>
        ${this._engineError('peakTemperature')}
      </fieldset>
    `;
  }

  override render() {
    const r = this._readings;
    const d = this.display;
    const baro = d.barometricPressureAbs;
    return html`
      <fieldset>
        <legend>Readings now</legend>
        <number-field
          label="Liquid temperature"
          name="liquidTemperature"
          quantity="temperature"
          required
          testid="liquid-temperature"
          hint="Thermometer well or a probe on the shell below the liquid level"
          .display=${d}
          .value=${r.liquidTemperature}
          .min=${this.minTemperature}
          .max=${T_RANGE_K.max}
          .plausibleMin=${PLAUSIBLE_LIQUID_TEMPERATURE.min}
          .plausibleMax=${PLAUSIBLE_LIQUID_TEMPERATURE.max}
          plausible-what=${PLAUSIBLE_LIQUID_TEMPERATURE.what}
          @value-change=${this._field('liquidTemperature')}
        ></number-field>
        ${this._engineError('liquidTemperature')} ${this._contents(r)}

        <number-field
          label="Pressure gauge (optional)"
          name="pressureReadingGauge"
          quantity="gaugePressure"
          testid="gauge-pressure"
          hint="Leave empty if there is no gauge reading"
          .display=${d}
          .value=${r.pressureReadingGauge}
          .min=${-baro}
          .max=${READING_RANGES.pressureReadingGaugeMax}
          @value-change=${this._field('pressureReadingGauge')}
        ></number-field>
        ${this._engineError('pressureReadingGauge')}
      </fieldset>

      ${this._forecast(r)}
    `;
  }
}

customElements.define('check-form', CheckForm);

declare global {
  interface HTMLElementTagNameMap {
    'check-form': CheckForm;
  }
  interface HTMLElementEventMap {
    'readings-change': CustomEvent<ReadingsChange>;
  }
}
