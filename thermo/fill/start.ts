/**
 * The start of a fill: the tank's check before the delivery, kept as the record's before
 * snapshot. The figures are the check's own (contents, fill limit, stop-at percent, room left).
 */
import { checkTank } from '../check/checkTank.js';
import { InputError } from '../errors.js';
import type { TankCheckInput, TankCheckResult } from '../check/types.js';
import type { FillStart } from './types.js';

/**
 * Starts a fill from a check. Pass the check's result when the caller has it (the check
 * screen does); without it the check is run here. `at` is the start time (default now).
 * Throws `InputError` for an input the check refuses, or a time that is not a date.
 */
export function startFill(
  input: TankCheckInput,
  result?: TankCheckResult,
  at: Date = new Date(),
): FillStart {
  if (!(at instanceof Date) || Number.isNaN(at.getTime()))
    throw new InputError('at', 'a valid date', String(at));
  const r = result ?? checkTank(input);
  const c = input.contents;
  const source =
    'gaugePercent' in c ? 'gaugePercent' : 'levelHeight' in c ? 'levelHeight' : 'netMass';
  return {
    // A deep copy: the record must not change when the screen's input object does.
    check: JSON.parse(JSON.stringify(input)) as TankCheckInput,
    before: {
      phase: r.phase,
      liquidTemperature: input.liquidTemperature,
      contentsSource: source,
      gaugePercent: 'gaugePercent' in c ? c.gaugePercent : null,
      liquidPercent: r.contents.liquidPercent,
      totalMass: r.contents.totalMass,
      maxMass: r.fillLimit.maxMass,
      binding: r.fillLimit.binding,
      roomLeftMass: r.fillLimit.roomLeftMass,
      roomLeftVolume: r.fillLimit.roomLeftVolume,
      roomLeftVolumeAt60F: r.fillLimit.roomLeftVolumeAt60F,
      stopAtGaugePercent: r.fillLimit.stopAtGaugePercent,
    },
    startedAt: at.toISOString(),
  };
}
