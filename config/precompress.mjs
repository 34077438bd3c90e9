// @ts-check
import { readdir, readFile, writeFile } from 'node:fs/promises';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { brotliCompressSync, constants, gzipSync } from 'node:zlib';

/**
 * Writes a brotli (`.br`) and a gzip (`.gz`) twin beside every compressible file of the client build, once, at
 * the highest levels, so the server (src/server/serve.ts, sirv) answers static assets compressed without compressing
 * per request. A twin is kept only when it is smaller than the file.
 *
 * Own code rather than a package: the Vite compression plugins hook Vite's client build, which Astro runs
 * before it copies public/ and writes its own files; this hook sees the finished folder. node:zlib does the work.
 */

/** Text formats worth compressing; images and fonts of the build are compressed formats already. */
const COMPRESSIBLE = /\.(?:js|mjs|css|html|svg|json|txt|xml|map|webmanifest)$/;

/** @param {string} dir @returns {AsyncGenerator<string>} */
async function* filesUnder(dir) {
  for (const entry of await readdir(dir, { withFileTypes: true })) {
    const path = join(dir, entry.name);
    if (entry.isDirectory()) yield* filesUnder(path);
    else if (COMPRESSIBLE.test(entry.name)) yield path;
  }
}

/** Writes the twins under `dir`; returns how many files got at least one. @param {string} dir */
export async function precompressFolder(dir) {
  let count = 0;
  for await (const path of filesUnder(dir)) {
    const bytes = await readFile(path);
    const br = brotliCompressSync(bytes, {
      params: { [constants.BROTLI_PARAM_QUALITY]: 11, [constants.BROTLI_PARAM_SIZE_HINT]: bytes.length },
    });
    const gz = gzipSync(bytes, { level: 9 });
    if (br.length < bytes.length) await writeFile(`${path}.br`, br);
    if (gz.length < bytes.length) await writeFile(`${path}.gz`, gz);
    if (br.length < bytes.length || gz.length < bytes.length) count += 1;
  }
  return count;
}

/** The Astro integration: runs after the build, on the client folder. @returns {import('astro').AstroIntegration} */
export function precompress() {
  let clientDir = '';
  return {
    name: 'kitwright:precompress',
    hooks: {
      'astro:config:done': ({ config }) => {
        clientDir = fileURLToPath(config.build.client);
      },
      'astro:build:done': async ({ logger }) => {
        const count = await precompressFolder(clientDir);
        logger.info(`${count} static files precompressed (brotli and gzip)`);
      },
    },
  };
}
