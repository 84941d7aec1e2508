/**
 * One walkdown as CSV: one row per tank in the record's ranked order, with the forecast and the
 * design and relief pressures used, every caution and the notes. Same cell rules as pwa/csv.ts
 * (RFC 4180, formula guard); figures rounded toward safety as on screen.
 */
import { DisplayUnits, formatPercent } from '../components/display.js';
import { forecastPeakAir } from '../components/walkdown-board.js';
import type { WalkdownRecord } from '../components/walkdown-types.js';
import { LEVEL_WORDS, cautionText, rankedEntries } from '../components/walkdown-words.js';
import { cell, numCell } from './csv.js';

export function walkdownToCsv(w: WalkdownRecord, d: DisplayUnits): string {
  type Q = Parameters<DisplayUnits['number']>[0];
  const n = (q: Q, v: number | null | undefined, round: 'nearest' | 'up' | 'down' = 'nearest') =>
    numCell(d.number(q, v ?? null, round));
  const L = (q: Parameters<DisplayUnits['label']>[0]) => d.label(q);
  const head = [
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
  ];
  const air = forecastPeakAir(w.forecast);
  const rows = rankedEntries(w).map((e, i) => {
    const r = e.result;
    const s = r?.summary;
    const allowance =
      w.forecast.tankAllowances.find((a) => a.tankId === e.tankId)?.sunAllowance ??
      w.forecast.sunAllowance;
    return [
      cell(w.site),
      cell(w.startedAt),
      cell(w.finishedAt ?? ''),
      cell(w.checkedBy),
      cell(w.appVersion),
      String(i + 1),
      cell(e.tankName),
      cell(
        e.status === 'pending'
          ? 'not visited'
          : e.status === 'unreached'
            ? 'could not reach'
            : 'checked',
      ),
      cell(e.reason),
      cell(e.note),
      cell(r?.productLabel ?? ''),
      n('temperature', air),
      n('temperatureDifference', allowance),
      n('temperature', r?.peakTemperature),
      n('temperature', e.readings.liquidTemperature),
      e.readings.gaugePercent === null
        ? ''
        : numCell(formatPercent(e.readings.gaugePercent).replace(' %', '')),
      n('gaugePressure', e.readings.gaugePressure),
      n('gaugePressure', r?.designPressure),
      n('gaugePressure', r?.reliefSetPressure),
      n('gaugePressure', s?.peakPressure, 'up'),
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
    ];
  });
  return [head.map(cell), ...rows].map((r) => r.join(',')).join('\r\n') + '\r\n';
}
