/**
 * The findings of a fill reconciliation: each a stable code with its SI params and an English
 * default message (US trade units first, SI in brackets), most severe first, the standing
 * caution last. They say what the figures show and what to verify; they never give permission
 * to fill, and they defer to the site's procedures.
 */
import { fmtDiff, fmtGauge, fmtMass } from '../check/format.js';
import { STANDING_CAUTION } from '../check/standing.js';
import type { CautionLevel } from '../check/types.js';
import { formatNumber, formatQuantity, type Rounding } from '../units.js';
import type {
  FillBefore,
  FillFinding,
  FillParam,
  FillReconciliation,
  FillVerdict,
} from './types.js';

const RANK: Record<CautionLevel, number> = { danger: 0, warning: 1, caution: 2, notice: 3 };

/** The signal word of each verdict: over-limit > gauge-low > gauge-high > consistent. */
export function verdictLevel(v: FillVerdict): CautionLevel {
  return v === 'over-limit'
    ? 'danger'
    : v === 'gauge-low'
      ? 'warning'
      : v === 'gauge-high'
        ? 'caution'
        : 'notice';
}

export interface FindingContext {
  before: FillBefore;
  interrupted: boolean;
  /** Metered volume, m³. */
  volume: number;
  /** Site barometric pressure, Pa absolute. */
  baro: number;
}

const pct = (x: number, round: Rounding = 'nearest') => `${formatNumber(x, 1, round)} %`;
const pts = (x: number, round: Rounding = 'nearest') =>
  `${formatNumber(x, 1, round)} percentage points`;
const vol = (m3: number, round: Rounding = 'nearest') =>
  `${formatQuantity('volume', m3, 'usgal', { decimals: 1, round })} (${formatQuantity('volume', m3, 'L', { decimals: 0, round })})`;
const P = (value: number, quantity: FillParam['quantity']): FillParam => ({ value, quantity });

export function buildFindings(r: FillReconciliation, k: FindingContext): FillFinding[] {
  const out: FillFinding[] = [];
  const add = (level: CautionLevel, code: string, message: string, params: FillFinding['params']) =>
    out.push({ level, code, message, params });
  const figures = {
    reading: P(r.gaugePercent, 'gaugePercent'),
    expected: P(r.expectedGaugePercent, 'gaugePercent'),
    difference: P(r.difference, 'gaugePoints'),
    band: P(r.band.halfWidth, 'gaugePoints'),
  };
  const seen = `the gauge reads ${pct(r.gaugePercent)}; the contents before and the metered delivery put it at ${pct(r.expectedGaugePercent)} (agreement band ±${pts(r.band.halfWidth, 'down')})`;

  if (r.overMass > 0) {
    add(
      'danger',
      'fill-over-limit',
      `Over the fill limit after the delivery by ${fmtMass(r.overMass, 'up')} (about ${vol(r.overVolume, 'up')} of liquid): the limit is ${fmtMass(r.maxMass, 'down')}, the gauge reading stands for ${fmtMass(r.gaugeMass)}, and the contents before plus the metered delivery come to ${fmtMass(r.expectedMass)}. A tank over its limit can become liquid-full as it warms. Follow the site's procedure for an overfilled tank.`,
      {
        overMass: P(r.overMass, 'mass'),
        overVolume: P(r.overVolume, 'volume'),
        maxMass: P(r.maxMass, 'mass'),
        gaugeMass: P(r.gaugeMass, 'mass'),
        expectedMass: P(r.expectedMass, 'mass'),
      },
    );
  }
  if (r.difference < -r.band.halfWidth) {
    add(
      'warning',
      'fill-gauge-low',
      `The gauge reads low: ${seen}. The tank holds about ${fmtMass(-r.differenceMass, 'up')} (${vol(-r.differenceVolume, 'up')} of liquid) more than the gauge shows. A gauge that reads low leads to overfilling: do not rely on it to fill this tank until it is verified — check for a sticking float or a loose dial, confirm the contents by weight or with the fixed maximum-level gauge, and follow the site's procedures.`,
      {
        ...figures,
        differenceMass: P(r.differenceMass, 'mass'),
        differenceVolume: P(r.differenceVolume, 'volume'),
      },
    );
  } else if (r.difference > r.band.halfWidth) {
    add(
      'caution',
      'fill-gauge-high',
      `The gauge reads high: ${seen}. The tank holds about ${fmtMass(r.differenceMass, 'down')} less than the gauge shows. Check the meter ticket (volume and whether it is temperature-compensated), the temperatures and the gauge.`,
      {
        ...figures,
        differenceMass: P(r.differenceMass, 'mass'),
        differenceVolume: P(r.differenceVolume, 'volume'),
      },
    );
  } else {
    add(
      'notice',
      'fill-consistent',
      `The gauge agrees with the metered delivery: ${seen}.`,
      figures,
    );
  }
  pressureFinding(r, k, add);
  contextFindings(r, k, add);
  out.sort((a, b) => RANK[a.level] - RANK[b.level]);
  out.push({ level: 'notice', code: 'standing', message: STANDING_CAUTION, params: {} });
  return out;
}

