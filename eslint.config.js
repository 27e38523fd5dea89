// Lint: typescript-eslint's recommended rules plus the dependency direction of DESIGN.md —
// src/core imports nothing outside src/core (no Office, DOM or Node); the adapters (functions,
// taskpane, cli) depend on core and registry and never on each other.
const tseslint = require('typescript-eslint');

const NODE_BUILTINS = ['fs', 'path', 'os', 'child_process', 'crypto', 'stream', 'util', 'url', 'http', 'https', 'zlib', 'readline', 'worker_threads'];
const nodeBuiltinPatterns = NODE_BUILTINS.flatMap((m) => [m, `node:${m}`]);

function restrict(patterns, message) {
  return { 'no-restricted-imports': ['error', { patterns: [{ group: patterns, message }] }] };
}

module.exports = tseslint.config(
  { ignores: ['node_modules/**', 'lib/**', 'dist/**', 'coverage/**', 'test-artifacts/**', 'out/**', '*.js', 'bin/**'] },
  ...tseslint.configs.recommended,
  {
    rules: {
      '@typescript-eslint/no-unused-vars': ['error', { argsIgnorePattern: '^_', varsIgnorePattern: '^_' }],
    },
  },
  {
    files: ['src/core/**/*.ts'],
    rules: restrict(['../*', '!./*', ...nodeBuiltinPatterns, 'exceljs', 'office-*', '@microsoft/*'], 'src/core is pure: it imports only other src/core modules (DESIGN.md).'),
  },
  {
    files: ['src/registry/**/*.ts'],
    rules: restrict(['../functions/*', '../taskpane/*', '../cli/*', ...nodeBuiltinPatterns], 'src/registry depends only on src/core.'),
  },
  {
    files: ['src/demo/**/*.ts'],
    rules: restrict(['../functions/*', '../taskpane/*', '../cli/*', ...nodeBuiltinPatterns], 'src/demo is invented data on top of src/core only.'),
  },
  {
    files: ['src/schedule/**/*.ts'],
    rules: restrict(['../functions/*', '../taskpane/*', '../cli/*', '../demo/*', '../registry/*', ...nodeBuiltinPatterns], 'src/schedule is the shared window-schedule format on top of src/core only.'),
  },
  {
    files: ['src/functions/**/*.ts'],
    rules: restrict(['../taskpane/*', '../cli/*', ...nodeBuiltinPatterns], 'Adapters never import each other (DESIGN.md).'),
  },
  {
    files: ['src/taskpane/**/*.ts'],
    rules: restrict(['../functions/*', '../cli/*', ...nodeBuiltinPatterns], 'Adapters never import each other (DESIGN.md).'),
  },
  {
    files: ['src/cli/**/*.ts'],
    rules: restrict(['../functions/*', '../taskpane/*'], 'Adapters never import each other (DESIGN.md).'),
  },
);
