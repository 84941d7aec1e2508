/**
 * The fill limit's arithmetic and its words (thermo/check/fillLimit.ts), each figure against
 * something outside the limit code: the reference saturation tables (test/reference/sat/, from
 * the published reference equations named in test/reference/fluids.csv), the filling rules
 * (test/reference/trade/, CFR 2015 text), hand arithmetic, and — for tight identities — the
 * core's own `saturation()` at the same state (an independent function: the fill limit must
 * turn those densities into masses, percents and volumes the way the rules define them).
 */
import { describe, expect, it } from 'vitest';
import { checkTank, saturation, type TankCheckInput } from '../../thermo/index.js';
import { floorTo } from '../../thermo/check/fillLimit.js';
import { MODEL_ALLOWANCE } from '../../thermo/rules/allowance.js';
import { WATER_FD_KG_M3 } from '../../thermo/rules/water.js';
import { T_15C_K, T_60F_K } from '../../thermo/constants.js';
import { toSI } from '../../thermo/units.js';
import { expectRel, expectWithin } from './check-helpers.js';

const F = (x: number) => toSI('temperature', x, 'F');
const gal = (x: number) => toSI('volume', x, 'usgal');
const psig = (x: number) => toSI('gaugePressure', x, 'psig');
const V = gal(1000);
const SAT = (f: string, T: number) =>
  `test/reference/sat/${f}.csv at ${T} K (reference equation named in test/reference/fluids.csv)`;
const MODEL_WHY = 'model within 0.5 % of the reference saturated liquid density (README table)';
const CORE = 'identity with the core’s saturation() at the same state';

function check(over: Partial<TankCheckInput> = {}, tank: Partial<TankCheckInput['tank']> = {}) {
  return checkTank({
    tank: { waterCapacity: V, designPressureGauge: psig(250), ...tank },
    product: 'propane',
    liquidTemperature: 288.15,
    contents: { gaugePercent: 40 },
    peakTemperature: 288.15,
    ...over,
  });
}
const entry = (r: ReturnType<typeof check>, id: string) => {
  const l = r.fillLimit.limits.find((x) => x.id === id);
  expect(l, `no limit ${id} in ${r.fillLimit.limits.map((x) => x.id).join(', ')}`).toBeDefined();
  return l!;
};

describe('floorTo: rounding a limit down (hand arithmetic)', () => {
  it('rounds down to a step below 1 and to a step of 1 or more, never up', () => {
    expect(floorTo(1.239, 0.01)).toBe(1.23);
    expect(floorTo(0.29, 0.01)).toBe(0.29); // 0.29 × 100 = 28.999999999999996 in binary
    expect(floorTo(85.79, 0.1)).toBe(85.7);
    expect(floorTo(0.57, 0.01)).toBe(0.57); // not 0.5700000000000001 (57 × 0.01)
    expect(floorTo(1239, 10)).toBe(1230);
    expect(floorTo(1240, 10)).toBe(1240);
    expect(floorTo(7.9, 1)).toBe(7);
    expect(floorTo(-0.004, 0.01)).toBe(-0.01);
  });
});

