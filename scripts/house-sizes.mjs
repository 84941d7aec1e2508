// House sizes: functions over 80 lines and files over 400 lines (the limits of DEVELOPERS.md).
// Usage: node scripts/house-sizes.mjs [dir ...]   (default: thermo components pwa)
// Exits 1 when anything is over. `measureSizes()` is also used by test/house/*.test.ts.
import { readdirSync, readFileSync, statSync } from 'node:fs';
import { join, relative } from 'node:path';
import { fileURLToPath } from 'node:url';
import ts from 'typescript';

export const MAX_FUNCTION_LINES = 80;
export const MAX_FILE_LINES = 400;

/** Every .ts file under `dir` (not .d.ts), sorted. */
export function tsFiles(dir) {
  const out = [];
  for (const name of readdirSync(dir).sort()) {
    const path = join(dir, name);
    if (statSync(path).isDirectory()) out.push(...tsFiles(path));
    else if (name.endsWith('.ts') && !name.endsWith('.d.ts')) out.push(path);
  }
  return out;
}

function functionName(node, sf) {
  if (node.name) return node.name.getText(sf);
  const parent = node.parent;
  if (
    parent &&
    (ts.isVariableDeclaration(parent) ||
      ts.isPropertyAssignment(parent) ||
      ts.isPropertyDeclaration(parent))
  )
    return parent.name.getText(sf);
  if (ts.isConstructorDeclaration(node)) return 'constructor';
  return '(anonymous)';
}

/** Lines of the file and of every function-like node with a body (first line to last, inclusive). */
export function measureFile(path) {
  const text = readFileSync(path, 'utf8');
  const sf = ts.createSourceFile(path, text, ts.ScriptTarget.Latest, true);
  const fileLines = text.split('\n').length - (text.endsWith('\n') ? 1 : 0);
  const functions = [];
  const visit = (node) => {
    if (ts.isFunctionLike(node) && node.body) {
      const start = sf.getLineAndCharacterOfPosition(node.getStart(sf)).line;
      const end = sf.getLineAndCharacterOfPosition(node.getEnd()).line;
      functions.push({ name: functionName(node, sf), line: start + 1, lines: end - start + 1 });
    }
    ts.forEachChild(node, visit);
  };
  visit(sf);
  return { path, fileLines, functions };
}

/** Offences under the given directories: `{ file, name?, line?, lines, limit }`. */
export function measureSizes(dirs, { root = process.cwd(), exclude = () => false } = {}) {
  const over = [];
  for (const dir of dirs) {
    for (const path of tsFiles(join(root, dir))) {
      const file = relative(root, path).split('\\').join('/');
      if (exclude(file)) continue;
      const m = measureFile(path);
      if (m.fileLines > MAX_FILE_LINES)
        over.push({ file, lines: m.fileLines, limit: MAX_FILE_LINES });
      for (const f of m.functions)
        if (f.lines > MAX_FUNCTION_LINES)
          over.push({
            file,
            name: f.name,
            line: f.line,
            lines: f.lines,
            limit: MAX_FUNCTION_LINES,
          });
    }
  }
  return over;
}

export function describe(o) {
  return o.name === undefined
    ? `${o.file}: file ${o.lines} lines > ${o.limit}`
    : `${o.file}:${o.line} ${o.name}: ${o.lines} lines > ${o.limit}`;
}

if (process.argv[1] && fileURLToPath(import.meta.url) === process.argv[1]) {
  const dirs = process.argv.slice(2);
  const over = measureSizes(dirs.length ? dirs : ['thermo', 'components', 'pwa']);
  for (const o of over) console.log(describe(o));
  console.log(over.length ? `${over.length} over the house sizes` : 'all within the house sizes');
  process.exitCode = over.length ? 1 : 0;
}
