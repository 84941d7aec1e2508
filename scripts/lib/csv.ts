/** Minimal CSV reading for the project's own reference fixtures (no quoted commas in numeric files). */
import { readFileSync } from 'node:fs';

export function readCsv(path: string): Record<string, string>[] {
  const lines = readFileSync(path, 'utf8')
    .split(/\r?\n/)
    .filter((l) => l.trim() !== '' && !l.startsWith('#'));
  const head = splitLine(lines[0] ?? '');
  return lines.slice(1).map((l) => {
    const cells = splitLine(l);
    return Object.fromEntries(head.map((h, i) => [h, cells[i] ?? '']));
  });
}

/** Splits one CSV line, honouring double quotes around cells that contain commas. */
export function splitLine(line: string): string[] {
  const out: string[] = [];
  let cur = '';
  let quoted = false;
  for (const ch of line) {
    if (ch === '"') quoted = !quoted;
    else if (ch === ',' && !quoted) {
      out.push(cur);
      cur = '';
    } else cur += ch;
  }
  out.push(cur);
  return out;
}
