/**
 * Settings: display units per quantity (gauge or absolute always spelled out), the site's
 * barometric pressure or elevation, instrument tolerances, the default sun allowance (a rule of
 * thumb) and the outdoor theme. Every change applies at once.
 *
 * @fires settings-change - `CustomEvent<{ settings: Settings }>` on every valid change.
 *
 * data-testid: `unit-pressure`, `unit-temperature`, `unit-volume`, `unit-mass`, `unit-length`,
 * `baro-mode-standard`, `baro-mode-pressure`, `baro-mode-elevation`, `baro-pressure`,
 * `elevation`, `gauge-accuracy`, `gauge-full-scale`, `thermometer-tolerance`,
 * `default-sun-allowance`, `theme-outdoor`, `number-format`; the fills' fieldset
 * (fill-settings.ts): `fill-gauge-points`, `fill-meter-percent`, `fill-meter-compensated-default`.
 */
import { LitElement, html, css, nothing } from 'lit';
import { baseStyles } from './styles.js';
import { DisplayUnits } from './display.js';
import './number-field.js';
import type { NumberFieldChange } from './number-field.js';
import { fillSettingsFieldset } from './fill-settings.js';
import { unitLabel } from '../thermo/units.js';
import { DEFAULT_SETTINGS, type BarometerMode, type Settings, type UnitPrefs } from './types.js';
import {
  NUMBER_FORMAT_LABELS,
  formatDigits,
  resolveNumberFormat,
  type NumberFormatId,
} from './number-parse.js';

export interface SettingsChange {
  settings: Settings;
}

/** Ranges of the settings, SI. */
export const SETTING_RANGES = {
  baroPressure: { min: 20_000, max: 120_000 },
  elevation: { min: -500, max: 11_000 },
  /** Fraction of full scale. */
  gaugeAccuracy: { min: 0, max: 0.2 },
  gaugeFullScale: { min: 1e4, max: 1e8 },
  thermometerTolerance: { min: 0, max: 10 },
  sunAllowance: { min: 0, max: 40 },
  /** Days after which readings no longer count on the site board. */
  staleReadingDays: { min: 1, max: 365 },
} as const;

type UnitChoice<K extends keyof UnitPrefs> = {
  key: K;
  label: string;
  quantity: Parameters<typeof unitLabel>[0];
  options: UnitPrefs[K][];
};

const UNIT_CHOICES: [
  UnitChoice<'pressure'>,
  UnitChoice<'temperature'>,
  UnitChoice<'volume'>,
  UnitChoice<'mass'>,
  UnitChoice<'length'>,
] = [
  {
    key: 'pressure',
    label: 'Pressure (gauge)',
    quantity: 'gaugePressure',
    options: ['psig', 'barg', 'kPag'],
  },
  { key: 'temperature', label: 'Temperature', quantity: 'temperature', options: ['F', 'C'] },
  { key: 'volume', label: 'Volume', quantity: 'volume', options: ['usgal', 'L', 'm3'] },
  { key: 'mass', label: 'Mass', quantity: 'mass', options: ['lb', 'kg'] },
  { key: 'length', label: 'Level and dimensions', quantity: 'length', options: ['in', 'cm'] },
];

export class SettingsForm extends LitElement {
  static override properties = {
    settings: { attribute: false },
  };

  /** The current settings. */
  declare settings: Settings;

  constructor() {
    super();
    this.settings = DEFAULT_SETTINGS;
  }

  static override styles = [
    baseStyles,
    css`
      .field {
        margin-bottom: 0.75rem;
      }
      .field label {
        display: block;
        margin-bottom: 0.2rem;
      }
      .choice {
        display: flex;
        align-items: center;
        gap: 0.6rem;
        min-height: 48px;
        font-weight: 600;
      }
      .choice input {
        width: 26px;
        height: 26px;
        min-height: 26px;
        flex: none;
      }
      .note {
        font-size: 0.92em;
      }
      .units {
        display: grid;
        grid-template-columns: repeat(auto-fit, minmax(9rem, 1fr));
        gap: 0 0.75rem;
      }
    `,
  ];

  private _emit(settings: Settings): void {
    this.settings = settings;
    this.dispatchEvent(
      new CustomEvent<SettingsChange>('settings-change', {
        detail: { settings },
        bubbles: true,
        composed: true,
      }),
    );
  }

