/**
 * The server's configuration is read in one module (src/lib/server-config.ts): its defaults and fallbacks
 * are the ones the README's configuration table states, and no other module under src/ reads process.env.
 */
import { readdirSync, readFileSync } from 'node:fs';
import { join, relative } from 'node:path';
import { fileURLToPath } from 'node:url';
import { afterEach, describe, expect, it } from 'vitest';
import { serverConfig } from '../../src/lib/server-config';

const root = fileURLToPath(new URL('../../', import.meta.url));
const saved = { ...process.env };

afterEach(() => {
  for (const name of ['TRUST_PROXY', 'DATABASE_POOL_MAX', 'SITE_URL', 'MAIL_FROM', 'KW_WORK_THREADS', 'PORT'])
    if (saved[name] === undefined) delete process.env[name];
    else process.env[name] = saved[name];
});

describe('serverConfig', () => {
  it('gives the README defaults for unset variables', () => {
    delete process.env.DATABASE_POOL_MAX;
    delete process.env.SITE_URL;
    delete process.env.KW_WORK_THREADS;
    delete process.env.PORT;
    // README.md, "Configuration": DATABASE_POOL_MAX 10 connections per app instance.
    expect(serverConfig('DATABASE_POOL_MAX')).toBe(10);
    expect(serverConfig('SITE_URL')).toBeUndefined();
    expect(serverConfig('KW_WORK_THREADS')).toBeUndefined();
    expect(serverConfig('PORT')).toBe(4321);
  });

  it('reads set values as their types, each time it is asked', () => {
    process.env.DATABASE_POOL_MAX = '25';
    expect(serverConfig('DATABASE_POOL_MAX')).toBe(25);
    process.env.DATABASE_POOL_MAX = '4';
    expect(serverConfig('DATABASE_POOL_MAX')).toBe(4);
    process.env.SITE_URL = 'https://kits.example.org';
    expect(serverConfig('SITE_URL')).toBe('https://kits.example.org');
  });

  it('falls back to the default for a value it cannot use', () => {
    for (const bad of ['yes', '0', '-2', '1.5', '']) {
      process.env.TRUST_PROXY = bad;
      expect([bad, serverConfig('TRUST_PROXY')]).toEqual([bad, 0]);
    }
    process.env.TRUST_PROXY = '2';
    expect(serverConfig('TRUST_PROXY')).toBe(2);
    process.env.DATABASE_POOL_MAX = 'many';
    expect(serverConfig('DATABASE_POOL_MAX')).toBe(10);
    process.env.SITE_URL = '  ';
    expect(serverConfig('SITE_URL')).toBeUndefined();
    process.env.MAIL_FROM = '';
    expect(serverConfig('MAIL_FROM')).toBe('Kitwright <no-reply@kitwright.example>');
  });
});

/** Files under dir, recursively. */
function files(dir: string): string[] {
  return readdirSync(dir, { withFileTypes: true }).flatMap((e) =>
    e.isDirectory() ? files(join(dir, e.name)) : [join(dir, e.name)],
  );
}

it('is the only module under src/ that reads process.env', () => {
  const all = files(join(root, 'src'));
  expect(all.length).toBeGreaterThan(100);
  const readers = all
    .filter((f) => /\.(ts|tsx|astro|mjs)$/.test(f) && readFileSync(f, 'utf8').includes('process.env'))
    .map((f) => relative(root, f));
  expect(readers).toEqual(['src/lib/server-config.ts']);
});
