/**
 * Input checks for `reconcileFill`. Every failure throws `InputError` naming the dotted field
 * (`delivered.volume`, `after.gaugePercent`, …) and its valid range; ranges are what the
 * reconciliation can handle, not what is usual on site.
 */
import { InputError } from '../errors.js';
import type { Quantity } from '../units.js';
import { describeProduct } from '../api.js';
import type { TankCheckInput } from '../check/types.js';
import { validateInput } from '../check/validate.js';
import { T_CHECK_MAX_K, T_CHECK_MIN_K } from '../limits.js';
import { FILL_ACCURACY_DEFAULTS, FILL_ACCURACY_LIMITS } from './defaults.js';
import type { FillInput, FillStart, MeterBasis } from './types.js';

export const METER_BASES: readonly MeterBasis[] = ['compensated-60F', 'compensated-15C', 'gross'];

export interface CleanFill {
  start: FillStart;
  volume: number;
  basis: MeterBasis;
  meterTemperature: number | null;
  interrupted: boolean;
  afterGauge: number;
  afterTemperature: number;
  afterPressureGauge: number | null;
  gaugePoints: number;
  meterFraction: number;
}

/** `x` if a finite number from lo to hi; else an InputError with the range in words and numbers. */
export function num(
  field: string,
  x: unknown,
  lo: number,
  hi: number,
  range: string,
  quantity?: Quantity,
): number {
  if (typeof x !== 'number' || !Number.isFinite(x) || x < lo || x > hi)
    throw new InputError(field, range, x, { min: lo, max: hi, ...(quantity ? { quantity } : {}) });
  return x;
}

export function isObject(x: unknown): x is Record<string, unknown> {
  return typeof x === 'object' && x !== null && !Array.isArray(x);
}

const T_RANGE = `from ${T_CHECK_MIN_K} to ${T_CHECK_MAX_K} K`;

/** A temperature the check accepts, K. */
export function temperature(field: string, x: unknown): number {
  return num(field, x, T_CHECK_MIN_K, T_CHECK_MAX_K, T_RANGE, 'temperature');
}

export function validateFillInput(input: FillInput): CleanFill {
  if (!isObject(input))
    throw new InputError('fill', 'an object { start, delivered, after, accuracy? }', input);
  const start = input.start;
  validateFillStart(start, 'start');
  const d: unknown = input.delivered;
  if (!isObject(d))
    throw new InputError('delivered', 'an object { volume, basis?, meterTemperature? }', d);
  const volume = num('delivered.volume', d.volume, 0, 1e5, 'from 0 to 100 000 m³', 'volume');
  const basis = (d.basis ?? 'compensated-60F') as MeterBasis;
  if (!METER_BASES.includes(basis))
    throw new InputError(
      'delivered.basis',
      "'compensated-60F', 'compensated-15C' or 'gross'",
      basis,
    );
  const meterTemperature =
    d.meterTemperature === undefined
      ? null
      : temperature('delivered.meterTemperature', d.meterTemperature);
  if (d.interrupted !== undefined && typeof d.interrupted !== 'boolean')
    throw new InputError('delivered.interrupted', 'true or false', d.interrupted);
  const a: unknown = input.after;
  if (!isObject(a))
    throw new InputError(
      'after',
      'an object { gaugePercent, liquidTemperature?, pressureReadingGauge? }',
      a,
    );
  const afterGauge = num('after.gaugePercent', a.gaugePercent, 0, 100, 'a percent from 0 to 100');
  const afterTemperature =
    a.liquidTemperature === undefined
      ? start.before.liquidTemperature
      : temperature('after.liquidTemperature', a.liquidTemperature);
  // The range of a gauge pressure is the check's (it knows the site's barometer).
  const afterPressureGauge =
    a.pressureReadingGauge === undefined
      ? null
      : num(
          'after.pressureReadingGauge',
          a.pressureReadingGauge,
          -120_000,
          1e8,
          'from −120 000 to 100 000 000 Pa gauge',
          'gaugePressure',
        );
  const { gaugePoints, meterFraction } = validateAccuracy(input.accuracy);
  return {
    start,
    volume,
    basis,
    meterTemperature,
    interrupted: d.interrupted === true,
    afterGauge,
    afterTemperature,
    afterPressureGauge,
    gaugePoints,
    meterFraction,
  };
}