describe('propane at 288.15 K, 1,000 US gal, Table H-27 42 %', () => {
  const T = 288.15;
  // computed inside each test, so per-test coverage ties every assertion to the code it checks
  const at = () => {
    const r = check();
    return { r, s: saturation('propane', T), fl: r.fillLimit };
  };
  const WW = V * WATER_FD_KG_M3; // water weight capacity, kg (8.32828 lb/gal, 49 CFR 173.315(a) Note 1)

  it('the weight limit is 0.42 × the water weight, named with its own 42 %', () => {
    const { r, fl } = at();
    const w = entry(r, fl.binding);
    expect(w.kind).toBe('rule');
    expectWithin(w.maxMass, 0.42 * WW, 0.01, {
      input: '1,000 gal, SG 0.5072',
      source: 'FACTS.md case 4: 0.42 × 1000 × 8.32828 lb',
      kind: 'published',
      why: 'rounded down to 0.01 kg',
    });
    expect(w.maxMass).toBeLessThanOrEqual(0.42 * WW);
    expect(w.fillingDensity).toBe(0.42);
    expect(w.referenceTemperature).toBeNull();
    expect(w.modelAllowance).toBe(0);
    // never above the mass rounded down to 0.01 kg, and within that rounding of the printed 42 %
    expect(fl.maxFillingDensity).toBeLessThanOrEqual(0.42);
    expect(fl.maxFillingDensity).toBeLessThanOrEqual(w.maxMass / WW + 1e-12);
    expect(fl.maxFillingDensity).toBeGreaterThanOrEqual(w.maxMass / WW);
    expectWithin(fl.maxFillingDensity, 0.42, 0.01 / WW, {
      input: '1,000 gal',
      source: 'Table H-27 (42 %), less the 0.01 kg rounding',
      kind: 'published',
    });
    expect(fl.boundBy).toBe('rule-set');
  });

  it('the weight limit as a gauge percent: (m/V − ρV)/(ρL − ρV) at today’s temperature', () => {
    const { r, s, fl } = at();
    const w = entry(r, fl.binding);
    const expected = ((w.maxMass / V - s.rhoV) / (s.rhoL - s.rhoV)) * 100;
    expectWithin(w.gaugePercent!, expected, 1e-9, { input: T, source: CORE, kind: 'identity' });
    // against the reference table: ρL 507.503273, ρV 15.81286096 kg/m³
    const ref = ((w.maxMass / V - 15.81286096) / (507.503273 - 15.81286096)) * 100;
    expectWithin(w.gaugePercent!, ref, 0.6, {
      input: T,
      source: SAT('propane', T),
      kind: 'published',
      why: MODEL_WHY,
    });
    expectWithin(fl.stopAtGaugePercent, Math.floor(expected * 10) / 10, 1e-9, {
      input: T,
      source: 'the stop rounds the percent down to 0.1 (toward safety)',
      kind: 'identity',
    });
  });

  it('the not-liquid-full limit: V × ρL(peak) less the model allowance, at the peak', () => {
    const { r, s } = at();
    const p = entry(r, 'not-liquid-full-at-peak');
    expect(p.kind).toBe('physical');
    expect(p.referenceTemperature).toBe(T);
    expect(p.modelAllowance).toBe(MODEL_ALLOWANCE.liquidDensity);
    expectWithin(p.maxMass, V * s.rhoL * (1 - MODEL_ALLOWANCE.liquidDensity), 0.011, {
      input: T,
      source: CORE,
      kind: 'identity',
      why: 'rounded down to 0.01 kg',
    });
    expectRel(p.maxMass, V * 507.503273 * 0.995, 0.005, {
      input: T,
      source: SAT('propane', T),
      kind: 'published',
      why: MODEL_WHY,
    });
    expectWithin(p.fillingDensity, p.maxMass / WW, 1e-12, {
      input: T,
      source: 'definition of a filling density (FACTS.md section a)',
      kind: 'identity',
    });
    expectWithin(p.gaugePercent!, ((p.maxMass / V - s.rhoV) / (s.rhoL - s.rhoV)) * 100, 1e-9, {
      input: T,
      source: CORE,
      kind: 'identity',
    });
    expect(p.description).toBe(
      'The tank must not become liquid-full at the forecast peak liquid temperature',
    );
    expect(p.citation).toContain('49 CFR 173.304(b)');
  });

  it('room left as liquid now, at 60 °F and at 15 °C: mass ÷ the saturated liquid density there', () => {
    const { s, fl } = at();
    const room = fl.roomLeftMass;
    expect(room).toBeGreaterThan(0);
    const cases: [number, number, string][] = [
      [fl.roomLeftVolume, s.rhoL, 'now'],
      [fl.roomLeftVolumeAt60F, saturation('propane', T_60F_K).rhoL, '60 °F'],
      [fl.roomLeftVolumeAt15C, saturation('propane', T_15C_K).rhoL, '15 °C'],
    ];
    for (const [got, rho, at] of cases) {
      expectWithin(got, room / rho, 1.01e-6, {
        input: at,
        source: CORE,
        kind: 'identity',
        why: 'rounded down to 1e-6 m³',
      });
      expect(got).toBeLessThanOrEqual(room / rho);
    }
    // 60 °F (288.706 K) and 15 °C differ by 0.56 K: the two volumes must differ (liquid expands)
    expect(fl.roomLeftVolumeAt60F).toBeGreaterThan(fl.roomLeftVolumeAt15C);
  });

  it('the room left is the limit less the contents (liquid and vapour), rounded down', () => {
    const { r, fl } = at();
    expectWithin(fl.roomLeftMass, fl.maxMass - r.contents.totalMass, 0.0101, {
      input: T,
      source: 'mass balance',
      kind: 'identity',
    });
    expect(fl.roomLeftMass).toBeLessThanOrEqual(fl.maxMass - r.contents.totalMass + 1e-9);
  });
});

