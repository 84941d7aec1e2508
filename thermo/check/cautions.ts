/**
 * Ranked cautions: the signal words of the ANSI Z535 convention (danger, warning, caution,
 * notice), each with a stable code and its numbers as typed parameters (SI with their quantity),
 * most severe first; the standing caution always last. The English default message comes from
 * caution-text.ts; an app writes each code in its user's words and units. Messages say what the
 * figures show and which limit applies; they never give permission to fill.
 */
import { checkMinTemperature } from '../limits.js';
import { CO2_TRIPLE_POINT_PA, cautionMessage } from './caution-text.js';
import { co2SublimationTemperature } from './sublimation.js';
import { num, type CautionCode, type MessageParams } from './codes.js';
import type { ProductModel, State } from './model.js';
import { siteRuleParams } from './siteRuleNotice.js';
import { saturationTemperature } from './search.js';
import type { Caution, CautionLevel, TankCheckInput, TankCheckResult } from './types.js';
import type { CleanInput } from './validate.js';

export { CO2_TRIPLE_POINT_PA };

const RANK: Record<CautionLevel, number> = { danger: 0, warning: 1, caution: 2, notice: 3 };

export interface CautionContext {
  input: TankCheckInput;
  clean: CleanInput;
  now: State;
  model: ProductModel;
  rule: boolean;
  sgModel: number;
  skippedRefs: number[];
  shapeVolume: number | null;
  T60: number;
  /** Peak pressure raised by its model allowance, Pa gauge (as the headroom takes it). */
  peakRaised: number;
  /** The allowance taken on the peak pressure, fraction. */
  peakAllowance: number;
}

type Add = (level: CautionLevel, code: CautionCode, params: MessageParams) => void;

export function buildCautions(r: TankCheckResult, k: CautionContext): Caution[] {
  const out: Caution[] = [];
  const add: Add = (level, code, params) => {
    const main = Object.values(params).find((v) => typeof v !== 'string');
    out.push({
      level,
      code,
      params,
      message: cautionMessage(code, params, k.clean.baro),
      value: main && typeof main !== 'string' ? main.value : null,
      quantity: main && typeof main !== 'string' ? (main.quantity as Caution['quantity']) : null,
    });
  };
  nowCautions(r, k, add);
  limitCautions(r, k, add);
  peakCautions(r, k, add);
  readingCautions(r, k, add);
  noticeCautions(r, k, add);
  out.sort((a, b) => RANK[a.level] - RANK[b.level]);
  out.push({
    level: 'notice',
    code: 'standing',
    params: {},
    message: cautionMessage('standing', {}, k.clean.baro),
    value: null,
    quantity: null,
  });
  return out;
}

const T = (K: number, round: 'up' | 'down' | 'nearest' = 'nearest') => num(K, 'temperature', round);
const G = (pa: number, round: 'up' | 'down' | 'nearest' = 'nearest') =>
  num(pa, 'gaugePressure', round);

