/**
 * Where a tank's latest readings come from, for the site board: the newest of its saved checks
 * (their readings' `takenAt` when present, else the time saved), the tanks checked on walkdowns, and — for
 * an invented demo tank with neither — the demo readings it was seeded with, at the seed time.
 */
import type { CheckRecord, Settings, TankRecord } from '../components/types.js';
import {
  DEFAULT_STALE_DAYS,
  checkTime,
  readingsTime,
  newestReadings,
  type LatestReadings,
} from '../components/walkdown-board.js';
import type { WalkdownRecord } from '../components/walkdown-types.js';
import type { Store } from './storage.js';

/** The site a tank is grouped under (as on the tank list). */
export function siteOf(t: TankRecord): string {
  return t.site.trim() || 'No site';
}

/** The age limit of readings for the board, days (Settings, default 7). */
export function staleDays(settings: Settings): number {
  // Settings from before this field was added have none.
  const d = settings.staleReadingDays as number | undefined;
  return typeof d === 'number' && Number.isFinite(d) && d > 0 ? d : DEFAULT_STALE_DAYS;
}

export async function latestReadingsFor(
  store: Store,
  tanks: readonly TankRecord[],
  checks: readonly CheckRecord[],
  walkdowns: readonly WalkdownRecord[],
): Promise<Map<string, LatestReadings | null>> {
  const candidates = new Map<string, LatestReadings[]>();
  const add = (id: string, c: LatestReadings) => {
    const list = candidates.get(id);
    if (list) list.push(c);
    else candidates.set(id, [c]);
  };
  const ids = new Set(tanks.map((t) => t.id));
  for (const c of checks)
    if (ids.has(c.tankId))
      add(c.tankId, { readings: c.readings, at: checkTime(c), source: 'check' });
  for (const w of walkdowns)
    for (const e of w.entries)
      if (ids.has(e.tankId) && e.status === 'checked' && e.result && e.at)
        add(e.tankId, { readings: e.readings, at: e.at, source: 'walk' });
  // A demo tank with no check reads its seeded readings: all such reads at once, not in turn.
  const drafts = await Promise.all(
    tanks.map((t) => (t.demo && !candidates.has(t.id) ? store.getDraft(t.id) : undefined)),
  );
  const out = new Map<string, LatestReadings | null>();
  tanks.forEach((t, i) => {
    const draft = drafts[i];
    const list = candidates.get(t.id) ?? [];
    if (list.length === 0 && draft)
      list.push({
        readings: draft.readings,
        at: readingsTime(draft.readings, draft.updatedAt),
        source: 'demo',
      });
    out.set(t.id, newestReadings(list));
  });
  return out;
}
