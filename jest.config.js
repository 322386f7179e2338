// Two projects: React components under jest-expo, and the Node side (shared, server, documents)
// compiled by SWC. ESM-only packages are compiled too, since jest on Node 20 cannot require() them.
const esmOnly = [
  'better-auth',
  '@better-auth',
  'better-call',
  'jose',
  'nanostores',
  '@noble',
  '@better-fetch',
  'rou3',
  'set-cookie-parser',
  'defu',
  'dinero.js',
  '@dinero.js',
  'p-limit',
  'yocto-queue',
];

const alias = { '^@/(.*)$': '<rootDir>/$1' };

// jest-expo's own list of packages it compiles, plus the ESM-only ones the client reaches.
const expoCompiled = [
  '.pnpm',
  'react-native',
  '@react-native',
  '@react-native-community',
  'expo',
  '@expo',
  '@expo-google-fonts',
  'react-navigation',
  '@react-navigation',
  '@sentry/react-native',
  'native-base',
  'standard-navigation',
];
const clientEsmOnly = ['dinero.js', '@dinero.js', '@tanstack'];

module.exports = {
  projects: [
    {
      displayName: 'components',
      preset: 'jest-expo',
      testMatch: ['<rootDir>/tests/components/**/*.test.tsx'],
      moduleNameMapper: alias,
      transformIgnorePatterns: [
        `/node_modules/(?!(${[...expoCompiled, ...clientEsmOnly].join('|')}))`,
        '/node_modules/react-native-reanimated/plugin/',
        '/node_modules/@react-native/babel-preset/',
      ],
    },
    {
      displayName: 'node',
      testEnvironment: 'node',
      testMatch: ['<rootDir>/tests/{shared,server,documents}/**/*.test.ts'],
      moduleNameMapper: alias,
      // Under `npm run test:pg` (SAGGAR_TEST_DB=postgres): a PostgreSQL cluster for the run.
      globalSetup: '<rootDir>/tests/server/helpers/postgres-setup.ts',
      globalTeardown: '<rootDir>/tests/server/helpers/postgres-teardown.ts',
      // What only PostgreSQL offers (several server processes writing at once) is tested in
      // that run alone, in files named *.postgres.test.ts; what only concerns the SQLite file
      // (its online backup) in the SQLite run alone, in files named *.sqlite.test.ts.
      testPathIgnorePatterns: [
        process.env.SAGGAR_TEST_DB === 'postgres'
          ? '\\.sqlite\\.test\\.ts$'
          : '\\.postgres\\.test\\.ts$',
      ],
      transform: {
        '^.+\\.(t|j|mj|cj)sx?$': [
          '@swc/jest',
          {
            jsc: { parser: { syntax: 'typescript', tsx: true }, target: 'es2022' },
            module: { type: 'commonjs' },
          },
        ],
      },
      transformIgnorePatterns: [`/node_modules/(?!(${esmOnly.join('|')})/)`],
    },
  ],
};
