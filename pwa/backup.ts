/**
 * The JSON backup file: its format, and a validator that refuses a bad or foreign file with a
 * reason a person can act on. Validation is complete before anything is written, so a refused
 * file changes nothing. Hand-written rather than a schema library: the format is small and the
 * bundle budget is tight.
 *
 * Format history:
 *   1  { format: 'tankside-backup', version: 1, exportedAt, tanks, checks, settings }
 *   2  adds `fills` (fill records, pwa/fill-backup.ts), `sites` (site forecasts) and `walkdowns`
 *      (pwa/walkdown-backup.ts); a format-1 file reads as one with none of them and imports whole.
 *   3  the same records with every pressure named gauge or absolute (`designPressureGauge`,
 *      `pressureReadingGauge`, `pGauge`, `barometer.pressureAbs`, …; pwa/legacy-names.ts has
 *      the whole table); a format-1 or -2 file is renamed on the way in, values unchanged.
 */
import type { DataSet } from './storage.js';
import type { FillRecord } from '../thermo/fill/index.js';
import { FillBackupError, validateBackupFills } from './fill-backup.js';
import {
  DEFAULT_SETTINGS,
  type CheckRecord,
  type CheckSummary,
  type Readings,
  type Settings,
  type TankRecord,
} from '../components/types.js';
import { TEXT_LIMITS } from '../components/limits.js';
import type { NumberFormatId } from '../components/number-parse.js';
import type { SiteForecast, WalkdownRecord } from '../components/walkdown-types.js';
import { WalkInvalid, validateWalkData } from './walkdown-backup.js';
import {
  upgradeCheck,
  upgradeFill,
  upgradeSettings,
  upgradeTank,
  upgradeWalkdown,
} from './legacy-names.js';

export const BACKUP_FORMAT = 'tankside-backup';
export const BACKUP_VERSION = 3;
/** Larger files are refused before they are read (a register of thousands of checks is far smaller). */
export const BACKUP_MAX_BYTES = 20 * 1024 * 1024;

export interface BackupFile {
  format: typeof BACKUP_FORMAT;
  version: number;
  exportedAt: string;
  tanks: TankRecord[];
  checks: CheckRecord[];
  settings: Settings | null;
  /** From format 2 on. */
  fills?: FillRecord[];
  sites: SiteForecast[];
  walkdowns: WalkdownRecord[];
}

export function makeBackup(data: DataSet, now = new Date()): BackupFile {
  return {
    format: BACKUP_FORMAT,
    version: BACKUP_VERSION,
    exportedAt: now.toISOString(),
    ...data,
    sites: data.sites ?? [],
    walkdowns: data.walkdowns ?? [],
  };
}

export type ParseResult = { ok: true; data: DataSet } | { ok: false; reason: string };

/** A refusal naming where and what (exported for the team server's record check). */
export class Invalid extends Error {}

type Obj = Record<string, unknown>;

function isObj(x: unknown): x is Obj {
  return typeof x === 'object' && x !== null && !Array.isArray(x);
}

function fail(where: string, what: string): never {
  throw new Invalid(`${where}: ${what}`);
}

function str(
  o: Obj,
  key: string,
  where: string,
  nonEmpty = false,
  maxLength: number = TEXT_LIMITS.message,
): string {
  const v = Object.hasOwn(o, key) ? o[key] : undefined;
  if (typeof v !== 'string') fail(where, `“${key}” must be text`);
  if (nonEmpty && v.trim() === '') fail(where, `“${key}” must not be empty`);
  if (v.length > maxLength)
    fail(where, `“${key}” is ${v.length} characters long; at most ${maxLength} are kept`);
  return v;
}

function num(o: Obj, key: string, where: string, lo: number, hi: number): number {
  const v = o[key];
  if (typeof v !== 'number' || !Number.isFinite(v) || v < lo || v > hi)
    fail(where, `“${key}” must be a number from ${lo} to ${hi}`);
  return v;
}

