/**
 * The US federal rule set: 29 CFR 1910.110 (LP-gas) and 1910.111 (anhydrous ammonia) for
 * storage containers, 49 CFR 173.304, 173.304a and 173.315 for DOT cylinders, cargo and portable
 * tanks; CFR 2015 annual edition text (check the current eCFR before release).
 */
import { T_130F_K, T_131F_K } from '../../gases.js';
import { TABLE_H27, TABLE_173_304A_D1, TABLE_173_315B } from '../../lpgas.js';
import type { RuleSet } from '../../ruleset.js';
import { dot4lRule } from '../../refrigerated.js';
import { volumeRules } from '../../volumeLimits.js';
import { GAL_1200_M3 } from '../../water.js';
import { US_FILLING_DENSITIES } from './densities.js';
import { US_RELIEF_RANGES } from './relief.js';

export const US_FEDERAL: RuleSet = {
  id: 'us-federal',
  title: 'US federal (OSHA, DOT)',
  edition: 'CFR 2015 annual edition',
  sources: ['CFR-29-1910.110', 'CFR-29-1910.111', 'CFR-49-173'],
  sizeSplitM3: GAL_1200_M3,
  fillingDensities: US_FILLING_DENSITIES,
  sgTables: {
    'H-27': TABLE_H27,
    '173.315(b)': TABLE_173_315B,
    '173.304a(d)(1)': TABLE_173_304A_D1,
  },
  volumeRules,
  referenceTemperatures: [
    {
      id: 'refrigerant-130F',
      product: 'refrigerant-nos',
      classes: ['cylinder'],
      temperature: T_130F_K,
      kind: 'rule',
      description: 'Refrigerant gas n.o.s. in DOT cylinders: not liquid full at 130 °F (54.4 °C)',
      citation: '49 CFR 173.304a(a)(2) (CFR 2015 ed.)',
    },
    {
      id: 'dot-131F',
      except: ['carbon-dioxide', 'nitrous-oxide'],
      classes: ['cylinder'],
      temperature: T_131F_K,
      kind: 'physical',
      description:
        'Liquefied gas in DOT cylinders: not liquid full at any temperature up to 131 °F (55 °C)',
      citation: '49 CFR 173.304(b) (CFR 2015 ed.)',
    },
  ],
  relief: {
    whenNotGiven: 'design-pressure',
    ranges: US_RELIEF_RANGES,
    insulatedCylinderRule: dot4lRule,
  },
};
