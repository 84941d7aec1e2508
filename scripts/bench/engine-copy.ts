/**
 * The engine a blend benchmark times: this repository's thermo/, or another copy of it given as
 * the script's first argument (e.g. an older commit unpacked by
 * `git archive <rev> thermo | tar -x -C /tmp/old`), so before and after can be run back to back.
 * Shared by scripts/bench-blend.ts and scripts/bench-cold.ts.
 */
import { resolve } from 'node:path';
import { pathToFileURL } from 'node:url';

type Engine = {
  checkTank: typeof import('../../thermo/check/checkTank.js').checkTank;
  LPG_PRESETS: typeof import('../../thermo/rules/presets.js').LPG_PRESETS;
  closedTank: typeof import('../../thermo/api.js').closedTank;
  toSI: typeof import('../../thermo/units.js').toSI;
};

/** The folder of the engine timed: the first argument that is not a flag, else ../../thermo. */
export function engineRoot(argv: readonly string[] = process.argv.slice(2)): string {
  const dir = argv.find((a) => !a.startsWith('--'));
  return dir ? resolve(dir) : resolve(import.meta.dirname, '../../thermo');
}

/** Loads the engine's modules (module loading is never part of a timing). */
export async function loadEngine(root = engineRoot()): Promise<Engine> {
  const at = (p: string) => pathToFileURL(`${root}/${p}`).href;
  const check = (await import(at('check/checkTank.ts'))) as Pick<Engine, 'checkTank'>;
  const presets = (await import(at('rules/presets.ts'))) as Pick<Engine, 'LPG_PRESETS'>;
  const api = (await import(at('api.ts'))) as Pick<Engine, 'closedTank'>;
  const units = (await import(at('units.ts'))) as Pick<Engine, 'toSI'>;
  return {
    checkTank: check.checkTank,
    LPG_PRESETS: presets.LPG_PRESETS,
    closedTank: api.closedTank,
    toSI: units.toSI,
  };
}

/** The 4-component LP-gas blend both benchmarks time (the HD-5 limit preset). */
export function hd5Blend(e: Engine) {
  return e.LPG_PRESETS.find((p) => p.id === 'hd5-limit')!.product;
}
