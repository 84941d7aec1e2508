/**
 * Input and result of `checkTank`: from a tank's nameplate and today's readings to its
 * contents, fill limit, peak-day pressure, a gauge diagnosis and ranked cautions.
 *
 * Units: SI everywhere — K, Pa, kg, m³, m, kg/m³. Every pressure of the result says its
 * reference in its name: `pGauge`, `readingGauge`, `expectedGauge` (Pa above the site barometric
 * pressure) or `pAbs` (Pa absolute). Input fields say it the same way, and stored records carry
 * these names since storage v5: the tank's `designPressureGauge` and `reliefSetPressureGauge`,
 * the reading `pressureReadingGauge` and the gauge's `fullScaleGauge` are gauge,
 * `barometricPressureAbs` is absolute.
 * Convert user units with `thermo/units.ts` only.
 */
import type { Product } from '../product.js';
import type { FillMethod } from '../rules/volumeLimits.js';

export type { FillMethod };
import type { RecoveryInput } from '../rules/recovery.js';
import type { SiteRule } from '../rules/siteRule.js';
import type { CautionCode, CauseCode, MessageParams } from './codes.js';

export type { ContainerClass, HeadKind, Placement, TankShape } from '../types.js';
import type { ContainerClass, Placement, TankShape } from '../types.js';

/** The tank's nameplate and fittings. */
export interface TankInput {
  /** Water capacity, m³ (volume of the container; nameplate "W.C." converted from US gal or lb of water). */
  waterCapacity: number;
  /** Design pressure / MAWP, Pa gauge. */
  designPressureGauge: number;
  /** Relief-valve start-to-discharge set pressure, Pa gauge. Default: the design pressure. */
  reliefSetPressureGauge?: number;
  /** Default `aboveground`. */
  placement?: Placement;
  /** Insulated shell (changes the ammonia rule). Default false. */
  insulated?: boolean;
  /** Default `storage`. */
  containerClass?: ContainerClass;
  /**
   * How the tank is filled (default `gauge`):
   * - `gauge`: by a float, rotary or slip-tube gauge: the rule's volume limits apply beside its weight limit;
   * - `fixed-gauge`: until liquid appears at a fixed maximum-level gauge (dip tube): its setting is the stop
   *   (ammonia 85 %, 29 CFR 1910.111(b)(14)(v)); DOT cargo/portable LP-gas tanks take 97 % of the weight
   *   limit (49 CFR 173.315(b) Note 1);
   * - `weight`: on a scale: the weight column applies.
   */
  fillMethod?: FillMethod;
  /** Older records' form of `fillMethod: 'fixed-gauge'`; used only when `fillMethod` is absent. Default false. */
  fixedDipTube?: boolean;
  /** Shape and inside dimensions; needed only for `contents.levelHeight`. */
  shape?: TankShape;
  /**
   * A refrigerant recovery cylinder: adds the technician's usual liquid-volume limit
   * (common practice, default 80 % of the water capacity; see rules/recovery.ts). Optional.
   */
  recovery?: RecoveryInput;
  /** Minimum design metal temperature from the nameplate, K. Optional. */
  minDesignMetalTemperature?: number;
  /** Id of a rule set for this tank, overriding the site's (`TankCheckInput.ruleSet`). Optional. */
  ruleSet?: string;
}

/** One contents reading. */
export type ContentsInput =
  /** Float (or rotary / slip-tube) gauge reading, percent of the tank volume filled by liquid, 0…100. */
  | { gaugePercent: number }
  /** Net mass of product from a scale (gross − tare), kg. */
  | { netMass: number }
  /** Liquid level height above the tank bottom (inside), m. Needs `tank.shape`. */
  | { levelHeight: number };

/** The pressure gauge that gave `pressureReadingGauge`. */
export interface PressureGaugeInput {
  /** Full-scale reading, Pa gauge. Default: the tank's design pressure (a gauge reads at least to the MAWP — common practice). */
  fullScaleGauge?: number;
  /** Accuracy as a fraction of full scale. Default 0.02 (±2 % of full scale). */
  accuracy?: number;
}

