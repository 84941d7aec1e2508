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
import { CAUSE_TEXT } from './caution-text.js';
import type { CauseCode } from './codes.js';
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
  const x = (pAbs - s4.pAbs) / (s3.pAbs - s4.pAbs);
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
  const reading = c.pressureReadingGauge!;
  const expected = now.pAbs - c.baro;
  const difference = reading - expected;
  const tolerance = c.accuracy * c.fullScaleGauge + MODEL_ALLOWANCE.vapourPressure * now.pAbs;
  const verdict: DiagnosisResult['verdict'] =
    difference > tolerance ? 'high' : difference < -tolerance ? 'low' : 'fits';
  const readingAbs = reading + c.baro;
  const causeCodes: CauseCode[] = [];
  // A zeotropic blend's composition can shift (vapour withdrawal, leak, recovered vapour).
  const shift = compositionShiftCauses(model.product, c.T, verdict)[0] ?? null;
  if (verdict === 'high') {
    if (now.phase === 'liquid-full') causeCodes.push('liquid-full-high');
    causeCodes.push('non-condensable');
    if (shift) causeCodes.push('composition-shift-high');
    causeCodes.push('lighter-components', 'different-product', 'liquid-warmer', 'gauge-error-high');
  } else if (verdict === 'low') {
    if (now.phase === 'liquid-full') causeCodes.push('liquid-full-uncertain');
    if (now.phase === 'vapour-only' || now.lf < 0.02) causeCodes.push('no-liquid-left');
    causeCodes.push('liquid-colder');
    if (shift) causeCodes.push('composition-shift-low');
    causeCodes.push('heavier-components', 'different-product', 'vapour-draw', 'gauge-error-low');
  }
  const temperatureForReading =
    readingAbs > 0 ? saturationTemperature(model, readingAbs, [c.T, c.Tpeak], Tlo) : null;
  return {
    readingGauge: reading,
    expectedGauge: expected,
    difference,
    tolerance,
    verdict,
    causes: causeCodes.map(
      (code) => (code.startsWith('composition-shift') && shift) || CAUSE_TEXT[code],
    ),
    causeCodes,
    propaneFraction: lpGas && readingAbs > 0 ? propaneSplit(c.T, readingAbs) : null,
    temperatureForReading,
  };
}
