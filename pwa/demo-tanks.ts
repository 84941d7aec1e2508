/**
 * The invented demo tanks as data, in the units the scenario was written in (°F, psig, US gal
 * or L, lb). `demoSpec()` turns a row into SI once, through thermo/units.ts.
 *
 * These figures are a scenario of our own. They are not taken from any real tank and are not
 * used as check values in any test.
 */
import { toSI, type VolumeUnit } from '../thermo/units.js';
import type { ContentsMode, Readings } from '../components/types.js';
import type { TankInput } from '../thermo/check/types.js';

/** One invented tank; pressures in psig, temperatures in °F, masses in lb. */
export interface DemoRow {
  key: string;
  /** Which invented site: the gas yard (default) or the refrigeration van. */
  van?: true;
  name: string;
  productId: string;
  capacity: [number, VolumeUnit];
  designPsig: number;
  reliefPsig?: number;
  placement?: TankInput['placement'];
  containerClass: NonNullable<TankInput['containerClass']>;
  fillMethod?: TankInput['fillMethod'];
  recovery?: TankInput['recovery'];
  liquidF: number;
  contents: ContentsMode;
  gaugePercent?: number;
  netMassLb?: number;
  gaugePsig?: number;
  peakAirF: number;
  notes: string;
}

// prettier-ignore
export const DEMO_TANKS: readonly DemoRow[] = [
  { key: 'lpg-home', name: 'Demo: small home tank', productId: 'propane',
    capacity: [500, 'usgal'], designPsig: 250, placement: 'aboveground', containerClass: 'storage',
    liquidF: 64, contents: 'gaugePercent', gaugePercent: 58, peakAirF: 93,
    notes: 'Invented for the demo. Behind the imaginary barn.' },
  { key: 'lpg-bulk', name: 'Demo: large bulk tank', productId: 'preset:commercial-propane',
    capacity: [30_000, 'usgal'], designPsig: 250, placement: 'aboveground', containerClass: 'storage',
    liquidF: 77, contents: 'gaugePercent', gaugePercent: 71, gaugePsig: 142, peakAirF: 101,
    notes: 'Invented for the demo. Plant yard that does not exist.' },
  { key: 'butane', name: 'Demo: butane tank', productId: 'preset:commercial-butane',
    capacity: [1_000, 'usgal'], designPsig: 125, placement: 'aboveground', containerClass: 'storage',
    liquidF: 59, contents: 'gaugePercent', gaugePercent: 63, peakAirF: 88,
    notes: 'Invented for the demo.' },
  { key: 'nh3-nurse', name: 'Demo: ammonia nurse tank', productId: 'ammonia',
    capacity: [1_000, 'usgal'], designPsig: 250, placement: 'aboveground', containerClass: 'cargo',
    fillMethod: 'gauge',
    liquidF: 72, contents: 'gaugePercent', gaugePercent: 79, peakAirF: 96,
    notes: 'Invented for the demo. Parked at the end of a field that is not there.' },
  { key: 'refrigerant', name: 'Demo: refrigerant cylinder', productId: 'r134a',
    capacity: [12, 'L'], designPsig: 260, containerClass: 'cylinder',
    liquidF: 75, contents: 'netMass', netMassLb: 21, peakAirF: 97,
    notes: 'Invented for the demo. On an imaginary service van.' },
  { key: 'r410a-recovery', van: true, name: 'Demo: R-410A recovery cylinder', productId: 'r410a',
    capacity: [6, 'usgal'], designPsig: 400, containerClass: 'cylinder',
    recovery: { fillFraction: 0.8 },
    liquidF: 82, contents: 'netMass', netMassLb: 38, gaugePsig: 262, peakAirF: 120,
    notes: 'Invented for the demo. Behind the seat of a van that does not exist.' },
  { key: 'r454b', van: true, name: 'Demo: R-454B cylinder', productId: 'r454b',
    capacity: [24, 'L'], designPsig: 400, containerClass: 'cylinder',
    liquidF: 70, contents: 'netMass', netMassLb: 42, peakAirF: 104,
    notes: 'Invented for the demo. On an imaginary van shelf.' },
  { key: 'co2', name: 'Demo: CO2 cylinder', productId: 'carbon-dioxide',
    capacity: [34, 'L'], designPsig: 1_800, reliefPsig: 3_000, containerClass: 'cylinder',
    liquidF: 70, contents: 'netMass', netMassLb: 44, peakAirF: 92,
    notes: 'Invented for the demo. In a make-believe cellar.' },
];

/** A demo tank's nameplate and readings in SI. */
export interface DemoSpec {
  key: string;
  van: boolean;
  name: string;
  productId: string;
  nameplate: TankInput;
  readings: Partial<Readings>;
  notes: string;
}

const F = (x: number) => toSI('temperature', x, 'F');
const psig = (x: number) => toSI('gaugePressure', x, 'psig');
const lb = (x: number) => toSI('mass', x, 'lb');

/** The row in SI; optional figures stay absent when the row has none. */
export function demoSpec(row: DemoRow): DemoSpec {
  const nameplate: TankInput = {
    waterCapacity: toSI('volume', row.capacity[0], row.capacity[1]),
    designPressureGauge: psig(row.designPsig),
    ...(row.reliefPsig !== undefined ? { reliefSetPressureGauge: psig(row.reliefPsig) } : {}),
    ...(row.placement ? { placement: row.placement } : {}),
    containerClass: row.containerClass,
    ...(row.fillMethod ? { fillMethod: row.fillMethod } : {}),
    ...(row.recovery ? { recovery: row.recovery } : {}),
  };
  const readings: Partial<Readings> = {
    liquidTemperature: F(row.liquidF),
    contentsMode: row.contents,
    ...(row.gaugePercent !== undefined ? { gaugePercent: row.gaugePercent } : {}),
    ...(row.netMassLb !== undefined ? { netMass: lb(row.netMassLb) } : {}),
    ...(row.gaugePsig !== undefined ? { pressureReadingGauge: psig(row.gaugePsig) } : {}),
    peakAirTemperature: F(row.peakAirF),
  };
  return {
    key: row.key,
    van: row.van === true,
    name: row.name,
    productId: row.productId,
    nameplate,
    readings,
    notes: row.notes,
  };
}
