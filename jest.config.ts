import type { Config } from 'jest';

// Three projects, one runner. `npm test` prepares PostgreSQL and the web export first;
// unit tests need neither, so `npx jest --selectProjects unit` works on its own.
type Project = Exclude<NonNullable<Config['projects']>[number], string>;

const common: Project = {
  rootDir: '.',
  testEnvironment: 'node',
  // Transpile only (isolatedModules in tests/tsconfig.json, fast); type errors are caught by `npm run typecheck`. Columns declare their types
  // explicitly, so TypeORM does not depend on emitted decorator metadata.
  transform: { '^.+\\.tsx?$': ['ts-jest', { tsconfig: '<rootDir>/tests/tsconfig.json' }] },
  moduleNameMapper: { '^@/(.*)$': '<rootDir>/$1' },
  modulePathIgnorePatterns: ['<rootDir>/dist/'],
};

const config: Config = {
  // API suites reset and seed PostgreSQL in beforeAll; on a loaded two-core machine that can pass 5 s.
  testTimeout: 30_000,
  projects: [
    { ...common, displayName: 'unit', testMatch: ['<rootDir>/tests/unit/**/*.test.ts'] },
    { ...common, displayName: 'api', testMatch: ['<rootDir>/tests/api/**/*.test.ts'] },
    { ...common, displayName: 'browser', testMatch: ['<rootDir>/tests/browser/**/*.test.ts'] },
  ],
};

export default config;
