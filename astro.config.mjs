// @ts-check
import { defineConfig } from 'astro/config';
import node from '@astrojs/node';
import react from '@astrojs/react';
import tailwindcss from '@tailwindcss/vite';

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
  // Astro's own origin check: every form post must come from this site.
  security: { checkOrigin: true },
  vite: {
    plugins: [tailwindcss()],
    ssr: {
      // Native and CommonJS server-only packages stay outside the bundle.
      external: ['@node-rs/argon2', 'sharp', 'pg', 'knex'],
    },
  },
});
