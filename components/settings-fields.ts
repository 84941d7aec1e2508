/**
 * The fieldsets of `<settings-form>` as templates over its settings: units, barometric pressure,
 * instruments, forecast and screen. They render inside the form's shadow root, so ids, labels
 * and data-testids are the form's own.
 */
import { html, nothing, type TemplateResult } from 'lit';
import { DisplayUnits } from './display.js';
import type { NumberFieldChange } from './number-field.js';
import { unitLabel } from '../thermo/units.js';
import { DEFAULT_SETTINGS, type BarometerMode, type Settings, type UnitPrefs } from './types.js';
import {
  NUMBER_FORMAT_LABELS,
  formatDigits,
  resolveNumberFormat,
  type NumberFormatId,
} from './number-parse.js';
import { SETTING_RANGES } from './setting-ranges.js';

/** What the templates read from and call on the form. */
export interface SettingsView {
  settings: Settings;
  /** Applies and announces new settings. */
  emit(next: Settings): void;
  unit<K extends keyof UnitPrefs>(key: K, value: UnitPrefs[K]): void;
  /** A `value-change` handler that applies a valid value through `apply` (null: no change). */
  num(
    apply: (s: Settings, v: number | null) => Settings | null,
  ): (e: CustomEvent<NumberFieldChange>) => void;
  baroMode(mode: BarometerMode): void;
}

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

/** Display units per quantity and the number format. */
export function unitsFieldset(v: SettingsView): TemplateResult {
  const s = v.settings;
  const d = DisplayUnits.fromSettings(s);
  return html`
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
                @change=${(e: Event) => v.unit(c.key, (e.target as HTMLSelectElement).value as never)}
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
          @change=${(e: Event) => v.emit({ ...s, numberFormat: (e.target as HTMLSelectElement).value as NumberFormatId })}
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
  `;
}

/** The site barometric pressure: standard, a reading or from the elevation. */
export function barometerFieldset(v: SettingsView): TemplateResult {
  const s = v.settings;
  const d = DisplayUnits.fromSettings(s);
  // Elevations in feet or metres, following the length choice.
  const elevationUnits = new DisplayUnits(
    { ...s.units, length: s.units.length === 'in' ? 'ft' : 'm' },
    d.barometricPressureAbs,
  );
  const b = s.barometer;
  return html`
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
              @change=${() => v.baroMode(m)}
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
              .value=${b.pressureAbs}
              .min=${SETTING_RANGES.baroPressure.min}
              .max=${SETTING_RANGES.baroPressure.max}
              @value-change=${v.num((st, v) => (v === null ? null : { ...st, barometer: { ...st.barometer, pressureAbs: v } }))}
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
              @value-change=${v.num((st, v) => (v === null ? null : { ...st, barometer: { ...st.barometer, elevation: v } }))}
            ></number-field>`
          : nothing
      }
      <p class="note">In use: ${d.format('pressure', d.barometricPressureAbs)}.</p>
    </fieldset>
  `;
}

/** Instrument tolerances. */
export function instrumentsFieldset(v: SettingsView): TemplateResult {
  const s = v.settings;
  const d = DisplayUnits.fromSettings(s);
  return html`
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
        @value-change=${v.num((st, v) => (v === null ? null : { ...st, gaugeAccuracy: v }))}
      ></number-field>
      <number-field
        label="Pressure gauge full scale"
        name="gaugeFullScaleGauge"
        quantity="gaugePressure"
        testid="gauge-full-scale"
        hint="Leave empty to take each tank’s design pressure"
        .display=${d}
        .value=${s.gaugeFullScaleGauge}
        .min=${SETTING_RANGES.gaugeFullScaleGauge.min}
        .max=${SETTING_RANGES.gaugeFullScaleGauge.max}
        @value-change=${v.num((st, v) => ({ ...st, gaugeFullScaleGauge: v }))}
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
        @value-change=${v.num((st, v) => (v === null ? null : { ...st, thermometerTolerance: v }))}
      ></number-field>
    </fieldset>
  `;
}

/** The default sun allowance and how long readings count. */
export function forecastFieldset(v: SettingsView): TemplateResult {
  const s = v.settings;
  const d = DisplayUnits.fromSettings(s);
  return html`
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
        @value-change=${v.num((st, v) => (v === null ? null : { ...st, sunAllowance: v }))}
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
        @value-change=${v.num((st, v) => (v === null ? null : { ...st, staleReadingDays: v }))}
      ></number-field>
    </fieldset>
  `;
}

/** The outdoor theme. */
export function screenFieldset(v: SettingsView): TemplateResult {
  const s = v.settings;
  return html`
    <fieldset>
      <legend>Screen</legend>
      <label class="choice">
        <input
          type="checkbox"
          data-testid="theme-outdoor"
          .checked=${s.theme === 'outdoor'}
          @change=${(e: Event) => v.emit({ ...s, theme: (e.target as HTMLInputElement).checked ? 'outdoor' : 'standard' })}
        />
        Outdoor theme: highest contrast and larger text for sunlight
      </label>
    </fieldset>
  `;
}
