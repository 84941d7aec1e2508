/**
 * The reconciliation of a fill: from the contents before and the metered delivery, the
 * contents and float-gauge percent to expect after it, compared with the gauge's reading
 * within a band derived from the instruments' stated accuracy and the model's allowance.
 *
 * The physics is the tank check's: the expected after-state is `checkTank` on the expected
 * mass at the after temperature; its fill limit, stop-at percent and pressure diagnosis are
 * taken from that result. The delivered mass is the metered volume times the model's saturated
 * liquid density at the meter's temperature (60 °F, 15 °C, or the product's for a gross meter).
 */
import { saturation } from '../api.js';
import { checkTank } from '../check/checkTank.js';
import type { TankCheckInput, TankCheckResult } from '../check/types.js';
import { T_60F_K } from '../constants.js';
import { ConvergenceError, InputError } from '../errors.js';
import { MODEL_ALLOWANCE } from '../rules/allowance.js';
import { buildFindings, verdictLevel } from './findings.js';
import type { FillBand, FillInput, FillReconciliation, FillVerdict } from './types.js';
import { validateFillInput, type CleanFill } from './validate.js';

/** 15 °C, the metric base of a compensated meter, K. */
export const T_15C_K = 288.15;

/** x rounded down / up to a multiple of a power-of-ten step below 1 (dividing by 1/step keeps 0.1 exact). */
const floorTo = (x: number, step: number) => Math.floor(x * (1 / step) + 1e-9) / (1 / step);
const ceilTo = (x: number, step: number) => Math.ceil(x * (1 / step) - 1e-9) / (1 / step);

/** Reconciles a fill. Throws `InputError` (naming the field and its valid range) for bad input only. */
export function reconcileFill(input: FillInput): FillReconciliation {
  try {
    return reconcile(validateFillInput(input));
  } catch (e) {
    if (e instanceof ConvergenceError)
      throw new InputError(
        'start.check.product',
        `a product and temperatures the model can solve (${e.message})`,
      );
    throw e;
  }
}

interface Sat {
  rhoL: number;
  rhoV: number;
}

function reconcile(c: CleanFill): FillReconciliation {
  const check = c.start.check;
  const before = c.start.before;
  const V = check.tank.waterCapacity;
  const satAfter = saturationAt(check, c.afterTemperature, 'after.liquidTemperature');

  const { Tref, rhoRef } = meterDensity(c);
  const deliveredMass = c.volume * rhoRef;
  const expectedMass = before.totalMass + deliveredMass;

  if (deliveredMass > 0) refuseLowerLevel(c, satAfter);

  // --- The expected after-state, by the tank check. ---
  const expected = expectedCheck(c, expectedMass, rhoRef);
  const E = expected.contents.liquidPercent;
  const gaugeMass = V * (satAfter.rhoV + (c.afterGauge / 100) * (satAfter.rhoL - satAfter.rhoV));
  const difference = c.afterGauge - E;
  const band = bandOf(c, deliveredMass, E, satAfter);

  // --- The fill limit after: the lower of the check's limit before and at the after temperature. ---
  const maxMass = Math.min(before.maxMass, expected.fillLimit.maxMass);
  const stopAt = expected.fillLimit.stopAtGaugePercent;
  // Over by the meter: the expected contents above the limit. Over by the gauge: a reading
  // above the stop-at percent, by the contents it stands for (a reading at the stop-at is not
  // over, even where the check rounds the limit's mass down and not its percent).
  const overByGauge = c.afterGauge > stopAt + 1e-9 ? gaugeMass - maxMass : 0;
  const over = Math.max(expectedMass - maxMass, overByGauge);
  // Masses are rounded to 0.01 kg by the check; less than that over is rounding, not over.
  const overMass = over > 0.005 ? ceilTo(over, 0.01) : 0;

  let verdict: FillVerdict = 'consistent';
  if (overMass > 0) verdict = 'over-limit';
  else if (difference < -band.halfWidth) verdict = 'gauge-low';
  else if (difference > band.halfWidth) verdict = 'gauge-high';

  const d = expected.diagnosis;
  const result: FillReconciliation = {
    verdict,
    level: verdictLevel(verdict),
    afterTemperature: c.afterTemperature,
    meterReferenceTemperature: Tref,
    deliveredDensity: rhoRef,
    deliveredMass,
    expectedMass,
    expectedPhase: expected.phase,
    expectedGaugePercent: E,
    expectedLiquidVolume: expected.contents.liquidVolume,
    gaugePercent: c.afterGauge,
    gaugeMass,
    difference,
    differenceMass: gaugeMass - expectedMass,
    differenceVolume: (gaugeMass - expectedMass) / satAfter.rhoL,
    band,
    maxMass,
    stopAtGaugePercent: stopAt,
    overMass,
    overVolume: overMass > 0 ? ceilTo(overMass / satAfter.rhoL, 1e-6) : 0,
    pressure: d
      ? {
          readingGauge: d.readingGauge,
          expectedGauge: d.expectedGauge,
          difference: d.difference,
          tolerance: d.tolerance,
          verdict: d.verdict,
        }
      : null,
    findings: [],
  };
  result.findings = buildFindings(result, {
    before,
    interrupted: c.interrupted,
    volume: c.volume,
    baro: expected.barometricPressureAbs,
  });
  return result;
}

