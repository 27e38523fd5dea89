/**
 * Which test names each test file holds, for mutation runs only: the bail environment records them as
 * tests start (in Stryker's initial run every test runs), and the sequencer uses them to run only the
 * files that hold a test covering the mutant. Stryker's jest runner selects tests by name alone, so
 * without this every related file would be loaded (a second or more each) for every mutant.
 *
 * Kept in memory and, to outlive a restart of the test process (after a timed-out mutant), in a file
 * in jest's root directory (Stryker's sandbox copy of the project).
 */
// eslint-disable-next-line @typescript-eslint/no-require-imports -- jest loads this file as CommonJS
const fs = require('fs');
// eslint-disable-next-line @typescript-eslint/no-require-imports -- jest loads this file as CommonJS
const path = require('path');

const KEY = Symbol.for('sunpane.mutation.testFiles');
const FILE_NAME = '.mutation-test-files.json';

/** The map of test file → set of full test names for a jest root directory. */
function testFiles(rootDir) {
  const all = (globalThis[KEY] ??= new Map());
  let files = all.get(rootDir);
  if (files === undefined) {
    files = new Map();
    try {
      const saved = JSON.parse(fs.readFileSync(path.join(rootDir, FILE_NAME), 'utf8'));
      for (const [file, names] of Object.entries(saved)) files.set(file, new Set(names));
    } catch {
      // not saved yet
    }
    all.set(rootDir, files);
  }
  return files;
}

function recordTest(rootDir, testPath, fullName) {
  const files = testFiles(rootDir);
  let names = files.get(testPath);
  if (names === undefined) files.set(testPath, (names = new Set()));
  names.add(fullName);
}

function saveTestFiles(rootDir) {
  const out = {};
  for (const [file, names] of testFiles(rootDir)) out[file] = [...names];
  fs.writeFileSync(path.join(rootDir, FILE_NAME), JSON.stringify(out));
}

module.exports = { testFiles, recordTest, saveTestFiles };
