/**
 * The "full" states (thermo/check/full.ts) and the site's own limits (thermo/check/siteLimits.ts)
 * at their edges. Sources: the project README ("Limits of validity": a tank is full of dense
 * fluid past the critical temperature when its contents are denser than the critical density;
 * the pressure allowance is 10 % when full, 0.5 % otherwise); CO2's critical point from
 * test/reference/fluids.csv (Span & Wagner 1996: Tc 304.1282 K, ρc 467.6 kg/m³); the propane
 * reference table test/reference/sat/propane.csv (Lemmon et al. 2009); the definition of a
 * filling density (49 CFR 173.304a(a)(2) Note 1, FACTS.md section a).
 */
import { describe, expect, it } from 'vitest';
import { fullKind, pressureAllowance } from '../../thermo/check/full.js';
import type { State } from '../../thermo/check/model.js';
import { checkTank, saturation, type TankCheckInput } from '../../thermo/index.js';
import { WATER_FD_KG_M3 } from '../../thermo/rules/water.js';
import { toSI } from '../../thermo/units.js';
import { expectRel, expectWithin } from './check-helpers.js';

const RHOC_CO2 = 467.5999639; // test/reference/fluids.csv (Span & Wagner 1996)
const state = (phase: State['phase']): State => ({
  phase,
  pAbs: 8e6,
  lf: 1,
  rhoL: null,
  rhoV: null,
  approximate: false,
});

describe('fullKind and the pressure allowance (README "Limits of validity")', () => {
  it('liquid-full is full; past the critical point only contents denser than ρc are', () => {
    expect(fullKind(state('liquid-full'), 300, RHOC_CO2)).toBe('liquid');
    expect(fullKind(state('supercritical'), RHOC_CO2 * 1.001, RHOC_CO2)).toBe('dense-fluid');
    // "denser than the critical density": at ρc itself the tank is not called full
    expect(fullKind(state('supercritical'), RHOC_CO2, RHOC_CO2)).toBeNull();
    expect(fullKind(state('supercritical'), 200, RHOC_CO2)).toBeNull();
    expect(fullKind(state('two-phase'), 900, RHOC_CO2)).toBeNull();
    expect(fullKind(state('vapour-only'), 900, RHOC_CO2)).toBeNull();
  });
  it('10 % on a full tank’s pressure, 0.5 % otherwise', () => {
    expect(pressureAllowance(state('liquid-full'), 300, RHOC_CO2)).toBe(0.1);
    expect(pressureAllowance(state('supercritical'), 500, RHOC_CO2)).toBe(0.1);
    expect(pressureAllowance(state('supercritical'), 400, RHOC_CO2)).toBe(0.005);
    expect(pressureAllowance(state('two-phase'), 500, RHOC_CO2)).toBe(0.005);
  });
});

