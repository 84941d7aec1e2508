/**
 * The fill record: a tank's check before a delivery, the metered delivery, the readings after
 * it, and the reconciliation of the after-gauge with the meter.
 *
 * Units: SI as in the tank check (K, Pa gauge for readings, kg, m³); gauge readings are a
 * percent 0…100 of the tank volume, like `ContentsInput.gaugePercent`.
 */
import type { CautionLevel, CautionQuantity, TankCheckInput, TankPhase } from '../check/types.js';

/**
 * How the delivery meter states its volume:
 * - `compensated-60F`: temperature-compensated to 60 °F (the US trade's base);
 * - `compensated-15C`: temperature-compensated to 15 °C;
 * - `gross`: the volume at the product's temperature in the meter.
 */
export type MeterBasis = 'compensated-60F' | 'compensated-15C' | 'gross';

/** The before-readings and what the check made of them: the start of a fill record. */
export interface FillStart {
  /** The check's input as entered (tank, product, readings), so the record stands alone. */
  check: TankCheckInput;
  /** Key figures of the check's result. */
  before: FillBefore;
  /** ISO 8601 time the fill was started. */
  startedAt: string;
}

export interface FillBefore {
  phase: TankPhase;
  /** Liquid temperature before, K. */
  liquidTemperature: number;
  /** How the contents were read before the delivery. */
  contentsSource: 'gaugePercent' | 'levelHeight' | 'netMass';
  /** The float-gauge reading before, percent 0…100, or null when the contents were not read on it. */
  gaugePercent: number | null;
  /** Liquid volume ÷ tank volume before, percent 0…100. */
  liquidPercent: number;
  /** Total product in the tank before, kg. */
  totalMass: number;
  /** The check's fill limit, kg (rounded down). */
  maxMass: number;
  /** The limit that binds (the check's id). */
  binding: string;
  /** Room left, kg (rounded down; negative when over). */
  roomLeftMass: number;
  /** Room left as liquid at the liquid temperature before, m³. */
  roomLeftVolume: number;
  /** Room left as liquid at 60 °F, m³ (what a compensated meter would read). */
  roomLeftVolumeAt60F: number;
  /** Float-gauge percent at which the tank holds the limit, at the temperature before. */
  stopAtGaugePercent: number;
}

/** What the delivery meter read. */
export interface DeliveredInput {
  /** Metered volume, m³, as the meter reads it (on `basis`). Zero for a delivery that never flowed. */
  volume: number;
  /** Default `compensated-60F`. */
  basis?: MeterBasis;
  /** For a gross meter: the product's temperature in the meter, K. Default: the after liquid temperature. */
  meterTemperature?: number;
  /** The delivery was stopped before the intended amount (a partial fill). Default false. */
  interrupted?: boolean;
}

/** Readings after the delivery. */
export interface AfterReadings {
  /** Float-gauge reading after the delivery, percent 0…100. */
  gaugePercent: number;
  /** Liquid temperature after, K. Default: the temperature before. */
  liquidTemperature?: number;
  /** Pressure gauge reading after, Pa gauge. Optional; enables the product check. */
  pressureReadingGauge?: number;
}

/** The stated accuracy of the instruments (see `FILL_ACCURACY_DEFAULTS` for the defaults and their basis). */
export interface FillAccuracy {
  /** Float gauge: ± percentage points of the tank volume, per reading. */
  gaugePoints?: number;
  /** Delivery meter: ± fraction of the delivered volume. */
  meterFraction?: number;
}

export interface FillInput {
  start: FillStart;
  delivered: DeliveredInput;
  after: AfterReadings;
  accuracy?: FillAccuracy;
}

/** Verdicts, most severe first: over-limit > gauge-low > gauge-high > consistent. */
export type FillVerdict = 'over-limit' | 'gauge-low' | 'gauge-high' | 'consistent';

/** What a finding's number measures: a quantity of `thermo/units.ts` (SI), or a gauge percent 0…100. */
export type FillQuantity = CautionQuantity | 'gaugePercent' | 'gaugePoints';

