/**
 * The demo sites shown on first start: plainly invented tanks at two invented sites (an LP-gas
 * and gas yard, and a refrigeration van with an R-410A recovery cylinder and an R-454B cylinder), each
 * with invented readings, so a new user sees real results at once. Every name says it is a
 * demo; every record is marked `demo: true`. Clearing them asks once and can be undone; a demo tank
 * the user edits or saves a check on becomes theirs and is never cleared (pwa/demo-own.ts).
 *
 * These figures are a scenario of our own. They are not taken from any real tank and are not
 * used as check values in any test.
 */
import { toSI } from '../thermo/units.js';
import {
  DEFAULT_SETTINGS,
  newId,
  type CheckRecord,
  type DraftRecord,
  type Readings,
  type Settings,
  type TankRecord,
} from '../components/types.js';
import type { TankInput } from '../thermo/check/types.js';

export const DEMO_SITE = 'Demo site · Invented Acres, 1 Nowhere Lane (not a real place)';
/** A second invented site: a refrigeration contractor's van (refrigerant blends). */
export const DEMO_REFRIGERANT_SITE =
  'Demo site · Make-Believe Cooling, service van 0 (not a real firm)';

interface DemoSpec {
  key: string;
  /** Default: DEMO_SITE. */
  site?: string;
  name: string;
  productId: string;
  nameplate: TankInput;
  readings: Partial<Readings>;
  notes: string;
}

const F = (x: number) => toSI('temperature', x, 'F');
const psig = (x: number) => toSI('gaugePressure', x, 'psig');
const gal = (x: number) => toSI('volume', x, 'usgal');

function specs(): DemoSpec[] {
  return [
    {
      key: 'lpg-home',
      name: 'Demo: small home tank',
      productId: 'propane',
      nameplate: {
        waterCapacity: gal(500),
        designPressure: psig(250),
        placement: 'aboveground',
        containerClass: 'storage',
      },
      readings: {
        liquidTemperature: F(64),
        contentsMode: 'gaugePercent',
        gaugePercent: 58,
        peakAirTemperature: F(93),
      },
      notes: 'Invented for the demo. Behind the imaginary barn.',
    },
    {
      key: 'lpg-bulk',
      name: 'Demo: large bulk tank',
      productId: 'preset:commercial-propane',
      nameplate: {
        waterCapacity: gal(30_000),
        designPressure: psig(250),
        placement: 'aboveground',
        containerClass: 'storage',
      },
      readings: {
        liquidTemperature: F(77),
        contentsMode: 'gaugePercent',
        gaugePercent: 71,
        gaugePressure: psig(142),
        peakAirTemperature: F(101),
      },
      notes: 'Invented for the demo. Plant yard that does not exist.',
    },
    {
      key: 'butane',
      name: 'Demo: butane tank',
      productId: 'preset:commercial-butane',
      nameplate: {
        waterCapacity: gal(1_000),
        designPressure: psig(125),
        placement: 'aboveground',
        containerClass: 'storage',
      },
      readings: {
        liquidTemperature: F(59),
        contentsMode: 'gaugePercent',
        gaugePercent: 63,
        peakAirTemperature: F(88),
      },
      notes: 'Invented for the demo.',
    },
    {
      key: 'nh3-nurse',
      name: 'Demo: ammonia nurse tank',
      productId: 'ammonia',
      nameplate: {
        waterCapacity: gal(1_000),
        designPressure: psig(250),
        placement: 'aboveground',
        containerClass: 'cargo',
        fillMethod: 'gauge',
      },
      readings: {
        liquidTemperature: F(72),
        contentsMode: 'gaugePercent',
        gaugePercent: 79,
        peakAirTemperature: F(96),
      },
      notes: 'Invented for the demo. Parked at the end of a field that is not there.',
    },
    {
      key: 'refrigerant',
      name: 'Demo: refrigerant cylinder',
      productId: 'r134a',
      nameplate: {
        waterCapacity: toSI('volume', 12, 'L'),
        designPressure: psig(260),
        containerClass: 'cylinder',
      },
      readings: {
        liquidTemperature: F(75),
        contentsMode: 'netMass',
        netMass: toSI('mass', 21, 'lb'),
        peakAirTemperature: F(97),
      },
      notes: 'Invented for the demo. On an imaginary service van.',
    },
    {
      key: 'r410a-recovery',
      site: DEMO_REFRIGERANT_SITE,
      name: 'Demo: R-410A recovery cylinder',
      productId: 'r410a',
      nameplate: {
        waterCapacity: toSI('volume', 6, 'usgal'),
        designPressure: psig(400),
        containerClass: 'cylinder',
        recovery: { fillFraction: 0.8 },
      },
      readings: {
        liquidTemperature: F(82),
        contentsMode: 'netMass',
        netMass: toSI('mass', 38, 'lb'),
        gaugePressure: psig(262),
        peakAirTemperature: F(120),
      },
      notes: 'Invented for the demo. Behind the seat of a van that does not exist.',
    },
    {
      key: 'r454b',
      site: DEMO_REFRIGERANT_SITE,
      name: 'Demo: R-454B cylinder',
      productId: 'r454b',
      nameplate: {
        waterCapacity: toSI('volume', 24, 'L'),
        designPressure: psig(400),
        containerClass: 'cylinder',
      },
      readings: {
        liquidTemperature: F(70),
        contentsMode: 'netMass',
        netMass: toSI('mass', 42, 'lb'),
        peakAirTemperature: F(104),
      },
      notes: 'Invented for the demo. On an imaginary van shelf.',
    },
    {
      key: 'co2',
      name: 'Demo: CO2 cylinder',
      productId: 'carbon-dioxide',
      nameplate: {
        waterCapacity: toSI('volume', 34, 'L'),
        designPressure: psig(1_800),
        reliefSetPressure: psig(3_000),
        containerClass: 'cylinder',
      },
      readings: {
        liquidTemperature: F(70),
        contentsMode: 'netMass',
        netMass: toSI('mass', 44, 'lb'),
        peakAirTemperature: F(92),
      },
      notes: 'Invented for the demo. In a make-believe cellar.',
    },
  ];
}

export interface DemoData {
  tanks: TankRecord[];
  drafts: DraftRecord[];
  checks: CheckRecord[];
}

/**
 * Builds the demo site: tanks and their readings (kept as drafts, so each opens with results).
 * No saved checks: a saved check needs the check engine, which is not loaded on first start.
 */
export function buildDemo(settings: Settings = DEFAULT_SETTINGS, now = new Date()): DemoData {
  const iso = now.toISOString();
  const tanks: TankRecord[] = [];
  const drafts: DraftRecord[] = [];
  const checks: CheckRecord[] = [];
  for (const s of specs()) {
    const tank: TankRecord = {
      id: `demo-${s.key}-${newId()}`,
      site: s.site ?? DEMO_SITE,
      name: s.name,
      notes: s.notes,
      nameplate: s.nameplate,
      productId: s.productId,
      demo: true,
      createdAt: iso,
      updatedAt: iso,
    };
    const readings: Readings = {
      liquidTemperature: null,
      contentsMode: 'gaugePercent',
      gaugePercent: null,
      levelHeight: null,
      netMass: null,
      gaugePressure: null,
      peakAirTemperature: null,
      sunAllowance: settings.sunAllowance,
      ...s.readings,
    };
    tanks.push(tank);
    drafts.push({ tankId: tank.id, readings, updatedAt: iso });
  }
  return { tanks, drafts, checks };
}
