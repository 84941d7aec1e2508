/**
 * Words for the board, the walk and the record: each level by word and shape (never colour
 * alone), the figures of a row in the user's units rounded toward safety, the age of readings,
 * and the walkdown as shareable text. Plain module; the elements and the CSV use it.
 */
import { upperDiffers, upperShort, type UpperPeak } from './peak-words.js';
import type { DisplayUnits } from './display.js';
import { formatPercent } from './display.js';
import type { BoardLevel } from './walkdown-board.js';
import type { WalkEntry, WalkResult, WalkdownRecord } from './walkdown-types.js';
import type { Caution } from '../thermo/check/types.js';
import { forecastPeakAir } from './walkdown-board.js';
import { cautionText as messageText } from './messages.js';
import { STANDING_CAUTION } from '../thermo/check/standing.js';

export const LEVEL_WORDS: Record<BoardLevel, string> = {
  danger: 'Danger',
  warning: 'Warning',
  caution: 'Caution',
  notice: 'Notice',
  ok: 'No caution',
  'needs-reading': 'Needs a reading',
};

/** A shape per level, so the level reads without colour (and in black-and-white print). */
export const LEVEL_SHAPES: Record<BoardLevel, string> = {
  danger: '◆',
  warning: '▲',
  caution: '■',
  notice: '●',
  ok: '○',
  'needs-reading': '?',
};

/** The standing caution on every walkdown screen and record: the engine's own. */
export const STANDING_WALK = STANDING_CAUTION;

/** The age of readings in words: "40 min", "5 h", "3 d". */
export function ageText(ms: number | null): string {
  if (ms === null || !Number.isFinite(ms)) return 'no readings';
  const min = Math.max(0, Math.round(ms / 60_000));
  if (min < 60) return `${min} min`;
  const h = Math.round(min / 60);
  if (h < 48) return `${h} h`;
  return `${Math.round(h / 24)} d`;
}

/** A headroom in words: the difference rounded down, or "over by …" rounded up. */
export function headroomText(pa: number, d: DisplayUnits): string {
  return pa < 0
    ? `over by ${d.format('pressureDifference', -pa, 'up')}`
    : d.format('pressureDifference', pa, 'down');
}

/** Degrees left to liquid-full, rounded down; "already liquid-full" when none are left. */
export function marginText(k: number | null, d: DisplayUnits): string {
  if (k === null) return 'not reached';
  if (k <= 0) return 'reached at the peak';
  return `${d.format('temperatureDifference', k, 'down')} away`;
}

/** A caution in the user's words and units, through the app's message catalogue. */
export function cautionText(c: Caution, d: DisplayUnits): string {
  return messageText(c, d);
}

/** The peak as a walkdown keeps it, with its raised figure (absent in older records). */
export function upperOf(r: WalkResult): UpperPeak {
  const s = r.summary;
  return {
    peak: s.peakGauge,
    upper: s.peakGaugeUpper,
    allowance: s.peakAllowance,
    phase: r.peakPhase,
  };
}

/** "Up to 1788 psig allowing 10 % for model error: to" when that shows apart from the peak, else "To". */
function upperLead(r: WalkResult, d: DisplayUnits): string {
  const u = upperOf(r);
  return upperDiffers(u, d) ? `${upperShort(u, d)}: to` : 'To';
}

/**
 * The figure lines of one projected tank. The headrooms are measured from the peak raised by the
 * model's allowance; that figure leads the headroom line whenever it shows apart from the peak.
 */
export function resultLines(r: WalkResult, d: DisplayUnits): string[] {
  const s = r.summary;
  return [
    `Peak ${d.format('gaugePressure', s.peakGauge, 'up')} at ${d.format('temperature', r.peakTemperature)} liquid`,
    `${upperLead(r, d)} relief ${headroomText(s.headroomToRelief, d)} · to design ${headroomText(s.headroomToDesign, d)}`,
    r.peakPhase === 'supercritical' || r.peakPhase === 'vapour-only'
      ? `No liquid surface at the peak (${r.peakPhase === 'supercritical' ? 'above the critical temperature' : 'vapour only'}) · liquid-full ${marginText(r.liquidFullMargin, d)}`
      : `Liquid ${formatPercent(r.peakLiquidPercent, 'up')} at the peak · liquid-full ${marginText(r.liquidFullMargin, d)}`,
  ];
}

/** The forecast used, in words. */
export function forecastText(w: WalkdownRecord, d: DisplayUnits): string {
  const f = w.forecast;
  const air = forecastPeakAir(f);
  const days = f.days.length > 1 ? ` (hottest of ${f.days.length} days)` : '';
  const own = f.tankAllowances.length
    ? `; ${f.tankAllowances.length} tank${f.tankAllowances.length === 1 ? '' : 's'} with their own allowance`
    : '';
  return air === null
    ? 'No forecast entered'
    : `Peak air ${d.format('temperature', air)}${days} + sun allowance ${d.format('temperatureDifference', f.sunAllowance)}${own}; entered ${new Date(f.enteredAt).toLocaleString()}`;
}

/** Entries ranked as on the board: checked tanks by level and margin, then the rest. */
export function rankedEntries(w: WalkdownRecord): WalkEntry[] {
  const order = ['danger', 'warning', 'needs-reading', 'caution', 'notice', 'ok'];
  const key = (e: WalkEntry) => (e.result ? order.indexOf(e.result.level) : order.length);
  const margin = (e: WalkEntry) =>
    Math.min(e.result?.reliefMargin ?? Infinity, e.result?.liquidFullMargin ?? Infinity);
  return [...w.entries].sort((a, b) => key(a) - key(b) || margin(a) - margin(b));
}

export function statusText(e: WalkEntry): string {
  if (e.status === 'unreached') return `Could not reach: ${e.reason}`;
  if (e.status === 'pending') return 'Not visited';
  if (!e.result) return `Checked, no result: ${e.problem}`;
  return `${LEVEL_SHAPES[e.result.level]} ${LEVEL_WORDS[e.result.level]}`;
}

/** The whole walkdown as plain text, for sharing. Ends with the standing caution. */
export function walkdownText(w: WalkdownRecord, d: DisplayUnits): string {
  const lines = [
    `Site walkdown — ${w.site}`,
    `${new Date(w.startedAt).toLocaleString()}${w.finishedAt ? ` to ${new Date(w.finishedAt).toLocaleString()}` : ' (under way)'}`,
    `Checked by: ${w.checkedBy || 'not given'}`,
    `Forecast: ${forecastText(w, d)}`,
    `App version: ${w.appVersion}`,
    '',
  ];
  rankedEntries(w).forEach((e, i) => {
    lines.push(`${i + 1}. ${e.tankName} — ${statusText(e)}`);
    if (e.result) {
      lines.push(...resultLines(e.result, d).map((l) => `   ${l}`));
      lines.push(
        `   Design ${d.format('gaugePressure', e.result.designPressureGauge)} · relief ${d.format('gaugePressure', e.result.reliefSetPressureGauge)}`,
      );
      for (const c of e.result.cautions.filter((x) => x.code !== 'standing'))
        lines.push(`   - ${c.level.toUpperCase()}: ${cautionText(c, d)}`);
    }
    if (e.note) lines.push(`   Note: ${e.note}`);
  });
  lines.push('', STANDING_WALK);
  return lines.join('\n');
}
