/**
 * Choosing a kit's scale for a class. Buildability first, sheet count second: of the scales at which every
 * piece meets the grade band's minimums (buildability.ts), the one on the fewest sheets, and of those the
 * largest model. A bigger model over several sheets beats a tiny one on a single sheet. Scales at which a
 * piece falls below the floor (what nobody can cut) are refused. The same choice is also made together with
 * a venue. Scales are 1:N; explanations are for teachers.
 */
import { InputError } from '../errors';
import type { Model } from '../geometry/model-schema';
import type { Piece } from '../geometry/types';
import type { PartSubstitute } from '../geometry/part-substitutes';
import { modelPatterns } from '../geometry/model-patterns';
import { SCALE_DENOMINATOR_MAX } from '../geometry/pattern-option-schemas';
import {
  BUILD_GRADE_BAND_DEFAULT,
  BUILD_GRADE_BAND_FLOOR,
  BUILD_GRADE_BAND_WORDS,
  buildabilityMm,
  buildabilityShortfalls,
  buildabilityShortfallWords,
  pieceAcrossMm,
  type BuildabilityShortfall,
  type BuildGradeBand,
} from '../geometry/buildability';
import { sheetSize, type SheetSizeId } from './sheet-sizes';
import { MAX_SHEETS, sheetPackKit, sheetPieceRoomMm } from './sheet-packer';

type PieceRoom = ReturnType<typeof sheetPieceRoomMm>;
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
  /** The class the kit is for; BUILD_GRADE_BAND_DEFAULT when left out. */
  gradeBand?: BuildGradeBand;
  /** Units of the printed furniture (the check square's size), which takes room on the first sheet. */
  units?: UnitSystem;
}

export interface PaperScale {
  scaleDenominator: number;
  gradeBand: BuildGradeBand;
  /** Sheets one kit takes at this scale; null past the most a kit may have. */
  sheetCount: number | null;
  /** Pieces larger than the printable area at this scale: they are split across sheets. */
  tiledPieceIds: string[];
  /** Where a piece falls short of the band's minimums at this scale (empty: the class can build it all). */
  shortfalls: BuildabilityShortfall[];
  /** The smallest scale (largest N) at which the band can build every piece; null when none can. */
  buildableDenominator: number | null;
  /** The smallest scale (largest N) that keeps every piece above the floor: what anyone can cut. */
  smallestValidDenominator: number;
  explanation: string;
}

interface ScaleCheck {
  pieces: Piece[];
  substitutes: PartSubstitute[];
  /** Shortfalls against the floor: any makes the scale impossible. */
  floor: BuildabilityShortfall[];
  /** Shortfalls against the class's band. */
  band: BuildabilityShortfall[];
}

/** Pieces' buildability at 1:N. */
function scaleCheck(model: Model, n: number, gsm: number, band: BuildGradeBand, pieceMaxMm: PieceRoom): ScaleCheck {
  const options = { scaleDenominator: n, paperGsm: gsm, gradeBand: band, pieceMaxMm };
  const { pieces, substitutes } = modelPatterns(model, options);
  return {
    pieces,
    substitutes,
    floor: buildabilityShortfalls(pieces, BUILD_GRADE_BAND_FLOOR),
    band: buildabilityShortfalls(pieces, band),
  };
}

