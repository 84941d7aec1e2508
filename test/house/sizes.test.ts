/**
 * House sizes (project rule, DEVELOPERS.md): no file over 400 lines and no function over 80
 * lines in thermo/. Measured by scripts/house-sizes.mjs, which lists the offenders by hand too.
 */
import { describe, expect, it } from 'vitest';
import {
  MAX_FILE_LINES,
  MAX_FUNCTION_LINES,
  measure,
  measureSource,
} from '../../scripts/house-sizes.mjs';

interface Offender {
  file: string;
  lines: number;
  name?: string;
  line?: number;
}


describe('house sizes in thermo/', () => {
  const { files, functions } = measure(['thermo']) as {
    files: Offender[];
    functions: Offender[];
  };

  it(`has no file over ${MAX_FILE_LINES} lines`, () => {
    expect(files.map((f) => `${f.file}: ${f.lines} lines`)).toEqual([]);
  });

  it(`has no function over ${MAX_FUNCTION_LINES} lines`, () => {
    expect(functions.map((f) => `${f.file}:${f.line} ${f.name}: ${f.lines} lines`)).toEqual([]);
  });

  it('counts a function from its first to its last line, arrows and methods included', () => {
    // Hand-built source: a declaration of 81 lines (over), an arrow of exactly 80 (not over),
    // a method of 82 (over); a 401-line text is one line over the file size.
    const body = (n: number) => Array.from({ length: n - 2 }, (_, i) => `  x += ${i};`).join('\n');
    const src = [
      `function long(x: number) {\n${body(81)}\n}`,
      `const edge = (x: number) => {\n${body(80)}\n};`,
      `class A {\n  m(x: number) {\n${body(82)}\n  }\n}`,
    ].join('\n');
    const m = measureSource('fixture.ts', src) as { lines: number; functions: Offender[] };
    expect(m.functions.map((f) => [f.name, f.lines])).toEqual([
      ['long', 81],
      ['m', 82],
    ]);
    expect(m.lines).toBe(81 + 80 + 82 + 2);
  });
});
