// @ts-check
/**
 * Mutation testing of the core's shading, sky, glazing and gain folders (StrykerJS). See DEVELOPERS.md,
 * section "Mutation testing", for the commands, the run times and the latest scores.
 *
 * `npm run mutation` mutates all four folders; `npm run mutation:<folder>` (or SUNPANE_MUTATE=<folder>)
 * one of them, with its own incremental file and reports, so that a run of one folder keeps the
 * others' results. Incremental results and reports live in reports/mutation/ (git-ignored: a cache of
 * one machine's run that changes with every edit of the core or its tests).
 */
const AREAS = ['shading', 'sky', 'glazing', 'gain'];
const only = process.env.SUNPANE_MUTATE;
if (only !== undefined && !AREAS.includes(only)) {
  throw new Error(`SUNPANE_MUTATE is "${only}"; it must be one of ${AREAS.join(', ')} (or unset for all four).`);
}
const areas = only ? [only] : AREAS;
const name = only ?? 'core';

/** @type {import('@stryker-mutator/api/core').PartialStrykerOptions} */
export default {
  packageManager: 'npm',
  testRunner: 'jest',
  jest: {
    projectType: 'custom',
    configFile: 'jest.mutation.config.js',
    // Each mutant runs only the test files that import its source file (directly or not).
    enableFindRelatedTests: true,
  },
  coverageAnalysis: 'perTest',
  // Mutants in code run while modules load (tables and constants built at import, such as the
  // Kasten–Young power table and the horizon air mass) would each need the whole test set; they are
  // left out of the run and reported as ignored (DEVELOPERS.md gives their count per folder).
  ignoreStatic: true,
  // The machine is shared: one test process at a time.
  concurrency: 1,
  // The first run of the tests (the one that records which test covers which mutant) runs in one
  // process and, over a whole folder, outlasts Stryker's default 5 minutes: shading took 13 min 47 s
  // on the quiet two-core machine (2026-12-04), and `npm run mutation:shading` stopped at 5 minutes.
  dryRunTimeoutMinutes: 45,
  mutate: [
    ...areas.map((area) => `src/core/${area}/**/*.ts`),
    // Re-exports and type declarations: nothing that runs, nothing to mutate.
    ...areas.map((area) => `!src/core/${area}/index.ts`),
    ...areas.map((area) => `!src/core/${area}/types.ts`),
  ],
  ignorePatterns: ['dist', 'lib', 'out', 'coverage', 'test-artifacts'],
  incremental: true,
  incrementalFile: `reports/mutation/${name}-incremental.json`,
  reporters: ['clear-text', 'progress', 'html', 'json'],
  htmlReporter: { fileName: `reports/mutation/${name}.html` },
  jsonReporter: { fileName: `reports/mutation/${name}.json` },
  thresholds: { high: 90, low: 80, break: null },
  tempDirName: '.stryker-tmp',
};
