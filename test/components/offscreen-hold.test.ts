/// <reference types="mocha" />
/**
 * The results are never stale where they can be seen. While <check-results> is far below the
 * screen (a reading being typed at the top of a phone), a new result is drawn when the page is
 * idle instead of on the keystroke (components/offscreen-hold.ts); within reach of the screen,
 * or before printing, it is drawn at once. Whoever awaits `updateComplete` sees the current
 * figures either way. The figures compared are the engine's own (`data-si` against the result
 * given): this is a test of what is on screen when, not of the physics.
 */
import { expect, fixtureSync, html, waitUntil } from '@open-wc/testing';
import '../../components/check-results.js';
import type { CheckResults } from '../../components/check-results.js';
import type { OffscreenHold } from '../../components/offscreen-hold.js';
import { DisplayUnits } from '../../components/display.js';
import { DEFAULT_SETTINGS } from '../../components/types.js';
import { checkTank } from '../../thermo/index.js';
import type { TankCheckResult } from '../../thermo/check/types.js';
import { toSI } from '../../thermo/units.js';
import { byTestId } from './dom.js';

const US = DisplayUnits.fromSettings(DEFAULT_SETTINGS);

function resultAt(liquidC: number): TankCheckResult {
  return checkTank({
    tank: {
      waterCapacity: toSI('volume', 500, 'usgal'),
      designPressureGauge: toSI('gaugePressure', 250, 'psig'),
    },
    product: 'propane',
    liquidTemperature: toSI('temperature', liquidC, 'C'),
    contents: { gaugePercent: 50 },
    peakTemperature: toSI('temperature', 40, 'C'),
  });
}

const R1 = resultAt(10);
const R2 = resultAt(25);

/** The room-left figure shown, as the engine value it was drawn from. */
const shownRoom = (el: CheckResults) => Number(byTestId(el, 'room-left').dataset.si);
/** Lets lit run every update now due, without giving the page an idle moment. */
const microtasks = async () => {
  for (let i = 0; i < 5; i++) await Promise.resolve();
};
const holdOf = (el: CheckResults) => (el as unknown as { _hold: OffscreenHold })._hold;

/**
 * A <check-results> with R1 drawn, far below the top of the page or at it. Its place is told to
 * the hold as its IntersectionObserver would (`placed`): a page that the test runner keeps in
 * the background gets no frames, hence no observer reports, and the spacer keeps a real report,
 * where one comes, in agreement.
 */
async function placed(farBelow: boolean): Promise<CheckResults> {
  const wrap = fixtureSync<HTMLDivElement>(html`
    <div>
      <div style=${farBelow ? 'height: 6000px' : 'height: 0'}></div>
      <check-results .result=${R1} .display=${US} .missing=${[]}></check-results>
    </div>
  `);
  const el = wrap.querySelector('check-results')!;
  await el.updateComplete;
  holdOf(el).placed(!farBelow);
  return el;
}

/** Far below the screen, R2 is given and held: the figures drawn stay R1's. Returns those. */
async function heldR2(): Promise<{ el: CheckResults; before: number }> {
  const el = await placed(true);
  const before = shownRoom(el);
  el.result = R2;
  await microtasks();
  expect(holdOf(el).pending !== null, 'held').to.equal(true);
  expect(shownRoom(el), 'still the figures drawn before').to.equal(before);
  return { el, before };
}

/** Nothing is held any more and the figures shown are no longer `before`. */
function drawn(el: CheckResults, before: number): void {
  expect(holdOf(el).pending === null, 'nothing held').to.equal(true);
  expect(shownRoom(el)).to.not.equal(before);
}

describe('results far off screen are drawn when idle, never stale where seen', () => {
  it('the two results differ in the figure watched (else the test shows nothing)', () => {
    expect(R1.fillLimit.roomLeftMass).to.not.equal(R2.fillLimit.roomLeftMass);
  });

  it('within reach of the screen, a new result is drawn in the same update', async () => {
    const el = await placed(false);
    const before = shownRoom(el);
    el.result = R2;
    await microtasks();
    drawn(el, before);
  });

  it('far below the screen, it waits for an idle moment; updateComplete waits with it', async () => {
    const { el, before } = await heldR2();
    await el.updateComplete;
    drawn(el, before);
    // A later result goes the same way and is drawn too.
    el.result = R1;
    await el.updateComplete;
    expect(shownRoom(el)).to.equal(before);
  });

  it('a held result is drawn before printing', async () => {
    const { el, before } = await heldR2();
    dispatchEvent(new Event('beforeprint'));
    await microtasks();
    drawn(el, before);
  });

  it('a held result is drawn as soon as the element comes near the screen', async () => {
    const { el, before } = await heldR2();
    holdOf(el).placed(true);
    await microtasks();
    drawn(el, before);
  });

  it('the held change still reaches the screen reader’s summary', async () => {
    const el = await placed(true);
    el.result = R2;
    await el.updateComplete;
    const announcer = byTestId(el, 'results-announcer');
    await waitUntil(() => /Fill limit/.test(announcer.textContent ?? ''), 'announced', {
      timeout: 5000,
    });
  });
});
