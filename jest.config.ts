import type { Config } from 'jest';

// One jest project per workspace; ts-jest transpiles file by file (isolatedModules in the
// tsconfig) for speed, and `npm run typecheck` does the type checking. Browser tests live in their own project and are run
// after the app is built (scripts/test.mjs), so `npm test` can start the real server first.
const tsJest = {
  '^.+\\.tsx?$': ['ts-jest', { tsconfig: '<rootDir>/tsconfig.json' }],
};
const workspaceSources = {
  '^@evenset/contracts$': '<rootDir>/../../packages/contracts/src/index.ts',
  '^@evenset/metrology$': '<rootDir>/../../packages/metrology/src/index.ts',
};

const config: Config = {
  projects: [
    {
      displayName: 'metrology',
      rootDir: '<rootDir>/packages/metrology',
      testMatch: ['<rootDir>/src/**/*.spec.ts'],
      transform: tsJest,
      testEnvironment: 'node',
    },
    {
      displayName: 'contracts',
      rootDir: '<rootDir>/packages/contracts',
      testMatch: ['<rootDir>/src/**/*.spec.ts'],
      transform: tsJest,
      testEnvironment: 'node',
    },
    {
      displayName: 'api',
      rootDir: '<rootDir>/apps/api',
      testMatch: ['<rootDir>/src/**/*.spec.ts', '<rootDir>/test/**/*.e2e-spec.ts'],
      transform: tsJest,
      moduleNameMapper: workspaceSources,
      testEnvironment: 'node',
      setupFiles: ['reflect-metadata'],
      setupFilesAfterEnv: ['<rootDir>/test/setup/timeouts.ts'],
    },
    {
      displayName: 'scripts',
      rootDir: '<rootDir>/scripts',
      testMatch: ['<rootDir>/tests/**/*.e2e-spec.ts'],
      transform: tsJest,
      testEnvironment: 'node',
    },
    {
      displayName: 'web',
      rootDir: '<rootDir>/apps/web',
      testMatch: ['<rootDir>/src/**/*.spec.{ts,tsx}'],
      transform: {
        '^.+\\.tsx?$': ['ts-jest', { tsconfig: '<rootDir>/tsconfig.spec.json' }],
      },
      moduleNameMapper: {
        ...workspaceSources,
        '\\.(css|woff2?)$': 'identity-obj-proxy',
      },
      testEnvironment: 'jsdom',
      setupFilesAfterEnv: ['<rootDir>/jest.setup.ts'],
    },
    {
      displayName: 'browser',
      rootDir: '<rootDir>/apps/web',
      testMatch: ['<rootDir>/e2e/**/*.e2e-spec.ts'],
      transform: { '^.+\\.ts$': ['ts-jest', { tsconfig: '<rootDir>/e2e/tsconfig.json' }] },
      testEnvironment: 'node',
      globalSetup: '<rootDir>/e2e/setup/global-setup.ts',
      globalTeardown: '<rootDir>/e2e/setup/global-teardown.ts',
    },
  ],
};

export default config;
