/**
 * The demo sites shown on first start: plainly invented tanks at two invented sites (an LP-gas
 * and gas yard, and a refrigeration van with an R-410A recovery cylinder and an R-454B cylinder), each
 * with invented readings, so a new user sees real results at once. Every name says it is a
 * demo; every record is marked `demo: true`. Clearing them asks once and can be undone; a demo tank
 * the user edits or saves a check on becomes theirs and is never cleared (pwa/demo-own.ts).
 *
 * The tanks themselves are data in pwa/demo-tanks.ts.
 *
 * These figures are a scenario of our own. They are not taken from any real tank and are not
 * used as check values in any test.
 */
import {
  DEFAULT_SETTINGS,
  newId,
  type CheckRecord,
  type DraftRecord,
  type Readings,
  type Settings,
  type TankRecord,
} from '../components/types.js';
import { DEMO_TANKS, demoSpec } from './demo-tanks.js';

export const DEMO_SITE = 'Demo site · Invented Acres, 1 Nowhere Lane (not a real place)';
/** A second invented site: a refrigeration contractor's van (refrigerant blends). */
export const DEMO_REFRIGERANT_SITE =
  'Demo site · Make-Believe Cooling, service van 0 (not a real firm)';

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
  for (const s of DEMO_TANKS.map(demoSpec)) {
    const tank: TankRecord = {
      id: `demo-${s.key}-${newId()}`,
      site: s.van ? DEMO_REFRIGERANT_SITE : DEMO_SITE,
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
      pressureReadingGauge: null,
      peakAirTemperature: null,
      sunAllowance: settings.sunAllowance,
      ...s.readings,
    };
    tanks.push(tank);
    drafts.push({ tankId: tank.id, readings, updatedAt: iso });
  }
  return { tanks, drafts, checks };
}
