/**
 * Input checks for `checkTank`. Every failure throws `InputError` naming the dotted field and
 * its valid range. Ranges here are what the check can handle, not what is normal on site:
 * possible-but-odd values pass and become cautions later.
 */
import { InputError } from '../errors.js';
import { P_ATM_Pa } from '../constants.js';
import { T_CHECK_MAX_K, T_CHECK_MIN_K } from '../limits.js';
import type { Quantity } from '../units.js';
import { tankHeight, validateShape } from '../tank/geometry.js';
import { barometricPressureAtElevation } from '../units.js';
import { FILL_METHODS } from '../rules/volumeLimits.js';
import type { ContainerClass, FillMethod, Placement, TankCheckInput } from './types.js';

export interface CleanInput {
  V: number;
  designPressureGauge: number;
  reliefSetPressureGauge: number;
  reliefGiven: boolean;
  placement: Placement;
  insulated: boolean;
  containerClass: ContainerClass;
  fixedDipTube: boolean;
  /** `tank.fillMethod`, or `fixed-gauge` for an older record with `fixedDipTube: true`. */
  fillMethod: FillMethod;
  mdmt: number | null;
  T: number;
  Tpeak: number;
  baro: number;
  pressureReadingGauge: number | null;
  fullScaleGauge: number;
  accuracy: number;
  specificGravity: number | null;
}

/**
 * `x` if it is a finite number from `lo` to `hi` (inclusive); otherwise an `InputError` with
 * `range` as its words and the same bounds as `limits`. `quantity` is what the bounds measure
 * (absent for a plain number such as a percent 0…100).
 */
function num(
  field: string,
  x: unknown,
  lo: number,
  hi: number,
  range: string,
  quantity: Quantity | undefined,
): number {
  if (typeof x !== 'number' || !Number.isFinite(x) || x < lo || x > hi)
    throw new InputError(field, range, x, { min: lo, max: hi, ...(quantity ? { quantity } : {}) });
  return x;
}

function optBool(field: string, x: unknown): boolean {
  if (x === undefined) return false;
  if (typeof x !== 'boolean') throw new InputError(field, 'true or false', x);
  return x;
}

export function validateInput(input: TankCheckInput): CleanInput {
  if (!input || typeof input !== 'object')
    throw new InputError(
      'input',
      'an object { tank, product, liquidTemperature, contents, peakTemperature }',
      input,
    );
  const tank = validateTank(input.tank);
  const site = validateConditions(input);
  const gauge = validateGauge(input, site.baro, tank.designPressureGauge);
  const specificGravity =
    input.specificGravity === undefined
      ? null
      : num(
          'specificGravity',
          input.specificGravity,
          0.2,
          2,
          'from 0.2 to 2 (liquid, 60/60 °F)',
          undefined,
        );

  validateContents(input.contents, input.tank.shape);
  return { ...tank, ...site, ...gauge, specificGravity };
}

type TankPart = Pick<
  CleanInput,
  | 'V'
  | 'designPressureGauge'
  | 'reliefSetPressureGauge'
  | 'reliefGiven'
  | 'placement'
  | 'insulated'
  | 'containerClass'
  | 'fixedDipTube'
  | 'fillMethod'
  | 'mdmt'
>;

/** The tank's nameplate and how it is filled. */
function validateTank(tank: TankCheckInput['tank']): TankPart {
  if (!tank || typeof tank !== 'object')
    throw new InputError('tank', 'an object { waterCapacity, designPressureGauge, … }', tank);
  const V = num(
    'tank.waterCapacity',
    tank.waterCapacity,
    1e-4,
    1e5,
    'from 0.0001 to 100 000 m³',
    'volume',
  );
  const designPressureGauge = num(
    'tank.designPressureGauge',
    tank.designPressureGauge,
    1e4,
    1e8,
    'from 10 000 to 100 000 000 Pa gauge',
    'gaugePressure',
  );
  const reliefGiven = tank.reliefSetPressureGauge !== undefined;
  const reliefSetPressureGauge = reliefGiven
    ? num(
        'tank.reliefSetPressureGauge',
        tank.reliefSetPressureGauge,
        1e4,
        1e8,
        'from 10 000 to 100 000 000 Pa gauge',
        'gaugePressure',
      )
    : designPressureGauge;
  const placement = tank.placement ?? 'aboveground';
  if (placement !== 'aboveground' && placement !== 'underground')
    throw new InputError('tank.placement', "'aboveground' or 'underground'", placement);
  const containerClass = tank.containerClass ?? 'storage';
  if (!['storage', 'cylinder', 'cargo', 'portable'].includes(containerClass)) {
    throw new InputError(
      'tank.containerClass',
      "'storage', 'cylinder', 'cargo' or 'portable'",
      containerClass,
    );
  }
  const insulated = optBool('tank.insulated', tank.insulated);
  const fixedDipTube = optBool('tank.fixedDipTube', tank.fixedDipTube);
  const fillMethod = tank.fillMethod ?? (fixedDipTube ? 'fixed-gauge' : 'gauge');
  if (!FILL_METHODS.includes(fillMethod))
    throw new InputError('tank.fillMethod', "'gauge', 'fixed-gauge' or 'weight'", fillMethod);
  if (tank.shape !== undefined) validateShape(tank.shape, 'tank.shape');
  const mdmt =
    tank.minDesignMetalTemperature === undefined
      ? null
      : num(
          'tank.minDesignMetalTemperature',
          tank.minDesignMetalTemperature,
          73.15,
          373.15,
          'from 73.15 to 373.15 K',
          'temperature',
        );

  return {
    V,
    designPressureGauge,
    reliefSetPressureGauge,
    reliefGiven,
    placement,
    insulated,
    containerClass,
    fixedDipTube,
    fillMethod,
    mdmt,
  };
}

