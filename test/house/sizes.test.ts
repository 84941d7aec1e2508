import { mkdirSync, mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe as suite, expect, it } from 'vitest';
import { describe, measureSizes } from '../../scripts/house-sizes.mjs';

/** A function whose text spans exactly `lines` lines, first to last. */
function fn(name: string, lines: number): string {
  const body = Array.from({ length: lines - 2 }, (_, i) => `  const v${i} = ${i};`);
  return [`export function ${name}(): void {`, ...body, '}'].join('\n');
}

suite('house sizes of the app (DEVELOPERS.md: functions ≤ 80 lines, files ≤ 400)', () => {
  it('measureSizes finds no function over 80 lines and no file over 400 in thermo/, components/ and pwa/', () => {
    const over = measureSizes(['thermo', 'components', 'pwa']);
    expect(over.map(describe)).toEqual([]);
  });

  it('measureSizes reports a function of 81 lines and a file of 401, not 80 and 400', () => {
    const root = mkdtempSync(join(tmpdir(), 'house-'));
    mkdirSync(join(root, 'x'));
    writeFileSync(join(root, 'x', 'ok.ts'), `${fn('a', 80)}\n`);
    writeFileSync(join(root, 'x', 'long-fn.ts'), `${fn('b', 81)}\n`);
    const filler = (n: number): string => Array.from({ length: n }, (_, i) => `// ${i}`).join('\n');
    writeFileSync(join(root, 'x', 'file400.ts'), `${filler(400)}\n`);
    writeFileSync(join(root, 'x', 'file401.ts'), `${filler(401)}\n`);
    writeFileSync(
      join(root, 'x', 'arrow.ts'),
      `export const c = (): void => {\n${filler(80)}\n};\n`,
    );
    const over = measureSizes(['x'], { root }).map(describe);
    expect(over).toEqual([
      'x/arrow.ts:1 c: 82 lines > 80',
      'x/file401.ts: file 401 lines > 400',
      'x/long-fn.ts:1 b: 81 lines > 80',
    ]);
  });
});
