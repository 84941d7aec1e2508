/**
 * The fill record: made from a reconciliation, read back through JSON (as storage and the
 * backup keep it) unchanged, and a damaged record refused with the field named — so a backup
 * import can say what is wrong before it writes anything.
 */
import { describe, it, expect } from 'vitest';
import {
  InputError,
  makeFillRecord,
  startFill,
  validateFillRecord,
  FILL_ACCURACY_DEFAULTS,
  type FillRecord,
} from '../../thermo/index.js';
import { toSI } from '../../thermo/units.js';
import { checkClose } from '../helpers/check.js';

const gal = (x: number) => toSI('volume', x, 'usgal');
const start = startFill(
  {
    tank: { waterCapacity: gal(500), designPressureGauge: toSI('gaugePressure', 250, 'psig') },
    product: 'propane',
    liquidTemperature: toSI('temperature', 50, 'F'),
    contents: { gaugePercent: 30 },
    peakTemperature: toSI('temperature', 90, 'F'),
  },
  undefined,
  new Date('2026-03-01T09:00:00Z'),
);
const record = makeFillRecord({
  id: 'f1',
  tankId: 't1',
  input: { start, delivered: { volume: gal(150) }, after: { gaugePercent: 60 } },
  note: 'ticket 4471',
  at: new Date('2026-03-01T09:40:00Z'),
});

function refusedField(x: unknown): string {
  try {
    validateFillRecord(x);
  } catch (e) {
    if (e instanceof InputError) return e.field;
    throw e;
  }
  return 'accepted';
}

const copy = (): FillRecord => JSON.parse(JSON.stringify(record)) as FillRecord;

describe('fill record', () => {
  it('keeps before, delivered, after, verdict, times and note, and survives JSON', () => {
    expect(record.start.startedAt).toBe('2026-03-01T09:00:00.000Z');
    expect(record.finishedAt).toBe('2026-03-01T09:40:00.000Z');
    expect(record.note).toBe('ticket 4471');
    expect(record.accuracy).toEqual({
      gaugePoints: FILL_ACCURACY_DEFAULTS.gaugePoints,
      meterFraction: FILL_ACCURACY_DEFAULTS.meterFraction,
    });
    expect(['consistent', 'gauge-low', 'gauge-high', 'over-limit']).toContain(
      record.result.verdict,
    );
    expect(validateFillRecord(copy())).toEqual(record);
    // Mass balance of what is kept: expected after = before + delivered.
    checkClose({
      what: 'expected mass',
      input: '500 gal, 30 % + 150 gal',
      actual: record.result.expectedMass,
      expected: record.start.before.totalMass + record.result.deliveredMass,
      rtol: 1e-12,
      kind: 'identity',
      source: 'mass balance',
    });
  });

  it('refuses a damaged record, naming the field', () => {
    const cases: [string, (r: Record<string, unknown> & FillRecord) => void][] = [
      ['fill.id', (r) => (r.id = '')],
      ['fill.note', (r) => ((r as { note: unknown }).note = 5)],
      ['fill.finishedAt', (r) => (r.finishedAt = 'yesterday')],
      ['fill.finishedAt', (r) => (r.finishedAt = '2026-03-01T08:00:00.000Z')],
      ['fill.result.verdict', (r) => ((r.result as { verdict: string }).verdict = 'fine')],
      // JSON turns NaN into null: a number gone missing is refused, not shown as NaN.
      [
        'fill.result.expectedGaugePercent',
        (r) => ((r.result as { expectedGaugePercent: unknown }).expectedGaugePercent = null),
      ],
      ['fill.after.gaugePercent', (r) => (r.after.gaugePercent = 130)],
      ['fill.delivered.volume', (r) => (r.delivered.volume = -3)],
      [
        'fill.start.before.totalMass',
        (r) => ((r.start.before as { totalMass: unknown }).totalMass = '12'),
      ],
      [
        'fill.start.check.tank.designPressureGauge',
        (r) => (r.start.check.tank.designPressureGauge = 0),
      ],
      [
        'fill.start.check.product',
        (r) => ((r.start.check as { product: unknown }).product = 'unobtainium'),
      ],
      ['fill.accuracy.meterFraction', (r) => (r.accuracy.meterFraction = 2)],
      [
        'fill.result.findings[0].params',
        (r) => ((r.result.findings[0] as { params: unknown }).params = []),
      ],
    ];
    for (const [field, damage] of cases) {
      const r = copy() as Record<string, unknown> & FillRecord;
      damage(r);
      expect(refusedField(r), field).toBe(field);
    }
    expect(refusedField(null)).toBe('fill');
  });
});
