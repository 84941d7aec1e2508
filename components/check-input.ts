/**
 * From what the user typed (Readings, SI) plus the tank and the settings to the engine's
 * `TankCheckInput`, or a list of what is still missing. No arithmetic on units here: the only
 * sum is peak liquid temperature = peak air temperature + sun allowance, both already in K.
 */
import { checkTank, InputError, type InputErrorCode, type InputLimits } from '../thermo/index.js';
import { cautionText, refusalWords } from './messages.js';
import type { TankCheckInput, TankCheckResult } from '../thermo/check/types.js';
import type { SiteRules } from './site-rules.js';
import type { DisplayUnits } from './display.js';
import { T_CHECK_MAX_K, T_CHECK_MIN_K, checkMinTemperature } from '../thermo/limits.js';
import { productFor, productLabel, tripleTemperatures } from './products.js';
import type { CheckSummary, Readings, Settings, TankRecord } from './types.js';

/** Temperatures the check accepts, K (thermo/limits.ts). */
export const T_RANGE_K = { min: T_CHECK_MIN_K, max: T_CHECK_MAX_K } as const;

/** Lowest liquid temperature the check accepts for this product, K (the engine's own rule). */
export function minTemperatureFor(productId: string): number {
  return checkMinTemperature(Math.max(-Infinity, ...tripleTemperatures(productId)));
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

export function buildCheckInput(
  tank: TankRecord,
  r: Readings,
  settings: Settings,
  rules: SiteRules = {},
): BuiltInput {
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
      ...(settings.gaugeFullScaleGauge !== null
        ? { fullScaleGauge: settings.gaugeFullScaleGauge }
        : {}),
    },
  };
  if (r.pressureReadingGauge !== null) input.pressureReadingGauge = r.pressureReadingGauge;
  if (rules.ruleSet !== undefined) input.ruleSet = rules.ruleSet;
  if (rules.siteRule !== undefined) input.siteRule = rules.siteRule;
  if (settings.barometer.mode === 'pressure')
    input.barometricPressureAbs = settings.barometer.pressureAbs;
  else if (settings.barometer.mode === 'elevation') input.elevation = settings.barometer.elevation;
  return { input, missing: [], peakEstimated };
}

/** An engine refusal: the field it names, its message (SI) and, for a number, its valid range. */
export interface CheckError {
  field: string;
  message: string;
  limits?: InputLimits;
  /** The engine's kind of refusal (`InputError.code`), when it was one. */
  code?: InputErrorCode;
}

export interface CheckOutcome {
  input: TankCheckInput | null;
  result: TankCheckResult | null;
  missing: string[];
  peakEstimated: boolean;
  /** The engine refused the input: its message, and the field it names. */
  error: CheckError | null;
}

/** The engine's fields as the app's forms label them (readings, tank form, settings). */
export const FIELD_LABELS: Record<string, string> = {
  liquidTemperature: 'Liquid temperature',
  peakTemperature: 'Peak liquid temperature',
  'contents.gaugePercent': 'Float gauge',
  'contents.netMass': 'Net product mass',
  'contents.levelHeight': 'Liquid level height',
  pressureReadingGauge: 'Pressure gauge',
  'tank.waterCapacity': 'Water capacity',
  'tank.designPressureGauge': 'Design pressure (MAWP)',
  'tank.reliefSetPressureGauge': 'Relief valve set pressure',
  'tank.minDesignMetalTemperature': 'Minimum design metal temperature',
  'tank.shape.diameter': 'Inside diameter',
  'tank.shape.shellLength': 'Shell length between head seams',
  barometricPressureAbs: 'Barometric pressure',
  elevation: 'Site elevation',
  'pressureGauge.fullScaleGauge': 'Pressure gauge full scale',
  'pressureGauge.accuracy': 'Pressure gauge accuracy (of full scale)',
};

/** Unit text of the engine's plain-number fields (those whose limits carry no quantity). */
const PLAIN_UNITS: Record<string, string> = { 'contents.gaugePercent': '%' };

/**
 * An engine refusal in words, with its range in the user's units when the engine gave the range
 * as numbers (e.g. "Liquid temperature must be from -189.6 to 260.3 °F for this product"), else
 * the field refused in the app's words (never the engine's field names or SI units). The range goes through `DisplayUnits` (thermo/units.ts), rounded
 * inward. No full stop at the end.
 */
export function errorText(error: CheckError, display: DisplayUnits): string {
  const l = error.limits;
  const name = FIELD_LABELS[error.field];
  if (error.code === 'not-a-number' && name) return `${name} must be a number`;
  if (!l || !name || (l.min === undefined && l.max === undefined))
    return refusalWords(error.field, name);
  try {
    const range = display.range(l.quantity ?? null, l.min, l.max, {
      ...(l.minExclusive ? { minExclusive: true } : {}),
      unitText: PLAIN_UNITS[error.field] ?? '',
    });
    return `${name} must be ${range}${l.note ? ` ${l.note}` : ''}`;
  } catch {
    // A range the units cannot show (not expected): say what was refused, in words.
    return refusalWords(error.field, name);
  }
}

/**
 * Builds the input and runs the check, with the site's rule set and own rule when given. Never
 * throws: an engine refusal comes back as `error`.
 */
export function runCheck(
  tank: TankRecord,
  readings: Readings,
  settings: Settings,
  rules: SiteRules = {},
): CheckOutcome {
  const built = buildCheckInput(tank, readings, settings, rules);
  if (!built.input) return { ...built, result: null, error: null };
  try {
    return { ...built, result: checkTank(built.input), error: null };
  } catch (e) {
    if (e instanceof InputError) {
      const error: CheckError = { field: e.field, message: e.message, code: e.code };
      if (e.limits) error.limits = e.limits;
      return { ...built, result: null, error };
    }
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
export function summarize(result: TankCheckResult, display?: DisplayUnits): CheckSummary {
  const ranked = result.cautions.filter((c) => c.code !== 'standing');
  return {
    phase: result.phase,
    pGauge: result.pGauge,
    totalMass: result.contents.totalMass,
    liquidVolume: result.contents.liquidVolume,
    fillingDensity: result.contents.fillingDensity,
    maxMass: result.fillLimit.maxMass,
    roomLeftMass: result.fillLimit.roomLeftMass,
    stopAtGaugePercent: result.fillLimit.stopAtGaugePercent,
    binding: result.fillLimit.binding,
    peakTemperature: result.peak.temperature,
    peakGauge: result.peak.pGauge,
    peakGaugeUpper: result.peak.pGaugeUpper,
    peakAllowance: result.peak.allowance,
    peakLiquidFraction: result.peak.liquidFraction,
    headroomToDesign: result.peak.headroomToDesign,
    headroomToRelief: result.peak.headroomToRelief,
    liquidFullTemperature: result.liquidFullTemperature,
    topLevel: ranked[0]?.level ?? null,
    // Saved in the user's words and units of the moment the check was saved.
    cautions: result.cautions.map((c) => ({
      level: c.level,
      code: c.code,
      message: display ? cautionText(c, display) : c.message,
    })),
  };
}
