// The heating chart's series computed in the chart worker (components/chart-worker.ts, started by
// components/chart-client.ts): the points it returns are the closed tank's states, so in the
// two-phase region the pressure is the saturation pressure. Checked against propane's reference
// saturation table, test/reference/sat/propane.csv (Lemmon, McLinden, Wagner 2009, J. Chem. Eng.
// Data 54, 3141–3180), within the model's accuracy for propane's p_sat in README.md (0.148 %;
// 0.3 % allowed).
import { expect } from '@open-wc/testing';
import { curveFor } from '../../components/chart-client.js';

describe('chart worker', () => {
  it('returns the closed-tank curve of propane, on the saturation pressure while two-phase', async function () {
    this.timeout(30_000);
    expect(typeof Worker).to.equal('function');
    const curve = await curveFor({
      product: 'propane',
      // 300 kg/m³ of propane is two-phase from 283 to 308 K (ρV < 300 < ρL all the way).
      result: {
        peak: { temperature: 303.15 },
        liquidFullTemperature: null,
        contents: { overallDensity: 300 },
      } as never,
      Tnow: 293.15,
    });
    expect(curve).to.not.equal(null);
    const at = (T: number) => curve!.points.find((p) => Math.abs(p.T - T) < 1e-9);
    // (checkClose is vitest-only; the same relative test here.) Rows of the reference table:
    const rows: [number, number][] = [
      [293.15, 836460.905],
      [303.15, 1078995.227],
    ];
    for (const [T, pRef] of rows) {
      const p = at(T)?.pAbs ?? Number.NaN;
      expect(Math.abs(p / pRef - 1), `p at ${T} K: ${p} Pa against ${pRef} Pa`).to.be.below(0.003);
    }
  });
});
