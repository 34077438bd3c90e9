/**
 * Buildability notes on the sheets: for each laid-out sheet, the pieces on it that fall short of the kit's grade
 * band (buildability.ts, measured on the laid-out pieces) and the parts replaced by a stated substitute
 * (part-substitutes.ts: a flat disc printed for a dish, a rod cut against its gauge for a boom), each with
 * where it sits on the sheet, so the builder's preview can mark the piece and list the note under the sheet.
 */
import {
  BUILD_GRADE_BAND_WORDS,
  buildabilityNoteWords,
  buildabilityShortfalls,
  type BuildGradeBand,
} from '../geometry/buildability';
import { partSubstituteUse, type PartSubstitute } from '../geometry/part-substitutes';
import type { Piece } from '../geometry/types';
import { polygonArea } from '../geometry/vec';
import { CUT_GAUGE_HEIGHT_MM } from '../layout/cut-gauge';
import { labelCandidatePoints } from '../render/label-placement';
import { placementApply, placementBoundsOfPoints } from '../layout/placement';
import type { KitLayout, LaidOutSheet, Placement, SheetVec2Mm } from '../layout/types';

/** A spot on a sheet as a share of its width and height from the top-left corner (0…1), for an overlay. */
export interface SheetSpot {
  x: number;
  y: number;
}

/** One numbered note on a sheet: the piece it concerns, what to know about it, and where its marks go. */
export interface SheetNote {
  /** 1-based within the sheet, in reading order of the marks (top to bottom, then left to right). */
  number: number;
  pieceId: string;
  label: string;
  /** Short of the band's minimums, or made from something else than the printed part. */
  kind: 'shortfall' | 'substitute';
  /** Plain-words sentences, e.g. "Tab 12 is 3.1 mm deep; grades 3–5 need 6.0 mm". */
  words: string[];
  /** Where the piece sits: one spot per copy (or tile) of it on the sheet. */
  at: SheetSpot[];
}

export interface KitSheetNotes {
  /** The band the pieces are held against, in words ("grades 6–8"). */
  bandWords: string;
  /** How many pieces of the whole kit fall short of the band's minimums (0: every piece meets them). */
  shortPieces: number;
  /** The notes of each sheet, in sheet order. */
  sheets: SheetNote[][];
}

/** The notes of every sheet of a laid-out kit. */
export function kitSheetNotes(
  layout: Pick<KitLayout, 'pieces' | 'sheets' | 'substitutes' | 'gradeBand'>,
): KitSheetNotes {
  const band = layout.gradeBand;
  const words = new Map<string, { kind: SheetNote['kind']; words: string[] }>();
  const pieces = new Map(layout.pieces.map((p) => [p.id, p]));
  for (const s of buildabilityShortfalls(layout.pieces, band)) {
    const entry = words.get(s.pieceId) ?? { kind: 'shortfall' as const, words: [] };
    entry.words.push(buildabilityNoteWords(s, band, pieces.get(s.pieceId)!));
    words.set(s.pieceId, entry);
  }
  const shortPieces = words.size;
  const substitutes = new Map(layout.substitutes.map((s) => [s.partId, s]));
  for (const piece of layout.pieces) {
    const s = substitutes.get(piece.partId);
    if (s) substituteNote(words, piece.id, s, band);
  }
  return {
    bandWords: BUILD_GRADE_BAND_WORDS[band],
    shortPieces,
    sheets: layout.sheets.map((sheet) => sheetNotes(sheet, pieces, words, substitutes, band)),
  };
}

function substituteNote(
  words: Map<string, { kind: SheetNote['kind']; words: string[] }>,
  id: string,
  s: PartSubstitute,
  band: BuildGradeBand,
) {
  const use = partSubstituteUse(s, band);
  const entry = words.get(id) ?? { kind: 'substitute' as const, words: [] };
  entry.words.push(use[0]!.toUpperCase() + use.slice(1));
  words.set(id, entry);
}

function sheetNotes(
  sheet: LaidOutSheet,
  pieces: Map<string, Piece>,
  words: Map<string, { kind: SheetNote['kind']; words: string[] }>,
  substitutes: Map<string, PartSubstitute>,
  band: BuildGradeBand,
): SheetNote[] {
  const spots = new Map<string, { label: string; at: SheetVec2Mm[] }>();
  const add = (id: string, label: string, at: SheetVec2Mm) => {
    const entry = spots.get(id) ?? { label, at: [] };
    entry.at.push(at);
    spots.set(id, entry);
  };
  for (const placement of sheet.placements) {
    const piece = pieces.get(placement.pieceId);
    if (piece && words.has(piece.id)) add(piece.id, piece.label, pieceSpotMm(placement, piece));
  }
  // A rod has no piece: its note goes on the gauge it is cut against (once per part of the gauge).
  for (const g of sheet.gauges ?? []) {
    const s = substitutes.get(g.partId);
    if (!s || spots.has(g.partId)) continue;
    substituteNote(words, g.partId, s, band);
    add(g.partId, g.label, [g.xMm + (g.toMm - g.fromMm) / 2, g.yMm + CUT_GAUGE_HEIGHT_MM / 2]);
  }
  const notes = [...spots].map(([pieceId, { label, at }]) => ({ pieceId, label, ...words.get(pieceId)!, at }));
  const first = (n: { at: SheetVec2Mm[] }) =>
    n.at.reduce((a, b) => (b[1] < a[1] || (b[1] === a[1] && b[0] < a[0]) ? b : a));
  notes.sort((a, b) => first(a)[1] - first(b)[1] || first(a)[0] - first(b)[0]);
  return notes.map((n, i) => ({
    number: i + 1,
    pieceId: n.pieceId,
    label: n.label,
    kind: n.kind,
    words: n.words,
    at: n.at.map(([x, y]) => ({ x: x / sheet.widthMm, y: y / sheet.heightMm })),
  }));
}

/**
 * Where a placed piece's mark goes on the sheet, mm: the point of its largest face farthest from the face's
 * edges (labelCandidatePoints), or for a tile, the best such point of the largest face its window shows, else
 * the middle of what the window shows.
 */
export function pieceSpotMm(placement: Placement, piece: Pick<Piece, 'hinge' | 'outlineMm'>): SheetVec2Mm {
  const window = placement.tile?.windowMm;
  const inWindow = ([x, y]: SheetVec2Mm) =>
    !window ||
    (x >= window.xMm && x <= window.xMm + window.widthMm && y >= window.yMm && y <= window.yMm + window.heightMm);
  const faces = [...piece.hinge.faces].sort(
    (a, b) => Math.abs(polygonArea(b.polygonMm)) - Math.abs(polygonArea(a.polygonMm)),
  );
  for (const face of faces) {
    const spot = labelCandidatePoints(face.polygonMm.map((p) => placementApply(placement, p))).find(inWindow);
    if (spot) return spot;
  }
  const box = placementBoundsOfPoints(piece.outlineMm.map((p) => placementApply(placement, p)));
  const w = window ?? box;
  const [x0, x1] = [Math.max(box.xMm, w.xMm), Math.min(box.xMm + box.widthMm, w.xMm + w.widthMm)];
  const [y0, y1] = [Math.max(box.yMm, w.yMm), Math.min(box.yMm + box.heightMm, w.yMm + w.heightMm)];
  return [(x0 + x1) / 2, (y0 + y1) / 2];
}
