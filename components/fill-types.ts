/**
 * The app's fill records: a saved fill is the engine's `FillRecord` as it stands; a fill under
 * way (before-readings kept, the delivery not yet entered) is a `FillDraft`, kept per tank so a
 * reload never loses it. SI throughout, like the other records.
 */
import type { FillRecord, FillStart } from '../thermo/fill/index.js';

export type { FillRecord };

/** A half-entered fill: the start, and what was typed of the delivery and the after-readings. */
export interface FillDraft {
  tankId: string;
  start: FillStart;
  /** Metered volume, m³, or null when not entered. */
  volume: number | null;
  /** The meter reads temperature-compensated (60 °F in US units, 15 °C in metric). */
  compensated: boolean;
  /** For a gross meter: the product's temperature in the meter, K, or null (the after temperature). */
  meterTemperature: number | null;
  /** After-gauge, percent 0…100, or null. */
  afterGauge: number | null;
  /** After liquid temperature, K, or null (the temperature before). */
  afterTemperature: number | null;
  /** After pressure, Pa gauge, or null. */
  afterPressureGauge: number | null;
  /** The delivery was stopped before the intended amount. */
  interrupted: boolean;
  note: string;
  /** ISO 8601 */
  updatedAt: string;
}
