/**
 * The limits a filling rule prints by volume (percent of the container filled by liquid at the
 * liquid temperature), beside its weight column, and the settings of fixed maximum-level gauges.
 * CFR 2015 annual edition text (check the current eCFR before release).
 *
 * Which apply depends on how the tank is filled:
 * - `gauge` (float, rotary or slip-tube gauge read against the liquid temperature): the printed
 *   volume limits, and for LP-gas the weight limit turned into a volume by the regulation's
 *   formula FD / (SG · VCF) at today's temperature (29 CFR 1910.110(b)(19)(v));
 * - `fixed-gauge` (filled until liquid appears at a fixed maximum-level gauge): the printed volume
 *   limits and the gauge's setting (ammonia 85 %; LP-gas: the volume of the weight limit at 40 °F
 *   aboveground or 50 °F underground, DOT cargo tanks at 97 % of the weight figure);
 * - `weight` (on a scale): only the weight column, and the volume limits of rules that print no
 *   weight figure for that container (refrigerated CO2 and N2O in cargo tanks).
 */
import type { Product } from '../product.js';
import type { ContainerClass, Placement } from '../types.js';
import { isLpGas, productIds, type RuleChoice } from './gases.js';
import { WATER_FD_KG_M3 } from './water.js';

/** How the tank is filled: by a float or variable gauge, to a fixed maximum-level gauge, or by weight on a scale. */
export type FillMethod = 'gauge' | 'fixed-gauge' | 'weight';

export const FILL_METHODS: readonly FillMethod[] = ['gauge', 'fixed-gauge', 'weight'];

const degF = (f: number) => ((f - 32) * 5) / 9 + 273.15;
/** 30 °F in K: the ammonia 87.5 % condition (29 CFR 1910.111(b)(11)(ii); 49 CFR 173.315(a) Note 5). */
export const T_30F_K = degF(30);
/** 40 °F / 50 °F in K: the LP-gas fixed-gauge liquid temperatures (29 CFR 1910.110(b)(19)(v); 49 CFR 173.315(h)(3)). */
export const T_40F_K = degF(40);
export const T_50F_K = degF(50);
/** 49 CFR 173.304a(d)(4): the cylinder dip tube is set for liquid of 0.03051 ft³/lb at 40 °F (= 525.0 kg/m³), at most 42 % by weight. */
export const CYLINDER_DIP_TUBE_KG_M3 = 0.45359237 / (0.03051 * 0.028316846592);
/** 49 CFR 173.304a(d)(4): only cylinders of at least 200 lb water capacity (in m³ of water at 60 °F, in air). */
export const CYLINDER_DIP_TUBE_MIN_M3 = (200 * 0.45359237) / WATER_FD_KG_M3;

export interface VolumeRuleChoice {
  id: string;
  /** `volume`: a printed maximum percent by volume; `gauge-setting`: where a fixed maximum-level gauge is set. */
  kind: 'volume' | 'gauge-setting';
  description: string;
  citation: string;
  /** Percent of the container's volume the liquid may fill at the liquid temperature, 0…100. */
  percent: number;
}

export interface VolumeRuleContext {
  product: Product;
  containerClass: ContainerClass;
  placement: Placement;
  insulated: boolean;
  fillMethod: FillMethod;
  /** Liquid temperature, K; read as the temperature of the liquid being charged. */
  liquidTemperature: number;
  /** The weight rule that applies (already × 0.97 for a DOT fixed gauge), or null. */
  weightRule: RuleChoice | null;
  /** Specific gravity 60/60 °F the weight rule used. */
  specificGravity: number;
  /** m³ */
  waterCapacity: number;
  /** ρL(T)/ρL(60 °F) of the saturated liquid, or null where there is no liquid. */
  vcf: (T: number) => number | null;
}

const CFR = ' (CFR 2015 ed.)';

/** Every volume limit and gauge setting that applies to this fill. */
export function volumeRules(ctx: VolumeRuleContext): VolumeRuleChoice[] {
  const out: VolumeRuleChoice[] = [];
  const ids = productIds(ctx.product);
  const single = ids && ids.length === 1 ? ids[0]!.id : null;
  const dot = ctx.containerClass === 'cargo' || ctx.containerClass === 'portable';
  // Refrigerated CO2 and N2O in cargo and portable tanks: the rule prints only a volume, so it holds however the tank is filled.
  if (dot && (single === 'carbon-dioxide' || single === 'nitrous-oxide')) {
    const name = single === 'carbon-dioxide' ? 'Carbon dioxide' : 'Nitrous oxide';
    out.push({
      id: 'refrigerated-95-volume',
      kind: 'volume',
      description: `${name}, refrigerated liquid, in cargo/portable tanks: at most 95 % of the tank’s volume`,
      citation: '49 CFR 173.315(c)(1)' + CFR,
      percent: 95,
    });
  }
  if (ctx.fillMethod === 'weight') return out;
  if (single === 'ammonia') out.push(...ammoniaRules(ctx, dot));
  if (single === 'sulfur-dioxide' && dot) {
    out.push({
      id: 'so2-volume',
      kind: 'volume',
      description: 'Sulfur dioxide in cargo/portable tanks: 87.5 % by volume',
      citation: '49 CFR 173.315(a) table' + CFR,
      percent: 87.5,
    });
  }
  if (isLpGas(ctx.product) && ctx.weightRule) {
    const r = lpgVolume(ctx, ctx.weightRule, dot);
    if (r) out.push(r);
  }
  return out;
}

