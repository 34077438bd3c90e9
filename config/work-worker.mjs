// @ts-check
import { fileURLToPath } from 'node:url';

/**
 * Builds the worker threads' entry (src/lib/work/work-worker.ts) into the server build beside entry.mjs, and
 * tells the app where it went: `import workerUrl from 'virtual:kitwright/work-worker'` is the file URL of the
 * built worker, or null under the dev server (no build), where the work runs on the request's thread.
 */
const VIRTUAL_ID = 'virtual:kitwright/work-worker';
const RESOLVED_ID = `\0${VIRTUAL_ID}`;
const WORKER_SOURCE = fileURLToPath(new URL('../src/lib/work/work-worker.ts', import.meta.url));

/** @returns {import('vite').Plugin} */
export function workWorker() {
  let ssrBuild = false;
  return {
    name: 'kitwright:work-worker',
    config: (_config, env) => {
      ssrBuild = env.command === 'build' && Boolean(env.isSsrBuild);
    },
    resolveId: (id) => (id === VIRTUAL_ID ? RESOLVED_ID : undefined),
    load(id) {
      if (id !== RESOLVED_ID) return undefined;
      if (!ssrBuild) return 'export default null;';
      const ref = this.emitFile({ type: 'chunk', id: WORKER_SOURCE, fileName: 'work-worker.mjs' });
      return `export default import.meta.ROLLUP_FILE_URL_${ref};`;
    },
  };
}
