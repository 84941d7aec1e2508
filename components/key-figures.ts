/**
 * The figures a driver acts on, picked once for the key bar, the results and the shared summary:
 * the float-gauge percent to stop at or below, the room left as liquid at the base temperature
 * (60 °F, or 15 °C when temperatures are shown in °C) and as mass, and the peak-day headroom.
 * Rounded toward safety: the stop-at percent and the room left down, an excess up.
 */
import { upperDiffers, upperSentence, type UpperPeak } from './peak-words.js';
import type { TankCheckResult } from '../thermo/check/types.js';
import { T_15C_K, T_60F_K } from '../thermo/constants.js';
import { formatPercent, type DisplayUnits } from './display.js';

export interface KeyFigures {
  /** Float-gauge percent to stop at or below, 0…100 (rounded down by the engine). */
  stopAtPercent: number;
  /** Room left as liquid at the base temperature, m³ (negative when over the limit). */
  roomLeftVolume: number;
  /** Room left as mass, kg (negative when over the limit). */
  roomLeftMass: number;
  /** The base temperature of `roomLeftVolume`, K. */
  baseTemperature: number;
  /** True when the tank holds more than the limit. */
  over: boolean;
  /** True when a fixed maximum-level gauge's setting is the stop (read there, not on the float gauge). */
  fixedGauge: boolean;
  /** True when the site's own stricter rule sets the stop (components/site-rules.ts). */
  siteRule: boolean;
  /** True when the relief setting was not entered and the design pressure stands in for it. */
  reliefAssumed: boolean;
  /** Peak-day pressure, Pa gauge; headroom to the relief setting, Pa (negative when exceeded). */
  peakGauge: number;
  headroomToRelief: number;
  /** The peak raised by the model's allowance, the figure the headroom is measured from (Pa gauge, its allowance and the phase at the peak). */
  peakUpper: UpperPeak;
}

/** The base temperature of liquid volumes in the user's units: 15 °C in °C, else 60 °F. */
export function baseTemperatureFor(d: DisplayUnits): number {
  return d.unit('temperature') === 'C' ? T_15C_K : T_60F_K;
}

/** "60 °F" or "15 °C". */
export function baseLabel(d: DisplayUnits): string {
  return d.unit('temperature') === 'C' ? '15 °C' : '60 °F';
}

export function keyFigures(r: TankCheckResult, d: DisplayUnits): KeyFigures {
  const f = r.fillLimit;
  const metric = d.unit('temperature') === 'C';
  return {
    stopAtPercent: f.stopAtGaugePercent,
    roomLeftVolume: metric ? f.roomLeftVolumeAt15C : f.roomLeftVolumeAt60F,
    roomLeftMass: f.roomLeftMass,
    baseTemperature: baseTemperatureFor(d),
    over: f.roomLeftMass < 0,
    fixedGauge: f.stopAtFixedGauge,
    siteRule: f.boundBy === 'site-rule',
    reliefAssumed: r.cautions.some((c) => c.code === 'relief-assumed'),
    peakGauge: r.peak.pGauge,
    headroomToRelief: r.peak.headroomToRelief,
    peakUpper: {
      peak: r.peak.pGauge,
      upper: r.peak.pGaugeUpper,
      allowance: r.peak.allowance,
      phase: r.peak.phase,
    },
  };
}

/** The key figures in words, in the user's units (for the key bar's screen-reader text and the summary). */
export interface KeyWords {
  /** "Stop at or below 80.1 % on the float gauge (at today’s liquid temperature)" */
  stop: string;
  /** "Room left 112 US gal as liquid at 60 °F (470.5 lb)" or "Over the limit by 55 US gal as liquid at 60 °F (231 lb)" */
  room: string;
  /** "Peak day 205 psig; headroom to relief 45 psi" or "…; relief setting exceeded by 12 psi"; with "up to …" after the peak when the raised figure shows differently. */
  peak: string;
}

export function keyWords(k: KeyFigures, d: DisplayUnits): KeyWords {
  const base = baseLabel(d);
  const stop = k.fixedGauge
    ? `Stop when liquid first appears at the fixed maximum-level gauge (set at ${formatPercent(k.stopAtPercent, 'down')})`
    : `Stop at or below ${formatPercent(k.stopAtPercent, 'down')} on the float gauge (the most ${k.siteRule ? 'this site’s own rule' : 'the rule'} allows at today’s liquid temperature)`;
  const room = k.over
    ? `Over the limit by ${d.format('volume', -k.roomLeftVolume, 'up')} as liquid at ${base} (${d.format('mass', -k.roomLeftMass, 'up')})`
    : `Room left ${d.format('volume', k.roomLeftVolume, 'down')} as liquid at ${base} (${d.format('mass', k.roomLeftMass, 'down')})`;
  const upper = upperDiffers(k.peakUpper, d) ? `, ${upperSentence(k.peakUpper, d)}` : '';
  const peakDay = `Peak day ${d.format('gaugePressure', k.peakGauge, 'up')}${upper}`;
  const peak =
    k.headroomToRelief < 0
      ? `${peakDay}; relief setting${k.reliefAssumed ? ' (assumed)' : ''} exceeded by ${d.format('pressureDifference', -k.headroomToRelief, 'up')}`
      : `${peakDay}; headroom to relief${k.reliefAssumed ? ' (assumed)' : ''} ${d.format('pressureDifference', k.headroomToRelief, 'down')}`;
  return { stop, room, peak };
}
