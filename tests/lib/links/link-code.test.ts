/**
 * Reading a live code from a request-target, and a target as a Location header value. The encoding is checked
 * against the WHATWG URL parser (Node's URL, an implementation of the URL Standard, "path percent-encode set"
 * and "query percent-encode set") and the header rule against RFC 9110, 5.5 (field values: visible ASCII,
 * space and tab, obs-text; no controls).
 */
import { describe, expect, it } from 'vitest';
import { linkCodeFromTarget, linkLocation } from '../../../src/lib/links/link-code';

describe('linkCodeFromTarget', () => {
  it('reads the code of /go/CODE in any case, with a trailing slash, a query or percent-encoded letters', () => {
    for (const target of ['/go/K7M2PQ', '/go/k7m2pq', '/go/K7M2PQ/', '/go/K7M2PQ?utm=poster', '/go/%4B7M2PQ']) {
      expect(linkCodeFromTarget(target), target).toBe('K7M2PQ');
    }
    expect(linkCodeFromTarget('/go/K7M2PQRS')).toBe('K7M2PQRS');
  });

  it('gives null for other paths, codes with look-alike letters, bad lengths and malformed escapes', () => {
    for (const target of [
      '/go/',
      '/go',
      '/links/K7M2PQ',
      '/api/go/K7M2PQ',
      '/go/K7M2PQ/more',
      '/go/K7M2P0',
      '/go/K7M2PI',
      '/go/K7M2P',
      '/go/K7M2PQRST',
      '/go/%E0%A4%A',
      '/go/K7M2PQ//',
    ]) {
      expect(linkCodeFromTarget(target), target).toBeNull();
    }
  });
});

describe('linkLocation', () => {
  it('keeps a printable ASCII target as stored', () => {
    for (const target of ['/activities?grade=6-8#top', 'https://example.org/mission/a%20b?x=1&y=2']) {
      expect(linkLocation(target)).toBe(target);
    }
  });

  it('percent-encodes non-ASCII and spaces in UTF-8 as the WHATWG URL parser does', () => {
    for (const target of ['https://example.org/día del cohete', 'https://example.org/x?q=ü', '/activities/é x']) {
      const parsed = new URL(target, 'https://site.example').toString();
      const located = new URL(linkLocation(target), 'https://site.example').toString();
      expect(located, target).toBe(parsed);
      expect(linkLocation(target)).toMatch(/^[\x21-\x7e]+$/);
    }
    expect(linkLocation('/a\u{1F680}')).toBe('/a%F0%9F%9A%80');
  });

  it('leaves no control character a header could not carry, and encodes a lone surrogate as U+FFFD', () => {
    expect(linkLocation('/a\r\nSet-Cookie: x=1')).toBe('/a%0D%0ASet-Cookie:%20x=1');
    expect(linkLocation('/a\uD800b')).toBe('/a%EF%BF%BDb');
    expect(new URL('/a\uD800b', 'https://site.example').pathname).toBe('/a%EF%BF%BDb');
  });
});
