/**
 * Held-out reference points: saturation states at whole-°F temperatures from
 * test/reference/trade/saturation_properties.csv (derived from the published reference
 * equations of state named in its `# source:` line, outside this project). None of these points
 * is in the fit (scripts/fit-fluids.ts fits test/reference/sat/*.csv, rows every 5 K, and the
 * liquid-full points), and the temperatures fall between the fitted rows, so this checks the
 * model where it was not fitted (rows within 0.5 K of a fitted row are left out). Targets: the README accuracy targets (p_sat 0.5 %, ρ_L 0.5 %).
 */
import { fileURLToPath } from 'node:url';
import { describe, it } from 'vitest';
import { readCsv } from '../../scripts/lib/csv.js';
import { saturation } from '../../thermo/index.js';
import { fluidById } from '../../thermo/data/fluids.js';
import { toSI } from '../../thermo/units.js';
import { checkClose } from '../helpers/check.js';

const rows = readCsv(
  fileURLToPath(new URL('../reference/trade/saturation_properties.csv', import.meta.url)),
);
const IDS: Record<string, string> = {
  propane: 'propane',
  'n-butane': 'n-butane',
  isobutane: 'isobutane',
  ammonia: 'ammonia',
  'R-134a': 'r134a',
  R134a: 'r134a',
  'R-22': 'r22',
  R22: 'r22',
  CO2: 'carbon-dioxide',
  'carbon dioxide': 'carbon-dioxide',
};

function fitted(id: string): number[] {
  const url = new URL(`../reference/sat/${id}.csv`, import.meta.url);
  return readCsv(fileURLToPath(url)).map((r) => Number(r.T_K));
}

describe('held-out saturation points (not in the fit)', () => {
  const cases = rows
    .map((r) => ({ r, id: IDS[r.fluid!], T: toSI('temperature', Number(r.T_F), 'F') }))
    .filter((c) => c.id !== undefined && c.T < fluidById(c.id)!.Tc - 0.5)
    // Held out: at least 0.5 K from every fitted row of that fluid's table.
    .filter((c) => fitted(c.id!).every((Tk) => Math.abs(Tk - c.T) >= 0.5));
  it.each(cases.map((c) => [c.id!, c.r.T_F!, c] as const))('%s at %s °F', (id, tF, c) => {
    const s = saturation(id, c.T);
    const source = 'trade/saturation_properties.csv (held out of the fit)';
    checkClose({
      what: 'p_sat',
      input: { id, T_F: tF },
      actual: s.pAbs,
      expected: Number(c.r.p_sat_kPa_abs) * 1000,
      rtol: 0.005,
      kind: 'published',
      source,
      why: 'README target, p_sat 0.5 %',
    });
    checkClose({
      what: 'ρ_L sat',
      input: { id, T_F: tF },
      actual: s.rhoL,
      expected: Number(c.r.rho_liq_kg_m3),
      rtol: 0.005,
      kind: 'published',
      source,
      why: 'README target, ρ_L 0.5 %',
    });
  });
});