type Add = (
  level: CautionLevel,
  code: string,
  message: string,
  params: FillFinding['params'],
) => void;

function pressureFinding(r: FillReconciliation, k: FindingContext, add: Add): void {
  const p = r.pressure;
  if (!p || p.verdict === 'fits') return;
  add(
    'warning',
    'fill-pressure-off-curve',
    `The pressure after the delivery, ${fmtGauge(p.readingGauge, 'nearest', k.baro)}, is ${p.verdict === 'high' ? 'above' : 'below'} the product's expected ${fmtGauge(p.expectedGauge, 'up', k.baro)} by ${fmtDiff(Math.abs(p.difference), 'up')} (more than the ${fmtDiff(p.tolerance)} the gauge and the model allow). A different product from the one on record may have been delivered; the temperature may not have settled, or the pressure gauge may be faulty. Check the delivery ticket's product and follow the site's procedures.`,
    {
      reading: P(p.readingGauge, 'gaugePressure'),
      expected: P(p.expectedGauge, 'gaugePressure'),
      difference: P(p.difference, 'pressureDifference'),
      tolerance: P(p.tolerance, 'pressureDifference'),
    },
  );
}

function contextFindings(r: FillReconciliation, k: FindingContext, add: Add): void {
  const b = k.before;
  if (k.interrupted) {
    add(
      'notice',
      'fill-interrupted',
      'The delivery was stopped before the intended amount: the reconciliation uses the volume the meter shows, not the amount ordered.',
      {},
    );
  }
  if (k.volume === 0) {
    add(
      'notice',
      'fill-nothing-delivered',
      'The meter shows nothing delivered: the comparison is of the gauge with the contents before, at the after temperature.',
      {},
    );
  }
  if (b.phase === 'vapour-only' || b.totalMass === 0) {
    add(
      'notice',
      'fill-from-empty',
      'The tank held vapour only before the delivery: the expected level comes from the meter alone, so a gauge that reads low by a fixed amount shows here.',
      {},
    );
  } else if (b.contentsSource !== 'netMass') {
    add(
      'notice',
      'fill-same-gauge',
      `The contents before were read on the same gauge (${pct(b.gaugePercent ?? b.liquidPercent)}): a gauge that is off by a fixed amount is off both times and does not show here; a sticking or slipping gauge does. Weighing, or a delivery into an empty tank, shows a fixed error too.`,
      { beforeReading: P(b.gaugePercent ?? b.liquidPercent, 'gaugePercent') },
    );
  }
  if (r.stopAtGaugePercent < b.stopAtGaugePercent - 0.05 && r.overMass === 0) {
    add(
      'notice',
      'fill-stop-at-moved',
      `At the after temperature the stop-at gauge percent is ${pct(r.stopAtGaugePercent, 'down')} (it was ${pct(b.stopAtGaugePercent, 'down')} before).`,
      {
        stopAt: P(r.stopAtGaugePercent, 'gaugePercent'),
        stopAtBefore: P(b.stopAtGaugePercent, 'gaugePercent'),
      },
    );
  }
}