function optNum(o: Obj, key: string, where: string, lo: number, hi: number): void {
  if (o[key] !== undefined) num(o, key, where, lo, hi);
}

function nullableNum(o: Obj, key: string, where: string, lo: number, hi: number): void {
  if (o[key] !== null) num(o, key, where, lo, hi);
}

function oneOf<T extends string>(
  o: Obj,
  key: string,
  where: string,
  allowed: readonly T[],
  optional = false,
): void {
  const v = o[key];
  if (optional && v === undefined) return;
  if (typeof v !== 'string' || !(allowed as readonly string[]).includes(v))
    fail(where, `“${key}” must be one of ${allowed.join(', ')}`);
}

function bool(o: Obj, key: string, where: string, optional = false): void {
  const v = o[key];
  if (optional && v === undefined) return;
  if (typeof v !== 'boolean') fail(where, `“${key}” must be true or false`);
}

function date(o: Obj, key: string, where: string): void {
  const v = str(o, key, where);
  if (Number.isNaN(Date.parse(v))) fail(where, `“${key}” must be a date`);
}

export function validateTank(t: unknown, i: number): TankRecord {
  const where = `Tank ${i + 1}`;
  if (!isObj(t)) fail(where, 'is not an object');
  const name = str(t, 'name', where, true, TEXT_LIMITS.name);
  const w = `${where} (“${name}”)`;
  str(t, 'id', w, true, TEXT_LIMITS.id);
  str(t, 'site', w, false, TEXT_LIMITS.site);
  str(t, 'notes', w, false, TEXT_LIMITS.notes);
  str(t, 'productId', w, true, TEXT_LIMITS.product);
  bool(t, 'demo', w);
  date(t, 'createdAt', w);
  date(t, 'updatedAt', w);
  const np = t.nameplate;
  if (!isObj(np)) fail(w, '“nameplate” is missing');
  const nw = `${w}, nameplate`;
  num(np, 'waterCapacity', nw, 1e-4, 1e5);
  num(np, 'designPressureGauge', nw, 1e4, 1e8);
  optNum(np, 'reliefSetPressureGauge', nw, 1e4, 1e8);
  oneOf(np, 'placement', nw, ['aboveground', 'underground'] as const, true);
  oneOf(np, 'containerClass', nw, ['storage', 'cylinder', 'cargo', 'portable'] as const, true);
  bool(np, 'insulated', nw, true);
  bool(np, 'fixedDipTube', nw, true);
  oneOf(np, 'fillMethod', nw, ['gauge', 'fixed-gauge', 'weight'] as const, true);
  optNum(np, 'minDesignMetalTemperature', nw, 73.15, 373.15);
  if (np.recovery !== undefined) {
    if (!isObj(np.recovery)) fail(nw, '“recovery” is not an object');
    optNum(np.recovery, 'fillFraction', `${nw}, recovery`, 0.5, 0.95);
  }
  if (np.shape !== undefined) {
    const s = np.shape;
    if (!isObj(s)) fail(nw, '“shape” is not an object');
    oneOf(s, 'kind', `${nw}, shape`, [
      'horizontal-cylinder',
      'vertical-cylinder',
      'sphere',
    ] as const);
    num(s, 'diameter', `${nw}, shape`, 0.05, 50);
    if (s.kind !== 'sphere') {
      oneOf(s, 'heads', `${nw}, shape`, ['hemispherical', 'ellipsoidal', 'flat'] as const);
      num(s, 'shellLength', `${nw}, shape`, 0, 200);
    }
  }
  return t as unknown as TankRecord;
}

function validateReadings(r: unknown, where: string): Readings {
  if (!isObj(r)) fail(where, '“readings” is missing');
  const w = `${where}, readings`;
  oneOf(r, 'contentsMode', w, ['gaugePercent', 'levelHeight', 'netMass'] as const);
  nullableNum(r, 'liquidTemperature', w, 0, 1000);
  nullableNum(r, 'gaugePercent', w, 0, 100);
  nullableNum(r, 'levelHeight', w, 0, 1e3);
  nullableNum(r, 'netMass', w, 0, 1e8);
  nullableNum(r, 'pressureReadingGauge', w, -2e5, 1e8);
  nullableNum(r, 'peakAirTemperature', w, 0, 1000);
  nullableNum(r, 'sunAllowance', w, 0, 100);
  return r as unknown as Readings;
}

