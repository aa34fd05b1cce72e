// Lint for the whole tree: type-aware TypeScript rules and the hooks rules. Formatting is prettier's job.
import js from '@eslint/js';
import reactHooks from 'eslint-plugin-react-hooks';
import { defineConfig, globalIgnores } from 'eslint/config';
import globals from 'globals';
import tseslint from 'typescript-eslint';

export default defineConfig([
  globalIgnores(['dist/', 'dev-dist/', 'coverage/', 'test-results/', 'node_modules/']),
  js.configs.recommended,
  tseslint.configs.strictTypeChecked,
  tseslint.configs.stylisticTypeChecked,
  reactHooks.configs.flat.recommended,
  {
    languageOptions: {
      parserOptions: { projectService: true, tsconfigRootDir: import.meta.dirname },
      globals: { ...globals.browser, ...globals.node },
    },
    linterOptions: { reportUnusedDisableDirectives: 'error' },
    rules: {
      // With noUncheckedIndexedAccess every array read is `T | undefined`; `xs[i]!` marks an index that is
      // in range by construction (solver loops, fixtures), where a run-time check would be dead code.
      '@typescript-eslint/no-non-null-assertion': 'off',
      // `onClick={() => setOpen(false)}` returns nothing useful and reads plainly.
      '@typescript-eslint/no-confusing-void-expression': ['error', { ignoreArrowShorthand: true }],
      // Numbers in messages and keys (`step ${i}`) are meant; objects and undefined are still refused.
      '@typescript-eslint/restrict-template-expressions': ['error', { allowNumber: true }],
      // `const { kind: _kind, ...rest } = x` drops a field on purpose; `_` marks a parameter kept for its place.
      '@typescript-eslint/no-unused-vars': [
        'error',
        { argsIgnorePattern: '^_', varsIgnorePattern: '^_', caughtErrorsIgnorePattern: '^_', ignoreRestSiblings: true },
      ],
      // In forms an empty text is as missing as no text: `typed || fallback` is meant there.
      '@typescript-eslint/prefer-nullish-coalescing': ['error', { ignorePrimitives: { string: true } }],
      // node:test's describe/it return promises the runner itself awaits.
      '@typescript-eslint/no-floating-promises': [
        'error',
        { allowForKnownSafeCalls: [{ from: 'package', package: 'node:test', name: ['describe', 'it', 'test'] }] },
      ],
    },
  },
  {
    files: ['test/**'],
    rules: {
      // JSON read back from the CLI, files and pages, and vitest's asymmetric matchers (`expect.closeTo`), are `any`.
      '@typescript-eslint/no-unsafe-assignment': 'off',
      '@typescript-eslint/no-unsafe-member-access': 'off',
      '@typescript-eslint/no-unsafe-return': 'off',
      // Test doubles implement async interfaces without awaiting, stub hooks with empty bodies, and wrap
      // prototype methods they call back with their own `this`.
      '@typescript-eslint/require-await': 'off',
      '@typescript-eslint/no-empty-function': 'off',
      '@typescript-eslint/unbound-method': 'off',
    },
  },
  {
    // Plain JavaScript (this file, the CommonJS shim) is not in the TypeScript project.
    files: ['**/*.{js,cjs,mjs}'],
    extends: [tseslint.configs.disableTypeChecked],
  },
  {
    files: ['**/*.cjs'],
    languageOptions: { sourceType: 'commonjs' },
  },
]);
