/// <reference types="vitest" />
import { getViteConfig } from 'astro/config';
import { routeInputSchemasPlugin } from './tests/api/route-input-schemas.plugin';
import { UNIT_TEST_INCLUDE } from './tests/test-globs';

// Unit tests of src/lib, database tests, API tests against the running test server and the real PostgreSQL,
// and tests of scripts/ and the configuration. Browser specs (tests/browser/*.spec.ts) run with
// vitest.browser.config.ts; scripts/test.ts runs both.
export default getViteConfig({
  // API route modules imported by the fuzz suite name the zod schemas they check input with.
  plugins: [routeInputSchemasPlugin()],
  test: {
    include: UNIT_TEST_INCLUDE,
    environment: 'node',
    testTimeout: 30_000,
    hookTimeout: 60_000,
    fileParallelism: true,
    pool: 'forks',
  },
});
