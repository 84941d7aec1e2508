/**
 * The one place that converts user units to and from SI. Everything else in thermo/ and the
 * app works in SI: K, Pa (absolute unless the name says gauge), kg, m³, m, kg/m³.
 *
 * Gauge pressure: p_gauge = p_abs − p_baro, with p_baro the site barometric pressure
 * (default: the standard atmosphere, 101 325 Pa). Pass the site value (or derive it from the
 * elevation with `barometricPressureAtElevation`) so psig and psia agree at altitude.
 *
 * Exact conversion factors (by definition):
 *   1 lb = 0.45359237 kg; 1 in = 0.0254 m; 1 ft = 0.3048 m;
 *   1 US gal = 231 in³ = 3.785411784 L; 1 imperial gal = 4.54609 L;
 *   1 psi = 1 lbf/in² = 0.45359237 · 9.80665 / 0.0254² Pa = 6894.757293168… Pa;
 *   1 bar = 100 000 Pa; 1 atm = 101 325 Pa; T(K) = (T(°F) − 32)·5/9 + 273.15.
 * Sources: NIST SP 811 (2008), Appendix B; ISO 80000-1.
 */
import { P_ATM_Pa } from './constants.js';
import { InputError } from './errors.js';

export const LB_KG = 0.45359237;
export const IN_M = 0.0254;
export const FT_M = 0.3048;
export const US_GAL_M3 = 3.785411784e-3;
export const IMP_GAL_M3 = 4.54609e-3;
export const STANDARD_GRAVITY = 9.80665;
export const PSI_PA = (LB_KG * STANDARD_GRAVITY) / (IN_M * IN_M);

/** Unit ids accepted for each quantity. */
export interface UnitIds {
  /** Absolute pressure in SI (Pa); every pressure unit is accepted, gauge ones via the barometer. */
  pressure: PressureUnit;
  /** Gauge pressure in SI (Pa gauge); every pressure unit is accepted, absolute ones via the barometer. */
  gaugePressure: PressureUnit;
  /** A pressure difference (headroom, tolerance), Pa. */
  pressureDifference: PressureDifferenceUnit;
  /** Temperature, K. */
  temperature: TemperatureUnit;
  /** Temperature difference (a sun allowance), K. */
  temperatureDifference: TemperatureDifferenceUnit;
  /** Volume, m³. */
  volume: VolumeUnit;
  /** Mass, kg. */
  mass: MassUnit;
  /** Density, kg/m³. */
  density: DensityUnit;
  /** Length (level height, tank dimensions, elevation), m. */
  length: LengthUnit;
  /** A share of something: SI value is a fraction 0…1. */
  fraction: FractionUnit;
}
export type Quantity = keyof UnitIds;

export type PressureUnit =
  'psig' | 'psia' | 'barg' | 'bara' | 'kPag' | 'kPaa' | 'MPag' | 'MPaa' | 'Pa';
export type PressureDifferenceUnit = 'psi' | 'bar' | 'kPa' | 'MPa' | 'Pa';
export type TemperatureUnit = 'F' | 'C' | 'K';
export type TemperatureDifferenceUnit = 'F' | 'C' | 'K';
export type VolumeUnit = 'usgal' | 'impgal' | 'L' | 'm3' | 'ft3';
export type MassUnit = 'lb' | 'kg' | 't';
export type DensityUnit = 'kg/m3' | 'kg/L' | 'lb/usgal' | 'lb/ft3';
export type LengthUnit = 'm' | 'cm' | 'mm' | 'in' | 'ft';
export type FractionUnit = 'percent' | 'fraction';

export interface UnitInfo {
  id: string;
  /** Short label for display, e.g. `psig`, `bar g`, `°F`, `US gal`. */
  label: string;
}

