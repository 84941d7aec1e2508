/// <reference types="mocha" />
// <check-screen>: the answer first (the key bar above the readings with the engine's stop-at
// percent and room left at 60 °F / 15 °C), "over the limit by" for an over-full tank, and
// readings with a time (a reopened tank's last check offered for reuse, old readings marked).
// The figures are compared with `checkTank` for the same input (kind: identity — the screen adds
// only formatting). The tank and the times are made-up fixtures, not demo data.
import { expect, fixture, html, oneEvent } from '@open-wc/testing';
import '../../components/check-screen.js';
import type { CheckScreen } from '../../components/check-screen.js';
import type { ReadingsChange } from '../../components/check-form.js';
import {
  DEFAULT_SETTINGS,
  emptyReadings,
  type Readings,
  type Settings,
  type TankRecord,
} from '../../components/types.js';
import { DisplayUnits } from '../../components/display.js';
import { buildCheckInput } from '../../components/check-input.js';
import type { LastReadings } from '../../components/reopen.js';
import { summaryText } from '../../components/summary.js';
import { checkTank } from '../../thermo/index.js';
import { toSI } from '../../thermo/units.js';
import { byTestId, deep, settleAll } from './dom.js';

const METRIC: Settings = {
  ...DEFAULT_SETTINGS,
  units: { pressure: 'kPag', temperature: 'C', volume: 'L', mass: 'kg', length: 'cm' },
};

const tank: TankRecord = {
  id: 'fixture',
  site: 'Test bench',
  name: 'Fixture tank',
  notes: '',
  nameplate: {
    waterCapacity: toSI('volume', 500, 'usgal'),
    designPressureGauge: toSI('gaugePressure', 250, 'psig'),
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
    liquidTemperature: toSI('temperature', 18, 'C'),
    gaugePercent: 50,
    ...patch,
  };
}

async function screen(
  r: Readings,
  settings: Settings,
  last: LastReadings | null = null,
): Promise<CheckScreen> {
  const el = await fixture<CheckScreen>(
    html`<check-screen
      .tank=${tank}
      .settings=${settings}
      .readings=${r}
      .last=${last}
    ></check-screen>`,
  );
  await settleAll(el);
  return el;
}

const si = (el: CheckScreen, id: string) => Number(byTestId(el, id).dataset.si);

describe('check-screen: the answer first', () => {
  for (const [name, settings] of [
    ['US units', DEFAULT_SETTINGS],
    ['metric units', METRIC],
  ] as const) {
    it(`the key bar shows checkTank’s stop-at percent and room left (${name})`, async () => {
      const r = readings();
      const el = await screen(r, settings);
      const expected = checkTank(buildCheckInput(tank, r, settings).input!);
      const metric = settings.units.temperature === 'C';
      const room = metric
        ? expected.fillLimit.roomLeftVolumeAt15C
        : expected.fillLimit.roomLeftVolumeAt60F;
      expect(si(el, 'key-stop-percent')).to.equal(expected.fillLimit.stopAtGaugePercent);
      expect(si(el, 'key-room-left-volume')).to.equal(room);
      const d = DisplayUnits.fromSettings(settings);
      expect(byTestId(el, 'key-room-left-volume').textContent).to.equal(
        d.format('volume', room, 'down'),
      );
      expect(byTestId(el, 'key-bar').textContent).to.contain(metric ? '15 °C' : '60 °F');
    });
  }

  it('the key bar comes before the readings and sticks to the top of the screen', async () => {
    const el = await screen(readings(), DEFAULT_SETTINGS);
    const bar = el.shadowRoot!.querySelector('.keybar')!;
    const form = el.shadowRoot!.querySelector('check-form')!;
    expect(bar.compareDocumentPosition(form) & Node.DOCUMENT_POSITION_FOLLOWING).to.not.equal(0);
    const style = getComputedStyle(bar);
    expect(style.position).to.equal('sticky');
    expect(style.top).to.equal('0px');
  });

  it('an over-full tank reads “over the limit by”, never a negative room left', async () => {
    const r = readings({ gaugePercent: 96 });
    const el = await screen(r, DEFAULT_SETTINGS);
    const expected = checkTank(buildCheckInput(tank, r, DEFAULT_SETTINGS).input!);
    expect(expected.fillLimit.roomLeftMass).to.be.lessThan(0);
    expect(si(el, 'key-room-left-volume')).to.equal(expected.fillLimit.roomLeftVolumeAt60F);
    expect(byTestId(el, 'key-bar').textContent).to.contain('Over the limit by');
    for (const id of ['key-room-left-volume', 'room-left-volume', 'room-left-volume-60f'])
      expect(byTestId(el, id).textContent, id).not.to.match(/[-−]\s*\d/);
    const all = deep(el, '[data-testid="results"]')!.textContent!.replace(/\s+/g, ' ');
    expect(all).not.to.match(/room left[^.]*[-−]\d/i);
    expect(all).to.contain('Over the limit by, as liquid now');
    expect(all).not.to.contain('Room left as liquid');
  });

  it('the two figures that could be confused say which one to act on', async () => {
    const el = await screen(readings(), DEFAULT_SETTINGS);
    expect(byTestId(el, 'volumetric-note').textContent).to.contain('act on the stop-at figure');
    // The rule's 42 % is shown as 42 %, not as the mass limit's 41.9 %.
    expect(byTestId(el, 'max-filling-density').textContent).to.equal('42.0 %');
  });

  it('the standing caution is short on screen with the whole text one tap away', async () => {
    const r = readings();
    const el = await screen(r, DEFAULT_SETTINGS);
    const expected = checkTank(buildCheckInput(tank, r, DEFAULT_SETTINGS).input!);
    const box = byTestId(el, 'standing-caution') as HTMLDetailsElement;
    expect(box.tagName).to.equal('DETAILS');
    expect(box.querySelector('summary')!.textContent).to.contain('site procedures');
    expect(box.textContent).to.contain(expected.standingCaution);
  });
});

