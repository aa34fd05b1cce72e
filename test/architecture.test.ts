/**
 * The direction of dependencies, checked on the source: app → jobs → physics (and app → physics),
 * never back. Physics is pure TypeScript (its own modules and @stdlib only, no browser globals),
 * the job log never reaches into the app, and the CLI loads neither the app nor the log.
 */
import ts from 'typescript';
import { describe, expect, it } from 'vitest';
import { importsOf, parseSource, repoPath, resolveImport, staticImportGraph } from './importGraph';
import { sourceFiles } from './sourceFiles';

interface Dependency {
  from: string;
  line: number;
  specifier: string;
  /** The repository file it names, or undefined for a package. */
  target: string | undefined;
}

function dependencies(path: string, text?: string): Dependency[] {
  return importsOf(parseSource(path, text)).map((ref) => ({
    from: path,
    line: ref.line,
    specifier: ref.specifier,
    target: resolveImport(path, ref.specifier),
  }));
}

const layer = (path: string) =>
  /^src\/(physics|jobs|app|i18n|pwa)\//u.exec(path)?.[1] ?? (path === 'src/cli.ts' ? 'cli' : 'other');

const describeDependency = (d: Dependency) => `${d.from}:${d.line} imports ${d.specifier}`;

/** Physics may import its own modules and the @stdlib math packages, nothing else. */
function physicsImportProblems(deps: Dependency[]): string[] {
  return deps
    .filter((d) => (d.target ? layer(d.target) !== 'physics' : !d.specifier.startsWith('@stdlib/')))
    .map(describeDependency);
}

const BROWSER_GLOBALS = new Set([
  'document',
  'window',
  'localStorage',
  'sessionStorage',
  'indexedDB',
  'navigator',
  'location',
  'fetch',
  'self',
  'globalThis',
]);

/** Uses of browser globals (as values, not as property names or declared names). */
function browserGlobals(path: string, text?: string): string[] {
  const source = parseSource(path, text);
  const found: string[] = [];
  const visit = (node: ts.Node) => {
    if (ts.isIdentifier(node) && BROWSER_GLOBALS.has(node.text)) {
      const parent = node.parent;
      const isMemberName =
        (ts.isPropertyAccessExpression(parent) && parent.name === node) ||
        (ts.isPropertyAssignment(parent) && parent.name === node) ||
        (ts.isQualifiedName(parent) && parent.right === node);
      const isDeclaredName =
        (ts.isVariableDeclaration(parent) ||
          ts.isParameter(parent) ||
          ts.isPropertySignature(parent) ||
          ts.isPropertyDeclaration(parent) ||
          ts.isBindingElement(parent)) &&
        parent.name === node;
      if (!isMemberName && !isDeclaredName)
        found.push(`${path}:${source.getLineAndCharacterOfPosition(node.getStart()).line + 1}: ${node.text}`);
    }
    ts.forEachChild(node, visit);
  };
  visit(source);
  return found;
}

/** Outside physics, physics is reached only through its public entry, `physics/index.ts`. */
function deepPhysicsImports(deps: Dependency[]): string[] {
  return deps
    .filter((d) => layer(d.from) !== 'physics' && d.target && layer(d.target) === 'physics')
    .filter((d) => d.target !== 'src/physics/index.ts')
    .map(describeDependency);
}

/** `app/ui` is a leaf of the app: plain widgets and formatting, which know no settings, screen or feature. */
function uiImportProblems(deps: Dependency[]): string[] {
  return deps
    .filter((d) => d.target?.startsWith('src/app/') && !d.target.startsWith('src/app/ui/'))
    .map(describeDependency);
}

/** `export * from` in a module: its public names would be whatever the modules behind it export. */
function starExports(path: string, text?: string): string[] {
  const source = parseSource(path, text);
  return source.statements
    .filter((s) => ts.isExportDeclaration(s) && !s.exportClause && s.moduleSpecifier)
    .map((s) => `${path}:${source.getLineAndCharacterOfPosition(s.getStart()).line + 1}: ${s.getText()}`);
}

/**
 * Import circles among the given modules (every import but `import()`, type imports included: a circle of
 * types is still two modules that cannot be read apart). Each circle is listed once, as the modules in it.
 */
