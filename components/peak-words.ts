/**
 * The peak pressure and the figure its headrooms are measured from, in words.
 *
 * The engine raises the peak by the model's allowance before it takes the headroom to design
 * and relief (thermo/rules/allowance.ts): 0.5 % of the absolute pressure while two-phase, 10 %
 * when the tank is liquid-full or full of dense fluid. `PeakResult.pGaugeUpper` is that raised
 * figure. Wherever a peak and a headroom appear together the raised figure is shown beside the
 * peak when the two differ once rounded up for display, so "peak", "up to" and "to design" add up;
 * when they round to the same figure the headroom already reconciles with the peak shown.
 */
import type { TankPhase } from '../thermo/check/types.js';
import type { DisplayUnits } from './display.js';

/** A peak pressure with its raised figure, all Pa gauge; the allowance as a fraction. */
export interface UpperPeak {
  peak: number;
  /** The peak raised by the model's allowance, or undefined for a record saved before it. */
  upper: number | undefined;
  /** Fraction the absolute peak pressure was raised by, or undefined for an old record. */
  allowance: number | undefined;
  /** Phase state at the peak (says why the allowance is large). */
  phase: TankPhase | undefined;
}

/** "10 % when liquid-full", "10 % when full of dense fluid" or "0.5 %". */
export function allowanceText(allowance: number, phase: TankPhase | undefined): string {
  const pct = `${Number((allowance * 100).toFixed(1))} %`;
  if (allowance < 0.05) return pct;
  if (phase === 'supercritical') return `${pct} when full of dense fluid`;
  return `${pct} when liquid-full`;
}

/** True when the raised figure shows as a different number from the peak (both rounded up). */
export function upperDiffers(u: UpperPeak, d: DisplayUnits): boolean {
  return (
    u.upper !== undefined &&
    d.format('gaugePressure', u.upper, 'up') !== d.format('gaugePressure', u.peak, 'up')
  );
}

/** "up to 1788 psig allowing for the model's uncertainty (10 % when liquid-full)". */
export function upperSentence(u: UpperPeak, d: DisplayUnits): string {
  if (u.upper === undefined) return '';
  const why = u.allowance === undefined ? '' : ` (${allowanceText(u.allowance, u.phase)})`;
  return `up to ${d.format('gaugePressure', u.upper, 'up')} allowing for the model's uncertainty${why}`;
}

/** The board's short form: "Up to 1788 psig allowing 10 % for model error". */
export function upperShort(u: UpperPeak, d: DisplayUnits): string {
  if (u.upper === undefined) return '';
  const pct = u.allowance === undefined ? '' : ` ${Number((u.allowance * 100).toFixed(1))} %`;
  return `Up to ${d.format('gaugePressure', u.upper, 'up')} allowing${pct} for model error`;
}
