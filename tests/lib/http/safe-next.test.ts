/**
 * The `next` check against the WHATWG URL Standard's basic URL parser (Node's global URL implements it, as
 * browsers do when they follow a Location header or `location.assign`): tabs and newlines are removed anywhere,
 * `\` counts as `/` in http(s) URLs, `//host` is a network-path reference (RFC 3986 §4.2). The attack strings are
 * the open-redirect shapes listed in OWASP's Unvalidated Redirects and Forwards Cheat Sheet and the issue brief.
 */
import { describe, expect, it } from 'vitest';
import { SAFE_NEXT_LENGTH_MAX, safeNextPath } from '../../../src/lib/http/safe-next';

const SITE = 'https://kits.example.org/join';

/** Every way a browser or a decoding proxy may read the value: as given and after each percent-decoding round. */
function readings(value: string): string[] {
  const forms = [value];
  let form = value;
  for (let i = 0; i < 4; i += 1) {
    try {
      const next = decodeURIComponent(form);
      if (next === form) break;
      forms.push(next);
      form = next;
    } catch {
      break;
    }
  }
  return forms;
}

function staysOnSite(value: string): boolean {
  return readings(value).every((form) => new URL(form, SITE).host === 'kits.example.org');
}

describe('safeNextPath', () => {
  it('keeps same-site paths with their query and fragment', () => {
    for (const good of [
      '/classes/1',
      '/kits/3f2a9c1e-8d4b-4c1a-9e2f-0a1b2c3d4e5f',
      '/class',
      '/kits/new?model=skein&scale=20',
      '/activities/shake-test#data',
      '/',
      '/a?u=//x',
    ]) {
      expect(safeNextPath(good)).toBe(good);
      expect(staysOnSite(good)).toBe(true);
    }
  });

  const REFUSED: [string, (string | null | undefined)[]][] = [
    [
      'absent, empty, relative and absolute values',
      [
        null,
        undefined,
        '',
        'classes',
        'https://evil.example',
        'http:evil.example',
        'javascript:alert(1)',
        'data:text/html,x',
        ' /classes',
      ],
    ],
    [
      'protocol-relative and backslash forms',
      ['//evil.example', '///evil.example', '/\\evil.example', '\\\\evil.example', '/\\/evil.example'],
    ],
    [
      'tabs, newlines and control characters, raw or encoded',
      [
        '/\t/evil.example',
        '/\n/evil.example',
        '/\r/x',
        '/\u0000x',
        '/x\u007f',
        '/%09/evil.example',
        '/%0A/x',
        '/%0d/x',
        '/%00',
        '/%7F',
      ],
    ],
    [
      'encoded slashes, backslashes, dot segments and nested encodings',
      [
        '/%2F%2Fevil.example',
        '/%2fevil.example/..',
        '/%5Cevil.example',
        '/%252F%252Fevil.example',
        '/../evil',
        '/a/./b',
        '/%2e%2e/x',
        '/%25252525',
        '/%',
        '/%zz',
      ],
    ],
    [
      'non-ASCII, raw or encoded (the ideographic full stop reads as a dot in a host)',
      ['/%E3%80%82x', '/\u3002x', '/%EF%BC%8F%EF%BC%8Fevil.example', '/caf\u00e9', '/\u2028x'],
    ],
  ];

  it.each(REFUSED)('refuses %s', (_kind, values) => {
    for (const bad of values) expect(safeNextPath(bad), JSON.stringify(bad)).toBeNull();
  });

  it('refuses exactly what the reference parser reads as another host', () => {
    // Refusing these is required, not merely cautious: a browser leaves the site on each.
    for (const away of ['/\\evil.example', '//evil.example', '/\t/evil.example']) {
      expect(new URL(away, SITE).host).toBe('evil.example');
    }
    // UTS #46 maps U+3002 to "." in host names, which is why non-ASCII is refused anywhere in a next path.
    expect(new URL('https://evil\u3002example/').host).toBe('evil.example');
  });

  it('refuses values longer than the limit', () => {
    expect(safeNextPath(`/${'a'.repeat(SAFE_NEXT_LENGTH_MAX - 1)}`)).not.toBeNull();
    expect(safeNextPath(`/${'a'.repeat(SAFE_NEXT_LENGTH_MAX)}`)).toBeNull();
  });

  it('never accepts a value that any reading of the WHATWG parser sends off the site (seeded random strings)', () => {
    const alphabet = [
      '/',
      '/',
      '\\',
      '%',
      '2F',
      '5C',
      '09',
      '0A',
      'E3',
      '80',
      '82',
      '.',
      ':',
      '@',
      '?',
      '#',
      '\t',
      '\n',
      'e',
      'v',
      'x',
      ' ',
      '。',
    ];
    let seed = 20261204;
    const random = () => {
      seed = (seed * 1103515245 + 12345) % 2147483648; // ANSI C rand() constants
      return seed / 2147483648;
    };
    let accepted = 0;
    for (let i = 0; i < 20000; i += 1) {
      const length = 1 + Math.floor(random() * 8);
      let value = '';
      for (let j = 0; j < length; j += 1) value += alphabet[Math.floor(random() * alphabet.length)];
      const verdict = safeNextPath(value);
      if (verdict !== null) {
        accepted += 1;
        expect(staysOnSite(value), JSON.stringify(value)).toBe(true);
      }
    }
    expect(accepted).toBeGreaterThan(100);
  });
});
