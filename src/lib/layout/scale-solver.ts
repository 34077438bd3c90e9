/**
 * Choosing a kit's scale: the largest scale at which every piece fits a sheet inside its printable margin
 * (90° turns allowed) while no piece is under PIECE_SIZE_MIN_MM across and no tab under TAB_DEPTH_MIN_MM,
 * and the same choice made together with a venue. Scales are 1:N; explanations are for teachers.
 */
import { InputError } from '../errors';
import type { Model } from '../geometry/model-schema';
import type { Piece } from '../geometry/types';
import { modelPatterns, SCALE_DENOMINATOR_MAX } from '../geometry/model-patterns';
import { PIECE_SIZE_MIN_MM, TAB_DEPTH_MIN_MM } from '../geometry/paper';
import { pointsBounds } from '../geometry/vec';
import { SHEET_MARGIN_MM, sheetSize, type SheetSizeId } from './sheet-sizes';
import { USUAL_SCALE_DENOMINATORS } from './scale-ratios';
import { solveVenueScale, type Venue, type VenueScale } from './venues';
import type { UnitSystem } from './units';

export interface PaperScaleRequest {
  sheetId: SheetSizeId;
  paperGsm: number;
  /** A scale the teacher asks for; omitted, the solver picks one. */
  scaleDenominator?: number;
  /** Pick from the usual ratios (default) or any whole 1:N. */
  ratios?: 'usual' | 'any';
}

export interface PaperScale {
  scaleDenominator: number;
  /** Pieces larger than the printable area at this scale: they are split across sheets. */
  tiledPieceIds: string[];
  /** The smallest scale (largest N) that keeps every piece and tab above the limits. */
  smallestValidDenominator: number;
  explanation: string;
}

interface ScaleCheck {
  tooSmall: { label: string; acrossMm: number; what: 'piece' | 'tab' } | null;
  tiled: string[];
}

/** Pieces' size problems and which pieces overflow the sheet at 1:N. */
function scaleCheck(model: Model, n: number, gsm: number, sheetId: SheetSizeId): ScaleCheck {
  const { pieces } = modelPatterns(model, { scaleDenominator: n, paperGsm: gsm });
  const sheet = sheetSize(sheetId);
  const [pw, ph] = [sheet.widthMm - 2 * SHEET_MARGIN_MM, sheet.heightMm - 2 * SHEET_MARGIN_MM];
  let tooSmall: ScaleCheck['tooSmall'] = null;
  const tiled: string[] = [];
  for (const p of pieces) {
    const across = pieceAcrossMm(p);
    if (across < PIECE_SIZE_MIN_MM && (!tooSmall || across < tooSmall.acrossMm))
      tooSmall = { label: p.label, acrossMm: across, what: 'piece' };
    const tab = pieceTabDepthMm(p);
    if (tab < TAB_DEPTH_MIN_MM && !tooSmall) tooSmall = { label: p.label, acrossMm: tab, what: 'tab' };
    const b = pointsBounds(p.outlineMm);
    const [w, h] = [b.maxX - b.minX, b.maxY - b.minY];
    if (!((w <= pw && h <= ph) || (h <= pw && w <= ph))) tiled.push(p.id);
  }
  return { tooSmall, tiled };
}

/** The smaller side of a piece's faces' bounding box, mm (tabs left out: they are not the part). */
export function pieceAcrossMm(piece: Piece): number {
  const b = pointsBounds(piece.hinge.faces.flatMap((f) => f.polygonMm));
  return Math.min(b.maxX - b.minX, b.maxY - b.minY);
}

/**
 * The shallowest tab of a piece as cut, mm: each tab's own depth after neighbours trimmed it (GlueTab.depthMm),
 * or, for a tab that does not state it, the farthest reach of its polygon from the edge it starts on.
 * Infinity when the piece has no tabs. The paper weight is already in the tabs; older callers may still pass it.
 */
