/**
 * The site board's projection and ranking (components/walkdown-board.ts). The projected figures
 * are checked against the propane reference table (test/reference/sat/propane.csv: Lemmon,
 * McLinden, Wagner (2009), J. Chem. Eng. Data 54, 3141–3180) and against peak temperatures
 * summed by hand; the ranking against orders written out by hand from the stated rule.
 * The tanks here are invented test tanks, not the demo site.
 */
import { describe, expect, it } from 'vitest';
import { checkClose } from '../helpers/check.js';
import {
  DEFAULT_STALE_DAYS,
  compareRows,
  forecastPeakAir,
  newestReadings,
  projectTank,
  rankRows,
  walkOrder,
  type BoardRow,
  type LatestReadings,
  type SiteForecast,
} from '../../components/walkdown-board.js';
import { DEFAULT_SETTINGS, type Readings, type TankRecord } from '../../components/types.js';

const NOW = new Date('2026-07-01T12:00:00Z');
const BARO = 101_325;

function tank(id: string, name: string, over: Partial<TankRecord> = {}): TankRecord {
  return {
    id,
    site: 'Test yard',
    name,
    notes: '',
    // 1 000 L propane storage tank, 1.724 MPa (250 psig) design and relief: invented test tank.
    nameplate: { waterCapacity: 1, designPressureGauge: 1_723_689, containerClass: 'storage' },
    productId: 'propane',
    demo: false,
    createdAt: NOW.toISOString(),
    updatedAt: NOW.toISOString(),
    ...over,
  };
}

function readings(over: Partial<Readings> = {}): Readings {
  return {
    liquidTemperature: 293.15,
    contentsMode: 'gaugePercent',
    gaugePercent: 50,
    levelHeight: null,
    netMass: null,
    pressureReadingGauge: null,
    // The tank's own forecast, which the site forecast must replace.
    peakAirTemperature: 280,
    sunAllowance: 0,
    ...over,
  };
}

function latest(hoursAgo: number, r: Readings = readings()): LatestReadings {
  return {
    readings: r,
    at: new Date(NOW.getTime() - hoursAgo * 3_600_000).toISOString(),
    source: 'check',
  };
}

const FORECAST: SiteForecast = {
  site: 'Test yard',
  days: [305.15, 313.15, 310.15],
  sunAllowance: 5,
  tankAllowances: [{ tankId: 'shaded', sunAllowance: 0 }],
  enteredAt: NOW.toISOString(),
};

describe('site forecast', () => {
  it('the hottest of the days entered counts', () => {
    expect(forecastPeakAir(FORECAST)).toBe(313.15);
    expect(forecastPeakAir({ ...FORECAST, days: [] })).toBeNull();
  });
});

