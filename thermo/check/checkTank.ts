/**
 * The tank check: from nameplate and readings to contents, fill limit, peak-day pressure,
 * a gauge diagnosis and ranked cautions. Pure and synchronous; SI in and out (see types.ts).
 *
 * Heating a closed tank keeps the overall density ρ = m/V constant, so the peak state is the
 * core's closed-tank state at the peak temperature and the same ρ. The liquid-full temperature
 * is where the saturated liquid density falls to ρ; the relief temperature is where the
 * closed-tank pressure, raised by the model allowance, reaches the relief set pressure.
 */
import { ConvergenceError, InputError } from '../errors.js';
import { T_60F_K } from '../constants.js';
import { T_CHECK_MAX_K, checkMinTemperature } from '../limits.js';
import { fullKind, pressureAllowance } from './full.js';
import { isLpGas } from '../rules/gases.js';
import { WATER_FD_KG_M3, WATER_SG_KG_M3 } from '../rules/water.js';
import { fractionAtLevel, levelAtFraction, tankHeight, totalVolume } from '../tank/geometry.js';
import { buildCautions } from './cautions.js';
import { diagnose } from './diagnosis.js';
import { computeFillLimit } from './fillLimit.js';
import { resolveRules } from './rulesInput.js';
import { ProductModel, type State } from './model.js';
import {
  liquidFullTemperature as findLiquidFullTemperature,
  reliefTemperature as findReliefTemperature,
} from './search.js';
import { STANDING_CAUTION } from './standing.js';
import type { PeakResult, TankCheckInput, TankCheckResult } from './types.js';
import { validateInput, type CleanInput } from './validate.js';

/**
 * x rounded down / up to a multiple of step. Only whole steps occur here (P_STEP), so x / step
 * is the plain quotient; a fraction of a step would need the exact form of fillLimit.ts.
 */
const floorTo = (x: number, step: number) => Math.floor(x / step + 1e-9) * step;
const ceilTo = (x: number, step: number) => Math.ceil(x / step - 1e-9) * step;
/** Pressures are rounded to 100 Pa (0.015 psi): up for pressures, down for headroom. */
const P_STEP = 100;

/** The fields of `TankCheckInput` an `InputError` may name (dotted, as in the input). */
const INPUT_FIELD =
  /^(input|tank(\.[A-Za-z]+(\.[A-Za-z]+)?)?|product(\..*)?|specificGravity|liquidTemperature|contents(\.(gaugePercent|netMass|levelHeight))?|pressureReadingGauge|pressureGauge(\.(fullScaleGauge|accuracy))?|barometricPressureAbs|elevation|peakTemperature|ruleSet|siteRule(\.(maxFillPercent|maxFillingDensity))?)$/;

/** Check a tank. Throws `InputError` (naming the field and its valid range) for bad input only. */
export function checkTank(input: TankCheckInput): TankCheckResult {
  try {
    return check(input);
  } catch (e) {
    // A core refusal about an internal argument (a density, a temperature of a search) is a
    // flaw of the check, but the caller can only change the input: name the product and
    // readings together rather than a field the input does not have.
    if (e instanceof InputError && !INPUT_FIELD.test(e.field)) {
      throw new InputError(
        'product',
        `a product and readings the model can solve together (${e.message})`,
        undefined,
      );
    }
    // The core never hides a failed solve. Where it cannot solve this product at these
    // temperatures, say so about the input rather than crash with another error type.
    if (e instanceof ConvergenceError) {
      throw new InputError(
        'product',
        `a product and temperatures the model can solve (${e.message})`,
        undefined,
      );
    }
    throw e;
  }
}

