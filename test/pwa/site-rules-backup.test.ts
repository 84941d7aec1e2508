/// <reference types="mocha" />
// The site's rule set and own stricter rule travel with the site record in the backup (optional
// fields, no format change): a site with them reads back unchanged, a site without them (every
// older backup) still imports, and a bad stored rule is refused naming the site and the field.
// Kind: behaviour; records are placeholders.
import { expect } from '@open-wc/testing';
import { makeBackup, parseBackup } from '../../pwa/backup.js';
import type { SiteForecast } from '../../components/walkdown-types.js';

const SITE: SiteForecast = {
  site: 'S',
  days: [310],
  sunAllowance: 5,
  tankAllowances: [],
  enteredAt: '2024-06-01T00:00:00.000Z',
};

const file = (sites: unknown[]) =>
  JSON.stringify({ ...makeBackup({ tanks: [], checks: [], settings: null }), sites });

describe('site rules in the backup', () => {
  it('a site with a rule set and its own rule reads back unchanged', () => {
    const site = {
      ...SITE,
      ruleSet: 'us-federal',
      siteRule: { maxFillPercent: 80, maxFillingDensity: 0.4 },
    };
    const r = parseBackup(file([site]));
    expect(r.ok).to.equal(true);
    if (r.ok) expect(r.data.sites).to.deep.equal([site]);
  });

  it('a site without them (an older backup) still imports', () => {
    const r = parseBackup(file([SITE]));
    expect(r.ok).to.equal(true);
  });

  it('a bad own rule or an unknown rule set is refused naming the site', () => {
    const r = parseBackup(file([{ ...SITE, siteRule: { maxFillPercent: 150 } }]));
    expect(r.ok).to.equal(false);
    if (!r.ok) expect(r.reason).to.contain('Site forecast 1').and.contain('maxFillPercent');
    const r2 = parseBackup(file([{ ...SITE, ruleSet: 'nowhere' }]));
    expect(r2.ok).to.equal(false);
    if (!r2.ok) expect(r2.reason).to.contain('rule set');
  });
});
