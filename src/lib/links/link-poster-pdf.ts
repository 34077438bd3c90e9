/**
 * A live link printed: a sheet of bookmarks (three to a page, with cut lines) or a poster (one page, its symbol
 * and type growing with the sheet), each with the title, the QR code as vector squares (error correction
 * LINK_QR_ERROR_CORRECTION) pointing at the /go/CODE address, and that address and code spelled out under the
 * symbol for people without a camera. Pure: the caller passes the address and the font bytes. Lengths in mm.
 */
import { jsPDF } from 'jspdf';
import { z } from 'zod';
import { SHEET_SIZES } from '../layout/sheet-sizes';
import { pdfFontsAdd, pdfFontUse, type PdfFonts } from '../render/pdf-fonts';
import { qrRects } from '../render/qr';
import { LINK_PRINT_PAPERS, LINK_QR_ERROR_CORRECTION, type LinkPrintPaper } from './link-code';

export const LINK_PRINT_FORMATS = ['bookmark', 'poster'] as const;
export type LinkPrintFormat = (typeof LINK_PRINT_FORMATS)[number];

export const LinkPrintQuerySchema = z
  .object({
    format: z
      .enum(LINK_PRINT_FORMATS, { errorMap: () => ({ message: 'format must be bookmark or poster' }) })
      .default('poster'),
    paper: z
      .enum(LINK_PRINT_PAPERS, {
        errorMap: () => ({ message: `paper must be one of ${LINK_PRINT_PAPERS.join(', ')}` }),
      })
      .default('letter'),
  })
  .strict();

/** Bookmarks on one sheet and their size, mm (a usual bookmark is about 2 × 7 in; common practice, no source). */
export const BOOKMARKS_PER_SHEET = 3;
export const BOOKMARK_SIZE_MM: [number, number] = [60, 190];
/**
 * Side of the QR symbol (quiet zone included), mm, on a bookmark and on a Letter poster: at least 2 cm for a phone
 * at arm's length (common practice, no source). A poster on other paper scales its symbol, type and margins with
 * the sheet's width (every size here is at least as tall for its width as Letter, so the panel still fits).
 */
export const QR_SIDE_MM: Record<LinkPrintFormat, number> = { bookmark: 48, poster: 130 };
const POSTER_BASE_WIDTH_MM = SHEET_SIZES.letter.widthMm;

const INK = '#1b2330';

export interface LinkPrint {
  title: string;
  /** The full /go/CODE address the QR code encodes. */
  address: string;
  code: string;
}

/** The bookmark sheet or the poster of a live link. */
export function linkPosterPdf(
  link: LinkPrint,
  format: LinkPrintFormat,
  paper: LinkPrintPaper,
  fonts: PdfFonts,
): Uint8Array<ArrayBuffer> {
  const { widthMm, heightMm } = SHEET_SIZES[paper];
  const doc = new jsPDF({
    unit: 'mm',
    format: [widthMm, heightMm],
    orientation: 'portrait',
    compress: true,
    putOnlyUsedFonts: true,
  });
  pdfFontsAdd(doc, fonts);
  doc.setProperties({ title: link.title, subject: link.address, creator: 'Kitwright' });
  const pageW = doc.internal.pageSize.getWidth();
  const pageH = doc.internal.pageSize.getHeight();
  doc.setTextColor(INK);
  if (format === 'poster') {
    const k = pageW / POSTER_BASE_WIDTH_MM;
    panel(doc, link, { x: 20 * k, y: 25 * k, w: pageW - 40 * k, h: pageH - 50 * k }, QR_SIDE_MM.poster * k, 30 * k);
  } else {
    const [w, h] = BOOKMARK_SIZE_MM;
    const x0 = (pageW - BOOKMARKS_PER_SHEET * w) / 2;
    const y0 = (pageH - h) / 2;
    doc.setDrawColor('#8a94a3');
    doc.setLineWidth(0.2);
    doc.setLineDashPattern([2, 1.5], 0);
    for (let i = 0; i < BOOKMARKS_PER_SHEET; i++) {
      doc.rect(x0 + i * w, y0, w, h, 'S');
    }
    doc.setLineDashPattern([], 0);
    for (let i = 0; i < BOOKMARKS_PER_SHEET; i++) {
      panel(doc, link, { x: x0 + i * w + 5, y: y0 + 10, w: w - 10, h: h - 20 }, QR_SIDE_MM.bookmark, 15);
    }
    pdfFontUse(doc, false);
    doc.setFontSize(8);
    doc.text('Cut along the dashed lines.', pageW / 2, y0 + h + 6, { align: 'center' });
  }
  return new Uint8Array(doc.output('arraybuffer'));
}

/** Title on top, the QR code centred, then the address and the code, inside the box. */
function panel(
  doc: jsPDF,
  link: LinkPrint,
  box: { x: number; y: number; w: number; h: number },
  qrSideMm: number,
  titlePt: number,
): void {
  const cx = box.x + box.w / 2;
  pdfFontUse(doc, true);
  doc.setFontSize(titlePt);
  const titleLines: string[] = doc.splitTextToSize(link.title, box.w);
  const lineMm = (titlePt * 1.25 * 25.4) / 72;
  titleLines
    .slice(0, 4)
    .forEach((line, i) => doc.text(line, cx, box.y + i * lineMm, { align: 'center', baseline: 'top' }));
  const qrTop = box.y + Math.min(titleLines.length, 4) * lineMm + 6;
  const side = Math.min(qrSideMm, box.w);
  doc.setFillColor(INK);
  for (const r of qrRects(
    link.address,
    { xMm: cx - side / 2, yMm: qrTop, widthMm: side, heightMm: side },
    LINK_QR_ERROR_CORRECTION,
  ))
    doc.rect(r.xMm, r.yMm, r.widthMm, r.heightMm, 'F');
  // The address on one line where it can be (down to 6 pt), so it can be typed from the paper.
  pdfFontUse(doc, false);
  const wantPt = Math.max(8, titlePt * 0.45);
  doc.setFontSize(wantPt);
  const addressPt = Math.max(6, Math.min(wantPt, (0.98 * wantPt * box.w) / doc.getTextWidth(link.address)));
  doc.setFontSize(addressPt);
  const addressLines: string[] = doc.splitTextToSize(link.address, box.w);
  const addressMm = (addressPt * 1.3 * 25.4) / 72;
  addressLines.forEach((line, i) =>
    doc.text(line, cx, qrTop + side + 3 + i * addressMm, { align: 'center', baseline: 'top' }),
  );
  pdfFontUse(doc, true);
  doc.setFontSize(titlePt * 0.7);
  doc.text(`Code ${link.code}`, cx, qrTop + side + 6 + addressLines.length * addressMm, {
    align: 'center',
    baseline: 'top',
  });
}