function check(input: TankCheckInput): TankCheckResult {
  const c = validateInput(input);
  const rules = resolveRules(input);
  const model = new ProductModel(input.product);
  const b = model.basics;
  const Tlo = productFloor(model, c);
  const lpGas = isLpGas(input.product);
  const sgModel = b.rho60 / WATER_SG_KG_M3;
  const sg = c.specificGravity ?? sgModel;

  // --- Contents now: overall density ρ = m / V. ---
  const satNow = model.sat(c.T);
  const shape = input.tank.shape;
  const rho = overallDensity(model, c, input, Tlo);
  const shapeVolume = shape ? totalVolume(shape) : null;

  const now = model.state(c.T, rho);
  const totalMass = rho * c.V;
  const waterWeight = c.V * WATER_FD_KG_M3;

  // --- Fill limit (fillLimit.ts). ---
  const { fillLimit, ruleFound, skippedRefs } = computeFillLimit({
    model,
    product: input.product,
    c,
    sg,
    satNow,
    totalMass,
    waterWeight,
    recovery: input.tank.recovery,
    ...rules,
  });

  // --- Peak. ---
  const peakState = c.Tpeak === c.T ? now : peakStateOf(model, c, rho);
  const peak = buildPeak(peakState, c, rho, b.rhoc);

  // --- Liquid-full and relief temperatures. ---
  const { liquidFullTemperature, reliefTemperature } = searchTemperatures(model, c, rho, Tlo);

  // --- Diagnosis. ---
  const diagnosis = c.pressureReadingGauge === null ? null : diagnose(model, c, now, lpGas, Tlo);

  const result: TankCheckResult = {
    phase: now.phase,
    full: fullKind(now, rho, b.rhoc),
    pGauge: ceilTo(now.pAbs - c.baro, P_STEP),
    pAbs: now.pAbs,
    pGaugeUpper: ceilTo(now.pAbs * (1 + pressureAllowance(now, rho, b.rhoc)) - c.baro, P_STEP),
    barometricPressureAbs: c.baro,
    product: productSummary(b, lpGas, sg, c.specificGravity === null),
    contents: contentsOf(now, c, rho, shape, b.rho60),
    fillLimit,
    peak,
    liquidFullTemperature,
    reliefTemperature,
    diagnosis,
    cautions: [],
    standingCaution: STANDING_CAUTION,
  };
  // The cautions quote the same raised peak the headrooms are measured from.
  const peakAllowance = peak.allowance;
  const peakRaised = peak.pGaugeUpper;
  result.cautions = buildCautions(result, {
    input,
    clean: c,
    now,
    model,
    rule: ruleFound,
    sgModel,
    skippedRefs,
    shapeVolume,
    T60: T_60F_K,
    peakAllowance,
    peakRaised,
  });
  return result;
}

/** The liquid-full temperature and the relief temperature of this fill, K (or null). */
function searchTemperatures(model: ProductModel, c: CleanInput, rho: number, Tlo: number) {
  const hints = [c.T, c.Tpeak];
  const rhoc = model.basics.rhoc;
  const liquidFullTemperature = findLiquidFullTemperature(model, rho, hints, Tlo);
  const reliefTemperature = findReliefTemperature(
    model,
    rho,
    c.reliefSetPressureGauge + c.baro,
    (s) => pressureAllowance(s, rho, rhoc),
    c.T,
    liquidFullTemperature,
    hints,
  );
  return { liquidFullTemperature, reliefTemperature };
}

function productSummary(
  b: ProductModel['basics'],
  lpGas: boolean,
  sg: number,
  sgFromModel: boolean,
): TankCheckResult['product'] {
  return {
    label: b.label,
    lpGas,
    specificGravity: sg,
    specificGravitySource: sgFromModel ? 'model' : 'entered',
    liquidDensityAt60F: b.rho60,
    criticalTemperature: b.Tc,
  };
}

/** This product's lowest check temperature, K; refuses liquid or peak temperatures below it. */
function productFloor(model: ProductModel, c: CleanInput): number {
  const Tlo = checkMinTemperature(model.basics.Tmin);
  const tRange = `from ${Tlo.toFixed(2)} K (this product's lower limit) to ${T_CHECK_MAX_K} K`;
  const tLimits = {
    min: Tlo,
    max: T_CHECK_MAX_K,
    quantity: 'temperature',
    note: 'for this product',
  } as const;
  if (c.T < Tlo) throw new InputError('liquidTemperature', tRange, c.T, tLimits);
  if (c.Tpeak < Tlo) throw new InputError('peakTemperature', tRange, c.Tpeak, tLimits);

  return Tlo;
}