/** Every unit of every quantity with its display label, in the order an app should offer them. */
export const UNITS: { readonly [Q in Quantity]: readonly (UnitInfo & { id: UnitIds[Q] })[] } = {
  pressure: pressureUnits(),
  gaugePressure: pressureUnits(),
  pressureDifference: [
    { id: 'psi', label: 'psi' },
    { id: 'bar', label: 'bar' },
    { id: 'kPa', label: 'kPa' },
    { id: 'MPa', label: 'MPa' },
    { id: 'Pa', label: 'Pa' },
  ],
  temperature: [
    { id: 'F', label: '°F' },
    { id: 'C', label: '°C' },
    { id: 'K', label: 'K' },
  ],
  temperatureDifference: [
    { id: 'F', label: '°F' },
    { id: 'C', label: '°C' },
    { id: 'K', label: 'K' },
  ],
  volume: [
    { id: 'usgal', label: 'US gal' },
    { id: 'impgal', label: 'imp gal' },
    { id: 'L', label: 'L' },
    { id: 'm3', label: 'm³' },
    { id: 'ft3', label: 'ft³' },
  ],
  mass: [
    { id: 'lb', label: 'lb' },
    { id: 'kg', label: 'kg' },
    { id: 't', label: 't' },
  ],
  density: [
    { id: 'kg/m3', label: 'kg/m³' },
    { id: 'kg/L', label: 'kg/L' },
    { id: 'lb/usgal', label: 'lb/US gal' },
    { id: 'lb/ft3', label: 'lb/ft³' },
  ],
  length: [
    { id: 'in', label: 'in' },
    { id: 'ft', label: 'ft' },
    { id: 'mm', label: 'mm' },
    { id: 'cm', label: 'cm' },
    { id: 'm', label: 'm' },
  ],
  fraction: [
    { id: 'percent', label: '%' },
    { id: 'fraction', label: '' },
  ],
};

function pressureUnits(): readonly (UnitInfo & { id: PressureUnit })[] {
  return [
    { id: 'psig', label: 'psig' },
    { id: 'psia', label: 'psia' },
    { id: 'barg', label: 'bar g' },
    { id: 'bara', label: 'bar a' },
    { id: 'kPag', label: 'kPa g' },
    { id: 'kPaa', label: 'kPa a' },
    { id: 'MPag', label: 'MPa g' },
    { id: 'MPaa', label: 'MPa a' },
    { id: 'Pa', label: 'Pa a' },
  ];
}

/** Options of a conversion. */
export interface ConvertOptions {
  /** Site barometric pressure, Pa absolute (default 101 325 Pa). Used only across gauge/absolute. */
  barometricPressureAbs?: number;
}

/** Pressure units: scale to Pa and whether the value is gauge. */
const PRESSURE: Record<PressureUnit, { scale: number; gauge: boolean }> = {
  psig: { scale: PSI_PA, gauge: true },
  psia: { scale: PSI_PA, gauge: false },
  barg: { scale: 1e5, gauge: true },
  bara: { scale: 1e5, gauge: false },
  kPag: { scale: 1e3, gauge: true },
  kPaa: { scale: 1e3, gauge: false },
  MPag: { scale: 1e6, gauge: true },
  MPaa: { scale: 1e6, gauge: false },
  Pa: { scale: 1, gauge: false },
};

const LINEAR: {
  [Q in Exclude<Quantity, 'pressure' | 'gaugePressure' | 'temperature'>]: Record<
    UnitIds[Q],
    number
  >;
} = {
  pressureDifference: { psi: PSI_PA, bar: 1e5, kPa: 1e3, MPa: 1e6, Pa: 1 },
  temperatureDifference: { F: 5 / 9, C: 1, K: 1 },
  volume: { usgal: US_GAL_M3, impgal: IMP_GAL_M3, L: 1e-3, m3: 1, ft3: FT_M ** 3 },
  mass: { lb: LB_KG, kg: 1, t: 1000 },
  density: { 'kg/m3': 1, 'kg/L': 1000, 'lb/usgal': LB_KG / US_GAL_M3, 'lb/ft3': LB_KG / FT_M ** 3 },
  length: { m: 1, cm: 0.01, mm: 0.001, in: IN_M, ft: FT_M },
  fraction: { percent: 0.01, fraction: 1 },
};

