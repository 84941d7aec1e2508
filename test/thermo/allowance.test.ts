/**
 * The model allowances applied toward safety (thermo/rules/allowance.ts): identity checks that
 * the headroom at the peak is taken from the raised pressure, with the larger allowance once
 * the tank is liquid-full.
 */
import { describe, expect, it } from 'vitest';
import { checkTank, type TankCheckInput } from '../../thermo/index.js';
import { PSI_PA as PSI, toSI } from '../../thermo/units.js';
import { P_ATM_Pa } from '../../thermo/constants.js';

const F = (f: number) => toSI('temperature', f, 'F');
// The allowances as the README states them (accuracy targets: p_sat 0.5 %; limits of validity: a
// liquid-full peak pressure raised by 10 %), written here rather than read from
// thermo/rules/allowance.ts, so that a changed or dropped allowance fails this test.
const VAPOUR_PRESSURE_ALLOWANCE = 0.005;
const LIQUID_FULL_ALLOWANCE = 0.1;

function input(gaugePercent: number, peakF: number): TankCheckInput {
  return {
    tank: {
      waterCapacity: toSI('volume', 500, 'usgal'),
      designPressureGauge: 250 * PSI,
      reliefSetPressureGauge: 250 * PSI,
    },
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
    const raised = r.peak.pAbs * (1 + VAPOUR_PRESSURE_ALLOWANCE) - P_ATM_Pa;
    // raised peak rounded up, headroom rounded down (100 Pa steps): identity within two steps.
    expect(Math.abs(250 * PSI - raised - r.peak.headroomToDesign)).toBeLessThan(200);
    expect(r.peak.headroomToDesign).toBeLessThanOrEqual(250 * PSI - raised);
  });

  it('raises a liquid-full peak pressure by 10 %, the model’s accuracy past liquid-full', () => {
    const r = checkTank(input(95, 110));
    expect(r.peak.phase).toBe('liquid-full');
    const raised = r.peak.pAbs * (1 + LIQUID_FULL_ALLOWANCE) - P_ATM_Pa;
    expect(r.peak.headroomToDesign).toBeLessThanOrEqual(250 * PSI - raised);
    expect(r.peak.headroomToDesign).toBeLessThan(0);
    const caution = r.cautions.find((c) => c.code === 'design-at-peak');
    expect(caution?.message).toMatch(/model allowance of 10\.0 %/);
  });
});
