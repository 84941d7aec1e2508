/**
 * The site board, pure: every tank of a site projected to one site forecast from its latest
 * readings, and ranked worst first. No DOM, no storage; the board element and the walk call it.
 *
 * The ranking rule (shown on the board in `RANK_RULE`):
 *   1. by level: danger, warning, needs a reading, caution, notice, no caution;
 *   2. within a level, by the smaller of two margins, both in degrees of further warming above
 *      the forecast peak: to the relief setting (relief temperature − peak temperature) and to
 *      liquid-full (liquid-full temperature − peak temperature); the smaller first;
 *   3. then by tank name.
 * Degrees are used for both margins so the two can be compared at all: a pressure headroom and a
 * temperature margin have no common unit. A tank whose readings are missing or older than the
 * limit is never projected: it is listed as "needs a reading", below danger and warning (which
 * are known to be bad) and above the lesser levels (an unread tank could be anywhere).
 */
import { runCheck, summarize } from './check-input.js';
import { siteRulesOf, type SiteRule } from './site-rules.js';
import { routeOrder } from './walkdown-route.js';
import type { CheckRecord, CheckSummary, Readings, Settings, TankRecord } from './types.js';
import type { CautionLevel, TankCheckResult } from '../thermo/check/types.js';

export type BoardLevel = CautionLevel | 'ok' | 'needs-reading';

/** Levels in rank order, worst first. */
export const LEVEL_ORDER: readonly BoardLevel[] = [
  'danger',
  'warning',
  'needs-reading',
  'caution',
  'notice',
  'ok',
];

export const RANK_RULE =
  'Worst first: danger, warning, needs a reading, caution, notice, no caution; within a level, the smaller of the degrees left to the relief setting and to liquid-full; then by name.';

/** Default age, days, after which a tank's readings no longer count for the board. */
export const DEFAULT_STALE_DAYS = 7;

/** One site's forecast, SI. */
export interface SiteForecast {
  /** The site (as on the tanks). */
  site: string;
  /** Forecast peak air temperature of each day entered, K; the hottest counts. */
  days: number[];
  /** Sun allowance added to the peak air temperature, K (the site's default). */
  sunAllowance: number;
  /** Per-tank sun allowance where a tank is shaded or insulated, K. */
  tankAllowances: { tankId: string; sunAllowance: number }[];
  /** ISO 8601: when the forecast was entered. */
  enteredAt: string;
  /** Optional walk order: tank ids in the order of the site's route. */
  route?: string[];
  /** The site's rule set id (components/site-rules.ts); absent: US federal. Optional. */
  ruleSet?: string;
  /** The site's own stricter rule; absent: none. Optional. */
  siteRule?: SiteRule;
}

/** A tank's latest readings and when they were taken. */
export interface LatestReadings {
  readings: Readings;
  /** ISO 8601 */
  at: string;
  /** Where they came from: a saved check, a walk, or the invented demo readings. */
  source: 'check' | 'walk' | 'demo';
}

export interface BoardRow {
  tank: TankRecord;
  level: BoardLevel;
  /** Why a tank needs a reading (none, too old, incomplete, refused by the check), else null. */
  reason: string | null;
  /** Time of the readings used, ISO, or null when none. */
  readingsAt: string | null;
  /** Age of those readings, ms, or null. */
  ageMs: number | null;
  /** Sun allowance used for this tank, K. */
  sunAllowance: number;
  /** The full result (null when the tank needs a reading). */
  result: TankCheckResult | null;
  summary: CheckSummary | null;
  /** The readings projected (site forecast in place), or null. */
  readings: Readings | null;
  /** Peak liquid fraction → percent 0…100, or null. */
  peakLiquidPercent: number | null;
  /** Liquid-full temperature − peak temperature, K, or null when the tank cannot become liquid-full. */
  liquidFullMargin: number | null;
  /** Relief temperature − peak temperature, K, or null when the relief setting is not reached below 400 K. */
  reliefMargin: number | null;
}

/** The hottest day of the forecast, K, or null when no day is entered. */
export function forecastPeakAir(f: SiteForecast | null | undefined): number | null {
  const days = (f?.days ?? []).filter((t) => Number.isFinite(t));
  return days.length ? Math.max(...days) : null;
}

/** The sun allowance for one tank: its own when set, else the site's. */
export function allowanceFor(f: SiteForecast, tankId: string): number {
  return f.tankAllowances.find((a) => a.tankId === tankId)?.sunAllowance ?? f.sunAllowance;
}

