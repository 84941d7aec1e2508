/// <reference types="mocha" />
// The app's side of fills: findings worded from their codes in the user's units, refusals on
// the field that caused them, the gauge-low flag, the fills CSV. Figures are checked against
// the hand cases of test/reference/fill/worked-cases.md (propane, 1,000 US gal water capacity,
// 20 % at 60 °F), converted by hand; the tank is a made-up fixture. Kind: published / behaviour.
import { expect } from '@open-wc/testing';
import { DisplayUnits } from '../../components/display.js';
import { DEFAULT_SETTINGS, type Settings, type TankRecord } from '../../components/types.js';
import { FILL_CODES, FILL_WORDS, fillFindingText } from '../../components/messages.js';
import { runFill } from '../../components/fill-run.js';
import { newFillDraft } from '../../components/fill-start.js';
import { lastFillFlag } from '../../components/fill-flag.js';
import { fillsToCsv } from '../../pwa/fill-csv.js';
import { checkTank } from '../../thermo/index.js';
import {
  makeFillRecord,
  reconcileFill,
  startFill,
  type FillInput,
  type FillRecord,
} from '../../thermo/fill/index.js';
import type { TankCheckInput } from '../../thermo/check/types.js';
import { toSI } from '../../thermo/units.js';

const F = (x: number) => toSI('temperature', x, 'F');
const gal = (x: number) => toSI('volume', x, 'usgal');
const US: Settings = DEFAULT_SETTINGS;
const METRIC: Settings = {
  ...DEFAULT_SETTINGS,
  units: { pressure: 'kPag', temperature: 'C', volume: 'L', mass: 'kg', length: 'cm' },
  numberFormat: 'point',
};
const CASES = 'test/reference/fill/worked-cases.md';

const check: TankCheckInput = {
  tank: { waterCapacity: gal(1000), designPressureGauge: toSI('gaugePressure', 250, 'psig') },
  product: 'propane',
  liquidTemperature: F(60),
  contents: { gaugePercent: 20 },
  peakTemperature: F(80),
};
const start = startFill(check, undefined, new Date('2026-03-01T09:00:00Z'));
const run = (delivered: FillInput['delivered'], after: FillInput['after'], s = start) =>
  reconcileFill({ start: s, delivered, after });

/** The first number before `unit` in `text` (points as decimal marks). */
function numberBefore(text: string, unit: string): number {
  const m = new RegExp(`(-?[\\d,]+(?:\\.\\d+)?) ${unit}`).exec(text);
  if (!m) throw new Error(`no “${unit}” figure in: ${text}`);
  return Number(m[1]!.replace(/,/g, ''));
}

describe('fill findings in the user’s units', () => {
  it('case 4 (700 gal into 20 %): over the limit by 415.3 lb = 188.4 kg, rounded up', () => {
    // The gauge reads what the meter expects, so the amount over is the metered contents'.
    const probe = run({ volume: gal(700) }, { gaugePercent: 100 });
    const r = run({ volume: gal(700) }, { gaugePercent: probe.expectedGaugePercent });
    const over = r.findings.find((f) => f.code === 'fill-over-limit')!;
    const lb = numberBefore(fillFindingText(over, DisplayUnits.fromSettings(US)), 'lb');
    const kg = numberBefore(fillFindingText(over, DisplayUnits.fromSettings(METRIC)), 'kg');
    // Hand figures: 3,913.2 − 3,497.9 = 415.3 lb; 415.3 × 0.45359237 = 188.38 kg. The model's
    // density allowance (±0.5 % of the contents, about ±20 lb) bounds the difference.
    expect(Math.abs(lb - 415.3)).to.be.below(20, `${CASES} case 4`);
    expect(Math.abs(kg - 188.38)).to.be.below(9, `${CASES} case 4`);
    expect(kg * 2.20462262).to.be.at.least(r.overMass * 2.20462262 - 0.1); // rounded up
    expect(kg).to.be.at.least(r.overMass);
  });

  it('every code a reconciliation gives has an entry, and metric text has no US unit', () => {
    const empty = startFill({ ...check, contents: { gaugePercent: 0 } });
    const results = [
      run({ volume: gal(400) }, { gaugePercent: 61 }),
      run({ volume: gal(400) }, { gaugePercent: 52 }),
      run({ volume: gal(400) }, { gaugePercent: 70 }),
      run({ volume: gal(700) }, { gaugePercent: 95 }),
      run({ volume: gal(100), interrupted: true }, { gaugePercent: 31, liquidTemperature: F(40) }),
      run({ volume: 0 }, { gaugePercent: 20 }),
      run(
        { volume: gal(400) },
        { gaugePercent: 61, pressureReadingGauge: toSI('gaugePressure', 11.3, 'psig') },
      ),
      run({ volume: gal(750) }, { gaugePercent: 75 }, empty),
    ];
    const seen = new Set<string>();
    const d = DisplayUnits.fromSettings(METRIC);
    for (const r of results)
      for (const f of r.findings) {
        if (f.code === 'standing') continue;
        seen.add(f.code);
        expect(FILL_CODES as readonly string[]).to.include(f.code);
        const text = fillFindingText(f, d);
        expect(text, f.code).not.to.match(/\blb\b|gal|°F|psi|NaN|undefined/);
      }
    for (const c of [
      'fill-consistent',
      'fill-gauge-low',
      'fill-gauge-high',
      'fill-over-limit',
      'fill-pressure-off-curve',
      'fill-interrupted',
      'fill-nothing-delivered',
      'fill-from-empty',
      'fill-same-gauge',
    ])
      expect([...seen]).to.include(c);
    expect(Object.keys(FILL_WORDS).sort()).to.deep.equal([...FILL_CODES].sort());
  });

  it('a finding with a parameter missing keeps the engine’s own sentence', () => {
    const f = { code: 'fill-over-limit', message: 'engine words', params: {} };
    expect(fillFindingText(f, DisplayUnits.fromSettings(US))).to.equal('engine words');
  });
});

