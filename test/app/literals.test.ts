/**
 * No component renders a user-visible literal: every JSX text node and every
 * user-visible attribute (aria-label, title, placeholder, alt, label, legend) that
 * contains a letter must come from t() (or data such as a grade name), never a string literal.
 */
import { readFileSync } from 'node:fs';
import ts from 'typescript';
import { describe, expect, it } from 'vitest';
import { sourceFiles } from '../sourceFiles';

const VISIBLE_ATTRIBUTES = new Set([
  'aria-label',
  'title',
  'placeholder',
  'alt',
  'label',
  'legend',
  'hint',
  'unitLabel',
  'message',
  'aria-description',
]);
const HAS_LETTER = /\p{L}/u;

const tsxFiles = (dir: string) => sourceFiles(dir, /\.tsx$/u);

/** User-visible literals in one source text, as "line: text". */
export function visibleLiterals(fileName: string, text: string): string[] {
  const source = ts.createSourceFile(fileName, text, ts.ScriptTarget.Latest, true, ts.ScriptKind.TSX);
  const found: string[] = [];
  const report = (node: ts.Node, literal: string) => {
    const { line } = source.getLineAndCharacterOfPosition(node.getStart());
    found.push(`${fileName}:${line + 1}: ${literal.trim()}`);
  };
  const visit = (node: ts.Node) => {
    if (ts.isJsxText(node) && HAS_LETTER.test(node.text)) report(node, node.text);
    if (
      ts.isJsxExpression(node) &&
      node.expression &&
      ts.isJsxElement(node.parent) &&
      (ts.isStringLiteral(node.expression) || ts.isNoSubstitutionTemplateLiteral(node.expression))
    ) {
      if (HAS_LETTER.test(node.expression.text)) report(node, node.expression.text);
    }
    if (ts.isJsxAttribute(node) && VISIBLE_ATTRIBUTES.has(node.name.getText(source)) && node.initializer) {
      const init = node.initializer;
      const literal = ts.isStringLiteral(init)
        ? init.text
        : ts.isJsxExpression(init) &&
            init.expression &&
            (ts.isStringLiteral(init.expression) || ts.isNoSubstitutionTemplateLiteral(init.expression))
          ? init.expression.text
          : undefined;
      if (literal !== undefined && HAS_LETTER.test(literal)) report(node, literal);
    }
    ts.forEachChild(node, visit);
  };
  visit(source);
  return found;
}

describe('no user-visible literal strings in components', () => {
  it('the scanner catches text nodes and visible attributes, and lets t() calls and symbols pass', () => {
    const sample = `const A = () => <div title="Hello" aria-label={t('x')}><p>Case depth</p><b>{'Loose'}</b><i>{t('y')}</i><span>±</span><Field label="Temp" unitLabel={UNIT.pct} /></div>;`;
    expect(visibleLiterals('sample.tsx', sample).map((f) => f.split(': ')[1])).toEqual([
      'Hello',
      'Case depth',
      'Loose',
      'Temp',
    ]);
  });

  it('src/app and src/pwa components render only translated text', () => {
    const files = [...tsxFiles('src/app'), ...tsxFiles('src/pwa')];
    expect(files.length).toBeGreaterThan(15);
    const literals = files.flatMap((file) => visibleLiterals(file, readFileSync(file, 'utf8')));
    expect(literals).toEqual([]);
  });
});
