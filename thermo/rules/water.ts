/**
 * Water densities the trade rules are written in. Two different ones are in use:
 *
 * - Filling density (percent of the container's water weight capacity) uses water weighed in
 *   air at 60 °F: 8.32828 lb per US gal (49 CFR 173.315(a) Note 1; WAC 296-307-40029), which is
 *   also 1 lb of water = 27.737 in³ at 60 °F (49 CFR 173.304a(a)(2) Note 1).
 *   8.32828 lb/US gal × 0.45359237 kg/lb ÷ 3.785411784e-3 m³/US gal = 997.95 kg/m³.
 * - Specific gravity at 60/60 °F divides by the true (vacuum) density of water at 60 °F,
 *   999.016 kg/m³ (from memory: API MPMS 11.1 value; consistent with the published specific
 *   gravities of ASTM D2598 Table 1 for propane 0.5072, isobutane 0.5629, n-butane 0.5842).
 */
import { LB_KG, US_GAL_M3 } from '../units.js';

/** Water weight at 60 °F used by the filling-density rules, kg/m³ (8.32828 lb/US gal, in air). */
export const WATER_FD_KG_M3 = (8.32828 * LB_KG) / US_GAL_M3;

/** True density of water at 60 °F for specific gravity 60/60 °F, kg/m³ (from memory, API MPMS 11.1). */
export const WATER_SG_KG_M3 = 999.016;

/** 1200 US gal in m³: the split between small and large LP-gas containers in Table H-27 and 173.315(b). */
export const GAL_1200_M3 = 1200 * US_GAL_M3;