function nowCautions(r: TankCheckResult, k: CautionContext, add: Add): void {
  const c = k.clean;
  const baro = c.baro;
  const Tc = T(r.product.criticalTemperature);
  if (r.full === 'liquid')
    add('danger', 'liquid-full-now', {
      temperature: T(c.T),
      fillingDensity: num(r.contents.fillingDensity, 'fraction', 'up'),
    });
  if (r.full === 'dense-fluid')
    add('danger', 'dense-fluid-now', {
      temperature: T(c.T),
      criticalTemperature: Tc,
      fillingDensity: num(r.contents.fillingDensity, 'fraction', 'up'),
    });
  // Reached now: the expected pressure, or the same raised by its allowance (relief temperature).
  if (r.pGauge >= c.reliefSetPressureGauge || r.reliefTemperature === c.T)
    add('danger', 'relief-now', {
      pressure: G(r.pGauge, 'up'),
      upper: G(r.pGaugeUpper, 'up'),
      relief: G(c.reliefSetPressureGauge),
    });
  if (r.phase === 'supercritical')
    add('warning', 'supercritical-now', { temperature: T(c.T), criticalTemperature: Tc });
  const readingAbs = c.pressureReadingGauge === null ? null : c.pressureReadingGauge + baro;
  if (
    k.input.product === 'carbon-dioxide' &&
    ((readingAbs !== null && readingAbs < CO2_TRIPLE_POINT_PA) || r.pAbs < CO2_TRIPLE_POINT_PA)
  )
    add('danger', 'co2-below-triple-point', {
      threshold: G(CO2_TRIPLE_POINT_PA - baro),
      tripleAbsolute: num(CO2_TRIPLE_POINT_PA, 'pressure'),
    });
  const vacuumRead = c.pressureReadingGauge !== null && c.pressureReadingGauge < 0;
  if (r.pGauge < 0 || vacuumRead)
    add('warning', 'vacuum', {
      pressure: G(vacuumRead ? c.pressureReadingGauge! : r.pGauge),
      source: vacuumRead ? 'reading' : 'expected',
      temperature: T(c.T),
    });
  if (c.mdmt === null) return;
  if (c.T < c.mdmt) {
    add('warning', 'below-mdmt', { temperature: T(c.T), mdmt: T(c.mdmt) });
    return;
  }
  const Tlo = checkMinTemperature(k.model.basics.Tmin);
  const Tb = saturationTemperature(k.model, baro, [c.T, c.Tpeak], Tlo);
  // CO2 has no liquid at air pressure: vented, it turns to dry ice and gas at its sublimation
  // temperature (about −78.5 °C), which is then how cold the metal can get.
  const dryIce = Tb === null && k.input.product === 'carbon-dioxide';
  const Tcold = dryIce ? co2SublimationTemperature(baro) : Tb;
  if (Tcold !== null && Tcold < c.mdmt)
    add('caution', 'autorefrigeration-below-mdmt', {
      boiling: T(Tcold),
      mdmt: T(c.mdmt),
      ...(dryIce ? { forms: 'dry ice' } : {}),
    });
}

function limitCautions(r: TankCheckResult, k: CautionContext, add: Add): void {
  const c = k.clean;
  const fl = r.fillLimit;
  const bind = fl.limits.find((l) => l.id === fl.binding);
  // The limit is rounded down to 0.01 kg: contents exactly at the rule's figure are not "over".
  if (r.contents.totalMass - fl.maxMass > 0.01)
    add('warning', 'over-fill-limit', {
      contents: num(r.contents.totalMass, 'mass', 'up'),
      limit: num(fl.maxMass, 'mass', 'down'),
      over: num(-fl.roomLeftMass, 'mass', 'up'),
      limitId: fl.binding,
      ...(bind ? { description: bind.description, citation: bind.citation } : {}),
    });
  if (!k.rule)
    add('warning', 'no-filling-rule', {
      limit: num(fl.maxMass, 'mass', 'down'),
      containerClass: c.containerClass,
      shown: bind ? 'not-full' : 'contents',
      ...(r.product.lpGas ? { specificGravity: num(r.product.specificGravity, null) } : {}),
    });
  for (const Tref of k.skippedRefs)
    add('notice', 'reference-above-critical', {
      reference: T(Tref),
      criticalTemperature: T(r.product.criticalTemperature),
    });
}

