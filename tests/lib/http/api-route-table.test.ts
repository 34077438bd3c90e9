import { describe, expect, it } from 'vitest';
import { apiRoutePattern, apiRouteTable } from '../../../src/lib/http/api-route-table';
import { routesOnDisk } from '../../api/routes-on-disk';

const patterns = [...new Set(routesOnDisk().map((r) => r.route))];
const table = apiRouteTable(patterns.map((p) => [p, p] as const));
const routeOf = (path: string) => table.match(path)?.route.pattern ?? null;

describe('apiRoutePattern', () => {
  it('names a file as Astro names its route: no .ts, no last /index, helpers left out', () => {
    expect(apiRoutePattern('/api/classes/index.ts')).toBe('/api/classes');
    expect(apiRoutePattern('/api/kits/[id].pdf.ts')).toBe('/api/kits/[id].pdf');
    expect(apiRoutePattern('/api/kits/_download.ts')).toBeNull();
    expect(apiRoutePattern('/api/_shared/helper.ts')).toBeNull();
  });
});

describe('apiRouteTable over the API route files', () => {
  it('takes every route file, and each route answers a path made from its own pattern', () => {
    expect(patterns.length).toBeGreaterThan(80);
    for (const pattern of patterns) {
      if (pattern.includes('[...')) continue;
      const path = pattern.replace(/\[([^\]]+)\]/g, (_, name: string) => `x-${name}-1`);
      expect(routeOf(path), path).toBe(pattern);
    }
  });

  it('prefers a static segment, then a param with static text, then a bare param, then the rest (Astro route priority)', () => {
    expect(routeOf('/api/kits/preview')).toBe('/api/kits/preview');
    expect(routeOf('/api/kits/k1.pdf')).toBe('/api/kits/[id].pdf');
    expect(routeOf('/api/kits/k1')).toBe('/api/kits/[id]');
    expect(routeOf('/api/events/registrations/cancel')).toBe('/api/events/registrations/cancel');
    expect(routeOf('/api/events/e1/registrations')).toBe('/api/events/[id]/registrations');
    expect(routeOf('/api/no/such/route')).toBe('/api/[...path]');
  });

  it('gives params, ignores a trailing slash, and matches no path with a dot segment', () => {
    expect(table.match('/api/kits/k%201/duplicate/')?.params).toEqual({ id: 'k%201' });
    expect(table.match('/api/no/such')?.params).toEqual({ path: 'no/such' });
    expect(table.match('/api/')?.params).toEqual({ path: undefined });
    expect(routeOf('/api/kits/..')).toBeNull();
    expect(routeOf('/api/./health')).toBeNull();
  });
});
