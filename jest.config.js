// Two projects: `node` for server, harness, shared and external checks (real
// PostgreSQL through tests/setup); `web` for screens under jest-expo/web.
// End-to-end tests have their own config (jest.e2e.config.js), run by scripts/test.sh
// once the server is up.
//
// Files run in parallel, one worker more than the cores: each node file works in its own copy of
// the template database (tests/setup/test-database.ts) and its own temporary folders. jest's
// default is one worker fewer than the cores, which on a 2-core machine is a single worker: the
// node and web files then took 245 s one after another. With one worker per core, the cores sat
// 10-38 % idle for the minute after the e2e files ended, while files waited on purpose (a hung
// target's time limit, a server kept from its database, a killed worker's restart); a third
// worker filled that time, and a cold `npm test` went from 293-295 s to 277 s.
const os = require('node:os');
const NODE_TRANSFORM = require('./tests/setup/node-transform');

module.exports = {
  maxWorkers: os.availableParallelism() + 1,
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
