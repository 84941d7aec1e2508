/**
 * Does the gauge pressure fit the product at the entered liquid temperature? The expected
 * pressure is the model's; the band is the gauge's accuracy (fraction of full scale, default
 * ±2 %) plus the model's vapour-pressure allowance. Outside the band, likely causes in words
 * (trade knowledge, common practice), and for LP-gas the propane/n-butane split that would
 * give the reading.
 *
 * Split estimate (ideal solution, Raoult's law): p = x·p°(propane) + (1 − x)·p°(n-butane) with
 * the pure-fluid vapour pressures from the core at the entered temperature, so
 * x = (p − p°C4)/(p°C3 − p°C4). Propane and n-butane mix nearly ideally; the estimate is
 * checked against reference bubble pressures in the tests.
 */
import { MODEL_ALLOWANCE } from '../rules/allowance.js';
import { compositionShiftCauses } from './blendShift.js';
import { ProductModel, type State } from './model.js';
import { saturationTemperature } from './search.js';
import type { DiagnosisResult } from './types.js';
import type { CleanInput } from './validate.js';

let propane: ProductModel | undefined;
let butane: ProductModel | undefined;

/** Propane mole fraction of a propane/n-butane liquid whose vapour pressure at T equals pAbs (clamped to 0…1 within 0.02 of an end), or null outside. */
export function propaneSplit(T: number, pAbs: number): number | null {
  propane ??= new ProductModel('propane');
  butane ??= new ProductModel('n-butane');
  const s3 = propane.sat(T);
  const s4 = butane.sat(T);
  if (!s3 || !s4) return null;
  const x = (pAbs - s4.p) / (s3.p - s4.p);
  // Within 2 points of an end the reading fits the pure fluid at that end (gauge and model error).
  if (x > 1 && x <= 1.02) return 1;
  if (x < 0 && x >= -0.02) return 0;
  return x >= 0 && x <= 1 ? x : null;
}

export function diagnose(
  model: ProductModel,
  c: CleanInput,
  now: State,
  lpGas: boolean,
  Tlo: number,
): DiagnosisResult {
  const reading = c.gaugePressure!;
  const expected = now.pAbs - c.baro;
  const difference = reading - expected;
  const tolerance = c.accuracy * c.fullScale + MODEL_ALLOWANCE.vapourPressure * now.pAbs;
  const verdict: DiagnosisResult['verdict'] =
    difference > tolerance ? 'high' : difference < -tolerance ? 'low' : 'fits';
  const readingAbs = reading + c.baro;
  const causes: string[] = [];
  if (verdict === 'high') {
    if (now.phase === 'liquid-full')
      causes.push(
        'The tank is liquid-full: with no vapour space the pressure climbs steeply with temperature.',
      );
    causes.push(
      'Air or another non-condensable gas in the vapour space (for example a new or opened tank that was not purged).',
    );
    causes.push(...compositionShiftCauses(model.product, c.T, verdict));
    causes.push(
      'Lighter components than the product entered (for example ethane or propane in butane).',
    );
    causes.push('A different product from the one entered.');
    causes.push(
      'The liquid is warmer than the thermometer shows (sun on the shell, or a thermometer reading the air).',
    );
    causes.push('Gauge error: a zero offset, a damaged gauge or one of the wrong range.');
  } else if (verdict === 'low') {
    if (now.phase === 'liquid-full')
      causes.push(
        'The tank is liquid-full: its pressure then depends steeply on the exact fill and temperature, so the expected figure is uncertain.',
      );
    if (now.phase === 'vapour-only' || now.lf < 0.02)
      causes.push(
        'There may be no liquid left: a tank holding vapour only shows less than the vapour pressure.',
      );
    causes.push(
      'The liquid is colder than the thermometer shows (a recent withdrawal or venting chills the liquid).',
    );
    causes.push(...compositionShiftCauses(model.product, c.T, verdict));
    causes.push('Heavier components than the product entered (for example butane in propane).');
    causes.push('A different product from the one entered.');
    causes.push(
      'Vapour being drawn off faster than the liquid boils, pulling the pressure down for a while.',
    );
    causes.push('Gauge error: a zero offset, a blocked or damaged gauge.');
  }
  const temperatureForReading =
    readingAbs > 0 ? saturationTemperature(model, readingAbs, [c.T, c.Tpeak], Tlo) : null;
  return {
    reading,
    expected,
    difference,
    tolerance,
    verdict,
    causes,
    propaneFraction: lpGas && readingAbs > 0 ? propaneSplit(c.T, readingAbs) : null,
    temperatureForReading,
  };
}
