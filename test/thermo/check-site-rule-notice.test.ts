/**
 * The notice that the site's own rule binds (thermo/check/siteRuleNotice.ts): which figure,
 * the stop on the gauge and the limit, each rounded down (a limit shown higher than it is would
 * let a tank be overfilled). Checked by hand against the propane reference table
 * test/reference/sat/propane.csv at 288.15 K (Lemmon, McLinden & Wagner 2009: ρL 507.503 kg/m³,
 * ρV 15.813 kg/m³) and the definition of a filling density (49 CFR 173.304a(a)(2) Note 1: the
 * contents as a share of the water the container holds at 60 °F, 999.0 kg/m³ here).
 */
import { describe, expect, it } from 'vitest';
import { siteRuleParams } from '../../thermo/check/siteRuleNotice.js';
import { checkTank, type TankCheckInput } from '../../thermo/index.js';
import type { MessageNumber } from '../../thermo/check/codes.js';
import { WATER_FD_KG_M3 } from '../../thermo/rules/water.js';
import { toSI } from '../../thermo/units.js';
import { expectRel } from './check-helpers.js';

const V = toSI('volume', 1000, 'usgal');
const RHO_L = 507.503273; // test/reference/sat/propane.csv, 288.15 K
const RHO_V = 15.81286096;
const SRC = 'test/reference/sat/propane.csv at 288.15 K (Lemmon et al. 2009)';

const tank = (siteRule: TankCheckInput['siteRule']): TankCheckInput => ({
  tank: { waterCapacity: V, designPressureGauge: toSI('gaugePressure', 250, 'psig') },
  product: 'propane',
  liquidTemperature: 288.15,
  contents: { gaugePercent: 40 },
  peakTemperature: 288.15,
  siteRule,
});
const n = (x: unknown) => x as MessageNumber;

describe('the site rule notice', () => {
  it('a share by volume: the figure as entered, the same stop, the mass it holds', () => {
    const r = checkTank(tank({ maxFillPercent: 70.5 }));
    expect(r.fillLimit.boundBy).toBe('site-rule');
    const p = siteRuleParams(r);
    expect(p['form']).toBe('percent');
    expect(n(p['figure'])).toEqual({ value: 0.705, quantity: 'fraction', round: 'down' });
    // The stop on the gauge for a rule by volume at the present temperature is that volume.
    expect(n(p['stop']).quantity).toBe('fraction');
    expect(n(p['stop']).round).toBe('down');
    expect(n(p['stop']).value).toBeLessThanOrEqual(0.705);
    expect(n(p['stop']).value).toBeGreaterThan(0.704);
    expect(n(p['limit']).quantity).toBe('mass');
    expect(n(p['limit']).round).toBe('down');
    expectRel(n(p['limit']).value, V * (0.705 * RHO_L + 0.295 * RHO_V), 0.005, {
      input: '70.5 % of 1000 US gal at 288.15 K',
      source: SRC,
      kind: 'published',
      why: 'model within 0.5 % of the reference liquid density',
    });
  });

  it('a filling density: the figure as entered, the gauge it reaches, the share of water weight', () => {
    const r = checkTank(tank({ maxFillingDensity: 0.355 }));
    expect(r.fillLimit.boundBy).toBe('site-rule');
    const p = siteRuleParams(r);
    expect(p['form']).toBe('filling-density');
    expect(n(p['figure'])).toEqual({ value: 0.355, quantity: 'fraction', round: 'down' });
    const m = 0.355 * V * WATER_FD_KG_M3;
    expect(n(p['limit']).value).toBeLessThanOrEqual(m);
    expect(m - n(p['limit']).value).toBeLessThan(0.011);
    // The liquid share of the tank that mass fills at 288.15 K: (m/V − ρV)/(ρL − ρV).
    const lf = (m / V - RHO_V) / (RHO_L - RHO_V);
    expectRel(n(p['stop']).value, lf, 0.006, {
      input: '35.5 % of the water weight, 1000 US gal, 288.15 K',
      source: SRC,
      kind: 'published',
      why: 'reference densities; the stop is rounded down to 0.1 %',
    });
    expect(n(p['stop']).round).toBe('down');
  });

  it('is worded as a limit to stop at, never as leave to fill', () => {
    for (const rule of [{ maxFillPercent: 70.5 }, { maxFillingDensity: 0.355 }]) {
      const c = checkTank(tank(rule)).cautions.find((x) => x.code === 'site-rule-binds')!;
      expect(c.message).toMatch(/^Limited by this site's own rule: /);
      expect(c.message).toMatch(/Stop at or below \d+\.\d % on the float gauge/);
      expect(c.message).not.toMatch(/\b(safe|allowed|permitted|OK|may fill|can fill)\b/i);
    }
  });
});
