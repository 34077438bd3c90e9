import { memo, useRef, useState } from 'react';
import type { KitSheetNotes, SheetNote } from '../../lib/kit/sheet-notes';

interface Props {
  sheets: string[];
  title: string;
  /** Dims the sheets while newer ones build. */
  stale: boolean;
  /** The saved kit's sheets (its QR code on the first) or an unsaved kit's (a note where the QR code goes). */
  qr: 'saved' | 'note';
  /** Numbered notes on the pieces of each sheet: marks over the sheet, the notes listed under it. */
  notes: KitSheetNotes;
}

/** Zoom steps of the full-size view, as a share of the view's width (1: the sheet fills the width). */
const ZOOMS = [1, 1.5, 2, 3, 4] as const;

const svgBody = (svg: string) => svg.replace(/^<\?xml[^>]*>\s*/, '');

const noteId = (where: string, sheet: number, n: number) => `${where}-${sheet}-note-${n}`;

/** A numbered mark over each copy of a noted piece; choosing one moves focus to its note. */
function NoteMarks({ notes, sheet, where }: { notes: SheetNote[]; sheet: number; where: string }) {
  return notes.flatMap((n) =>
    n.at.map((at, k) => (
      <button
        key={`${n.number}-${k}`}
        type="button"
        className={`absolute flex h-6 w-6 -translate-x-1/2 -translate-y-1/2 items-center justify-center rounded-full border-2 border-white text-xs font-bold text-white shadow ${n.kind === 'shortfall' ? 'bg-caution' : 'bg-orbit'}`}
        style={{ left: `${at.x * 100}%`, top: `${at.y * 100}%` }}
        aria-label={`Note ${n.number}: ${n.label}`}
        data-testid="sheet-note-mark"
        onClick={() => document.getElementById(noteId(where, sheet, n.number))?.focus()}
      >
        {n.number}
      </button>
    )),
  );
}

/** The notes of one sheet, numbered as its marks. */
function NoteList({ notes, sheet, where }: { notes: SheetNote[]; sheet: number; where: string }) {
  if (notes.length === 0) return null;
  return (
    <ol
      className="mt-2 flex flex-col gap-1 text-sm"
      aria-label={`Notes on sheet ${sheet + 1}`}
      data-testid="sheet-notes"
    >
      {notes.map((n) => (
        <li key={n.number} id={noteId(where, sheet, n.number)} tabIndex={-1} className="flex gap-2 rounded">
          <span
            aria-hidden="true"
            className={`mt-0.5 h-5 w-5 shrink-0 rounded-full text-center text-xs font-bold leading-5 text-white ${n.kind === 'shortfall' ? 'bg-caution' : 'bg-orbit'}`}
          >
            {n.number}
          </span>
          <span>
            <span className="sr-only">Note {n.number}: </span>
            <strong>{n.label}</strong>: {n.words.join('. ')}.
          </span>
        </li>
      ))}
    </ol>
  );
}

/**
 * Every sheet of a kit as inline SVG (our own server's output, text escaped there), scaled to the column; a
 * button per sheet opens it full size in a modal dialog (Escape closes it, focus stays inside) that zooms with
 * its buttons or the + and − keys and scrolls with the arrow keys, a mouse or a finger.
 */
