import fs from 'node:fs';
import path from 'node:path';
import ts from 'typescript';

/*
 * The modules a browser entry loads, read from the source the way the bundler does: every
 * value import and re-export is followed, type-only imports are not (they are erased), and a
 * dynamic import() is followed only when asked (it is a chunk loaded later, maybe never).
 */

export interface ImportGraph {
  /** Project files reached, relative to the repository root. */
  files: string[];
  /** Each package specifier reached (e.g. "zod/mini"), with the first file that imports it. */
  packages: Map<string, string>;
}

const root = path.resolve(import.meta.dirname, '../..');
const { config } = ts.readConfigFile(path.join(root, 'tsconfig.json'), ts.sys.readFile);
const { options } = ts.parseJsonConfigFileContent(config, ts.sys, root);

function isTypeOnly(node: ts.ImportDeclaration | ts.ExportDeclaration): boolean {
  if (ts.isExportDeclaration(node)) return node.isTypeOnly;
  const clause = node.importClause;
  if (!clause) return false; // a bare `import './x'` runs the module
  if (clause.isTypeOnly) return true;
  const named = clause.namedBindings;
  return (
    !clause.name &&
    !!named &&
    ts.isNamedImports(named) &&
    named.elements.length > 0 &&
    named.elements.every((e) => e.isTypeOnly)
  );
}

/** Specifiers a file loads: static value imports, and dynamic ones when `dynamic`. */
function specifiersOf(file: string, dynamic: boolean): string[] {
  const source = ts.createSourceFile(file, fs.readFileSync(file, 'utf8'), ts.ScriptTarget.Latest);
  const found: string[] = [];
  const visit = (node: ts.Node) => {
    if (
      (ts.isImportDeclaration(node) || ts.isExportDeclaration(node)) &&
      node.moduleSpecifier &&
      ts.isStringLiteral(node.moduleSpecifier) &&
      !isTypeOnly(node)
    )
      found.push(node.moduleSpecifier.text);
    if (
      dynamic &&
      ts.isCallExpression(node) &&
      node.expression.kind === ts.SyntaxKind.ImportKeyword &&
      ts.isStringLiteral(node.arguments[0])
    )
      found.push(node.arguments[0].text);
    ts.forEachChild(node, visit);
  };
  visit(source);
  return found;
}

/** Walks from `entries` (repository-relative paths); `followDynamic` says per file whether its import() calls count. */
export function importGraph(
  entries: string[],
  followDynamic: (file: string) => boolean = () => true,
): ImportGraph {
  const files = new Set<string>();
  const packages = new Map<string, string>();
  const queue = entries.map((entry) => path.join(root, entry));
  while (queue.length > 0) {
    const file = queue.pop()!;
    const relative = path.relative(root, file);
    if (files.has(relative)) continue;
    files.add(relative);
    for (const specifier of specifiersOf(file, followDynamic(relative))) {
      if (!specifier.startsWith('.')) {
        if (!packages.has(specifier)) packages.set(specifier, relative);
        continue;
      }
      const resolved = ts.resolveModuleName(specifier, file, options, ts.sys).resolvedModule;
      // Style sheets and other assets resolve to nothing here: they are not code.
      if (resolved && !resolved.isExternalLibraryImport) queue.push(resolved.resolvedFileName);
    }
  }
  return { files: [...files].sort(), packages };
}
