/**
 * The app's own records: what is kept about a tank, a saved check and the user's settings.
 * Every number is SI (K, Pa — a pressure's name ends in `Gauge` or `Abs` —, kg, m³, m), exactly as the
 * check engine takes it; display units live only in `Settings.units` and are applied through
 * `thermo/units.ts`.
 *
 * These types are shared by the components (which show them) and by pwa/storage.ts (which
 * keeps them), so they sit here, below the app shell in the import order pwa → components → thermo.
 */
import type { NumberFormatId } from './number-parse.js';
import type { CautionLevel, TankInput, TankPhase } from '../thermo/check/types.js';
import { FILL_ACCURACY_DEFAULTS } from '../thermo/fill/defaults.js';
import { P_ATM_Pa } from '../thermo/constants.js';

/** A tank in the register. */
export interface TankRecord {
  /** Random id, stable for the life of the record. */
  id: string;
  /** Site the tank stands at (free text; the register groups by it). */
  site: string;
  /** Short name the user knows the tank by. */
  name: string;
  /** Free-text notes (location on site, serial number…). */
  notes: string;
  /** The nameplate, SI, as the check engine takes it. */
  nameplate: TankInput;
  /** What the tank holds: a product choice of the app (see components/products.ts). */
  productId: string;
  /** Part of the invented demo site; false once the user edits it or saves a check on it. */
  demo: boolean;
  /** ISO 8601 timestamps. */
  createdAt: string;
  updatedAt: string;
}

/** How the contents were read. */
export type ContentsMode = 'gaugePercent' | 'levelHeight' | 'netMass';

/**
 * What the user typed on the check screen, SI. `null` means "not entered". Kept as entered so a
 * half-filled check can be saved as a draft and restored exactly.
 */
export interface Readings {
  /** Liquid temperature now, K. */
  liquidTemperature: number | null;
  contentsMode: ContentsMode;
  /** Float-gauge reading, percent 0…100. */
  gaugePercent: number | null;
  /** Liquid level height, m. */
  levelHeight: number | null;
  /** Net product mass on a scale, kg. */
  netMass: number | null;
  /** Pressure gauge reading, Pa gauge (optional). */
  pressureReadingGauge: number | null;
  /** Forecast peak air temperature, K. */
  peakAirTemperature: number | null;
  /** Sun allowance added to the peak air temperature, K (a rule of thumb; see settings). */
  sunAllowance: number | null;
  /**
   * ISO 8601 time the measured readings (temperature, contents, pressure) were last typed.
   * Optional: records from before it existed have none (their draft's `updatedAt` or the
   * check's `at` stands in; see components/reopen.ts).
   */
  takenAt?: string;
}

/** The key figures of a check as the engine gave them, kept with the check for history and CSV. */
export interface CheckSummary {
  phase: TankPhase;
  /** Expected pressure now, Pa gauge (`TankCheckResult.pGauge`). */
  pGauge: number;
  /** kg */
  totalMass: number;
  /** m³ */
  liquidVolume: number;
  /** fraction of the water weight capacity */
  fillingDensity: number;
  /** kg (rounded down by the engine) */
  maxMass: number;
  /** kg (rounded down; negative when over) */
  roomLeftMass: number;
  /** percent 0…100 */
  stopAtGaugePercent: number;
  /** Limit that binds (engine id). */
  binding: string;
  /** K */
  peakTemperature: number;
  /** Pa gauge (rounded up; `PeakResult.pGauge`) */
  peakGauge: number;
  /**
   * Pa gauge (rounded up): the peak raised by the model's allowance, the figure both headrooms are
   * measured from (`PeakResult.pGaugeUpper`). Absent in checks saved before it was kept.
   */
  peakGaugeUpper?: number;
  /** The allowance that raised it, fraction of the absolute pressure. Absent in older checks. */
  peakAllowance?: number;
  /** fraction 0…1 */
  peakLiquidFraction: number;
  /** Pa (negative when exceeded) */
  headroomToDesign: number;
  /** Pa (negative when exceeded) */
  headroomToRelief: number;
  /** K or null */
  liquidFullTemperature: number | null;
  /** Highest caution level other than the standing one, or null. */
  topLevel: CautionLevel | null;
  /** Caution messages in rank order, the standing caution last. */
  cautions: { level: CautionLevel; code: string; message: string }[];
}

