/**
 * The fill limit: every limit that applies to this fill, the lowest one binding.
 *
 * - the filling-density (weight) rule, as printed;
 * - the rule's printed limits by volume and a fixed maximum-level gauge's setting, when the tank
 *   is filled by gauge (rules/volumeLimits.ts): as a mass, percent × V × ρL(T) + the vapour in the
 *   rest of the tank, at the current liquid temperature, rounded down (no model allowance: the
 *   driver reads the printed percent itself on the gauge; see DECISIONS.md);
 * - never liquid-full up to each reference temperature (the forecast peak, and 130/131 °F for
 *   DOT cylinders), from the model's liquid density lowered by its allowance;
 * - the site's own stricter rule, when one is set (siteLimits.ts): it can only lower the limit.
 *
 * The weight, volume and reference-temperature rules come from the rule set chosen for the site
 * or tank (rules/sets/, default US federal).
 *
 * At a fixed liquid temperature the mass in the tank rises with the liquid percent, so the
 * lowest mass is also the lowest gauge percent: one limit binds both.
 */
import type { Product } from '../product.js';
import { MODEL_ALLOWANCE } from '../rules/allowance.js';
import { fillingRule, referenceRules } from '../rules/apply.js';
import { recoveryLimit, type RecoveryInput } from '../rules/recovery.js';
import type { RuleSet } from '../rules/ruleset.js';
import type { SiteRule } from '../rules/siteRule.js';
import type { ProductModel, Sat } from './model.js';
import { siteLimits } from './siteLimits.js';
import type { FillLimitResult, LimitEntry } from './types.js';
import type { CleanInput } from './validate.js';

/** x rounded down to a multiple of step (a power of ten). */
export const floorTo = (x: number, step: number) =>
  step < 1 ? Math.floor(x * (1 / step) + 1e-9) / (1 / step) : Math.floor(x / step + 1e-9) * step;

export interface FillLimitContext {
  model: ProductModel;
  product: Product;
  c: CleanInput;
  /** Specific gravity 60/60 °F for the LP-gas bands and the volume formula. */
  sg: number;
  /** Saturation now, or null above the critical temperature. */
  satNow: Sat | null;
  /** Product in the tank now, kg. */
  totalMass: number;
  /** Water weight capacity at 60 °F (in air), kg. */
  waterWeight: number;
  /** A refrigerant recovery cylinder's own limit (tank.recovery), when it is one. */
  recovery?: RecoveryInput;
  /** The rule set that applies (site's or tank's choice). */
  ruleSet: RuleSet;
  /** The site's own stricter rule, or null. */
  siteRule: SiteRule | null;
}

export interface FillLimitOutcome {
  fillLimit: FillLimitResult;
  /** A rule of the tables (weight or volume) covers this product in this container. */
  ruleFound: boolean;
  /** Reference temperatures at or above the critical temperature (the limit keeps the contents below the critical density there), K. */
  skippedRefs: number[];
}

/** Liquid percent at which the tank holds `mass` now (unclamped), or null with no liquid level. */
export function percentForMass(k: FillLimitContext, mass: number): number | null {
  const s = k.satNow;
  if (!s) return null;
  return ((mass / k.c.V - s.rhoV) / (s.rhoL - s.rhoV)) * 100;
}

export function computeFillLimit(k: FillLimitContext): FillLimitOutcome {
  const { c, model } = k;
  const limits: LimitEntry[] = [];
  // An insulated DOT cylinder with a low relief setting is read as a DOT-4L (refrigerated) cylinder.
  const byRelief = k.ruleSet.relief.insulatedCylinderRule;
  const rule4l =
    c.containerClass === 'cylinder' && c.insulated && byRelief
      ? byRelief(k.product, c.reliefSetPressureGauge)
      : null;
  const rule =
    rule4l ??
    fillingRule(
      {
        product: k.product,
        containerClass: c.containerClass,
        placement: c.placement,
        insulated: c.insulated,
        fixedDipTube: c.fillMethod === 'fixed-gauge',
        waterCapacity: c.V,
        specificGravity: k.sg,
      },
      k.ruleSet,
    );
  if (rule) {
    const maxMass = floorTo(rule.fillingDensity * k.waterWeight, 0.01);
    limits.push({
      id: rule.id,
      kind: 'rule',
      description: rule.description,
      citation: rule.citation,
      maxMass,
      fillingDensity: rule.fillingDensity,
      referenceTemperature: null,
      modelAllowance: 0,
      gaugePercent: percentForMass(k, maxMass),
    });
  }
  const vol = k.ruleSet.volumeRules({
    product: k.product,
    containerClass: c.containerClass,
    placement: c.placement,
    insulated: c.insulated,
    fillMethod: c.fillMethod,
    liquidTemperature: c.T,
    weightRule: rule,
    specificGravity: k.sg,
    waterCapacity: c.V,
    vcf: (T) => {
      const s = model.sat(T);
      return s ? s.rhoL / model.basics.rho60 : null;
    },
  });
  const s = k.satNow;
  if (s) {
    for (const v of vol) {
      const f = v.percent / 100;
      const maxMass = floorTo(c.V * (f * s.rhoL + (1 - f) * s.rhoV), 0.01);
      limits.push({
        id: v.id,
        kind: v.kind,
        description: v.description,
        citation: v.citation,
        maxMass,
        fillingDensity: maxMass / k.waterWeight,
        referenceTemperature: null,
        modelAllowance: 0,
        gaugePercent: v.percent,
      });
    }
  }
  const skippedRefs = physicalLimits(k, limits);
  limits.push(...siteLimits(k));
  // Lowest mass first; on a tie the printed percent (volume or gauge setting) is named.
  limits.sort((p, q) => p.maxMass - q.maxMass || rank(p) - rank(q));
  return {
    fillLimit: buildFillLimit(k, limits),
    ruleFound: rule !== null || vol.length > 0,
    skippedRefs,
  };
}

