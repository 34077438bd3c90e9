// @ts-check
/**
 * Client chunks for libraries an island loads as one: Preact's core, hooks and JSX runtime, and TanStack Query's
 * core with its hooks. Left to itself, Rollup splits each library into as many chunks as the islands' import sets
 * differ, and every small chunk costs a request and its own gzip dictionary: the kit builder loaded eleven chunks
 * of 0.2–3 kB before this. The server build keeps Astro's own chunking.
 */

/** Chunk name → the node_modules paths it holds. */
const CLIENT_CHUNK_GROUPS = {
  preact: /\/node_modules\/preact\//,
  'tanstack-query': /\/node_modules\/@tanstack\/(?:query-core|react-query)\//,
};

/** @param {string} id @returns {string | undefined} */
export function clientChunkOf(id) {
  for (const [name, pattern] of Object.entries(CLIENT_CHUNK_GROUPS)) if (pattern.test(id)) return name;
  return undefined;
}

/** @returns {import('vite').Plugin} */
export function clientChunks() {
  return {
    name: 'kitwright:client-chunks',
    config(_config, env) {
      if (env.isSsrBuild) return undefined;
      return { build: { rollupOptions: { output: { manualChunks: clientChunkOf } } } };
    },
  };
}
