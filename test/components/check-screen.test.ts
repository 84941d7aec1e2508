/// <reference types="mocha" />
// <check-screen> with the real check engine: live results as the user types, the same figures as
// `checkTank` for the same input (kind: identity — the screen adds nothing to the engine's
// numbers but formatting), errors next to the field, and the save event.
// The tank below is a made-up test fixture, not the demo data and not a published case.
import { expect, fixture, html, oneEvent, waitUntil } from '@open-wc/testing';
import '../../components/check-screen.js';
import type { CheckScreen, CheckSaveDetail } from '../../components/check-screen.js';
import type { NumberField } from '../../components/number-field.js';
import {
  DEFAULT_SETTINGS,
  emptyReadings,
  type Readings,
  type Settings,
  type TankRecord,
} from '../../components/types.js';
import { DisplayUnits } from '../../components/display.js';
import { buildCheckInput } from '../../components/check-input.js';
import { checkTank } from '../../thermo/index.js';
import { toSI } from '../../thermo/units.js';
import { byTestId, deep } from './dom.js';
import { FIELD_ERROR } from './dom.js';

const settings: Settings = {
  ...DEFAULT_SETTINGS,
  units: { pressure: 'kPag', temperature: 'C', volume: 'L', mass: 'kg', length: 'cm' },
};

const tank: TankRecord = {
  id: 'test-tank',
  site: 'Test bench',
  name: 'Fixture tank',
  notes: '',
  nameplate: {
    waterCapacity: 1,
    designPressureGauge: toSI('gaugePressure', 1700, 'kPag'),
    placement: 'aboveground',
    containerClass: 'storage',
  },
  productId: 'propane',
  demo: false,
  createdAt: '2024-01-01T00:00:00.000Z',
  updatedAt: '2024-01-01T00:00:00.000Z',
};

function readings(patch: Partial<Readings> = {}): Readings {
  return {
    ...emptyReadings(5),
    liquidTemperature: toSI('temperature', 20, 'C'),
    gaugePercent: 50,
    peakAirTemperature: toSI('temperature', 30, 'C'),
    ...patch,
  };
}

async function settle(el: CheckScreen): Promise<void> {
  await el.updateComplete;
  for (const tag of ['check-form', 'check-results'])
    await (el.shadowRoot!.querySelector(tag) as unknown as { updateComplete: Promise<unknown> })
      .updateComplete;
}

async function typeInto(el: CheckScreen, testid: string, text: string): Promise<void> {
  const input = byTestId(el, testid) as HTMLInputElement;
  input.value = text;
  input.dispatchEvent(new Event('input', { bubbles: true, composed: true }));
  const host = (input.getRootNode() as ShadowRoot).host as NumberField;
  await host.updateComplete;
  await settle(el);
}

