/**
 * The raised peak (`PeakResult.pGaugeUpper`): the figure both headrooms are measured from, so a
 * reader can reconcile "peak" and "headroom to design". Checked on a CO2 cylinder full of dense
 * fluid past its critical temperature, the case where the allowance is largest.
 */
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { checkTank, type TankCheckInput } from '../../thermo/index.js';
import { PSI_PA as PSI } from '../../thermo/units.js';
import { P_ATM_Pa } from '../../thermo/constants.js';
import { checkClose } from '../helpers/check.js';

// The allowance as the project README states it ("Limits of validity": the tank check raises a
// liquid-full peak pressure by 10 %; full of dense fluid is treated alike), written here rather
// than read from thermo/rules/allowance.ts so that a changed or dropped allowance fails.
const LIQUID_FULL_ALLOWANCE = 0.1;
const STEP = 100; // Pa, the engine's pressure rounding step (thermo/check/types.ts)

// test/reference/liquid-full.csv: CO2 in a closed tank at 0.56 × 999.0 kg/m³ (Span–Wagner
// reference equation of state): liquid-full at T_t and the pressure 5 K above.
const row = readFileSync(new URL('../reference/liquid-full.csv', import.meta.url), 'utf8')
  .split('\n')
  .find((l) => l.startsWith('carbon-dioxide,559.44,'))!
  .split(',');
const RHO = Number(row[1]);
const T_PLUS_5 = Number(row[4]) + 5;
const P_REF_PLUS_5 = Number(row[7]);

const V = 0.0227; // m³, an invented cylinder of about 6 US gal water capacity
const DESIGN = 1800 * PSI;

function input(): TankCheckInput {
  return {
    tank: { waterCapacity: V, designPressureGauge: DESIGN, reliefSetPressureGauge: 1800 * PSI },
    product: 'carbon-dioxide',
    liquidTemperature: 294.26,
    contents: { netMass: RHO * V },
    peakTemperature: T_PLUS_5,
    barometricPressureAbs: P_ATM_Pa,
  };
}

describe('peak raised by the model allowance (pGaugeUpper)', () => {
  const r = checkTank(input());
  const p = r.peak;

  it('is the peak pAbs × (1 + 10 %) − barometric, rounded up to 100 Pa', () => {
    expect(p.full).toBe('dense-fluid');
    const byHand = Math.ceil((p.pAbs * (1 + LIQUID_FULL_ALLOWANCE) - P_ATM_Pa) / STEP) * STEP;
    checkClose({
      what: 'CO2 dense-fluid peak raised by the stated allowance',
      input: { rho: RHO, T: T_PLUS_5 },
      actual: p.pGaugeUpper,
      expected: byHand,
      atol: 1e-6,
      kind: 'identity',
      source: 'README "Limits of validity": liquid-full peak raised by 10 %; rounding up to 100 Pa',
    });
    expect(p.pGaugeUpper).toBeGreaterThan(p.pGauge);
  });

  it('covers the reference pressure, which the unraised peak need not', () => {
    // The model is within 8 % of the reference 5 K past liquid-full (README); the raised figure
    // must not lie below the reference pressure.
    expect(p.pGaugeUpper).toBeGreaterThanOrEqual(P_REF_PLUS_5 - P_ATM_Pa);
    checkClose({
      what: 'CO2 peak pressure 5 K past liquid-full against the reference',
      input: { rho: RHO, T: T_PLUS_5 },
      actual: p.pAbs,
      expected: P_REF_PLUS_5,
      rtol: 0.08,
      kind: 'published',
      source: 'test/reference/liquid-full.csv (Span–Wagner CO2 reference equation of state)',
      why: 'README limits of validity: within 8 % 2 K and 5 K past liquid-full',
    });
  });

  it('is the figure both headrooms are measured from, exactly', () => {
    const floor = (x: number) => Math.floor(x / STEP) * STEP;
    checkClose({
      what: 'headroom to design = design − pGaugeUpper (rounded down)',
      input: { design: DESIGN, upper: p.pGaugeUpper },
      actual: p.headroomToDesign,
      expected: floor(DESIGN - p.pGaugeUpper),
      atol: 1e-6,
      kind: 'identity',
      source: 'thermo/check/types.ts PeakResult: headroom measured from the raised peak',
    });
    expect(p.headroomToRelief).toBe(floor(1800 * PSI - p.pGaugeUpper));
  });

  it('is the pressure the design caution quotes', () => {
    const low = checkTank({
      ...input(),
      tank: { ...input().tank, designPressureGauge: 1000 * PSI },
    });
    expect(low.peak.headroomToDesign).toBeLessThan(0);
    const c = low.cautions.find((x) => x.code === 'design-at-peak');
    expect(c?.params.pressure).toMatchObject({ value: low.peak.pGaugeUpper });
  });
});