function peakCautions(r: TankCheckResult, k: CautionContext, add: Add): void {
  const c = k.clean;
  const p = r.peak;
  const Tf = r.liquidFullTemperature;
  const peakT = T(p.temperature);
  // Full at the peak, or from a temperature at or below it: always a danger.
  const full =
    p.full ??
    (Tf !== null && Tf <= p.temperature
      ? p.phase === 'supercritical'
        ? 'dense-fluid'
        : 'liquid'
      : null);
  const from: MessageParams = Tf !== null ? { from: T(Tf, 'down') } : {};
  if (full === 'dense-fluid')
    add('danger', 'dense-fluid-at-peak', {
      peak: peakT,
      criticalTemperature: T(r.product.criticalTemperature),
      ...from,
    });
  else if (full === 'liquid') add('danger', 'liquid-full-at-peak', { peak: peakT, ...from });
  else if (Tf !== null && Tf - p.temperature < 5)
    add('warning', 'liquid-full-near-peak', {
      full: T(Tf, 'down'),
      peak: peakT,
      margin: num(5, 'temperatureDifference'),
    });
  if (Tf === null && !k.model.basics.pure && r.contents.overallDensity > k.model.basics.rhoc)
    add('notice', 'liquid-full-beyond-model', { top: T(k.model.satTop(), 'down') });
  if (p.headroomToDesign < 0)
    add('danger', 'design-at-peak', {
      peak: peakT,
      pressure: G(k.peakRaised, 'up'),
      allowance: num(k.peakAllowance, 'fraction'),
      design: G(c.designPressureGauge),
      over: num(-p.headroomToDesign, 'pressureDifference', 'up'),
    });
  // No headroom left is the set pressure reached: the valve starts to discharge there.
  if (p.headroomToRelief <= 0)
    add('warning', 'relief-at-peak', {
      peak: peakT,
      pressure: G(k.peakRaised, 'up'),
      relief: G(c.reliefSetPressureGauge),
      ...(r.reliefTemperature !== null ? { from: T(r.reliefTemperature, 'down') } : {}),
    });
  else if (p.headroomToRelief < 0.05 * c.reliefSetPressureGauge)
    add('caution', 'relief-near-at-peak', {
      peak: peakT,
      headroom: num(p.headroomToRelief, 'pressureDifference', 'down'),
      relief: G(c.reliefSetPressureGauge),
    });
  if (p.phase === 'supercritical' && p.full === null && r.phase !== 'supercritical')
    add('caution', 'supercritical-at-peak', {
      peak: peakT,
      criticalTemperature: T(r.product.criticalTemperature),
    });
  // Contents thinner than the critical density cannot nearly fill the tank with liquid (the
  // liquid's share stays below about half up to the critical point, by the rule of rectilinear
  // diameters); a flash that says so near a blend's critical region is not a real state.
  if (
    p.phase === 'two-phase' &&
    p.liquidFraction > 0.95 &&
    r.contents.overallDensity > k.model.basics.rhoc
  )
    add('caution', 'small-vapour-space-at-peak', {
      liquidFraction: num(p.liquidFraction, 'fraction', 'up'),
    });
}

function readingCautions(r: TankCheckResult, k: CautionContext, add: Add): void {
  const c = k.clean;
  const contents = k.input.contents;
  if ('gaugePercent' in contents && (contents.gaugePercent <= 0 || contents.gaugePercent >= 100))
    add('caution', 'gauge-at-end', { reading: num(contents.gaugePercent / 100, 'fraction') });
  if ('netMass' in contents && contents.netMass === 0)
    add('notice', 'empty', { contents: num(0, 'mass') });
  const d = r.diagnosis;
  if (d && d.verdict !== 'fits')
    add('caution', d.verdict === 'high' ? 'pressure-high' : 'pressure-low', {
      difference: num(d.difference, 'pressureDifference'),
      reading: G(d.readingGauge),
      expected: G(d.expectedGauge),
      temperature: T(c.T),
      tolerance: num(d.tolerance, 'pressureDifference'),
      ...(d.causeCodes[0] ? { cause: d.causeCodes[0] } : {}),
      ...(d.propaneFraction !== null
        ? { propaneFraction: num(d.propaneFraction, 'fraction') }
        : {}),
    });
  if (k.shapeVolume !== null && Math.abs(k.shapeVolume / c.V - 1) > 0.03)
    add('caution', 'shape-capacity-mismatch', {
      shapeVolume: num(k.shapeVolume, 'volume'),
      waterCapacity: num(c.V, 'volume'),
      excess: num(k.shapeVolume / c.V - 1, 'fraction'),
    });
}

function noticeCautions(r: TankCheckResult, k: CautionContext, add: Add): void {
  const c = k.clean;
  if (!c.reliefGiven) add('notice', 'relief-assumed', { design: G(c.designPressureGauge) });
  if (c.reliefSetPressureGauge > c.designPressureGauge)
    add('notice', 'relief-above-design', {
      relief: G(c.reliefSetPressureGauge),
      design: G(c.designPressureGauge),
    });
  if (c.specificGravity !== null && Math.abs(c.specificGravity / k.sgModel - 1) > 0.02)
    add('notice', 'sg-differs', {
      entered: num(c.specificGravity, null),
      model: num(k.sgModel, null),
    });
  if (c.Tpeak < c.T) add('notice', 'peak-below-now', { peak: T(c.Tpeak), temperature: T(c.T) });
  if (!k.model.basics.pure) add('notice', 'blend-bubble-point', { pressure: G(r.pGauge, 'up') });
  if (r.fillLimit.boundBy === 'site-rule') add('notice', 'site-rule-binds', siteRuleParams(r));
}
