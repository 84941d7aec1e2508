export const MAX_FUNCTION_LINES: number;
export const MAX_FILE_LINES: number;
export interface Offence {
  file: string;
  name?: string;
  line?: number;
  lines: number;
  limit: number;
}
export function tsFiles(dir: string): string[];
export function measureFile(path: string): {
  path: string;
  fileLines: number;
  functions: { name: string; line: number; lines: number }[];
};
export function measureSizes(
  dirs: string[],
  options?: { root?: string; exclude?: (file: string) => boolean },
): Offence[];
export function describe(o: Offence): string;