  private _unit<K extends keyof UnitPrefs>(key: K, value: UnitPrefs[K]): void {
    this._emit({ ...this.settings, units: { ...this.settings.units, [key]: value } });
  }

  private _num(apply: (s: Settings, v: number | null) => Settings | null) {
    return (e: CustomEvent<NumberFieldChange>) => {
      e.stopPropagation();
      if (!e.detail.valid) return;
      const next = apply(this.settings, e.detail.value);
      if (next) this._emit(next);
    };
  }

  private _baroMode(mode: BarometerMode): void {
    this._emit({ ...this.settings, barometer: { ...this.settings.barometer, mode } });
  }

  override render() {
    const s = this.settings;
    const d = DisplayUnits.fromSettings(s);
    // Elevations in feet or metres, following the length choice.
    const elevationUnits = new DisplayUnits(
      { ...s.units, length: s.units.length === 'in' ? 'ft' : 'm' },
      d.barometricPressure,
    );
    const b = s.barometer;
    return html`
      <h2>Settings</h2>
      <fieldset>
        <legend>Units</legend>
        <div class="units">
          ${UNIT_CHOICES.map(
            (c) =>
              html`<div class="field">
                <label for="u-${c.key}">${c.label}</label>
                <select
                  id="u-${c.key}"
                  data-testid="unit-${c.key}"
                  @change=${(e: Event) => this._unit(c.key, (e.target as HTMLSelectElement).value as never)}
                >
                  ${(c.options as string[]).map(
                    (o) =>
                      html`<option value=${o} ?selected=${s.units[c.key] === o}>
                        ${unitLabel(c.quantity, o as never)}
                      </option>`,
                  )}
                </select>
              </div>`,
          )}
        </div>
        <div class="field">
          <label for="u-number-format">Number format</label>
          <select
            id="u-number-format"
            data-testid="number-format"
            aria-describedby="number-format-note"
            @change=${(e: Event) => this._emit({ ...s, numberFormat: (e.target as HTMLSelectElement).value as NumberFormatId })}
          >
            ${(Object.keys(NUMBER_FORMAT_LABELS) as NumberFormatId[]).map(
              (id) =>
                html`<option value=${id} ?selected=${(s.numberFormat ?? 'auto') === id}>
                  ${NUMBER_FORMAT_LABELS[id]}
                </option>`,
            )}
          </select>
          <p class="note" id="number-format-note">
            Type numbers as ${formatDigits('12345.6', resolveNumberFormat(s.numberFormat))}: the
            decimal mark is never taken for a thousands separator, and an entry that could be read
            both ways is refused.
          </p>
        </div>
        <p class="note">
          Pressures are gauge (${d.label('gaugePressure')}: above the site’s barometric pressure)
          unless marked absolute (${d.label('pressure')}). Differences such as headroom are in
          ${d.label('pressureDifference')}.
        </p>
      </fieldset>

      <fieldset>
        <legend>Site barometric pressure</legend>
        <p class="note">
          Used between gauge and absolute pressure. At altitude a gauge reads higher for the same
          tank.
        </p>
        ${(
          [
            ['standard', 'Standard atmosphere (sea level)'],
            ['pressure', 'A barometer reading'],
            ['elevation', 'From the site elevation'],
          ] as [BarometerMode, string][]
        ).map(
          ([m, text]) =>
            html`<label class="choice">
              <input
                type="radio"
                name="baro"
                data-testid="baro-mode-${m}"
                .checked=${b.mode === m}
                @change=${() => this._baroMode(m)}
              />
              ${text}
            </label>`,
        )}
        ${
          b.mode === 'pressure'
            ? html`<number-field
                label="Barometric pressure"
                name="baroPressure"
                quantity="pressure"
                testid="baro-pressure"
                required
                .display=${new DisplayUnits(s.units)}
                .value=${b.pressure}
                .min=${SETTING_RANGES.baroPressure.min}
                .max=${SETTING_RANGES.baroPressure.max}
                @value-change=${this._num((st, v) => (v === null ? null : { ...st, barometer: { ...st.barometer, pressure: v } }))}
              ></number-field>`
            : nothing
        }
        ${
          b.mode === 'elevation'
            ? html`<number-field
                label="Site elevation"
                name="elevation"
                quantity="length"
                testid="elevation"
                required
                .display=${elevationUnits}
                .value=${b.elevation}
                .min=${SETTING_RANGES.elevation.min}
                .max=${SETTING_RANGES.elevation.max}
                @value-change=${this._num((st, v) => (v === null ? null : { ...st, barometer: { ...st.barometer, elevation: v } }))}
              ></number-field>`
            : nothing
        }
        <p class="note">In use: ${d.format('pressure', d.barometricPressure)}.</p>
      </fieldset>

      <fieldset>
        <legend>Instruments</legend>
        <number-field
          label="Pressure gauge accuracy (of full scale)"
          name="gaugeAccuracy"
          quantity="fraction"
          testid="gauge-accuracy"
          required
          .display=${d}
          .decimals=${2}
          .value=${s.gaugeAccuracy}
          .min=${SETTING_RANGES.gaugeAccuracy.min}
          .max=${SETTING_RANGES.gaugeAccuracy.max}
          @value-change=${this._num((st, v) => (v === null ? null : { ...st, gaugeAccuracy: v }))}
        ></number-field>
        <number-field
          label="Pressure gauge full scale"
          name="gaugeFullScale"
          quantity="gaugePressure"
          testid="gauge-full-scale"
          hint="Leave empty to take each tank’s design pressure"
          .display=${d}
          .value=${s.gaugeFullScale}
          .min=${SETTING_RANGES.gaugeFullScale.min}
          .max=${SETTING_RANGES.gaugeFullScale.max}
          @value-change=${this._num((st, v) => ({ ...st, gaugeFullScale: v }))}
        ></number-field>
        <number-field
          label="Thermometer tolerance (±)"
          name="thermometerTolerance"
          quantity="temperatureDifference"
          testid="thermometer-tolerance"
          required
          .display=${d}
          .value=${s.thermometerTolerance}
          .min=${SETTING_RANGES.thermometerTolerance.min}
          .max=${SETTING_RANGES.thermometerTolerance.max}
          @value-change=${this._num((st, v) => (v === null ? null : { ...st, thermometerTolerance: v }))}
        ></number-field>
      </fieldset>

      ${fillSettingsFieldset(s, d, (next) => this._emit(next))}

      <fieldset>
        <legend>Forecast</legend>
        <number-field
          label="Default sun allowance (rule of thumb)"
          name="sunAllowance"
          quantity="temperatureDifference"
          testid="default-sun-allowance"
          required
          hint=${`Added to the forecast peak air temperature for the liquid. A common rule of thumb for an unshaded, uninsulated tank (about ${d.format('temperatureDifference', DEFAULT_SETTINGS.sunAllowance)}), not a rule from any code: follow site procedures.`}
          .display=${d}
          .value=${s.sunAllowance}
          .min=${SETTING_RANGES.sunAllowance.min}
          .max=${SETTING_RANGES.sunAllowance.max}
          @value-change=${this._num((st, v) => (v === null ? null : { ...st, sunAllowance: v }))}
        ></number-field>
        <number-field
          label="Days readings count on the site board"
          name="staleReadingDays"
          testid="stale-reading-days"
          required
          hint="Older readings are listed as needing a reading, never projected"
          .decimals=${0}
          .display=${d}
          .value=${s.staleReadingDays}
          .min=${SETTING_RANGES.staleReadingDays.min}
          .max=${SETTING_RANGES.staleReadingDays.max}
          @value-change=${this._num((st, v) => (v === null ? null : { ...st, staleReadingDays: v }))}
        ></number-field>
      </fieldset>

      <fieldset>
        <legend>Screen</legend>
        <label class="choice">
          <input
            type="checkbox"
            data-testid="theme-outdoor"
            .checked=${s.theme === 'outdoor'}
            @change=${(e: Event) => this._emit({ ...s, theme: (e.target as HTMLInputElement).checked ? 'outdoor' : 'standard' })}
          />
          Outdoor theme: highest contrast and larger text for sunlight
        </label>
      </fieldset>
    `;
  }
}

customElements.define('settings-form', SettingsForm);

declare global {
  interface HTMLElementTagNameMap {
    'settings-form': SettingsForm;
  }
}
