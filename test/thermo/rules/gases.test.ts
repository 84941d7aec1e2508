/**
 * The product groups the US federal rules name (thermo/rules/gases.ts), called directly:
 * - LP-gas, 29 CFR 1910.110(a)(7) (CFR 2015 ed.): "composed predominantly of" propane, propylene,
 *   butanes (normal or iso) and butylenes; the project reads "predominantly" as at least 90 mol %
 *   of those with the rest ethane or n-pentane (its stated reading, gases.ts) — the boundary is
 *   checked on both sides.
 * - Refrigerant gas n.o.s., 49 CFR 173.304a(a)(2) (CFR 2015 ed.): refrigerants without a named
 *   entry (R-134a, R-404A, R-407C, R-410A … unless named; R-22 has its own 105 % entry):
 *   test/reference/trade/FACTS.md section a3.
 * - 130 °F and 131 °F (55 °C): 173.304a(a)(2) and 173.304(b); °C = (°F − 32) × 5/9.
 */
import { describe, it, expect } from 'vitest';
import {
  EXEMPT_FROM_131F,
  T_130F_K,
  T_131F_K,
  isLpGas,
  isRefrigerantNos,
  productIds,
} from '../../../thermo/rules/gases.js';
import { LPG_PRESETS } from '../../../thermo/rules/presets.js';
import { expectWithin } from '../check-helpers.js';

const mix = (...c: [string, number][]) => ({
  components: c.map(([id, moleFraction]) => ({ id, moleFraction })),
});
const custom = {
  custom: { name: 'X', molarMass: 0.05, Tc: 400, Pc: 4e6, omega: 0.2 },
};

describe('a product as ids with mole fractions', () => {
  it('a listed fluid is one component, all of it', () => {
    expect(productIds('propane')).toEqual([{ id: 'propane', x: 1 }]);
  });
  it('a blend lists its components in order; a zero share is no component', () => {
    expect(productIds(mix(['propane', 0.7], ['ammonia', 0], ['n-butane', 0.3]))).toEqual([
      { id: 'propane', x: 0.7 },
      { id: 'n-butane', x: 0.3 },
    ]);
  });
  it('a custom fluid, a missing product or components that are not a list: no ids', () => {
    expect(productIds(custom)).toBeNull();
    expect(productIds(null as never)).toBeNull();
    expect(productIds(undefined as never)).toBeNull();
    expect(productIds({ components: 'propane' } as never)).toBeNull();
    expect(productIds(42 as never)).toBeNull();
  });
});

describe('LP-gas: 29 CFR 1910.110(a)(7)', () => {
  it('each fluid the definition names is LP-gas on its own', () => {
    for (const id of ['propane', 'propylene', 'n-butane', 'isobutane', '1-butene', 'isobutene'])
      expect(isLpGas(id), id).toBe(true);
  });
  it('fluids it does not name are not, alone: ammonia, ethane, n-pentane, R-22, CO2', () => {
    for (const id of ['ammonia', 'ethane', 'n-pentane', 'r22', 'carbon-dioxide', 'dimethyl-ether'])
      expect(isLpGas(id), id).toBe(false);
    expect(isLpGas(custom)).toBe(false);
  });
  it('"predominantly": 90 mol % of the named fluids with ethane or n-pentane is LP-gas; 89 % is not', () => {
    expect(isLpGas(mix(['propane', 0.9], ['ethane', 0.1]))).toBe(true);
    expect(isLpGas(mix(['n-butane', 0.9], ['n-pentane', 0.1]))).toBe(true);
    expect(isLpGas(mix(['propane', 0.89], ['ethane', 0.11]))).toBe(false);
    expect(isLpGas(mix(['propane', 0.5], ['ethane', 0.3], ['n-pentane', 0.2]))).toBe(false);
    // 0.3 + 0.6 is 0.8999999999999999 in binary floating point: still the 90 % of the reading
    expect(isLpGas(mix(['propane', 0.3], ['propylene', 0.6], ['ethane', 0.1]))).toBe(true);
  });
  it('a blend of the named fluids is LP-gas (the 50/50 butane-propane mix of 1910.110(b)(19)(ii))', () => {
    expect(isLpGas(mix(['propane', 0.5], ['n-butane', 0.5]))).toBe(true);
    for (const p of LPG_PRESETS) expect(isLpGas(p.product), p.id).toBe(true);
  });
  it('any other component, however little, makes it not LP-gas', () => {
    expect(isLpGas(mix(['propane', 0.95], ['ammonia', 0.05]))).toBe(false);
    expect(isLpGas(mix(['propane', 0.99], ['r134a', 0.01]))).toBe(false);
  });
});

describe('refrigerant gas n.o.s.: 49 CFR 173.304a(a)(2)', () => {
  it('R-134a and the blends the entry names as examples (R-404A, R-407C, R-410A) are covered', () => {
    for (const id of ['r134a', 'r404a', 'r407c', 'r410a'])
      expect(isRefrigerantNos(id), id).toBe(true);
  });
  it('R-22 has a named entry (105 %), so it is not n.o.s.; nor are LP-gas, ammonia or CO2', () => {
    for (const id of ['r22', 'propane', 'ammonia', 'carbon-dioxide'])
      expect(isRefrigerantNos(id), id).toBe(false);
  });
  it('a blend is n.o.s. only when every component is', () => {
    expect(isRefrigerantNos(mix(['r32', 0.5], ['r125', 0.5]))).toBe(true);
    expect(isRefrigerantNos(mix(['r32', 0.5], ['propane', 0.5]))).toBe(false);
    expect(isRefrigerantNos(mix(['r22', 0.5], ['r134a', 0.5]))).toBe(false);
  });
  it('a blend with no components, or a custom fluid, is not', () => {
    expect(isRefrigerantNos({ components: [] })).toBe(false);
    expect(isRefrigerantNos(mix(['r134a', 0]))).toBe(false);
    expect(isRefrigerantNos(custom)).toBe(false);
  });
});

describe('the DOT cylinder temperatures', () => {
  it('130 °F = 54.444 °C and 131 °F = 55 °C (173.304a(a)(2), 173.304(b); °C = (°F − 32) × 5/9)', () => {
    const src = '49 CFR 173.304a(a)(2), 173.304(b); FACTS.md d4';
    expectWithin(T_130F_K, 273.15 + 490 / 9, 1e-9, { input: 130, source: src, kind: 'published' });
    expectWithin(T_131F_K, 328.15, 1e-9, { input: 131, source: src, kind: 'published' });
  });
  it('CO2 and N2O are the products 173.304(b) lets be liquid full at 131 °F', () => {
    expect([...EXEMPT_FROM_131F].sort()).toEqual(['carbon-dioxide', 'nitrous-oxide']);
  });
});
