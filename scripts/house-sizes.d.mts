/** Types of scripts/house-sizes.mjs, for the test that imports it. */
export interface Offender {
  file: string;
  lines: number;
  line?: number;
  name?: string;
}
export const MAX_FILE_LINES: number;
export const MAX_FUNCTION_LINES: number;
export function measureSource(rel: string, text: string): { lines: number; functions: Offender[] };
export function measure(
  dirs: string[],
  root?: string,
): { files: Offender[]; functions: Offender[] };
