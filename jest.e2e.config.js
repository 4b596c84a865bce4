// End-to-end tests: playwright-core driving Debian's Chromium against the server that
// scripts/test.sh started (SHEETKEEPER_E2E_URL). Compiled like the node project.
module.exports = {
  displayName: 'e2e',
  testEnvironment: 'node',
  roots: ['<rootDir>/tests/e2e'],
  testMatch: ['<rootDir>/tests/e2e/**/*.test.ts'],
  transform: require('./tests/setup/node-transform'),
  setupFilesAfterEnv: ['<rootDir>/tests/e2e/support/close-browser-after-file.ts'],
  testTimeout: 60000,
  maxWorkers: 1,
  // One file at a time, journeys that read the seeded state first (the file says why).
  testSequencer: '<rootDir>/tests/setup/e2e-sequencer.js',
};
