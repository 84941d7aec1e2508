/**
 * Commercial LP-gas blends as products for the core. Compositions are mole fractions. The
 * specifications limit liquid volume percent; for these light hydrocarbons mole % and liquid
 * volume % differ by a few percent of the amount, and the presets take them as equal (our
 * simplification, stated in each source line). A product ticket or analysis beats any preset.
 */
import type { Product } from '../product.js';

export interface LpgPreset {
  id: string;
  name: string;
  product: Product & { components: { id: string; moleFraction: number }[] };
  /** Where the composition comes from. */
  source: string;
}

export const LPG_PRESETS: readonly LpgPreset[] = [
  {
    id: 'hd5-limit',
    name: 'Special-duty propane (HD-5), at the specification limits',
    product: {
      components: [
        { id: 'propane', moleFraction: 0.9 },
        { id: 'propylene', moleFraction: 0.05 },
        { id: 'ethane', moleFraction: 0.025 },
        { id: 'n-butane', moleFraction: 0.025 },
      ],
    },
    source:
      'HD-5 limits from memory (GPA 2140 / ASTM D1835 Table 1, to verify): propane ≥ 90 %, propylene ≤ 5 %, butanes and heavier ≤ 2.5 %; the rest put as ethane; vol % taken as mol %',
  },
  {
    id: 'commercial-propane',
    name: 'Commercial propane, typical',
    product: {
      components: [
        { id: 'propane', moleFraction: 0.95 },
        { id: 'propylene', moleFraction: 0.03 },
        { id: 'ethane', moleFraction: 0.01 },
        { id: 'isobutane', moleFraction: 0.01 },
      ],
    },
    source:
      'common practice: an illustrative composition inside the commercial-propane limits (butanes and heavier ≤ 2.5 %, from memory of ASTM D1835)',
  },
  {
    id: 'pb-50-50',
    name: 'Propane–butane 50/50',
    product: {
      components: [
        { id: 'propane', moleFraction: 0.5 },
        { id: 'n-butane', moleFraction: 0.5 },
      ],
    },
    source:
      '29 CFR 1910.110(b)(19)(ii) names a "50/50 butane-propane mix" for variable-gauge markings; vol % taken as mol %',
  },
  {
    id: 'commercial-butane',
    name: 'Commercial butane, typical',
    product: {
      components: [
        { id: 'n-butane', moleFraction: 0.7 },
        { id: 'isobutane', moleFraction: 0.25 },
        { id: 'propane', moleFraction: 0.05 },
      ],
    },
    source:
      'common practice: an illustrative composition (commercial butane is predominantly butanes and butylenes, 29 CFR 1910.110(a)(7))',
  },
];
