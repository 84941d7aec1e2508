/**
 * Readings have a time (components/reopen.ts): a reopened tank restores readings typed during
 * this visit and otherwise starts blank, offering the newest of the old draft and the saved
 * checks as the dated last check. Logic only, no figures: the times below are invented.
 */
import { describe, expect, it } from 'vitest';
import {
  SAME_VISIT_MS,
  ageText,
  hasMeasured,
  isOld,
  lastReadings,
  measuredChanged,
  openingReadings,
} from '../../components/reopen.js';
import { emptyReadings, type CheckRecord, type DraftRecord } from '../../components/types.js';

const NOW = new Date('2026-03-10T12:00:00.000Z');
const ago = (ms: number) => new Date(NOW.getTime() - ms).toISOString();
const typed = { ...emptyReadings(5), liquidTemperature: 290, gaugePercent: 60 };

function draft(updatedAt: string, takenAt?: string): DraftRecord {
  return { tankId: 't', readings: takenAt ? { ...typed, takenAt } : typed, updatedAt };
}

describe('reopen: which readings a reopened tank starts from', () => {
  it('readings typed during this visit come back as they were, with their time', () => {
    const o = openingReadings(draft(ago(5 * 60_000)), 5, NOW);
    expect(o.readings.liquidTemperature).toBe(290);
    expect(o.readings.takenAt).toBe(ago(5 * 60_000));
    expect(o.last).toBeNull();
  });

  it('older readings start blank and are offered as the last readings, dated', () => {
    const o = openingReadings(draft(ago(3 * 86_400_000)), 5, NOW);
    expect(hasMeasured(o.readings)).toBe(false);
    expect(o.last?.at).toBe(ago(3 * 86_400_000));
    expect(o.last?.readings.gaugePercent).toBe(60);
  });

  it('the readings’ own time wins over the draft’s (a forecast edited later does not refresh them)', () => {
    const o = openingReadings(draft(ago(60_000), ago(2 * 3_600_000)), 5, NOW);
    expect(hasMeasured(o.readings)).toBe(false);
    expect(o.last?.at).toBe(ago(2 * 3_600_000));
  });

  it('the visit ends at SAME_VISIT_MS: just before is restored, at it is old', () => {
    expect(isOld(ago(SAME_VISIT_MS - 1000), NOW)).toBe(false);
    expect(isOld(ago(SAME_VISIT_MS), NOW)).toBe(true);
    expect(isOld('not a date', NOW)).toBe(true);
  });

  it('an old draft with no measured reading is not offered', () => {
    const d: DraftRecord = { tankId: 't', readings: emptyReadings(5), updatedAt: ago(86_400_000) };
    expect(openingReadings(d, 5, NOW).last).toBeNull();
    expect(openingReadings(undefined, 5, NOW).readings).toEqual(emptyReadings(5));
  });

  it('the last check is the newest of the old draft and the saved checks', () => {
    const old = openingReadings(draft(ago(5 * 86_400_000)), 5, NOW).last;
    const check = {
      id: 'c',
      tankId: 't',
      at: ago(86_400_000),
      readings: { ...typed, gaugePercent: 70 },
      productLabel: 'Propane',
      summary: { stopAtGaugePercent: 80, roomLeftMass: 12 },
      demo: false,
    } as unknown as CheckRecord;
    const last = lastReadings(old, [check]);
    expect(last?.source).toBe('check');
    expect(last?.readings.gaugePercent).toBe(70);
    expect(lastReadings(old, [{ ...check, at: ago(9 * 86_400_000) }])?.source).toBe('draft');
  });

  it('a changed measured reading is told apart from a forecast edit', () => {
    expect(measuredChanged(typed, { ...typed, gaugePercent: 61 })).toBe(true);
    expect(measuredChanged(typed, { ...typed, peakAirTemperature: 300 })).toBe(false);
  });

  it('ages read in minutes, hours, then days', () => {
    expect(ageText(ago(12 * 60_000), NOW)).toBe('12 min');
    expect(ageText(ago(5 * 3_600_000), NOW)).toBe('5 h');
    expect(ageText(ago(4 * 86_400_000), NOW)).toBe('4 days');
  });
});
