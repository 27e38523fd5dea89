// The house rules of src, checked by `npm run deps` (part of `npm test`); docs/architecture.md
// explains them. Concept folders of src/core, lowest first:
//   common → time → sun → sky / shading → glazing → gain → load
// A folder imports only folders below it, and code outside a folder only through its index.ts.
const ORDER = ['common', 'time', 'sun', 'sky|shading', 'glazing', 'gain', 'load'];

const upward = ORDER.slice(0, -1).map((level, i) => ({
  name: `core-${level.replace('|', '-')}-imports-upward`,
  comment: `src/core/{${level}} must not import a folder above it (${ORDER.slice(i + 1).join(', ')})`,
  severity: 'error',
  from: { path: `^src/core/(${level})/` },
  to: { path: `^src/core/(${ORDER.slice(i + 1).join('|')})/` },
}));

module.exports = {
  forbidden: [
    {
      name: 'no-circular',
      comment: 'No import cycles anywhere in src.',
      severity: 'error',
      from: { path: '^src/' },
      to: { circular: true },
    },
    ...upward,
    {
      name: 'core-sky-shading-apart',
      comment: 'sky and shading stand side by side: neither imports the other.',
      severity: 'error',
      from: { path: '^src/core/(sky|shading)/' },
      to: { path: '^src/core/(sky|shading)/', pathNot: '^src/core/$1/' },
    },
    {
      name: 'core-through-index',
      comment: "Outside a concept folder, import it through its index.ts (the folder's only public door).",
      severity: 'error',
      from: { path: '^src/core/([^/]+)/' },
      to: { path: '^src/core/[^/]+/(?!index\\.ts$)[^/]+$', pathNot: '^src/core/$1/' },
    },
    {
      name: 'outside-core-through-index',
      comment: "Code outside src/core imports a concept folder only through its index.ts.",
      severity: 'error',
      from: { path: '^src/(?!core/)' },
      to: { path: '^src/core/[^/]+/(?!index\\.ts$)[^/]+$' },
    },
    {
      name: 'core-is-pure',
      comment: 'src/core imports nothing outside src/core: no Office, DOM, Node or npm packages.',
      severity: 'error',
      from: { path: '^src/core/' },
      to: { pathNot: '^src/core/' },
    },
    {
      name: 'shared-layers-below-adapters',
      comment: 'registry, demo, schedule, io and outputs sit on the core; they never import an adapter.',
      severity: 'error',
      from: { path: '^src/(registry|demo|schedule|io|outputs)/' },
      to: { path: '^src/(functions|taskpane|cli)/' },
    },
    {
      name: 'schedule-on-glossary',
      comment: 'The window-schedule format is the glossary seen as columns: it depends on the core and the registry only.',
      severity: 'error',
      from: { path: '^src/schedule/' },
      to: { path: '^src/demo/' },
    },
    {
      name: 'io-on-core-only',
      comment: 'Reading and writing user files and sheets (src/io) depends on the core only.',
      severity: 'error',
      from: { path: '^src/io/' },
      to: { path: '^src/(registry|demo|schedule)/' },
    },
    {
      name: 'shared-layers-no-node',
      comment: 'registry, demo, schedule, io and outputs also run in the add-in: no Node built-ins.',
      severity: 'error',
      from: { path: '^src/(registry|demo|schedule|io|outputs|functions|taskpane)/' },
      to: { dependencyTypes: ['core'] },
    },
    {
      name: 'outputs-on-nothing-but-core',
      comment: 'What every output shares (hourly columns, caution, palette, formulas) depends on the core at most.',
      severity: 'error',
      from: { path: '^src/outputs/' },
      to: { path: '^src/(registry|demo|schedule)/' },
    },
    {
      name: 'adapters-apart',
      comment: 'The adapters (functions, taskpane, cli) never import each other.',
      severity: 'error',
      from: { path: '^src/(functions|taskpane|cli)/' },
      to: { path: '^src/(functions|taskpane|cli)/', pathNot: '^src/$1/' },
    },
  ],
  options: {
    doNotFollow: { path: 'node_modules' },
    tsConfig: { fileName: 'tsconfig.json' },
    tsPreCompilationDeps: true,
    exclude: { path: '(^|/)node_modules/' },
  },
};
