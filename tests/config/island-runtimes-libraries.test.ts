/**
 * The island runtime plugin (config/island-runtimes.mjs) keeps a hand-made list of the React libraries the
 * Preact islands use. A library left off the list would import React itself inside a Preact island (two
 * runtimes on one page, hooks that break); a library left on it after the islands stop using it is dead.
 * Here the list is compared with what the islands outside src/components/preview import, followed through
 * node_modules: every installed package that reaches React (declares react or react-dom, or a package that
 * does, as a dependency or peer) must be on the list, and nothing else. The plugin also calls an Astro
 * internal to tag Preact islands; an Astro upgrade that drops it fails here rather than in the browser.
 */
import { existsSync, readdirSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { expect, it } from 'vitest';
import { COMPAT_LIBRARIES, importsCompat } from '../../config/island-runtimes.mjs';

const root = fileURLToPath(new URL('../../', import.meta.url));
const REACT = new Set(['react', 'react-dom']);

/** Source files of the islands that render with preact/compat (importsCompat says which). */
function compatIslandFiles(dir = join(root, 'src/components')): string[] {
  return readdirSync(dir, { withFileTypes: true }).flatMap((entry) => {
    const path = join(dir, entry.name);
    if (entry.isDirectory()) return compatIslandFiles(path);
    return /\.tsx?$/.test(entry.name) && importsCompat(path) ? [path] : [];
  });
}

/** The npm package a bare import specifier names (`@scope/name/sub` → `@scope/name`), or null. */
function packageOf(specifier: string): string | null {
  if (specifier.startsWith('.') || specifier.includes(':')) return null;
  const parts = specifier.split('/');
  return specifier.startsWith('@') ? `${parts[0]}/${parts[1]}` : parts[0]!;
}

function packageJson(name: string): { dependencies?: object; peerDependencies?: object } | null {
  const file = join(root, 'node_modules', name, 'package.json');
  return existsSync(file) ? JSON.parse(readFileSync(file, 'utf8')) : null;
}

/** Installed packages `name` depends on (dependencies and peers; optional peers that are not installed are left out). */
function installedDependencies(name: string): string[] {
  const json = packageJson(name);
  return Object.keys({ ...json?.dependencies, ...json?.peerDependencies }).filter((d) => packageJson(d) !== null);
}

/** Whether a package imports React, directly or through a package it depends on. */
function reachesReact(name: string, seen = new Set<string>()): boolean {
  if (seen.has(name)) return false;
  seen.add(name);
  return installedDependencies(name).some((d) => REACT.has(d) || reachesReact(d, seen));
}

/** Every installed package the compat islands load: what they import, and what those depend on. */
function packagesLoaded(): Set<string> {
  const pending = compatIslandFiles().flatMap((file) =>
    [...readFileSync(file, 'utf8').matchAll(/(?:from|import)\s*\(?\s*'([^']+)'/g)]
      .map((m) => packageOf(m[1]!))
      .filter((p): p is string => p !== null),
  );
  const loaded = new Set<string>();
  for (let name = pending.pop(); name !== undefined; name = pending.pop()) {
    if (loaded.has(name) || REACT.has(name)) continue;
    loaded.add(name);
    pending.push(...installedDependencies(name));
  }
  return loaded;
}

it('lists exactly the React libraries the Preact islands load', () => {
  const loaded = packagesLoaded();
  // The walk found the islands' own imports (a walk that found nothing would pass the check below vacuously).
  expect(loaded).toContain('react-hook-form');
  expect(loaded).toContain('zod');
  const needCompat = [...loaded].filter((name) => reachesReact(name)).sort();
  expect([...COMPAT_LIBRARIES].sort()).toEqual(needCompat);
});

it('finds the Astro internal the plugin tags Preact islands with', async () => {
  const runtime = (await import('astro/runtime/server/index.js')) as Record<string, unknown>;
  expect(typeof runtime.__astro_tag_component__).toBe('function');
});
