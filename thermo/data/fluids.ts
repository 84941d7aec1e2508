/**
 * Pure-fluid constants: molar mass, critical point, acentric factor, triple point, critical
 * density and Rackett factor. Every figure is the primary value of the project's compiled
 * constants (figures read from the data files of the reference equations of state, see
 * `sources.ts`, key in `source`). The critical point and acentric factor are those stated with
 * each fluid's reference equation of state, so the cubic models share their critical point.
 *
 * Units: molarMass kg/mol, Tc K, pc Pa, rhoc kg/m³, Ttriple K, Tb K (normal boiling point).
 */

export interface FluidConstants {
  /** API id, e.g. `propane`, `r134a`. */
  readonly id: string;
  /** Display name. */
  readonly name: string;
  readonly formula: string;
  readonly cas: string;
  /** kg/mol */
  readonly molarMass: number;
  /** K */
  readonly Tc: number;
  /** Pa */
  readonly pc: number;
  /** Acentric factor, dimensionless. */
  readonly omega: number;
  /** Critical density, kg/m³. */
  readonly rhoc: number;
  /** Triple-point temperature, K: the lowest temperature the API accepts. */
  readonly Ttriple: number;
  /** Normal boiling point, K (null for CO2: its triple point lies above 1 atm). */
  readonly Tb: number | null;
  /** Rackett compressibility Z_RA (Hankinson & Thomson 1979 table), null where none. */
  readonly zRA: number | null;
  /** Key into `SOURCES` for the reference equation of state these constants belong to. */
  readonly source: string;
}

