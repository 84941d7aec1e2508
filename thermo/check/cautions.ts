/**
 * Ranked cautions: the signal words of the ANSI Z535 convention (danger, warning, caution,
 * notice), each in plain language with the number behind it, most severe first; the standing
 * caution always last. Messages say what the figures show and which limit applies; they never
 * give permission to fill.
 */
import { peakPressureAllowance } from '../rules/allowance.js';
import { fmtAbs, fmtDiff, fmtGauge, fmtMass, fmtPct, fmtT } from './format.js';
import type { ProductModel, State } from './model.js';
import { saturationTemperature } from './search.js';
import { STANDING_CAUTION } from './standing.js';
import type {
  Caution,
  CautionLevel,
  CautionQuantity,
  TankCheckInput,
  TankCheckResult,
} from './types.js';
import type { CleanInput } from './validate.js';

/** CO2 triple point: 216.592 K at 517.96 kPa absolute (Span & Wagner 1996, J. Phys. Chem. Ref. Data 25, 1509). */
export const CO2_TRIPLE_POINT_PA = 517_960;

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
}

export function buildCautions(r: TankCheckResult, k: CautionContext): Caution[] {
  const out: Caution[] = [];
  const add = (
    level: CautionLevel,
    code: string,
    message: string,
    value: number | null,
    quantity: CautionQuantity | null,
  ) => out.push({ level, code, message, value, quantity });
  const c = k.clean;
  const baro = c.baro;
  const g = (pa: number, round: 'up' | 'down' | 'nearest' = 'nearest') => fmtGauge(pa, round, baro);
  const productIsCo2 = k.input.product === 'carbon-dioxide';

  // --- Now. ---
  if (r.phase === 'liquid-full') {
    add(
      'danger',
      'liquid-full-now',
      `The figures show the tank liquid-full now at ${fmtT(c.T)}: there is no vapour space, and the pressure rises steeply with any warming. The contents are ${fmtPct(r.contents.fillingDensity, 'up')} of the water weight capacity.`,
      c.T,
      'temperature',
    );
  }
  if (r.pressure >= c.reliefSetPressure) {
    add(
      'danger',
      'relief-now',
      `The expected pressure now, ${g(r.pressure, 'up')}, is at or above the relief set pressure ${g(c.reliefSetPressure)}: the relief valve may be discharging.`,
      r.pressure,
      'gaugePressure',
    );
  }
  if (r.phase === 'supercritical') {
    add(
      'warning',
      'supercritical-now',
      `The liquid temperature ${fmtT(c.T)} is above the critical temperature ${fmtT(r.product.criticalTemperature)}: there is no liquid surface, so a level or float gauge means nothing; only the weight tells the contents.`,
      r.product.criticalTemperature,
      'temperature',
    );
  }
  const readingAbs = c.gaugePressure === null ? null : c.gaugePressure + baro;
  if (productIsCo2) {
    const threshold = CO2_TRIPLE_POINT_PA - baro;
    const low =
      (readingAbs !== null && readingAbs < CO2_TRIPLE_POINT_PA) ||
      r.pressureAbsolute < CO2_TRIPLE_POINT_PA;
    if (low) {
      add(
        'danger',
        'co2-below-triple-point',
        `Pressure below the CO2 triple-point pressure ${fmtAbs(CO2_TRIPLE_POINT_PA)} = ${g(threshold)} here: liquid CO2 cannot exist below it, and dry ice (solid CO2) can form and block lines and valves. Do not vent or withdraw liquid; follow the supplier's procedure.`,
        threshold,
        'gaugePressure',
      );
    }
  }
  const vacuumNow = r.pressure < 0;
  const vacuumRead = c.gaugePressure !== null && c.gaugePressure < 0;
  if (vacuumNow || vacuumRead) {
    const v = vacuumRead ? c.gaugePressure! : r.pressure;
    add(
      'warning',
      'vacuum',
      `The tank is under vacuum (${g(v)}${vacuumRead ? ', gauge reading' : `, expected at ${fmtT(c.T)}`}): no vapour will flow to appliances, and air can be drawn in through a leak or an open valve.`,
      v,
      'gaugePressure',
    );
  }
  if (c.mdmt !== null) {
    if (c.T < c.mdmt) {
      add(
        'warning',
        'below-mdmt',
        `The liquid at ${fmtT(c.T)} is colder than the minimum design metal temperature ${fmtT(c.mdmt)}: the shell may be brittle; avoid shocks and pressure changes and follow the site procedure.`,
        c.mdmt,
        'temperature',
      );
    } else {
      const Tb = saturationTemperature(
        k.model,
        baro,
        [c.T, c.Tpeak],
        Math.max(k.model.basics.Tmin + 0.01, 150),
      );
      if (Tb !== null && Tb < c.mdmt) {
        add(
          'caution',
          'autorefrigeration-below-mdmt',
          `If the tank is vented or emptied fast, the liquid can chill toward its boiling point at atmospheric pressure, ${fmtT(Tb)}, which is below the minimum design metal temperature ${fmtT(c.mdmt)}.`,
          Tb,
          'temperature',
        );
      }
    }
  }

  // --- Fill limit. ---
  const fl = r.fillLimit;
  const bind = fl.limits.find((l) => l.id === fl.binding);
  // The limit is rounded down to 0.01 kg: contents exactly at the rule's figure are not "over".
  if (r.contents.totalMass - fl.maxMass > 0.01) {
    add(
      'warning',
      'over-fill-limit',
      `The contents, ${fmtMass(r.contents.totalMass, 'up')}, are above the fill limit of ${fmtMass(fl.maxMass, 'down')} by ${fmtMass(-fl.roomLeftMass, 'up')}${bind ? ` (${bind.description}; ${bind.citation})` : ''}.`,
      -fl.roomLeftMass,
      'mass',
    );
  }
  if (!k.rule) {
    add(
      'warning',
      'no-filling-rule',
      `No filling-density table in this tool covers this product in a ${c.containerClass} container${r.product.lpGas ? ` (specific gravity ${r.product.specificGravity.toFixed(4)})` : ''}. The limit shown is ${bind ? 'only the not-liquid-full limit' : 'the present contents (no limit could be computed)'}; the applicable code decides the real limit.`,
      fl.maxMass,
      'mass',
    );
  }
  for (const T of k.skippedRefs) {
    add(
      'caution',
      'no-liquid-at-reference',
      `At ${fmtT(T)} the product is above its critical temperature, so a not-liquid-full limit cannot be computed for that temperature; the pressure then depends on the fill alone.`,
      T,
      'temperature',
    );
  }

  // --- Peak. ---
  const p = r.peak;
  if (p.phase === 'liquid-full') {
    add(
      'danger',
      'liquid-full-at-peak',
      `At the forecast peak ${fmtT(p.temperature)} the figures show the tank liquid-full${r.liquidFullTemperature !== null ? ` (from about ${fmtT(r.liquidFullTemperature, 'down')})` : ''}: the pressure would then be limited only by the relief valve.`,
      r.liquidFullTemperature ?? p.temperature,
      'temperature',
    );
  } else if (
    r.liquidFullTemperature !== null &&
    r.liquidFullTemperature > p.temperature &&
    r.liquidFullTemperature - p.temperature < 5
  ) {
    add(
      'warning',
      'liquid-full-near-peak',
      `The tank would become liquid-full at ${fmtT(r.liquidFullTemperature, 'down')}, less than 5 K (9 °F) above the forecast peak ${fmtT(p.temperature)}.`,
      r.liquidFullTemperature,
      'temperature',
    );
  }
  if (p.headroomToDesign < 0) {
    add(
      'danger',
      'design-at-peak',
      `At the forecast peak ${fmtT(p.temperature)} the expected pressure ${g(p.p, 'up')} (with the model allowance of ${(peakPressureAllowance(p.phase) * 100).toFixed(1)} %) is above the design pressure ${g(c.designPressure)} by ${fmtDiff(-p.headroomToDesign, 'up')}.`,
      -p.headroomToDesign,
      'pressureDifference',
    );
  }
  if (p.headroomToRelief < 0) {
    add(
      'warning',
      'relief-at-peak',
      `The relief valve may open: at the forecast peak ${fmtT(p.temperature)} the expected pressure ${g(p.p, 'up')} (with the model allowance) reaches the relief set pressure ${g(c.reliefSetPressure)}${r.reliefTemperature !== null ? `, from about ${fmtT(r.reliefTemperature, 'down')}` : ''}.`,
      r.reliefTemperature ?? p.temperature,
      'temperature',
    );
  } else if (p.headroomToRelief < 0.05 * c.reliefSetPressure) {
    add(
      'caution',
      'relief-near-at-peak',
      `Little headroom at the forecast peak ${fmtT(p.temperature)}: ${fmtDiff(p.headroomToRelief, 'down')} below the relief set pressure ${g(c.reliefSetPressure)}.`,
      p.headroomToRelief,
      'pressureDifference',
    );
  }
  if (
    r.liquidFullTemperature === null &&
    !k.model.basics.pure &&
    r.contents.overallDensity > k.model.basics.rhoc
  ) {
    const top = k.model.satTop();
    add(
      'notice',
      'liquid-full-beyond-model',
      `No liquid-full temperature is given: for this blend it lies above ${fmtT(top, 'down')}, beyond the range where the model finds its bubble point.`,
      top,
      'temperature',
    );
  }
  if (p.phase === 'supercritical' && r.phase !== 'supercritical') {
    add(
      'caution',
      'supercritical-at-peak',
      `At the forecast peak ${fmtT(p.temperature)} the product is above its critical temperature ${fmtT(r.product.criticalTemperature)}: no liquid level; the pressure depends on the fill.`,
      r.product.criticalTemperature,
      'temperature',
    );
  }
  if (p.phase === 'two-phase' && p.liquidFraction > 0.95) {
    add(
      'caution',
      'small-vapour-space-at-peak',
      `At the forecast peak the liquid would fill ${fmtPct(p.liquidFraction, 'up')} of the tank.`,
      p.liquidFraction,
      'fraction',
    );
  }

  // --- Readings. ---
  const contents = k.input.contents;
  if ('gaugePercent' in contents && (contents.gaugePercent <= 0 || contents.gaugePercent >= 100)) {
    add(
      'caution',
      'gauge-at-end',
      `The float gauge reads ${contents.gaugePercent} %: at the end of its scale the gauge may be stuck or the tank empty or liquid-full; check another way (weight, fixed level gauge).`,
      contents.gaugePercent / 100,
      'fraction',
    );
  }
  if ('netMass' in contents && contents.netMass === 0) {
    add('notice', 'empty', 'The scale shows no product in the tank.', 0, 'mass');
  }
  const d = r.diagnosis;
  if (d && d.verdict !== 'fits') {
    const word = d.verdict === 'high' ? 'higher' : 'lower';
    add(
      'caution',
      d.verdict === 'high' ? 'pressure-high' : 'pressure-low',
      `The gauge reads ${g(d.reading)}, ${fmtDiff(Math.abs(d.difference))} ${word} than the ${g(d.expected)} expected for this product at ${fmtT(c.T)} (band ±${fmtDiff(d.tolerance)}). Likely: ${d.causes[0] ?? ''}${d.propaneFraction !== null ? ` The reading fits a propane/butane mix of about ${Math.round(d.propaneFraction * 100)} % propane (mole).` : ''}`,
      d.difference,
      'pressureDifference',
    );
  }
  if (k.shapeVolume !== null && Math.abs(k.shapeVolume / c.V - 1) > 0.03) {
    add(
      'caution',
      'shape-capacity-mismatch',
      `The tank dimensions give ${fmtPct(k.shapeVolume / c.V - 1)} more volume than the water capacity entered; check the dimensions (inside, tangent to tangent) and the nameplate.`,
      k.shapeVolume,
      'volume',
    );
  }

  // --- Notices. ---
  if (!c.reliefGiven) {
    add(
      'notice',
      'relief-assumed',
      `Relief set pressure not entered: taken as the design pressure ${g(c.designPressure)}. On many containers the relief valve may start to discharge lower (29 CFR 1910.110 Table H-26: 88–100 % of design for ASME 1950 and later).`,
      c.designPressure,
      'gaugePressure',
    );
  }
  if (c.reliefSetPressure > c.designPressure) {
    add(
      'notice',
      'relief-above-design',
      `The relief set pressure ${g(c.reliefSetPressure)} is above the design pressure ${g(c.designPressure)}; check the valve marking against the nameplate.`,
      c.reliefSetPressure,
      'gaugePressure',
    );
  }
  if (c.specificGravity !== null && Math.abs(c.specificGravity / k.sgModel - 1) > 0.02) {
    add(
      'notice',
      'sg-differs',
      `The entered specific gravity ${c.specificGravity.toFixed(3)} differs by more than 2 % from the model's ${k.sgModel.toFixed(4)} for this product; check the product.`,
      c.specificGravity,
      null,
    );
  }
  if (c.Tpeak < c.T) {
    add(
      'notice',
      'peak-below-now',
      `The forecast peak ${fmtT(c.Tpeak)} is colder than the liquid now ${fmtT(c.T)}: the peak figures describe a cooler tank.`,
      c.Tpeak,
      'temperature',
    );
  }
  if (!k.model.basics.pure) {
    add(
      'notice',
      'blend-bubble-point',
      `For a blend the two-phase pressure is taken as the bubble-point pressure of the whole contents (${g(r.pressure, 'up')} now), slightly above the real pressure.`,
      r.pressure,
      'gaugePressure',
    );
  }

  out.sort((a, b) => RANK[a.level] - RANK[b.level]);
  out.push({
    level: 'notice',
    code: 'standing',
    message: STANDING_CAUTION,
    value: null,
    quantity: null,
  });
  return out;
}
