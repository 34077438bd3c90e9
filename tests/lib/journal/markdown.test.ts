import fc from 'fast-check';
import sanitizeHtml from 'sanitize-html';
/**
 * Entry bodies render no script, no event handler, no raw HTML and no link outside http/https/mailto. Judged by
 * parse5 (the WHATWG HTML parsing algorithm, as a browser would read the output), not by the sanitizer itself.
 */
import { parseFragment } from 'parse5';
import { describe, expect, it } from 'vitest';
import {
  MARKDOWN_ALLOWED_TAGS,
  markdownExcerpt,
  markdownLinkAllowed,
  markdownToSafeHtml,
} from '../../../src/lib/journal/markdown';

/**
 * Attack strings in the style of the OWASP "XSS Filter Evasion Cheat Sheet" (cheatsheetseries.owasp.org),
 * // from memory: written down from that sheet's sections (basic script, image/event handlers, javascript: and
 * // entity-encoded schemes, embedded tab/newline, malformed tags, SVG/iframe/object/meta, style expressions),
 * plus the Markdown forms of the same attacks (inline links, reference links, autolinks).
 */
const XSS_VECTORS = [
  '<script>alert(1)</script>',
  '<SCRIPT SRC=https://xss.example/xss.js></SCRIPT>',
  '<IMG SRC="javascript:alert(\'XSS\');">',
  "<IMG SRC=javascript:alert('XSS')>",
  "<IMG SRC=JaVaScRiPt:alert('XSS')>",
  '<IMG SRC=`javascript:alert("RSnake says, \'XSS\'")`>',
  '<IMG """><SCRIPT>alert("XSS")</SCRIPT>">',
  '<IMG SRC=# onmouseover="alert(\'xxs\')">',
  '<IMG SRC=/ onerror="alert(String.fromCharCode(88,83,83))"></img>',
  '<img src=x onerror="&#0000106&#0000097&#0000118&#0000097&#0000115&#0000099&#0000114&#0000105&#0000112&#0000116&#0000058&#0000097&#0000108&#0000101&#0000114&#0000116&#0000040&#0000039&#0000088&#0000083&#0000083&#0000039&#0000041">',
  '<IMG SRC="jav\tascript:alert(\'XSS\');">',
  '<IMG SRC="jav&#x09;ascript:alert(\'XSS\');">',
  '<IMG SRC=" &#14;  javascript:alert(\'XSS\');">',
  '<SCRIPT/XSS SRC="http://xss.example/xss.js"></SCRIPT>',
  '<BODY onload!#$%&()*~+-_.,:;?@[/|\\]^`=alert("XSS")>',
  '<<SCRIPT>alert("XSS");//\\<</SCRIPT>',
  '<SCRIPT SRC=http://xss.example/xss.js?< B >',
  '<iframe src=http://xss.example/scriptlet.html <',
  '</TITLE><SCRIPT>alert("XSS");</SCRIPT>',
  '<INPUT TYPE="IMAGE" SRC="javascript:alert(\'XSS\');">',
  '<BODY BACKGROUND="javascript:alert(\'XSS\')">',
  "<svg/onload=alert('XSS')>",
  '<svg><script>alert(1)</script></svg>',
  '<LINK REL="stylesheet" HREF="javascript:alert(\'XSS\');">',
  '<META HTTP-EQUIV="refresh" CONTENT="0;url=javascript:alert(\'XSS\');">',
  '<IFRAME SRC="javascript:alert(\'XSS\');"></IFRAME>',
  '<TABLE BACKGROUND="javascript:alert(\'XSS\')">',
  '<DIV STYLE="background-image: url(javascript:alert(\'XSS\'))">',
  '<DIV STYLE="width: expression(alert(\'XSS\'));">',
  '<OBJECT TYPE="text/x-scriptlet" DATA="http://xss.example/scriptlet.html"></OBJECT>',
  '<EMBED SRC="data:image/svg+xml;base64,PHN2ZyB4bWxuczpzdmc9Imh0dH A6Ly93d3cudzMub3JnLzIwMDAvc3ZnIiB4bWxucz0iaHR0cDovL3d3dy53My5vcmcv MjAwMC9zdmciIHhtbG5zOnhsaW5rPSJodHRwOi8vd3d3LnczLm9yZy8xOTk5L3hs aW5rIiB2ZXJzaW9uPSIxLjAiIHg9IjAiIHk9IjAiIHdpZHRoPSIxOTQiIGhlaWdodD0iMjAw IiBpZD0ieHNzIj48c2NyaXB0IHR5cGU9InRleHQvZWNtYXNjcmlwdCI+YWxlcnQoIlh TUyIpOzwvc2NyaXB0Pjwvc3ZnPg==" AllowScriptAccess="always"></EMBED>',
  '<a href="javascript:alert(1)">click</a>',
  '<form action="javascript:alert(1)"><button>go</button></form>',
  '<details open ontoggle=alert(1)>',
  '<math><mtext><table><mglyph><style><img src=x onerror=alert(1)></style></mglyph></table></mtext></math>',
  '[click](javascript:alert(1))',
  '[click](JAVASCRIPT:alert(1))',
  '[click](java\u0000script:alert(1))',
  '[click](&#106;avascript:alert(1))',
  '[click](data:text/html;base64,PHNjcmlwdD5hbGVydCgxKTwvc2NyaXB0Pg==)',
  '[click](vbscript:msgbox(1))',
  '[click][ref]\n\n[ref]: javascript:alert(1)',
  '<javascript:alert(1)>',
  '![x](javascript:alert(1))',
  '![x](https://tracker.example/pixel.png)',
  '[a](https://ok.example/ "title" onclick="alert(1)")',
  '`<script>` inside code is text',
  '```html\n<script>alert(1)</script>\n```',
] as const;

