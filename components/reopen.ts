/**
 * Readings have a time. Reopening a tank starts from blank readings unless the kept draft was
 * typed during this visit; older readings are offered as "last check, ‹date›" with one tap to
 * reuse them, and reused readings carry their age on screen. Plain functions, no DOM.
 */
import {
  emptyReadings,
  type CheckRecord,
  type CheckSummary,
  type DraftRecord,
  type Readings,
} from './types.js';

/** Readings typed less than this long ago belong to the same visit and are restored as they are, ms. */
export const SAME_VISIT_MS = 30 * 60_000;

/** The readings a person measures on site (the forecast is not a reading of the tank). */
const MEASURED = [
  'liquidTemperature',
  'gaugePercent',
  'levelHeight',
  'netMass',
  'pressureReadingGauge',
] as const;

/** A previous set of readings, with when it was taken and, for a saved check, its key figures. */
export interface LastReadings {
  readings: Readings;
  /** ISO 8601 time the readings were taken. */
  at: string;
  source: 'draft' | 'check';
  /** Key figures of a saved check (as saved then), or null for an unsaved draft. */
  summary: CheckSummary | null;
}

/** True when any measured reading is entered. */
export function hasMeasured(r: Readings): boolean {
  return MEASURED.some((k) => r[k] !== null && r[k] !== undefined);
}

/** True when a measured reading differs between `a` and `b` (or the contents mode changed). */
export function measuredChanged(a: Readings, b: Readings): boolean {
  return a.contentsMode !== b.contentsMode || MEASURED.some((k) => a[k] !== b[k]);
}

/** When a set of readings was taken: its own time, else the record's time. */
export function takenAt(r: Readings, recordTime: string): string {
  return r.takenAt ?? recordTime;
}

/** True when readings taken at `at` are older than this visit. An unreadable time counts as old. */
export function isOld(at: string | undefined, now: Date): boolean {
  if (at === undefined) return false;
  const t = Date.parse(at);
  return !Number.isFinite(t) || now.getTime() - t >= SAME_VISIT_MS;
}

export interface Opening {
  /** Readings the screen starts from. */
  readings: Readings;
  /** A previous set offered for reuse, or null. */
  last: LastReadings | null;
}

/**
 * What a reopened tank starts from: the draft when it was typed during this visit, else blank
 * readings with the draft offered as the last readings.
 */
export function openingReadings(
  draft: DraftRecord | undefined,
  sunAllowance: number,
  now = new Date(),
): Opening {
  const blank = emptyReadings(sunAllowance);
  if (!draft || !hasMeasured(draft.readings))
    return { readings: draft?.readings ?? blank, last: null };
  const at = takenAt(draft.readings, draft.updatedAt);
  if (!isOld(at, now)) return { readings: { ...draft.readings, takenAt: at }, last: null };
  return {
    readings: { ...blank, sunAllowance: draft.readings.sunAllowance ?? sunAllowance },
    last: { readings: { ...draft.readings, takenAt: at }, at, source: 'draft', summary: null },
  };
}

/** The newest of an old draft and the saved checks (newest first or in any order). */
export function lastReadings(
  draft: LastReadings | null,
  checks: CheckRecord[],
): LastReadings | null {
  let best = draft;
  for (const c of checks) {
    const at = takenAt(c.readings, c.at);
    if (!best || Date.parse(at) > Date.parse(best.at))
      best = { readings: { ...c.readings, takenAt: at }, at, source: 'check', summary: c.summary };
  }
  return best;
}

/** How old a time is, in words: "5 min", "3 h", "4 days". */
export function ageText(at: string, now = new Date()): string {
  const ms = Math.max(0, now.getTime() - Date.parse(at));
  const min = Math.floor(ms / 60_000);
  if (min < 60) return `${min} min`;
  const h = Math.floor(min / 60);
  if (h < 48) return `${h} h`;
  return `${Math.floor(h / 24)} days`;
}

/** A date and time for a reading, e.g. "2 Dec 2026, 14:05" (the user's locale). */
export function whenText(at: string): string {
  const d = new Date(at);
  if (!Number.isFinite(d.getTime())) return 'an unknown time';
  return d.toLocaleString(undefined, { dateStyle: 'medium', timeStyle: 'short' });
}
