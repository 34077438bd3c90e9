// @ts-check
import { init, parse } from 'es-module-lexer';
import MagicString from 'magic-string';
/**
 * Which runtime renders which island.
 *
 * Every island is written against React's API and typed with @types/react. The 3D preview
 * (src/components/preview) renders with React itself, because @react-three/fiber is a React reconciler.
 * Every other island renders with preact/compat, the React-compatible build of Preact: React DOM alone is
 * 65 kB gzip, more than the builder page's whole 60 kB budget, while Preact with compat is about 11 kB.
 *
 * @astrojs/preact's own `compat` switch aliases `react` for the whole project, which would take React away
 * from the 3D island too. This plugin aliases it per importer instead: our files outside the preview folder,
 * and the React libraries those islands use (TanStack Query, react-hook-form), get preact/compat; everything
 * else (the preview, @react-three/*, @astrojs/react's client) gets React.
 *
 * Why this plugin rather than the supported design (every island on Preact with @astrojs/preact's `compat`,
 * and the 3D preview drawn with three.js directly, without @react-three/fiber): that design needs no plugin,
 * and is the one to move to. Today it would mean rewriting the preview's components (about 1,200 lines
 * in src/components/preview: canvas, frame loop, orbit controls, fold animation, the frame-rendered signal
 * the browser tests wait for) as imperative three.js, in one change, while that folder is being extended;
 * the plugin is under 100 lines. Its two risks are held by tests: tests/config/island-runtimes.test.ts (which files
 * get compat) and tests/config/island-runtimes-libraries.test.ts (COMPAT_LIBRARIES is exactly the React
 * libraries the Preact islands load, and the Astro internal below still exists).
 */

/** Globs for the integrations' `include` options (which JSX transform and renderer a file gets). */
export const REACT_ISLANDS = ['**/src/components/preview/**'];
export const PREACT_ISLANDS = ['**/src/components/**/*.tsx'];

/** React libraries used by the Preact islands; bundled on the server too, so the alias reaches them. */
export const COMPAT_LIBRARIES = [
  '@tanstack/react-query',
  '@tanstack/react-table',
  'react-hook-form',
  '@hookform/resolvers',
];

const ALIASES = {
  react: 'preact/compat',
  'react-dom': 'preact/compat',
  'react-dom/client': 'preact/compat/client',
  'react/jsx-runtime': 'preact/jsx-runtime',
  'react/jsx-dev-runtime': 'preact/jsx-dev-runtime',
};

/**
 * True when a module imported by `importer` should see preact/compat as `react`.
 * @param {string} importer the importing module's id (an absolute path, maybe with a query)
 */
export function importsCompat(importer) {
  const file = (importer.split('?')[0] ?? '').replaceAll('\\', '/');
  if (file.includes('/node_modules/')) return COMPAT_LIBRARIES.some((lib) => file.includes(`/node_modules/${lib}/`));
  return file.includes('/src/') && !file.includes('/src/components/preview/');
}

/**
 * Rewrites `react` imports to Preact's in the modules importsCompat picks, and on the server tags each Preact
 * island's default export for @astrojs/preact, so Astro does not try rendering it with React first. It works
 * on the compiled JavaScript (after JSX and TypeScript, before Vite resolves imports) rather than in
 * resolveId, because the dev server never asks plugins to resolve a package it keeps external on the server,
 * such as `react`.
 * @returns {import('vite').Plugin}
 */
export function islandRuntimes() {
  return {
    name: 'kitwright:island-runtimes',
    enforce: 'post',
    async transform(code, id, options) {
      if (!/\.[cm]?[jt]sx?($|\?)/.test(id) || !importsCompat(id) || !code.includes('react')) return null;
      await init;
      const [imports, exports] = parse(code, id);
      const out = new MagicString(code);
      for (const { n: name, s: start, e: end } of imports) {
        const target =
          name && Object.hasOwn(ALIASES, name) ? ALIASES[/** @type {keyof typeof ALIASES} */ (name)] : null;
        // A dynamic import's range includes its quotes; a static import's does not.
        if (target) out.overwrite(start, end, code[start] === '"' || code[start] === "'" ? `'${target}'` : target);
      }
      const island = exports.find((e) => e.n === 'default')?.ln;
      if (options?.ssr && island && id.includes('/src/components/')) {
        out.append(
          `\nimport { __astro_tag_component__ as __kwTagIsland } from 'astro/runtime/server/index.js';` +
            `\n__kwTagIsland(${island}, '@astrojs/preact');\n`,
        );
      }
      return out.hasChanged()
        ? { code: out.toString(), map: out.generateMap({ hires: 'boundary', source: id }) }
        : null;
    },
  };
}