/** The instruments' accuracies, defaults filled in. */
function validateAccuracy(accuracy: unknown): { gaugePoints: number; meterFraction: number } {
  const acc: unknown = accuracy ?? {};
  if (!isObject(acc))
    throw new InputError('accuracy', 'an object { gaugePoints?, meterFraction? }', acc);
  const L = FILL_ACCURACY_LIMITS;
  const gaugePoints =
    acc.gaugePoints === undefined
      ? FILL_ACCURACY_DEFAULTS.gaugePoints
      : num(
          'accuracy.gaugePoints',
          acc.gaugePoints,
          L.gaugePoints.min,
          L.gaugePoints.max,
          'from 0 to 20 percentage points of the tank volume',
        );
  const meterFraction =
    acc.meterFraction === undefined
      ? FILL_ACCURACY_DEFAULTS.meterFraction
      : num(
          'accuracy.meterFraction',
          acc.meterFraction,
          L.meterFraction.min,
          L.meterFraction.max,
          'a fraction of the delivered volume from 0 to 0.1',
          'fraction',
        );
  return { gaugePoints, meterFraction };
}

const SOURCES = ['gaugePercent', 'levelHeight', 'netMass'] as const;
const PHASES = ['two-phase', 'liquid-full', 'vapour-only', 'supercritical'] as const;

/** Throws unless `x` is a well-formed `FillStart` (the shape `startFill` makes). */
function validateFillStart(x: unknown, field: string): asserts x is FillStart {
  if (!isObject(x)) throw new InputError(field, 'an object { check, before, startedAt }', x);
  if (!isObject(x.check) || !isObject(x.check.tank))
    throw new InputError(`${field}.check`, 'the tank check input the fill started from', x.check);
  validateCheckInput(x.check, `${field}.check`);
  date(`${field}.startedAt`, x.startedAt);
  const b = x.before;
  if (!isObject(b)) throw new InputError(`${field}.before`, 'the figures of the check before', b);
  const f = `${field}.before`;
  oneOf(`${f}.phase`, b.phase, PHASES);
  oneOf(`${f}.contentsSource`, b.contentsSource, SOURCES);
  temperature(`${f}.liquidTemperature`, b.liquidTemperature);
  if (b.gaugePercent !== null)
    num(`${f}.gaugePercent`, b.gaugePercent, 0, 100, 'a percent from 0 to 100, or null');
  num(`${f}.liquidPercent`, b.liquidPercent, 0, 100, 'a percent from 0 to 100');
  num(`${f}.stopAtGaugePercent`, b.stopAtGaugePercent, 0, 100, 'a percent from 0 to 100');
  num(`${f}.totalMass`, b.totalMass, 0, 1e8, 'from 0 to 100 000 000 kg', 'mass');
  num(`${f}.maxMass`, b.maxMass, 0, 1e8, 'from 0 to 100 000 000 kg', 'mass');
  for (const k of ['roomLeftMass', 'roomLeftVolume', 'roomLeftVolumeAt60F'] as const)
    num(`${f}.${k}`, b[k], -1e8, 1e8, 'a finite number from −100 000 000 to 100 000 000');
  if (typeof b.binding !== 'string')
    throw new InputError(`${f}.binding`, 'text (a limit id)', b.binding);
}

export function oneOf(field: string, x: unknown, allowed: readonly string[]): void {
  if (typeof x !== 'string' || !allowed.includes(x))
    throw new InputError(field, `one of ${allowed.map((a) => `'${a}'`).join(', ')}`, x);
}

export function date(field: string, x: unknown): void {
  if (typeof x !== 'string' || Number.isNaN(Date.parse(x)))
    throw new InputError(field, 'an ISO 8601 date and time', x);
}

/** The check input a fill started from, as the check itself validates it, fields prefixed. */
function validateCheckInput(check: unknown, field: string): void {
  try {
    validateInput(check as TankCheckInput);
    describeProduct((check as TankCheckInput).product);
  } catch (e) {
    if (e instanceof InputError)
      throw new InputError(`${field}.${e.field}`, e.validRange, undefined, e.limits);
    throw e;
  }
}