/** The paper scale for a parsed model; throws InputError for a requested scale that makes parts too small. */
export function solvePaperScale(model: Model, req: PaperScaleRequest): PaperScale {
  const band = req.gradeBand ?? BUILD_GRADE_BAND_DEFAULT;
  const size = sheetSize(req.sheetId);
  const room = sheetPieceRoomMm(size, req.units ?? 'metric');
  const checks = new Map<number, ScaleCheck>();
  const check = (n: number): ScaleCheck =>
    checks.get(n) ?? checks.set(n, scaleCheck(model, n, req.paperGsm, band, room)).get(n)!;
  // One kit at 1:N laid out as the pipeline does (pieces cut at folds to fit); null past MAX_SHEETS.
  const kits = new Map<number, { sheets: number; tiled: string[] } | null>();
  const kit = (n: number) => {
    if (!kits.has(n)) {
      let laid: { sheets: number; tiled: string[] } | null = null;
      try {
        const options = { sheetSize: size, units: req.units ?? 'metric', copies: 1, paperGsm: req.paperGsm } as const;
        const { sheets } = sheetPackKit(check(n).pieces, { ...options, substitutes: check(n).substitutes });
        const tiled = new Set(sheets.flatMap((s) => s.placements.filter((p) => p.tile).map((p) => p.pieceId)));
        laid = { sheets: sheets.length, tiled: [...tiled] };
      } catch (err) {
        if (!(err instanceof InputError)) throw err;
      }
      kits.set(n, laid);
    }
    return kits.get(n)!;
  };
  // Sheets of one kit at 1:N; Infinity past the packer's MAX_SHEETS.
  const sheetCount = (n: number): number => kit(n)?.sheets ?? Infinity;
  const smallestValid = largestDenominator((n) => check(n).floor.length === 0);
  if (smallestValid === null) {
    const worst = check(1).floor[0]!;
    throw new InputError(
      `Even at 1:1 ${buildabilityShortfallWords(worst, BUILD_GRADE_BAND_FLOOR)}; make that part larger.`,
    );
  }
  // The band asks at least as much as the floor, so its limit lies at or below the floor's.
  const buildable = largestDenominator((n) => check(n).band.length === 0, smallestValid);
  const answer = (n: number, explanation: string): PaperScale => ({
    scaleDenominator: n,
    gradeBand: band,
    sheetCount: Number.isFinite(sheetCount(n)) ? sheetCount(n) : null,
    tiledPieceIds: kit(n)?.tiled ?? [],
    shortfalls: check(n).band,
    buildableDenominator: buildable,
    smallestValidDenominator: smallestValid,
    explanation,
  });
  const usualValid = [...USUAL_SCALE_DENOMINATORS].reverse().find((k) => k <= smallestValid) ?? 1;
  if (req.scaleDenominator !== undefined) {
    const n = req.scaleDenominator;
    const worst = check(n).floor[0];
    if (worst) {
      throw new InputError(
        `At 1:${n} ${buildabilityShortfallWords(worst, BUILD_GRADE_BAND_FLOOR)}; 1:${usualValid} is the smallest ratio at which every piece can be cut and glued.`,
        { scaleDenominator: [`1:${usualValid} or larger`] },
      );
    }
    return answer(n, scaleWords(n, sheetCount(n), check(n), kit(n)?.tiled ?? [], size.label, band));
  }
  const ratios = req.ratios ?? 'usual';
  const usualAtMost = (m: number) => [...USUAL_SCALE_DENOMINATORS].reverse().find((k) => k <= m) ?? m;
  // A band served only by a kit of too many sheets is served as if no scale were buildable.
  const feasible =
    buildable !== null && Number.isFinite(sheetCount(ratios === 'any' ? buildable : usualAtMost(buildable)));
  const n = bestDenominator(ratios, feasible ? buildable : smallestValid, sheetCount);
  const words = scaleWords(n, sheetCount(n), check(n), kit(n)?.tiled ?? [], size.label, band);
  // The next smaller scale, to say what the sheets saved there would cost.
  const smaller = req.ratios === 'any' ? n + 1 : USUAL_SCALE_DENOMINATORS.find((k) => k > n && k <= smallestValid);
  if (smaller === undefined || smaller > smallestValid || check(smaller).band.length === 0) return answer(n, words);
  const fewer = sheetCount(smaller);
  const worse = check(smaller).band[0]!;
  return answer(
    n,
    `${words} 1:${smaller} ${fewer < sheetCount(n) ? `fits ${sheetsWords(fewer, size.label)}` : 'is smaller still'}, but ${buildabilityShortfallWords(worse, band)}.`,
  );
}

/**
 * The scale to suggest: buildable by the band first, fewest sheets second, largest model third. Sheet counts
 * grow with the model, so the smallest buildable scale has the fewest sheets; larger scales are taken while
 * they need no more sheets. `top` is the smallest buildable scale, or with none the smallest anyone can cut
 * (the class then needs help with the smallest parts).
 */