describe('fill refusals on their field, in the user’s units', () => {
  const tank = { id: 't' } as TankRecord;
  const draftOf = (s: Settings) => newFillDraft(tank.id, check, checkTank(check), s);
  it('an after-gauge below the contents before is refused on the after-gauge field', () => {
    const d = DisplayUnits.fromSettings(METRIC);
    const o = runFill({ ...draftOf(METRIC), volume: 0.5, afterGauge: 10 }, METRIC, d);
    expect(o.refusal?.field).to.equal('afterGauge');
    // The contents before alone read 20 % at the same temperature (the floor is rounded down).
    expect(o.refusal?.message).to.match(/^Float gauge after must be from 20(\.0)? to 100 %/);
    expect(o.refusal?.message).to.contain('cannot lower the level');
    expect(o.result).to.equal(null);
  });
  it('a delivery that cannot fit is refused on the volume field in litres', () => {
    const d = DisplayUnits.fromSettings(METRIC);
    const o = runFill({ ...draftOf(METRIC), volume: 5, afterGauge: 90 }, METRIC, d);
    expect(o.refusal?.field).to.equal('volume');
    expect(o.refusal?.message).to.match(/^Metered volume must be from 0 to [\d,]+(\.\d+)? L/);
    expect(o.refusal?.message).not.to.match(/m³|NaN/);
    // 110 % of a liquid-full 3,785 L tank less the 20 % before: at most about 3,400 L (hand).
    expect(numberBefore(o.refusal!.message, 'L')).to.be.within(3000, 3500);
  });
  it('the meter basis follows the units: 15 °C metric, 60 °F US, gross when unticked', () => {
    const m = runFill(
      { ...draftOf(METRIC), volume: 1, afterGauge: 40 },
      METRIC,
      DisplayUnits.fromSettings(METRIC),
    );
    expect(m.input?.delivered.basis).to.equal('compensated-15C');
    const u = runFill(
      { ...draftOf(US), volume: 1, afterGauge: 40 },
      US,
      DisplayUnits.fromSettings(US),
    );
    expect(u.input?.delivered.basis).to.equal('compensated-60F');
    const g = runFill(
      { ...draftOf(US), volume: 1, afterGauge: 40, compensated: false },
      US,
      DisplayUnits.fromSettings(US),
    );
    expect(g.input?.delivered.basis).to.equal('gross');
    expect(u.input?.accuracy).to.deep.equal({ gaugePoints: 3, meterFraction: 0.01 });
  });
});

function record(id: string, at: string, after: number): FillRecord {
  return makeFillRecord({
    id,
    tankId: 't',
    input: { start, delivered: { volume: gal(400) }, after: { gaugePercent: after } },
    note: '=HYPERLINK("x")',
    at: new Date(at),
  });
}

describe('lastFillFlag', () => {
  const low = record('low', '2026-03-01T10:00:00Z', 52);
  const fine = record('fine', '2026-03-02T10:00:00Z', 61);
  it('flags a tank whose last fill read low until a later check', () => {
    expect(low.result.verdict).to.equal('gauge-low');
    expect(lastFillFlag([low], [])?.fillId).to.equal('low');
    expect(lastFillFlag([low], [{ at: '2026-02-28T10:00:00Z' }])?.fillId).to.equal('low');
    expect(lastFillFlag([low], [{ at: '2026-03-01T11:00:00Z' }])).to.equal(null);
  });
  it('only the newest fill counts', () => {
    expect(lastFillFlag([low, fine], [])).to.equal(null);
    expect(
      lastFillFlag([fine, { ...low, finishedAt: '2026-03-03T10:00:00Z' }], [])?.fillId,
    ).to.equal('low');
    expect(lastFillFlag([], [])).to.equal(null);
  });
});

describe('fillsToCsv', () => {
  it('one row per fill, units in the headings, the note made inert', () => {
    const csv = fillsToCsv(
      [{ id: 't', site: 'S', name: 'Fixture' } as TankRecord],
      [record('a', '2026-03-01T10:00:00Z', 61)],
      DisplayUnits.fromSettings(METRIC),
    );
    const [head, row] = csv.trimEnd().split('\r\n');
    expect(head).to.contain('metered volume (L)').and.to.contain('delivered (kg)');
    expect(row).to.contain('consistent');
    expect(row).to.contain(`"'=HYPERLINK(""x"")"`);
    // 400 US gal = 1514.2 L (1 US gal = 3.785411784 L, exact by definition).
    expect(row).to.contain('1514');
  });
});
