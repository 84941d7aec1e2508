/**
 * A rule set: one jurisdiction's filling rules as data. The check picks its weight limit, its
 * volume limits and its not-liquid-full temperatures from the set chosen for the site (or the
 * tank); `apply.ts` reads a set, `sets/` holds one folder per set and the registry.
 *
 * Imports run one way: check → rules → types. Nothing here imports from thermo/check.
 */
import type { Product } from '../product.js';
import type { ContainerClass, Placement } from '../types.js';
import type { VolumeRuleChoice, VolumeRuleContext } from './volumeLimits.js';

/**
 * Which products an entry covers: a product group the rules name (`lp-gas`: predominantly
 * propane, propylene, butanes and butylenes; `refrigerant-nos`: every component a refrigerant
 * without a named entry) or a single fluid id (e.g. `ammonia`).
 */
export type ProductGroup = 'lp-gas' | 'refrigerant-nos' | { fluid: string };

/** A container's size against the set's size split (`RuleSet.sizeSplitM3`). */
export type SizeBand = 'small' | 'large';

/** A band table by liquid specific gravity 60/60 °F: [lowest SG, highest SG or null, percent per column…]. */
export type SgBand = readonly [number, number | null, ...number[]];

/** A filling density read from a specific-gravity table of the set. */
export interface SgTablePick {
  /** Key in `RuleSet.sgTables`. */
  table: string;
  /** Column of the table (0 = first percent column). */
  column: number;
}

/** One row of the weight rules: which product and container, and the filling density. */
export interface FillingDensityEntry {
  /** Stable id of the limit (shown in results and stored with checks). */
  id: string;
  product: ProductGroup;
  /** Container classes the entry covers. */
  classes: readonly ContainerClass[];
  /** Only this placement (absent: any). */
  placement?: Placement;
  /** Only insulated (true) or uninsulated (false) containers (absent: either). */
  insulated?: boolean;
  /** Only this size band (absent: any size). */
  size?: SizeBand;
  /** Percent of the water weight capacity at 60 °F, or a specific-gravity table's column. */
  percent: number | SgTablePick;
  /** Words for a fixed percent; a table entry's words are written from its band. */
  description: string;
  /** Where it is printed (regulation, table, edition). */
  citation: string;
  /** A fixed maximum-level gauge (dip tube) takes this share of the weight figure, with its citation. */
  fixedGauge?: { factor: number; citation: string };
}

/** A temperature up to which a container must not become liquid-full. */
export interface ReferenceTemperatureEntry {
  id: string;
  /** Products it covers (absent: every product). */
  product?: ProductGroup;
  /** Single fluids it does not cover. */
  except?: readonly string[];
  classes: readonly ContainerClass[];
  /** K */
  temperature: number;
  /** `rule` when the rule itself prints the figure as a filling rule; `physical` when it states the principle. */
  kind: 'rule' | 'physical';
  description: string;
  citation: string;
}

/** Relief-valve start-to-discharge range, fractions of the design pressure, for one service and construction code. */
export interface ReliefRangeEntry {
  service: 'lp-gas' | 'ammonia';
  era: 'asme-1949-and-earlier' | 'asme-1950-and-later';
  min: number;
  max: number;
  citation: string;
}

/** A weight rule chosen by the relief setting (e.g. refrigerated liquid in an insulated cylinder). */
export type ReliefRuleHook = (
  product: Product,
  reliefSetPressureGauge: number,
) => { id: string; description: string; citation: string; fillingDensity: number } | null;

export interface RuleSet {
  /** Registry key, e.g. `us-federal`; stored with sites and tanks. */
  id: string;
  /** Short title for a picker (fits a 320 px wide phone: about 24 characters). */
  title: string;
  /** Which text of the rules, e.g. `CFR 2015 annual edition`. */
  edition: string;
  /** Keys in thermo/data/sources.ts. */
  sources: readonly string[];
  /** Water capacity that splits `small` from `large`, m³ (a size at the split is small). */
  sizeSplitM3: number;
  /** Weight rules, first match wins. */
  fillingDensities: readonly FillingDensityEntry[];
  /** Specific-gravity band tables the entries refer to. */
  sgTables: Readonly<Record<string, readonly SgBand[]>>;
  /** Limits by volume and fixed-gauge settings that apply to a fill (the set's volumetric tables). */
  volumeRules: (ctx: VolumeRuleContext) => VolumeRuleChoice[];
  /** Not-liquid-full temperatures by container class (the forecast peak is added by the check). */
  referenceTemperatures: readonly ReferenceTemperatureEntry[];
  /** Relief-setting practice. */
  relief: {
    /** What the check takes when the nameplate gives no relief setting. */
    whenNotGiven: 'design-pressure';
    /** Start-to-discharge ranges the rules print. */
    ranges: readonly ReliefRangeEntry[];
    /** Insulated cylinders whose weight rule depends on the relief setting. */
    insulatedCylinderRule?: ReliefRuleHook;
  };
}
