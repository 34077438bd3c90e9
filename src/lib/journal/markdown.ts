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

/** The body as plain text for a summary (no markup), cut at `max` characters on a word. */
export function markdownExcerpt(source: string, max = 220): string {
  const plain = sanitizeHtml(md.render(source), { allowedTags: [], allowedAttributes: {} })
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
}
