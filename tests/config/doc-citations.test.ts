/**
 * Every Markdown document a tracked file names (README.md, DEVELOPERS.md, …) is in the repository, so a
 * comment never sends the reader to a document they cannot open. Tracked files come from git itself.
 */
import { execFileSync } from 'node:child_process';
import { readFileSync } from 'node:fs';
import { basename, join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { expect, it } from 'vitest';

const root = fileURLToPath(new URL('../../', import.meta.url));
const tracked = execFileSync('git', ['ls-files', '-z'], { cwd: root, encoding: 'utf8' }).split('\0').filter(Boolean);
const TEXT = /\.(ts|tsx|astro|js|mjs|md|css|yml|yaml)$/;

it('every *.md a tracked file names is a file of the repository', () => {
  const docs = new Set(tracked.filter((f) => f.endsWith('.md')).flatMap((f) => [f, basename(f)]));
  const missing = tracked
    .filter((f) => TEXT.test(f))
    .flatMap((f) =>
      [...readFileSync(join(root, f), 'utf8').matchAll(/[\w./-]*[\w-]\.md\b/g)]
        .map(([name]) => name.replace(/^\.\//, ''))
        .filter((name) => !docs.has(name))
        .map((name) => `${f}: ${name}`),
    );
  expect(missing).toEqual([]);
});
