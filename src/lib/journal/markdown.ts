/**
 * An entry's Markdown body as safe HTML: markdown-it with raw HTML off (tags in the text stay text), then
 * sanitize-html with a short allow-list of the elements Markdown produces, so nothing markdown-it lets through by
 * mistake can run either. Links keep only absolute http, https and mailto addresses and get rel="nofollow noopener";
 * images are not allowed (photos go through the upload, where their metadata is removed).
 */
import MarkdownIt from 'markdown-it';
import sanitizeHtml from 'sanitize-html';

/** The link schemes an entry may use. */
export const MARKDOWN_LINK_SCHEMES = ['http', 'https', 'mailto'] as const;

/** The elements Markdown produces that an entry keeps; everything else is shown as text. */
export const MARKDOWN_ALLOWED_TAGS = [
  'p',
  'br',
  'hr',
  'h1',
  'h2',
  'h3',
  'h4',
  'h5',
  'h6',
  'strong',
  'em',
  's',
  'code',
  'pre',
  'blockquote',
  'ul',
  'ol',
  'li',
  'a',
  'table',
  'thead',
  'tbody',
  'tr',
  'th',
  'td',
] as const;

const SCHEME = /^([a-z][a-z0-9+.-]*):/i;

/** True for an absolute address with an allowed scheme (relative links are refused: a journal links out). */
export function markdownLinkAllowed(href: string): boolean {
  // Browsers drop ASCII whitespace and control characters inside a scheme ("java\tscript:"), so compare without them.
  // eslint-disable-next-line no-control-regex
  const bare = href.replace(/[\u0000-\u0020\u007f-\u009f]/g, '');
  const scheme = SCHEME.exec(bare)?.[1]?.toLowerCase();
  return scheme !== undefined && (MARKDOWN_LINK_SCHEMES as readonly string[]).includes(scheme);
}

const md = new MarkdownIt({ html: false, linkify: true, typographer: false, breaks: false });
md.validateLink = markdownLinkAllowed;
md.disable(['image']);

const SANITIZE: sanitizeHtml.IOptions = {
  allowedTags: [...MARKDOWN_ALLOWED_TAGS],
  allowedAttributes: { a: ['href', 'rel'], ol: ['start'], th: ['style'], td: ['style'] },
  allowedStyles: { '*': { 'text-align': [/^(left|right|center)$/] } },
  allowedSchemes: [...MARKDOWN_LINK_SCHEMES],
  allowedSchemesAppliedToAttributes: ['href'],
  allowProtocolRelative: false,
  disallowedTagsMode: 'escape',
  transformTags: {
    a: (tagName, attribs) => ({
      tagName,
      attribs: {
        ...(attribs.href && markdownLinkAllowed(attribs.href) ? { href: attribs.href } : {}),
        rel: 'nofollow noopener',
      },
    }),
  },
};

/** The body as sanitized HTML. */
export function markdownToSafeHtml(source: string): string {
  return sanitizeHtml(md.render(source), SANITIZE);
}

/**
 * The body as plain text for a summary (no markup), cut at `max` characters on a word: the text of the parsed
 * Markdown's tokens (what the rendered HTML shows, images' alt text aside), read only until the cut. No HTML
 * is rendered or sanitized, and only the paragraphs the cut needs are parsed: a queue page summarises 25 entries,
 * and rendering each whole body cost about 0.6 ms.
 */
export function markdownExcerpt(source: string, max = 220): string {
  const key = `${max}\u0000${source}`;
  let excerpt = excerpts.get(key);
  if (excerpt === undefined) {
    excerpt = excerptOf(source, max);
    if (excerpts.size >= EXCERPTS_KEPT) excerpts.delete(excerpts.keys().next().value!);
  } else excerpts.delete(key); // set again below: a Map's order is the recency order
  excerpts.set(key, excerpt);
  return excerpt;
}

/** Excerpts kept, by body: a queue page shows the same 25 bodies to every coordinator until one is decided. */
const EXCERPTS_KEPT = 2_000;
const excerpts = new Map<string, string>();

function excerptOf(source: string, max: number): string {
  const start = excerptSource(source, max);
  let plain = markdownPlainText(start, max);
  // Paragraphs of little text (long link addresses): read the whole body after all.
  if (plain.length < max && start.length < source.length) plain = markdownPlainText(source, max);
  if (plain.length <= max) return plain;
  const cut = plain.slice(0, max);
  return `${cut.slice(0, Math.max(cut.lastIndexOf(' '), max - 30))}…`;
}

/** The text of the Markdown's tokens, whitespace collapsed, read until a little past `max` characters. */
function markdownPlainText(source: string, max: number): string {
  const parts: string[] = [];
  let length = 0;
  const add = (text: string) => {
    parts.push(text);
    length += text.length;
  };
  for (const block of md.parse(source, {})) {
    if (block.type === 'inline') {
      for (const t of block.children ?? []) {
        if (t.type === 'text' || t.type === 'code_inline') add(t.content);
        else if (t.type === 'softbreak' || t.type === 'hardbreak') add(' ');
      }
    } else if (block.type === 'fence' || block.type === 'code_block') add(block.content);
    add(' ');
    // Whitespace may still collapse, so read on a little past the cut before stopping.
    if (length > 2 * max + 50) break;
  }
  return parts.join('').replace(/\s+/g, ' ').trim();
}

/**
 * The start of a body that holds its first `max` characters of text: whole paragraphs up to the first blank line
 * past 3 × max characters (no inline markup spans a blank line, so the cut changes nothing before it).
 */
function excerptSource(source: string, max: number): string {
  const blank = source.indexOf('\n\n', 3 * max);
  return blank < 0 ? source : source.slice(0, blank);
}