export interface TankCheckInput {
  tank: TankInput;
  /** Fluid id, blend or custom fluid, as in the core (see `LPG_PRESETS` for commercial LP-gas blends). */
  product: Product;
  /** Measured liquid specific gravity at 60/60 °F (hydrometer or supplier ticket). Optional; default from the model. Used only to pick the filling-density band. */
  specificGravity?: number;
  /** Liquid temperature now, K (thermometer well or surface probe). */
  liquidTemperature: number;
  /** One contents reading. */
  contents: ContentsInput;
  /** Pressure gauge reading now, Pa gauge. Optional; enables the diagnosis. */
  pressureReadingGauge?: number;
  /** The gauge's full scale and accuracy (for the diagnosis tolerance). */
  pressureGauge?: PressureGaugeInput;
  /** Site barometric pressure, Pa absolute. Default: from `elevation`, else 101 325 Pa. */
  barometricPressureAbs?: number;
  /** Site elevation, m (standard atmosphere), used when no barometric pressure is given. */
  elevation?: number;
  /** Forecast peak liquid temperature, K (the app adds a sun allowance to the peak air temperature). */
  peakTemperature: number;
  /** Id of the site's rule set (rules/sets/); `tank.ruleSet` overrides it. Default `us-federal`. */
  ruleSet?: string;
  /** The site's own stricter rule (a company's maximum fill percent and/or filling density). Optional. */
  siteRule?: SiteRule;
}

/** How a tank is full: with liquid, or (above the critical temperature) with dense fluid. */
export type FullKind = 'liquid' | 'dense-fluid';

/** Phase state of the tank contents. */
export type TankPhase = 'two-phase' | 'liquid-full' | 'vapour-only' | 'supercritical';

/** Signal words of the ANSI Z535 convention, most severe first. */
export type CautionLevel = 'danger' | 'warning' | 'caution' | 'notice';

/** Quantity of the number behind a caution (to format it with `thermo/units.ts`). */
export type CautionQuantity =
  | 'gaugePressure'
  | 'pressure'
  | 'pressureDifference'
  | 'temperature'
  | 'mass'
  | 'volume'
  | 'fraction';

export interface Caution {
  level: CautionLevel;
  /** Stable machine code, e.g. `relief-at-peak`, `vacuum`, `standing`. */
  code: CautionCode;
  /** The numbers (SI, with their quantity) and words behind the message, by name; see `CAUTION_CODES`. */
  params: MessageParams;
  /** Default plain-language message in English with the numbers in it (°F/psig and °C/kPa); an app writes `code` and `params` in its user's units instead. Never permission to fill. */
  message: string;
  /** The number behind the caution, SI (unit per `quantity`), or null when the caution has none. */
  value: number | null;
  /** What `value` measures. */
  quantity: CautionQuantity | null;
}

/** The product as the check saw it. */
export interface ProductSummary {
  /** Display name. */
  label: string;
  /** True for LP-gas (propane, propylene, butanes, butylenes and their mixtures, 29 CFR 1910.110(a)(7)). */
  lpGas: boolean;
  /** Liquid specific gravity at 60/60 °F used for the rule (entered, or model ÷ 999.016 kg/m³), dimensionless. */
  specificGravity: number;
  /** Where `specificGravity` came from. */
  specificGravitySource: 'entered' | 'model';
  /** Saturated liquid density at 60 °F from the model, kg/m³. */
  liquidDensityAt60F: number;
  /** Critical temperature (pure) or pseudo-critical (blend, Kay's rule), K. */
  criticalTemperature: number;
}

export interface ContentsResult {
  /** Liquid volume now, m³. */
  liquidVolume: number;
  /** Liquid volume ÷ tank volume now, percent 0…100 (what a float gauge should read). */
  liquidPercent: number;
  /** Liquid level height now, m, or null when the tank shape is not given or there is no liquid surface. */
  levelHeight: number | null;
  /** Liquid mass, kg. */
  liquidMass: number;
  /** Vapour mass, kg. */
  vapourMass: number;
  /** Total product mass in the tank, kg. */
  totalMass: number;
  /** Total mass ÷ water weight capacity at 60 °F (water 8.32828 lb/US gal, in air), fraction (0.42 = 42 %). */
  fillingDensity: number;
  /** Liquid volume corrected to 60 °F (15.6 °C): liquid mass ÷ liquid density at 60 °F, m³. */
  liquidVolumeAt60F: number;
  /** Overall density of the contents (total mass ÷ tank volume), kg/m³. */
  overallDensity: number;
}

