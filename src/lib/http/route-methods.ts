/**
 * Which methods an API route answers, read from the names its module exports, for the Allow header of a 405
 * (RFC 9110 §15.5.6: a 405 response MUST carry Allow with the target's supported methods).
 */

/** Methods a route file may export, in the order Allow lists them. */
export const ROUTE_METHODS = ['GET', 'HEAD', 'POST', 'PUT', 'PATCH', 'DELETE'] as const;

/** The methods a module answers: its exported method names, plus HEAD wherever GET is (Astro answers HEAD with GET). */
export function routeMethodsAllowed(exportNames: readonly string[]): string[] {
  const names = new Set(exportNames);
  if (names.has('GET')) names.add('HEAD');
  return ROUTE_METHODS.filter((m) => names.has(m));
}

/** The source files an Astro route pattern ('/api/kits/[id]') may come from, as paths relative to src/. */
export function routeModulePaths(routePattern: string): string[] {
  return [`./pages${routePattern}.ts`, `./pages${routePattern}/index.ts`];
}

/**
 * True when the URL's path or query holds a percent sign that does not start a UTF-8 escape (`?%`, `%E0%A4%A`,
 * `%FF`): such a URL names no route and no parameters (RFC 3986 §2.1), so it is answered 400, not guessed at.
 */
export function routeUrlMalformed(url: URL): boolean {
  try {
    decodeURIComponent(url.pathname);
    for (const part of url.search.slice(1).split(/[&=]/)) decodeURIComponent(part.replace(/\+/g, ' '));
    return false;
  } catch {
    return true;
  }
}
