/// <reference types="mocha" />
// <check-screen> words the check engine's refusals in the user's units: the range comes from the
// InputError's limits through DisplayUnits (thermo/units.ts), rounded inward, never the SI text.
// Expected figures are either written out here (a fixed range, converted by hand below) or taken
// from checkTank's own limits for the same input (kind: identity). The tanks are made-up fixtures.
import { expect, fixture, html } from '@open-wc/testing';
import '../../components/check-screen.js';
import type { CheckScreen } from '../../components/check-screen.js';
import type { NumberField } from '../../components/number-field.js';
import {
  DEFAULT_SETTINGS,
  emptyReadings,
  type Readings,
  type Settings,
  type TankRecord,
} from '../../components/types.js';
import { DisplayUnits } from '../../components/display.js';
import { buildCheckInput, errorText } from '../../components/check-input.js';
import { checkTank, InputError } from '../../thermo/index.js';
import { toSI } from '../../thermo/units.js';
import { byTestId } from './dom.js';

const settings: Settings = {
  ...DEFAULT_SETTINGS,
  units: { pressure: 'psig', temperature: 'F', volume: 'usgal', mass: 'lb', length: 'in' },
};
const F = (x: number) => toSI('temperature', x, 'F');

function tank(productId: string, patch: Partial<TankRecord['nameplate']> = {}): TankRecord {
  return {
    id: `test-${productId}`,
    site: 'Test bench',
    name: 'Fixture tank',
    notes: '',
    nameplate: {
      waterCapacity: toSI('volume', 1000, 'usgal'),
      designPressureGauge: toSI('gaugePressure', 250, 'psig'),
      placement: 'aboveground',
      containerClass: 'storage',
      ...patch,
    },
    productId,
    demo: false,
    createdAt: '2024-01-01T00:00:00.000Z',
    updatedAt: '2024-01-01T00:00:00.000Z',
  };
}

function readings(patch: Partial<Readings> = {}): Readings {
  return { ...emptyReadings(5), liquidTemperature: F(70), gaugePercent: 50, ...patch };
}

async function screen(t: TankRecord, r: Readings): Promise<CheckScreen> {
  const el = await fixture<CheckScreen>(
    html`<check-screen .tank=${t} .settings=${settings} .readings=${r}></check-screen>`,
  );
  await settle(el);
  return el;
}

async function settle(el: CheckScreen): Promise<void> {
  await el.updateComplete;
  for (const tag of ['check-form', 'check-results'])
    await (el.shadowRoot!.querySelector(tag) as unknown as { updateComplete: Promise<unknown> })
      .updateComplete;
}

/** A figure followed by a kelvin sign: the SI message leaking through. */
const KELVIN = /\d K\b/;

