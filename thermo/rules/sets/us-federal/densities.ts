/**
 * US federal filling densities (percent of the weight of water at 60 °F the container holds),
 * CFR 2015 annual edition text (check the current eCFR before release). First match wins, so
 * the order matters: LP-gas by its specific-gravity tables, then the other gases' rows.
 */
import type { FillingDensityEntry } from '../../ruleset.js';

const ED = ' (CFR 2015 ed.)';
const DOT = ['cargo', 'portable'] as const;
const NOT_STORAGE = ['cylinder', 'cargo', 'portable'] as const;
/** 49 CFR 173.315(b) Note 1: a fixed-length dip tube or other fixed maximum-level indicator: 97 % of the weight value. */
const NOTE_1 = { factor: 0.97, citation: '49 CFR 173.315(b) Note 1' };
const lpg = 'lp-gas' as const;
const fluid = (id: string) => ({ fluid: id });

const LP_GAS: readonly FillingDensityEntry[] = [
  {
    id: 'dot-cylinder',
    product: lpg,
    classes: ['cylinder'],
    percent: { table: '173.304a(d)(1)', column: 0 },
    description: 'LP-gas, DOT cylinders',
    citation: '49 CFR 173.304a(d)(1), DOT cylinders' + ED,
  },
  {
    id: 'dot-cargo-small',
    product: lpg,
    classes: DOT,
    size: 'small',
    percent: { table: '173.315(b)', column: 0 },
    description: 'LP-gas, DOT cargo/portable tanks, 1,200 US gal or less',
    citation: '49 CFR 173.315(b), cargo/portable tanks 1,200 US gal or less' + ED,
    fixedGauge: NOTE_1,
  },
  {
    id: 'dot-cargo-large',
    product: lpg,
    classes: DOT,
    size: 'large',
    percent: { table: '173.315(b)', column: 1 },
    description: 'LP-gas, DOT cargo/portable tanks over 1,200 US gal',
    citation: '49 CFR 173.315(b), cargo/portable tanks over 1,200 US gal' + ED,
    fixedGauge: NOTE_1,
  },
  {
    id: 'h27-underground',
    product: lpg,
    classes: ['storage'],
    placement: 'underground',
    percent: { table: 'H-27', column: 2 },
    description: 'LP-gas, underground storage',
    citation: '29 CFR 1910.110(b)(12)(i) Table H-27, underground' + ED,
  },
  {
    id: 'h27-aboveground-small',
    product: lpg,
    classes: ['storage'],
    size: 'small',
    percent: { table: 'H-27', column: 0 },
    description: 'LP-gas, aboveground storage, 1,200 US gal or less',
    citation: '29 CFR 1910.110(b)(12)(i) Table H-27, aboveground, 1,200 US gal or less' + ED,
  },
  {
    id: 'h27-aboveground-large',
    product: lpg,
    classes: ['storage'],
    size: 'large',
    percent: { table: 'H-27', column: 1 },
    description: 'LP-gas, aboveground storage over 1,200 US gal',
    citation: '29 CFR 1910.110(b)(12)(i) Table H-27, aboveground, over 1,200 US gal' + ED,
  },
];

const AMMONIA: readonly FillingDensityEntry[] = [
  {
    id: 'nh3-cylinder',
    product: fluid('ammonia'),
    classes: ['cylinder'],
    percent: 54,
    description: 'Anhydrous ammonia in DOT cylinders: 54 % of water weight',
    citation: '49 CFR 173.304a(a)(2)' + ED,
  },
  {
    id: 'nh3-cargo',
    product: fluid('ammonia'),
    classes: DOT,
    percent: 56,
    description: 'Anhydrous ammonia in DOT cargo/portable tanks: 56 % of water weight',
    citation: '49 CFR 173.315(a) table' + ED,
  },
  // The table lists underground uninsulated (58 %) only; an insulated underground tank takes the lower insulated figure.
  {
    id: 'nh3-storage-insulated',
    product: fluid('ammonia'),
    classes: ['storage'],
    placement: 'underground',
    insulated: true,
    percent: 57,
    description: 'Anhydrous ammonia, insulated container: 57 % of water weight',
    citation: '29 CFR 1910.111(b)(11)(i)' + ED,
  },
  {
    id: 'nh3-storage-underground',
    product: fluid('ammonia'),
    classes: ['storage'],
    placement: 'underground',
    percent: 58,
    description: 'Anhydrous ammonia, underground uninsulated container: 58 % of water weight',
    citation: '29 CFR 1910.111(b)(11)(i)' + ED,
  },
  {
    id: 'nh3-storage-insulated',
    product: fluid('ammonia'),
    classes: ['storage'],
    insulated: true,
    percent: 57,
    description: 'Anhydrous ammonia, aboveground insulated container: 57 % of water weight',
    citation: '29 CFR 1910.111(b)(11)(i)' + ED,
  },
  {
    id: 'nh3-storage-aboveground',
    product: fluid('ammonia'),
    classes: ['storage'],
    percent: 56,
    description: 'Anhydrous ammonia, aboveground uninsulated container: 56 % of water weight',
    citation: '29 CFR 1910.111(b)(11)(i)' + ED,
  },
];

const OTHERS: readonly FillingDensityEntry[] = [
  {
    id: 'co2-cylinder',
    product: fluid('carbon-dioxide'),
    classes: ['cylinder'],
    percent: 68,
    description: 'Carbon dioxide in DOT 1800 psig class cylinders: 68 % of water weight',
    citation: '49 CFR 173.304a(a)(2)' + ED,
  },
  {
    id: 'n2o-cylinder',
    product: fluid('nitrous-oxide'),
    classes: ['cylinder'],
    percent: 68,
    description: 'Nitrous oxide in DOT 1800 psig class cylinders: 68 % of water weight',
    citation: '49 CFR 173.304a(a)(2)' + ED,
  },
  {
    id: 'cl2',
    product: fluid('chlorine'),
    classes: NOT_STORAGE,
    percent: 125,
    description: 'Chlorine: 125 % of water weight',
    citation: '49 CFR 173.304a(a)(2); 173.315(a) table' + ED,
  },
  {
    id: 'so2',
    product: fluid('sulfur-dioxide'),
    classes: NOT_STORAGE,
    percent: 125,
    description: 'Sulfur dioxide: 125 % of water weight',
    citation: '49 CFR 173.304a(a)(2); 173.315(a) table' + ED,
  },
  {
    id: 'r22',
    product: fluid('r22'),
    classes: NOT_STORAGE,
    percent: 105,
    description: 'R-22: 105 % of water weight',
    citation: '49 CFR 173.304a(a)(2); 173.315(a) table' + ED,
  },
  {
    id: 'dme-cargo',
    product: fluid('dimethyl-ether'),
    classes: DOT,
    percent: 59,
    description: 'Dimethyl ether in DOT cargo/portable tanks: 59 % of water weight',
    citation: '49 CFR 173.315(a) table' + ED,
  },
];

export const US_FILLING_DENSITIES: readonly FillingDensityEntry[] = [
  ...LP_GAS,
  ...AMMONIA,
  ...OTHERS,
];
