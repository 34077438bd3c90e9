/// <reference types="vitest" />
import { getViteConfig } from 'astro/config';
import { routeInputSchemasPlugin } from './tests/api/route-input-schemas.plugin';

// Unit tests of src/lib and API tests against the running test server and the real PostgreSQL.
// Browser specs (tests/browser/*.spec.ts) run through scripts/browser-tests.ts with their own config.
export default getViteConfig({
  // API route modules imported by the fuzz suite name the zod schemas they check input with.
  plugins: [routeInputSchemasPlugin()],
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