function baro(options: ConvertOptions | undefined): number {
  const pb = options?.barometricPressureAbs ?? P_ATM_Pa;
  if (typeof pb !== 'number' || !Number.isFinite(pb) || pb < 20_000 || pb > 120_000) {
    throw new InputError('barometricPressureAbs', 'from 20 000 to 120 000 Pa absolute', pb);
  }
  return pb;
}

function unitError(quantity: Quantity, unit: unknown): InputError {
  return new InputError(
    'unit',
    `a ${quantity} unit: ${UNITS[quantity].map((u) => u.id).join(', ')}`,
    unit,
  );
}

/**
 * Converts a value in a user unit to SI: Pa absolute (`pressure`), Pa gauge (`gaugePressure`),
 * Pa (`pressureDifference`), K, K (difference), m³, kg, kg/m³, m, fraction.
 * Throws `InputError` for a non-finite value or an unknown unit; it does not judge ranges.
 */
export function toSI<Q extends Quantity>(
  quantity: Q,
  value: number,
  unit: UnitIds[Q],
  options?: ConvertOptions,
): number {
  if (typeof value !== 'number' || !Number.isFinite(value))
    throw new InputError('value', 'a finite number', value);
  if (quantity === 'pressure' || quantity === 'gaugePressure') {
    const u = PRESSURE[unit as PressureUnit];
    if (!u) throw unitError(quantity, unit);
    const p = value * u.scale;
    if (quantity === 'pressure') return u.gauge ? p + baro(options) : p;
    return u.gauge ? p : p - baro(options);
  }
  if (quantity === 'temperature') {
    if (unit === 'K') return value;
    if (unit === 'C') return value + 273.15;
    if (unit === 'F') return ((value - 32) * 5) / 9 + 273.15;
    throw unitError(quantity, unit);
  }
  const table = LINEAR[quantity as keyof typeof LINEAR] as Record<string, number>;
  const f = table[unit as string];
  if (f === undefined) throw unitError(quantity, unit);
  return value * f;
}

/** Converts an SI value (units as in `toSI`) to a user unit. */
export function fromSI<Q extends Quantity>(
  quantity: Q,
  valueSI: number,
  unit: UnitIds[Q],
  options?: ConvertOptions,
): number {
  if (typeof valueSI !== 'number' || !Number.isFinite(valueSI))
    throw new InputError('value', 'a finite number', valueSI);
  if (quantity === 'pressure' || quantity === 'gaugePressure') {
    const u = PRESSURE[unit as PressureUnit];
    if (!u) throw unitError(quantity, unit);
    let p = valueSI;
    if (quantity === 'pressure' && u.gauge) p -= baro(options);
    if (quantity === 'gaugePressure' && !u.gauge) p += baro(options);
    return p / u.scale;
  }
  if (quantity === 'temperature') {
    if (unit === 'K') return valueSI;
    if (unit === 'C') return valueSI - 273.15;
    if (unit === 'F') return ((valueSI - 273.15) * 9) / 5 + 32;
    throw unitError(quantity, unit);
  }
  const table = LINEAR[quantity as keyof typeof LINEAR] as Record<string, number>;
  const f = table[unit as string];
  if (f === undefined) throw unitError(quantity, unit);
  return valueSI / f;
}

/** Display label of a unit, e.g. `bar g`, `°F`. */
export function unitLabel<Q extends Quantity>(quantity: Q, unit: UnitIds[Q]): string {
  return UNITS[quantity].find((u) => u.id === unit)?.label ?? String(unit);
}

export type Rounding = 'nearest' | 'up' | 'down';

