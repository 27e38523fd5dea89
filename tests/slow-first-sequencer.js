/**
 * The order in which `npm test` starts its test files (jest.config.js).
 *
 * Two workers take the files one after another in this order, so the run is shortest when the long
 * files start first and the short ones fill the end. Jest's own order does that for the files it
 * timed on an earlier run in the same folder, but it starts every file it has no time for (all of
 * them in a fresh clone, as CI has; a new file) before the timed ones, largest file first. The five
 * fuzz files are a few lines each (their work is in tests/support/registryFuzz.ts) and so started
 * last in a fresh clone, leaving one worker alone with a fuzz file at the end.
 *
 * Here a file that failed on the last run goes first (as in jest), then the rest by expected
 * seconds, longest first: the last run's time where jest has one, else the estimate below, else a
 * guess from the file's size. The estimates only order the files; a stale one costs some idle time
 * at the end of the run, never a check.
 */
// eslint-disable-next-line @typescript-eslint/no-require-imports -- jest loads this file as CommonJS
const Sequencer = require('@jest/test-sequencer').default;
// eslint-disable-next-line @typescript-eslint/no-require-imports -- jest loads this file as CommonJS
const path = require('node:path');

/**
 * Seconds of the slowest files in a whole `npm test` on the 2-core machine, two workers, load about 6
 * from other work (December 2026, after the LibreOffice and pretest changes; the demo's LibreOffice
 * test scaled for its later one-recalculation change; the heavy fuzz files scaled by their CPU
 * time's growth when every function went to 10,000 runs). Loaded seconds are longer than quiet ones, but
 * in about the same order, which is all that is used here; every other file took under 6 s.
 */
const ESTIMATES = {
  'tests/browser/pane.browser.test.ts': 65,
  'tests/registry/fuzz-gain-hour.test.ts': 60,
  'tests/registry/fuzz-shading.test.ts': 57,
  'tests/registry/fuzz-gain-days.test.ts': 53,
  'tests/libreoffice/tableLoad.test.ts': 48,
  'tests/browser/look.browser.test.ts': 39,
  'tests/registry/fuzz-sun.test.ts': 38,
  'tests/libreoffice/demo.test.ts': 31,
  'tests/reference/polygon-clipping-union.test.ts': 24,
  'tests/cli/commands.test.ts': 20,
  'tests/registry/fuzz-sky-glazing.test.ts': 17,
  'tests/browser/help.browser.test.ts': 15,
  'tests/cli/demo.test.ts': 15,
  'tests/reference/raycast-view-factors.test.ts': 14,
  'tests/cli/outputs.test.ts': 12,
  'tests/cli/dateSystem.test.ts': 12,
  'tests/browser/functions.browser.test.ts': 12,
  'tests/libreoffice/print.test.ts': 11,
  'tests/cli/scheduleStream.test.ts': 9,
  'tests/registry/clock.test.ts': 7,
  'tests/core/gain/sharedYear.test.ts': 7,
  'tests/reference/iana-clock-sun.test.ts': 7,
  'tests/core/shading/skyline.test.ts': 6,
};

/** A guess for a file with neither a time nor an estimate: a second and a half per 10 kB. */
const SECONDS_PER_BYTE = 1.5 / 10_000;

class SlowFirstSequencer extends Sequencer {
  sort(tests) {
    const expected = (test) => {
      const timed = this.time(test);
      if (timed != null) return timed / 1000;
      const rel = path.relative(test.context.config.rootDir, test.path).split(path.sep).join('/');
      if (ESTIMATES[rel] !== undefined) return ESTIMATES[rel];
      return (test.context.hasteFS.getSize(test.path) ?? 0) * SECONDS_PER_BYTE;
    };
    for (const test of tests) test.duration = this.time(test); // as jest's own sort leaves it (its reporter reads it)
    const known = tests.map((test) => ({ test, failed: this.hasFailed(test), seconds: expected(test) }));
    known.sort((a, b) => (a.failed !== b.failed ? (a.failed ? -1 : 1) : b.seconds - a.seconds || (a.test.path < b.test.path ? -1 : 1)));
    return known.map((k) => k.test);
  }
}

module.exports = SlowFirstSequencer;