function ammoniaRules(ctx: VolumeRuleContext, dot: boolean): VolumeRuleChoice[] {
  if (ctx.containerClass === 'cylinder') return [];
  const out: VolumeRuleChoice[] = [];
  const warm = ctx.liquidTemperature >= T_30F_K - 1e-9;
  const mild = warm
    ? 'the liquid being at 30 °F (−1.1 °C) or warmer; 82 % if the liquid charged is colder'
    : 'the liquid being below 30 °F (−1.1 °C)';
  if (dot) {
    const unlagged = !ctx.insulated;
    out.push({
      id: 'nh3-cargo-volume',
      kind: 'volume',
      description:
        unlagged && warm
          ? `Anhydrous ammonia in an uninsulated DOT cargo/portable tank: 87.5 % by volume, ${mild}`
          : `Anhydrous ammonia in DOT cargo/portable tanks: 82 % by volume${unlagged ? `, ${mild}` : ''}`,
      citation: `49 CFR 173.315(a) table${unlagged && warm ? ' and Note 5' : ''}` + CFR,
      percent: unlagged && warm ? 87.5 : 82,
    });
  } else if (ctx.insulated) {
    out.push({
      id: 'nh3-storage-insulated-volume',
      kind: 'volume',
      description: 'Anhydrous ammonia, insulated container: 83.5 % by volume',
      citation: '29 CFR 1910.111(b)(11)(i)' + CFR,
      percent: 83.5,
    });
  } else if (ctx.placement === 'underground') {
    out.push({
      id: 'nh3-storage-underground-volume',
      kind: 'volume',
      description: 'Anhydrous ammonia, underground uninsulated container: 85 % by volume',
      citation: '29 CFR 1910.111(b)(11)(i)' + CFR,
      percent: 85,
    });
  } else {
    out.push({
      id: 'nh3-storage-aboveground-volume',
      kind: 'volume',
      description: `Anhydrous ammonia, aboveground uninsulated container: ${warm ? 87.5 : 82} % by volume, ${mild}`,
      citation: `29 CFR 1910.111(b)(11)(${warm ? 'ii' : 'i'})` + CFR,
      percent: warm ? 87.5 : 82,
    });
  }
  if (ctx.fillMethod === 'fixed-gauge') {
    out.push({
      id: 'nh3-fixed-gauge',
      kind: 'gauge-setting',
      description:
        'Fixed maximum-level gauge for ammonia, set at 85 % of the water capacity: the fill stops when liquid first appears at the gauge',
      citation: '29 CFR 1910.111(b)(14)(v)' + CFR,
      percent: 85,
    });
  }
  return out;
}

/** LP-gas: the weight limit as a volume, FD / (SG · VCF) (29 CFR 1910.110(b)(19)(v)). */
function lpgVolume(
  ctx: VolumeRuleContext,
  rule: RuleChoice,
  dot: boolean,
): VolumeRuleChoice | null {
  const fd = rule.fillingDensity * 100;
  const sg = ctx.specificGravity;
  if (ctx.fillMethod === 'gauge') {
    if (ctx.containerClass === 'cylinder') return null; // cylinders are charged by weight (49 CFR 173.304a(c))
    const vcf = ctx.vcf(ctx.liquidTemperature);
    if (vcf === null) return null;
    return {
      id: 'lpg-volume-now',
      kind: 'volume',
      description: `LP-gas by volume: the ${fmt(fd)} % weight limit as a liquid volume at today’s temperature, ${fmt(fd)} / (SG ${sg.toFixed(3)} × VCF ${vcf.toFixed(4)})`,
      citation:
        `29 CFR 1910.110(b)(19)(v) formula at the liquid temperature${dot ? '; 49 CFR 173.315(b) Note 1' : ''}` +
        CFR,
      percent: Math.min(100, fd / (sg * vcf)),
    };
  }
  if (ctx.containerClass === 'cylinder') {
    if (sg < 0.504 - 1e-9 || ctx.waterCapacity < CYLINDER_DIP_TUBE_MIN_M3 * (1 - 1e-9)) return null;
    const pct = ((0.42 * WATER_FD_KG_M3) / CYLINDER_DIP_TUBE_KG_M3) * 100;
    return {
      id: 'lpg-cylinder-dip-tube',
      kind: 'gauge-setting',
      description: `Cylinder dip tube set where liquid of 0.03051 ft³/lb at 40 °F weighs 42 % of the water capacity (${pct.toFixed(1)} % of the volume): the fill stops when liquid first appears at the gauge`,
      citation: '49 CFR 173.304a(d)(4)' + CFR,
      percent: pct,
    };
  }
  const Tset = !dot && ctx.placement === 'underground' ? T_50F_K : T_40F_K;
  const vcf = ctx.vcf(Tset);
  if (vcf === null) return null;
  const tWords = Tset === T_50F_K ? '50 °F (underground)' : '40 °F';
  return {
    id: 'lpg-fixed-gauge',
    kind: 'gauge-setting',
    description: `Fixed maximum-level gauge set for the ${fmt(fd)} % weight limit at ${tWords}: ${fmt(fd)} / (SG ${sg.toFixed(3)} × VCF ${vcf.toFixed(4)}); the fill stops when liquid first appears at the gauge`,
    citation: (dot ? '49 CFR 173.315(b) Note 1, 173.315(h)(3)' : '29 CFR 1910.110(b)(19)(v)') + CFR,
    percent: Math.min(100, fd / (sg * vcf)),
  };
}

const fmt = (x: number) =>
  Math.abs(x - Math.round(x)) < 1e-9 ? String(Math.round(x)) : x.toFixed(2);
