/**
 * The check screen's engine refusals: a message beside the field the engine names (in the
 * user's units when it gave a range) and one line for the results and the key bar.
 */
import type { DisplayUnits } from './display.js';
import { errorText, type CheckOutcome } from './check-input.js';
import type { Readings } from './types.js';

export type FieldErrors = Partial<Record<keyof Readings | 'peakTemperature', string>>;

export interface ScreenErrors {
  fieldErrors: FieldErrors;
  /** One line for the results ('' when the figures can be shown). */
  error: string;
}

/** Engine field → reading name used by <check-form>. */
const FIELD_OF: Record<string, keyof Readings | 'peakTemperature'> = {
  liquidTemperature: 'liquidTemperature',
  'contents.gaugePercent': 'gaugePercent',
  'contents.netMass': 'netMass',
  'contents.levelHeight': 'levelHeight',
  pressureReadingGauge: 'pressureReadingGauge',
  peakTemperature: 'peakTemperature',
};

export function screenErrors(
  o: CheckOutcome | null,
  valid: boolean,
  display: DisplayUnits,
): ScreenErrors {
  const fieldErrors: FieldErrors = {};
  let error = '';
  if (!valid) error = 'A reading above is not valid: fix the marked field to see the figures.';
  else if (o?.error) {
    const key = FIELD_OF[o.error.field];
    // In the user's units when the engine gave the range as numbers.
    const message = errorText(o.error, display);
    if (key) fieldErrors[key] = `The check cannot use this value: ${message}.`;
    error = o.error.field.startsWith('tank')
      ? `The tank’s nameplate has a figure the check cannot use (${message}). Edit the tank to fix it.`
      : key
        ? 'The check cannot use a reading: see the message next to the field.'
        : message;
  }
  return { fieldErrors, error };
}

/**
 * `screenErrors` remembered: the same object back while the outcome, validity and units are the
 * same, and while the words it gives are (so <check-form> is not drawn again for nothing).
 */
export function keptScreenErrors(): (
  o: CheckOutcome | null,
  valid: boolean,
  display: DisplayUnits,
) => ScreenErrors {
  let last: { o: CheckOutcome | null; valid: boolean; d: DisplayUnits; e: ScreenErrors } | null =
    null;
  return (o, valid, d) => {
    if (last && last.o === o && last.valid === valid && last.d === d) return last.e;
    const e = screenErrors(o, valid, d);
    const same = last !== null && JSON.stringify(last.e) === JSON.stringify(e);
    last = { o, valid, d, e: same ? last!.e : e };
    return last.e;
  };
}