export const FLUIDS: readonly FluidConstants[] = [
  { id: 'propane', name: 'Propane', formula: 'C3H8', cas: '74-98-6', molarMass: 0.04409562, Tc: 369.89, pc: 4251200, omega: 0.1521, rhoc: 220.478, Ttriple: 85.525, Tb: 231.036, zRA: 0.2766, source: 'Lemmon-JCED-2009' },
  { id: 'n-butane', name: 'n-butane', formula: 'C4H10', cas: '106-97-8', molarMass: 0.0581222, Tc: 425.125, pc: 3796000, omega: 0.20081, rhoc: 228, Ttriple: 134.895, Tb: 272.66, zRA: 0.273, source: 'Buecker-JPCRD-2006B' },
  { id: 'isobutane', name: 'Isobutane', formula: 'C4H10', cas: '75-28-5', molarMass: 0.0581222, Tc: 407.817, pc: 3629000, omega: 0.183532, rhoc: 225.5, Ttriple: 113.73, Tb: 261.401, zRA: 0.2754, source: 'Buecker-JPCRD-2006B' },
  { id: 'propylene', name: 'Propylene', formula: 'C3H6', cas: '115-07-1', molarMass: 0.04207974, Tc: 364.211, pc: 4555000, omega: 0.146, rhoc: 229.629, Ttriple: 87.953, Tb: 225.531, zRA: 0.2779, source: 'Lemmon-PROPYLENE-2013' },
  { id: 'ethane', name: 'Ethane', formula: 'C2H6', cas: '74-84-0', molarMass: 0.03006904, Tc: 305.322, pc: 4872200, omega: 0.099, rhoc: 206.18, Ttriple: 90.368, Tb: 184.569, zRA: 0.2808, source: 'Buecker-JPCRD-2006' },
  { id: 'ammonia', name: 'Ammonia', formula: 'H3N', cas: '7664-41-7', molarMass: 0.01703052, Tc: 405.56, pc: 11363391, omega: 0.255691, rhoc: 233.25, Ttriple: 195.49, Tb: 239.834, zRA: 0.2465, source: 'Gao-JPCRD-2020' },
  { id: 'carbon-dioxide', name: 'Carbon dioxide', formula: 'CO2', cas: '124-38-9', molarMass: 0.0440098, Tc: 304.1282, pc: 7377300, omega: 0.22394, rhoc: 467.6, Ttriple: 216.592, Tb: null, zRA: 0.2722, source: 'Span-JPCRD-1996' },
  { id: 'dimethyl-ether', name: 'Dimethyl ether', formula: 'C2H6O', cas: '115-10-6', molarMass: 0.04606844, Tc: 400.378, pc: 5336800, omega: 0.196, rhoc: 273.647, Ttriple: 131.66, Tb: 248.368, zRA: null, source: 'Wu-JPCRD-2011' },
  { id: 'r134a', name: 'R-134a', formula: 'C2H2F4', cas: '811-97-2', molarMass: 0.102032, Tc: 374.21, pc: 4059280, omega: 0.32684, rhoc: 511.9, Ttriple: 169.85, Tb: 247.076, zRA: null, source: 'TillnerRoth-JPCRD-1994' },
  { id: 'r32', name: 'R-32', formula: 'CH2F2', cas: '75-10-5', molarMass: 0.052024, Tc: 351.255, pc: 5782000, omega: 0.2769, rhoc: 424, Ttriple: 136.34, Tb: 221.499, zRA: null, source: 'TillnerRoth-JPCRD-1997' },
  { id: 'r125', name: 'R-125', formula: 'C2HF5', cas: '354-33-6', molarMass: 0.1200214, Tc: 339.173, pc: 3617700, omega: 0.3052, rhoc: 573.582, Ttriple: 172.52, Tb: 225.061, zRA: null, source: 'Lemmon-JPCRD-2005' },
  { id: 'r143a', name: 'R-143a', formula: 'C2H3F3', cas: '420-46-2', molarMass: 0.084041, Tc: 345.857, pc: 3761000, omega: 0.26149, rhoc: 431, Ttriple: 161.34, Tb: 225.909, zRA: null, source: 'LemmonJacobsen-JPCRD-2000' },
  { id: 'r1234yf', name: 'R-1234yf', formula: 'C3H2F4', cas: '754-12-1', molarMass: 0.1140416, Tc: 367.85, pc: 3384400, omega: 0.276, rhoc: 476.694, Ttriple: 121.6, Tb: 243.692, zRA: null, source: 'Lemmon-IJT-2022' },
  { id: 'r1234ze-e', name: 'R-1234ze(E)', formula: 'C3H2F4', cas: '29118-24-9', molarMass: 0.11404159, Tc: 382.52, pc: 3635376.3, omega: 0.313122, rhoc: 489.238, Ttriple: 168.62, Tb: 254.177, zRA: null, source: 'Thol-IJT-2016-R1234zeE' },
  { id: 'r22', name: 'R-22', formula: 'CHClF2', cas: '75-45-6', molarMass: 0.086468, Tc: 369.295, pc: 4990000, omega: 0.22082, rhoc: 523.842, Ttriple: 115.73, Tb: 232.34, zRA: 0.2663, source: 'Kamei-IJT-1995' },
  { id: 'nitrous-oxide', name: 'Nitrous oxide', formula: 'N2O', cas: '10024-97-2', molarMass: 0.0440128, Tc: 309.52, pc: 7245000, omega: 0.1613, rhoc: 452.011, Ttriple: 182.33, Tb: 184.684, zRA: 0.2758, source: 'Lemmon-JCED-2006' },
  { id: 'sulfur-dioxide', name: 'Sulfur dioxide', formula: 'O2S', cas: '7446-09-5', molarMass: 0.0640638, Tc: 430.64, pc: 7886587.6, omega: 0.25613, rhoc: 525.003, Ttriple: 197.7, Tb: 263.137, zRA: 0.2661, source: 'Gao-JCED-2016' },
  { id: 'chlorine', name: 'Chlorine', formula: 'Cl2', cas: '7782-50-5', molarMass: 0.070906, Tc: 416.8654, pc: 7642387.5, omega: 0.07, rhoc: 571.502, Ttriple: 172.171, Tb: 239.198, zRA: 0.2767, source: 'Thol-AICHE-2021' },
  { id: '1-butene', name: '1-butene', formula: 'C4H8', cas: '106-98-9', molarMass: 0.05610632, Tc: 419.29, pc: 4005100, omega: 0.191861, rhoc: 237.891, Ttriple: 87.8, Tb: 266.844, zRA: 0.2736, source: 'Lemmon-FPE-2005' },
  { id: 'isobutene', name: 'Isobutene', formula: 'C4H8', cas: '115-11-7', molarMass: 0.05610632, Tc: 418.09, pc: 4009800, omega: 0.192593, rhoc: 233.963, Ttriple: 132.4, Tb: 266.146, zRA: 0.2728, source: 'Lemmon-FPE-2005' },
  { id: 'n-pentane', name: 'n-pentane', formula: 'C5H12', cas: '109-66-0', molarMass: 0.07214878, Tc: 469.7, pc: 3367519, omega: 0.251032, rhoc: 232, Ttriple: 143.47, Tb: 309.209, zRA: 0.2684, source: 'Thol-FPE-2019-alkanes-pentane' },
];

const BY_ID = new Map(FLUIDS.map((f) => [f.id, f]));

/** The constants of a listed fluid, or undefined. */
export function fluidById(id: string): FluidConstants | undefined {
  return BY_ID.get(id);
}
