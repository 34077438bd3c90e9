/**
 * The two vitest configurations name only folders that hold tests and together run every test file under
 * tests/: what each runs comes from vitest itself (`vitest list --filesOnly`), the files on disk from a walk of
 * tests/. A config that names a missing folder, or a new folder of tests that no config names, fails here.
 */
import { execFile } from 'node:child_process';
import { mkdtemp, readFile, rm } from 'node:fs/promises';
import { readdirSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, relative } from 'node:path';
import { fileURLToPath } from 'node:url';
import { promisify } from 'node:util';
import { describe, expect, it } from 'vitest';
import { BROWSER_TEST_INCLUDE, UNIT_TEST_INCLUDE } from '../test-globs';

const root = fileURLToPath(new URL('../../', import.meta.url));

/** The test files vitest runs with this config, relative to the root. */
async function vitestFiles(config: string): Promise<string[]> {
  const dir = await mkdtemp(join(tmpdir(), 'kw-vitest-list-'));
  try {
    const out = join(dir, 'files.json');
    // A vitest started from inside a test must not take this run's worker settings for its own.
    const env = Object.fromEntries(Object.entries(process.env).filter(([name]) => !name.startsWith('VITEST')));
    await promisify(execFile)(
      join(root, 'node_modules/.bin/vitest'),
      ['list', '--filesOnly', `--json=${out}`, '--config', config],
      { cwd: root, env: { ...env, ASTRO_TELEMETRY_DISABLED: '1' } },
    );
    const listed = JSON.parse(await readFile(out, 'utf8')) as { file: string }[];
    return listed.map((f) => relative(root, f.file)).sort();
  } finally {
    await rm(dir, { recursive: true, force: true });
  }
}

/** Files under tests/ whose names end with `suffix`, relative to the root. */
function filesOnDisk(suffix: string): string[] {
  return readdirSync(join(root, 'tests'), { recursive: true, encoding: 'utf8' })
    .filter((name) => name.endsWith(suffix))
    .map((name) => join('tests', name))
    .sort();
}

/** The folder a glob starts from: its segments before the first one with a wildcard. */
const globBase = (pattern: string) => pattern.slice(0, pattern.search(/\/[^/]*[*?{[]/));

const [unitFiles, browserFiles] = await Promise.all([
  vitestFiles('vitest.config.ts'),
  vitestFiles('vitest.browser.config.ts'),
]);

describe.each([
  ['vitest.config.ts', UNIT_TEST_INCLUDE, unitFiles, '.test.ts'],
  ['vitest.browser.config.ts', BROWSER_TEST_INCLUDE, browserFiles, '.spec.ts'],
])('%s', (config, include, files, suffix) => {
  it.each(include)('%s names a folder that holds tests', (pattern) => {
    const base = globBase(pattern);
    expect(
      files.some((f) => f.startsWith(`${base}/`)),
      `${config}: no test file under ${base}`,
    ).toBe(true);
  });

  it(`runs every *${suffix} under tests/`, () => {
    expect(files).toEqual(filesOnDisk(suffix));
  });
});

it('the unit config runs the tests of scripts/', () => {
  expect(unitFiles).toContain('tests/scripts/postgres-lease.test.ts');
});
