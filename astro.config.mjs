// @ts-check
import { defineConfig } from 'astro/config';
import node from '@astrojs/node';
import react from '@astrojs/react';
import tailwindcss from '@tailwindcss/vite';

/** Hosts the server answers for: loopback, plus SITE_URL's host in production. */
function allowedDomains() {
  const domains = [{ hostname: '127.0.0.1' }, { hostname: 'localhost' }];
  if (process.env.SITE_URL) domains.push({ hostname: new URL(process.env.SITE_URL).hostname });
  return domains;
}

export default defineConfig({
  output: 'server',
  // KW_OUT_DIR lets two test runs on one machine build side by side (DEVELOPERS.md).
  outDir: process.env.KW_OUT_DIR ?? './dist',
  adapter: node({ mode: 'standalone' }),
  integrations: [react()],
  server: {
    host: process.env.HOST ?? '127.0.0.1',
    port: Number(process.env.PORT ?? 4321),
  },
  // Astro's own origin check: every form post must come from this site. Without allowedDomains the node
  // adapter sees every request as http://localhost and refuses same-site posts on 127.0.0.1.
  security: { checkOrigin: true, allowedDomains: allowedDomains() },
  vite: {
    plugins: [tailwindcss()],
    ssr: {
      // Native and CommonJS server-only packages stay outside the bundle.
      external: ['@node-rs/argon2', 'sharp', 'pg', 'knex'],
    },
  },
});
