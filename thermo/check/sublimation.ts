/**
 * Carbon dioxide has no liquid below its triple-point pressure (517.96 kPa): liquid vented to
 * the air turns to solid (dry ice) and gas at the sublimation temperature of the pressure it
 * meets, about −78.5 °C at one atmosphere. That temperature, not a boiling point, is how cold a
 * fast-vented CO2 tank's metal can get.
 *
 * Sublimation pressure of Span & Wagner 1996 (sources key 'Span-JPCRD-1996', eq. 3.12):
 *   ln(p_sub/p_t) = (T_t/T)·[a1(1 − T/T_t) + a2(1 − T/T_t)^1.9 + a3(1 − T/T_t)^2.9],
 * valid from the triple point down to about 154 K (0.001 MPa).
 */
import { bracketedRoot } from '../solvers/root.js';
import { CO2_TRIPLE_POINT_PA } from './caution-text.js';

/** CO2 triple-point temperature, K (Span & Wagner 1996). */
export const CO2_TRIPLE_POINT_K = 216.592;
const A1 = -14.740846;
const A2 = 2.4327015;
const A3 = -5.3061778;
/** Lowest temperature the equation is used at, K (about 0.001 MPa). */
const T_LOW_K = 154;

/** Sublimation pressure of CO2 at T (K, at most the triple point), Pa absolute. */
export function co2SublimationPressure(T: number): number {
  const x = 1 - T / CO2_TRIPLE_POINT_K;
  const s = A1 * x + A2 * x ** 1.9 + A3 * x ** 2.9;
  return CO2_TRIPLE_POINT_PA * Math.exp((CO2_TRIPLE_POINT_K / T) * s);
}

/**
 * Temperature at which CO2 sublimes at pAbs (Pa), K; null at or above the triple-point pressure
 * (liquid can exist there) or below the equation's range.
 */
export function co2SublimationTemperature(pAbs: number): number | null {
  if (!(pAbs < CO2_TRIPLE_POINT_PA) || !(pAbs >= co2SublimationPressure(T_LOW_K))) return null;
  const f = (T: number) => Math.log(co2SublimationPressure(T) / pAbs);
  return bracketedRoot(f, T_LOW_K, CO2_TRIPLE_POINT_K, {
    name: 'CO2 sublimation temperature',
    xTol: 1e-6,
  }).x;
}
