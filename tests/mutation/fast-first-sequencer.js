/**
 * Test files and their order for mutation runs only (jest.mutation.config.js).
 *
 * - When Stryker asks for some tests by name (a mutant's covering tests), only the files that hold
 *   one of them run (names recorded by tests/mutation/bail-environment.js in the initial run; a file
 *   not recorded always runs).
 * - Files that failed last time go first (a test that killed the previous mutant often kills the
 *   next), then the quickest, so that with the bail environment a killed mutant costs little. Jest's
 *   own order runs the slowest first, which suits parallel workers, not this.
 */
// eslint-disable-next-line @typescript-eslint/no-require-imports -- jest loads this file as CommonJS
const Sequencer = require('@jest/test-sequencer').default;
// eslint-disable-next-line @typescript-eslint/no-require-imports -- jest loads this file as CommonJS
const { testFiles } = require('./test-files');

class FastFirstSequencer extends Sequencer {
  constructor(options) {
    super(options);
    this.namePattern = options?.globalConfig?.testNamePattern;
  }

  sort(tests) {
    let chosen = tests;
    if (this.namePattern && tests.length > 0) {
      const pattern = new RegExp(this.namePattern, 'i');
      const files = testFiles(tests[0].context.config.rootDir);
      const holding = tests.filter((test) => {
        const names = files.get(test.path);
        return names === undefined || [...names].some((name) => pattern.test(name));
      });
      if (holding.length > 0) chosen = holding;
    }
    const known = chosen.map((test) => ({ test, failed: this.hasFailed(test), time: this.time(test) ?? Number.POSITIVE_INFINITY }));
    known.sort((a, b) => (a.failed !== b.failed ? (a.failed ? -1 : 1) : a.time - b.time || (a.test.path < b.test.path ? -1 : 1)));
    return known.map((k) => k.test);
  }
}

module.exports = FastFirstSequencer;
