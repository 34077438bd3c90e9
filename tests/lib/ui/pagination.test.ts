import { describe, expect, it } from 'vitest';
import { pageCount, pageHref, pageNumberFrom } from '../../../src/lib/ui/pagination';

describe('pageNumberFrom', () => {
  it('reads a page number and falls back to the first page for anything else', () => {
    expect(pageNumberFrom(new URLSearchParams('page=3'))).toBe(3);
    for (const bad of ['', 'page=0', 'page=-2', 'page=1.5', 'page=abc', 'page=1e9']) {
      expect(pageNumberFrom(new URLSearchParams(bad)), bad).toBe(1);
    }
  });
});

describe('pageCount', () => {
  it('rounds up and keeps one page for an empty list', () => {
    expect(pageCount(0, 25)).toBe(1);
    expect(pageCount(25, 25)).toBe(1);
    expect(pageCount(26, 25)).toBe(2);
  });
});

describe('pageHref', () => {
  it('keeps the other parameters and drops page=1', () => {
    const params = new URLSearchParams('q=field&page=4');
    expect(pageHref(params, 5)).toBe('?q=field&page=5');
    expect(pageHref(params, 1)).toBe('?q=field');
    expect(pageHref(new URLSearchParams(), 1)).toBe('?');
  });
});
