/// <reference types="mocha" />
// <check-screen> draws again only what an edit changes (the head is kept while the tank, units
// and minute stay; the form is not given new error objects for the same messages; the chart moves
// with its own series). These tests hold it to the one thing that matters: after any edit, every
// figure on the screen is the one a screen opened fresh on the new readings, tank or units shows
// (kind: identity — two paths to the same screen, one updated in place and one drawn once), and
// those are the engine's own (`checkTank` for the same input). The tank is a made-up fixture, not
// the demo data and not a published case.
import { expect, fixture, html, waitUntil } from '@open-wc/testing';
import '../../components/check-screen.js';
import type { CheckScreen } from '../../components/check-screen.js';
import {
  DEFAULT_SETTINGS,
  emptyReadings,
  type Readings,
  type Settings,
  type TankRecord,
} from '../../components/types.js';
import { buildCheckInput } from '../../components/check-input.js';
import { checkTank } from '../../thermo/index.js';
import { toSI } from '../../thermo/units.js';
import { byTestId, deep, deepAll, typeText } from './dom.js';

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
    reliefSetPressureGauge: toSI('gaugePressure', 1600, 'kPag'),
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
    pressureReadingGauge: toSI('gaugePressure', 800, 'kPag'),
    peakAirTemperature: toSI('temperature', 30, 'C'),
    ...patch,
  };
}

type Updating = { updateComplete: Promise<unknown> };

async function settle(el: CheckScreen): Promise<void> {
  await el.updateComplete;
  for (const tag of ['check-form', 'key-bar', 'check-results'])
    await (deep(el, tag) as unknown as Updating).updateComplete;
}

async function open(r: Readings, t = tank, s = settings): Promise<CheckScreen> {
  const el = await fixture<CheckScreen>(
    html`<check-screen .tank=${t} .settings=${s} .readings=${r}></check-screen>`,
  );
  await settle(el);
  return el;
}

/**
 * Every figure and line the screen shows: the head, the key bar and the results (each element
 * with a data-testid: its SI value and its text). The polite announcer is left out (it speaks a
 * moment after typing stops, by design).
 */
function shown(el: CheckScreen): Record<string, string> {
  const out: Record<string, string> = {};
  const parts = [deep(el, '.head'), deep(el, 'key-bar'), deep(el, 'check-results')];
  for (const part of parts) {
    expect(part, 'part of the screen').to.not.equal(null);
    for (const x of deepAll(part!, '[data-testid]')) {
      const id = x.dataset.testid!;
      if (id === 'results-announcer') continue;
      let n = 0;
      while (`${id}#${n}` in out) n++;
      out[`${id}#${n}`] =
        `${x.dataset.si ?? ''}|${(x.textContent ?? '').replace(/\s+/g, ' ').trim()}`;
    }
  }
  out.plate = (deep(el, '.plate')?.textContent ?? '').replace(/\s+/g, ' ').trim();
  return out;
}

/** The chart's two panels as drawn, once drawn. */
async function chartOf(el: CheckScreen): Promise<string> {
  await waitUntil(() => deep(el, '[data-testid="chart-liquid"]') !== null, 'chart drawn', {
    timeout: 5000,
  });
  return deep(el, '[data-testid="chart"]')!.outerHTML;
}

describe('check-screen draws again only what changed, and every figure follows an edit', () => {
  it('a typed liquid temperature changes every figure to those of a screen opened on it', async () => {
    const el = await open(readings());
    const before = shown(el);
    const input = byTestId(el, 'liquid-temperature') as HTMLInputElement;
    const was = el.dataset.checkInput;
    typeText(input, '35');
    await waitUntil(() => el.dataset.checkInput !== was, 'figures for the new reading');
    await settle(el);
    const after = shown(el);

    const next = readings({ liquidTemperature: toSI('temperature', 35, 'C') });
    const fresh = await open(next);
    expect(after).to.deep.equal(shown(fresh));
    // Not a vacuous comparison: the edit moved the figures, to the engine's own.
    expect(after['key-stop-percent#0']).to.not.equal(before['key-stop-percent#0']);
    const engine = checkTank(buildCheckInput(tank, next, settings).input!);
    expect(Number(byTestId(el, 'key-stop-percent').dataset.si)).to.equal(
      engine.fillLimit.stopAtGaugePercent,
    );
    expect(Number(byTestId(el, 'peak-pressure').dataset.si)).to.equal(engine.peak.pGauge);
    expect(Number(byTestId(el, 'result-pressure').dataset.si)).to.equal(engine.pGauge);
  });

  it('the heating chart ends up drawn as on a screen opened on the new reading', async () => {
    const el = await open(readings());
    const first = await chartOf(el);
    typeText(byTestId(el, 'liquid-temperature') as HTMLInputElement, '35');
    const fresh = await chartOf(
      await open(readings({ liquidTemperature: toSI('temperature', 35, 'C') })),
    );
    expect(fresh).to.not.equal(first);
    await waitUntil(
      () => deep(el, '[data-testid="chart"]')?.outerHTML === fresh,
      'the chart of the new reading',
      { timeout: 5000 },
    );
  });

  it('a changed tank redraws the head and the figures', async () => {
    const el = await open(readings());
    const before = shown(el);
    const other: TankRecord = {
      ...tank,
      name: 'Renamed tank',
      nameplate: { ...tank.nameplate, designPressureGauge: toSI('gaugePressure', 2400, 'kPag') },
    };
    el.tank = other;
    await settle(el);
    const after = shown(el);
    expect(after).to.deep.equal(shown(await open(readings(), other)));
    expect(after['tank-heading#0']).to.contain('Renamed tank');
    expect(after.plate).to.not.equal(before.plate);
  });

  it('changed units redraw the head and every figure in them', async () => {
    const el = await open(readings());
    const us: Settings = {
      ...settings,
      units: { pressure: 'psig', temperature: 'F', volume: 'usgal', mass: 'lb', length: 'in' },
    };
    el.settings = us;
    await settle(el);
    const after = shown(el);
    expect(after).to.deep.equal(shown(await open(readings(), tank, us)));
    expect(after.plate).to.contain('psig');
  });
});
