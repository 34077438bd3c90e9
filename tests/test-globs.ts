/**
 * Which files each vitest configuration runs, kept apart from the configs so tests/config/vitest-config.test.ts
 * can read them without loading Astro's Vite configuration.
 */

/** vitest.config.ts: unit tests of src/lib, database and API tests, and tests of scripts/ and configuration. */
export const UNIT_TEST_INCLUDE = [
  'tests/lib/**/*.test.ts',
  'tests/api/**/*.test.ts',
  'tests/db/**/*.test.ts',
  'tests/scripts/**/*.test.ts',
  'tests/config/**/*.test.ts',
];

/** vitest.browser.config.ts: the browser specs. */
export const BROWSER_TEST_INCLUDE = ['tests/browser/**/*.spec.ts'];