/** When a check's readings were taken: their `takenAt` when present, else the check's saved time. */
export function checkTime(c: CheckRecord): string {
  return readingsTime(c.readings, c.at);
}

/** The readings' own `takenAt` when it is a readable time, else `recordTime`. */
export function readingsTime(r: Readings, recordTime: string): string {
  const t = r.takenAt;
  return typeof t === 'string' && !Number.isNaN(Date.parse(t)) ? t : recordTime;
}

/** The newest of the given candidates (checks, walk entries, demo readings), or null. */
export function newestReadings(candidates: readonly LatestReadings[]): LatestReadings | null {
  let best: LatestReadings | null = null;
  for (const c of candidates) {
    const t = Date.parse(c.at);
    if (Number.isNaN(t)) continue;
    if (!best || t > Date.parse(best.at)) best = c;
  }
  return best;
}

/** The board's row of a tank that is not projected (no readings, too old or incomplete). */
export function needsReading(
  tank: TankRecord,
  reason: string,
  latest: LatestReadings | null,
  ageMs: number | null,
  sun: number,
): BoardRow {
  return {
    tank,
    level: 'needs-reading',
    reason,
    readingsAt: latest?.at ?? null,
    ageMs,
    sunAllowance: sun,
    result: null,
    summary: null,
    readings: null,
    peakLiquidPercent: null,
    liquidFullMargin: null,
    reliefMargin: null,
  };
}

/** Readings with the site forecast in place of the tank's own forecast. */
export function withForecast(r: Readings, f: SiteForecast, tankId: string): Readings {
  const air = forecastPeakAir(f);
  return {
    ...r,
    peakAirTemperature: air ?? r.peakAirTemperature,
    sunAllowance: air === null ? r.sunAllowance : allowanceFor(f, tankId),
  };
}

/** Projects one tank to the site forecast. Never throws. */
export function projectTank(
  tank: TankRecord,
  latest: LatestReadings | null,
  forecast: SiteForecast,
  settings: Settings,
  now: Date,
  staleDays: number = DEFAULT_STALE_DAYS,
): BoardRow {
  const sun = allowanceFor(forecast, tank.id);
  if (!latest) return needsReading(tank, 'No readings yet', null, null, sun);
  const ageMs = now.getTime() - Date.parse(latest.at);
  if (!(ageMs <= staleDays * 86_400_000))
    return needsReading(tank, `Readings older than ${staleDays} days`, latest, ageMs, sun);
  const readings = withForecast(latest.readings, forecast, tank.id);
  const out = runCheck(tank, readings, settings, siteRulesOf(forecast));
  if (!out.result) {
    const why = out.error
      ? 'The check refused these readings'
      : `Missing ${out.missing.join(', ')}`;
    return needsReading(tank, why, latest, ageMs, sun);
  }
  const r = out.result;
  const summary = summarize(r);
  return {
    tank,
    level: summary.topLevel ?? 'ok',
    reason: null,
    readingsAt: latest.at,
    ageMs,
    sunAllowance: sun,
    result: r,
    summary,
    readings,
    peakLiquidPercent: r.peak.liquidFraction * 100,
    liquidFullMargin:
      r.liquidFullTemperature === null ? null : r.liquidFullTemperature - r.peak.temperature,
    reliefMargin: r.reliefTemperature === null ? null : r.reliefTemperature - r.peak.temperature,
  };
}

/** The smaller of the two margins, K (Infinity when neither applies). */
export function rankMargin(row: BoardRow): number {
  return Math.min(row.reliefMargin ?? Infinity, row.liquidFullMargin ?? Infinity);
}

const collator = new Intl.Collator(undefined, { numeric: true, sensitivity: 'base' });

/** Compares two rows by `RANK_RULE`. */
export function compareRows(a: BoardRow, b: BoardRow): number {
  const la = LEVEL_ORDER.indexOf(a.level);
  const lb = LEVEL_ORDER.indexOf(b.level);
  if (la !== lb) return la - lb;
  const ma = rankMargin(a);
  const mb = rankMargin(b);
  if (ma !== mb) return ma < mb ? -1 : 1;
  return collator.compare(a.tank.name, b.tank.name);
}

/** Rows ranked worst first (a new array). */
export function rankRows(rows: readonly BoardRow[]): BoardRow[] {
  return [...rows].sort(compareRows);
}

/**
 * The walk order: the site's route where the user set one (tanks not on it follow in board
 * order), else the board order.
 */
export function walkOrder(ranked: readonly BoardRow[], route?: readonly string[]): string[] {
  return routeOrder(
    ranked.map((r) => r.tank.id),
    route,
  );
}
