/**
 * One walkdown as CSV: one row per tank in the record's ranked order, with the forecast and the
 * design and relief pressures used, every caution and the notes. Same cell rules as pwa/csv.ts
 * (RFC 4180, formula guard); figures rounded toward safety as on screen.
 */
import { DisplayUnits, formatPercent } from '../components/display.js';
import { forecastPeakAir } from '../components/walkdown-board.js';
import type { WalkEntry, WalkdownRecord } from '../components/walkdown-types.js';
import { LEVEL_WORDS, cautionText, rankedEntries } from '../components/walkdown-words.js';
import { cell, numCell } from './csv.js';

type Q = Parameters<DisplayUnits['number']>[0];

/** The header row, with each quantity's unit as the user's settings give it. */
function header(d: DisplayUnits): string[] {
  const L = (q: Parameters<DisplayUnits['label']>[0]) => d.label(q);
  return [
    'site',
    'walk started (UTC)',
    'walk finished (UTC)',
    'checked by',
    'app version',
    'rank',
    'tank',
    'status',
    'could not reach because',
    'note',
    'product',
    `forecast peak air (${L('temperature')})`,
    `sun allowance (${L('temperatureDifference')})`,
    `peak liquid temperature (${L('temperature')})`,
    `liquid temperature read (${L('temperature')})`,
    'float gauge read (%)',
    `pressure read (${L('gaugePressure')})`,
    `design pressure (${L('gaugePressure')})`,
    `relief set pressure (${L('gaugePressure')})`,
    `peak pressure (${L('gaugePressure')}, rounded up)`,
    `headroom to relief (${L('pressureDifference')}, rounded down)`,
    `headroom to design (${L('pressureDifference')}, rounded down)`,
    'liquid at peak (%, rounded up)',
    `margin to liquid-full (${L('temperatureDifference')}, rounded down)`,
    'level',
    'cautions',
    `peak raised by the model allowance, the headrooms measured from it (${L('gaugePressure')}, rounded up)`,
  ];
}

const STATUS_WORDS = { pending: 'not visited', unreached: 'could not reach', checked: 'checked' };

/** One tank's row: the walk's columns, then its readings, then its figures at the forecast. */
function entryRow(w: WalkdownRecord, e: WalkEntry, rank: number, d: DisplayUnits): string[] {
  const n = (q: Q, v: number | null | undefined, round: 'nearest' | 'up' | 'down' = 'nearest') =>
    numCell(d.number(q, v ?? null, round));
  const r = e.result;
  const s = r?.summary;
  const allowance =
    w.forecast.tankAllowances.find((a) => a.tankId === e.tankId)?.sunAllowance ??
    w.forecast.sunAllowance;
  return [
    ...[w.site, w.startedAt, w.finishedAt ?? '', w.checkedBy, w.appVersion].map(cell),
    String(rank),
    ...[e.tankName, STATUS_WORDS[e.status], e.reason, e.note, r?.productLabel ?? ''].map(cell),
    n('temperature', forecastPeakAir(w.forecast)),
    n('temperatureDifference', allowance),
    n('temperature', r?.peakTemperature),
    n('temperature', e.readings.liquidTemperature),
    e.readings.gaugePercent === null
      ? ''
      : numCell(formatPercent(e.readings.gaugePercent).replace(' %', '')),
    n('gaugePressure', e.readings.pressureReadingGauge),
    n('gaugePressure', r?.designPressureGauge),
    n('gaugePressure', r?.reliefSetPressureGauge),
    n('gaugePressure', s?.peakGauge, 'up'),
    n('pressureDifference', s?.headroomToRelief, 'down'),
    n('pressureDifference', s?.headroomToDesign, 'down'),
    r ? numCell(formatPercent(r.peakLiquidPercent, 'up').replace(' %', '')) : '',
    n('temperatureDifference', r?.liquidFullMargin, 'down'),
    cell(r ? LEVEL_WORDS[r.level] : ''),
    cell(
      (r?.cautions ?? [])
        .filter((c) => c.code !== 'standing')
        .map((c) => `${c.level}: ${cautionText(c, d)}`)
        .join(' | '),
    ),
    n('gaugePressure', s?.peakGaugeUpper, 'up'),
  ];
}

export function walkdownToCsv(w: WalkdownRecord, d: DisplayUnits): string {
  const rows = rankedEntries(w).map((e, i) => entryRow(w, e, i + 1, d));
  return [header(d).map(cell), ...rows].map((r) => r.join(',')).join('\r\n') + '\r\n';
}