/** The meter's base temperature and the model's liquid density there. */
function meterDensity(c: CleanFill): { Tref: number; rhoRef: number } {
  const Tref =
    c.basis === 'compensated-60F'
      ? T_60F_K
      : c.basis === 'compensated-15C'
        ? T_15C_K
        : (c.meterTemperature ?? c.afterTemperature);
  const field = c.basis === 'gross' ? 'delivered.meterTemperature' : 'delivered.basis';
  return { Tref, rhoRef: saturationAt(c.start.check, Tref, field).rhoL };
}

/** Refuses an after-reading below what the contents before alone read at the after temperature. */
function refuseLowerLevel(c: CleanFill, satAfter: Sat): void {
  const V = c.start.check.tank.waterCapacity;
  const floorReading = floorTo(leverPercent(c.start.before.totalMass / V, satAfter), 0.1);
  if (c.afterGauge >= floorReading - 1e-9) return;
  throw new InputError(
    'after.gaugePercent',
    `from ${floorReading.toFixed(1)} to 100 %: the contents before the delivery alone read ${floorReading.toFixed(1)} % at the after temperature, and a metered delivery cannot lower the level (check the readings; if the gauge does read this it is faulty: do not fill by it, and follow the site's procedures)`,
    c.afterGauge,
    {
      min: floorReading,
      max: 100,
      note: 'the contents before the delivery alone, at the after temperature',
    },
  );
}

/**
 * Float-gauge percent of contents of overall density `rho` by the lever rule — the check's own
 * definition of a gauge reading (checkTank: ρ = f·ρL + (1 − f)·ρV) — clipped to 0…100.
 */
function leverPercent(rho: number, s: Sat): number {
  return Math.max(0, Math.min(100, ((rho - s.rhoV) / (s.rhoL - s.rhoV)) * 100));
}

/** Saturated densities at T from the core, or an InputError on `field` where there is no liquid level. */
function saturationAt(check: TankCheckInput, T: number, field: string): Sat {
  try {
    const s = saturation(check.product, T);
    return { rhoL: s.rhoL, rhoV: s.rhoV };
  } catch (e) {
    if (e instanceof InputError && e.field === 'T') {
      throw new InputError(
        field,
        `${e.validRange}, where this product has a liquid level (there is none above the critical temperature, so a gauge reading or a metered liquid volume means nothing there)`,
        T,
        e.limits,
      );
    }
    throw e;
  }
}

/** The check's fields as the fill names them. */
const FIELD: Record<string, string> = {
  liquidTemperature: 'after.liquidTemperature',
  pressureReadingGauge: 'after.pressureReadingGauge',
  'contents.netMass': 'delivered.volume',
};

