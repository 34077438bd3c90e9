/**
 * The little Markdown our guide bodies use, as blocks for the PDF: `## ` headings and paragraphs (lines
 * joined by spaces). Emphasis markers and links are reduced to their text; anything else is kept as text.
 */

export type MarkdownBlock = { kind: 'heading'; text: string } | { kind: 'paragraph'; text: string };

/** Blocks in order; an empty or blank body gives []. */
export function markdownBlocks(body: string): MarkdownBlock[] {
  const blocks: MarkdownBlock[] = [];
  for (const chunk of body.split(/\n\s*\n/)) {
    const lines = chunk
      .trim()
      .split('\n')
      .map((l) => l.trim());
    if (lines.length === 0 || lines[0] === '') continue;
    const heading = /^#{1,6}\s+(.*)$/.exec(lines[0]!);
    if (heading) {
      blocks.push({ kind: 'heading', text: markdownInline(heading[1]!) });
      lines.shift();
      if (lines.length === 0) continue;
    }
    blocks.push({ kind: 'paragraph', text: markdownInline(lines.join(' ')) });
  }
  return blocks;
}

/** Inline Markdown as plain text: [text](url) → text, **x** / *x* / `x` → x. */
export function markdownInline(text: string): string {
  return text
    .replace(/\[([^\]]+)\]\([^)]*\)/g, '$1')
    .replace(/(\*\*|__)(.+?)\1/g, '$2')
    .replace(/(\*|_)(\S(?:.*?\S)?)\1/g, '$2')
    .replace(/`([^`]+)`/g, '$1');
}
