/**
 * Default accuracies of the two instruments a fill compares, for when Settings give none.
 * Neither has a source in the project's trade facts; both are marked as such.
 */
export const FILL_ACCURACY_DEFAULTS = {
  /**
   * A float (rotary, slip-tube) gauge is read to about ±3 percentage points of the tank volume:
   * common practice (dials are graduated in 5 % steps over most of the scale, finer only near
   * the fill mark). Each reading, before and after, carries it.
   */
  gaugePoints: 3,
  /**
   * A vehicle-mounted LP-gas delivery meter is held within ±1 % of the delivered volume in
   * service: from memory (the maintenance tolerance of the weights-and-measures code for
   * LP-gas liquid meters, NIST Handbook 44 §3.32, not re-read), marked common practice. A
   * newly proved meter does better; Settings may give the figure of the meter's last proving.
   */
  meterFraction: 0.01,
} as const;

/** What the Settings may hold: the ranges `reconcileFill` accepts. */
export const FILL_ACCURACY_LIMITS = {
  gaugePoints: { min: 0, max: 20 },
  meterFraction: { min: 0, max: 0.1 },
} as const;