describe('projection of one tank to the site forecast', () => {
  it('peak = hottest day + the site allowance; pressure and headroom as the reference table says', () => {
    const row = projectTank(tank('a', 'A'), latest(2), FORECAST, DEFAULT_SETTINGS, NOW);
    expect(row.level).not.toBe('needs-reading');
    const peak = row.result!.peak;
    // 313.15 K (hottest day) + 5 K (site allowance), summed by hand: 318.15 K.
    checkClose({
      what: 'peak liquid temperature',
      input: FORECAST,
      actual: peak.temperature,
      expected: 318.15,
      atol: 1e-9,
      kind: 'identity',
      source: 'hand sum of the hottest day and the sun allowance',
    });
    // Propane at 318.15 K: 1 534 314 Pa absolute (Lemmon et al. 2009 via the reference table).
    checkClose({
      what: 'peak pressure, gauge',
      input: 'propane 318.15 K, half full',
      actual: peak.pGauge,
      expected: 1_534_314 - BARO,
      rtol: 0.006,
      why: 'core ±0.5 % in vapour pressure plus rounding up to 100 Pa',
      kind: 'published',
      source: 'test/reference/sat/propane.csv (Lemmon, McLinden, Wagner 2009)',
    });
    // Headroom = relief − (p_abs · 1.005 − baro), the 0.5 % model allowance raised toward safety.
    checkClose({
      what: 'headroom to relief',
      input: 'relief 1 723 689 Pa',
      actual: row.summary!.headroomToRelief,
      expected: 1_723_689 - (1_534_314 * 1.005 - BARO),
      atol: 9_000,
      why: '±0.5 % of 1.53 MPa from the model, plus 100 Pa rounding',
      kind: 'published',
      source: 'test/reference/sat/propane.csv (Lemmon, McLinden, Wagner 2009)',
    });
    expect(row.peakLiquidPercent).toBeCloseTo(peak.liquidFraction * 100, 12);
    // Relief margin in degrees: the table's vapour pressure at the relief setting lies between
    // 318.15 K (1.53 MPa) and the relief temperature, so the margin is positive and below 10 K.
    expect(row.reliefMargin!).toBeGreaterThan(0);
    expect(row.reliefMargin!).toBeLessThan(10);
  });

  it('a shaded tank takes its own allowance; the tank’s own forecast is replaced', () => {
    const row = projectTank(tank('shaded', 'S'), latest(2), FORECAST, DEFAULT_SETTINGS, NOW);
    checkClose({
      what: 'peak liquid temperature of a shaded tank',
      input: 'hottest 313.15 K, own allowance 0 K',
      actual: row.result!.peak.temperature,
      expected: 313.15,
      atol: 1e-9,
      kind: 'identity',
      source: 'hand sum',
    });
    expect(row.readings!.peakAirTemperature).toBe(313.15);
  });

  it('readings older than the limit, or none, need a reading and are not projected', () => {
    const limitH = DEFAULT_STALE_DAYS * 24;
    const fresh = projectTank(tank('a', 'A'), latest(limitH - 1), FORECAST, DEFAULT_SETTINGS, NOW);
    expect(fresh.level).not.toBe('needs-reading');
    const stale = projectTank(tank('a', 'A'), latest(limitH + 1), FORECAST, DEFAULT_SETTINGS, NOW);
    expect(stale.level).toBe('needs-reading');
    expect(stale.result).toBeNull();
    expect(stale.summary).toBeNull();
    const none = projectTank(tank('a', 'A'), null, FORECAST, DEFAULT_SETTINGS, NOW);
    expect(none.level).toBe('needs-reading');
    const shorter = projectTank(tank('a', 'A'), latest(49), FORECAST, DEFAULT_SETTINGS, NOW, 2);
    expect(shorter.level).toBe('needs-reading');
  });

  it('incomplete readings need a reading rather than a guess', () => {
    const r = readings({ gaugePercent: null });
    const row = projectTank(tank('a', 'A'), latest(1, r), FORECAST, DEFAULT_SETTINGS, NOW);
    expect(row.level).toBe('needs-reading');
    expect(row.reason).toMatch(/float-gauge/);
  });

  it('a fuller tank ranks before an emptier one of the same level (liquid-full comes sooner)', () => {
    const full = projectTank(
      tank('f', 'Zulu'),
      latest(1, readings({ gaugePercent: 84 })),
      FORECAST,
      DEFAULT_SETTINGS,
      NOW,
    );
    const half = projectTank(tank('h', 'Alpha'), latest(1), FORECAST, DEFAULT_SETTINGS, NOW);
    // 84 % at 20 °C goes liquid-full a little above 318 K (propane expands about 0.3 %/K).
    expect(full.liquidFullMargin).not.toBeNull();
    if (full.level === half.level) expect(compareRows(full, half)).toBeLessThan(0);
    else expect(['danger', 'warning']).toContain(full.level);
  });
});

function row(
  id: string,
  level: BoardRow['level'],
  relief: number | null,
  full: number | null,
): BoardRow {
  return {
    tank: tank(id, id),
    level,
    reason: null,
    readingsAt: null,
    ageMs: null,
    sunAllowance: 0,
    result: null,
    summary: null,
    readings: null,
    peakLiquidPercent: null,
    liquidFullMargin: full,
    reliefMargin: relief,
  };
}

describe('ranking', () => {
  it('level first, then the smaller margin, then the name', () => {
    const rows = [
      row('ok-far', 'ok', 30, null),
      row('notice', 'notice', 40, null),
      row('unread', 'needs-reading', null, null),
      row('warn-b', 'warning', 12, 3),
      row('warn-a', 'warning', 2, 20),
      row('danger', 'danger', -1, null),
      row('ok-near', 'ok', 25, 8),
      row('caution', 'caution', 50, null),
      row('ok-tie-b', 'ok', null, null),
      row('ok-tie-a', 'ok', null, null),
    ];
    // Written out by hand from the rule: warn-a (min 2) before warn-b (min 3); ok-near (min 8)
    // before ok-far (30); two oks without margins by name.
    expect(rankRows(rows).map((r) => r.tank.id)).toEqual([
      'danger',
      'warn-a',
      'warn-b',
      'unread',
      'caution',
      'notice',
      'ok-near',
      'ok-far',
      'ok-tie-a',
      'ok-tie-b',
    ]);
  });

  it('a set route comes first, tanks not on it follow in board order', () => {
    const ranked = [row('x', 'danger', 1, null), row('y', 'ok', 9, null), row('z', 'ok', 10, null)];
    expect(walkOrder(ranked)).toEqual(['x', 'y', 'z']);
    expect(walkOrder(ranked, ['z', 'gone', 'y'])).toEqual(['z', 'y', 'x']);
  });

  it('the newest readings win; an unreadable time is ignored', () => {
    const a = latest(5);
    const b = latest(1);
    expect(newestReadings([a, b, { ...a, at: 'not a time' }])).toBe(b);
    expect(newestReadings([])).toBeNull();
  });
});
