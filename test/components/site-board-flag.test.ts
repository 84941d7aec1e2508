/**
 * The walkdown board flags a tank whose last fill found the float gauge reading low, until a
 * later check clears it (issue: the fill record; the flag itself is components/fill-flag.ts).
 * Fixture rows are "needs a reading" rows so no engine figures are involved: the test is about
 * which row carries the flag and what it says, not about physics.
 */
import { expect, fixture, html } from '@open-wc/testing';
import '../../components/site-board.js';
import type { SiteBoard } from '../../components/site-board.js';
import { needsReading, type BoardRow, type SiteForecast } from '../../components/walkdown-board.js';
import type { FillFlag } from '../../components/fill-flag.js';
import { blankTank } from '../../components/blank-tank.js';
import { deepAll } from './dom.js';

function row(id: string, name: string): BoardRow {
  const tank = { ...blankTank(id, '2026-01-01T00:00:00.000Z'), name, site: 'Yard' };
  return needsReading(tank, 'No readings', null, null, 0);
}

const FORECAST: SiteForecast = {
  site: 'Yard',
  days: [],
  sunAllowance: 0,
  tankAllowances: [],
  enteredAt: '',
};

describe('site board: the gauge-low flag of the last fill', () => {
  it('shows on the flagged tank only, in words, deferring to site procedures', async () => {
    const flags = new Map<string, FillFlag>([
      ['b', { fillId: 'f1', at: '2026-11-30T10:00:00.000Z', difference: -8 }],
    ]);
    const el = await fixture<SiteBoard>(
      html`<site-board
        site="Yard"
        .forecast=${FORECAST}
        .rows=${[row('a', 'Tank A'), row('b', 'Tank B')]}
        .computing=${null}
        .fillFlags=${flags}
      ></site-board>`,
    );
    await el.updateComplete;
    const rows = deepAll(el, '[data-testid="walkdown-row"]');
    expect(rows.map((r) => r.dataset.tankId)).to.deep.equal(['a', 'b']);
    expect(rows[0]!.querySelector('[data-testid="walkdown-fill-flag"]')).to.equal(null);
    const flag = rows[1]!.querySelector('[data-testid="walkdown-fill-flag"]');
    expect(flag?.textContent).to.match(/Gauge read low at the last fill/);
    expect(flag?.textContent).to.match(/site procedures/);
  });
});
