import js from '@eslint/js';
import globals from 'globals';
import tseslint from 'typescript-eslint';

export default tseslint.config(
  {
    ignores: [
      'dist/**',
      'node_modules/**',
      'coverage/**',
      'dev-dist/**',
      '.reports/**',
      '.stryker-tmp/**',
    ],
  },
  js.configs.recommended,
  ...tseslint.configs.recommended,
  {
    rules: {
      '@typescript-eslint/no-explicit-any': 'error',
      '@typescript-eslint/no-unused-vars': [
        'error',
        { argsIgnorePattern: '^_', ignoreRestSiblings: true },
      ],
    },
  },
  // Plain JavaScript run by Node: scripts and tool configs.
  {
    files: ['**/*.mjs', '**/*.cjs', '*.config.js'],
    languageOptions: { globals: globals.node },
  },
  // Plain JavaScript service-worker fixtures used by the browser tests.
  {
    files: ['test/components/fixtures/*.js'],
    languageOptions: { globals: globals.serviceworker },
  },
);