export function pieceTabDepthMm(piece: Piece, _paperGsm?: number): number {
  let min = Infinity;
  for (const t of piece.tabs) min = Math.min(min, t.depthMm ?? tabReachMm(t.polygonMm));
  return min;
}

function tabReachMm(polygonMm: readonly (readonly [number, number])[]): number {
  const [b, a] = [polygonMm[0], polygonMm[1]];
  if (!a || !b) return 0;
  const len = Math.hypot(b[0] - a[0], b[1] - a[1]) || 1;
  return Math.max(
    ...polygonMm.map((p) => Math.abs((b[0] - a[0]) * (p[1] - a[1]) - (b[1] - a[1]) * (p[0] - a[0])) / len),
  );
}

/** The paper scale for a parsed model; throws InputError for a requested scale that makes parts too small. */
export function solvePaperScale(model: Model, req: PaperScaleRequest): PaperScale {
  const memo = new Map<number, ScaleCheck>();
  const check = (n: number): ScaleCheck =>
    memo.get(n) ?? memo.set(n, scaleCheck(model, n, req.paperGsm, req.sheetId)).get(n)!;
  const sheet = sheetSize(req.sheetId).label;
  const smallestValid = largestDenominator((n) => check(n).tooSmall === null);
  if (smallestValid === null) {
    const worst = check(1).tooSmall!;
    throw new InputError(
      `Even at 1:1 the ${worst.label} ${worst.what === 'tab' ? 'has a tab of' : 'is'} ${mm(worst.acrossMm)} across, under the ${worst.what === 'tab' ? TAB_DEPTH_MIN_MM : PIECE_SIZE_MIN_MM} mm that can be cut and glued; make that part larger.`,
    );
  }
  const usualValid = [...USUAL_SCALE_DENOMINATORS].reverse().find((n) => n <= smallestValid) ?? 1;
  if (req.scaleDenominator !== undefined) {
    const n = req.scaleDenominator;
    const c = check(n);
    if (c.tooSmall) {
      const { label, acrossMm, what } = c.tooSmall;
      throw new InputError(
        `At 1:${n} the ${label} ${what === 'tab' ? 'has tabs only' : 'is'} ${mm(acrossMm)} across; 1:${usualValid} is the smallest ratio that keeps every piece above ${PIECE_SIZE_MIN_MM} mm and every tab above ${TAB_DEPTH_MIN_MM} mm.`,
        { scaleDenominator: [`1:${usualValid} or larger`] },
      );
    }
    return {
      scaleDenominator: n,
      tiledPieceIds: c.tiled,
      smallestValidDenominator: smallestValid,
      explanation: tiledWords(n, c.tiled, model, sheet),
    };
  }
  const fits = (n: number) => n <= smallestValid && check(n).tiled.length === 0;
  let n: number | null;
  if (req.ratios === 'any') {
    const first = smallestDenominator((k) => check(k).tiled.length === 0);
    n = first !== null && first <= smallestValid ? first : null;
  } else {
    n = USUAL_SCALE_DENOMINATORS.find((k) => fits(k)) ?? null;
  }
  if (n !== null) {
    return {
      scaleDenominator: n,
      tiledPieceIds: [],
      smallestValidDenominator: smallestValid,
      explanation: `At 1:${n} every piece of ${model.name} fits on ${sheet} inside the ${SHEET_MARGIN_MM} mm margin. A larger scale would not fit without splitting pieces across sheets.`,
    };
  }
  const tiledAt = req.ratios === 'any' ? smallestValid : usualValid;
  const tiled = check(tiledAt).tiled;
  return {
    scaleDenominator: tiledAt,
    tiledPieceIds: tiled,
    smallestValidDenominator: smallestValid,
    explanation: `No scale fits every piece of ${model.name} on ${sheet} and keeps the smallest parts big enough to cut. ${tiledWords(tiledAt, tiled, model, sheet)}`,
  };
}