const ALLOWED = new Set<string>(MARKDOWN_ALLOWED_TAGS);
/** Elements that can run script, load a resource or submit data; none may be on the allow-list. */
const DANGEROUS = [
  'script',
  'img',
  'iframe',
  'svg',
  'math',
  'object',
  'embed',
  'style',
  'link',
  'meta',
  'form',
  'input',
  'button',
  'base',
  'body',
  'video',
  'audio',
  'source',
  'details',
  'template',
  'frame',
  'frameset',
];

interface P5Node {
  nodeName: string;
  tagName?: string;
  attrs?: { name: string; value: string }[];
  childNodes?: P5Node[];
}

/** Every element of the parsed fragment with its attributes. */
function elements(html: string): { tag: string; attrs: Record<string, string> }[] {
  const out: { tag: string; attrs: Record<string, string> }[] = [];
  const walk = (node: P5Node) => {
    if (node.tagName)
      out.push({ tag: node.tagName, attrs: Object.fromEntries((node.attrs ?? []).map((a) => [a.name, a.value])) });
    for (const child of node.childNodes ?? []) walk(child);
  };
  walk(parseFragment(html) as unknown as P5Node);
  return out;
}

describe('markdownToSafeHtml', () => {
  it('allows no element that can run script, load a resource or submit a form', () => {
    expect(DANGEROUS.filter((tag) => ALLOWED.has(tag))).toEqual([]);
  });

  it(`renders none of ${XSS_VECTORS.length} attack strings as markup a browser would run`, () => {
    expect(XSS_VECTORS.length).toBeGreaterThanOrEqual(30);
    for (const vector of XSS_VECTORS) {
      const html = markdownToSafeHtml(vector);
      for (const el of elements(html)) {
        expect(ALLOWED.has(el.tag), `${vector} → <${el.tag}>`).toBe(true);
        for (const [name, value] of Object.entries(el.attrs)) {
          expect(name.startsWith('on'), `${vector} → ${name}`).toBe(false);
          expect(['href', 'rel', 'start', 'style'].includes(name), `${vector} → attribute ${name}`).toBe(true);
          if (name === 'href') expect(value, vector).toMatch(/^(https?:|mailto:)/i);
          if (name === 'style') expect(value, vector).toMatch(/^text-align:(left|right|center);?$/);
        }
      }
      expect(html.toLowerCase(), vector).not.toMatch(/<script|<img|<iframe|<svg|<object|<embed/);
    }
  });

  it('keeps ordinary Markdown: emphasis, lists, tables, code and safe links with rel', () => {
    const html = markdownToSafeHtml(
      '# Drop test\n\n**Bold** and *soft*.\n\n- one\n- two\n\n| a | b |\n|:-|-:|\n| 1 | 2 |\n\n`x < y`\n\n[site](https://example.org/a?b=1) and mail@example.org',
    );
    const els = elements(html);
    expect(els.map((e) => e.tag)).toEqual(
      expect.arrayContaining(['h1', 'strong', 'em', 'ul', 'li', 'table', 'th', 'td', 'code', 'a']),
    );
    const links = els.filter((e) => e.tag === 'a');
    expect(links.map((l) => l.attrs.href)).toEqual(['https://example.org/a?b=1', 'mailto:mail@example.org']);
    for (const l of links) expect(l.attrs.rel).toBe('nofollow noopener');
    expect(html).toContain('x &lt; y');
  });

  it('shows raw HTML as text rather than dropping the words', () => {
    expect(markdownToSafeHtml('<b>bold?</b>')).toBe('<p>&lt;b&gt;bold?&lt;/b&gt;</p>\n');
  });
});

