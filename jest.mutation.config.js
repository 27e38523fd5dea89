/**
 * Jest configuration for mutation testing (`npm run mutation`, stryker.config.mjs): the normal
 * configuration narrowed to the tests that exercise the mutated core folders (shading, sky, glazing,
 * gain) — their own unit tests, the folders downstream of them (load) and the outside checks in
 * tests/reference. The sun and time tests (long ephemeris and calendar sweeps that never reach the
 * mutated code) and the adapter, CLI, browser and LibreOffice tests are left out. A test that fails
 * ends the run of its mutant (tests/mutation/bail-environment.js) and the quickest files go first
 * (tests/mutation/fast-first-sequencer.js). Only the default reporter.
 */
const path = require('path');
const base = require('./jest.config.js');

/** @type {import('jest').Config} */
module.exports = {
  ...base,
  // src is a root too, so that jest sees the whole import graph when it looks for the test files
  // related to a mutated file (a gain test reaches glazing through gain).
  roots: ['<rootDir>/src', '<rootDir>/tests/core', '<rootDir>/tests/reference'],
  testPathIgnorePatterns: ['/node_modules/', '/tests/core/(sun|time)/'],
  testEnvironment: path.join(__dirname, 'tests/mutation/bail-environment.js'),
  testSequencer: path.join(__dirname, 'tests/mutation/fast-first-sequencer.js'),
  reporters: ['default'],
  // One process per mutant run, as before the normal configuration took both cores.
  maxWorkers: 1,
};
