/// <reference types="mocha" />
// The stop-at percent the driver reads is the binding one. The demo ammonia nurse tank (an
// invented scenario, used here only as the app shows it) is an uninsulated DOT cargo tank at
// 72 °F: 49 CFR 173.315(a) table and Note 5 allow 87.5 % by volume when the liquid is at 30 °F or
// warmer, below the 56 % weight limit (about 91.9 % on the gauge at 72 °F). The results must show
// a stop at or below 87.5 % and the one line that says the volume limit binds.
import { expect, fixture, html } from '@open-wc/testing';
import '../../components/check-results.js';
import '../../components/tank-form.js';
import type { CheckResults } from '../../components/check-results.js';
import type { TankForm } from '../../components/tank-form.js';
import { buildDemo } from '../../pwa/demo.js';
import { buildCheckInput } from '../../components/check-input.js';
import { DEFAULT_SETTINGS } from '../../components/types.js';
import { DisplayUnits } from '../../components/display.js';
import { summaryText } from '../../components/summary.js';
import { checkTank } from '../../thermo/index.js';
import { byTestId } from './dom.js';

/** 49 CFR 173.315(a) Note 5 (CFR 2015 ed.), copied in test/reference/trade/filling_density_other.csv. */
const NOTE_5_VOLUME_PERCENT = 87.5;

describe('fill stop: the binding limit', () => {
  const demo = buildDemo(DEFAULT_SETTINGS);
  const tank = demo.tanks.find((t) => t.id.startsWith('demo-nh3-nurse-'))!;
  const readings = demo.drafts.find((d) => d.tankId === tank.id)!.readings;
  const result = checkTank(buildCheckInput(tank, readings, DEFAULT_SETTINGS).input!);

  it('check-results shows the demo nurse tank stopping at or below 87.5 % with the volume-limit line', async () => {
    const el = await fixture<CheckResults>(
      html`<check-results
        .result=${result}
        .display=${new DisplayUnits(DEFAULT_SETTINGS.units)}
      ></check-results>`,
    );
    await el.updateComplete;
    const stop = Number(byTestId(el, 'fill-stop-percent').dataset.si);
    expect(stop).to.be.at.most(NOTE_5_VOLUME_PERCENT);
    expect(byTestId(el, 'fill-stop-percent').textContent).to.contain('87.5');
    const why = byTestId(el, 'fill-stop-why');
    expect(why.textContent).to.contain('volume limit at this temperature');
    expect(why.textContent).to.contain('173.315(a)');
    expect(why.getBoundingClientRect().height).to.be.greaterThan(0);
    const binding = byTestId(el, 'fill-binding');
    expect(binding.dataset.si).to.equal('nh3-cargo-volume');
  });

  it('the shared summary gives the same binding stop and the reason', () => {
    const text = summaryText(tank, readings, result, new DisplayUnits(DEFAULT_SETTINGS.units));
    expect(text).to.contain('Stop at or below 87.5 % on the float gauge');
    expect(text).to.contain('Why: The rule’s volume limit at this temperature binds');
  });

  it('tank-form asks how the tank is filled, and an older record with a dip tube shows the fixed gauge', async () => {
    const old = {
      ...tank,
      nameplate: { ...tank.nameplate, fillMethod: undefined, fixedDipTube: true },
    };
    const el = await fixture<TankForm>(
      html`<tank-form
        .tank=${old}
        .display=${new DisplayUnits(DEFAULT_SETTINGS.units)}
      ></tank-form>`,
    );
    await el.updateComplete;
    const sel = byTestId(el, 'tank-fill-method') as HTMLSelectElement;
    expect(sel.value).to.equal('fixed-gauge');
    expect([...sel.options].map((o) => o.value)).to.deep.equal(['gauge', 'fixed-gauge', 'weight']);
    expect(sel.options[1]!.textContent).to.contain('liquid appears');
  });
});
