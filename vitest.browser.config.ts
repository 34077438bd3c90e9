import { getViteConfig } from 'astro/config';
import { BROWSER_TEST_INCLUDE } from './tests/test-globs';

// Browser specs: playwright-core driving Debian's chromium against the built test server (scripts/test.ts).
export default getViteConfig({
  test: {
    include: BROWSER_TEST_INCLUDE,
    environment: 'node',
    testTimeout: 60_000,
    hookTimeout: 60_000,
    fileParallelism: false,
    pool: 'forks',
  },
});
