import { getViteConfig } from 'astro/config';

// Browser specs: playwright-core driving Debian's chromium against the built test server (scripts/test.ts).
export default getViteConfig({
  test: {
    include: ['tests/browser/**/*.spec.ts'],
    environment: 'node',
    testTimeout: 60_000,
    hookTimeout: 60_000,
    fileParallelism: false,
    pool: 'forks',
  },
});
