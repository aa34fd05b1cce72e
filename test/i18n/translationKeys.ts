/**
 * The translation keys a source file can ask for, read with the TypeScript parser: literal
 * keys (`t('app.depth.title')`, or a key kept as data: `label: 'app.x.y'`) and the static
 * heads of keys built from templates (`t(\`app.models.${m}\`)` → `app.models.`). A `t()`
 * whose key cannot be read this way (`t(key)`) is reported, since no check could follow it.
 */
import ts from 'typescript';

/** The top-level names of the locale files: a string starting with one of them and a dot is a key. */
const KEY = /^(app|errors|warnings|jobs|cli)\./u;

export interface KeyUse {
  /** A whole key, or the start of every key a template can build. */
  key: string;
  kind: 'key' | 'prefix';
  where: string;
}

const isTCall = (node: ts.CallExpression) =>
  (ts.isIdentifier(node.expression) && node.expression.text === 't') ||
  (ts.isPropertyAccessExpression(node.expression) && node.expression.name.text === 't');

/** Keys and key prefixes in one source, and the `t()` calls whose key is not readable. */
export function translationKeys(source: ts.SourceFile): { uses: KeyUse[]; unreadable: string[] } {
  const uses: KeyUse[] = [];
  const unreadable: string[] = [];
  const where = (node: ts.Node) =>
    `${source.fileName}:${source.getLineAndCharacterOfPosition(node.getStart()).line + 1}`;
  /** Whether `node` (a t() argument) is a key we can read, possibly one of two branches. */
  const readable = (node: ts.Expression): boolean => {
    if (ts.isParenthesizedExpression(node)) return readable(node.expression);
    if (ts.isConditionalExpression(node)) return readable(node.whenTrue) && readable(node.whenFalse);
    if (ts.isStringLiteralLike(node)) return KEY.test(node.text);
    return ts.isTemplateExpression(node) && KEY.test(node.head.text);
  };
  const visit = (node: ts.Node) => {
    if (ts.isStringLiteralLike(node) && KEY.test(node.text))
      uses.push({ key: node.text, kind: 'key', where: where(node) });
    else if (ts.isTemplateExpression(node) && KEY.test(node.head.text))
      uses.push({ key: node.head.text, kind: 'prefix', where: where(node) });
    if (ts.isCallExpression(node) && isTCall(node)) {
      const first = node.arguments[0];
      if (!first || !readable(first)) unreadable.push(`${where(node)}: ${node.getText(source).slice(0, 80)}`);
    }
    ts.forEachChild(node, visit);
  };
  visit(source);
  return { uses, unreadable };
}

/** Every message path of a locale tree (`app.depth.title`, …). */
export function leafKeys(node: unknown, prefix = ''): string[] {
  if (typeof node !== 'object' || node === null || Object.keys(node).length === 0) return [prefix];
  return Object.entries(node).flatMap(([k, v]) => leafKeys(v, prefix ? `${prefix}.${k}` : k));
}

const PLURAL_SUFFIX = /^_(?:zero|one|two|few|many|other)$/u;

/** The messages a use can show: the key itself, its plural forms, or its subtree; for a prefix, every key starting with it. */
export function messagesOf(use: Pick<KeyUse, 'key' | 'kind'>, leaves: readonly string[]): string[] {
  if (use.kind === 'prefix') return leaves.filter((leaf) => leaf.startsWith(use.key));
  return leaves.filter(
    (leaf) =>
      leaf === use.key ||
      leaf.startsWith(`${use.key}.`) ||
      (leaf.startsWith(`${use.key}_`) && PLURAL_SUFFIX.test(leaf.slice(use.key.length))),
  );
}