function bestDenominator(ratios: 'usual' | 'any', top: number, sheetCount: (n: number) => number): number {
  if (ratios === 'any') {
    const least = sheetCount(top);
    return smallestDenominator((k) => sheetCount(k) <= least, top) ?? top;
  }
  const candidates = USUAL_SCALE_DENOMINATORS.filter((k) => k <= top).reverse();
  if (candidates.length === 0) return Math.min(top, USUAL_SCALE_DENOMINATORS[0]);
  let best = candidates[0]!;
  const least = sheetCount(best);
  for (const k of candidates.slice(1)) {
    if (sheetCount(k) > least) break;
    best = k;
  }
  return best;
}

function sheetsWords(count: number, sheet: string): string {
  if (!Number.isFinite(count)) return `more than ${MAX_SHEETS} ${sheet} sheets`;
  return count === 1 ? `one ${sheet} sheet` : `${count} ${sheet} sheets`;
}

/** "1:20 on 3 US Letter sheets: the smallest piece is 18 mm, right for grades 6–8." and what falls short. */
function scaleWords(
  n: number,
  sheets: number,
  c: ScaleCheck,
  tiledIds: string[],
  sheet: string,
  band: BuildGradeBand,
): string {
  const smallest = c.pieces.reduce<Piece | null>(
    (a, p) => (a === null || pieceAcrossMm(p) < pieceAcrossMm(a) ? p : a),
    null,
  );
  const who = BUILD_GRADE_BAND_WORDS[band];
  const head = `1:${n} on ${sheetsWords(sheets, sheet)}`;
  const tiled =
    tiledIds.length === 0
      ? ''
      : ` ${tiledIds.length === 1 ? 'One piece is' : `${tiledIds.length} pieces are`} larger than ${sheet} with no fold to cut it at (${tiledIds.join(', ')}), so ${tiledIds.length === 1 ? 'it is' : 'they are'} printed in tiles across sheets.`;
  if (c.band.length > 0)
    return `${head}: too small for ${who}, since ${buildabilityShortfallWords(c.band[0]!, band)}; choose a larger scale (a smaller N) or help the class with the smallest parts.${tiled}`;
  const size = smallest ? `the smallest piece is ${buildabilityMm(pieceAcrossMm(smallest))}` : 'it has no pieces';
  return `${head}: ${size}, right for ${who}.${tiled}`;
}

/** The largest N in 1…max with ok(N), assuming ok holds for all smaller N; null if none. */
function largestDenominator(ok: (n: number) => boolean, max = SCALE_DENOMINATOR_MAX): number | null {
  if (!ok(1)) return null;
  let lo = 1,
    hi = max;
  if (ok(hi)) return hi;
  while (hi - lo > 1) {
    const mid = Math.floor((lo + hi) / 2);
    if (ok(mid)) lo = mid;
    else hi = mid;
  }
  return lo;
}

/** The smallest N in 1…max with ok(N), assuming ok holds for all larger N up to max; null if none. */
function smallestDenominator(ok: (n: number) => boolean, max = SCALE_DENOMINATOR_MAX): number | null {
  if (ok(1)) return 1;
  let lo = 1,
    hi = max;
  if (!ok(hi)) return null;
  while (hi - lo > 1) {
    const mid = Math.floor((lo + hi) / 2);
    if (ok(mid)) hi = mid;
    else lo = mid;
  }
  return hi;
}

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
  // The class's band decides how small the model may get; with no buildable scale, the floor does.
  const limit = paper.buildableDenominator ?? paper.smallestValidDenominator;
  const who = BUILD_GRADE_BAND_WORDS[paper.gradeBand];
  if (n <= limit) {
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
      explanation:
        n === paper.scaleDenominator
          ? `${paper.explanation} Its deployed span fits the ${venue.label}.`
          : `At 1:${n} the deployed span fits the ${venue.label}, and the paper model is still large enough for ${who}.`,
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
    explanation: `No one scale does both: to fit the ${venue.label} the model must be at 1:${room.scaleDenominator} or smaller, but below 1:${limit} its smallest pieces or tabs are too small for ${who} to cut and glue. Build the paper model at 1:${paper.scaleDenominator} and lay the booms out separately at 1:${room.scaleDenominator}, clearly labelled as a different scale.`,
  };
}
