// One Jest config, three projects: pure code and the server in node, components in jest-expo,
// the browser test against the served web build. Aliases come from tsconfig.json (one place).
const { pathsToModuleNameMapper } = require('ts-jest');
const { compilerOptions } = require('./tsconfig.json');

const aliases = pathsToModuleNameMapper(compilerOptions.paths, { prefix: '<rootDir>/' });
// d3-scale / d3-shape ship ESM that Jest 29 will not load: use their UMD builds.
const d3 = { '^(d3-[a-z-]+|internmap)$': '<rootDir>/node_modules/$1/dist/$1.js' };

const tsJest = [
  'ts-jest',
  {
    tsconfig: {
      // transpile only (no type check in tests; `npm run typecheck` does that), to CommonJS for Jest
      isolatedModules: true,
      rootDir: __dirname,
      ignoreDeprecations: '6.0',
      module: 'commonjs',
      moduleResolution: 'node10',
      target: 'es2022',
      esModuleInterop: true,
      jsx: 'react-jsx',
      resolveJsonModule: true,
    },
  },
];

const node = {
  testEnvironment: 'node',
  transform: { '^.+\\.tsx?$': tsJest },
  moduleNameMapper: { ...d3, ...aliases },
};

module.exports = {
  // Generous for a loaded two-core CI machine: route tests hash passwords and migrate a database.
  testTimeout: 30_000,
  projects: [
    {
      ...node,
      displayName: 'analysis',
      testMatch: ['<rootDir>/tests/analysis/**/*.test.ts', '<rootDir>/tests/scripts/**/*.test.ts'],
    },
    {
      ...node,
      displayName: 'server',
      testMatch: ['<rootDir>/tests/server/**/*.test.ts'],
      globalSetup: '<rootDir>/tests/support/db-global-setup.ts',
      globalTeardown: '<rootDir>/tests/support/db-global-teardown.ts',
    },
    {
      ...node,
      displayName: 'e2e',
      testMatch: ['<rootDir>/tests/e2e/**/*.test.ts'],
      globalSetup: '<rootDir>/tests/support/db-global-setup.ts',
      globalTeardown: '<rootDir>/tests/support/db-global-teardown.ts',
    },
    {
      displayName: 'components',
      preset: 'jest-expo/web',
      testMatch: ['<rootDir>/tests/components/**/*.test.ts?(x)'],
      // The preset's own react-native → react-native-web mapping, kept beside ours.
      moduleNameMapper: { '^react-native$': 'react-native-web', ...d3, ...aliases },
      // Expo's Babel preset as Metro runs it for the web (there is no babel.config.js).
      transform: {
        '\\.[jt]sx?$': ['babel-jest', { presets: ['babel-preset-expo'], caller: { name: 'metro', bundler: 'metro', platform: 'web' } }],
      },
    },
  ],
};
