/**
 * Saved checks as CSV (RFC 4180: comma-separated, CRLF, quotes doubled), one row per check, in
 * the user's units with the unit in each column heading. Figures are the ones saved with the
 * check, rounded toward safety as on screen. Text cells that a spreadsheet would read as a
 * formula (also behind leading spaces, line breaks or a full-width sign) are prefixed with an
 * apostrophe.
 */
import { DisplayUnits, formatPercent } from '../components/display.js';
import type { CheckRecord, TankRecord } from '../components/types.js';

/**
 * A text cell a spreadsheet could run as a formula: one whose first visible character is = + - @
 * (also their full-width forms ＝ ＋ － ＠ and the minus sign −, which some spreadsheets
 * normalise), even after leading spaces, tabs or line breaks; or one that starts with a tab or a
 * line break. (OWASP, "CSV Injection", names = + - @ tab and carriage return.)
 */
export function looksLikeFormula(v: string): boolean {
  return (
    /^[\s\u00a0\u2000-\u200b\u202f\u3000\ufeff]*[=+\-@\uff1d\uff0b\uff0d\uff20\u2212]/.test(v) ||
    /^[\t\r\n]/.test(v)
  );
}

export function cell(v: string): string {
  const safe = looksLikeFormula(v) ? `'${v}` : v;
  return /[",\r\n]/.test(safe) ? `"${safe.replace(/"/g, '""')}"` : safe;
}

/** A number cell (no formula guard: a negative number is a number). */
export function numCell(text: string): string {
  return text === '–' ? '' : text;
}

export function checksToCsv(tanks: TankRecord[], checks: CheckRecord[], d: DisplayUnits): string {
  const byId = new Map(tanks.map((t) => [t.id, t]));
  const n = (
    q: Parameters<DisplayUnits['number']>[0],
    v: number | null,
    round: 'nearest' | 'up' | 'down' = 'nearest',
  ) => numCell(d.number(q, v, round));
  const L = (q: Parameters<DisplayUnits['label']>[0]) => d.label(q);
  const head = [
    'site',
    'tank',
    'checked at (UTC)',
    'product',
    `liquid temperature (${L('temperature')})`,
    'contents reading',
    'float gauge (%)',
    `level (${L('length')})`,
    `scale mass (${L('mass')})`,
    `gauge pressure (${L('gaugePressure')})`,
    `peak liquid temperature (${L('temperature')})`,
    'phase',
    `expected pressure (${L('gaugePressure')})`,
    `contents (${L('mass')})`,
    `liquid volume (${L('volume')})`,
    'filling density (%)',
    `fill limit (${L('mass')}, rounded down)`,
    `room left (${L('mass')}, rounded down)`,
    'stop at float gauge (%, rounded down)',
    'binding limit',
    `peak pressure (${L('gaugePressure')}, rounded up)`,
    `headroom to design (${L('pressureDifference')})`,
    `headroom to relief (${L('pressureDifference')})`,
    `liquid-full at (${L('temperature')})`,
    'most severe caution',
    'demo',
    `peak raised by the model allowance, the headrooms measured from it (${L('gaugePressure')}, rounded up)`,
  ];
  const rows = [...checks]
    .sort((a, b) => (a.at < b.at ? -1 : a.at > b.at ? 1 : 0))
    .map((c) => {
      const t = byId.get(c.tankId);
      const r = c.readings;
      const s = c.summary;
      const top = s.cautions.find((x) => x.code !== 'standing');
      return [
        cell(t?.site ?? ''),
        cell(t?.name ?? '(deleted tank)'),
        cell(c.at),
        cell(c.productLabel),
        n('temperature', r.liquidTemperature),
        cell(r.contentsMode),
        r.gaugePercent === null ? '' : numCell(formatPercent(r.gaugePercent).replace(' %', '')),
        n('length', r.levelHeight),
        n('mass', r.netMass),
        n('gaugePressure', r.pressureReadingGauge),
        n('temperature', s.peakTemperature),
        cell(s.phase),
        n('gaugePressure', s.pGauge, 'up'),
        n('mass', s.totalMass),
        n('volume', s.liquidVolume),
        n('fraction', s.fillingDensity),
        n('mass', s.maxMass, 'down'),
        n('mass', s.roomLeftMass, 'down'),
        numCell(formatPercent(s.stopAtGaugePercent, 'down').replace(' %', '')),
        cell(s.binding),
        n('gaugePressure', s.peakGauge, 'up'),
        n('pressureDifference', s.headroomToDesign, 'down'),
        n('pressureDifference', s.headroomToRelief, 'down'),
        n('temperature', s.liquidFullTemperature, 'down'),
        cell(top ? `${top.level}: ${top.message}` : ''),
        c.demo ? 'yes' : 'no',
        n('gaugePressure', s.peakGaugeUpper ?? null, 'up'),
      ];
    });
  return [head.map(cell), ...rows].map((r) => r.join(',')).join('\r\n') + '\r\n';
}
