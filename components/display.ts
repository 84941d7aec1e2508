/**
 * The user's display units, bound once from the settings. A thin layer over `thermo/units.ts`
 * (which does every conversion): it only picks which unit each quantity is shown in, so no
 * component ever converts by hand.
 *
 * Gauge and absolute are always explicit: a gauge pressure is labelled psig / bar g / kPa g and
 * an absolute one psia / bar a / kPa a, and a pressure difference (headroom, tolerance) psi /
 * bar / kPa.
 */
import {
  formatNumber,
  formatQuantity,
  fromSI,
  toSI,
  unitLabel,
  barometricPressureAtElevation,
  type Quantity,
  type Rounding,
  type UnitIds,
} from '../thermo/units.js';
import type { Settings, UnitPrefs } from './types.js';
import { P_ATM_Pa } from '../thermo/constants.js';
import { formatDigits, resolveNumberFormat, type NumberFormat } from './number-parse.js';

export type { Quantity, Rounding };

const ABSOLUTE: Record<UnitPrefs['pressure'], UnitIds['pressure']> = {
  psig: 'psia',
  barg: 'bara',
  kPag: 'kPaa',
};
const DIFFERENCE: Record<UnitPrefs['pressure'], UnitIds['pressureDifference']> = {
  psig: 'psi',
  barg: 'bar',
  kPag: 'kPa',
};

/** Shown digits per quantity and unit, chosen for what a field reading needs. */
function decimalsFor(q: Quantity, unit: string): number | undefined {
  switch (q) {
    case 'gaugePressure':
    case 'pressureDifference':
      return unit.startsWith('psi') || unit.startsWith('kPa') ? 0 : 2;
    case 'pressure':
      // Absolute pressures sit near the barometer, where one more digit tells sites apart.
      return unit.startsWith('psi') ? 1 : unit.startsWith('kPa') ? 0 : 3;
    case 'volume':
      return undefined;
    case 'temperature':
    case 'temperatureDifference':
      return 1;
    case 'fraction':
      return 1;
    case 'mass':
      return 1;
    case 'length':
      return unit === 'in' ? 1 : 0;
    default:
      return undefined;
  }
}

/**
 * Precision that fits the instrument: a mass or volume of a thousand units or more is shown
 * whole (no 0.1 lb on a 100,000 lb tank: no scale or gauge on such a tank reads that finely,
 * common practice), and one of a hundred or more to at most one decimal.
 */
export function fitPrecision(q: Quantity, x: number, decimals: number): number {
  if (q !== 'mass' && q !== 'volume') return decimals;
  const a = Math.abs(x);
  if (a >= 1000) return 0;
  if (a >= 100) return Math.min(decimals, 1);
  return decimals;
}

export class DisplayUnits {
  /** Site barometric pressure used across gauge and absolute, Pa absolute. */
  readonly barometricPressureAbs: number;

  /**
   * The user's number format (decimal mark, digit groups). Without one, `format` and `range`
   * write plain `1234.5` and inputs read the browser locale's format.
   */
  readonly numberFormat: NumberFormat | undefined;

  constructor(
    readonly units: UnitPrefs,
    barometricPressureAbs = P_ATM_Pa,
    numberFormat?: NumberFormat,
  ) {
    this.barometricPressureAbs = barometricPressureAbs;
    this.numberFormat = numberFormat;
  }

  static fromSettings(settings: Settings): DisplayUnits {
    return new DisplayUnits(
      settings.units,
      siteBarometricPressure(settings),
      resolveNumberFormat(settings.numberFormat),
    );
  }

  /** The format numbers are typed in: the user's, else the browser locale's. */
  inputFormat(): NumberFormat {
    return this.numberFormat ?? resolveNumberFormat('auto');
  }

  /**
   * Plain `1234.5` text in the user's number format: their decimal mark, and digit groups from
   * 10 000 up (no format set: unchanged; `forInput`: the format numbers are typed in).
   */
  localize(text: string, forInput = false): string {
    const fmt = forInput ? this.inputFormat() : this.numberFormat;
    return fmt ? formatDigits(text, fmt) : text;
  }

  /** The unit id shown for a quantity. */
  unit<Q extends Quantity>(q: Q): UnitIds[Q] {
    const u = this.units;
    const map: { [K in Quantity]: UnitIds[K] } = {
      gaugePressure: u.pressure,
      pressure: ABSOLUTE[u.pressure],
      pressureDifference: DIFFERENCE[u.pressure],
      temperature: u.temperature,
      temperatureDifference: u.temperature,
      volume: u.volume,
      mass: u.mass,
      density: u.mass === 'lb' ? 'lb/usgal' : 'kg/m3',
      length: u.length,
      fraction: 'percent',
    };
    return map[q];
  }

  /** Display label of the unit of a quantity, e.g. `psig`, `°F`, `US gal`. */
  label(q: Quantity): string {
    return unitLabel(q, this.unit(q));
  }

