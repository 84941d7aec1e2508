/**
 * US federal relief-valve start-to-discharge ranges, fractions of the design pressure (CFR 2015
 * annual edition text): LP-gas, 29 CFR 1910.110(b)(10)(iv) Table H-26: U-68/U-69 (1949 and
 * earlier) 110–125 %; U-200/U-201, ASME 1950–1968, API-ASME 88–100 %. Ammonia, 29 CFR
 * 1910.111(b)(9)(ii): U-68/U-69 110–125 %; U-200/U-201, ASME 1952–1962, API-ASME, USCG 95–100 %.
 */
import type { ReliefRangeEntry } from '../../ruleset.js';

const H26 = '29 CFR 1910.110(b)(10)(iv) Table H-26';
const NH3 = '29 CFR 1910.111(b)(9)(ii)';

export const US_RELIEF_RANGES: readonly ReliefRangeEntry[] = [
  { service: 'lp-gas', era: 'asme-1949-and-earlier', min: 1.1, max: 1.25, citation: H26 },
  { service: 'lp-gas', era: 'asme-1950-and-later', min: 0.88, max: 1.0, citation: H26 },
  { service: 'ammonia', era: 'asme-1949-and-earlier', min: 1.1, max: 1.25, citation: NH3 },
  { service: 'ammonia', era: 'asme-1950-and-later', min: 0.95, max: 1.0, citation: NH3 },
];
