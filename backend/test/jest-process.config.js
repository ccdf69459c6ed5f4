/**
 * Process tests: the built server (dist/main.js) started as child processes, killed with
 * SIGKILL and run twice on one database file. `npm test` runs them after the build.
 */
module.exports = {
  rootDir: '.',
  testEnvironment: 'node',
  testRegex: 'processes/.*\\.process-spec\\.ts$',
  transform: { '^.+\\.ts$': ['ts-jest', { tsconfig: '<rootDir>/../tsconfig.json' }] },
  moduleFileExtensions: ['ts', 'js', 'json'],
  testTimeout: 120000,
  // One at a time: each starts servers of its own, and timing matters to the crash test.
  maxWorkers: 1,
};