describe('the peak colder than the liquid now', () => {
  it('the not-liquid-full limit is taken at the present temperature and says so', () => {
    const r = check({ liquidTemperature: 303.15, peakTemperature: 288.15 });
    const p = entry(r, 'not-liquid-full-at-peak');
    expect(p.referenceTemperature).toBe(303.15);
    expect(p.description).toContain('present liquid temperature');
    expectRel(p.maxMass, V * 484.390859 * 0.995, 0.005, {
      input: '303.15 K now, peak 288.15 K',
      source: SAT('propane', 303.15),
      kind: 'published',
      why: MODEL_WHY,
    });
  });
});

describe('ammonia by gauge at 303.15 K: the 87.5 % volume column (29 CFR 1910.111(b)(11)(ii))', () => {
  const T = 303.15;
  const at = () => {
    const r = check({ product: 'ammonia', liquidTemperature: T, peakTemperature: T });
    return { r, s: saturation('ammonia', T), fl: r.fillLimit };
  };
  it('the volume limit as a mass: V × (0.875 ρL + 0.125 ρV), its filling density, its note', () => {
    const { r, s, fl } = at();
    const v = entry(r, 'nh3-storage-aboveground-volume');
    expect(fl.binding).toBe(v.id);
    expect(v.kind).toBe('volume');
    expect(v.gaugePercent).toBe(87.5);
    expect(v.referenceTemperature).toBeNull();
    expect(v.modelAllowance).toBe(0);
    expectWithin(v.maxMass, V * (0.875 * s.rhoL + 0.125 * s.rhoV), 0.011, {
      input: T,
      source: CORE,
      kind: 'identity',
      why: 'rounded down to 0.01 kg',
    });
    expectRel(v.maxMass, V * (0.875 * 595.3642977 + 0.125 * 9.045970156), 0.005, {
      input: T,
      source: SAT('ammonia', T),
      kind: 'published',
      why: MODEL_WHY,
    });
    expectWithin(v.fillingDensity, v.maxMass / (V * WATER_FD_KG_M3), 1e-12, {
      input: T,
      source: 'definition of a filling density (FACTS.md section a)',
      kind: 'identity',
    });
    // the stop is the printed percent; the result's filling density is the binding entry's own
    expect(fl.stopAtGaugePercent).toBe(87.5);
    expect(fl.maxFillingDensity).toBe(v.fillingDensity);
    expect(fl.volumetricMaxPercent).toBe(87.5);
    // one line: the volume figure, the 56 % weight limit it lies below and where the 56 % sits now
    const w = entry(r, 'nh3-storage-aboveground');
    const note = fl.bindingNote!;
    expect(note).toContain('volume limit at this temperature binds: 87.5 % by volume');
    expect(note).toContain('below its weight limit of 56 % of the water weight');
    expect(note).toContain(`(${Math.floor(w.gaugePercent! * 10) / 10} % on the gauge now)`);
    expect(note).toContain('29 CFR 1910.111(b)(11)(ii)');
    expect(note).not.toContain('CFR 2015 ed.');
    expect(note.startsWith('The rule’s volume limit')).toBe(true);
  });

  it('filled by weight, the weight column alone binds and the note says why', () => {
    const rw = check(
      { product: 'ammonia', liquidTemperature: T, peakTemperature: T },
      { fillMethod: 'weight' },
    );
    expect(rw.fillLimit.binding).toBe('nh3-storage-aboveground');
    expect(rw.fillLimit.volumetricMaxPercent).toBeNull();
    expect(rw.fillLimit.bindingNote).toBe(
      'Filled by weight on a scale: the rule’s weight column applies, not its volume column.',
    );
  });

  it('underground: the fixed tube gauge at 85 % and the 85 % volume column tie; the gauge is named', () => {
    // 29 CFR 1910.111(b)(11)(i) underground uninsulated 85 % by volume; (b)(14)(v) fixed tube
    // gauge set at 85 %: the same mass, so the gauge setting (what the driver watches) binds.
    const ru = check(
      { product: 'ammonia', liquidTemperature: T, peakTemperature: T },
      { placement: 'underground', fillMethod: 'fixed-gauge' },
    );
    const fl2 = ru.fillLimit;
    expect(fl2.binding).toBe('nh3-fixed-gauge');
    expect(fl2.stopAtFixedGauge).toBe(true);
    expect(fl2.stopAtGaugePercent).toBe(85);
    expect(fl2.volumetricMaxPercent).toBe(85);
    expect(entry(ru, 'nh3-storage-underground-volume').maxMass).toBe(fl2.maxMass);
    expect(fl2.bindingNote).toContain(
      'Filled by the fixed maximum-level gauge: the fill stops when liquid first appears at the gauge, set at 85 %',
    );
  });
});

