/// <reference types="mocha" />
// pwa/ modules as pure functions: backup validation, CSV export, routes and the demo site (run in
// the browser with the other app tests). Kind: identity / behaviour; records are placeholders.
import { expect } from '@open-wc/testing';
import { BACKUP_FORMAT, BACKUP_VERSION, makeBackup, parseBackup } from '../../pwa/backup.js';
import { makeFillRecord, startFill, type FillRecord } from '../../thermo/fill/index.js';
import { FORMAT1 } from './fixtures/backup-format1.js';
import { FORMAT2 } from './fixtures/backup-format2.js';
import {
  NAMED_CHECK,
  NAMED_FILL,
  NAMED_FORECAST,
  NAMED_SETTINGS,
  NAMED_TANK,
  NAMED_TANK_NO_RELIEF,
  NAMED_WALKDOWN,
} from './fixtures/named-records.js';
import { checksToCsv, looksLikeFormula } from '../../pwa/csv.js';
import { lastCheckByTank } from '../../pwa/lookups.js';
import { TEXT_LIMITS } from '../../components/limits.js';
import { href, parseRoute } from '../../pwa/router.js';
import { buildDemo, DEMO_REFRIGERANT_SITE, DEMO_SITE } from '../../pwa/demo.js';
import { DisplayUnits } from '../../components/display.js';
import { blankTank } from '../../components/blank-tank.js';
import {
  DEFAULT_SETTINGS,
  emptyReadings,
  type CheckRecord,
  type TankRecord,
} from '../../components/types.js';

function tank(id: string, name = `Tank ${id}`): TankRecord {
  return {
    ...blankTank(id, '2024-01-01T00:00:00.000Z'),
    site: 'S',
    name,
    nameplate: { waterCapacity: 1, designPressureGauge: 1e6 },
  };
}

function check(id: string, tankId: string): CheckRecord {
  return {
    id,
    tankId,
    at: '2024-02-01T10:00:00.000Z',
    demo: false,
    productLabel: 'Propane',
    readings: { ...emptyReadings(5), liquidTemperature: 293.15, gaugePercent: 50 },
    summary: {
      phase: 'two-phase',
      pGauge: 7e5,
      totalMass: 200,
      liquidVolume: 0.4,
      fillingDensity: 0.2,
      maxMass: 400,
      roomLeftMass: 200,
      stopAtGaugePercent: 80,
      binding: 'rule',
      peakTemperature: 303.15,
      peakGauge: 9e5,
      peakGaugeUpper: 9.045e5,
      peakLiquidFraction: 0.55,
      headroomToDesign: 1e5,
      headroomToRelief: -2e4,
      liquidFullTemperature: null,
      topLevel: 'warning',
      cautions: [
        { level: 'warning', code: 'w', message: 'A warning, with "quotes"' },
        { level: 'notice', code: 'standing', message: 'Standing.' },
      ],
    },
  };
}

/** A placeholder fill on tank `tankId` (1 m³ water capacity, propane), made by the engine. */
function fill(id: string, tankId: string): FillRecord {
  const start = startFill(
    {
      tank: { waterCapacity: 1, designPressureGauge: 1.7e6 },
      product: 'propane',
      liquidTemperature: 290,
      contents: { gaugePercent: 20 },
      peakTemperature: 300,
    },
    undefined,
    new Date('2024-02-01T09:00:00.000Z'),
  );
  return makeFillRecord({
    id,
    tankId,
    input: { start, delivered: { volume: 0.3 }, after: { gaugePercent: 50 } },
    note: 'ticket 12',
    at: new Date('2024-02-01T09:40:00.000Z'),
  });
}

