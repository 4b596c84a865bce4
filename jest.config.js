// Two projects: `node` for server, harness, shared and external checks (real
// PostgreSQL through tests/setup); `web` for screens under jest-expo/web.
// End-to-end tests have their own config (jest.e2e.config.js), run by scripts/test.sh
// once the server is up.
//
// Files run in parallel on every core: each node file works in its own copy of the
// template database (tests/setup/test-database.ts) and its own temporary folders. jest's
// default is one worker fewer than the cores, which on a 2-core machine is a single
// worker: the node and web files then took 245 s one after another (lead's measure).
const os = require('node:os');
const NODE_TRANSFORM = require('./tests/setup/node-transform');

module.exports = {
  maxWorkers: os.availableParallelism(),
  // A hang guard, not a speed budget: with the load at 20, 32 tests in 9 ordinary files
  // (starting the app, a bcrypt sign-in, a first render) passed jest's default 5 s.
  testTimeout: 30_000,
  projects: [
    {
      displayName: 'node',
      testEnvironment: 'node',
      roots: ['<rootDir>/tests'],
      testMatch: ['<rootDir>/tests/{server,harness,shared,scripts,external,constants}/**/*.test.ts'],
      transform: NODE_TRANSFORM,
      setupFiles: ['<rootDir>/tests/setup/node-setup.ts'],
      globalSetup: '<rootDir>/tests/setup/global-setup.ts',
      globalTeardown: '<rootDir>/tests/setup/global-teardown.ts',
    },
    {
      displayName: 'web',
      preset: 'jest-expo/web',
      roots: ['<rootDir>/tests'],
      testMatch: ['<rootDir>/tests/{app,components,client}/**/*.test.tsx'],
      setupFiles: ['<rootDir>/tests/setup/web-setup.ts'],
    },
  ],
};
