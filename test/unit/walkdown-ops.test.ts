/**
 * The walk's steps (components/walkdown-ops.ts) and one walkdown as CSV (pwa/walkdown-csv.ts).
 * Unit conversions are checked against NIST SP 811 (2008) App. B (1 psi = 6 894.757 Pa,
 * °F = K × 1.8 − 459.67, exact to the digits used); the rounding direction against the rule of the
 * project (pressures up, headroom down). Tanks and readings are invented test values.
 */
import { describe, expect, it } from 'vitest';
import { DEFAULT_SETTINGS, type Readings, type TankRecord } from '../../components/types.js';
import { projectTank, rankRows, type SiteForecast } from '../../components/walkdown-board.js';
import {
  checkEntry,
  editEntry,
  finishWalk,
  goTo,
  nextIndex,
  skipEntry,
  startWalk,
} from '../../components/walkdown-ops.js';
import { progress } from '../../components/walkdown-types.js';
import { walkdownToCsv } from '../../pwa/walkdown-csv.js';
import { DisplayUnits } from '../../components/display.js';

const NOW = new Date('2026-07-01T12:00:00Z');
const PSI = 6894.757;

function tank(id: string, name: string): TankRecord {
  return {
    id,
    site: 'Yard',
    name,
    notes: '',
    nameplate: { waterCapacity: 1, designPressureGauge: 250 * PSI },
    productId: 'propane',
    demo: false,
    createdAt: NOW.toISOString(),
    updatedAt: NOW.toISOString(),
  };
}

const READ: Readings = {
  liquidTemperature: 293.15,
  contentsMode: 'gaugePercent',
  gaugePercent: 60,
  levelHeight: null,
  netMass: null,
  pressureReadingGauge: null,
  peakAirTemperature: null,
  sunAllowance: 0,
};

// 105 °F: (105 + 459.67) / 1.8 K.
const F: SiteForecast = {
  site: 'Yard',
  days: [(105 + 459.67) / 1.8],
  sunAllowance: 5,
  tankAllowances: [],
  enteredAt: NOW.toISOString(),
  route: ['b'],
};

function walk() {
  const tanks = [tank('a', '=SUM(A1)'), tank('b', 'Bravo'), tank('c', 'Charlie')];
  const latest = new Map(
    tanks.map((t) => [t.id, { readings: READ, at: NOW.toISOString(), source: 'check' as const }]),
  );
  const rows = rankRows(
    tanks.map((t) => projectTank(t, latest.get(t.id)!, F, DEFAULT_SETTINGS, NOW)),
  );
  return { tanks, w: startWalk('Yard', rows, F, latest, 'Sam', 5, NOW) };
}

describe('the walk', () => {
  it('starts in the route order, takes the latest readings, and counts progress', () => {
    const { w } = walk();
    expect(w.entries[0]!.tankId).toBe('b');
    expect(w.entries.every((e) => e.readings.gaugePercent === 60)).toBe(true);
    expect(progress(w)).toEqual({ done: 0, total: 3 });
  });

  it('records a tank, skips one with its reason, and finishes with who checked', () => {
    const { tanks, w } = walk();
    let x = editEntry(w, 0, { readings: { ...READ, gaugePercent: 70 }, note: 'Valve cap missing' });
    x = checkEntry(
      x,
      0,
      tanks.find((t) => t.id === 'b'),
      DEFAULT_SETTINGS,
      NOW,
    );
    expect(x.entries[0]!.status).toBe('checked');
    expect(x.entries[0]!.result!.peakTemperature).toBeCloseTo((105 + 459.67) / 1.8 + 5, 9);
    x = goTo(x, nextIndex(x));
    expect(x.current).toBe(1);
    x = skipEntry(x, 1, '  ');
    expect(x.entries[1]!.reason).toBe('No reason given');
    x = finishWalk(x, ' Sam ', NOW);
    expect(x.status).toBe('finished');
    expect(x.checkedBy).toBe('Sam');
    expect(progress(x)).toEqual({ done: 2, total: 3 });
    // The record is plain data: it survives a JSON round trip (the backup) unchanged.
    expect(JSON.parse(JSON.stringify(x))).toEqual(x);
  });
});

/** One CSV line's cells (RFC 4180 quotes; no line breaks inside cells here). */
function cells(line: string): string[] {
  const out: string[] = [];
  let cur = '';
  let quoted = false;
  for (let i = 0; i < line.length; i++) {
    const ch = line[i]!;
    if (quoted) {
      if (ch === '"' && line[i + 1] === '"') {
        cur += '"';
        i++;
      } else if (ch === '"') quoted = false;
      else cur += ch;
    } else if (ch === '"') quoted = true;
    else if (ch === ',') {
      out.push(cur);
      cur = '';
    } else cur += ch;
  }
  out.push(cur);
  return out;
}

describe('walkdown CSV', () => {
  it('one row per tank, forecast and pressures in psig, rounded toward safety, formulas made inert', () => {
    const { tanks, w } = walk();
    let x = checkEntry(
      w,
      0,
      tanks.find((t) => t.id === 'b'),
      DEFAULT_SETTINGS,
      NOW,
    );
    x = skipEntry(x, 1, 'Locked gate');
    const csv = walkdownToCsv(
      finishWalk(x, 'Sam', NOW),
      DisplayUnits.fromSettings(DEFAULT_SETTINGS),
    );
    const lines = csv.trimEnd().split('\r\n');
    expect(lines.length).toBe(4);
    const head = cells(lines[0]!);
    const row = cells(lines.find((l) => l.includes('Bravo'))!);
    const col = (name: string) => row[head.findIndex((h) => h.startsWith(name))]!;
    expect(Number(col('forecast peak air'))).toBeCloseTo(105, 6);
    expect(Number(col('design pressure'))).toBeCloseTo(250, 6);
    const r = x.entries[0]!.result!;
    // Peak pressure shown ≥ the SI figure, headroom shown ≤ it (NIST psi).
    expect(Number(col('peak pressure')) * PSI).toBeGreaterThanOrEqual(r.summary.peakGauge - 1e-6);
    expect(Number(col('headroom to relief')) * PSI).toBeLessThanOrEqual(
      r.summary.headroomToRelief + 1e-6,
    );
    expect(Number(col('peak pressure')) * PSI - r.summary.peakGauge).toBeLessThan(PSI);
    // The raised peak, last column, names gauge; shown rounded up, and the headroom to design
    // shown (rounded down) reconciles with design − raised peak as printed, within 1 psi.
    expect(head[head.length - 1]).toMatch(
      /^peak raised by the model allowance.*\(psig, rounded up\)$/,
    );
    const upper = Number(row[row.length - 1]);
    expect(upper * PSI).toBeGreaterThanOrEqual(r.summary.peakGaugeUpper! - 1e-6);
    expect(upper * PSI - r.summary.peakGaugeUpper!).toBeLessThan(PSI);
    expect(upper).toBeGreaterThanOrEqual(Number(col('peak pressure')));
    const fromUpper = Number(col('design pressure')) - upper;
    expect(Number(col('headroom to design'))).toBeLessThanOrEqual(fromUpper + 1e-9);
    expect(Number(col('headroom to design'))).toBeGreaterThan(fromUpper - 2);
    expect(csv).toContain("'=SUM(A1)");
    expect(csv).toContain('Locked gate');
  });
});