describe('the site’s own limits', () => {
  const V = toSI('volume', 1000, 'usgal');
  const base = (over: Partial<TankCheckInput>): TankCheckInput => ({
    tank: { waterCapacity: V, designPressureGauge: toSI('gaugePressure', 250, 'psig') },
    product: 'propane',
    liquidTemperature: 288.15,
    contents: { gaugePercent: 40 },
    peakTemperature: 288.15,
    ...over,
  });

  it('both figures listed, worded with the figure as entered, each as its own kind of limit', () => {
    const r = checkTank(base({ siteRule: { maxFillPercent: 70.5, maxFillingDensity: 0.355 } }));
    const pct = r.fillLimit.limits.find((l) => l.id === 'site-max-fill-percent')!;
    const fd = r.fillLimit.limits.find((l) => l.id === 'site-max-filling-density')!;
    expect(pct.kind).toBe('site');
    expect(fd.kind).toBe('site');
    expect(pct.description).toBe(
      'This site’s own rule: liquid in at most 70.5 % of the container by volume at the present liquid temperature',
    );
    expect(fd.description).toBe(
      'This site’s own rule: at most 35.5 % of the water weight capacity',
    );
    for (const l of [pct, fd]) {
      expect(l.citation).toBe(
        'this site’s own rule (entered for the site; stricter than the rule set)',
      );
      expect(l.referenceTemperature).toBeNull();
      expect(l.modelAllowance).toBe(0);
    }
    // the percent: V × (f ρL + (1 − f) ρV), rounded down (site-rule.test.ts, by hand)
    const s = saturation('propane', 288.15);
    expect(pct.gaugePercent).toBe(70.5);
    expectWithin(pct.maxMass, V * (0.705 * s.rhoL + 0.295 * s.rhoV), 0.011, {
      input: '70.5 %',
      source: 'identity with the core’s saturation() at 288.15 K',
      kind: 'identity',
    });
    expectRel(pct.maxMass, V * (0.705 * 507.503273 + 0.295 * 15.81286096), 0.005, {
      input: '70.5 %',
      source: 'test/reference/sat/propane.csv at 288.15 K',
      kind: 'published',
      why: 'model within 0.5 % of the reference liquid density',
    });
    expectWithin(pct.fillingDensity, pct.maxMass / (V * WATER_FD_KG_M3), 1e-12, {
      input: '70.5 %',
      source: 'definition of a filling density',
      kind: 'identity',
    });
    // the filling density: that share of the water weight, rounded down; as a gauge percent now
    expectWithin(fd.maxMass, 0.355 * V * WATER_FD_KG_M3, 0.01, {
      input: '35.5 %',
      source: 'definition of a filling density',
      kind: 'published',
    });
    expect(fd.maxMass).toBeLessThanOrEqual(0.355 * V * WATER_FD_KG_M3);
    expect(fd.fillingDensity).toBe(0.355);
    expectWithin(fd.gaugePercent!, ((fd.maxMass / V - s.rhoV) / (s.rhoL - s.rhoV)) * 100, 1e-9, {
      input: '35.5 %',
      source: 'identity with the core’s saturation() at 288.15 K',
      kind: 'identity',
    });
  });

  it('only the figures entered become limits; no site rule, no site limit', () => {
    const ids = (r: ReturnType<typeof checkTank>) => r.fillLimit.limits.map((l) => l.id);
    const none = checkTank(base({}));
    expect(none.fillLimit.limits.every((l) => l.kind !== 'site' && typeof l.id === 'string')).toBe(
      true,
    );
    const pct = ids(checkTank(base({ siteRule: { maxFillPercent: 80 } })));
    expect(pct).toContain('site-max-fill-percent');
    expect(pct).not.toContain('site-max-filling-density');
    const fd = ids(checkTank(base({ siteRule: { maxFillingDensity: 0.4 } })));
    expect(fd).toContain('site-max-filling-density');
    expect(fd).not.toContain('site-max-fill-percent');
  });

  it('past the critical temperature there is no level, so a percent limit is not applied', () => {
    // CO2 at 310 K, above Tc = 304.13 K: the filling-density figure still applies.
    const V2 = 0.0227;
    const r = checkTank({
      tank: {
        waterCapacity: V2,
        designPressureGauge: toSI('gaugePressure', 1800, 'psig'),
        containerClass: 'cylinder',
      },
      product: 'carbon-dioxide',
      liquidTemperature: 310,
      contents: { netMass: 0.3 * V2 * WATER_FD_KG_M3 },
      peakTemperature: 310,
      siteRule: { maxFillPercent: 80, maxFillingDensity: 0.5 },
    });
    expect(r.phase).toBe('supercritical');
    const ids = r.fillLimit.limits.map((l) => l.id);
    expect(ids).not.toContain('site-max-fill-percent');
    const fd = r.fillLimit.limits.find((l) => l.id === 'site-max-filling-density')!;
    expect(fd.gaugePercent).toBeNull();
    expectWithin(fd.maxMass, 0.5 * V2 * WATER_FD_KG_M3, 0.01, {
      input: 'CO2 at 310 K, site 50 %',
      source: 'definition of a filling density',
      kind: 'published',
    });
  });
});
