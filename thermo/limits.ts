/**
 * The temperature limits of the core and of the tank check, exported once: the engine, the
 * app's fields and the backup validation all read them from here.
 */

/** Highest temperature the core's property functions take, K. */
export const T_MODEL_MAX_K = 600;

/**
 * Temperatures the tank check takes, K: liquid and peak temperatures, and the top of every
 * search (liquid-full, relief, saturation temperature). Each product's own floor (its triple
 * point) may lie above `min`: see `checkMinTemperature`.
 */
export const T_CHECK_MIN_K = 150;
export const T_CHECK_MAX_K = 400;

/** How far above a product's lowest model temperature (its triple point) the check starts, K. */
export const T_CHECK_TRIPLE_MARGIN_K = 0.01;

/**
 * Lowest temperature the tank check takes for a product whose model starts at `productTmin`
 * (its triple point, or the highest of a blend's), K.
 */
export function checkMinTemperature(productTmin: number): number {
  return Math.max(productTmin + T_CHECK_TRIPLE_MARGIN_K, T_CHECK_MIN_K);
}