describe('check-screen: readings have a time', () => {
  it('typing a measured reading stamps the readings with the time', async () => {
    const el = await screen(emptyReadings(5), DEFAULT_SETTINGS);
    const input = byTestId(el, 'liquid-temperature') as HTMLInputElement;
    const before = Date.now();
    const ev = oneEvent(el, 'readings-change') as Promise<CustomEvent<ReadingsChange>>;
    input.value = '60';
    input.dispatchEvent(new Event('input', { bubbles: true, composed: true }));
    const { detail } = await ev;
    const at = Date.parse(detail.readings.takenAt!);
    expect(at).to.be.within(before, Date.now());
  });

  it('blank readings show the last check, dated; one tap reuses it and marks its age', async () => {
    const at = new Date(Date.now() - 3 * 86_400_000).toISOString();
    const old = readings({ takenAt: at });
    const last: LastReadings = { readings: old, at, source: 'draft', summary: null };
    const el = await screen(emptyReadings(5), DEFAULT_SETTINGS, last);
    const card = byTestId(el, 'last-check');
    expect(card.dataset.at).to.equal(at);
    expect(card.textContent).to.contain('Last check,');
    expect(card.textContent).to.contain('3 days ago');
    expect(deep(el, '[data-testid="key-stop-percent"]')).to.equal(null);
    byTestId(el, 'last-check-reuse').click();
    await settleAll(el);
    const expected = checkTank(buildCheckInput(tank, old, DEFAULT_SETTINGS).input!);
    expect(si(el, 'key-stop-percent')).to.equal(expected.fillLimit.stopAtGaugePercent);
    expect(byTestId(el, 'key-stale').textContent).to.contain('3 days old');
    expect(byTestId(el, 'readings-age').textContent).to.contain('not now');
    expect(deep(el, '[data-testid="last-check"]')).to.equal(null);
  });

  it('readings typed during this visit are not marked old', async () => {
    const r = readings({ takenAt: new Date(Date.now() - 60_000).toISOString() });
    const el = await screen(r, DEFAULT_SETTINGS);
    expect(deep(el, '[data-testid="key-stale"]')).to.equal(null);
    expect(deep(el, '[data-testid="readings-age"]')).to.equal(null);
  });
});

describe('check-screen at 320 px', () => {
  it('a long figure (“exceeded by … psi”, a blend’s name) wraps beside its label, never over it', async function () {
    // A blend's check and heating curve take a few seconds on a loaded machine.
    this.timeout(60_000);
    // A made-up tank whose relief setting is far below the peak pressure, holding a blend.
    const low: TankRecord = {
      ...tank,
      productId: 'preset:pb-50-50',
      nameplate: { ...tank.nameplate, designPressureGauge: toSI('gaugePressure', 60, 'psig') },
    };
    const r = readings({ liquidTemperature: toSI('temperature', 35, 'C') });
    // The element itself is the fixture (a plain wrapper would wait for an animation frame,
    // which a background tab never gives).
    const el = await fixture<CheckScreen>(
      html`<check-screen
        style="width: 240px"
        .tank=${low}
        .settings=${DEFAULT_SETTINGS}
        .readings=${r}
      ></check-screen>`,
    );
    await settleAll(el);
    expect(byTestId(el, 'peak-headroom-relief').textContent).to.contain('exceeded by');
    const results = el.shadowRoot!.querySelector('check-results')!.shadowRoot!;
    const pairs = [...results.querySelectorAll('dt')].map(
      (dt) => [dt, dt.nextElementSibling as HTMLElement] as const,
    );
    expect(pairs.length).to.be.greaterThan(5);
    for (const [dt, dd] of pairs) {
      const a = dt.getBoundingClientRect();
      const b = dd.getBoundingClientRect();
      const apart = a.right <= b.left + 0.5 || a.bottom <= b.top + 0.5 || b.bottom <= a.top + 0.5;
      expect(apart, `${dt.textContent} | ${dd.textContent}`).to.equal(true);
      // Text running out of its own box would lie over the other one.
      for (const cell of [dt, dd])
        expect(cell.scrollWidth, `${cell.textContent} runs out of its box`).to.be.at.most(
          cell.clientWidth + 1,
        );
    }
  });
});

describe('the shared summary', () => {
  it('leads with the same stop-at percent and room left as the bar, in the user’s units', async () => {
    const r = readings({ takenAt: '2026-03-10T08:30:00.000Z' });
    const el = await screen(r, METRIC);
    const result = checkTank(buildCheckInput(tank, r, METRIC).input!);
    const d = DisplayUnits.fromSettings(METRIC);
    const text = summaryText(tank, r, result, d);
    const room = byTestId(el, 'key-room-left-volume').textContent!.trim();
    const stop = byTestId(el, 'key-stop-percent').textContent!.trim();
    expect(text).to.contain(`Stop at or below ${stop} on the float gauge`);
    expect(text).to.contain(`Room left ${room} as liquid at 15 °C`);
    expect(room).to.equal(d.format('volume', result.fillLimit.roomLeftVolumeAt15C, 'down'));
    expect(text).to.contain('readings taken');
    expect(text).not.to.match(/you may|safe to fill/i);
  });
});
