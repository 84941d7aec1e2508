/// <reference types="mocha" />
/**
 * Peak and headroom reconcile on screen: the result card and a site-board row show the peak and,
 * beside it, the peak raised by the model's allowance that both headrooms are measured from
 * (`PeakResult.pGaugeUpper`). The cylinder is a made-up test fixture (CO2 past its critical
 * temperature, full of dense fluid), not the demo data and not a published case; the check here
 * is an identity on the figures shown: design − raised peak, both as printed, is the headroom
 * printed, within the display step.
 */
import { expect, fixture, html } from '@open-wc/testing';
import '../../components/check-results.js';
import '../../components/site-board.js';
import type { CheckResults } from '../../components/check-results.js';
import type { SiteBoard } from '../../components/site-board.js';
import { projectTank, type SiteForecast } from '../../components/walkdown-board.js';
import { DEFAULT_SETTINGS, emptyReadings, type TankRecord } from '../../components/types.js';
import { DisplayUnits } from '../../components/display.js';
import { checkTank } from '../../thermo/index.js';
import { PSI_PA as PSI, toSI } from '../../thermo/units.js';
import { byTestId, deepAll } from './dom.js';

const US = DisplayUnits.fromSettings(DEFAULT_SETTINGS);
const F = (f: number) => toSI('temperature', f, 'F');
const V = 0.0227; // m³
const DESIGN = 1800 * PSI;
const MASS = 0.56 * 999 * V; // kg: denser than CO2's critical density (about 468 kg/m³)

const num = (s: string | null | undefined) => Number(/-?[\d.]+/.exec(s ?? '')![0]);

describe('peak and its raised figure', () => {
  it('the result card shows the peak and the figure both headrooms are measured from', async () => {
    const r = checkTank({
      tank: { waterCapacity: V, designPressureGauge: DESIGN, reliefSetPressureGauge: DESIGN },
      product: 'carbon-dioxide',
      liquidTemperature: F(70),
      contents: { netMass: MASS },
      peakTemperature: F(105),
    });
    expect(r.peak.full).to.equal('dense-fluid');
    const el = await fixture<CheckResults>(
      html`<check-results .result=${r} .display=${US} .missing=${[]}></check-results>`,
    );
    await el.updateComplete;
    const peak = byTestId(el, 'peak-pressure');
    const upper = byTestId(el, 'peak-pressure-upper');
    expect(Number(peak.dataset.si)).to.equal(r.peak.pGauge);
    expect(Number(upper.dataset.si)).to.equal(r.peak.pGaugeUpper);
    expect(upper.textContent).to.match(/psig/);
    expect(num(upper.textContent)).to.be.greaterThan(num(peak.textContent));
    expect(upper.parentElement!.parentElement!.textContent).to.match(/10 % when full of dense/);
    // As printed: design − raised peak ≥ headroom shown > design − raised peak − 2 (1 psi steps).
    const shown = num(byTestId(el, 'peak-headroom-design').textContent);
    expect(shown).to.be.at.most(1800 - num(upper.textContent));
    expect(shown).to.be.greaterThan(1800 - num(upper.textContent) - 2);
  });

  it('a board row shows the raised figure before the headrooms, with its data-si', async () => {
    const tank: TankRecord = {
      id: 'cyl',
      site: 'Bench',
      name: 'Fixture cylinder',
      notes: '',
      nameplate: {
        waterCapacity: V,
        designPressureGauge: DESIGN,
        placement: 'aboveground',
        containerClass: 'storage',
      },
      productId: 'carbon-dioxide',
      demo: false,
      createdAt: '2026-01-01T00:00:00.000Z',
      updatedAt: '2026-01-01T00:00:00.000Z',
    };
    const readings = {
      ...emptyReadings(0),
      liquidTemperature: F(70),
      contentsMode: 'netMass' as const,
      netMass: MASS,
    };
    const forecast: SiteForecast = {
      site: 'Bench',
      days: [F(95)],
      sunAllowance: toSI('temperatureDifference', 10, 'F'),
      tankAllowances: [],
      enteredAt: '2026-01-01T00:00:00.000Z',
    };
    const now = new Date('2026-01-02T00:00:00.000Z');
    const row = projectTank(
      tank,
      { readings, at: now.toISOString(), source: 'check' },
      forecast,
      DEFAULT_SETTINGS,
      now,
    );
    expect(row.summary, row.reason ?? '').to.not.equal(null);
    const el = await fixture<SiteBoard>(
      html`<site-board
        site="Bench"
        .forecast=${forecast}
        .rows=${[row]}
        .computing=${null}
        .display=${US}
      ></site-board>`,
    );
    await el.updateComplete;
    const li = deepAll(el, '[data-testid="walkdown-row"]')[0]!;
    expect(Number(li.dataset.siPeakUpper)).to.equal(row.result!.peak.pGaugeUpper);
    const text = li.textContent!.replace(/\s+/g, ' ');
    const peak = /Peak (\d+) psig/.exec(text);
    const up = /Up to (\d+) psig allowing 10 % for model error: to relief/.exec(text);
    expect(peak, text).to.not.equal(null);
    expect(up, text).to.not.equal(null);
    expect(Number(up![1])).to.be.greaterThan(Number(peak![1]));
    const design = /to design (\d+) psi/.exec(text);
    expect(Number(design![1])).to.be.at.most(1800 - Number(up![1]));
    expect(Number(design![1])).to.be.greaterThan(1800 - Number(up![1]) - 2);
  });
});
