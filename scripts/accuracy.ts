/**
 * Measures the default model against the reference tables in test/reference/ and writes the
 * worst deviation per fluid and property into README.md between the accuracy markers.
 *
 *   npm run accuracy            (prints and updates README.md)
 *   npm run accuracy -- --check (prints only)
 *
 * Ranges are the targets: −40 °C to +50 °C, or up to 0.97·Tc where that is lower.
 * The same measurement backs test/thermo/reference.test.ts, which fails on any miss.
 */
import { readFileSync, writeFileSync } from 'node:fs';
import {
  BLEND_TARGETS,
  measureAccuracy,
  measureBlends,
  measureRefrigerantBlends,
  TARGETS,
} from '../test/reference/measure.js';

const rows = measureAccuracy();
const pct = (x: number | null) => (x === null ? '–' : `${(x * 100).toFixed(3)} %`);
const kel = (x: number | null) => (x === null ? '–' : `${x.toFixed(2)} K`);
const mark = (x: number | null, target: number) => (x !== null && x > target ? ' ✗' : '');
const lines = [
  `| fluid | p_sat | ρ_L sat | ρ_V sat | ρ compressed liquid | liquid-full T | points |`,
  `|---|---|---|---|---|---|---|`,
  ...rows.map(
    (r) =>
      `| ${r.fluid} | ${pct(r.psat)}${mark(r.psat, TARGETS.psat)} | ${pct(r.rhoL)}${mark(r.rhoL, TARGETS.rhoL)} | ${pct(r.rhoV)}${mark(r.rhoV, TARGETS.rhoV)} | ${pct(r.compressed)}${mark(r.compressed, TARGETS.compressed)} | ${kel(r.liquidFullK)}${mark(r.liquidFullK, TARGETS.liquidFullK)} | ${r.points} |`,
  ),
  '',
  `| blend (mole fractions), 233–333 K | bubble pressure | bubble liquid ρ | incipient vapour ρ | points |`,
  `|---|---|---|---|---|`,
  ...measureBlends().map(
    (b) =>
      `| ${b.mixture} | ${pct(b.bubble)}${mark(b.bubble, TARGETS.bubble)} | ${pct(b.rhoL)} | ${pct(b.rhoV)} | ${b.points} |`,
  ),
  '',
  `| refrigerant blend, 233–333 K | bubble p | dew p | bubble liquid ρ | dew vapour ρ | compressed liquid ρ | points |`,
  `|---|---|---|---|---|---|---|`,
  ...measureRefrigerantBlends().map((b) => {
    const t = BLEND_TARGETS;
    return `| ${b.blend} | ${pct(b.bubble)}${mark(b.bubble, t.bubble)} | ${pct(b.dew)}${mark(b.dew, t.dew)} | ${pct(b.rhoL)}${mark(b.rhoL, t.rhoL)} | ${pct(b.rhoV)}${mark(b.rhoV, t.rhoV)} | ${pct(b.compressed)}${mark(b.compressed, t.compressed)} | ${b.points} |`;
  }),
  '',
  `Targets: p_sat ${TARGETS.psat * 100} %, ρ_L ${TARGETS.rhoL * 100} %, ρ_V ${TARGETS.rhoV * 100} %, compressed liquid ${TARGETS.compressed * 100} %, liquid-full temperature ${TARGETS.liquidFullK} K; LP-gas blends: bubble pressure ${TARGETS.bubble * 100} %; refrigerant blends (reference: Lemmon & Jacobsen 2004, Bell 2023 mixture models, test/reference/blends/): bubble and dew pressure ${BLEND_TARGETS.bubble * 100} %, bubble liquid ρ ${BLEND_TARGETS.rhoL * 100} %, dew vapour ρ ${BLEND_TARGETS.rhoV * 100} %, compressed liquid ${BLEND_TARGETS.compressed * 100} %. ✗ marks a miss.`,
];
const table = lines.join('\n');
console.log(table);
if (!process.argv.includes('--check')) {
  const path = new URL('../README.md', import.meta.url);
  const readme = readFileSync(path, 'utf8');
  const begin = '<!-- accuracy:begin -->';
  const end = '<!-- accuracy:end -->';
  const i = readme.indexOf(begin);
  const j = readme.indexOf(end);
  if (i < 0 || j < 0) throw new Error('README.md has no accuracy markers');
  writeFileSync(path, `${readme.slice(0, i + begin.length)}\n${table}\n${readme.slice(j)}`);
  console.log('\nREADME.md updated.');
}