/** Overall density of the contents now, kg/m³ (mass ÷ tank volume), from the contents read. */
function overallDensity(
  model: ProductModel,
  c: CleanInput,
  input: TankCheckInput,
  Tlo: number,
): number {
  const satNow = model.sat(c.T);
  const shape = input.tank.shape;
  const contents = input.contents;
  if ('netMass' in contents) {
    const cap = netMassCap(model, c);
    if (contents.netMass > cap) {
      throw new InputError(
        'contents.netMass',
        `from 0 to ${Math.floor(cap)} kg for this tank (110 % of a liquid-full tank at the entered temperature, within what the model can hold)`,
        contents.netMass,
        {
          min: 0,
          max: cap,
          quantity: 'mass',
          note: 'for this tank (110 % of a liquid-full tank at the entered temperature, within what the model can hold)',
        },
      );
    }
    // An empty tank still holds a trace of vapour; 1e-6 kg/m³ keeps the state defined.
    return Math.max(contents.netMass / c.V, 1e-6);
  } else {
    if (!satNow) {
      // The level reading is fine; the liquid temperature is past where a liquid surface
      // exists (the end of the saturation curve), so the temperature is the field refused.
      const top = model.satTop();
      const note =
        'for a level or float-gauge reading (above it there is no liquid surface: weigh the tank instead)';
      throw new InputError(
        'liquidTemperature',
        `from ${Tlo.toFixed(2)} to ${top.toFixed(2)} K ${note}`,
        c.T,
        { min: Tlo, max: top, quantity: 'temperature', note },
      );
    }
    let f: number;
    if ('gaugePercent' in contents) f = contents.gaugePercent / 100;
    else {
      const H = tankHeight(shape!);
      if (contents.levelHeight > H)
        throw new InputError(
          'contents.levelHeight',
          `from 0 to ${H.toFixed(3)} m (the inside height of this tank)`,
          contents.levelHeight,
          { min: 0, max: H, quantity: 'length', note: '(the inside height of this tank)' },
        );
      f = fractionAtLevel(shape!, contents.levelHeight);
    }
    return f * satNow.rhoL + (1 - f) * satNow.rhoV;
  }
}

/** The closed-tank state at the peak temperature; refuses a peak the model cannot hold the fill at. */
function peakStateOf(model: ProductModel, c: CleanInput, rho: number): State {
  const peakState = model.stateOrNull(c.Tpeak, rho);
  if (!peakState) {
    const Tmax = model.maxTemperatureFor(rho, c.T, c.Tpeak);
    throw new InputError(
      'peakTemperature',
      `at most ${Tmax.toFixed(1)} K for this fill: beyond it the model cannot hold this much product in the tank (it would be liquid-full long before)`,
      c.Tpeak,
      {
        max: Tmax,
        quantity: 'temperature',
        note: 'for this fill: beyond it the model cannot hold this much product in the tank (it would be liquid-full long before)',
      },
    );
  }
  return peakState;
}

/** The contents now: volumes, masses, filling density. */
function contentsOf(
  now: State,
  c: CleanInput,
  rho: number,
  shape: TankCheckInput['tank']['shape'],
  rho60: number,
): TankCheckResult['contents'] {
  const totalMass = rho * c.V;
  const liquidMass = now.rhoL !== null ? now.lf * c.V * now.rhoL : 0;
  const vapourMass = Math.max(0, totalMass - liquidMass);
  const waterWeight = c.V * WATER_FD_KG_M3;
  return {
    liquidVolume: now.lf * c.V,
    liquidPercent: now.lf * 100,
    levelHeight: shape && now.phase !== 'supercritical' ? levelAtFraction(shape, now.lf) : null,
    liquidMass,
    vapourMass,
    totalMass,
    fillingDensity: totalMass / waterWeight,
    liquidVolumeAt60F: liquidMass / rho60,
    overallDensity: rho,
  };
}

function netMassCap(model: ProductModel, c: CleanInput): number {
  const s = model.sat(c.T);
  // 110 % of a liquid-full tank at this temperature (above the critical point: of the liquid
  // density at 60 °F), and never beyond what the model can hold at this temperature.
  const rhoCap = s ? 1.1 * s.rhoL : 1.1 * model.basics.rho60;
  return Math.min(rhoCap, model.maxDensityAt(c.T)) * c.V;
}

function buildPeak(s: State, c: CleanInput, rho: number, rhoc: number): PeakResult {
  const allowance = pressureAllowance(s, rho, rhoc);
  // Both headrooms are taken from the rounded-up raised peak, so design − pGaugeUpper is exact.
  const pGaugeUpper = ceilTo(s.pAbs * (1 + allowance) - c.baro, P_STEP);
  return {
    temperature: c.Tpeak,
    phase: s.phase,
    full: fullKind(s, rho, rhoc),
    pGauge: ceilTo(s.pAbs - c.baro, P_STEP),
    pAbs: s.pAbs,
    pGaugeUpper,
    allowance,
    liquidFraction: s.lf,
    headroomToDesign: floorTo(c.designPressureGauge - pGaugeUpper, P_STEP),
    headroomToRelief: floorTo(c.reliefSetPressureGauge - pGaugeUpper, P_STEP),
  };
}