describe('ammonia at 333.15 K: the 56 % weight limit lies past liquid-full', () => {
  it('the volume column binds and the note caps the weight limit’s gauge figure at 100 %', () => {
    // 56 % of the water weight is 0.56 × 997.95 = 558.9 kg/m³, denser than ammonia's saturated
    // liquid at 333.15 K, 545.3 kg/m³ (test/reference/sat/ammonia.csv, Gao et al. 2020): the
    // weight limit would be past liquid-full, so the printed 87.5 % by volume binds.
    const T = 333.15;
    const r = check(
      { product: 'ammonia', liquidTemperature: T, peakTemperature: T },
      { designPressureGauge: psig(600) },
    );
    expect(r.fillLimit.binding).toBe('nh3-storage-aboveground-volume');
    expect(entry(r, 'nh3-storage-aboveground').gaugePercent!).toBeGreaterThan(100);
    expect(r.fillLimit.bindingNote).toContain(
      'below its weight limit of 56 % of the water weight (100 % on the gauge now)',
    );
  });
});

describe('the site’s own rule against the rule set', () => {
  it('a site figure equal to the rule set’s names the rule set (it does not lower the limit)', () => {
    const r = check({ siteRule: { maxFillingDensity: 0.42 } });
    expect(r.fillLimit.binding).toBe('h27-aboveground-small');
    expect(r.fillLimit.boundBy).toBe('rule-set');
    expect(entry(r, 'site-max-filling-density').maxMass).toBe(r.fillLimit.maxMass);
  });

  it('a site limit below the vapour already in the tank stops the gauge at 0 %, never below', () => {
    // 1 % of the water weight is 9.98 kg/m³; propane vapour at 303.15 K is 23.45 kg/m³
    // (test/reference/sat/propane.csv): no liquid at all fits under that limit.
    const r = check({
      liquidTemperature: 303.15,
      peakTemperature: 303.15,
      siteRule: { maxFillingDensity: 0.01 },
    });
    const site = entry(r, 'site-max-filling-density');
    expect(site.gaugePercent!).toBeLessThan(0);
    expect(r.fillLimit.stopAtGaugePercent).toBe(0);
    expect(r.fillLimit.boundBy).toBe('site-rule');
    expect(r.fillLimit.bindingNote).toBe(
      `This site’s own rule binds, below the rule set’s limits: ${site.description}.`,
    );
  });
});

