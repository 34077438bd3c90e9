/**
 * docs/architecture.md stays true to the code: the pure folders it lists are exactly the PURE_FOLDERS that
 * eslint.config.js guards, and every file or folder path it names exists.
 */
import { existsSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { expect, it } from 'vitest';

const root = fileURLToPath(new URL('../../', import.meta.url));
const doc = readFileSync(join(root, 'docs/architecture.md'), 'utf8');
const eslintConfig = readFileSync(join(root, 'eslint.config.js'), 'utf8');

/** The `src/lib/x/` folders listed under the doc's "Pure domain folders" heading. */
function docPureFolders(): string[] {
  const section = doc.split(/^## /m).find((s) => s.startsWith('Pure domain folders'));
  if (!section) throw new Error('docs/architecture.md has no "Pure domain folders" section');
  return [...section.matchAll(/^- `(src\/lib\/[\w-]+)\/`/gm)].map((m) => m[1]!);
}

/** The folders of the PURE_FOLDERS array in eslint.config.js, without their trailing `/**`. */
function eslintPureFolders(): string[] {
  const list = /const PURE_FOLDERS = \[([^\]]*)\]/.exec(eslintConfig);
  if (!list) throw new Error('eslint.config.js has no PURE_FOLDERS array');
  return [...list[1]!.matchAll(/'([^']+)\/\*\*'/g)].map((m) => m[1]!);
}

it('names the same pure folders as the eslint guard', () => {
  const named = docPureFolders();
  const guarded = eslintPureFolders();
  expect(named.length).toBeGreaterThan(0);
  expect(new Set(named).size).toBe(named.length);
  expect([...named].sort()).toEqual([...guarded].sort());
});

it('names only paths that exist', () => {
  // Backticked tokens that look like repository paths: a folder with a slash, or a file with an extension.
  const paths = [...doc.matchAll(/`([\w.[\]-]+(?:\/[\w.[\]-]+)*\/?)`/g)]
    .map((m) => m[1]!)
    .filter((p) => p.includes('/') || /\w\.(ts|js|mjs|md)$/.test(p));
  expect(paths.length).toBeGreaterThan(20);
  expect(paths.filter((p) => !existsSync(join(root, p)))).toEqual([]);
});

it('names the lint guards it says hold each direction', () => {
  for (const name of ['LIB_DOWNWARD', 'PURE_RESTRICTIONS', 'PURE_FOLDERS']) {
    expect(doc).toContain(`\`${name}\``);
    expect(eslintConfig).toContain(`const ${name} =`);
  }
});