// On a tie the rule set's own entry is named before the site's rule (which then does not lower it).
const rank = (l: LimitEntry) =>
  l.kind === 'gauge-setting'
    ? 0
    : l.kind === 'volume'
      ? 1
      : l.kind === 'rule'
        ? 2
        : l.kind === 'physical'
          ? 3
          : 4;

/** Never liquid-full up to each reference temperature; returns the ones at or above the critical temperature. */
function physicalLimits(k: FillLimitContext, limits: LimitEntry[]): number[] {
  const { c, model } = k;
  const refs = referenceRules(k.product, c.containerClass, k.ruleSet);
  refs.push({
    id: 'not-liquid-full-at-peak',
    kind: 'physical',
    description:
      c.Tpeak >= c.T
        ? 'The tank must not become liquid-full at the forecast peak liquid temperature'
        : 'The tank must not become liquid-full at the present liquid temperature (warmer than the forecast peak)',
    citation:
      'physics of a closed tank (a liquid-full tank’s pressure climbs steeply with temperature); the same principle as 49 CFR 173.304(b) — common practice for storage',
    referenceTemperature: Math.max(c.Tpeak, c.T),
  });
  const recovery = recoveryLimit(k.recovery, c.T);
  if (recovery) refs.push({ ...recovery, kind: 'rule' });
  const skipped: number[] = [];
  for (const r of refs) {
    // Named only at or past the critical temperature: in the last stretch below it (no
    // saturation state, limit from the critical scaling) the product is not "above" it.
    if (!model.sat(r.referenceTemperature) && r.referenceTemperature >= model.basics.Tc)
      skipped.push(r.referenceTemperature);
    const rhoNotFull = notFullDensity(model, r.referenceTemperature);
    const share = r.id === 'recovery-cylinder' ? (recovery?.fraction ?? 1) : 1;
    const mass = floorTo(share * c.V * rhoNotFull * (1 - MODEL_ALLOWANCE.liquidDensity), 0.01);
    limits.push({
      id: r.id,
      kind: r.kind,
      description: r.description,
      citation: r.citation,
      maxMass: mass,
      fillingDensity: mass / k.waterWeight,
      referenceTemperature: r.referenceTemperature,
      modelAllowance: MODEL_ALLOWANCE.liquidDensity,
      gaugePercent: percentForMass(k, mass),
    });
  }
  return skipped;
}

