// Lint: typescript-eslint's recommended rules. The dependency rules of the house (folder order in
// src/core, index.ts as each folder's only door, no cycles, adapters apart) are checked by
// dependency-cruiser in `npm run deps` (.dependency-cruiser.js; docs/architecture.md).
const tseslint = require('typescript-eslint');

module.exports = tseslint.config(
  { ignores: ['node_modules/**', 'lib/**', 'dist/**', 'coverage/**', 'test-artifacts/**', 'out/**', '*.js', 'bin/**', 'reports/**', '.stryker-tmp/**'] },
  ...tseslint.configs.recommended,
  {
    rules: {
      '@typescript-eslint/no-unused-vars': ['error', { argsIgnorePattern: '^_', varsIgnorePattern: '^_' }],
    },
  },
);
