// @ts-check
import { fileURLToPath } from 'node:url';

/**
 * Two entries of our own in the server build, beside the adapter's entry.mjs, compiled like the rest of it:
 * - `serve.mjs` (src/server/serve.ts), the production server that wraps the adapter's middleware;
 * - `work-worker.mjs` (src/lib/work/work-worker.ts), the entry of each worker-pool thread. The app learns where it
 *   went from `import workerUrl from 'virtual:kitwright/work-worker'`: its file URL, or null under the dev
 *   server (no build), where the work runs on the request's thread.
 */
const VIRTUAL_ID = 'virtual:kitwright/work-worker';
const RESOLVED_ID = `\0${VIRTUAL_ID}`;
/** @param {string} path */
const source = (path) => fileURLToPath(new URL(`../src/${path}`, import.meta.url));

/** @returns {import('vite').Plugin} */
export function serverEntries() {
  let ssrBuild = false;
  return {
    name: 'kitwright:server-entries',
    config: (_config, env) => {
      ssrBuild = env.command === 'build' && Boolean(env.isSsrBuild);
    },
    buildStart() {
      if (ssrBuild) this.emitFile({ type: 'chunk', id: source('server/serve.ts'), fileName: 'serve.mjs' });
    },
    resolveId: (id) => (id === VIRTUAL_ID ? RESOLVED_ID : undefined),
    load(id) {
      if (id !== RESOLVED_ID) return undefined;
      if (!ssrBuild) return 'export default null;';
      const ref = this.emitFile({ type: 'chunk', id: source('lib/work/work-worker.ts'), fileName: 'work-worker.mjs' });
      return `export default import.meta.ROLLUP_FILE_URL_${ref};`;
    },
  };
}