/** A number behind a finding, SI (or a gauge percent / percentage points). */
export interface FillParam {
  value: number;
  quantity: FillQuantity;
}

/**
 * One finding of the reconciliation: a stable `code`, its SI `params` for the app to render in
 * the user's units, and an English default `message` (°F/psig with °C/kPa, lb with kg).
 */
export interface FillFinding {
  level: CautionLevel;
  /** Stable machine code, e.g. `fill-gauge-low`. */
  code: string;
  /** English default text with the figures in it. Never permission to fill. */
  message: string;
  params: Record<string, FillParam>;
}

/** How wide the agreement band is, and from what: each part in gauge percentage points. */
export interface FillBand {
  /** Half-width of the band, ± points (root sum of squares of the parts, rounded down to 0.1). */
  halfWidth: number;
  /** The after reading's gauge accuracy, points. */
  afterGauge: number;
  /** The before contents' gauge accuracy carried to the after level, points (0 when weighed). */
  beforeGauge: number;
  /** The meter's accuracy on the delivered amount, points. */
  meter: number;
  /** The model's liquid-density allowance on the delivered mass and on the expected level, points. */
  model: number;
}

export interface FillReconciliation {
  verdict: FillVerdict;
  /** Signal word of the verdict's finding. */
  level: CautionLevel;
  /** Liquid temperature after, K (entered, or the temperature before). */
  afterTemperature: number;
  /** Temperature at which the meter's volume is taken, K (60 °F, 15 °C, or the product's in a gross meter). */
  meterReferenceTemperature: number;
  /** Density used to turn the metered volume into mass, kg/m³ (the model's saturated liquid at the meter's temperature). */
  deliveredDensity: number;
  /** Delivered mass, kg. */
  deliveredMass: number;
  /** Before mass + delivered mass, kg. */
  expectedMass: number;
  /** Phase state the expected contents are in at the after temperature. */
  expectedPhase: TankPhase;
  /** Float-gauge percent the expected contents should read at the after temperature. */
  expectedGaugePercent: number;
  /** Expected liquid volume at the after temperature, m³. */
  expectedLiquidVolume: number;
  /** The after reading, percent. */
  gaugePercent: number;
  /** Contents the after reading stands for at the after temperature, kg. */
  gaugeMass: number;
  /** Reading − expected, percentage points. */
  difference: number;
  /** Contents by the gauge − contents expected, kg. */
  differenceMass: number;
  /** The same as liquid at the after temperature, m³. */
  differenceVolume: number;
  band: FillBand;
  /** The fill limit after the delivery: the lower of the check's limit before and at the after temperature, kg. */
  maxMass: number;
  /** Float-gauge percent at which the tank holds the limit at the after temperature. */
  stopAtGaugePercent: number;
  /** The larger of expected and gauge contents above the limit, kg (0 when not over). */
  overMass: number;
  /** `overMass` as liquid at the after temperature, m³. */
  overVolume: number;
  /** The after pressure against the product's expected pressure, when a pressure was entered. */
  pressure: {
    /** The after reading, Pa gauge. */
    readingGauge: number;
    /** The product's pressure at the after temperature, Pa gauge. */
    expectedGauge: number;
    difference: number;
    tolerance: number;
    verdict: 'fits' | 'high' | 'low';
  } | null;
  /** Most severe first; the last is always the standing caution (`code: 'standing'`). */
  findings: FillFinding[];
}

/** A fill as saved with the tank's history, in the backup and in the CSV export. */
export interface FillRecord {
  /** Random id, stable for the life of the record. */
  id: string;
  tankId: string;
  start: FillStart;
  delivered: DeliveredInput;
  after: AfterReadings;
  /** The accuracies used (defaults filled in), so the verdict can be redone as it was. */
  accuracy: Required<FillAccuracy>;
  result: FillReconciliation;
  /** ISO 8601 time the after-readings were reconciled and saved. */
  finishedAt: string;
  /** Free-text note (ticket number, what was verified…). */
  note: string;
}
