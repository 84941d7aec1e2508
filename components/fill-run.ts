/**
 * From a fill under way (what was typed, SI) to the engine's `FillInput` and its
 * reconciliation. Never throws: a refusal of the engine comes back with the screen field it
 * belongs to and a sentence in the user's units.
 */
import { InputError, type InputLimits } from '../thermo/errors.js';
import {
  reconcileFill,
  type FillInput,
  type FillReconciliation,
  type MeterBasis,
} from '../thermo/fill/index.js';
import type { DisplayUnits } from './display.js';
import type { FillDraft } from './fill-types.js';
import type { Settings } from './types.js';

/** The fields of the fill screen. */
export type FillField =
  | 'volume'
  | 'compensated'
  | 'meterTemperature'
  | 'afterGauge'
  | 'afterTemperature'
  | 'afterPressureGauge';

/** Engine field → screen field. */
const FIELD: Record<string, FillField> = {
  'delivered.volume': 'volume',
  'delivered.basis': 'compensated',
  'delivered.meterTemperature': 'meterTemperature',
  'after.gaugePercent': 'afterGauge',
  'after.liquidTemperature': 'afterTemperature',
  'after.pressureReadingGauge': 'afterPressureGauge',
};

/** The names the screen's labels use. */
export const FILL_FIELD_NAMES: Record<FillField, string> = {
  volume: 'Metered volume',
  compensated: 'The meter’s base temperature',
  meterTemperature: 'Product temperature at the meter',
  afterGauge: 'Float gauge after',
  afterTemperature: 'Liquid temperature after',
  afterPressureGauge: 'Pressure gauge after',
};

/** Why a range is what it is, per field, in plain words (added to the range). */
const WHY: Partial<Record<FillField, string>> = {
  afterGauge:
    'A metered delivery cannot lower the level. Check the readings; if the gauge does read this, it is faulty: do not fill by it, and follow the site’s procedures.',
  volume: 'Check the meter ticket: more than this cannot have gone in.',
};

export interface FillRefusal {
  field: FillField | null;
  message: string;
}

export interface FillOutcome {
  input: FillInput | null;
  result: FillReconciliation | null;
  /** What is still needed, in words. */
  missing: string[];
  refusal: FillRefusal | null;
}

/** The meter's basis: compensated to the base the user's units go with, or gross. */
export function meterBasis(compensated: boolean, d: DisplayUnits): MeterBasis {
  if (!compensated) return 'gross';
  return d.units.temperature === 'F' ? 'compensated-60F' : 'compensated-15C';
}

export function buildFillInput(
  draft: FillDraft,
  settings: Settings,
  d: DisplayUnits,
): { input: FillInput | null; missing: string[] } {
  const missing: string[] = [];
  if (draft.volume === null) missing.push('the metered volume');
  if (draft.afterGauge === null) missing.push('the float gauge after the delivery');
  if (draft.volume === null || draft.afterGauge === null) return { input: null, missing };
  const input: FillInput = {
    start: draft.start,
    delivered: { volume: draft.volume, basis: meterBasis(draft.compensated, d) },
    after: { gaugePercent: draft.afterGauge },
    accuracy: {
      gaugePoints: settings.fillGaugePoints,
      meterFraction: settings.fillMeterFraction,
    },
  };
  if (draft.interrupted) input.delivered.interrupted = true;
  if (!draft.compensated && draft.meterTemperature !== null)
    input.delivered.meterTemperature = draft.meterTemperature;
  if (draft.afterTemperature !== null) input.after.liquidTemperature = draft.afterTemperature;
  if (draft.afterPressureGauge !== null)
    input.after.pressureReadingGauge = draft.afterPressureGauge;
  return { input, missing };
}

/** A refusal in words, its range in the user's units when the engine gave it as numbers. */
export function refusalText(e: InputError, field: FillField | null, d: DisplayUnits): string {
  const l: InputLimits | undefined = e.limits;
  const name = field ? FILL_FIELD_NAMES[field] : null;
  if (!l || !name || (l.min === undefined && l.max === undefined)) return e.message;
  const range = d.range(l.quantity ?? null, l.min, l.max, {
    ...(l.minExclusive ? { minExclusive: true } : {}),
    unitText: field === 'afterGauge' ? '%' : '',
  });
  const why = field ? WHY[field] : undefined;
  return `${name} must be ${range}${l.note ? ` (${l.note})` : ''}.${why ? ` ${why}` : ''}`;
}

export function runFill(draft: FillDraft, settings: Settings, d: DisplayUnits): FillOutcome {
  const { input, missing } = buildFillInput(draft, settings, d);
  if (!input) return { input, result: null, missing, refusal: null };
  try {
    return { input, result: reconcileFill(input), missing, refusal: null };
  } catch (e) {
    if (e instanceof InputError) {
      const field = FIELD[e.field] ?? null;
      return {
        input,
        result: null,
        missing,
        refusal: { field, message: refusalText(e, field, d) },
      };
    }
    const why = e instanceof Error ? e.message : String(e);
    return {
      input,
      result: null,
      missing,
      refusal: {
        field: null,
        message: `The fill could not be worked out for these readings (${why}).`,
      },
    };
  }
}
