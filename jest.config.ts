import type { Config } from 'jest';

// Three projects, one runner. `npm test` prepares PostgreSQL and the web export first;
// unit tests need neither, so `npx jest --selectProjects unit` works on its own.
const tsJest = {
  '^.+\\.tsx?$': ['ts-jest', { tsconfig: '<rootDir>/tests/tsconfig.json', isolatedModules: true }],
} as const;

const common = {
  rootDir: '.',
  testEnvironment: 'node',
  transform: tsJest,
  moduleNameMapper: { '^@/(.*)$': '<rootDir>/$1' },
  modulePathIgnorePatterns: ['<rootDir>/dist/'],
};

const config: Config = {
  projects: [
    { ...common, displayName: 'unit', testMatch: ['<rootDir>/tests/unit/**/*.test.ts'] },
    { ...common, displayName: 'api', testMatch: ['<rootDir>/tests/api/**/*.test.ts'] },
    { ...common, displayName: 'browser', testMatch: ['<rootDir>/tests/browser/**/*.test.ts'] },
  ],
};

export default config;
