/**
 * Stable codes of everything the check says in words: cautions and diagnosis causes. Each comes
 * with typed parameters (SI values with their quantity), so an app can write it in its user's
 * units and words; the engine's own English `message` is only a default for API users.
 */
import type { Quantity, Rounding } from '../units.js';

/** Every caution code the check can emit (an app's message catalogue covers each). */
export const CAUTION_CODES = [
  'liquid-full-now',
  'dense-fluid-now',
  'relief-now',
  'supercritical-now',
  'co2-below-triple-point',
  'vacuum',
  'below-mdmt',
  'autorefrigeration-below-mdmt',
  'over-fill-limit',
  'no-filling-rule',
  'reference-above-critical',
  'liquid-full-at-peak',
  'dense-fluid-at-peak',
  'liquid-full-near-peak',
  'liquid-full-beyond-model',
  'design-at-peak',
  'relief-at-peak',
  'relief-near-at-peak',
  'supercritical-at-peak',
  'small-vapour-space-at-peak',
  'gauge-at-end',
  'empty',
  'pressure-high',
  'pressure-low',
  'shape-capacity-mismatch',
  'relief-assumed',
  'relief-above-design',
  'sg-differs',
  'peak-below-now',
  'blend-bubble-point',
  'site-rule-binds',
  'standing',
] as const;
export type CautionCode = (typeof CAUTION_CODES)[number];

/** Every likely cause the diagnosis can give, most likely first where it applies. */
export const CAUSE_CODES = [
  'liquid-full-high',
  'non-condensable',
  'lighter-components',
  'different-product',
  'liquid-warmer',
  'gauge-error-high',
  'liquid-full-uncertain',
  'no-liquid-left',
  'liquid-colder',
  'heavier-components',
  'vapour-draw',
  'gauge-error-low',
  'composition-shift-high',
  'composition-shift-low',
] as const;
export type CauseCode = (typeof CAUSE_CODES)[number];

/** A number behind a message: SI per `quantity` (a plain number when `quantity` is null). */
export interface MessageNumber {
  value: number;
  quantity: Quantity | null;
  /** Rounding toward safety at the last shown digit. Default `nearest`. */
  round?: Rounding;
}

/** Parameters of a message: numbers with their quantity, or words (names, citations). */
export type MessageParams = Record<string, MessageNumber | string>;

export const num = (
  value: number,
  quantity: Quantity | null,
  round: Rounding = 'nearest',
): MessageNumber => ({ value, quantity, round });