function tiledWords(n: number, tiled: string[], model: Model, sheet: string): string {
  if (tiled.length === 0) return `At 1:${n} every piece of ${model.name} fits on ${sheet}.`;
  return `At 1:${n}, ${tiled.length === 1 ? 'one piece is' : `${tiled.length} pieces are`} larger than ${sheet} (${tiled.join(', ')}) and will be split across sheets with overlap strips and alignment marks.`;
}

/** The largest N in 1…SCALE_DENOMINATOR_MAX with ok(N), assuming ok holds for all smaller N; null if none. */
function largestDenominator(ok: (n: number) => boolean): number | null {
  if (!ok(1)) return null;
  let lo = 1,
    hi = SCALE_DENOMINATOR_MAX;
  if (ok(hi)) return hi;
  while (hi - lo > 1) {
    const mid = Math.floor((lo + hi) / 2);
    if (ok(mid)) lo = mid;
    else hi = mid;
  }
  return lo;
}

/** The smallest N with ok(N), assuming ok holds for all larger N; null if none. */
function smallestDenominator(ok: (n: number) => boolean): number | null {
  if (ok(1)) return 1;
  let lo = 1,
    hi = SCALE_DENOMINATOR_MAX;
  if (!ok(hi)) return null;
  while (hi - lo > 1) {
    const mid = Math.floor((lo + hi) / 2);
    if (ok(mid)) hi = mid;
    else lo = mid;
  }
  return hi;
}

const mm = (v: number) => `${v < 10 ? v.toFixed(1) : Math.round(v)} mm`;

export interface KitScale {
  /** One scale for the paper model and the venue layout, or null when none does both. */
  scaleDenominator: number | null;
  paper: PaperScale;
  venue: VenueScale;
  /** Nearest workable choices, each labelled so a separate boom layout is never mistaken for the kit's scale. */
  alternatives: { label: string; scaleDenominator: number; explanation: string }[];
  explanation: string;
}

/** Body on paper and booms in the venue at one scale, or why not, with the nearest workable choices. */
export function solveKitScale(
  model: Model,
  req: PaperScaleRequest,
  venue: Venue,
  units: UnitSystem = 'metric',
): KitScale {
  const paper = solvePaperScale(model, { ...req, scaleDenominator: undefined });
  const room = solveVenueScale(model, venue, units);
  const n = Math.max(paper.scaleDenominator, room.usualScaleDenominator);
  const alternatives: KitScale['alternatives'] = [];
  if (n <= paper.smallestValidDenominator) {
    if (n > 2 * room.scaleDenominator) {
      alternatives.push({
        label: `Separate boom layout at 1:${room.scaleDenominator} (not the kit's scale)`,
        scaleDenominator: room.scaleDenominator,
        explanation: `At 1:${n} the layout uses little of the ${venue.label}. For a bigger floor layout, lay the booms out at 1:${room.scaleDenominator} and label it as a different scale from the paper model.`,
      });
    }
    return {
      scaleDenominator: n,
      paper,
      venue: room,
      alternatives,
      explanation: `At 1:${n} the paper model fits ${sheetSize(req.sheetId).label}${paper.tiledPieceIds.length ? ' (some pieces split across sheets)' : ''} and its deployed span fits the ${venue.label}.`,
    };
  }
  alternatives.push(
    {
      label: `Paper model at 1:${paper.scaleDenominator}`,
      scaleDenominator: paper.scaleDenominator,
      explanation: paper.explanation,
    },
    {
      label: `Separate boom layout at 1:${room.scaleDenominator} (not the paper model's scale)`,
      scaleDenominator: room.scaleDenominator,
      explanation: room.explanation,
    },
  );
  return {
    scaleDenominator: null,
    paper,
    venue: room,
    alternatives,
    explanation: `No one scale does both: to fit the ${venue.label} the model must be at 1:${room.scaleDenominator} or smaller, but below 1:${paper.smallestValidDenominator} its smallest pieces or tabs are too small to cut and glue. Build the paper model at 1:${paper.scaleDenominator} and lay the booms out separately at 1:${room.scaleDenominator}, clearly labelled as a different scale.`,
  };
}