describe('markdownLinkAllowed', () => {
  it.each([
    ['https://example.org', true],
    ['http://example.org', true],
    ['mailto:a@example.org', true],
    ['/activities/drop-test', false],
    ['#section', false],
    ['javascript:alert(1)', false],
    [' java\tscript:alert(1)', false],
    ['data:text/html,x', false],
    ['//evil.example/x', false],
    ['vbscript:x', false],
  ])('%s → %s', (href, allowed) => {
    expect(markdownLinkAllowed(href)).toBe(allowed);
  });
});

describe('markdownExcerpt', () => {
  it('strips markup, decodes entities once and cuts on a word', () => {
    expect(markdownExcerpt('**Tom & Jerry** <b>', 100)).toBe('Tom & Jerry <b>');
    const long = markdownExcerpt('word '.repeat(100), 40);
    expect(long.length).toBeLessThanOrEqual(41);
    expect(long.endsWith('word…')).toBe(true);
  });

  // The reference: the body as the entry page renders it (markdownToSafeHtml), stripped of every tag by
  // sanitize-html (a library from the registry), whitespace collapsed and cut the same way. The excerpt, which
  // renders no HTML, must read the same text.
  const reference = (source: string, max: number) => {
    const plain = sanitizeHtml(markdownToSafeHtml(source), {
      allowedTags: [],
      allowedAttributes: {},
    })
      .replace(/&lt;/g, '<')
      .replace(/&gt;/g, '>')
      .replace(/&quot;/g, '"')
      .replace(/&#39;/g, "'")
      .replace(/&amp;/g, '&')
      .replace(/\s+/g, ' ')
      .trim();
    if (plain.length <= max) return plain;
    const cut = plain.slice(0, max);
    return `${cut.slice(0, Math.max(cut.lastIndexOf(' '), max - 30))}…`;
  };
  const fragment = fc.constantFrom(
    'probe ',
    'boom folded ',
    '**bold words** ',
    '*tilted* ',
    '`code` ',
    '[a link](https://example.org/a/very/long/address/that/has/no/text/to/show) ',
    'https://example.org/bare ',
    'Tom & Jerry ',
    '&amp; &lt;b&gt; ',
    '<b>raw</b> ',
    '\n',
    '\n\n',
    '\n\n- item one\n- item two\n\n',
    '\n\n```\nfenced line\n```\n\n',
    '\n\n# Heading\n\n',
    '![alt text](https://example.org/p.png) ',
  );
  it('reads the same text as the rendered, tag-stripped body (fast-check, 300 bodies)', () => {
    fc.assert(
      fc.property(fc.array(fragment, { maxLength: 120 }), fc.integer({ min: 20, max: 300 }), (parts, max) => {
        const body = parts.join('');
        expect(markdownExcerpt(body, max)).toBe(reference(body, max));
      }),
      { numRuns: 300 },
    );
  });
});
