/**
 * Saved fills as CSV, one row per fill, in the user's units with the unit in each heading (the
 * same cell rules as the checks' CSV in csv.ts). Limits and room left round down, the amount
 * over a limit rounds up, as on screen.
 */
import { DisplayUnits, formatPercent } from '../components/display.js';
import type { TankRecord } from '../components/types.js';
import type { FillRecord } from '../thermo/fill/index.js';
import { cell } from './csv.js';

const pct = (v: number | null | undefined, round: 'nearest' | 'up' | 'down' = 'nearest') =>
  v === null || v === undefined ? '' : formatPercent(v, round).replace(' %', '');

export function fillsToCsv(tanks: TankRecord[], fills: FillRecord[], d: DisplayUnits): string {
  const byId = new Map(tanks.map((t) => [t.id, t]));
  const n = (
    q: Parameters<DisplayUnits['number']>[0],
    v: number | null | undefined,
    round: 'nearest' | 'up' | 'down' = 'nearest',
  ) => d.number(q, v ?? null, round);
  const L = (q: Parameters<DisplayUnits['label']>[0]) => d.label(q);
  const head = [
    'site',
    'tank',
    'started at (UTC)',
    'finished at (UTC)',
    `liquid temperature before (${L('temperature')})`,
    'float gauge before (%)',
    `contents before (${L('mass')})`,
    `fill limit before (${L('mass')}, rounded down)`,
    'stop at float gauge before (%, rounded down)',
    `room left before (${L('mass')}, rounded down)`,
    `metered volume (${L('volume')})`,
    'meter reads',
    'delivery interrupted',
    `delivered (${L('mass')})`,
    'float gauge after (%)',
    `liquid temperature after (${L('temperature')})`,
    `gauge pressure after (${L('gaugePressure')})`,
    'expected float gauge after (%)',
    'reading minus expected (points)',
    'agreement band (± points)',
    'verdict',
    `fill limit after (${L('mass')}, rounded down)`,
    `over the limit by (${L('mass')}, rounded up)`,
    'note',
  ];
  const rows = [...fills]
    .sort((a, b) => (a.finishedAt < b.finishedAt ? -1 : a.finishedAt > b.finishedAt ? 1 : 0))
    .map((f) => {
      const t = byId.get(f.tankId);
      const b = f.start.before;
      const r = f.result;
      return [
        cell(t?.site ?? ''),
        cell(t?.name ?? '(deleted tank)'),
        cell(f.start.startedAt),
        cell(f.finishedAt),
        n('temperature', b.liquidTemperature),
        pct(b.gaugePercent),
        n('mass', b.totalMass),
        n('mass', b.maxMass, 'down'),
        pct(b.stopAtGaugePercent, 'down'),
        n('mass', b.roomLeftMass, 'down'),
        n('volume', f.delivered.volume),
        cell(f.delivered.basis ?? 'compensated-60F'),
        f.delivered.interrupted ? 'yes' : 'no',
        n('mass', r.deliveredMass),
        pct(f.after.gaugePercent),
        n('temperature', r.afterTemperature),
        n('gaugePressure', f.after.pressureReadingGauge),
        pct(r.expectedGaugePercent),
        pct(r.difference),
        pct(r.band.halfWidth, 'down'),
        cell(r.verdict),
        n('mass', r.maxMass, 'down'),
        n('mass', r.overMass, 'up'),
        cell(f.note),
      ];
    });
  return [head.map(cell), ...rows].map((r) => r.join(',')).join('\r\n') + '\r\n';
}
