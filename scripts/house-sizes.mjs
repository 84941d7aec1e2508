/**
 * Lists the files and functions that outgrow the house sizes: files over 400 lines, functions
 * (declarations, methods, arrows, function expressions with a body) over 80 lines.
 *
 *   node scripts/house-sizes.mjs [DIR…]     (default: thermo components pwa)
 *
 * Prints one line per offender and exits 1 when there is any. test/house/sizes.test.ts runs
 * the same measurement over thermo/.
 */
import { readdirSync, readFileSync, statSync } from 'node:fs';
import { join, relative } from 'node:path';
import { fileURLToPath } from 'node:url';
import ts from 'typescript';

export const MAX_FILE_LINES = 400;
export const MAX_FUNCTION_LINES = 80;

/** Generated files are measured by their generator, not by hand. */
const GENERATED = /(^|\/)(fitted|kij-fitted)\.ts$/;

function tsFiles(dir) {
  return readdirSync(dir).flatMap((name) => {
    const p = join(dir, name);
    if (statSync(p).isDirectory()) return tsFiles(p);
    return name.endsWith('.ts') && !name.endsWith('.d.ts') ? [p] : [];
  });
}

function functionName(node, sf) {
  if (node.name) return node.name.getText(sf);
  const parent = node.parent;
  if (parent && ts.isVariableDeclaration(parent)) return parent.name.getText(sf);
  if (parent && ts.isPropertyAssignment(parent)) return parent.name.getText(sf);
  return '(anonymous)';
}

/** Line count of one source text and its functions longer than MAX_FUNCTION_LINES. */
export function measureSource(rel, text) {
  const lines = text.split('\n').length - (text.endsWith('\n') ? 1 : 0);
  const functions = [];
  const sf = ts.createSourceFile(rel, text, ts.ScriptTarget.Latest, true);
  const visit = (node) => {
    if (ts.isFunctionLike(node) && node.body) {
      const start = sf.getLineAndCharacterOfPosition(node.getStart(sf)).line;
      const end = sf.getLineAndCharacterOfPosition(node.getEnd()).line;
      const n = end - start + 1;
      if (n > MAX_FUNCTION_LINES)
        functions.push({ file: rel, line: start + 1, name: functionName(node, sf), lines: n });
    }
    ts.forEachChild(node, visit);
  };
  visit(sf);
  return { lines, functions };
}

/** Files over MAX_FILE_LINES and functions over MAX_FUNCTION_LINES under the given folders. */
export function measure(dirs, root = process.cwd()) {
  const files = [];
  const functions = [];
  for (const dir of dirs) {
    for (const path of tsFiles(join(root, dir))) {
      const rel = relative(root, path);
      if (GENERATED.test(rel)) continue;
      const m = measureSource(rel, readFileSync(path, 'utf8'));
      if (m.lines > MAX_FILE_LINES) files.push({ file: rel, lines: m.lines });
      functions.push(...m.functions);
    }
  }
  return { files, functions };
}

if (process.argv[1] && fileURLToPath(import.meta.url) === process.argv[1]) {
  const dirs = process.argv.slice(2);
  const { files, functions } = measure(dirs.length ? dirs : ['thermo', 'components', 'pwa']);
  for (const f of files) console.log(`${f.file}: ${f.lines} lines (file, max ${MAX_FILE_LINES})`);
  for (const f of functions)
    console.log(
      `${f.file}:${f.line} ${f.name}: ${f.lines} lines (function, max ${MAX_FUNCTION_LINES})`,
    );
  console.log(`${files.length} files and ${functions.length} functions over the house sizes`);
  process.exit(files.length + functions.length > 0 ? 1 : 0);
}