describe('check-screen engine errors in the user’s units', () => {
  it('check-screen shows an out-of-range liquid temperature’s range in °F, not K', async () => {
    // A draft restored with 140 K (−207.7 °F), below the check's 150 K. The engine's range is
    // 150…400 K = −189.67…260.33 °F; shown to 0.1 °F, rounded inward: −189.6 and 260.3.
    const el = await screen(tank('propane'), readings({ liquidTemperature: 140 }));
    const err = byTestId(el, 'engine-error-liquidTemperature');
    expect(err.textContent).to.equal(
      'The check cannot use this value: Liquid temperature must be from -189.6 to 260.3 °F.',
    );
    expect(err.textContent).not.to.match(KELVIN);
    expect(byTestId(el, 'results-error').textContent).to.contain('see the message next to');
  });

  it('check-screen gives the product’s own lower temperature limit in °F (ammonia)', async () => {
    // 190 K is above the check's 150 K but below ammonia's triple point (195.5 K).
    const t = tank('ammonia');
    const r = readings({ liquidTemperature: 190 });
    const el = await screen(t, r);
    const limits = engineLimits(t, r, 'liquidTemperature');
    const d = DisplayUnits.fromSettings(settings);
    const low = d.number('temperature', limits.min!, 'up');
    expect(low).to.equal('-107.7'); // (195.505 K − 273.15) · 1.8 + 32 = −107.76 °F, rounded up
    expect(byTestId(el, 'engine-error-liquidTemperature').textContent).to.equal(
      `The check cannot use this value: Liquid temperature must be from ${low} to 260.3 °F for this product.`,
    );
  });

  it('check-screen words the hottest peak a fill can take in °F when the forecast is typed', async () => {
    // Propane at 97 % and −40 °F: a forecast of 185 °F plus the 5 K (9 °F) sun allowance is
    // beyond what the model can hold in the tank; the engine names the hottest peak it can.
    const t = tank('propane');
    const el = await screen(t, readings({ liquidTemperature: F(-40), gaugePercent: 97 }));
    const input = byTestId(el, 'peak-air-temperature') as HTMLInputElement;
    input.value = '185';
    input.dispatchEvent(new Event('input', { bubbles: true, composed: true }));
    await ((input.getRootNode() as ShadowRoot).host as NumberField).updateComplete;
    await settle(el);
    const r = readings({
      liquidTemperature: F(-40),
      gaugePercent: 97,
      peakAirTemperature: F(185),
    });
    const limits = engineLimits(t, r, 'peakTemperature');
    const d = DisplayUnits.fromSettings(settings);
    const text = byTestId(el, 'engine-error-peakTemperature').textContent ?? '';
    expect(text).to.contain(
      `Peak liquid temperature must be at most ${d.number('temperature', limits.max!, 'down')} °F for this fill`,
    );
    expect(text).not.to.match(KELVIN);
  });

  it('check-screen puts a float gauge above the critical temperature on the liquid temperature', async () => {
    // Propane at 250 °F is past the end of its saturation curve (Tc 206.0 °F, Lemmon et al.
    // 2009, test/reference/fluids.csv): a float gauge has no liquid surface to read. The refusal
    // names the liquid temperature, in °F, with no engine field name.
    const t = tank('propane');
    const r = readings({ liquidTemperature: F(250), gaugePercent: 50 });
    const el = await screen(t, r);
    const text = byTestId(el, 'engine-error-liquidTemperature').textContent ?? '';
    const limits = engineLimits(t, r, 'liquidTemperature');
    const d = DisplayUnits.fromSettings(settings);
    expect(text).to.contain(`to ${d.number('temperature', limits.max!, 'down')} °F`);
    expect(Number(d.number('temperature', limits.max!, 'down'))).to.be.lessThan(206.1);
    expect(text).not.to.match(KELVIN);
    expect(text).not.to.contain('contents.');
    expect(el.shadowRoot!.querySelector('[data-testid="engine-error-gaugePercent"]')).to.equal(
      null,
    );
  });

  it('check-screen words a nameplate figure the check refuses in psig', async () => {
    // 1 psig is below the check's 10 000 Pa (1.45 psig); its 10 000…100 000 000 Pa gauge range is
    // 1.45…14 503.8 psig, shown in whole psig rounded inward and grouped from 10 000 up in the
    // default (en-US) number format: 2 and 14,503.
    const el = await screen(
      tank('propane', { designPressureGauge: toSI('gaugePressure', 1, 'psig') }),
      readings(),
    );
    const text = byTestId(el, 'results-error').textContent ?? '';
    expect(text).to.contain('Design pressure (MAWP) must be from 2 to 14,503 psig');
    expect(text).not.to.contain('Pa gauge');
  });

  it('errorText never passes on the engine’s field names or SI words without a range', () => {
    const d = DisplayUnits.fromSettings(settings);
    const e = new InputError('contents', 'exactly one of { gaugePercent }, { netMass }', 2);
    const text = errorText({ field: e.field, message: e.message }, d);
    expect(text).not.to.contain('gaugePercent');
    expect(text).not.to.contain('{');
    const p = new InputError('product', 'a product the model can solve (density must be 5 K)');
    const pt = errorText({ field: p.field, message: p.message }, d);
    expect(pt).to.contain('product');
    expect(pt).not.to.match(/\d\s*K\b/);
    // A known field with limits in a plain unit (percent, no quantity).
    expect(
      errorText({ field: 'contents.gaugePercent', message: '', limits: { min: 0, max: 100 } }, d),
    ).to.equal('Float gauge must be from 0 to 100 %');
  });
});

/** The limits of the InputError checkTank throws for this tank and readings (must name `field`). */
function engineLimits(t: TankRecord, r: Readings, field: string) {
  try {
    checkTank(buildCheckInput(t, r, settings).input!);
  } catch (e) {
    if (e instanceof InputError && e.field === field && e.limits) return e.limits;
    throw e;
  }
  throw new Error(`checkTank took the input; expected a refusal of ${field}`);
}
