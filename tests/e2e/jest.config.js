// Browser tests: the real server on a free port with a fresh database, driven by Debian's Chromium.
module.exports = {
  rootDir: '../..',
  displayName: 'e2e',
  testEnvironment: 'node',
  testMatch: ['<rootDir>/tests/e2e/**/*.test.ts'],
  moduleNameMapper: { '^@/(.*)$': '<rootDir>/$1' },
  transform: {
    '^.+\\.(t|j)sx?$': [
      '@swc/jest',
      { jsc: { parser: { syntax: 'typescript' }, target: 'es2022' }, module: { type: 'commonjs' } },
    ],
  },
  // The shared schemas reach dinero.js, which ships only ES modules.
  transformIgnorePatterns: ['/node_modules/(?!(dinero\\.js|@dinero\\.js)/)'],
  testTimeout: 60_000,
};
