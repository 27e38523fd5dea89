/**
 * Test environment for mutation runs only (jest.mutation.config.js).
 *
 * - Once a test has failed with a mutant active, that mutant is killed, so the remaining tests of the
 *   run fail at once instead of doing their work. Stryker's jest runner cannot stop jest itself (jest
 *   has no programmatic bail), and without this every killed mutant would cost as much as a survivor.
 * - In the initial run (no mutant active) it records which test names each file holds
 *   (tests/mutation/test-files.js), for the sequencer.
 *
 * Otherwise it is the node environment unchanged.
 */
// eslint-disable-next-line @typescript-eslint/no-require-imports -- jest loads this file as CommonJS
const { TestEnvironment } = require('jest-environment-node');
// eslint-disable-next-line @typescript-eslint/no-require-imports -- jest loads this file as CommonJS
const { recordTest, saveTestFiles } = require('./test-files');

const ACTIVE_MUTANT = '__STRYKER_ACTIVE_MUTANT__';
/** The mutant for which a test has failed in this process (a run of each mutant sets its own id). */
let killed;

/** A test's full name as jest matches it against a test name pattern: its describe blocks and its own name. */
function fullName(test) {
  const titles = [];
  for (let block = test; block !== undefined && block.parent !== undefined; block = block.parent) titles.unshift(block.name);
  return titles.join(' ');
}

class BailEnvironment extends TestEnvironment {
  constructor(config, context) {
    super(config, context);
    this.rootDir = config.projectConfig.rootDir;
    this.testPath = context.testPath;
  }

  async handleTestEvent(event, state) {
    if (typeof super.handleTestEvent === 'function') await super.handleTestEvent(event, state);
    const mutant = process.env[ACTIVE_MUTANT];
    if (mutant === undefined) {
      if (event.name === 'test_start') recordTest(this.rootDir, this.testPath, fullName(event.test));
      if (event.name === 'run_finish') saveTestFiles(this.rootDir);
      return;
    }
    if (event.name === 'test_done' && event.test.errors.length > 0) killed = mutant;
    if (event.name === 'test_start' && killed === mutant) {
      event.test.fn = () => {
        throw new Error(`mutant ${mutant} already killed by an earlier test`);
      };
    }
  }
}

module.exports = BailEnvironment;
