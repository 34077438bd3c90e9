/**
 * The QR code of the kit page as vector squares: the module matrix of the qrcode package
 * (ISO/IEC 18004 encoding) merged into horizontal runs, so each row of dark modules is one rectangle.
 */
import QRCode from 'qrcode';
import type { RectMm } from '../layout/types';

/** Light modules around the symbol; ISO/IEC 18004:2015 §9.1 asks for 4. */
export const QR_QUIET_ZONE_MODULES = 4;

/** Error correction levels of ISO/IEC 18004 (L, M, Q, H). */
export type QrLevel = 'L' | 'M' | 'Q' | 'H';

/** The symbol's side in modules and its dark modules as runs in module units (row, first column, length). */
export interface QrRuns {
  readonly size: number;
  readonly runs: readonly { readonly row: number; readonly col: number; readonly length: number }[];
}

/** Symbols kept, the most recently used last: a process prints the same few kit and link pages again and again. */
const QR_KEPT = 16;
const kept = new Map<string, QrRuns>();

/** Dark modules of the symbol for `text` (error correction M unless given), as runs in module units. */
export function qrRuns(text: string, level: QrLevel = 'M'): QrRuns {
  const key = `${level}${text}`;
  let symbol = kept.get(key);
  if (symbol) kept.delete(key);
  else {
    symbol = qrRunsOf(text, level);
    if (kept.size >= QR_KEPT) kept.delete(kept.keys().next().value!);
  }
  kept.set(key, symbol);
  return symbol;
}

function qrRunsOf(text: string, level: QrLevel): QrRuns {
  const { modules } = QRCode.create(text, { errorCorrectionLevel: level });
  const size = modules.size;
  const runs: { row: number; col: number; length: number }[] = [];
  for (let row = 0; row < size; row++) {
    let col = 0;
    while (col < size) {
      if (!modules.get(row, col)) {
        col++;
        continue;
      }
      const start = col;
      while (col < size && modules.get(row, col)) col++;
      runs.push({ row, col: start, length: col - start });
    }
  }
  return { size, runs };
}

/** The dark rectangles (sheet mm) of a QR code filling the square `box` with its quiet zone inside it. */
export function qrRects(text: string, box: RectMm, level: QrLevel = 'M'): RectMm[] {
  const { size, runs } = qrRuns(text, level);
  const side = Math.min(box.widthMm, box.heightMm);
  const module = side / (size + 2 * QR_QUIET_ZONE_MODULES);
  const x0 = box.xMm + QR_QUIET_ZONE_MODULES * module;
  const y0 = box.yMm + QR_QUIET_ZONE_MODULES * module;
  return runs.map((r) => ({
    xMm: x0 + r.col * module,
    yMm: y0 + r.row * module,
    widthMm: r.length * module,
    heightMm: module,
  }));
}