  /** SI → display number. */
  fromSI(q: Quantity, valueSI: number): number {
    return fromSI(q, valueSI, this.unit(q), { barometricPressureAbs: this.barometricPressureAbs });
  }

  /** An absolute pressure (Pa) as a number in the user's gauge unit (psig, bar g, kPa g). */
  gaugeFromAbsolute(pAbsolute: number): number {
    return fromSI('pressure', pAbsolute, this.units.pressure, {
      barometricPressureAbs: this.barometricPressureAbs,
    });
  }

  /** Display number → SI. */
  toSI(q: Quantity, value: number): number {
    return toSI(q, value, this.unit(q), { barometricPressureAbs: this.barometricPressureAbs });
  }

  /**
   * An SI value formatted with its unit. `round` is the direction of rounding at the last shown
   * digit: `down` for limits and room left, `up` for pressures (toward safety).
   */
  format(
    q: Quantity,
    valueSI: number | null | undefined,
    round: Rounding = 'nearest',
    decimals?: number,
  ): string {
    const unit = this.unit(q);
    const text = formatQuantity(q, valueSI, unit, {
      barometricPressureAbs: this.barometricPressureAbs,
      round,
      decimals: decimals ?? this._decimals(q, valueSI),
    });
    if (!this.numberFormat) return text;
    const m = /^(-?\d+(?:\.\d+)?)(.*)$/.exec(text);
    return m ? this.localize(m[1]!) + m[2]! : text;
  }

  /** Shown digits: per quantity and unit, and no finer than the figure's size warrants. */
  private _decimals(q: Quantity, valueSI: number | null | undefined): number | undefined {
    const base = decimalsFor(q, this.unit(q));
    if (valueSI === null || valueSI === undefined || !Number.isFinite(valueSI)) return base;
    const x = this.fromSI(q, valueSI);
    if (base !== undefined) return fitPrecision(q, x, base);
    // Volumes otherwise take formatQuantity's size-based digits; from 100 up, ours.
    return q === 'volume' && Math.abs(x) >= 100 ? fitPrecision(q, x, 1) : undefined;
  }

  /**
   * A valid range in the user's unit, e.g. `from -189.6 to 260.3 °F`, `at least 0 lb`,
   * `above 0 and at most 145038 psia`. Bounds are SI (per `q`); with `q` null they are plain
   * numbers shown with `unitText`. The shown bounds are rounded inward (the lower one up, the
   * upper one down), so a value typed as shown is always one that is accepted.
   */
  range(
    q: Quantity | null,
    min: number | undefined,
    max: number | undefined,
    options: { minExclusive?: boolean; unitText?: string } = {},
  ): string {
    const f = (v: number, round: Rounding) =>
      this.localize(q === null ? String(v) : trimZeros(this.number(q, v, round)));
    const unit = q === null ? (options.unitText ?? '') : this.label(q);
    const u = unit ? ` ${unit}` : '';
    const low =
      min === undefined ? '' : `${options.minExclusive ? 'above' : 'at least'} ${f(min, 'up')}`;
    if (min !== undefined && max !== undefined)
      return options.minExclusive
        ? `${low} and at most ${f(max, 'down')}${u}`
        : `from ${f(min, 'up')} to ${f(max, 'down')}${u}`;
    if (min !== undefined) return `${low}${u}`;
    if (max !== undefined) return `at most ${f(max, 'down')}${u}`;
    return 'a number';
  }

  /** Display number without its unit (for an input's value). */
  number(
    q: Quantity,
    valueSI: number | null | undefined,
    round: Rounding = 'nearest',
    decimals?: number,
  ): string {
    if (valueSI === null || valueSI === undefined || !Number.isFinite(valueSI)) return '';
    const x = this.fromSI(q, valueSI);
    return formatNumber(x, decimals ?? this._decimals(q, valueSI) ?? 3, round);
  }
}

/** The site barometric pressure the settings call for, Pa absolute. Falls back to the standard atmosphere. */
export function siteBarometricPressure(settings: Settings): number {
  const b = settings.barometer;
  try {
    if (b.mode === 'pressure' && Number.isFinite(b.pressureAbs)) return b.pressureAbs;
    if (b.mode === 'elevation' && Number.isFinite(b.elevation))
      return barometricPressureAtElevation(b.elevation);
  } catch {
    // An out-of-range elevation was refused when typed; fall through to the standard value.
  }
  return P_ATM_Pa;
}

/** A plain percent (already 0…100) for display, rounded in the given direction. */
export function formatPercent(
  percent: number | null | undefined,
  round: Rounding = 'nearest',
  decimals = 1,
): string {
  if (percent === null || percent === undefined || !Number.isFinite(percent)) return '–';
  return `${formatNumber(percent, decimals, round)} %`;
}

/** "68.0" → "68", "0.10" → "0.1"; integers are left alone. */
export function trimZeros(text: string): string {
  return text.includes('.') ? text.replace(/\.?0+$/, '') : text;
}
