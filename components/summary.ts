/**
 * Plain-text summary of a check, for sharing (Web Share API or the clipboard) and for the CSV
 * export. Numbers through `DisplayUnits`, rounded toward safety as on screen. Always ends with
 * the standing caution; never worded as permission.
 */
import { DisplayUnits, formatPercent } from './display.js';
import { phaseWords } from './phase-words.js';
import { stopPlace } from './fill-words.js';
import { cautionText } from './messages.js';
import type { Readings, TankRecord } from './types.js';
import type { TankCheckResult } from '../thermo/check/types.js';
import { upperSentence } from './peak-words.js';
import { keyFigures, keyWords } from './key-figures.js';
import { whenText } from './reopen.js';

function readingsLines(r: Readings, d: DisplayUnits): string[] {
  const contents =
    r.contentsMode === 'gaugePercent'
      ? `Float gauge: ${formatPercent(r.gaugePercent)}`
      : r.contentsMode === 'levelHeight'
        ? `Liquid level: ${d.format('length', r.levelHeight)}`
        : `Net mass on scale: ${d.format('mass', r.netMass)}`;
  return [
    `Liquid temperature: ${d.format('temperature', r.liquidTemperature)}`,
    contents,
    `Pressure gauge: ${r.pressureReadingGauge === null ? 'not read' : d.format('gaugePressure', r.pressureReadingGauge)}`,
    r.peakAirTemperature === null
      ? 'Forecast: none entered (peak figures at today’s liquid temperature)'
      : `Forecast peak air: ${d.format('temperature', r.peakAirTemperature)} + sun allowance ${d.format('temperatureDifference', r.sunAllowance ?? 0)} (rule of thumb)`,
  ];
}

/** A multi-line summary of a live result. */
export function summaryText(
  tank: TankRecord,
  readings: Readings,
  result: TankCheckResult,
  d: DisplayUnits,
  at = new Date(),
): string {
  const f = result.fillLimit;
  const p = result.peak;
  const ranked = result.cautions.filter((c) => c.code !== 'standing');
  // The key figures first, worded as on the screen's key bar.
  const key = keyWords(keyFigures(result, d), d);
  const lines = [
    `Tank check — ${tank.name}${tank.site ? `, ${tank.site}` : ''}${tank.demo ? ' (invented demo tank)' : ''}`,
    `${at.toLocaleString()}${readings.takenAt ? ` · readings taken ${whenText(readings.takenAt)}` : ''}`,
    `Product: ${result.product.label} · W.C. ${d.format('volume', tank.nameplate.waterCapacity)} · MAWP ${d.format('gaugePressure', tank.nameplate.designPressureGauge)}`,
    '',
    `${key.stop}.`,
    `${key.room}.`,
    `${key.peak}.`,
    '',
    ...readingsLines(readings, d),
    '',
    `Phase: ${phaseWords(result.phase, result.full)}`,
    `Contents: ${d.format('mass', result.contents.totalMass)} (filling density ${d.format('fraction', result.contents.fillingDensity)})`,
    `Fill limit: ${d.format('mass', f.maxMass, 'down')}`,
    `Where the stop is read: ${stopPlace(f)}`,
    ...(f.bindingNote ? [`Why: ${f.bindingNote}`] : []),
    `Peak day (${d.format('temperature', p.temperature)}): ${d.format('gaugePressure', p.pGauge, 'up')}, ${upperSentence({ peak: p.pGauge, upper: p.pGaugeUpper, allowance: p.allowance, phase: p.phase }, d)}; measured from that, headroom to relief ${headroom(p.headroomToRelief, d)}, to design ${headroom(p.headroomToDesign, d)}`,
    `Liquid-full at: ${result.liquidFullTemperature === null ? 'not reached' : d.format('temperature', result.liquidFullTemperature, 'down')}`,
    '',
    ranked.length ? 'Cautions:' : 'No further cautions from these figures.',
    ...ranked.map((c) => `- ${c.level.toUpperCase()}: ${cautionText(c, d)}`),
    '',
    result.standingCaution,
  ];
  return lines.join('\n');
}

function headroom(pa: number, d: DisplayUnits): string {
  return pa < 0
    ? `exceeded by ${d.format('pressureDifference', -pa, 'up')}`
    : d.format('pressureDifference', pa, 'down');
}
