/**
 * Starting a fill from a tank's check: the check's input and result become the fill's
 * before-readings (`startFill`), and the fill under way starts empty but for the meter's basis
 * from the Settings. Used by the check screen (one button).
 *
 * data-testid: `fill-start`.
 */
import { html } from 'lit';
import { startFill } from '../thermo/fill/start.js';
import type { TankCheckInput, TankCheckResult } from '../thermo/check/types.js';
import type { FillDraft } from './fill-types.js';
import type { Settings } from './types.js';

/** A new fill under way from the check on screen. */
export function newFillDraft(
  tankId: string,
  input: TankCheckInput,
  result: TankCheckResult,
  settings: Settings,
  at: Date = new Date(),
): FillDraft {
  return {
    tankId,
    start: startFill(input, result, at),
    volume: null,
    compensated: settings.fillMeterCompensated,
    meterTemperature: null,
    afterGauge: null,
    afterTemperature: null,
    afterPressureGauge: null,
    interrupted: false,
    note: '',
    updatedAt: at.toISOString(),
  };
}

/** The check screen's button; fires `fill-start` with `{ draft }` (bubbles to the shell). */
export function fillStartButton(
  host: HTMLElement,
  tankId: string,
  check: { input: TankCheckInput | null; result: TankCheckResult | null } | null,
  settings: Settings,
) {
  const ready = Boolean(check?.input && check.result);
  const start = () => {
    if (!check?.input || !check.result) return;
    const draft = newFillDraft(tankId, check.input, check.result, settings);
    host.dispatchEvent(
      new CustomEvent('fill-start', { detail: { draft }, bubbles: true, composed: true }),
    );
  };
  return html`<button data-testid="fill-start" ?disabled=${!ready} @click=${start}>
    Start a fill from these readings
  </button>`;
}
