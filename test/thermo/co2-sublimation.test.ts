// CO2's sublimation temperature, behind the cold-metal caution of a vented CO2 tank.
import { describe, expect, it } from 'vitest';
import {
  CO2_TRIPLE_POINT_K,
  co2SublimationPressure,
  co2SublimationTemperature,
} from '../../thermo/check/sublimation.js';
import { checkTank } from '../../thermo/index.js';
import { fromSI, toSI } from '../../thermo/units.js';

/** One standard atmosphere, Pa (definition: 101 325 Pa exactly, ISO 80000-4). */
const ATM = 101_325;

describe('CO2 sublimation', () => {
  it('meets the triple point (Span & Wagner 1996: 216.592 K at 517.96 kPa)', () => {
    expect(co2SublimationPressure(CO2_TRIPLE_POINT_K)).toBeCloseTo(517_960, 6);
    expect(co2SublimationTemperature(517_959)).toBeCloseTo(216.592, 3);
  });

  it('sublimes at −78.5 °C (−109.3 °F) at one atmosphere (shared/trade/FACTS.md, CO2 triple point; Span & Wagner 1996: 194.686 K, from memory)', () => {
    const T = co2SublimationTemperature(ATM)!;
    expect(T).toBeCloseTo(194.686, 2);
    expect(fromSI('temperature', T, 'C')).toBeCloseTo(-78.5, 1);
    expect(fromSI('temperature', T, 'F')).toBeCloseTo(-109.3, 0);
  });

  it('is colder at a lower barometric pressure (a high site), as Clausius–Clapeyron says', () => {
    // d ln p / d(1/T) = −ΔH_sub/R; with ΔH_sub ≈ 26 kJ/mol (from memory) 0.8 atm is about 2.5 K colder.
    const T1 = co2SublimationTemperature(ATM)!;
    const T08 = co2SublimationTemperature(0.8 * ATM)!;
    const dH = (8.314462618 * Math.log(1 / 0.8)) / (1 / T08 - 1 / T1);
    expect(T08).toBeLessThan(T1 - 2);
    expect(dH).toBeGreaterThan(24_000);
    expect(dH).toBeLessThan(28_000);
  });

  it('has no sublimation temperature where liquid can exist or below the range', () => {
    expect(co2SublimationTemperature(toSI('pressure', 75.2, 'psia'))).toBeNull(); // above the triple point
    expect(co2SublimationTemperature(100)).toBeNull();
    expect(co2SublimationTemperature(Number.NaN)).toBeNull();
  });
});

describe('the cold-metal caution of a CO2 tank', () => {
  const F = (x: number) => toSI('temperature', x, 'F');
  // A low-pressure bulk CO2 tank held near 0 °F and 300 psig (shared/trade/FACTS.md, CO2 triple
  // point: "usually held near 0 F and 300 psig"), its metal stamped at mdmtF.
  const tank = (mdmtF: number) =>
    checkTank({
      tank: {
        waterCapacity: toSI('volume', 1000, 'usgal'),
        designPressureGauge: toSI('gaugePressure', 350, 'psig'),
        minDesignMetalTemperature: F(mdmtF),
      },
      product: 'carbon-dioxide',
      liquidTemperature: F(0),
      contents: { gaugePercent: 50 },
      peakTemperature: F(10),
    });

  it('vented, the liquid turns to dry ice near −109.3 °F: below a −20 °F stamp, a caution that says so', () => {
    const c = tank(-20).cautions.find((x) => x.code === 'autorefrigeration-below-mdmt');
    expect(c).toBeDefined();
    expect(c!.params['forms']).toBe('dry ice');
    const boiling = c!.params['boiling'] as { value: number };
    expect(fromSI('temperature', boiling.value, 'F')).toBeCloseTo(-109.3, 0);
    expect(c!.message).toMatch(/dry ice/);
  });

  it('a stamp below the dry-ice temperature (−115 °F) gets no such caution', () => {
    expect(tank(-115).cautions.map((x) => x.code)).not.toContain('autorefrigeration-below-mdmt');
  });
});
