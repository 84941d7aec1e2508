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
import { LitElement, html, css } from 'lit';
import { baseStyles } from './styles.js';
import { DisplayUnits } from './display.js';
import './number-field.js';
import type { NumberFieldChange } from './number-field.js';
import { fillSettingsFieldset } from './fill-settings.js';
import { DEFAULT_SETTINGS, type BarometerMode, type Settings, type UnitPrefs } from './types.js';
import {
  barometerFieldset,
  forecastFieldset,
  instrumentsFieldset,
  screenFieldset,
  unitsFieldset,
  type SettingsView,
} from './settings-fields.js';

export interface SettingsChange {
  settings: Settings;
}

export { SETTING_RANGES } from './setting-ranges.js';

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

  /** The form's settings and actions for the templates of settings-fields.ts. */
  private _view(): SettingsView {
    return {
      settings: this.settings,
      emit: (next) => this._emit(next),
      unit: (key, value) => this._unit(key, value),
      num: (apply) => this._num(apply),
      baroMode: (mode) => this._baroMode(mode),
    };
  }

  override render() {
    const s = this.settings;
    const d = DisplayUnits.fromSettings(s);
    const v = this._view();
    return html`
      <h2>Settings</h2>
      ${unitsFieldset(v)} ${barometerFieldset(v)} ${instrumentsFieldset(v)}
      ${fillSettingsFieldset(s, d, (next) => this._emit(next))} ${forecastFieldset(v)}
      ${screenFieldset(v)}
    `;
  }
}

customElements.define('settings-form', SettingsForm);

declare global {
  interface HTMLElementTagNameMap {
    'settings-form': SettingsForm;
  }
}
