/**
 * Validation of the site forecasts and walkdowns of a backup file (format version 2 on), complete
 * before anything is written. Throws `WalkInvalid` with where and what; pwa/backup.ts turns it
 * into the refusal message.
 */
import { TEXT_LIMITS } from '../components/limits.js';
import { T_CHECK_MAX_K, T_CHECK_MIN_K } from '../thermo/limits.js';
import type { SiteForecast, WalkdownRecord } from '../components/walkdown-types.js';
import { siteRulesProblem } from '../components/site-rules.js';

export class WalkInvalid extends Error {}

type Obj = Record<string, unknown>;

const isObj = (x: unknown): x is Obj => typeof x === 'object' && x !== null && !Array.isArray(x);

function fail(where: string, what: string): never {
  throw new WalkInvalid(`${where}: ${what}`);
}

function text(o: Obj, key: string, where: string, max: number, nonEmpty = false): string {
  const v = Object.hasOwn(o, key) ? o[key] : undefined;
  if (typeof v !== 'string') fail(where, `“${key}” must be text`);
  if (nonEmpty && v.trim() === '') fail(where, `“${key}” must not be empty`);
  if (v.length > max)
    fail(where, `“${key}” is ${v.length} characters long; at most ${max} are kept`);
  return v;
}

function num(o: Obj, key: string, where: string, lo: number, hi: number, nullable = false): void {
  const v = o[key];
  if (nullable && v === null) return;
  if (typeof v !== 'number' || !Number.isFinite(v) || v < lo || v > hi)
    fail(where, `“${key}” must be a number from ${lo} to ${hi}`);
}

function date(o: Obj, key: string, where: string, nullable = false): void {
  if (nullable && o[key] === null) return;
  if (Number.isNaN(Date.parse(text(o, key, where, 40)))) fail(where, `“${key}” must be a date`);
}

function list(o: Obj, key: string, where: string, max: number): unknown[] {
  const v = o[key];
  if (!Array.isArray(v)) fail(where, `“${key}” must be a list`);
  if (v.length > max) fail(where, `“${key}” has ${v.length} items; at most ${max} are kept`);
  return v;
}

/** Most tanks a walk or a forecast may name (far above a real site). */
const MAX_TANKS = 5000;

export function validateSite(f: unknown, i: number): SiteForecast {
  const where = `Site forecast ${i + 1}`;
  if (!isObj(f)) fail(where, 'is not an object');
  text(f, 'site', where, TEXT_LIMITS.site);
  list(f, 'days', where, 31).forEach((d, j) => {
    if (typeof d !== 'number' || !Number.isFinite(d) || d < T_CHECK_MIN_K || d > T_CHECK_MAX_K)
      fail(where, `day ${j + 1} must be a temperature from ${T_CHECK_MIN_K} to ${T_CHECK_MAX_K} K`);
  });
  num(f, 'sunAllowance', where, 0, 40);
  list(f, 'tankAllowances', where, MAX_TANKS).forEach((a, j) => {
    if (!isObj(a)) fail(where, `allowance ${j + 1} is not an object`);
    text(a, 'tankId', `${where}, allowance ${j + 1}`, TEXT_LIMITS.id, true);
    num(a, 'sunAllowance', `${where}, allowance ${j + 1}`, 0, 40);
  });
  date(f, 'enteredAt', where);
  if (f.route !== undefined)
    list(f, 'route', where, MAX_TANKS).forEach((id, j) => {
      if (typeof id !== 'string' || id.length > TEXT_LIMITS.id)
        fail(where, `route stop ${j + 1} must be a tank id`);
    });
  // The site's rules are optional: a backup from before them has none.
  const rules = siteRulesProblem(f);
  if (rules) fail(where, rules);
  return f as unknown as SiteForecast;
}

const STATUSES = ['pending', 'checked', 'unreached'];
const READING_KEYS = [
  'liquidTemperature',
  'gaugePercent',
  'levelHeight',
  'netMass',
  'pressureReadingGauge',
  'peakAirTemperature',
  'sunAllowance',
] as const;

