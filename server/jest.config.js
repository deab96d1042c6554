import { createRequire } from 'node:module';

const swc = createRequire(import.meta.url)('../jest.swc.cjs');

export default {
  testEnvironment: 'node',
  roots: ['<rootDir>/src', '<rootDir>/test'],
  testMatch: ['**/*.spec.ts', '**/*.e2e-spec.ts'],
  extensionsToTreatAsEsm: ['.ts'],
  moduleNameMapper: { '^(\\.{1,2}/.*)\\.js$': '$1' },
  transform: { '^.+\\.ts$': ['@swc/jest', swc] },
  globalSetup: '<rootDir>/test/global-setup.mjs',
  setupFiles: ['<rootDir>/test/setup-env.ts'],
  testTimeout: 30000,
};
