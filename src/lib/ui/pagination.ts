/**
 * Pages of a long list read from the query string (?page=2): the page number parsed once, the page count,
 * and the address of another page that keeps the other query parameters.
 */
import { z } from 'zod';

/** Highest page number accepted; a typing-mistake guard (common practice, no source). */
export const PAGE_NUMBER_MAX = 100_000;

const PageNumberSchema = z.coerce.number().int().min(1).max(PAGE_NUMBER_MAX);

/** The ?page= of a URL, or 1 when it is missing or not a page number. */
export function pageNumberFrom(params: URLSearchParams): number {
  const parsed = PageNumberSchema.safeParse(params.get('page') ?? undefined);
  return parsed.success ? parsed.data : 1;
}

/** How many pages `total` rows fill at `pageSize` a page; at least 1, so an empty list still has its page. */
export function pageCount(total: number, pageSize: number): number {
  return Math.max(1, Math.ceil(total / pageSize));
}

/** The search part of the address of `page`, keeping every other parameter of `params` ("?q=x&page=2"). */
export function pageHref(params: URLSearchParams, page: number): string {
  const next = new URLSearchParams(params);
  if (page <= 1) next.delete('page');
  else next.set('page', String(page));
  const text = next.toString();
  return text ? `?${text}` : '?';
}