/** One limit considered for the fill. */
export interface LimitEntry {
  /** Stable id, e.g. `osha-h27`, `dot-173.315b`, `nh3-1910.111b11`, `not-liquid-full`. */
  id: string;
  /**
   * `rule`: a filling-density (weight) rule; `volume`: a rule's printed percent by volume;
   * `gauge-setting`: a fixed maximum-level gauge's setting; `physical`: never liquid-full up to a
   * reference temperature; `site`: the site's own stricter rule (never raises the limit).
   */
  kind: 'rule' | 'volume' | 'gauge-setting' | 'physical' | 'site';
  /** What the limit is, in words. */
  description: string;
  /** Where it comes from (regulation, table, edition) or "common practice". */
  citation: string;
  /** Maximum permitted mass, kg (rounded down to 0.01 kg). */
  maxMass: number;
  /** The same as a filling density, fraction of the water weight capacity at 60 °F. */
  fillingDensity: number;
  /** For a not-liquid-full limit: the temperature up to which the tank must not become liquid-full, K. Else null. */
  referenceTemperature: number | null;
  /** Fraction taken off the model's liquid density for this limit (0 for a table rule; see rules/allowance.ts). */
  modelAllowance: number;
  /**
   * The limit as a float-gauge percent at the current liquid temperature (not rounded): a volume
   * limit's or gauge setting's own percent; for a mass limit, the liquid percent at which the tank
   * holds `maxMass`. Null above the critical temperature (no liquid level).
   */
  gaugePercent: number | null;
}

export interface FillLimitResult {
  /** Maximum permitted mass: the lowest of `limits`, kg (rounded down). */
  maxMass: number;
  /** `maxMass` as a filling density, fraction of the water weight capacity at 60 °F (rounded down). */
  maxFillingDensity: number;
  /** The id of the limit that binds (one of `limits`). */
  binding: string;
  /**
   * Which rule bound: an entry of the rule set (weight, volume or gauge setting), the site's own
   * stricter rule, the not-liquid-full limit, or none at all.
   */
  boundBy: 'rule-set' | 'site-rule' | 'not-liquid-full' | 'none';
  /** Id of the rule set the check applied (rules/sets/). */
  ruleSet: string;
  /** Every limit considered, lowest first. */
  limits: LimitEntry[];
  /** maxMass − totalMass, kg (rounded down; negative when over the limit). */
  roomLeftMass: number;
  /** Room left as liquid volume at the current liquid temperature, m³ (rounded down; negative when over). */
  roomLeftVolume: number;
  /** Room left as liquid volume at 60 °F, m³ (rounded down; negative when over). */
  roomLeftVolumeAt60F: number;
  /**
   * Room left as liquid volume at 15 °C, the metric base temperature, m³ (rounded down; negative
   * when over): room left mass ÷ the model's saturated liquid density at 288.15 K.
   */
  roomLeftVolumeAt15C: number;
  /**
   * Float-gauge percent to stop at, at the current liquid temperature: the binding limit's
   * `gaugePercent` — the lowest of every weight limit, volume limit, gauge setting and
   * not-liquid-full limit that applies to this fill method — rounded down to 0.1 (100 when even a
   * liquid-full tank would hold less; 0 above the critical temperature).
   */
  stopAtGaugePercent: number;
  /**
   * The lowest rule limit by volume that applies now, percent of the container (a printed volume
   * limit, a fixed gauge's setting, or for LP-gas the weight limit as a volume, FD·100 / (SG · VCF),
   * VCF = ρL(T)/ρL(60 °F), 29 CFR 1910.110(b)(19)(v)). Null when none applies (for example a fill
   * by weight).
   */
  volumetricMaxPercent: number | null;
  /** How the tank is filled, as the check applied it (`fixedDipTube: true` reads as `fixed-gauge`). */
  fillMethod: FillMethod;
  /** True when a fixed maximum-level gauge's setting binds: the fill stops when liquid first appears at the gauge. */
  stopAtFixedGauge: boolean;
  /**
   * One line saying why the stop is where it is, when that is not simply the weight limit: a volume
   * limit below the weight limit at this temperature, a fixed gauge's setting, a fill by weight, or
   * the not-liquid-full limit. Null when the weight limit binds on a gauge fill.
   */
  bindingNote: string | null;
}

