/**
 * The live-links list's filters from a query string, and the search as a LIKE pattern. The escaping follows
 * PostgreSQL 15 documentation, 9.7.1 LIKE: "_" matches any one character, "%" any run, and the default escape
 * character is the backslash.
 */
import { describe, expect, it } from 'vitest';
import {
  LINK_FILTER_NONE,
  LINK_SEARCH_MAX,
  linkFilterFromQuery,
  linkSearchPattern,
} from '../../../src/lib/links/link-filter';

describe('linkFilterFromQuery', () => {
  it('reads the search, whose links and the state', () => {
    const params = new URLSearchParams({ q: '  shake test ', owner: 'kit', state: 'retired' });
    expect(linkFilterFromQuery(params)).toEqual({ search: 'shake test', owner: 'kit', state: 'retired' });
  });

  it('reads unknown or missing values as no filter, so a stale address still shows the list', () => {
    expect(linkFilterFromQuery(new URLSearchParams())).toEqual(LINK_FILTER_NONE);
    expect(linkFilterFromQuery(new URLSearchParams({ owner: 'KIT', state: 'gone' }))).toEqual(LINK_FILTER_NONE);
  });

  it('cuts a search longer than the longest kept', () => {
    const long = 'x'.repeat(LINK_SEARCH_MAX + 20);
    expect(linkFilterFromQuery(new URLSearchParams({ q: long })).search).toHaveLength(LINK_SEARCH_MAX);
  });
});

describe('linkSearchPattern', () => {
  it('matches the text anywhere, taking %, _ and the backslash literally', () => {
    expect(linkSearchPattern('poster')).toBe('%poster%');
    expect(linkSearchPattern('50%_off\\')).toBe('%50\\%\\_off\\\\%');
  });
});
