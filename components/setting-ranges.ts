/** Ranges of the settings, SI. */
export const SETTING_RANGES = {
  baroPressure: { min: 20_000, max: 120_000 },
  elevation: { min: -500, max: 11_000 },
  /** Fraction of full scale. */
  gaugeAccuracy: { min: 0, max: 0.2 },
  gaugeFullScaleGauge: { min: 1e4, max: 1e8 },
  thermometerTolerance: { min: 0, max: 10 },
  sunAllowance: { min: 0, max: 40 },
  /** Days after which readings no longer count on the site board. */
  staleReadingDays: { min: 1, max: 365 },
} as const;