const NUMBER_FORMAT_IDS: readonly NumberFormatId[] = [
  'auto',
  'point',
  'point-space',
  'comma',
  'comma-space',
];

const LEVELS = ['danger', 'warning', 'caution', 'notice'] as const;

function validateSummary(s: unknown, where: string): CheckSummary {
  if (!isObj(s)) fail(where, '“summary” is missing');
  const w = `${where}, summary`;
  oneOf(s, 'phase', w, ['two-phase', 'liquid-full', 'vapour-only', 'supercritical'] as const);
  for (const k of [
    'pGauge',
    'totalMass',
    'liquidVolume',
    'fillingDensity',
    'maxMass',
    'roomLeftMass',
    'stopAtGaugePercent',
    'peakTemperature',
    'peakGauge',
    'peakLiquidFraction',
    'headroomToDesign',
    'headroomToRelief',
  ]) {
    num(s, k, w, -1e12, 1e12);
  }
  str(s, 'binding', w);
  if (s.peakGaugeUpper !== undefined) num(s, 'peakGaugeUpper', w, -1e12, 1e12);
  if (s.peakAllowance !== undefined) num(s, 'peakAllowance', w, 0, 1);
  nullableNum(s, 'liquidFullTemperature', w, 0, 1000);
  if (s.topLevel !== null) oneOf(s, 'topLevel', w, LEVELS);
  if (!Array.isArray(s.cautions)) fail(w, '“cautions” must be a list');
  s.cautions.forEach((c, j) => {
    if (!isObj(c)) fail(`${w}, caution ${j + 1}`, 'is not an object');
    oneOf(c, 'level', `${w}, caution ${j + 1}`, LEVELS);
    str(c, 'code', `${w}, caution ${j + 1}`);
    str(c, 'message', `${w}, caution ${j + 1}`);
  });
  return s as unknown as CheckSummary;
}

/** `tankIds` null: the tank is not checked (a synced check may arrive before its tank). */
export function validateCheck(c: unknown, i: number, tankIds: Set<string> | null): CheckRecord {
  const where = `Check ${i + 1}`;
  if (!isObj(c)) fail(where, 'is not an object');
  str(c, 'id', where, true, TEXT_LIMITS.id);
  const tankId = str(c, 'tankId', where, true, TEXT_LIMITS.id);
  if (tankIds && !tankIds.has(tankId)) fail(where, 'belongs to a tank that is not in the file');
  date(c, 'at', where);
  str(c, 'productLabel', where, false, TEXT_LIMITS.product);
  bool(c, 'demo', where);
  validateReadings(c.readings, where);
  validateSummary(c.summary, where);
  return c as unknown as CheckRecord;
}

function validateSettings(s: unknown): Settings {
  const where = 'Settings';
  if (!isObj(s)) fail(where, 'is not an object');
  const u = s.units;
  if (!isObj(u)) fail(where, '“units” is missing');
  oneOf(u, 'pressure', `${where}, units`, ['psig', 'barg', 'kPag'] as const);
  oneOf(u, 'temperature', `${where}, units`, ['F', 'C'] as const);
  oneOf(u, 'volume', `${where}, units`, ['usgal', 'L', 'm3'] as const);
  oneOf(u, 'mass', `${where}, units`, ['lb', 'kg'] as const);
  oneOf(u, 'length', `${where}, units`, ['in', 'cm', 'ft', 'm'] as const);
  const b = s.barometer;
  if (!isObj(b)) fail(where, '“barometer” is missing');
  oneOf(b, 'mode', `${where}, barometer`, ['standard', 'pressure', 'elevation'] as const);
  num(b, 'pressureAbs', `${where}, barometer`, 20_000, 120_000);
  num(b, 'elevation', `${where}, barometer`, -500, 11_000);
  num(s, 'gaugeAccuracy', where, 0, 0.2);
  nullableNum(s, 'gaugeFullScaleGauge', where, 1e4, 1e8);
  num(s, 'thermometerTolerance', where, 0, 10);
  num(s, 'sunAllowance', where, 0, 40);
  oneOf(s, 'theme', where, ['standard', 'outdoor'] as const);
  oneOf(s, 'numberFormat', where, NUMBER_FORMAT_IDS, true);
  optNum(s, 'fillGaugePoints', where, 0, 20);
  optNum(s, 'fillMeterFraction', where, 0, 0.1);
  bool(s, 'fillMeterCompensated', where, true);
  optNum(s, 'staleReadingDays', where, 1, 365);
  return { ...DEFAULT_SETTINGS, ...(s as unknown as Settings) };
}

