import { memo } from 'react';

interface Props {
  sheets: string[];
  title: string;
  /** Dims the sheets while newer ones build. */
  stale: boolean;
}

/** Every sheet of a kit as inline SVG (our own server's output, text escaped there), scaled to the column. */
function SheetPreviews({ sheets, title, stale }: Props) {
  return (
    <ol
      className={`grid gap-4 sm:grid-cols-2 ${stale ? 'opacity-60 transition-opacity' : ''}`}
      aria-label={`Sheets of ${title}`}
      data-testid="sheet-previews"
      data-sheet-count={sheets.length}
    >
      {sheets.map((svg, i) => (
        <li key={i} className="list-none">
          <figure className="rounded-lg border border-ink/15 bg-white p-2 shadow-sm">
            <div
              role="img"
              aria-label={`Sheet ${i + 1} of ${sheets.length}`}
              className="[&>svg]:block [&>svg]:h-auto [&>svg]:w-full"
              dangerouslySetInnerHTML={{ __html: svg.replace(/^<\?xml[^>]*>\s*/, '') }}
            />
            <figcaption className="mt-1 text-center text-sm text-ink-soft">
              Sheet {i + 1} of {sheets.length}
            </figcaption>
          </figure>
        </li>
      ))}
    </ol>
  );
}

export default memo(SheetPreviews);
