/**
 * The model allowances applied toward safety (thermo/rules/allowance.ts): identity checks that
 * the headroom at the peak is taken from the raised pressure, with the larger allowance once
 * the tank is liquid-full.
 */
import { describe, expect, it } from 'vitest';
import { checkTank, type TankCheckInput } from '../../thermo/index.js';
import { MODEL_ALLOWANCE } from '../../thermo/rules/allowance.js';

const GAL = 0.003785411784;
const PSI = 6894.757;
const F = (f: number) => ((f - 32) * 5) / 9 + 273.15;

function input(gaugePercent: number, peakF: number): TankCheckInput {
  return {
    tank: { waterCapacity: 500 * GAL, designPressure: 250 * PSI, reliefSetPressure: 250 * PSI },
    product: 'propane',
    liquidTemperature: F(60),
    contents: { gaugePercent },
    peakTemperature: F(peakF),
  };
}

describe('checkTank peak headroom', () => {
  it('takes the headroom from the peak pressure raised by 0.5 % while two-phase', () => {
    const r = checkTank(input(60, 100));
    expect(r.peak.phase).toBe('two-phase');
    const raised = r.peak.pAbsolute * (1 + MODEL_ALLOWANCE.vapourPressure) - 101_325;
    // floored to the engine's pressure step (at most 100 Pa here): identity within that step.
    expect(Math.abs(250 * PSI - raised - r.peak.headroomToDesign)).toBeLessThan(100);
    expect(r.peak.headroomToDesign).toBeLessThanOrEqual(250 * PSI - raised);
  });

  it('raises a liquid-full peak pressure by 10 %, the model’s accuracy past liquid-full', () => {
    const r = checkTank(input(95, 110));
    expect(r.peak.phase).toBe('liquid-full');
    const raised = r.peak.pAbsolute * (1 + MODEL_ALLOWANCE.liquidFullPressure) - 101_325;
    expect(r.peak.headroomToDesign).toBeLessThanOrEqual(250 * PSI - raised);
    expect(r.peak.headroomToDesign).toBeLessThan(0);
    const caution = r.cautions.find((c) => c.code === 'design-at-peak');
    expect(caution?.message).toMatch(/model allowance of 10\.0 %/);
  });
});
