/** @type {import('jest').Config} */
module.exports = {
  testEnvironment: 'node',
  roots: ['<rootDir>/tests'],
  testMatch: ['**/*.test.ts'],
  transform: { '^.+\\.ts$': 'ts-jest' },
  testTimeout: 120000,
  reporters: ['default', '<rootDir>/tests/summary-reporter.js'],
};
