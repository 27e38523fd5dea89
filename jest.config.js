/** @type {import('jest').Config} */
module.exports = {
  testEnvironment: 'node',
  roots: ['<rootDir>/tests'],
  testMatch: ['**/*.test.ts'],
  transform: { '^.+\\.ts$': 'ts-jest' },
  testTimeout: 120000,
  // Both cores: jest's default on a 2-core machine is one worker (cores − 1), which runs the files
  // one after another in one process. Two workers took the whole suite from 357 s to 207 s on the
  // 2-core CI machine (quiet, December 2026); the browser and LibreOffice tests each start their
  // own Chromium and their own office profile, so two files at once do not meet.
  maxWorkers: 2,
  // Longest files first, in a fresh clone too (jest's own order starts untimed files by size, and
  // the fuzz files are a few lines each): tests/slow-first-sequencer.js.
  testSequencer: '<rootDir>/tests/slow-first-sequencer.js',
  reporters: ['default', '<rootDir>/tests/summary-reporter.js'],
};
