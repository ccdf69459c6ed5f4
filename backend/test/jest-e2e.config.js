/** End-to-end tests: the whole Nest app over HTTP (supertest) on a fresh SQLite file per test file. */
module.exports = {
  rootDir: '.',
  testEnvironment: 'node',
  testRegex: '.*\\.e2e-spec\\.ts$',
  setupFiles: ['<rootDir>/setup-env.ts'],
  transform: { '^.+\\.ts$': ['ts-jest', { tsconfig: '<rootDir>/../tsconfig.json' }] },
  moduleFileExtensions: ['ts', 'js', 'json'],
  // Password hashing at cost 12 takes a fraction of a second per user on this machine.
  testTimeout: 30000,
};