describe('the not-liquid-full limit binds below the rule’s limits', () => {
  it('propane with a 140 °F peak: the note names it after the rule set', () => {
    // FACTS.md case 11: propane at 42 % goes liquid-full at 146.6 °F, at 45 % at 121.4 °F, so a
    // 1,000 gal tank (42 %) with a 150 °F peak is bound by the not-liquid-full limit.
    const r = check({ peakTemperature: F(150) });
    expect(r.fillLimit.binding).toBe('not-liquid-full-at-peak');
    expect(r.fillLimit.boundBy).toBe('not-liquid-full');
    expect(r.fillLimit.bindingNote).toBe(
      'The not-liquid-full limit binds below the rule’s limits: the tank must not become liquid-full at the forecast peak liquid temperature.',
    );
  });
});

describe('a reference temperature in the last half kelvin below the critical point', () => {
  // propane: Tc = 369.89 K (Lemmon et al. 2009, test/reference/fluids.csv); the core's
  // saturation curve ends 0.5 K below it (README "Limits of validity").
  const Tc = 369.890009;
  const run = (Tpeak: number) =>
    checkTank({
      tank: { waterCapacity: 1, designPressureGauge: psig(900) },
      product: 'propane',
      liquidTemperature: 288.15,
      contents: { gaugePercent: 5 },
      peakTemperature: Tpeak,
    });
  const notices = (r: ReturnType<typeof run>) =>
    r.cautions.filter((c) => c.code === 'reference-above-critical');

  it('is not called "above the critical temperature" (bug: it was, at 205.4 °F against 206.1 °F)', () => {
    for (const T of [369.5, 369.64, Tc - 0.01]) expect(notices(run(T))).toEqual([]);
    const above = notices(run(Tc + 0.5));
    expect(above).toHaveLength(1);
    expect(above[0]!.value!).toBeGreaterThan(Tc);
  });

  it('its limit lies between the critical density and the last saturated liquid, falling as T rises', () => {
    // critical density 220.48 kg/m³ (fluids.csv); no liquid can be denser near Tc than the
    // saturated liquid 0.5 K below it (the core's saturation()).
    const rhoc = 220.4781275;
    const top = saturation('propane', 369.39).rhoL; // the model's Tc is 369.89 K
    const rho = (T: number) =>
      entry(run(T), 'not-liquid-full-at-peak').maxMass / (1 - MODEL_ALLOWANCE.liquidDensity);
    let last = top;
    for (const T of [369.5, 369.64, 369.8, Tc - 0.01]) {
      const x = rho(T);
      expect(x).toBeLessThan(last);
      expect(x).toBeGreaterThan(rhoc * 0.995);
      last = x;
    }
    // the shape of the coexistence curve near Tc: ρL − ρc ∝ (Tc − T)^β, β ≈ 0.326 (3D Ising
    // value, Sengers & Levelt Sengers 1986); halfway through the last 0.5 K:
    const mid = rhoc + (top - rhoc) * 0.5 ** 0.326;
    expectRel(rho(Tc - 0.25), mid, 0.003, {
      input: 'propane at Tc − 0.25 K',
      source: 'critical scaling with β = 0.326 (Sengers & Levelt Sengers 1986)',
      kind: 'published',
      why: 'the check uses β = 1/3; the two differ by 0.5 % of ρL − ρc here',
    });
    // at and past Tc: the critical density itself
    expectRel(rho(Tc + 0.5), rhoc, 0.005, {
      input: 'propane above Tc',
      source: 'test/reference/fluids.csv critical density',
      kind: 'published',
      why: 'the model holds the reference critical density (README)',
    });
  });
});