function SheetPreviews({ sheets, title, stale, qr, notes }: Props) {
  const dialog = useRef<HTMLDialogElement>(null);
  const [open, setOpen] = useState<number | null>(null);
  const [zoom, setZoom] = useState(0);
  const show = (i: number) => {
    setOpen(i);
    setZoom(0);
    dialog.current?.showModal();
  };
  const step = (by: number) => setZoom((z) => Math.min(ZOOMS.length - 1, Math.max(0, z + by)));
  const shown = open !== null && open < sheets.length ? open : null;
  const scale = ZOOMS[zoom] ?? 1;
  return (
    <>
      <p className="mb-2 text-sm text-ink-soft" data-testid="sheet-qr-note">
        {qr === 'saved'
          ? 'The saved kit’s sheets: the QR code on sheet 1 opens its kit page.'
          : 'Not saved yet: sheet 1 shows where the QR code will print once you save the kit.'}
      </p>
      <p className="mb-2 text-sm" aria-live="polite" data-testid="sheet-notes-summary">
        {notes.shortPieces === 0
          ? `Every piece meets the minimums for ${notes.bandWords}.`
          : `${notes.shortPieces} ${notes.shortPieces === 1 ? 'piece falls' : 'pieces fall'} short of the minimums for ${notes.bandWords}: the numbered marks on the sheets lead to the notes under each sheet.`}
      </p>
      <ol
        className={`grid gap-4 sm:grid-cols-2 ${stale ? 'opacity-60 transition-opacity' : ''}`}
        aria-label={`Sheets of ${title}`}
        data-testid="sheet-previews"
        data-sheet-count={sheets.length}
        data-qr={qr}
      >
        {sheets.map((svg, i) => (
          <li key={i} className="list-none">
            <figure className="rounded-lg border border-ink/15 bg-white p-2 shadow-sm">
              <div className="relative">
                <div
                  role="img"
                  aria-label={`Sheet ${i + 1} of ${sheets.length}`}
                  className="[&>svg]:block [&>svg]:h-auto [&>svg]:w-full"
                  dangerouslySetInnerHTML={{ __html: svgBody(svg) }}
                />
                <NoteMarks notes={notes.sheets[i] ?? []} sheet={i} where="sheet" />
              </div>
              <figcaption className="mt-1 flex items-center justify-between text-sm text-ink-soft">
                <span>
                  Sheet {i + 1} of {sheets.length}
                </span>
                <button type="button" className="btn-secondary px-2 py-1 text-sm" onClick={() => show(i)}>
                  Full size<span className="sr-only"> sheet {i + 1}</span>
                </button>
              </figcaption>
              <NoteList notes={notes.sheets[i] ?? []} sheet={i} where="sheet" />
            </figure>
          </li>
        ))}
      </ol>
      <dialog
        ref={dialog}
        aria-label={shown === null ? 'Sheet' : `Sheet ${shown + 1} of ${sheets.length}, full size`}
        className="m-auto h-[95vh] w-[95vw] max-w-none rounded-card p-0 backdrop:bg-ink/50"
        data-testid="sheet-full"
        data-zoom={scale}
        onClose={() => setOpen(null)}
      >
        {shown !== null && (
          <div className="flex h-full flex-col">
            <div className="flex flex-wrap items-center gap-2 border-b border-ink/10 p-2">
              <p className="mr-auto font-semibold">
                Sheet {shown + 1} of {sheets.length}
              </p>
              <button type="button" className="btn-secondary px-3 py-1" onClick={() => step(-1)} disabled={zoom === 0}>
                −<span className="sr-only"> Zoom out</span>
              </button>
              <span aria-live="polite" className="w-14 text-center text-sm">
                {Math.round(scale * 100)} %
              </span>
              <button
                type="button"
                className="btn-secondary px-3 py-1"
                onClick={() => step(1)}
                disabled={zoom === ZOOMS.length - 1}
              >
                +<span className="sr-only"> Zoom in</span>
              </button>
              <button
                type="button"
                className="btn-secondary px-3 py-1"
                onClick={() => show(shown - 1)}
                disabled={shown === 0}
              >
                Previous sheet
              </button>
              <button
                type="button"
                className="btn-secondary px-3 py-1"
                onClick={() => show(shown + 1)}
                disabled={shown === sheets.length - 1}
              >
                Next sheet
              </button>
              <button type="button" className="btn-primary px-3 py-1" onClick={() => dialog.current?.close()}>
                Close
              </button>
            </div>
            <div
              className="min-h-0 flex-1 touch-pan-x touch-pan-y touch-pinch-zoom overflow-auto bg-paper-deep p-3"
              tabIndex={0}
              role="region"
              aria-label="Sheet, scroll to move around; + and − zoom"
              onKeyDown={(e) => {
                if (e.key === '+' || e.key === '=') step(1);
                else if (e.key === '-' || e.key === '_') step(-1);
                else return;
                e.preventDefault();
              }}
            >
              <div className="relative mx-auto" style={{ width: `${scale * 100}%` }}>
                <div
                  className="bg-white shadow [&>svg]:block [&>svg]:h-auto [&>svg]:w-full"
                  dangerouslySetInnerHTML={{ __html: svgBody(sheets[shown]!) }}
                />
                <NoteMarks notes={notes.sheets[shown] ?? []} sheet={shown} where="full" />
              </div>
            </div>
            <div className="max-h-[25vh] overflow-auto border-t border-ink/10 px-3 pb-2 empty:hidden">
              <NoteList notes={notes.sheets[shown] ?? []} sheet={shown} where="full" />
            </div>
          </div>
        )}
      </dialog>
    </>
  );
}

export default memo(SheetPreviews);
