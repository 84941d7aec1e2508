/** Parameters of the `site-rule-binds` notice: which of the site's figures binds, and the stop it gives. */
import { num, type MessageParams } from './codes.js';
import { SITE_PERCENT_ID } from './siteLimits.js';
import type { TankCheckResult } from './types.js';

export function siteRuleParams(r: TankCheckResult): MessageParams {
  const fl = r.fillLimit;
  const b = fl.limits.find((l) => l.id === fl.binding)!;
  const byVolume = b.id === SITE_PERCENT_ID;
  return {
    form: byVolume ? 'percent' : 'filling-density',
    // The site's own figure as entered: a share of the container by volume or of the water weight.
    figure: num(byVolume ? (b.gaugePercent ?? 0) / 100 : b.fillingDensity, 'fraction', 'down'),
    stop: num(fl.stopAtGaugePercent / 100, 'fraction', 'down'),
    limit: num(fl.maxMass, 'mass', 'down'),
  };
}
