/**
 * A moved build folder (KW_OUT_DIR, e.g. npm test's dist-test-<port>) is ignored by git, ESLint and Prettier, as
 * `dist` is: each tool asked through its own interface (git check-ignore, ESLint#isPathIgnored,
 * prettier.getFileInfo), not by reading the ignore files.
 */
import { spawnSync } from 'node:child_process';
import { fileURLToPath } from 'node:url';
import { ESLint } from 'eslint';
import * as prettier from 'prettier';
import { describe, expect, it } from 'vitest';

const root = fileURLToPath(new URL('../../', import.meta.url));
const BUILT = ['dist/server/entry.mjs', 'dist-test-4322/server/entry.mjs', 'dist-5622/client/_astro/a.js'];

describe('build folders', () => {
  it.each(BUILT)('git, ESLint and Prettier ignore %s', async (path) => {
    expect(spawnSync('git', ['check-ignore', '-q', path], { cwd: root }).status).toBe(0);
    expect(await new ESLint({ cwd: root }).isPathIgnored(path)).toBe(true);
    const info = await prettier.getFileInfo(`${root}${path}`, { ignorePath: `${root}.prettierignore` });
    expect(info.ignored).toBe(true);
  });

  it('still lints and formats source files whose names start with dist', async () => {
    const path = 'src/lib/layout/distance-check.ts';
    expect(spawnSync('git', ['check-ignore', '-q', path], { cwd: root }).status).toBe(1);
    expect(await new ESLint({ cwd: root }).isPathIgnored(path)).toBe(false);
  });
});
