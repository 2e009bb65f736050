import fs from 'node:fs';
import path from 'node:path';
import ts from 'typescript';

// `npm run shape`: files over 200 lines and functions over 40 lines, as formatted (STYLE.md's
// rule of thumb 13). A report to read, not a gate: a long function that reads best whole stays.
const FILE_LIMIT = 200;
const FUNCTION_LIMIT = 40;
const ROOTS = ['src', 'server', 'shared', 'tests', 'scripts', 'bench'];
// A test's describe/it body is a list of cases, not a function to split.
const TEST_BLOCKS = /^(describe|it|test|beforeAll|beforeEach|afterAll|afterEach)(\.\w+)?$/;

function isTestBlock(node: ts.Node, file: ts.SourceFile): boolean {
  const parent = node.parent;
  return (
    !!parent && ts.isCallExpression(parent) && TEST_BLOCKS.test(parent.expression.getText(file))
  );
}

function sourceFiles(dir: string): string[] {
  return fs.readdirSync(dir, { withFileTypes: true }).flatMap((entry) => {
    const full = path.join(dir, entry.name);
    if (entry.isDirectory()) return sourceFiles(full);
    return /\.tsx?$/.test(entry.name) ? [full] : [];
  });
}

function functionName(node: ts.Node, file: ts.SourceFile): string {
  const named = node as ts.Node & { name?: ts.Node };
  if (named.name) return named.name.getText(file);
  const parent = node.parent;
  if (parent && ts.isVariableDeclaration(parent)) return parent.name.getText(file);
  if (parent && ts.isPropertyAssignment(parent)) return parent.name.getText(file);
  if (parent && ts.isCallExpression(parent))
    return `(callback of ${parent.expression.getText(file).slice(0, 40)})`;
  return '(anonymous)';
}

function longFunctions(file: ts.SourceFile) {
  const found: Array<{ name: string; lines: number; line: number }> = [];
  const visit = (node: ts.Node) => {
    if (ts.isFunctionLike(node) && 'body' in node && node.body && !isTestBlock(node, file)) {
      const start = file.getLineAndCharacterOfPosition(node.getStart(file)).line;
      const end = file.getLineAndCharacterOfPosition(node.getEnd()).line;
      const lines = end - start + 1;
      if (lines > FUNCTION_LIMIT)
        found.push({ name: functionName(node, file), lines, line: start + 1 });
    }
    ts.forEachChild(node, visit);
  };
  visit(file);
  return found;
}

const files = ROOTS.filter((root) => fs.existsSync(root))
  .flatMap(sourceFiles)
  .sort();
const longFiles: Array<{ file: string; lines: number }> = [];
const functions: Array<{ file: string; name: string; lines: number; line: number }> = [];
for (const name of files) {
  const text = fs.readFileSync(name, 'utf8');
  const lines = text.split('\n').length - (text.endsWith('\n') ? 1 : 0);
  if (lines > FILE_LIMIT) longFiles.push({ file: name, lines });
  const kind = name.endsWith('.tsx') ? ts.ScriptKind.TSX : ts.ScriptKind.TS;
  const source = ts.createSourceFile(name, text, ts.ScriptTarget.Latest, true, kind);
  for (const fn of longFunctions(source)) functions.push({ file: name, ...fn });
}

const verbose = process.argv.includes('--list');
process.stdout.on('error', () => process.exit(0));
console.log(
  `${files.length} files; ${longFiles.length} over ${FILE_LIMIT} lines; ${functions.length} functions over ${FUNCTION_LIMIT} lines`,
);
if (verbose) {
  for (const f of longFiles.sort((a, b) => b.lines - a.lines))
    console.log(`  file ${f.lines}  ${f.file}`);
  for (const f of functions.sort((a, b) => b.lines - a.lines))
    console.log(`  fn ${f.lines}  ${f.file}:${f.line} ${f.name}`);
}
