/**
 * From what the user typed (Readings, SI) plus the tank and the settings to the engine's
 * `TankCheckInput`, or a list of what is still missing. No arithmetic on units here: the only
 * sum is peak liquid temperature = peak air temperature + sun allowance, both already in K.
 */
import { checkTank, InputError } from '../thermo/index.js';
import type { TankCheckInput, TankCheckResult } from '../thermo/check/types.js';
import { productFor, productLabel, tripleTemperatures } from './products.js';
import type { CheckSummary, Readings, Settings, TankRecord } from './types.js';

/** Temperatures the check accepts, K (thermo/check/validate.ts: 150…400 K). */
export const T_RANGE_K = { min: 150, max: 400 } as const;

/** Lowest liquid temperature the check accepts for this product, K: 150 K or just above the triple point. */
export function minTemperatureFor(productId: string): number {
  return Math.max(T_RANGE_K.min, ...tripleTemperatures(productId).map((t) => t + 0.1));
}

/** Human names of the readings, as the field labels say them. */
export const READING_NAMES = {
  liquidTemperature: 'the liquid temperature',
  gaugePercent: 'the float-gauge reading',
  levelHeight: 'the liquid level',
  netMass: 'the scale mass',
} as const;

export interface BuiltInput {
  /** The engine input, or null when a reading is missing. */
  input: TankCheckInput | null;
  /** Readings still needed, in words. */
  missing: string[];
  /** No forecast entered: the peak is taken at today's liquid temperature. */
  peakEstimated: boolean;
}

export function buildCheckInput(tank: TankRecord, r: Readings, settings: Settings): BuiltInput {
  const missing: string[] = [];
  if (r.liquidTemperature === null) missing.push(READING_NAMES.liquidTemperature);
  const reading = r[r.contentsMode];
  if (reading === null) missing.push(READING_NAMES[r.contentsMode]);
  const product = productFor(tank.productId);
  if (product === undefined)
    missing.push(`a known product (this tank has “${productLabel(tank.productId)}”)`);
  if (
    missing.length > 0 ||
    r.liquidTemperature === null ||
    reading === null ||
    product === undefined
  ) {
    return { input: null, missing, peakEstimated: r.peakAirTemperature === null };
  }
  const peakEstimated = r.peakAirTemperature === null;
  // An emptied sun-allowance field means no allowance.
  const sun = r.sunAllowance ?? 0;
  const peakTemperature = peakEstimated ? r.liquidTemperature : r.peakAirTemperature! + sun;
  const contents =
    r.contentsMode === 'gaugePercent'
      ? { gaugePercent: reading }
      : r.contentsMode === 'netMass'
        ? { netMass: reading }
        : { levelHeight: reading };
  const input: TankCheckInput = {
    tank: tank.nameplate,
    product,
    liquidTemperature: r.liquidTemperature,
    contents,
    peakTemperature,
    pressureGauge: {
      accuracy: settings.gaugeAccuracy,
      ...(settings.gaugeFullScale !== null ? { fullScale: settings.gaugeFullScale } : {}),
    },
  };
  if (r.gaugePressure !== null) input.gaugePressure = r.gaugePressure;
  if (settings.barometer.mode === 'pressure')
    input.barometricPressure = settings.barometer.pressure;
  else if (settings.barometer.mode === 'elevation') input.elevation = settings.barometer.elevation;
  return { input, missing: [], peakEstimated };
}

export interface CheckOutcome {
  input: TankCheckInput | null;
  result: TankCheckResult | null;
  missing: string[];
  peakEstimated: boolean;
  /** The engine refused the input: its message, and the field it names. */
  error: { field: string; message: string } | null;
}

/** Builds the input and runs the check. Never throws: an engine refusal comes back as `error`. */
export function runCheck(tank: TankRecord, readings: Readings, settings: Settings): CheckOutcome {
  const built = buildCheckInput(tank, readings, settings);
  if (!built.input) return { ...built, result: null, error: null };
  try {
    return { ...built, result: checkTank(built.input), error: null };
  } catch (e) {
    if (e instanceof InputError)
      return { ...built, result: null, error: { field: e.field, message: e.message } };
    return {
      ...built,
      result: null,
      error: {
        field: '',
        message: `The check could not finish for these readings (${e instanceof Error ? e.message : String(e)}).`,
      },
    };
  }
}

/** The key figures of a result, kept with a saved check. */
export function summarize(result: TankCheckResult): CheckSummary {
  const ranked = result.cautions.filter((c) => c.code !== 'standing');
  return {
    phase: result.phase,
    pressure: result.pressure,
    totalMass: result.contents.totalMass,
    liquidVolume: result.contents.liquidVolume,
    fillingDensity: result.contents.fillingDensity,
    maxMass: result.fillLimit.maxMass,
    roomLeftMass: result.fillLimit.roomLeftMass,
    stopAtGaugePercent: result.fillLimit.stopAtGaugePercent,
    binding: result.fillLimit.binding,
    peakTemperature: result.peak.temperature,
    peakPressure: result.peak.p,
    peakLiquidFraction: result.peak.liquidFraction,
    headroomToDesign: result.peak.headroomToDesign,
    headroomToRelief: result.peak.headroomToRelief,
    liquidFullTemperature: result.liquidFullTemperature,
    topLevel: ranked[0]?.level ?? null,
    cautions: result.cautions.map((c) => ({ level: c.level, code: c.code, message: c.message })),
  };
}