export interface FormatOptions extends ConvertOptions {
  /** Digits after the decimal point (default: chosen from the size of the value, 3 significant figures at least). */
  decimals?: number;
  /**
   * Direction of rounding at the last shown digit. Use `down` for fill limits and room left,
   * `up` for pressures and for quantities where a larger value is the more cautious one.
   */
  round?: Rounding;
  /** Text for a missing value (null, undefined, NaN or infinite); default an en dash. */
  missing?: string;
}

/**
 * A value in SI formatted in a user unit with its label, e.g. `129.3 psig`. Never prints NaN
 * or Infinity: a missing or non-finite value prints `options.missing` (default "–").
 */
export function formatQuantity<Q extends Quantity>(
  quantity: Q,
  valueSI: number | null | undefined,
  unit: UnitIds[Q],
  options: FormatOptions = {},
): string {
  const missing = options.missing ?? '–';
  if (
    valueSI === null ||
    valueSI === undefined ||
    typeof valueSI !== 'number' ||
    !Number.isFinite(valueSI)
  )
    return missing;
  const x = fromSI(quantity, valueSI, unit, options);
  if (!Number.isFinite(x)) return missing;
  const decimals = options.decimals ?? defaultDecimals(x);
  const text = formatNumber(x, decimals, options.round ?? 'nearest');
  const label = unitLabel(quantity, unit);
  if (label === '') return text;
  return label === '%' ? `${text} %` : `${text} ${label}`;
}

function defaultDecimals(x: number): number {
  const a = Math.abs(x);
  if (a >= 100) return a >= 1000 ? 0 : 1;
  if (a >= 10) return 1;
  if (a >= 1) return 2;
  return 3;
}

/** A number rounded to `decimals` places in the given direction, as text (no exponent, no -0). */
export function formatNumber(x: number, decimals: number, round: Rounding = 'nearest'): string {
  if (!Number.isFinite(x)) return '–';
  const d = Math.max(0, Math.min(10, Math.round(decimals)));
  const k = 10 ** d;
  // A tiny nudge keeps 0.1·3 style binary noise from flipping a directed rounding.
  const scaled = x * k;
  const eps = 1e-9 * Math.max(1, Math.abs(scaled));
  let r: number;
  if (round === 'up') r = Math.ceil(scaled - eps);
  else if (round === 'down') r = Math.floor(scaled + eps);
  else r = Math.round(scaled);
  const v = r / k;
  const text = (Object.is(v, -0) ? 0 : v).toFixed(d);
  return text === `-${(0).toFixed(d)}` ? (0).toFixed(d) : text;
}

/**
 * Barometric pressure of the standard atmosphere at an elevation, Pa absolute. Troposphere
 * layer of ISO 2533:1975 / US Standard Atmosphere 1976:
 *   p = p0 · (1 − L·H/T0)^(g0·M/(R*·L)),
 * with p0 = 101 325 Pa, T0 = 288.15 K, L = 0.0065 K/m, g0 = 9.80665 m/s², M = 0.0289644 kg/mol,
 * R* = 8.3144598 J/(mol·K) (the 1976 value); H is the geopotential height, taken equal to the
 * elevation (the difference is under 0.03 % in pressure below 5 000 m).
 * Valid from −500 m to 11 000 m. The weather changes the real barometer by a few percent:
 * a site reading is better when there is one.
 */
export function barometricPressureAtElevation(elevation_m: number): number {
  if (
    typeof elevation_m !== 'number' ||
    !Number.isFinite(elevation_m) ||
    elevation_m < -500 ||
    elevation_m > 11_000
  ) {
    throw new InputError('elevation', 'from −500 to 11 000 m', elevation_m);
  }
  const T0 = 288.15;
  const L = 0.0065;
  const exponent = (STANDARD_GRAVITY * 0.0289644) / (8.3144598 * L);
  return P_ATM_Pa * (1 - (L * elevation_m) / T0) ** exponent;
}
