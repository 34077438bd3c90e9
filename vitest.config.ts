/// <reference types="vitest" />
import { getViteConfig } from 'astro/config';

// Unit tests of src/lib and API tests against the running test server and the real PostgreSQL.
// Browser specs (tests/browser/*.spec.ts) run through scripts/browser-tests.ts with their own config.
export default getViteConfig({
  test: {
    include: [
      'tests/lib/**/*.test.ts',
      'tests/api/**/*.test.ts',
      'tests/db/**/*.test.ts',
      'tests/scripts/**/*.test.ts',
      'tests/config/**/*.test.ts',
    ],
    environment: 'node',
    testTimeout: 30_000,
    hookTimeout: 60_000,
    fileParallelism: true,
    pool: 'forks',
  },
});
