/// <reference types="mocha" />
// The app's message catalogue (components/messages.ts) against the engine's codes: every code
// the engine can emit has an entry, and a sweep of made-up tanks that raises most cautions is
// written with no foreign unit — metric settings show no psig, °F, US gal or lb; US settings
// show no kelvin — and no engine field name. The tanks are invented fixtures, not check values.
import { expect, fixture, html } from '@open-wc/testing';
import '../../components/check-results.js';
import type { CheckResults } from '../../components/check-results.js';
import { CAUSE_WORDS, CAUTION_WORDS, causeText, cautionText } from '../../components/messages.js';
import { DisplayUnits } from '../../components/display.js';
import {
  CAUSE_CODES,
  CAUTION_CODES,
  checkTank,
  LPG_PRESETS,
  type TankCheckInput,
  type TankCheckResult,
} from '../../thermo/index.js';

const metric = new DisplayUnits({
  pressure: 'kPag',
  temperature: 'C',
  volume: 'L',
  mass: 'kg',
  length: 'm',
});
const metricBar = new DisplayUnits({
  pressure: 'barg',
  temperature: 'C',
  volume: 'm3',
  mass: 'kg',
  length: 'cm',
});
const us = new DisplayUnits({
  pressure: 'psig',
  temperature: 'F',
  volume: 'usgal',
  mass: 'lb',
  length: 'in',
});

/** US or imperial words a metric user must not see. */
const US_UNITS = /psi|°F|US gal|\blb\b/;
/** A figure followed by a kelvin sign (or a kelvin difference). */
const KELVIN = /\d\s*K\b/;
/** Engine names of fields and ids. */
const ENGINE_NAMES =
  /contents\.[a-zA-Z]|gaugePercent|netMass|liquidTemperature|peakTemperature|[a-z]+-[a-z]+-[a-z]+/;

const propane = (patch: Partial<TankCheckInput> = {}): TankCheckInput => ({
  tank: { waterCapacity: 1.9, designPressureGauge: 1.72e6 },
  product: 'propane',
  liquidTemperature: 290,
  contents: { gaugePercent: 50 },
  peakTemperature: 305,
  ...patch,
});

const SCENARIOS: TankCheckInput[] = [
  {
    tank: { waterCapacity: 1, designPressureGauge: 2e7 },
    product: 'carbon-dioxide',
    liquidTemperature: 283.15,
    contents: { netMass: 700 },
    peakTemperature: 304.35,
  },
  {
    tank: { waterCapacity: 1, designPressureGauge: 2e7 },
    product: 'carbon-dioxide',
    liquidTemperature: 310,
    contents: { netMass: 600 },
    peakTemperature: 312,
  },
  {
    tank: { waterCapacity: 1, designPressureGauge: 2e7, reliefSetPressureGauge: 1.9e7 },
    product: 'carbon-dioxide',
    liquidTemperature: 280,
    contents: { netMass: 200 },
    peakTemperature: 310,
    pressureReadingGauge: 2e5,
  },
  {
    tank: { waterCapacity: 1, designPressureGauge: 1e6, minDesignMetalTemperature: 260 },
    product: 'n-butane',
    liquidTemperature: 250,
    contents: { gaugePercent: 40 },
    peakTemperature: 290,
  },
  propane({
    tank: { waterCapacity: 1.9, designPressureGauge: 1.72e6, minDesignMetalTemperature: 240 },
  }),
  propane({ pressureReadingGauge: 2e6 }),
  propane({ pressureReadingGauge: 3e5, specificGravity: 0.6 }),
  propane({ contents: { gaugePercent: 100 } }),
  propane({ contents: { gaugePercent: 87 }, peakTemperature: 318 }),
  propane({ contents: { gaugePercent: 80 }, peakTemperature: 312 }),
  propane({ contents: { netMass: 0 } }),
  propane({
    tank: {
      waterCapacity: 1.9,
      designPressureGauge: 1.72e6,
      reliefSetPressureGauge: 1.8e6,
      shape: { kind: 'sphere', diameter: 2 },
    },
    peakTemperature: 280,
  }),
  propane({ tank: { waterCapacity: 1.9, designPressureGauge: 1.2e6 }, peakTemperature: 320 }),
  propane({
    tank: { waterCapacity: 1.9, designPressureGauge: 1.2e6, reliefSetPressureGauge: 1.19e6 },
  }),
  {
    ...propane(),
    product: LPG_PRESETS.find((p) => p.id === 'pb-50-50')!.product,
    liquidTemperature: 272.08,
    contents: { gaugePercent: 0.031 },
    peakTemperature: 282.89,
  },
];