/** A saved check. */
/** What the tank list shows of a tank's newest check (storage keeps one per tank). */
export interface CheckBrief {
  tankId: string;
  id: string;
  at: string;
  summary: Pick<CheckSummary, 'topLevel'>;
}

export interface CheckRecord {
  id: string;
  tankId: string;
  /** ISO 8601 time the check was saved. */
  at: string;
  readings: Readings;
  /** The product label at the time of the check. */
  productLabel: string;
  summary: CheckSummary;
  demo: boolean;
}

/** An unsaved, half-filled check, kept per tank so a reload or an update never loses it. */
export interface DraftRecord {
  tankId: string;
  readings: Readings;
  /** ISO 8601 */
  updatedAt: string;
}

/** Display units the user chose, one per quantity. Gauge/absolute is part of the pressure unit. */
export interface UnitPrefs {
  pressure: 'psig' | 'barg' | 'kPag';
  temperature: 'F' | 'C';
  volume: 'usgal' | 'L' | 'm3';
  mass: 'lb' | 'kg';
  /** Level heights and dimensions (the settings offer in and cm; ft and m are for elevations). */
  length: 'in' | 'cm' | 'ft' | 'm';
}

/** How the site's barometric pressure is known. */
export type BarometerMode = 'standard' | 'pressure' | 'elevation';

export interface Settings {
  units: UnitPrefs;
  barometer: {
    mode: BarometerMode;
    /** Site barometric pressure, Pa absolute (used when mode is `pressure`). */
    pressureAbs: number;
    /** Site elevation, m (used when mode is `elevation`). */
    elevation: number;
  };
  /** Pressure gauge accuracy, fraction of full scale (0.02 = ±2 %). */
  gaugeAccuracy: number;
  /** Pressure gauge full scale, Pa gauge, or null for "same as the tank's design pressure". */
  gaugeFullScaleGauge: number | null;
  /** Thermometer tolerance, K (±). Shown next to the temperature results. */
  thermometerTolerance: number;
  /** Default sun allowance for the peak, K (rule of thumb: +5 °C / 9 °F for an unshaded, uninsulated tank). */
  sunAllowance: number;
  /** `outdoor`: the high-contrast theme for sunlight. */
  theme: 'standard' | 'outdoor';
  /** How numbers are typed and shown: decimal mark and digit groups (`auto`: the device's language). */
  numberFormat: NumberFormatId;
  /** Float gauge accuracy for a fill's reconciliation, ± percentage points per reading. */
  fillGaugePoints: number;
  /** Delivery meter accuracy, ± fraction of the delivered volume. */
  fillMeterFraction: number;
  /** The delivery meter reads temperature-compensated (60 °F in US units, 15 °C in metric) by default. */
  fillMeterCompensated: boolean;
  /** Days after which a tank's readings no longer count on the site board (it then needs a reading). */
  staleReadingDays: number;
}

export const DEFAULT_SETTINGS: Settings = {
  units: { pressure: 'psig', temperature: 'F', volume: 'usgal', mass: 'lb', length: 'in' },
  barometer: { mode: 'standard', pressureAbs: P_ATM_Pa, elevation: 0 },
  gaugeAccuracy: 0.02,
  gaugeFullScaleGauge: null,
  thermometerTolerance: 1,
  sunAllowance: 5,
  theme: 'outdoor',
  numberFormat: 'auto',
  // thermo/fill/defaults.ts: common practice (gauge), from memory marked common practice (meter).
  fillGaugePoints: FILL_ACCURACY_DEFAULTS.gaugePoints,
  fillMeterFraction: FILL_ACCURACY_DEFAULTS.meterFraction,
  fillMeterCompensated: true,
  staleReadingDays: 7,
};

/** Empty readings for a new check. */
export function emptyReadings(sunAllowance: number): Readings {
  return {
    liquidTemperature: null,
    contentsMode: 'gaugePercent',
    gaugePercent: null,
    levelHeight: null,
    netMass: null,
    pressureReadingGauge: null,
    peakAirTemperature: null,
    sunAllowance,
  };
}

/** A random id for a new record (crypto where present). */
export function newId(): string {
  if (typeof crypto !== 'undefined' && 'randomUUID' in crypto) return crypto.randomUUID();
  return `${Date.now().toString(36)}-${Math.random().toString(36).slice(2, 10)}`;
}
