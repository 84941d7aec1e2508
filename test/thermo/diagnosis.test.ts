/** The gauge diagnosis: band, verdict, causes, propane/butane split, temperature for a reading. */
import { describe, it, expect } from 'vitest';
import { fileURLToPath } from 'node:url';
import { readCsv } from '../../scripts/lib/csv.js';
import { propaneSplit } from '../../thermo/check/diagnosis.js';
import { checkTank, type TankCheckInput } from '../../thermo/index.js';
import { fromSI, toSI } from '../../thermo/units.js';
import { expectWithin } from './check-helpers.js';

const F = (x: number) => toSI('temperature', x, 'F');
const psig = (x: number) => toSI('gaugePressure', x, 'psig');
const input = (reading: number, over: Partial<TankCheckInput> = {}): TankCheckInput => ({
  tank: { waterCapacity: toSI('volume', 500, 'usgal'), designPressureGauge: psig(250) },
  product: 'propane',
  liquidTemperature: F(80),
  contents: { gaugePercent: 50 },
  pressureReadingGauge: psig(reading),
  peakTemperature: F(95),
  ...over,
});

describe('propaneSplit', () => {
  it('propaneSplit recovers the propane fraction of reference propane/n-butane bubble points', () => {
    // published: bubble pressures from the GERG-2008 mixture model (Kunz & Wagner 2012, J. Chem.
    // Eng. Data 57, 3032) with the pure reference equations, test/reference/bubble.csv.
    // Tolerance 0.05 mole fraction: the split is an ideal-solution (Raoult) estimate; real
    // propane/n-butane bubble pressures lie a few percent below Raoult at 300–330 K.
    const rows = readCsv(fileURLToPath(new URL('../reference/bubble.csv', import.meta.url))).filter(
      (r) => Number(r.x_ethane) === 0,
    );
    expect(rows.length).toBeGreaterThan(10);
    for (const r of rows) {
      const x = propaneSplit(Number(r.T_K), Number(r.p_bubble_Pa));
      expect(x).not.toBeNull();
      expectWithin(x!, Number(r.x_propane), 0.05, {
        input: `${r.mixture} at ${r.T_K} K`,
        source: 'test/reference/bubble.csv (GERG-2008)',
        kind: 'published',
        why: 'ideal-solution estimate',
      });
    }
  });
});

describe('checkTank diagnosis', () => {
  it('checkTank finds a reading at the propane vapour pressure within the band', () => {
    // published [EOS]: propane at 80 °F = 129.3 psig (FACTS case 7; saturation_properties.csv)
    const r = checkTank(input(129.3));
    expect(r.diagnosis!.verdict).toBe('fits');
    expect(r.diagnosis!.causes).toEqual([]);
    // identity: default band = 2 % of full scale (the design pressure) + 0.5 % of the absolute pressure
    expectWithin(r.diagnosis!.tolerance, 0.02 * psig(250) + 0.005 * r.pAbs, 1e-6, {
      input: 'defaults',
      source: 'checkTank doc',
      kind: 'identity',
    });
    // the reading's temperature is 80 °F within 0.5 °F (129.3 psig printed to 0.1 psi ≈ 0.05 °F; core ±0.5 % VP ≈ 0.4 °F)
    expectWithin(fromSI('temperature', r.diagnosis!.temperatureForReading!, 'F'), 80, 0.5, {
      input: '129.3 psig',
      source: 'FACTS case 7 / saturation_properties.csv',
      kind: 'published',
    });
    // identity: at pure propane's own pressure the split is all propane
    expectWithin(r.diagnosis!.propaneFraction!, 1, 0.01, {
      input: '129.3 psig',
      source: 'definition',
      kind: 'identity',
    });
  });
  it('checkTank calls a reading 20 psi high "high" and names non-condensable gas first', () => {
    const r = checkTank(input(150));
    expect(r.diagnosis!.verdict).toBe('high');
    expect(r.diagnosis!.causes[0]).toMatch(/non-condensable/);
    expect(r.cautions.map((c) => c.code)).toContain('pressure-high');
  });
  it('checkTank calls a low reading "low" and estimates the propane/butane split', () => {
    const r = checkTank(input(100));
    expect(r.diagnosis!.verdict).toBe('low');
    expect(r.diagnosis!.causes.join(' ')).toMatch(/butane/);
    const x = r.diagnosis!.propaneFraction!;
    expect(x).toBeGreaterThan(0.5);
    expect(x).toBeLessThan(0.95);
    expect(r.cautions.find((c) => c.code === 'pressure-low')!.message).toMatch(/% propane/);
  });
  it('checkTank widens the band with a coarser gauge', () => {
    const r = checkTank({
      ...input(140),
      pressureGauge: { fullScaleGauge: psig(600), accuracy: 0.025 },
    });
    expect(r.diagnosis!.verdict).toBe('fits');
  });
  it('checkTank says a liquid-full tank may be why a reading is high', () => {
    const r = checkTank(
      input(190, {
        contents: { netMass: 0.5 * toSI('volume', 500, 'usgal') * 997.95 },
        liquidTemperature: F(100),
        peakTemperature: F(100),
      }),
    );
    expect(r.phase).toBe('liquid-full');
    expect(r.diagnosis!.causes.join(' ')).toMatch(/liquid-full/);
  });
});
