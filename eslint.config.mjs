// ESLint flat config: typescript-eslint's recommended rules everywhere, React's hooks rules for the client
// (app/, components/), and eslint-config-prettier last so that layout is Prettier's alone.
// Not type-aware: the type-checked set took about 45 s here against 15 s, and it would run before every `npm test`.
import js from '@eslint/js';
import tseslint from 'typescript-eslint';
import reactHooks from 'eslint-plugin-react-hooks';
import prettier from 'eslint-config-prettier';
import globals from 'globals';

export default tseslint.config(
  { ignores: ['dist/**', 'node_modules/**', 'assets/**', 'coverage/**', 'web-build/**', '.expo/**', '.data/**', 'tests/artifacts/**', 'server/build/**', '.scratch/**', 'expo-env.d.ts'] },
  js.configs.recommended,
  ...tseslint.configs.recommended,
  {
    languageOptions: { globals: { ...globals.node, ...globals.browser } },
    linterOptions: { reportUnusedDisableDirectives: 'error' },
    rules: {
      // A leading underscore marks a name kept on purpose: Express's four-argument error handler, a key left out with `...rest`.
      '@typescript-eslint/no-unused-vars': ['error', { argsIgnorePattern: '^_', varsIgnorePattern: '^_', caughtErrorsIgnorePattern: '^_', ignoreRestSiblings: true }],
    },
  },
  {
    files: ['app/**/*.{ts,tsx}', 'components/**/*.{ts,tsx}'],
    ...reactHooks.configs.flat.recommended,
    rules: {
      ...reactHooks.configs.flat.recommended.rules,
      // Both are advice for the React Compiler, which this app does not use: the effects flagged set state from
      // storage, a service worker or a changed prop on purpose, and TanStack Table's hook is only "incompatible" with it.
      'react-hooks/set-state-in-effect': 'off',
      'react-hooks/incompatible-library': 'off',
    },
  },
  {
    // Issue 12's size limits: no source file over 300 lines, no function over 120, every line counted.
    ignores: ['tests/**', 'seeds/**'],
    rules: {
      'max-lines': ['error', { max: 300, skipBlankLines: false, skipComments: false }],
      'max-lines-per-function': ['error', { max: 120, skipBlankLines: false, skipComments: false, IIFEs: true }],
    },
  },
  {
    // Metro's and Babel's configuration files are CommonJS, read with require().
    files: ['**/*.js'],
    languageOptions: { sourceType: 'commonjs' },
    rules: { '@typescript-eslint/no-require-imports': 'off' },
  },
  prettier,
);