function importCircles(graph: ReadonlyMap<string, readonly string[]>): string[][] {
  // Tarjan's strongly connected components; a component of more than one module (or a self-import) is a circle.
  let counter = 0;
  const order = new Map<string, number>();
  const low = new Map<string, number>();
  const stack: string[] = [];
  const onStack = new Set<string>();
  const circles: string[][] = [];
  const visit = (path: string) => {
    order.set(path, counter);
    low.set(path, counter++);
    stack.push(path);
    onStack.add(path);
    for (const next of graph.get(path) ?? []) {
      if (!order.has(next)) {
        visit(next);
        low.set(path, Math.min(low.get(path)!, low.get(next)!));
      } else if (onStack.has(next)) low.set(path, Math.min(low.get(path)!, order.get(next)!));
    }
    if (low.get(path) !== order.get(path)) return;
    const component: string[] = [];
    let member: string;
    do {
      member = stack.pop()!;
      onStack.delete(member);
      component.push(member);
    } while (member !== path);
    if (component.length > 1 || graph.get(path)?.includes(path)) circles.push(component.sort());
  };
  for (const path of graph.keys()) if (!order.has(path)) visit(path);
  return circles;
}

/** Who imports whom (not counting `import()`), for the given sources (`texts` stands in for files, in the samples). */
function importGraph(paths: readonly string[], texts: Record<string, string> = {}): Map<string, string[]> {
  return new Map(
    paths.map((path) => [
      path,
      importsOf(parseSource(path, texts[path]))
        .filter((ref) => ref.kind !== 'dynamic' && ref.specifier.startsWith('.'))
        .map((ref) => (texts[path] ? repoPath(`${path}/../${ref.specifier}.ts`) : resolveImport(path, ref.specifier)))
        .filter((target): target is string => target !== undefined),
    ]),
  );
}

const DEMO_LOG = 'src/app/log/demo/demoLog.ts';

const importKind = (d: Dependency) =>
  importsOf(parseSource(d.from)).find((ref) => ref.line === d.line && ref.specifier === d.specifier)?.kind;

/** String literals naming the demo plant's parts (KR-nnnn) or furnaces (F1–F3). */
function demoNames(path: string, text?: string): string[] {
  const source = parseSource(path, text);
  const found: string[] = [];
  const visit = (node: ts.Node) => {
    if (ts.isStringLiteralLike(node)) {
      for (const m of node.text.matchAll(/\bKR-\d{4}\b|^F[1-3]$/gu)) found.push(`${path}: ${m[0]}`);
    }
    ts.forEachChild(node, visit);
  };
  visit(source);
  return found;
}

const files = (dir: string) => sourceFiles(dir).map(repoPath);
const physics = files('src/physics');
const jobs = files('src/jobs');