/** Liquid and peak temperatures and the site's barometric pressure (absolute). */
function validateConditions(input: TankCheckInput): Pick<CleanInput, 'T' | 'Tpeak' | 'baro'> {
  const range = `from ${T_CHECK_MIN_K} to ${T_CHECK_MAX_K} K`;
  const T = num(
    'liquidTemperature',
    input.liquidTemperature,
    T_CHECK_MIN_K,
    T_CHECK_MAX_K,
    range,
    'temperature',
  );
  const Tpeak = num(
    'peakTemperature',
    input.peakTemperature,
    T_CHECK_MIN_K,
    T_CHECK_MAX_K,
    range,
    'temperature',
  );

  let baro: number;
  if (input.barometricPressureAbs !== undefined) {
    baro = num(
      'barometricPressureAbs',
      input.barometricPressureAbs,
      20_000,
      120_000,
      'from 20 000 to 120 000 Pa absolute',
      'pressure',
    );
  } else if (input.elevation !== undefined) {
    const z = num('elevation', input.elevation, -500, 11_000, 'from −500 to 11 000 m', 'length');
    baro = barometricPressureAtElevation(z);
  } else baro = P_ATM_Pa;

  return { T, Tpeak, baro };
}

/** The pressure reading (gauge) and the gauge that gave it. */
function validateGauge(
  input: TankCheckInput,
  baro: number,
  designPressureGauge: number,
): Pick<CleanInput, 'pressureReadingGauge' | 'fullScaleGauge' | 'accuracy'> {
  const pressureReadingGauge =
    input.pressureReadingGauge === undefined
      ? null
      : num(
          'pressureReadingGauge',
          input.pressureReadingGauge,
          -baro,
          1e8,
          `from −${Math.round(baro)} Pa (full vacuum at this barometric pressure) to 100 000 000 Pa gauge`,
          'gaugePressure',
        );
  const pg = input.pressureGauge;
  if (pg !== undefined && (pg === null || typeof pg !== 'object'))
    throw new InputError('pressureGauge', 'an object { fullScaleGauge?, accuracy? }', pg);
  const fullScaleGauge =
    pg?.fullScaleGauge === undefined
      ? designPressureGauge
      : num(
          'pressureGauge.fullScaleGauge',
          pg.fullScaleGauge,
          1e4,
          1e8,
          'from 10 000 to 100 000 000 Pa gauge',
          'gaugePressure',
        );
  const accuracy =
    pg?.accuracy === undefined
      ? 0.02
      : num(
          'pressureGauge.accuracy',
          pg.accuracy,
          0,
          0.2,
          'a fraction of full scale from 0 to 0.2',
          'fraction',
        );
  return { pressureReadingGauge, fullScaleGauge, accuracy };
}

/** Exactly one way of reading the contents, in its range. */
function validateContents(c: TankCheckInput['contents'], shape: TankCheckInput['tank']['shape']) {
  if (!c || typeof c !== 'object')
    throw new InputError('contents', 'one of { gaugePercent }, { netMass }, { levelHeight }', c);
  const keys = ['gaugePercent', 'netMass', 'levelHeight'].filter((k) => k in c);
  if (keys.length !== 1)
    throw new InputError(
      'contents',
      'exactly one of { gaugePercent }, { netMass }, { levelHeight }',
      Object.keys(c),
    );
  if ('gaugePercent' in c)
    num('contents.gaugePercent', c.gaugePercent, 0, 100, 'a percent from 0 to 100', undefined);
  if ('netMass' in c)
    num('contents.netMass', c.netMass, 0, 1e8, 'from 0 to 100 000 000 kg', 'mass');
  if ('levelHeight' in c) {
    if (shape === undefined)
      throw new InputError(
        'tank.shape',
        'given when contents.levelHeight is used (the level needs the tank shape)',
        undefined,
      );
    const h = c.levelHeight;
    if (typeof h !== 'number' || !Number.isFinite(h) || h < 0 || h > 1e3) {
      // The limits give the range the whole check takes, up to this tank's inside height
      // (checkTank refuses a level above it), as the words say.
      throw new InputError('contents.levelHeight', 'from 0 m to the inside height of the tank', h, {
        min: 0,
        max: tankHeight(shape),
        quantity: 'length',
      });
    }
  }
}