const results: TankCheckResult[] = SCENARIOS.map((s) => checkTank(s));
const cautions = results.flatMap((r) => r.cautions);

describe('messages catalogue', () => {
  it('has an entry for every caution and cause code the engine can emit', () => {
    for (const code of CAUTION_CODES) expect(CAUTION_WORDS, code).to.have.property(code);
    for (const code of CAUSE_CODES)
      expect(CAUSE_WORDS[code]?.length ?? 0, code).to.be.greaterThan(10);
    // The sweep reaches most codes, and every code it meets is a listed one.
    const seen = new Set(cautions.map((c) => c.code));
    for (const code of seen) expect(CAUTION_CODES as readonly string[]).to.include(code);
    expect(seen.size, [...seen].join(', ')).to.be.greaterThan(20);
  });

  it('writes every caution of the sweep with no US unit for metric users', () => {
    for (const d of [metric, metricBar])
      for (const c of cautions) {
        const text = cautionText(c, d);
        expect(text, c.code).to.not.match(US_UNITS);
        expect(text, c.code).to.not.match(KELVIN);
        expect(text, c.code).to.not.match(/NaN|undefined|Infinity/);
        if (c.code !== 'standing') expect(text.length, c.code).to.be.greaterThan(20);
      }
  });

  it('writes every caution of the sweep with no kelvin and no engine name for US users', () => {
    for (const c of cautions) {
      const text = cautionText(c, us);
      expect(text, c.code).to.not.match(KELVIN);
      expect(text, c.code).to.not.match(ENGINE_NAMES);
      expect(text, c.code).to.not.match(/kPa|°C/);
    }
  });

  it('uses the caution’s own numbers: the dense-fluid danger names the peak in the user’s unit', () => {
    // 304.35 K = 31.2 °C = 88.16 °F (K − 273.15; × 1.8 + 32).
    const c = results[0]!.cautions.find((x) => x.code === 'dense-fluid-at-peak')!;
    expect(cautionText(c, metric)).to.contain('31.2 °C');
    expect(cautionText(c, us)).to.contain('88.2 °F');
    expect(cautionText(c, metric)).to.contain('full of dense fluid');
  });

  it('words diagnosis causes from their codes', () => {
    const high = results[5]!.diagnosis!;
    expect(high.verdict).to.equal('high');
    expect(high.causeCodes.length).to.be.greaterThan(0);
    for (const code of high.causeCodes) expect(causeText(code)).to.not.match(ENGINE_NAMES);
  });
});

describe('check-results writes cautions and the diagnosis in the user’s units', () => {
  for (const [name, d, foreign] of [
    ['metric', metric, US_UNITS],
    ['US', us, KELVIN],
  ] as const) {
    it(`shows no foreign unit in cautions or the diagnosis (${name})`, async () => {
      for (const r of [results[0]!, results[2]!, results[5]!, results[6]!]) {
        const el = await fixture<CheckResults>(
          html`<check-results .result=${r} .display=${d} .missing=${[]}></check-results>`,
        );
        await el.updateComplete;
        const nodes = [
          ...el.shadowRoot!.querySelectorAll('[data-testid="caution"], [data-testid="diagnosis"]'),
        ];
        expect(nodes.length).to.be.greaterThan(0);
        for (const n of nodes) expect(n.textContent ?? '').to.not.match(foreign);
      }
    });
  }
});

describe('check-results says the relief setting is reached now', () => {
  it('shows "Now" rather than a temperature when the pressure is already at the setting', async () => {
    // Propane at 300 K has a vapour pressure near 1 MPa absolute (about 145 psia, from memory);
    // a relief setting of 0.5 MPa gauge is below it, so it is reached now.
    const r = checkTank(
      propane({
        tank: { waterCapacity: 1.9, designPressureGauge: 1.72e6, reliefSetPressureGauge: 5e5 },
        liquidTemperature: 300,
      }),
    );
    const el = await fixture<CheckResults>(
      html`<check-results .result=${r} .display=${metric} .missing=${[]}></check-results>`,
    );
    await el.updateComplete;
    const t = el.shadowRoot!.querySelector('[data-testid="relief-temperature"]')!;
    expect(t.textContent).to.contain('Now');
    expect(r.cautions.map((c) => c.code)).to.include('relief-now');
  });
});