/** checkTank on the expected contents at the after temperature, with the after pressure. */
function expectedCheck(c: CleanFill, mass: number, rhoRef: number): TankCheckResult {
  const input: TankCheckInput = {
    ...c.start.check,
    liquidTemperature: c.afterTemperature,
    contents: { netMass: mass },
    // The not-liquid-full limit takes the warmest of the peak, now and the temperature before
    // (the tank was there today), so the check's limit and stop-at are never above the limit
    // before the delivery.
    peakTemperature: Math.max(c.start.check.peakTemperature, c.start.before.liquidTemperature),
  };
  delete input.pressureReadingGauge;
  if (c.afterPressureGauge !== null) input.pressureReadingGauge = c.afterPressureGauge;
  try {
    return checkTank(input);
  } catch (e) {
    if (!(e instanceof InputError)) throw e;
    if (e.field === 'peakTemperature') {
      // The contents are past what the model can hold at the forecast peak: the limit before
      // (which counts the peak) still applies; the after-state is taken at the after temperature.
      return expectedCheckAt(input, c);
    }
    throw renamed(e, c, rhoRef);
  }
}

function expectedCheckAt(input: TankCheckInput, c: CleanFill): TankCheckResult {
  try {
    return checkTank({ ...input, peakTemperature: c.afterTemperature });
  } catch (e) {
    if (!(e instanceof InputError)) throw e;
    throw renamed(e, c, null);
  }
}

function renamed(e: InputError, c: CleanFill, rhoRef: number | null): InputError {
  const field = FIELD[e.field] ?? e.field;
  if (e.field === 'contents.netMass' && rhoRef !== null && e.limits?.max !== undefined) {
    const maxVolume = Math.max(
      0,
      floorTo((e.limits.max - c.start.before.totalMass) / rhoRef, 1e-6),
    );
    return new InputError(
      field,
      `from 0 to ${maxVolume.toFixed(6)} m³ on this meter's basis: more would not fit in the tank with its contents before (110 % of a liquid-full tank at the after temperature)`,
      c.volume,
      {
        min: 0,
        max: maxVolume,
        quantity: 'volume',
        note: 'more would not fit in the tank with its contents before',
      },
    );
  }
  const got =
    field === 'after.liquidTemperature'
      ? c.afterTemperature
      : field === 'after.pressureReadingGauge'
        ? (c.afterPressureGauge ?? undefined)
        : undefined;
  return new InputError(field, e.validRange, got, e.limits);
}

/**
 * The agreement band, in gauge percentage points at the after temperature. Parts, each the
 * stated accuracy carried to the after level (S = V·(ρL − ρV) is the mass of one whole gauge
 * scale): the after reading (g); the before reading (g·S_before/S_after, 0 when weighed); the
 * meter (m·delivered mass/S_after); the model's liquid-density allowance on the delivered mass
 * and on the expected level. Independent parts combine as the root sum of squares (JCGM
 * 100:2008, GUM §5.1.2, uncorrelated inputs, unit sensitivities); rounded down to 0.1 point so
 * rounding never hides a low reading.
 */
function bandOf(c: CleanFill, deliveredMass: number, E: number, satAfter: Sat): FillBand {
  const V = c.start.check.tank.waterCapacity;
  const S = V * (satAfter.rhoL - satAfter.rhoV);
  const deliveredPoints = (deliveredMass / S) * 100;
  let beforeGauge = 0;
  if (c.start.before.contentsSource !== 'netMass') {
    const sb = saturationAt(
      c.start.check,
      c.start.before.liquidTemperature,
      'start.before.liquidTemperature',
    );
    beforeGauge = (c.gaugePoints * (V * (sb.rhoL - sb.rhoV))) / S;
  }
  const afterGauge = c.gaugePoints;
  const meter = c.meterFraction * deliveredPoints;
  const model = MODEL_ALLOWANCE.liquidDensity * (deliveredPoints + E);
  const halfWidth = floorTo(Math.hypot(afterGauge, beforeGauge, meter, model), 0.1);
  return { halfWidth, afterGauge, beforeGauge, meter, model };
}
