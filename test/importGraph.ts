/**
 * The project's imports, read from the source with the TypeScript parser, for the tests that
 * check the code's structure: who imports whom, and which modules load with the first screen.
 */
import { existsSync, readFileSync, statSync } from 'node:fs';
import { dirname, join, relative, resolve } from 'node:path';
import ts from 'typescript';

/**
 * One import of a module. `static`: `import … from` or `export … from` (code that loads with the
 * importer); `dynamic`: `import()` (a separate chunk); `type`: `import type` (erased, no code).
 */
export interface ImportRef {
  specifier: string;
  kind: 'static' | 'dynamic' | 'type';
  line: number;
}

const ROOT = resolve(__dirname, '..');

/** A repository-relative path with forward slashes (`src/app/main.tsx`). */
export const repoPath = (path: string) => relative(ROOT, resolve(ROOT, path)).split('\\').join('/');

export function parseSource(path: string, text = readFileSync(resolve(ROOT, path), 'utf8')): ts.SourceFile {
  return ts.createSourceFile(
    path,
    text,
    ts.ScriptTarget.Latest,
    true,
    path.endsWith('.tsx') ? ts.ScriptKind.TSX : ts.ScriptKind.TS,
  );
}

/** `import type …`, or `import { type A, type B }` with nothing else: erased by the compiler. */
function isTypeOnlyImport(node: ts.ImportDeclaration): boolean {
  const clause = node.importClause;
  if (!clause) return false; // `import './x.css'` loads for its effect
  if (clause.phaseModifier === ts.SyntaxKind.TypeKeyword) return true;
  const named = clause.namedBindings;
  return (
    !clause.name &&
    named !== undefined &&
    ts.isNamedImports(named) &&
    named.elements.length > 0 &&
    named.elements.every((e) => e.isTypeOnly)
  );
}

/** Every import of a source (declarations, re-exports, `import()` and `require()`). */
export function importsOf(source: ts.SourceFile): ImportRef[] {
  const found: ImportRef[] = [];
  const add = (literal: ts.Expression | undefined, kind: ImportRef['kind']) => {
    if (literal && ts.isStringLiteralLike(literal)) {
      found.push({
        specifier: literal.text,
        kind,
        line: source.getLineAndCharacterOfPosition(literal.getStart()).line + 1,
      });
    }
  };
  const visit = (node: ts.Node) => {
    if (ts.isImportDeclaration(node)) add(node.moduleSpecifier, isTypeOnlyImport(node) ? 'type' : 'static');
    else if (ts.isExportDeclaration(node)) add(node.moduleSpecifier, node.isTypeOnly ? 'type' : 'static');
    else if (ts.isCallExpression(node) && node.expression.kind === ts.SyntaxKind.ImportKeyword)
      add(node.arguments[0], 'dynamic');
    else if (ts.isCallExpression(node) && ts.isIdentifier(node.expression) && node.expression.text === 'require')
      add(node.arguments[0], 'static');
    else if (ts.isImportTypeNode(node) && ts.isLiteralTypeNode(node.argument)) add(node.argument.literal, 'type');
    ts.forEachChild(node, visit);
  };
  visit(source);
  return found;
}

const EXTENSIONS = ['', '.ts', '.tsx', '/index.ts', '/index.tsx'];

/**
 * The repository file a relative specifier names, or undefined for a package (`preact`,
 * `@stdlib/…`, `node:fs`) or a virtual module (`virtual:…`).
 */
export function resolveImport(fromPath: string, specifier: string): string | undefined {
  if (!specifier.startsWith('.')) return undefined;
  const base = join(dirname(resolve(ROOT, fromPath)), specifier);
  // As TypeScript resolves: `./x.js` may name the source `./x.ts`.
  const candidates = [
    ...EXTENSIONS.map((extension) => base + extension),
    base.replace(/\.js$/u, '.ts'),
    base.replace(/\.jsx$/u, '.tsx'),
  ];
  for (const candidate of candidates) {
    if (existsSync(candidate) && statSync(candidate).isFile()) return repoPath(candidate);
  }
  throw new Error(`${fromPath}: cannot resolve ${specifier}`);
}

const SCRIPT = /\.(ts|tsx)$/u;

/**
 * The modules that load with `entry`: it and everything reached through static imports
 * (not `import()`, not `import type`). Stylesheets and JSON are listed too; only scripts are followed.
 */
export function staticImportGraph(entry: string): string[] {
  const seen = new Set<string>();
  const visit = (path: string) => {
    if (seen.has(path)) return;
    seen.add(path);
    if (!SCRIPT.test(path)) return;
    for (const ref of importsOf(parseSource(path))) {
      if (ref.kind !== 'static') continue;
      const target = resolveImport(path, ref.specifier);
      if (target) visit(target);
    }
  };
  visit(repoPath(entry));
  return [...seen].sort();
}