function validateEntry(e: unknown, where: string): void {
  if (!isObj(e)) fail(where, 'is not an object');
  text(e, 'tankId', where, TEXT_LIMITS.id, true);
  text(e, 'tankName', where, TEXT_LIMITS.name);
  if (!STATUSES.includes(e.status as string))
    fail(where, `“status” must be one of ${STATUSES.join(', ')}`);
  text(e, 'note', where, TEXT_LIMITS.notes);
  text(e, 'reason', where, TEXT_LIMITS.notes);
  text(e, 'problem', where, TEXT_LIMITS.message);
  date(e, 'at', where, true);
  const r = e.readings;
  if (!isObj(r)) fail(where, '“readings” is missing');
  if (!['gaugePercent', 'levelHeight', 'netMass'].includes(r.contentsMode as string))
    fail(`${where}, readings`, '“contentsMode” is not known');
  for (const k of READING_KEYS) num(r, k, `${where}, readings`, -2e5, 1e8, true);
  if (r.takenAt !== undefined) date(r, 'takenAt', `${where}, readings`);
  if (e.result !== null) {
    const res = e.result;
    if (!isObj(res) || !isObj(res.summary) || !Array.isArray(res.cautions))
      fail(where, '“result” must hold a summary and its cautions');
    for (const k of [
      'designPressureGauge',
      'reliefSetPressureGauge',
      'peakTemperature',
      'peakLiquidPercent',
    ])
      num(res, k, `${where}, result`, -1e12, 1e12);
    num(res, 'liquidFullMargin', `${where}, result`, -1e3, 1e3, true);
    num(res, 'reliefMargin', `${where}, result`, -1e3, 1e3, true);
    res.cautions.forEach((c, j) => {
      if (!isObj(c)) fail(where, `caution ${j + 1} is not an object`);
      text(c, 'code', `${where}, caution ${j + 1}`, TEXT_LIMITS.message);
      text(c, 'message', `${where}, caution ${j + 1}`, TEXT_LIMITS.message);
    });
  }
}

export function validateWalkdown(w: unknown, i: number): WalkdownRecord {
  const where = `Walkdown ${i + 1}`;
  if (!isObj(w)) fail(where, 'is not an object');
  text(w, 'id', where, TEXT_LIMITS.id, true);
  text(w, 'site', where, TEXT_LIMITS.site);
  if (w.status !== 'in-progress' && w.status !== 'finished')
    fail(where, '“status” must be in-progress or finished');
  date(w, 'startedAt', where);
  date(w, 'finishedAt', where, true);
  text(w, 'checkedBy', where, TEXT_LIMITS.name);
  text(w, 'appVersion', where, TEXT_LIMITS.id);
  validateSite(w.forecast, i);
  const entries = list(w, 'entries', where, MAX_TANKS);
  entries.forEach((e, j) => validateEntry(e, `${where}, tank ${j + 1}`));
  num(w, 'current', where, 0, Math.max(0, entries.length - 1));
  return w as unknown as WalkdownRecord;
}

/** The forecasts and walkdowns of a parsed backup (empty lists for a version-1 file). */
export function validateWalkData(raw: Obj): {
  sites: SiteForecast[];
  walkdowns: WalkdownRecord[];
} {
  const sites = raw.sites === undefined ? [] : list(raw, 'sites', 'The file', 10_000);
  const walks = raw.walkdowns === undefined ? [] : list(raw, 'walkdowns', 'The file', 100_000);
  const out = { sites: sites.map(validateSite), walkdowns: walks.map(validateWalkdown) };
  const ids = new Set<string>();
  for (const w of out.walkdowns) {
    if (ids.has(w.id)) fail('A walkdown', 'has the same id as another walkdown in the file');
    ids.add(w.id);
  }
  return out;
}