describe('parseBackup', () => {
  it('parseBackup accepts what makeBackup wrote, unchanged, fill records included', () => {
    const data = {
      tanks: [tank('a')],
      checks: [check('c', 'a')],
      settings: { ...DEFAULT_SETTINGS, theme: 'standard' as const },
      fills: [fill('f1', 'a')],
      sites: [],
      walkdowns: [],
    };
    expect(makeBackup(data).version).to.equal(BACKUP_VERSION);
    const r = parseBackup(JSON.stringify(makeBackup(data)));
    expect(r.ok).to.equal(true);
    if (r.ok) expect(r.data).to.deep.equal(data);
  });

  it('parseBackup imports a format-1 backup (before fill records) whole, its pressures under today’s names', () => {
    expect(FORMAT1.version).to.equal(1);
    const r = parseBackup(JSON.stringify(FORMAT1));
    expect(r.ok).to.equal(true);
    if (!r.ok) return;
    // The fixture's figures, written out again under the names of format 3.
    const [t] = FORMAT1.tanks;
    const [c] = FORMAT1.checks;
    expect(r.data.tanks).to.deep.equal([
      { ...t, nameplate: { waterCapacity: 1.8927, designPressureGauge: 1723689 } },
    ]);
    const { gaugePressure: _r, ...readings } = c!.readings;
    const { pressure: _p, peakPressure: _k, ...summary } = c!.summary;
    expect(r.data.checks).to.deep.equal([
      {
        ...c,
        readings: { ...readings, pressureReadingGauge: null },
        summary: { ...summary, pGauge: 630000, peakGauge: 1100000 },
      },
    ]);
    expect(r.data.settings).to.equal(null);
    expect(r.data.fills).to.deep.equal([]);
  });

  it('parseBackup imports a format-2 backup (old pressure names) with every record under today’s names and the same figures', () => {
    expect(FORMAT2.version).to.equal(2);
    const r = parseBackup(JSON.stringify(FORMAT2));
    expect(r.ok, r.ok ? '' : r.reason).to.equal(true);
    if (!r.ok) return;
    expect(r.data.tanks).to.deep.equal([NAMED_TANK, NAMED_TANK_NO_RELIEF]);
    expect(r.data.checks).to.deep.equal([NAMED_CHECK]);
    expect(r.data.settings).to.deep.equal(NAMED_SETTINGS);
    expect(r.data.fills).to.deep.equal([NAMED_FILL]);
    expect(r.data.sites).to.deep.equal([NAMED_FORECAST]);
    expect(r.data.walkdowns).to.deep.equal([NAMED_WALKDOWN]);
  });

  it('a format-3 backup round-trips every pressure field under its new name', () => {
    const data = {
      tanks: [NAMED_TANK, NAMED_TANK_NO_RELIEF],
      checks: [NAMED_CHECK],
      settings: NAMED_SETTINGS,
      fills: [NAMED_FILL],
      sites: [NAMED_FORECAST],
      walkdowns: [NAMED_WALKDOWN],
    };
    const file = makeBackup(data);
    expect(file.version).to.equal(3);
    const text = JSON.stringify(file);
    for (const old of ['"designPressure"', '"gaugePressure"', '"peakPressure"', '"gaugeFullScale"'])
      expect(text).not.to.contain(old);
    const r = parseBackup(text);
    expect(r.ok).to.equal(true);
    if (r.ok) expect(r.data).to.deep.equal(data);
  });

  it('a format-3 backup under the old names is refused, naming the new field and its range', () => {
    const file = JSON.parse(JSON.stringify(FORMAT2)) as typeof FORMAT2;
    const r = parseBackup(JSON.stringify({ ...file, version: 3 }));
    expect(r.ok).to.equal(false);
    if (!r.ok) {
      expect(r.reason).to.contain('“designPressureGauge” must be a number from 10000 to 100000000');
      expect(r.reason).to.contain('Nothing was changed');
    }
    // A format-2 file whose old-named figure is out of range: the message names the field as
    // it is now called and its range.
    const low = JSON.parse(JSON.stringify(FORMAT2)) as typeof FORMAT2;
    low.tanks[0]!.nameplate.designPressure = 5;
    const r2 = parseBackup(JSON.stringify(low));
    expect(r2.ok).to.equal(false);
    if (!r2.ok) {
      expect(r2.reason).to.contain('Tank 1 (“Tank N1”), nameplate');
      expect(r2.reason).to.contain(
        '“designPressureGauge” must be a number from 10000 to 100000000',
      );
    }
  });

  it('parseBackup refuses a bad fill record, naming the fill and its field, and a fill of no tank', () => {
    const base = { tanks: [tank('a')], checks: [], settings: null };
    const f = fill('f1', 'a');
    const cases: [unknown, string][] = [
      [{ ...f, after: { ...f.after, gaugePercent: 140 } }, 'Fill 1: “fill.after.gaugePercent”'],
      [{ ...f, result: { ...f.result, verdict: 'fine' } }, 'Fill 1: “fill.result.verdict”'],
      [{ ...f, tankId: 'gone' }, 'belongs to a tank that is not in the file'],
      ['not a record', 'Fill 1: “fill” must be'],
    ];
    for (const [bad, says] of cases) {
      const r = parseBackup(JSON.stringify({ ...makeBackup(base), fills: [bad] }));
      expect(r.ok).to.equal(false);
      if (!r.ok) expect(r.reason).to.contain(says).and.to.contain('Nothing was changed');
    }
    const twice = parseBackup(JSON.stringify({ ...makeBackup(base), fills: [f, f] }));
    expect(twice.ok).to.equal(false);
    if (!twice.ok) expect(twice.reason).to.contain('same id as another fill');
  });

  it('parseBackup refuses a 200 000-character site name and says the limit', () => {
    const t = { ...tank('a'), site: 'x'.repeat(200_000) };
    const r = parseBackup(JSON.stringify(makeBackup({ tanks: [t], checks: [], settings: null })));
    expect(r.ok).to.equal(false);
    if (!r.ok) {
      expect(r.reason).to.contain('“site” is 200000 characters long');
      expect(r.reason).to.contain(`at most ${TEXT_LIMITS.site}`);
      expect(r.reason).to.contain('Nothing was changed');
    }
    const long = { ...tank('b'), name: 'n'.repeat(TEXT_LIMITS.name + 1) };
    expect(
      parseBackup(JSON.stringify(makeBackup({ tanks: [long], checks: [], settings: null }))).ok,
    ).to.equal(false);
    const notes = { ...tank('c'), notes: 'n'.repeat(TEXT_LIMITS.notes) };
    expect(
      parseBackup(JSON.stringify(makeBackup({ tanks: [notes], checks: [], settings: null }))).ok,
    ).to.equal(true);
  });

  it('parseBackup checks the number format setting', () => {
    const ok = { ...DEFAULT_SETTINGS, numberFormat: 'comma' as const };
    expect(
      parseBackup(JSON.stringify(makeBackup({ tanks: [], checks: [], settings: ok }))).ok,
    ).to.equal(true);
    const bad = { ...DEFAULT_SETTINGS, numberFormat: 'roman' };
    const r = parseBackup(
      JSON.stringify({ ...makeBackup({ tanks: [], checks: [], settings: null }), settings: bad }),
    );
    expect(r.ok).to.equal(false);
    // A backup from before the setting existed still imports, with the default.
    const { numberFormat: _omit, ...old } = DEFAULT_SETTINGS;
    void _omit;
    const o = parseBackup(
      JSON.stringify({ ...makeBackup({ tanks: [], checks: [], settings: null }), settings: old }),
    );
    expect(o.ok && o.data.settings?.numberFormat).to.equal('auto');
  });

  it('ids named like object built-ins are kept apart from them in look-ups', () => {
    const ids = ['__proto__', 'constructor', 'toString', 'hasOwnProperty'];
    const tanks = ids.map((id) => tank(id));
    const checks = ids.map((id) => check(`c-${id}`, id));
    const r = parseBackup(JSON.stringify(makeBackup({ tanks, checks, settings: null })));
    expect(r.ok).to.equal(true);
    const last = lastCheckByTank(checks);
    for (const id of ids) expect(last[id]?.id, id).to.equal(`c-${id}`);
    expect(last['valueOf']).to.equal(undefined);
    expect(lastCheckByTank([])['constructor']).to.equal(undefined);
  });

  it('parseBackup refuses text that is not JSON', () => {
    const r = parseBackup('name,site\nx,y');
    expect(r.ok).to.equal(false);
    if (!r.ok) expect(r.reason).to.contain('not JSON');
  });

  it('parseBackup refuses a JSON file from something else', () => {
    const r = parseBackup(JSON.stringify({ hello: 'world', tanks: [] }));
    expect(r.ok).to.equal(false);
    if (!r.ok) expect(r.reason).to.contain('not a backup from this app');
  });

  it('parseBackup refuses a backup from a newer version', () => {
    const r = parseBackup(
      JSON.stringify({ format: BACKUP_FORMAT, version: 99, tanks: [], checks: [] }),
    );
    expect(r.ok).to.equal(false);
    if (!r.ok) expect(r.reason).to.contain('newer version');
    // The first format after this app's (3).
    const next = parseBackup(JSON.stringify({ ...FORMAT2, version: 4 }));
    expect(next.ok).to.equal(false);
    if (!next.ok) expect(next.reason).to.contain('newer version of the app (format 4)');
  });

  it('parseBackup names the tank and the field that is wrong', () => {
    const bad = {
      ...tank('a', 'Broken one'),
      nameplate: { waterCapacity: 'lots', designPressureGauge: 1e6 },
    };
    const r = parseBackup(
      JSON.stringify(
        makeBackup({ tanks: [bad as unknown as TankRecord], checks: [], settings: null }),
      ),
    );
    expect(r.ok).to.equal(false);
    if (!r.ok) {
      expect(r.reason).to.contain('Broken one');
      expect(r.reason).to.contain('waterCapacity');
      expect(r.reason).to.contain('Nothing was changed');
    }
  });

  it('parseBackup refuses a check of a tank not in the file, duplicate ids and NaN figures', () => {
    expect(
      parseBackup(
        JSON.stringify(
          makeBackup({ tanks: [tank('a')], checks: [check('c', 'zzz')], settings: null }),
        ),
      ).ok,
    ).to.equal(false);
    expect(
      parseBackup(
        JSON.stringify(makeBackup({ tanks: [tank('a'), tank('a')], checks: [], settings: null })),
      ).ok,
    ).to.equal(false);
    const c = check('c', 'a');
    const text = JSON.stringify(
      makeBackup({ tanks: [tank('a')], checks: [c], settings: null }),
    ).replace('"maxMass":400', '"maxMass":"NaN"');
    expect(parseBackup(text).ok).to.equal(false);
  });

  it('parseBackup refuses settings with an unknown unit', () => {
    const s = { ...DEFAULT_SETTINGS, units: { ...DEFAULT_SETTINGS.units, pressure: 'mmHg' } };
    const r = parseBackup(
      JSON.stringify(makeBackup({ tanks: [], checks: [], settings: s as never })),
    );
    expect(r.ok).to.equal(false);
    if (!r.ok) expect(r.reason).to.contain('pressure');
  });
});

