/**
 * The Settings' fieldset for fills: the float gauge's and the delivery meter's accuracy (the
 * defaults marked as common practice) and whether the meter reads temperature-compensated.
 * A plain template function, used by settings-form.ts.
 *
 * data-testid: `fill-gauge-points`, `fill-meter-percent`, `fill-meter-compensated-default`.
 */
import { html, type TemplateResult } from 'lit';
import type { DisplayUnits } from './display.js';
import type { NumberFieldChange } from './number-field.js';
import { DEFAULT_SETTINGS, type Settings } from './types.js';
import { FILL_ACCURACY_LIMITS } from '../thermo/fill/defaults.js';

export function fillSettingsFieldset(
  s: Settings,
  d: DisplayUnits,
  emit: (next: Settings) => void,
): TemplateResult {
  const L = FILL_ACCURACY_LIMITS;
  const take = (f: (v: number) => Settings) => (e: CustomEvent<NumberFieldChange>) => {
    if (e.detail.valid && e.detail.value !== null) emit(f(e.detail.value));
  };
  const base = d.units.temperature === 'F' ? '60 °F' : '15 °C';
  return html`
    <fieldset>
      <legend>Fills</legend>
      <number-field
        label="Float gauge accuracy (± points per reading)"
        name="fillGaugePoints"
        unit-text="points"
        testid="fill-gauge-points"
        required
        hint=${`Common practice: ±${DEFAULT_SETTINGS.fillGaugePoints} points (a float dial is marked in 5 % steps). Use your gauge's own figure if you know it.`}
        .display=${d}
        .decimals=${1}
        .value=${s.fillGaugePoints}
        .min=${L.gaugePoints.min}
        .max=${L.gaugePoints.max}
        @value-change=${take((v) => ({ ...s, fillGaugePoints: v }))}
      ></number-field>
      <number-field
        label="Delivery meter accuracy (± % of the volume)"
        name="fillMeterPercent"
        unit-text="%"
        testid="fill-meter-percent"
        required
        hint=${`Common practice: ±${DEFAULT_SETTINGS.fillMeterFraction * 100} % in service. Use the figure of the meter's last proving if you have it.`}
        .display=${d}
        .decimals=${1}
        .value=${s.fillMeterFraction * 100}
        .min=${L.meterFraction.min * 100}
        .max=${L.meterFraction.max * 100}
        @value-change=${take((v) => ({ ...s, fillMeterFraction: v / 100 }))}
      ></number-field>
      <label class="choice">
        <input
          type="checkbox"
          data-testid="fill-meter-compensated-default"
          .checked=${s.fillMeterCompensated}
          @change=${(e: Event) =>
            emit({ ...s, fillMeterCompensated: (e.target as HTMLInputElement).checked })}
        />
        Delivery meters read temperature-compensated (to ${base}) unless a fill says otherwise
      </label>
    </fieldset>
  `;
}
