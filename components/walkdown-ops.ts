/**
 * The walk's steps as pure functions over a `WalkdownRecord`: start it in the board's (or the
 * route's) order, record a tank, mark one "could not reach", move on, finish. Each returns a new
 * record, so the caller saves after every step and a reload resumes exactly where it was.
 */
import { productLabel } from './products.js';
import type { Readings, Settings, TankRecord } from './types.js';
import {
  projectTank,
  walkOrder,
  type BoardRow,
  type LatestReadings,
  type SiteForecast,
} from './walkdown-board.js';
import {
  APP_VERSION,
  type WalkEntry,
  type WalkResult,
  type WalkdownRecord,
} from './walkdown-types.js';
import { emptyReadings, newId } from './types.js';

/** The figures kept for a projected tank (null when it needs a reading). */
export function walkResult(row: BoardRow): WalkResult | null {
  const r = row.result;
  if (!r || !row.summary || row.peakLiquidPercent === null) return null;
  const np = row.tank.nameplate;
  return {
    level: row.level,
    productLabel: r.product.label || productLabel(row.tank.productId),
    designPressureGauge: np.designPressureGauge,
    reliefSetPressureGauge: np.reliefSetPressureGauge ?? np.designPressureGauge,
    peakTemperature: r.peak.temperature,
    peakPhase: r.peak.phase,
    peakLiquidPercent: row.peakLiquidPercent,
    liquidFullMargin: row.liquidFullMargin,
    reliefMargin: row.reliefMargin,
    summary: row.summary,
    cautions: structuredClone(r.cautions),
  };
}

/**
 * Starts a walk over the ranked board: in the site route's order when one is set and `order` is
 * 'route' (the default), else worst first as on the board.
 */
export function startWalk(
  site: string,
  ranked: readonly BoardRow[],
  forecast: SiteForecast,
  latest: ReadonlyMap<string, LatestReadings | null>,
  checkedBy: string,
  sunAllowance: number,
  now = new Date(),
  order: 'board' | 'route' = 'route',
): WalkdownRecord {
  const byId = new Map(ranked.map((r) => [r.tank.id, r]));
  const route = order === 'route' ? forecast.route : undefined;
  const entries: WalkEntry[] = walkOrder(ranked, route).map((id) => {
    const row = byId.get(id)!;
    const from = latest.get(id)?.readings;
    return {
      tankId: id,
      tankName: row.tank.name,
      status: 'pending',
      // Start from the tank's latest readings, so only what changed need be typed.
      readings: from ? structuredClone(from) : emptyReadings(sunAllowance),
      note: '',
      reason: '',
      at: null,
      result: null,
      problem: '',
    };
  });
  return {
    id: newId(),
    site,
    status: 'in-progress',
    startedAt: now.toISOString(),
    finishedAt: null,
    checkedBy,
    forecast: structuredClone(forecast),
    entries,
    current: 0,
    appVersion: APP_VERSION,
  };
}

function withEntry(w: WalkdownRecord, i: number, e: WalkEntry): WalkdownRecord {
  const entries = w.entries.slice();
  entries[i] = e;
  return { ...w, entries };
}

/** Keeps what is being typed for the tank on screen (not yet checked). */
export function editEntry(
  w: WalkdownRecord,
  i: number,
  change: { readings?: Readings; note?: string; reason?: string },
): WalkdownRecord {
  const e = w.entries[i];
  if (!e) return w;
  return withEntry(w, i, { ...e, ...change });
}

/** Records the tank as checked: its figures at the walk's forecast, from the readings entered. */
export function checkEntry(
  w: WalkdownRecord,
  i: number,
  tank: TankRecord | undefined,
  settings: Settings,
  now = new Date(),
): WalkdownRecord {
  const e = w.entries[i];
  if (!e) return w;
  const at = now.toISOString();
  if (!tank)
    return withEntry(w, i, { ...e, status: 'checked', at, result: null, problem: 'Tank deleted' });
  // Looked at on the walk: the readings count as taken now.
  const readings = { ...e.readings, takenAt: at };
  const row = projectTank(tank, { readings, at, source: 'walk' }, w.forecast, settings, now);
  const result = walkResult(row);
  return withEntry(w, i, {
    ...e,
    readings,
    status: 'checked',
    reason: '',
    at,
    result,
    problem: result ? '' : (row.reason ?? 'No result'),
  });
}

/** Marks the tank "could not reach", with the reason given. */
export function skipEntry(
  w: WalkdownRecord,
  i: number,
  reason: string,
  now = new Date(),
): WalkdownRecord {
  const e = w.entries[i];
  if (!e) return w;
  return withEntry(w, i, {
    ...e,
    status: 'unreached',
    reason: reason.trim() || 'No reason given',
    at: now.toISOString(),
    result: null,
    problem: '',
  });
}

/** Moves to tank `i` (clamped). */
export function goTo(w: WalkdownRecord, i: number): WalkdownRecord {
  return { ...w, current: Math.max(0, Math.min(w.entries.length - 1, i)) };
}

/** The next tank not yet done after the current one, else the current one's successor. */
export function nextIndex(w: WalkdownRecord): number {
  const n = w.entries.length;
  for (let k = 1; k <= n; k++) {
    const j = (w.current + k) % n;
    if (w.entries[j]!.status === 'pending') return j;
  }
  return Math.min(n - 1, w.current + 1);
}

/** Finishes the walk. Tanks never reached keep `pending` and read as "not visited" in the record. */
export function finishWalk(w: WalkdownRecord, checkedBy: string, now = new Date()): WalkdownRecord {
  return { ...w, status: 'finished', finishedAt: now.toISOString(), checkedBy: checkedBy.trim() };
}