describe('checksToCsv', () => {
  it('checksToCsv writes one row per check with the units in the headings and rounds toward safety', () => {
    const d = new DisplayUnits({
      pressure: 'kPag',
      temperature: 'C',
      volume: 'L',
      mass: 'kg',
      length: 'cm',
    });
    const csv = checksToCsv([tank('a', '=cmd()')], [check('c', 'a')], d);
    const lines = csv.trimEnd().split('\r\n');
    expect(lines).to.have.length(2);
    expect(lines[0]).to.contain('fill limit (kg, rounded down)');
    expect(lines[0]).to.contain('liquid temperature (°C)');
    expect(lines[1]).to.contain("'=cmd()"); // a name that looks like a formula is made inert
    expect(lines[1]).to.contain('"warning: A warning, with ""quotes"""');
    expect(lines[1]).to.contain(',20.0,'); // 293.15 K = 20.0 °C
    expect(lines[1]).to.contain(',-20,'); // headroom to relief, kPa, rounded down
    // Last column: the raised peak the headrooms are measured from, gauge, rounded up (904.5 → 905).
    expect(lines[0]).to.match(/peak raised by the model allowance.*\(kPa g, rounded up\)"$/);
    expect(lines[1]).to.match(/,905$/);
    expect(csv).not.to.contain('NaN');
  });
});

describe('CSV formula guard', () => {
  // Cells a spreadsheet would run: OWASP "CSV Injection" (= + - @, tab, carriage return), and the
  // same behind leading spaces, a line break or in full width, which spreadsheets also accept.
  const risky = [
    '=cmd()',
    '+1+1',
    '-2+3',
    '@SUM(A1)',
    '   =HYPERLINK("x")',
    '\n=1+1',
    '\r\n@x',
    '\t=1',
    '\u3000=1',
    '＝1+1',
    '＋1',
    '－1',
    '＠x',
    '\u00a0+1',
  ];
  it('every formula-like cell is made inert with a leading apostrophe', () => {
    const d = new DisplayUnits(DEFAULT_SETTINGS.units);
    for (const name of risky) {
      expect(looksLikeFormula(name), JSON.stringify(name)).to.equal(true);
      const csv = checksToCsv([tank('a', name)], [check('c', 'a')], d);
      const row = csv.split('\r\n').slice(1).join('\r\n');
      // The tank name is the second cell; quoted when it holds a line break.
      const q = name.replace(/"/g, '""');
      expect(row.includes(`,'${q}`) || row.includes(`,"'${q}`), JSON.stringify(name)).to.equal(
        true,
      );
    }
  });

  it('plain text and names with signs inside are left alone', () => {
    for (const name of ['Tank 1', 'North yard = east', 'A-1', 'x@y', '1000 gal'])
      expect(looksLikeFormula(name), name).to.equal(false);
  });
});

describe('router', () => {
  it('parseRoute reads every screen and href writes it back', () => {
    const cases = [
      ['', { name: 'tanks' }],
      ['#/', { name: 'tanks' }],
      ['#/tank/new', { name: 'new' }],
      ['#/tank/abc-1', { name: 'check', id: 'abc-1' }],
      ['#/tank/abc-1/edit', { name: 'edit', id: 'abc-1' }],
      ['#/settings', { name: 'settings' }],
      ['#/data', { name: 'data' }],
    ] as const;
    for (const [hash, route] of cases) {
      expect(parseRoute(hash)).to.deep.equal(route);
      if (hash) expect(parseRoute(href(route))).to.deep.equal(route);
    }
    expect(parseRoute('#/nowhere/at/all').name).to.equal('not-found');
  });
});

describe('buildDemo', () => {
  it('buildDemo makes eight plainly invented tanks at two invented sites, all marked demo, each with readings', () => {
    const demo = buildDemo();
    expect(demo.tanks).to.have.length(8);
    for (const t of demo.tanks) {
      expect(t.demo).to.equal(true);
      expect([DEMO_SITE, DEMO_REFRIGERANT_SITE]).to.include(t.site);
      expect(t.name).to.match(/^Demo: /);
    }
    expect(DEMO_SITE).to.contain('not a real place');
    expect(DEMO_REFRIGERANT_SITE).to.contain('not a real firm');
    // The refrigeration van: an R-410A recovery cylinder and an R-454B cylinder.
    const van = demo.tanks.filter((t) => t.site === DEMO_REFRIGERANT_SITE);
    expect(van.map((t) => t.productId).sort()).to.deep.equal(['r410a', 'r454b']);
    expect(demo.drafts.map((d) => d.tankId)).to.deep.equal(demo.tanks.map((t) => t.id));
    for (const d of demo.drafts) expect(d.readings.liquidTemperature).to.be.a('number');
  });
});
