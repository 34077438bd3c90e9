/**
 * Every API route under src/pages/api as Astro names it ('/api/kits/[id]'), with each method its file exports and
 * the file itself: read from the file system, so the authorization matrix and the fuzz suite cover a route the
 * moment its file exists.
 */
import { readdirSync, readFileSync } from 'node:fs';
import { join, relative } from 'node:path';

export const API_DIR = join(process.cwd(), 'src', 'pages', 'api');
const METHOD_EXPORT = /export\s+(?:const|async\s+function|function)\s+(GET|POST|PUT|PATCH|DELETE|ALL)\b/g;

export interface RouteOnDisk {
  /** The route as Astro names it: '/api/kits/[id].pdf'. */
  route: string;
  /** An exported method name (ALL for a catch-all handler). */
  method: string;
  /** The route file's absolute path. */
  file: string;
}

/** Every route file under src/pages/api with the methods it exports. */
export function routesOnDisk(): RouteOnDisk[] {
  const found: RouteOnDisk[] = [];
  const walk = (dir: string) => {
    for (const entry of readdirSync(dir, { withFileTypes: true })) {
      // Astro leaves files and folders whose name starts with "_" out of routing.
      if (entry.name.startsWith('_')) continue;
      const full = join(dir, entry.name);
      if (entry.isDirectory()) walk(full);
      else if (/\.(ts|js|mjs)$/.test(entry.name) && !entry.name.endsWith('.d.ts')) {
        const route = ('/api/' + relative(API_DIR, full).replace(/\\/g, '/'))
          .replace(/\.(ts|js|mjs)$/, '')
          .replace(/\/index$/, '');
        for (const m of readFileSync(full, 'utf8').matchAll(METHOD_EXPORT))
          found.push({ route, method: m[1]!, file: full });
      }
    }
  };
  walk(API_DIR);
  return found;
}
