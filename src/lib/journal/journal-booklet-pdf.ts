/**
 * A class journal as a PDF booklet (jspdf with the shipped KitwrightSans): a cover with the booklet's title and
 * what it holds, then each entry from a new page in the order given — title, who wrote it and its state or date,
 * the body as plain paragraphs (Markdown markup dropped, never rendered as HTML), its photos with their alt text
 * as captions, and each saved result as a table of its figures and its plot drawn as vectors. Pure: the caller
 * passes entries it has checked the reader may see, the photo copies' JPEG bytes and the font bytes. Lengths in mm.
 */
import type { SavedResult } from '../analysis/saved-result';
import {
  FLOW_MARGIN_MM,
  pdfFlowBytes,
  pdfFlowEnsure,
  pdfFlowFooters,
  pdfFlowHeading,
  pdfFlowNew,
  pdfFlowText,
  pdfFlowTextWidth,
} from '../activities/pdf-flow';
import type { PdfFonts } from '../render/pdf-fonts';
import { plotPdfDraw } from '../render/plot-pdf';
import { plotLayout } from '../render/plot-layout';
import { numberFormat } from '../tools/number-format';
import { ENTRY_BODY_MAX } from './entry-rules';
import { markdownExcerpt } from './markdown';

export interface BookletPhoto {
  /** The stored display copy (JPEG, metadata already stripped). */
  jpeg: Uint8Array;
  widthPx: number;
  heightPx: number;
  altText: string;
}

export interface BookletEntry {
  title: string;
  /** Who wrote it and for which class, e.g. "Team Comet · Period 3 Science". */
  byline: string;
  /** Its state or publication date, as the reader should see it. */
  status: string;
  /** Markdown source of the body. */
  body: string;
  photos: BookletPhoto[];
  results: SavedResult[];
}

export interface BookletInput {
  title: string;
  /** What the booklet holds, e.g. "Published entries of one school". */
  subtitle: string;
  /** When it was made, as text. */
  madeText: string;
  entries: BookletEntry[];
}

/** Tallest a photo is drawn, mm, so two fit a page. */
const PHOTO_MAX_HEIGHT_MM = 90;
/** Most rows of a result's table: its scalar figures, in the order the tool wrote them. */
const RESULT_TABLE_ROWS_MAX = 12;

/** The booklet's bytes. */
export function journalBookletPdf(input: BookletInput, fonts: PdfFonts): Uint8Array<ArrayBuffer> {
  const flow = pdfFlowNew('letter', fonts, input.title, input.subtitle);
  flow.y = 70;
  pdfFlowText(flow, input.title, { sizePt: 26, bold: true, afterMm: 4 });
  pdfFlowText(flow, input.subtitle, { sizePt: 13, afterMm: 2 });
  pdfFlowText(flow, `${input.entries.length} ${input.entries.length === 1 ? 'entry' : 'entries'} · ${input.madeText}`, {
    sizePt: 10.5,
  });
  if (input.entries.length === 0) pdfFlowText(flow, 'There are no entries to show yet.', { afterMm: 2 });

  for (const entry of input.entries) {
    flow.doc.addPage();
    flow.y = FLOW_MARGIN_MM;
    pdfFlowText(flow, entry.title, { sizePt: 17, bold: true, afterMm: 1 });
    pdfFlowText(flow, `${entry.byline} · ${entry.status}`, { sizePt: 9.5, color: '#46505f', afterMm: 4 });
    for (const paragraph of entry.body.split(/\n\s*\n/)) {
      const text = markdownExcerpt(paragraph, ENTRY_BODY_MAX);
      if (text) pdfFlowText(flow, text, { afterMm: 2.5 });
    }
    for (const photo of entry.photos) bookletPhoto(flow, photo);
    for (const result of entry.results) bookletResult(flow, result);
  }
  pdfFlowFooters(flow, input.title);
  return pdfFlowBytes(flow);
}

type Flow = ReturnType<typeof pdfFlowNew>;

/** A photo scaled to the text width (at most PHOTO_MAX_HEIGHT_MM tall), its alt text below as a caption. */
function bookletPhoto(flow: Flow, photo: BookletPhoto): void {
  const widthMax = pdfFlowTextWidth(flow);
  const scale = Math.min(widthMax / photo.widthPx, PHOTO_MAX_HEIGHT_MM / photo.heightPx);
  const w = photo.widthPx * scale;
  const h = photo.heightPx * scale;
  pdfFlowEnsure(flow, h + 8);
  flow.doc.addImage(photo.jpeg, 'JPEG', FLOW_MARGIN_MM + (widthMax - w) / 2, flow.y, w, h, undefined, 'NONE');
  flow.y += h + 1.5;
  pdfFlowText(flow, photo.altText || 'Photo without a description.', { sizePt: 8.5, color: '#46505f', afterMm: 4 });
}

/** The scalar figures of a result (numbers, text, yes/no) as label–value rows. */
export function resultTableRows(result: SavedResult): [string, string][] {
  const rows: [string, string][] = [];
  for (const [key, value] of Object.entries(result.result)) {
    if (rows.length >= RESULT_TABLE_ROWS_MAX) break;
    const label = key.replace(/([a-z0-9])([A-Z])/g, '$1 $2').toLowerCase();
    if (typeof value === 'number' && Number.isFinite(value)) rows.push([label, numberFormat(value, 4)]);
    else if (typeof value === 'string' && value.length <= 80) rows.push([label, value]);
    else if (typeof value === 'boolean') rows.push([label, value ? 'yes' : 'no']);
  }
  return rows;
}

/** A saved result: its inputs, its figures as a two-column table, and its plot as vectors. */
function bookletResult(flow: Flow, result: SavedResult): void {
  pdfFlowHeading(flow, `Result: ${result.plot.title}`, 12);
  pdfFlowText(flow, result.inputsSummary, { sizePt: 9.5, color: '#46505f', afterMm: 2 });
  const { doc } = flow;
  const width = pdfFlowTextWidth(flow);
  for (const [label, value] of resultTableRows(result)) {
    pdfFlowEnsure(flow, 6);
    doc.setDrawColor('#d1d5db');
    doc.setLineWidth(0.2);
    doc.line(FLOW_MARGIN_MM, flow.y - 0.8, FLOW_MARGIN_MM + width, flow.y - 0.8);
    const top = flow.y;
    pdfFlowText(flow, label, { sizePt: 9.5, afterMm: 0, rightMm: width / 2 });
    const after = flow.y;
    flow.y = top;
    pdfFlowText(flow, value, { sizePt: 9.5, bold: true, indentMm: width / 2, afterMm: 0 });
    flow.y = Math.max(after, flow.y) + 1.6;
  }
  const plotWidth = Math.min(width, 150);
  const layout = plotLayout(result.plot);
  pdfFlowEnsure(flow, (layout.heightPx * plotWidth) / layout.widthPx + 4);
  flow.y += 2 + plotPdfDraw(doc, result.plot, FLOW_MARGIN_MM + (width - plotWidth) / 2, flow.y + 2, plotWidth);
  flow.y += 4;
}