describe('architecture: the direction of dependencies', () => {
  it('has sources in each layer', () => {
    expect(physics.length).toBeGreaterThan(20);
    expect(jobs.length).toBeGreaterThan(10);
  });

  it('the checks see what they look for (samples)', () => {
    const sample = (path: string, text: string) => dependencies(path, text);
    expect(
      physicsImportProblems(
        sample(
          'src/physics/x.ts',
          "import { h } from 'preact'; import erfc from '@stdlib/math-base-special-erfc'; import { a } from './units'; import { b } from '../app/ui/format'; const c = await import('idb');",
        ),
      ),
    ).toEqual([
      'src/physics/x.ts:1 imports preact',
      'src/physics/x.ts:1 imports ../app/ui/format',
      'src/physics/x.ts:1 imports idb',
    ]);
    expect(
      deepPhysicsImports(
        sample(
          'src/app/x/y.ts',
          "import { a } from '../../physics'; import { b } from '../../physics/index'; import type { C } from '../../physics/cycle/recipe'; const d = await import('../../physics/planner/planner');",
        ),
      ),
    ).toEqual([
      'src/app/x/y.ts:1 imports ../../physics/cycle/recipe',
      'src/app/x/y.ts:1 imports ../../physics/planner/planner',
    ]);
    expect(deepPhysicsImports(sample('src/physics/cycle/x.ts', "import { a } from '../units';"))).toEqual([]);
    expect(
      uiImportProblems(
        sample(
          'src/app/ui/x.tsx',
          "import { a } from './format'; import { b } from '../../physics'; import type { C } from '../settings/state'; import { d } from '../depth/state'; import { e } from '../../i18n/useT';",
        ),
      ),
    ).toEqual(['src/app/ui/x.tsx:1 imports ../settings/state', 'src/app/ui/x.tsx:1 imports ../depth/state']);
    expect(
      starExports(
        'src/physics/index.ts',
        "export { a, type B } from './a';\nexport * from './c';\nexport * as d from './d';",
      ).map((line) => line.split(': ')[1]),
    ).toEqual(["export * from './c';"]);
    expect(
      importCircles(
        importGraph(['src/a.ts', 'src/b.ts', 'src/c.ts', 'src/d.ts'], {
          'src/a.ts': "import { b } from './b';",
          'src/b.ts': "import type { C } from './c';",
          'src/c.ts': "import { a } from './a'; const d = await import('./d');",
          'src/d.ts': "import { c } from './c';",
        }),
      ),
    ).toEqual([['src/a.ts', 'src/b.ts', 'src/c.ts']]);
    expect(
      browserGlobals(
        'src/physics/x.ts',
        'const a = window.innerWidth; const b = { document: 1 }; const c = x.localStorage; function f(navigator: string) { return indexedDB; }',
      ).map((f) => f.split(': ')[1]),
    ).toEqual(['window', 'indexedDB']);
  });

  it('physics imports only physics modules and @stdlib packages', () => {
    expect(physics.flatMap((path) => physicsImportProblems(dependencies(path)))).toEqual([]);
  });

  it('physics uses no browser globals (document, window, storage, IndexedDB, network)', () => {
    expect(physics.flatMap((path) => browserGlobals(path))).toEqual([]);
  });

  it('the job log imports physics and packages, never the app, the service worker code or i18n', () => {
    const wrong = jobs
      .flatMap((path) => dependencies(path))
      .filter((d) =>
        d.target ? !['jobs', 'physics'].includes(layer(d.target)) : /^(preact|@preact\/|i18next)/u.test(d.specifier),
      );
    expect(wrong.map(describeDependency)).toEqual([]);
  });

  it('outside physics, physics is imported only through physics/index.ts, which names every export', () => {
    const outside = files('src').filter((path) => layer(path) !== 'physics');
    expect(outside.flatMap((path) => deepPhysicsImports(dependencies(path)))).toEqual([]);
    expect(starExports('src/physics/index.ts')).toEqual([]);
  });

  it('app/ui imports nothing of the app outside app/ui (no settings, screens or features)', () => {
    const ui = files('src/app/ui');
    expect(ui.length).toBeGreaterThan(10);
    expect(ui.flatMap((path) => uiImportProblems(dependencies(path)))).toEqual([]);
  });

  it('no import circles anywhere in the source (type imports count; import() does not)', () => {
    const all = files('src');
    expect(all.length).toBeGreaterThan(100);
    expect(importCircles(importGraph(all))).toEqual([]);
  });

  it('the demo log loads only through the explicit action: one import(), from the log files view', () => {
    const intoDemo = files('src')
      .flatMap((path) => dependencies(path))
      .filter((d) => d.target === DEMO_LOG);
    expect(intoDemo.map((d) => `${d.from} ${importKind(d)}`)).toEqual(['src/app/log/DemoData.tsx dynamic']);
  });

  it('no production source outside the demo log names a demo part number or furnace (text in code, not comments)', () => {
    expect(demoNames('src/app/x.ts', "const picks = ['KR-2231', 'F2']; // KR-4410 in a comment is fine")).toEqual([
      'src/app/x.ts: KR-2231',
      'src/app/x.ts: F2',
    ]);
    expect(
      files('src')
        .filter((path) => path !== DEMO_LOG)
        .flatMap((path) => demoNames(path)),
    ).toEqual([]);
  });

  it('the CLI loads neither the app nor the job log (its whole static import graph)', () => {
    const reached = staticImportGraph('src/cli.ts');
    expect(reached).toContain('src/physics/caseDepth.ts');
    expect(reached.filter((path) => ['app', 'jobs', 'pwa'].includes(layer(path)))).toEqual([]);
  });

  it('nothing outside the app imports the app, and nothing imports the build tooling but the config', () => {
    const outside = [...physics, ...jobs, ...files('src/i18n'), ...files('src/pwa'), 'src/cli.ts'];
    const intoApp = outside.flatMap((path) => dependencies(path)).filter((d) => d.target && layer(d.target) === 'app');
    expect(intoApp.map(describeDependency)).toEqual([]);
    const intoBuild = files('src')
      .flatMap((path) => dependencies(path))
      .filter((d) => d.target?.startsWith('src/i18n/build/') && !d.from.startsWith('src/i18n/build/'));
    expect(intoBuild.map(describeDependency)).toEqual([]);
  });
});
