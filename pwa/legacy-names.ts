/**
 * Stored pressure names before they said gauge or absolute (storage v1–v4, backup formats 1
 * and 2, team records written by an app from before) → the names records carry now. One table,
 * three users: the storage upgrade to v5 (pwa/storage-schema.ts), the backup import of an older
 * file (pwa/backup.ts) and a team record arriving from a phone not yet updated
 * (pwa/sync/record-schema.ts).
 *
 * Each function takes a record as read (unknown shape) and gives it back with the old names
 * renamed; values are never changed, everything else is kept, a record without the field stays
 * as it was (the same object when nothing was renamed), and a record that already has the new
 * name keeps it. Anything that is not an object passes through untouched: the validators that
 * follow refuse it with their usual message.
 */

type Obj = Record<string, unknown>;
type Pairs = readonly (readonly [old: string, now: string])[];

/** Old name → new name, by where the field sits. */
export const LEGACY_NAMES = {
  /** `TankRecord.nameplate` (TankInput), and a fill's `start.check.tank`. */
  nameplate: [
    ['designPressure', 'designPressureGauge'],
    ['reliefSetPressure', 'reliefSetPressureGauge'],
  ],
  /** `Readings` (checks, drafts, walk entries). */
  readings: [['gaugePressure', 'pressureReadingGauge']],
  /** `CheckSummary` (checks, walk results). */
  summary: [
    ['pressure', 'pGauge'],
    ['peakPressure', 'peakGauge'],
  ],
  /** `WalkResult` (a walk entry's figures). */
  walkResult: [
    ['designPressure', 'designPressureGauge'],
    ['reliefSetPressure', 'reliefSetPressureGauge'],
  ],
  /** `Settings`. */
  settings: [['gaugeFullScale', 'gaugeFullScaleGauge']],
  /** `Settings.barometer`. */
  barometer: [['pressure', 'pressureAbs']],
  /** `TankCheckInput` (a fill's `start.check`). */
  checkInput: [
    ['gaugePressure', 'pressureReadingGauge'],
    ['barometricPressure', 'barometricPressureAbs'],
  ],
  /** `TankCheckInput.pressureGauge`. */
  pressureGauge: [['fullScale', 'fullScaleGauge']],
  /** `FillRecord.after`. */
  afterReadings: [['gaugePressure', 'pressureReadingGauge']],
  /** `FillRecord.result.pressure`. */
  fillPressure: [
    ['reading', 'readingGauge'],
    ['expected', 'expectedGauge'],
  ],
  /** `FillDraft`. */
  fillDraft: [['afterPressure', 'afterPressureGauge']],
} as const satisfies Record<string, Pairs>;

function isObj(x: unknown): x is Obj {
  return typeof x === 'object' && x !== null && !Array.isArray(x);
}

function has(o: Obj, key: string): boolean {
  return Object.prototype.hasOwnProperty.call(o, key);
}

/** `x` with each old name moved to its new one (a copy when anything moved). */
function renamed(x: unknown, pairs: Pairs): unknown {
  if (!isObj(x) || !pairs.some(([old]) => has(x, old))) return x;
  const out: Obj = { ...x };
  for (const [old, now] of pairs) {
    if (!has(out, old)) continue;
    if (!has(out, now)) out[now] = out[old];
    delete out[old];
  }
  return out;
}

/** `x` with `key` replaced by `fn(x[key])` when that changes it (a copy), else `x`. */
function inside(x: unknown, key: string, fn: (v: unknown) => unknown): unknown {
  if (!isObj(x) || !has(x, key)) return x;
  const v = fn(x[key]);
  return v === x[key] ? x : { ...x, [key]: v };
}

/** A list with `fn` applied to each item (a copy when any changed), else `x`. */
function eachOf(x: unknown, fn: (v: unknown) => unknown): unknown {
  if (!Array.isArray(x)) return x;
  const out = x.map(fn);
  return out.some((v, i) => v !== x[i]) ? out : x;
}

const N = LEGACY_NAMES;

export function upgradeTank(t: unknown): unknown {
  return inside(t, 'nameplate', (np) => renamed(np, N.nameplate));
}

export function upgradeCheck(c: unknown): unknown {
  const r = inside(c, 'readings', (x) => renamed(x, N.readings));
  return inside(r, 'summary', (s) => renamed(s, N.summary));
}

/** A check draft (`DraftRecord`). */
export function upgradeDraft(d: unknown): unknown {
  return inside(d, 'readings', (x) => renamed(x, N.readings));
}

export function upgradeSettings(s: unknown): unknown {
  const r = renamed(s, N.settings);
  return inside(r, 'barometer', (b) => renamed(b, N.barometer));
}

/** A tank check's input as a fill keeps it. */
function upgradeCheckInput(ci: unknown): unknown {
  let r = renamed(ci, N.checkInput);
  r = inside(r, 'tank', (t) => renamed(t, N.nameplate));
  return inside(r, 'pressureGauge', (g) => renamed(g, N.pressureGauge));
}

function upgradeFillStart(s: unknown): unknown {
  return inside(s, 'check', upgradeCheckInput);
}

export function upgradeFill(f: unknown): unknown {
  let r = inside(f, 'start', upgradeFillStart);
  r = inside(r, 'after', (a) => renamed(a, N.afterReadings));
  return inside(r, 'result', (res) => inside(res, 'pressure', (p) => renamed(p, N.fillPressure)));
}

/** A fill under way (`FillDraft`). */
export function upgradeFillDraft(d: unknown): unknown {
  const r = renamed(d, N.fillDraft);
  return inside(r, 'start', upgradeFillStart);
}

function upgradeWalkEntry(e: unknown): unknown {
  const r = inside(e, 'readings', (x) => renamed(x, N.readings));
  return inside(r, 'result', (res) =>
    inside(renamed(res, N.walkResult), 'summary', (s) => renamed(s, N.summary)),
  );
}

export function upgradeWalkdown(w: unknown): unknown {
  return inside(w, 'entries', (list) => eachOf(list, upgradeWalkEntry));
}
