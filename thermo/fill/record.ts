/**
 * The fill record as saved with the tank's history: making one from a reconciliation, and a
 * complete validation for a record read back (storage, backup import). The validation refuses
 * with an `InputError` naming the dotted field (`fill.after.gaugePercent`, …) and its range, so
 * an importer can say exactly what is wrong before it writes anything.
 */
import { InputError } from '../errors.js';
import { reconcileFill } from './reconcile.js';
import type { FillInput, FillReconciliation, FillRecord } from './types.js';
import { date, isObject, num, oneOf, validateFillInput } from './validate.js';

export interface MakeFillRecord {
  id: string;
  tankId: string;
  input: FillInput;
  /** Free-text note. Default empty. */
  note?: string;
  /** Time of the after-readings (default now). */
  at?: Date;
}

/** Reconciles a fill and wraps it as a record (the accuracies used are written out in full). */
export function makeFillRecord(m: MakeFillRecord): FillRecord {
  const at = m.at ?? new Date();
  if (!(at instanceof Date) || Number.isNaN(at.getTime()))
    throw new InputError('at', 'a valid date', String(at));
  const clean = validateFillInput(m.input);
  const result = reconcileFill(m.input);
  const record: FillRecord = {
    id: m.id,
    tankId: m.tankId,
    start: m.input.start,
    delivered: { ...m.input.delivered },
    after: { ...m.input.after },
    accuracy: { gaugePoints: clean.gaugePoints, meterFraction: clean.meterFraction },
    result,
    finishedAt: at.toISOString(),
    note: m.note ?? '',
  };
  return validateFillRecord(JSON.parse(JSON.stringify(record)));
}

const VERDICTS = ['over-limit', 'gauge-low', 'gauge-high', 'consistent'] as const;
const LEVELS = ['danger', 'warning', 'caution', 'notice'] as const;
const PHASES = ['two-phase', 'liquid-full', 'vapour-only', 'supercritical'] as const;
/** The result's plain numbers (SI, percent or points); each must be finite. */
const RESULT_NUMBERS = [
  'afterTemperature',
  'meterReferenceTemperature',
  'deliveredDensity',
  'deliveredMass',
  'expectedMass',
  'expectedGaugePercent',
  'expectedLiquidVolume',
  'gaugePercent',
  'gaugeMass',
  'difference',
  'differenceMass',
  'differenceVolume',
  'maxMass',
  'stopAtGaugePercent',
  'overMass',
  'overVolume',
] as const;
const BAND_NUMBERS = ['halfWidth', 'afterGauge', 'beforeGauge', 'meter', 'model'] as const;
const BIG = 1e12;
const FINITE = 'a finite number';

/** Validates a fill record read back from storage or a backup; returns it typed or throws `InputError`. */
export function validateFillRecord(x: unknown): FillRecord {
  const f = 'fill';
  if (!isObject(x)) throw new InputError(f, 'an object (a fill record)', x);
  for (const k of ['id', 'tankId'] as const) {
    if (typeof x[k] !== 'string' || x[k].trim() === '')
      throw new InputError(`${f}.${k}`, 'non-empty text', x[k]);
  }
  if (typeof x.note !== 'string') throw new InputError(`${f}.note`, 'text (may be empty)', x.note);
  if (x.note.length > 10_000)
    throw new InputError(`${f}.note`, 'text of at most 10 000 characters', x.note.length);
  date(`${f}.finishedAt`, x.finishedAt);
  try {
    validateFillInput({
      start: x.start,
      delivered: x.delivered,
      after: x.after,
      accuracy: x.accuracy,
    } as FillInput);
  } catch (e) {
    if (e instanceof InputError)
      throw new InputError(`${f}.${e.field}`, e.validRange, undefined, e.limits);
    throw e;
  }
  const acc = x.accuracy;
  if (!isObject(acc) || acc.gaugePoints === undefined || acc.meterFraction === undefined)
    throw new InputError(
      `${f}.accuracy`,
      'the accuracies used { gaugePoints, meterFraction }',
      acc,
    );
  const start = x.start as FillRecord['start'];
  if (Date.parse(x.finishedAt as string) < Date.parse(start.startedAt))
    throw new InputError(
      `${f}.finishedAt`,
      `at or after the start of the fill (${start.startedAt})`,
      x.finishedAt,
    );
  validateResult(x.result, `${f}.result`);
  return x as unknown as FillRecord;
}

function validateResult(r: unknown, f: string): asserts r is FillReconciliation {
  if (!isObject(r)) throw new InputError(f, 'the reconciliation of the fill', r);
  oneOf(`${f}.verdict`, r.verdict, VERDICTS);
  oneOf(`${f}.level`, r.level, LEVELS);
  oneOf(`${f}.expectedPhase`, r.expectedPhase, PHASES);
  for (const k of RESULT_NUMBERS) num(`${f}.${k}`, r[k], -BIG, BIG, FINITE);
  if (!isObject(r.band)) throw new InputError(`${f}.band`, 'the agreement band', r.band);
  for (const k of BAND_NUMBERS)
    num(`${f}.band.${k}`, r.band[k], 0, 100, 'from 0 to 100 percentage points');
  if (r.pressure !== null) {
    const p = r.pressure;
    if (!isObject(p)) throw new InputError(`${f}.pressure`, 'null or the pressure comparison', p);
    for (const k of ['readingGauge', 'expectedGauge', 'difference', 'tolerance'] as const)
      num(`${f}.pressure.${k}`, p[k], -BIG, BIG, FINITE);
    oneOf(`${f}.pressure.verdict`, p.verdict, ['fits', 'high', 'low']);
  }
  if (!Array.isArray(r.findings))
    throw new InputError(`${f}.findings`, 'a list of findings', r.findings);
  r.findings.forEach((c: unknown, i: number) => {
    const w = `${f}.findings[${i}]`;
    if (!isObject(c)) throw new InputError(w, 'an object { level, code, message, params }', c);
    oneOf(`${w}.level`, c.level, LEVELS);
    for (const k of ['code', 'message'] as const)
      if (typeof c[k] !== 'string') throw new InputError(`${w}.${k}`, 'text', c[k]);
    if (!isObject(c.params))
      throw new InputError(`${w}.params`, 'an object of { value, quantity }', c.params);
    for (const [name, p] of Object.entries(c.params)) {
      if (!isObject(p) || typeof p.quantity !== 'string')
        throw new InputError(`${w}.params.${name}`, 'an object { value, quantity }', p);
      num(`${w}.params.${name}.value`, p.value, -BIG, BIG, FINITE);
    }
  });
}
