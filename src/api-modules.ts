/**
 * The API route modules (src/pages/api), loaded on first use: the middleware reads a route's methods from its
 * exports for a 405, and the production server's API path (src/server/api-serve.ts) routes to them. Keys are
 * paths relative to src ('./pages/api/kits/[id].pdf.ts'); files starting with `_` are helpers, not routes.
 */
export type ApiModule = Record<string, unknown>;

export const API_MODULES = import.meta.glob<ApiModule>('./pages/api/**/*.ts');