function buildFillLimit(k: FillLimitContext, limits: LimitEntry[]): FillLimitResult {
  const { c } = k;
  const binding = limits[0];
  // With no limit at all (no rule, no liquid at any reference temperature) the check claims no room.
  const maxMass = binding ? binding.maxMass : floorTo(k.totalMass, 0.01);
  const roomLeftMass = floorTo(maxMass - k.totalMass, 0.01);
  const rho60 = k.model.basics.rho60;
  const rhoLiquidNow = k.satNow?.rhoL ?? rho60;
  const gp = binding ? binding.gaugePercent : percentForMass(k, maxMass);
  const stop = gp === null ? 0 : Math.min(100, Math.max(0, floorTo(gp, 0.1)));
  const byVolume = limits.filter((l) => l.kind === 'volume' || l.kind === 'gauge-setting');
  const boundBy = !binding
    ? 'none'
    : binding.kind === 'site'
      ? 'site-rule'
      : binding.kind === 'physical'
        ? 'not-liquid-full'
        : 'rule-set';
  return {
    maxMass,
    // The binding limit's own figure (a table's 42 % stays 42 %, not 41.999 % from the mass
    // rounded down to 0.01 kg); never above the rounded-down mass.
    maxFillingDensity: binding
      ? Math.min(binding.fillingDensity, maxMass / k.waterWeight + 1e-12)
      : floorTo(maxMass / k.waterWeight, 1e-5),
    binding: binding ? binding.id : 'none',
    boundBy,
    ruleSet: k.ruleSet.id,
    limits,
    roomLeftMass,
    roomLeftVolume: floorTo(roomLeftMass / rhoLiquidNow, 1e-6),
    roomLeftVolumeAt60F: floorTo(roomLeftMass / rho60, 1e-6),
    roomLeftVolumeAt15C: floorTo(roomLeftMass / k.model.basics.rho15, 1e-6),
    stopAtGaugePercent: stop,
    volumetricMaxPercent: byVolume.length
      ? Math.min(...byVolume.map((l) => l.gaugePercent ?? 100))
      : null,
    fillMethod: c.fillMethod,
    stopAtFixedGauge: binding?.kind === 'gauge-setting',
    bindingNote: bindingNote(c, limits, binding, stop),
  };
}

const pct = (x: number) => `${+floorTo(x, 0.1).toFixed(1)} %`;

/** One line saying why the stop is where it is (see FillLimitResult.bindingNote). */
function bindingNote(
  c: CleanInput,
  limits: LimitEntry[],
  b: LimitEntry | undefined,
  stop: number,
): string | null {
  if (!b) return null;
  const weight = limits.find((l) => l.kind === 'rule' && l.referenceTemperature === null);
  const setting = limits.find((l) => l.kind === 'gauge-setting');
  const weightWords = weight
    ? `its weight limit of ${+(weight.fillingDensity * 100).toFixed(2)} % of the water weight${weight.gaugePercent !== null ? ` (${pct(Math.min(100, weight.gaugePercent))} on the gauge now)` : ''}`
    : null;
  const cite = b.citation.replace(' (CFR 2015 ed.)', '');
  if (b.kind === 'site')
    return `This site’s own rule binds, below the rule set’s limits: ${b.description}.`;
  if (b.kind === 'gauge-setting')
    return `Filled by the fixed maximum-level gauge: the fill stops when liquid first appears at the gauge, set at ${pct(b.gaugePercent ?? stop)}; ${cite}.`;
  const lead =
    c.fillMethod === 'weight'
      ? 'Filled by weight on a scale: the rule’s weight column applies, not its volume column. '
      : setting
        ? `The fixed maximum-level gauge is set at ${pct(setting.gaugePercent ?? 100)}, above the limit at this temperature: stop by the float gauge at ${pct(stop)}, before liquid appears at the fixed gauge. `
        : '';
  if (b.kind === 'volume')
    return `${lead}The rule’s volume limit at this temperature binds: ${pct(b.gaugePercent ?? stop)} by volume${weightWords ? `, below ${weightWords}` : ''}; ${cite}.`;
  const ruled = limits.some((l) => l.kind !== 'physical' && l.kind !== 'site');
  if (b.kind === 'physical' && ruled)
    return `${lead}The not-liquid-full limit binds below the rule’s limits: ${b.description.charAt(0).toLowerCase()}${b.description.slice(1)}.`;
  return lead ? lead.trim() : null;
}

/**
 * The highest overall density that is not full at T, kg/m³: the saturated liquid density on
 * the saturation curve; above its end, the lower of the critical density (denser contents are
 * full of dense fluid) and the liquid density where the curve ends, so the limit never rises
 * as the reference temperature does (DECISIONS.md, "Full of dense fluid").
 */
export function notFullDensity(model: ProductModel, T: number): number {
  const s = model.sat(T);
  if (s) return s.rhoL;
  const b = model.basics;
  const Ttop = model.satTop();
  const top = model.sat(Ttop);
  if (!top || top.rhoL <= b.rhoc) return top ? top.rhoL : b.rhoc;
  // A pure fluid between the end of the curve (Tc − 0.5 K) and Tc: ρL − ρc ∝ (Tc − T)^(1/3)
  // (the critical scaling search.ts also uses), from the last saturation state down to ρc.
  if (b.pure && T < b.Tc)
    return b.rhoc + (top.rhoL - b.rhoc) * ((b.Tc - T) / (b.Tc - Ttop)) ** (1 / 3);
  return b.rhoc;
}
