// @ts-check
import { defineConfig } from 'astro/config';
import node from '@astrojs/node';
import preact from '@astrojs/preact';
import react from '@astrojs/react';
import tailwindcss from '@tailwindcss/vite';
import { COMPAT_LIBRARIES, PREACT_ISLANDS, REACT_ISLANDS, islandRuntimes } from './config/island-runtimes.mjs';
import { originAllowedHostnames } from './src/lib/http/origin-check.ts';
import { CSP_DIRECTIVES, CSP_SCRIPT_SOURCES, CSP_STYLE_SOURCES } from './src/lib/http/security-headers.ts';
import { precompress } from './config/precompress.mjs';
import { clientChunks } from './config/client-chunks.mjs';
import { serverEntries } from './config/server-entries.mjs';

export default defineConfig({
  output: 'server',
  // KW_OUT_DIR lets two test runs on one machine build side by side (DEVELOPERS.md).
  outDir: process.env.KW_OUT_DIR ?? './dist',
  // Middleware mode: src/server/serve.ts is the server (static files, compression, the socket address).
  adapter: node({ mode: 'middleware' }),
  // Preact islands are tagged for their renderer (config/island-runtimes.mjs); Astro asks React first about
  // the rest, which it answers without rendering them.
  integrations: [
    react({ include: REACT_ISLANDS }),
    preact({ include: PREACT_ISLANDS, exclude: REACT_ISLANDS }),
    precompress(),
  ],
  server: {
    host: process.env.HOST ?? '127.0.0.1',
    port: Number(process.env.PORT ?? 4321),
  },
  // checkOrigin is off: src/middleware.ts refuses cross-site requests of every body type with the shared JSON
  // error (src/lib/http/origin-check.ts). allowedDomains stays: the node adapter trusts a Host header only when
  // it matches, and without it every request's URL is http://localhost (node_modules/astro/dist/core/app/node.js).
  security: {
    checkOrigin: false,
    allowedDomains: originAllowedHostnames(process.env.SITE_URL).map((hostname) => ({ hostname })),
  },
  experimental: {
    // Astro adds the SHA-256 hash of every inline script it renders to script-src and sends the policy as a header
    // of each page; src/lib/http/security-headers.ts holds the directives, src/middleware.ts the other headers.
    csp: {
      algorithm: 'SHA-256',
      directives: [...CSP_DIRECTIVES],
      scriptDirective: { resources: [...CSP_SCRIPT_SOURCES] },
      styleDirective: { resources: [...CSP_STYLE_SOURCES] },
    },
  },
  vite: {
    plugins: [islandRuntimes(), tailwindcss(), serverEntries(), clientChunks()],
    // The dev server's pre-bundler would bind these to React before the alias sees them.
    optimizeDeps: { exclude: COMPAT_LIBRARIES, include: ['preact/compat', 'preact/hooks', 'preact/jsx-runtime'] },
    ssr: {
      // Native and CommonJS server-only packages stay outside the bundle.
      external: ['@node-rs/argon2', 'sharp', 'pg', 'knex'],
      noExternal: COMPAT_LIBRARIES,
    },
  },
});
