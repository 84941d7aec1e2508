/**
 * The walkdown's records: one walk of a site's tanks against one forecast, kept while it is under
 * way (so a reload, an update or a flat battery loses nothing) and kept for good once finished.
 * Every number is SI, as in components/types.ts.
 */
import type { CheckSummary, Readings } from './types.js';
import type { SiteForecast } from './walkdown-board.js';
import type { Caution, TankPhase } from '../thermo/check/types.js';
import type { BoardLevel } from './walkdown-board.js';

export type { SiteForecast };

/** What became of one tank on the walk. */
export type WalkStatus = 'pending' | 'checked' | 'unreached';

/** One tank's figures as the walk found them, kept with the record. */
export interface WalkResult {
  level: BoardLevel;
  productLabel: string;
  /** Pa gauge, as used. */
  designPressureGauge: number;
  /** Pa gauge, as used (the design pressure when the nameplate gives none). */
  reliefSetPressureGauge: number;
  /** K, the peak liquid temperature used (forecast + allowance). */
  peakTemperature: number;
  /** Phase state at the peak (a record made before this field reads as two-phase). */
  peakPhase?: TankPhase;
  /** Percent 0…100 at the peak. */
  peakLiquidPercent: number;
  /** K, or null when the tank cannot become liquid-full. */
  liquidFullMargin: number | null;
  /** K, or null when the relief setting is not reached below 400 K. */
  reliefMargin: number | null;
  summary: CheckSummary;
  /** Every caution as the engine gave it (code, level, SI value and params), the standing one last. */
  cautions: Caution[];
}

export interface WalkEntry {
  tankId: string;
  /** The tank's name when the walk started (kept if the tank is later renamed or deleted). */
  tankName: string;
  status: WalkStatus;
  /** Readings entered on the walk (started from the tank's latest readings). */
  readings: Readings;
  note: string;
  /** Why the tank could not be reached ("could not reach"), else ''. */
  reason: string;
  /** ISO time the tank was checked or skipped, or null while pending. */
  at: string | null;
  /** The figures at the forecast, filled in when the tank is checked; null otherwise. */
  result: WalkResult | null;
  /** Why the check gave no result (missing or refused readings), else ''. */
  problem: string;
}

export interface WalkdownRecord {
  id: string;
  site: string;
  status: 'in-progress' | 'finished';
  /** ISO */
  startedAt: string;
  /** ISO, or null while under way. */
  finishedAt: string | null;
  /** Who checked (free text). */
  checkedBy: string;
  /** The forecast and allowances used, as they were at the start. */
  forecast: SiteForecast;
  /** Tank ids in the walk's order; `entries` follow it. */
  entries: WalkEntry[];
  /** Index of the tank on screen. */
  current: number;
  /** The app's version that made the record. */
  appVersion: string;
}

declare const __APP_VERSION__: string | undefined;

/** The app's version (set at build time; 'dev' in tests run from source). */
export const APP_VERSION: string = typeof __APP_VERSION__ === 'string' ? __APP_VERSION__ : 'dev';

/** Counts for "4 of 6 checked". */
export function progress(w: WalkdownRecord): { done: number; total: number } {
  return {
    done: w.entries.filter((e) => e.status !== 'pending').length,
    total: w.entries.length,
  };
}
