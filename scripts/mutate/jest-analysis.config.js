// Jest for mutation testing (npm run mutate): the analysis project of jest.config.js as one flat
// config (Stryker's Jest runner swaps in its own test environment, which needs a flat config),
// its tests under tests/analysis only (tests/scripts run child processes, which a mutant never
// reaches).
const path = require('node:path');
const { projects } = require('../../jest.config.js');

const { displayName: _name, testMatch: _match, ...analysis } = projects.find((p) => p.displayName === 'analysis');

module.exports = {
  ...analysis,
  rootDir: path.resolve(__dirname, '../..'),
  testMatch: ['<rootDir>/tests/analysis/**/*.test.ts'],
};