const list = (x: unknown, upgrade: (r: unknown) => unknown): unknown =>
  Array.isArray(x) ? x.map(upgrade) : x;

/** A format-1 or -2 file's records under the names of format 3 (the values as they were). */
function withNewNames(raw: Obj): Obj {
  return {
    ...raw,
    tanks: list(raw.tanks, upgradeTank),
    checks: list(raw.checks, upgradeCheck),
    settings: upgradeSettings(raw.settings),
    fills: list(raw.fills, upgradeFill),
    walkdowns: list(raw.walkdowns, upgradeWalkdown),
  };
}

/** Every record of a file (in format-3 names), validated whole; throws on the first fault. */
function validateFile(file: Obj): DataSet {
  if (!Array.isArray(file.tanks)) fail('The file', '“tanks” must be a list');
  if (!Array.isArray(file.checks)) fail('The file', '“checks” must be a list');
  const tanks = file.tanks.map(validateTank);
  const tankIds = new Set<string>();
  for (const t of tanks) {
    if (tankIds.has(t.id)) fail(`Tank “${t.name}”`, 'has the same id as another tank in the file');
    tankIds.add(t.id);
  }
  const checks = file.checks.map((c, i) => validateCheck(c, i, tankIds));
  const checkIds = new Set<string>();
  for (const c of checks) {
    if (checkIds.has(c.id)) fail('A check', 'has the same id as another check in the file');
    checkIds.add(c.id);
  }
  const settings =
    file.settings === null || file.settings === undefined ? null : validateSettings(file.settings);
  const fills = validateBackupFills(file.fills, tankIds);
  const { sites, walkdowns } = validateWalkData(file);
  return { tanks, checks, settings, fills, sites, walkdowns };
}

/** Reads and validates a backup file's text. Never throws. */
export function parseBackup(text: string): ParseResult {
  let raw: unknown;
  try {
    raw = JSON.parse(text);
  } catch {
    return { ok: false, reason: 'This file is not a backup: it is not JSON text.' };
  }
  if (!isObj(raw) || raw.format !== BACKUP_FORMAT) {
    return {
      ok: false,
      reason:
        'This file is not a backup from this app (it has no "format": "tankside-backup" field).',
    };
  }
  if (typeof raw.version !== 'number' || !Number.isInteger(raw.version) || raw.version < 1) {
    return { ok: false, reason: 'This backup has no valid version number.' };
  }
  if (raw.version > BACKUP_VERSION) {
    return {
      ok: false,
      reason: `This backup was made by a newer version of the app (format ${raw.version}); update the app, then import it.`,
    };
  }
  try {
    return { ok: true, data: validateFile(raw.version < 3 ? withNewNames(raw) : raw) };
  } catch (e) {
    if (e instanceof Invalid || e instanceof FillBackupError || e instanceof WalkInvalid)
      return {
        ok: false,
        reason: `This backup cannot be imported. ${e.message}. Nothing was changed.`,
      };
    return { ok: false, reason: 'This backup cannot be read. Nothing was changed.' };
  }
}
