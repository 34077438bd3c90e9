/**
 * The API's route table for the server's own API path (src/server/api-serve.ts): the route files under
 * src/pages/api matched to a pathname the way Astro's file routing does, so the production server can call an
 * API route without Astro's page pipeline and still answer exactly the routes the dev server answers.
 *
 * - A file's route pattern is its path under src/pages without `.ts`, and without a last `/index`
 *   (`/api/kits/[id].pdf`, `/api/classes`); a file or folder whose name starts with `_` is not a route.
 * - `[name]` in a segment matches one or more characters other than `/`; `[...name]` matches the rest of the
 *   path, possibly nothing. A trailing slash is ignored (Astro's default `trailingSlash: 'ignore'`).
 * - When several patterns match, the one Astro ranks first wins: the ranking is Astro's route comparator
 *   (node_modules/astro/dist/core/routing/priority.js), restated here for segments of static text and params.
 * - A decoded path with a `.` or `..` segment matches no route (Astro leaves such paths unrouted too).
 */

interface SegmentPart {
  content: string;
  dynamic: boolean;
  spread: boolean;
}

export interface ApiRoute<T> {
  /** The route pattern, as Astro's `context.routePattern` names it. */
  pattern: string;
  value: T;
  segments: SegmentPart[][];
  regex: RegExp;
  paramNames: string[];
}

export interface ApiRouteMatch<T> {
  route: ApiRoute<T>;
  params: Record<string, string | undefined>;
}

/** The route pattern of a route file's path relative to src/pages ('/api/classes/index.ts' → '/api/classes'). */
export function apiRoutePattern(file: string): string | null {
  if (!file.endsWith('.ts') || file.split('/').some((segment) => segment.startsWith('_'))) return null;
  const pattern = file.slice(0, -'.ts'.length).replace(/\/index$/, '');
  return pattern === '' ? '/' : pattern;
}

const PARAM = /\[(\.\.\.)?([^\]]+)\]/g;

function segmentParts(segment: string): SegmentPart[] {
  const parts: SegmentPart[] = [];
  let at = 0;
  for (const m of segment.matchAll(PARAM)) {
    if (m.index > at) parts.push({ content: segment.slice(at, m.index), dynamic: false, spread: false });
    parts.push({ content: m[2]!, dynamic: true, spread: Boolean(m[1]) });
    at = m.index + m[0].length;
  }
  if (at < segment.length) parts.push({ content: segment.slice(at), dynamic: false, spread: false });
  return parts;
}

const escape = (text: string) => text.replace(/[.*+?^${}()|[\]\\]/g, '\\$&');

function routeOf<T>(pattern: string, value: T): ApiRoute<T> {
  const segments = pattern.split('/').filter(Boolean).map(segmentParts);
  const paramNames: string[] = [];
  const source = segments
    .map((parts) => {
      if (parts.length === 1 && parts[0]!.spread) {
        paramNames.push(parts[0]!.content);
        return '(?:/(.*?))?';
      }
      const inner = parts.map((part) => {
        if (!part.dynamic) return escape(part.content);
        paramNames.push(part.content);
        return part.spread ? '(.*?)' : '([^/]+?)';
      });
      return `/${inner.join('')}`;
    })
    .join('');
  return { pattern, value, segments, regex: new RegExp(`^${source}/?$`), paramNames };
}

/** Astro's route comparator over our segment shapes: negative when `a` is tried before `b`. */
export function apiRouteCompare(a: ApiRoute<unknown>, b: ApiRoute<unknown>): number {
  const common = Math.min(a.segments.length, b.segments.length);
  for (let i = 0; i < common; i++) {
    const as = a.segments[i]!,
      bs = b.segments[i]!;
    const aStatic = as.every((p) => !p.dynamic),
      bStatic = bs.every((p) => !p.dynamic);
    if (aStatic && bStatic) {
      const ac = as.map((p) => p.content).join(''),
        bc = bs.map((p) => p.content).join('');
      if (ac !== bc) return ac.localeCompare(bc);
    }
    if (aStatic !== bStatic) return aStatic ? -1 : 1;
    const aAllDynamic = as.every((p) => p.dynamic),
      bAllDynamic = bs.every((p) => p.dynamic);
    if (aAllDynamic !== bAllDynamic) return aAllDynamic ? 1 : -1;
    const aSpread = as.some((p) => p.spread),
      bSpread = bs.some((p) => p.spread);
    if (aSpread !== bSpread) return aSpread ? 1 : -1;
  }
  const al = a.segments.length,
    bl = b.segments.length;
  if (al !== bl) {
    const aRest = a.segments.at(-1)?.some((p) => p.spread) ?? false,
      bRest = b.segments.at(-1)?.some((p) => p.spread) ?? false;
    if (aRest !== bRest && Math.abs(al - bl) === 1) {
      if (al > bl && aRest) return 1;
      if (bl > al && bRest) return -1;
    }
    return al > bl ? -1 : 1;
  }
  return a.pattern.localeCompare(b.pattern);
}

/** A matcher over route patterns and their values (module loaders, in the server). */
export function apiRouteTable<T>(entries: readonly (readonly [pattern: string, value: T])[]) {
  const routes = entries.map(([pattern, value]) => routeOf(pattern, value)).sort(apiRouteCompare);
  // A path equal to an all-static pattern is that route: Astro's ranking puts a static segment before any param
  // at every position, and only patterns of as many segments (or one ending in a rest param) can match it.
  const statics = new Map(routes.filter((r) => r.paramNames.length === 0).map((r) => [r.pattern, r]));
  return {
    routes,
    /** The first route matching a decoded pathname, with its params; null when none does. */
    match(pathname: string): ApiRouteMatch<T> | null {
      const exact = statics.get(pathname.length > 1 && pathname.endsWith('/') ? pathname.slice(0, -1) : pathname);
      if (exact) return { route: exact, params: {} };
      if (pathname.split('/').some((s) => s === '.' || s === '..')) return null;
      for (const route of routes) {
        const m = route.regex.exec(pathname);
        if (!m) continue;
        const params: Record<string, string | undefined> = {};
        route.paramNames.forEach((name, i) => (params[name] = m[i + 1] || undefined));
        return { route, params };
      }
      return null;
    },
  };
}