describe('check-screen', () => {
  it('check-screen shows the fill limit that checkTank gives for the same input, rounded down', async () => {
    const r = readings();
    const el = await fixture<CheckScreen>(
      html`<check-screen .tank=${tank} .settings=${settings} .readings=${r}></check-screen>`,
    );
    await settle(el);
    const expected = checkTank(buildCheckInput(tank, r, settings).input!);
    const fill = byTestId(el, 'fill-limit');
    expect(Number(fill.dataset.si)).to.equal(expected.fillLimit.maxMass);
    const d = DisplayUnits.fromSettings(settings);
    expect(fill.textContent).to.equal(d.format('mass', expected.fillLimit.maxMass, 'down'));
    expect(Number(byTestId(el, 'fill-stop-percent').dataset.si)).to.equal(
      expected.fillLimit.stopAtGaugePercent,
    );
    expect(Number(byTestId(el, 'peak-pressure').dataset.si)).to.equal(expected.peak.pGauge);
    expect(byTestId(el, 'standing-caution').textContent).to.contain(expected.standingCaution);
    expect(el.shadowRoot!.textContent).not.to.contain('NaN');
    // The host says which engine input the figures come from.
    expect(JSON.parse(el.dataset.checkInput!)).to.deep.equal(
      JSON.parse(JSON.stringify(buildCheckInput(tank, r, settings).input)),
    );
  });

  it('check-screen updates the results live when the liquid temperature changes (no compute button)', async () => {
    const el = await fixture<CheckScreen>(
      html`<check-screen
        .tank=${tank}
        .settings=${settings}
        .readings=${readings()}
      ></check-screen>`,
    );
    await settle(el);
    const before = Number(byTestId(el, 'fill-stop-percent').dataset.si);
    await typeInto(el, 'liquid-temperature', '35');
    const after = Number(byTestId(el, 'fill-stop-percent').dataset.si);
    const expected = checkTank(
      buildCheckInput(tank, readings({ liquidTemperature: toSI('temperature', 35, 'C') }), settings)
        .input!,
    );
    expect(after).to.equal(expected.fillLimit.stopAtGaugePercent);
    expect(after).to.not.equal(before);
  });

  it('check-screen asks for the missing readings and still shows the standing caution', async () => {
    const el = await fixture<CheckScreen>(
      html`<check-screen
        .tank=${tank}
        .settings=${settings}
        .readings=${emptyReadings(5)}
      ></check-screen>`,
    );
    await settle(el);
    expect(byTestId(el, 'results-missing').textContent).to.contain('liquid temperature');
    expect(byTestId(el, 'standing-caution').textContent).to.contain('never replace');
    expect((byTestId(el, 'check-save') as HTMLButtonElement).disabled).to.equal(true);
  });

  it('check-screen names the field and its range for a bad reading and hides the figures', async () => {
    const el = await fixture<CheckScreen>(
      html`<check-screen
        .tank=${tank}
        .settings=${settings}
        .readings=${readings()}
      ></check-screen>`,
    );
    await settle(el);
    await typeInto(el, 'gauge-percent', '140');
    const err = deep(el, FIELD_ERROR);
    expect(err?.textContent).to.contain('Float gauge must be from 0 to 100 %');
    expect(byTestId(el, 'results-error').textContent).to.contain('not valid');
    expect(deep(el.shadowRoot!, '[data-testid="fill-limit"]')).to.equal(null);
    expect(el.shadowRoot!.textContent).not.to.contain('NaN');
  });

  it('check-screen fires check-save with the readings and the engine’s key figures', async () => {
    const r = readings();
    const el = await fixture<CheckScreen>(
      html`<check-screen .tank=${tank} .settings=${settings} .readings=${r}></check-screen>`,
    );
    await settle(el);
    const ev = oneEvent(el, 'check-save');
    byTestId(el, 'check-save').click();
    const { check } = ((await ev) as CustomEvent<CheckSaveDetail>).detail;
    const expected = checkTank(buildCheckInput(tank, r, settings).input!);
    expect(check.tankId).to.equal('test-tank');
    expect(check.readings).to.deep.equal(r);
    expect(check.summary.maxMass).to.equal(expected.fillLimit.maxMass);
    expect(check.summary.cautions.at(-1)?.code).to.equal('standing');
  });

  it('check-screen draws the heating chart with the design and relief lines and both markers', async () => {
    const el = await fixture<CheckScreen>(
      html`<check-screen
        .tank=${tank}
        .settings=${settings}
        .readings=${readings()}
      ></check-screen>`,
    );
    await waitUntil(
      () => deep(el.shadowRoot!, '[data-testid="chart-pressure"]') !== null,
      'chart drawn',
      { timeout: 3000 },
    );
    const p = deep(el.shadowRoot!, '[data-testid="chart-pressure"]')!;
    expect(p.querySelector('.design')).to.not.equal(null);
    expect(p.querySelector('.relief')).to.not.equal(null);
    expect(p.querySelector('circle.now')).to.not.equal(null);
    expect(p.querySelector('rect.peak')).to.not.equal(null);
    const l = deep(el.shadowRoot!, '[data-testid="chart-liquid"]')!;
    expect(l.querySelector('.full')).to.not.equal(null);
    expect(p.outerHTML).not.to.contain('NaN');
  });

  it('check-screen never words a result as permission', async () => {
    const el = await fixture<CheckScreen>(
      html`<check-screen
        .tank=${tank}
        .settings=${settings}
        .readings=${readings()}
      ></check-screen>`,
    );
    await settle(el);
    const text = (byTestId(el, 'results').textContent ?? '').toLowerCase();
    for (const banned of ['safe to fill', 'ok to fill', 'okay to fill', 'go ahead', 'you may fill'])
      expect(text).not.to.contain(banned);
  });

  it('check-screen takes the peak at the forecast air temperature plus the sun allowance', async () => {
    // Worked by hand: 30 °C forecast air + 5 K sun allowance = 273.15 + 35 = 308.15 K.
    const el = await fixture<CheckScreen>(
      html`<check-screen
        .tank=${tank}
        .settings=${settings}
        .readings=${readings()}
      ></check-screen>`,
    );
    await settle(el);
    const used = JSON.parse(el.dataset.checkInput!) as { peakTemperature: number };
    expect(Math.abs(used.peakTemperature - 308.15)).to.be.below(1e-9);
  });
});