export interface PeakResult {
  /** The forecast peak liquid temperature, K. */
  temperature: number;
  /** Phase state at the peak (closed tank, same contents). */
  phase: TankPhase;
  /** `liquid` when liquid-full at the peak, `dense-fluid` when above the critical temperature with contents denser than the critical density (as hazardous as liquid-full), else null. */
  full: FullKind | null;
  /** Expected pressure at the peak, Pa gauge (rounded up to 100 Pa). */
  pGauge: number;
  /** Same, Pa absolute (not rounded). */
  pAbs: number;
  /**
   * The peak raised by the model's allowance, the figure both headrooms are measured from, Pa
   * gauge (rounded up to 100 Pa): `pAbs × (1 + allowance) −` barometric pressure. A reader who
   * sees the peak and a headroom needs this figure to reconcile them.
   */
  pGaugeUpper: number;
  /**
   * The allowance the peak was raised by, fraction of the absolute pressure (rules/allowance.ts):
   * `liquidFullPressure` when full (liquid or dense fluid) at the peak, else `vapourPressure`.
   */
  allowance: number;
  /** Liquid volume ÷ tank volume at the peak, fraction 0…1. */
  liquidFraction: number;
  /** Design pressure − `pGaugeUpper`, Pa (rounded down to 100 Pa; negative when exceeded). */
  headroomToDesign: number;
  /** Relief set pressure − `pGaugeUpper`, Pa (rounded down to 100 Pa; negative when exceeded). */
  headroomToRelief: number;
}

export interface DiagnosisResult {
  /** The entered reading, Pa gauge. */
  readingGauge: number;
  /** Expected pressure at the entered liquid temperature, Pa gauge. */
  expectedGauge: number;
  /** reading − expected, Pa. */
  difference: number;
  /** Allowed band, ± Pa (gauge accuracy × full scale plus the model's vapour-pressure allowance). */
  tolerance: number;
  /** `fits`, `high` (above the band) or `low` (below the band). */
  verdict: 'fits' | 'high' | 'low';
  /** Likely causes in words (English default), most likely first (empty when the reading fits). */
  causes: string[];
  /** The same causes as stable codes, in the same order (see `CAUSE_CODES`). */
  causeCodes: CauseCode[];
  /**
   * LP-gas only: the propane mole fraction of a propane/n-butane mix whose vapour pressure at the
   * entered temperature equals the reading (ideal-solution estimate), fraction 0…1, or null.
   */
  propaneFraction: number | null;
  /** The liquid temperature at which the product's expected pressure equals the reading, K, or null. */
  temperatureForReading: number | null;
}

export interface TankCheckResult {
  /** Phase state now. */
  phase: TankPhase;
  /** `liquid` when liquid-full now, `dense-fluid` when full of dense fluid now (see `PeakResult.full`), else null. */
  full: FullKind | null;
  /** Expected pressure now, Pa gauge (model, at the entered liquid temperature; rounded up to 100 Pa). */
  pGauge: number;
  /** Expected pressure now, Pa absolute. */
  pAbs: number;
  /**
   * Expected pressure now raised by the model's allowance (as `PeakResult.pGaugeUpper`), Pa gauge
   * (rounded up to 100 Pa): the figure the `relief-now` caution and `reliefTemperature` use.
   */
  pGaugeUpper: number;
  /** The barometric pressure used, Pa absolute. */
  barometricPressureAbs: number;
  product: ProductSummary;
  contents: ContentsResult;
  fillLimit: FillLimitResult;
  peak: PeakResult;
  /** Temperature from which the tank (same contents, closed) is full — liquid-full, or full of dense fluid where the saturation curve ends first — K, or null when it never fills (contents not denser than the critical density). */
  liquidFullTemperature: number | null;
  /** Temperature at which the pressure, raised by the same model allowance as the headroom, reaches the relief set pressure, K; the present liquid temperature when it is reached already; null when not below 400 K. */
  reliefTemperature: number | null;
  /** Present when a gauge pressure was entered. */
  diagnosis: DiagnosisResult | null;
  /** Ranked, most severe first; the last is always the standing caution (`code: 'standing'`). */
  cautions: Caution[];
  /** The standing caution, in full, for every result. */
  standingCaution: string;
}
