/**
 * Buildability: what a class of a grade band can cut, fold, glue and read, as minimums per band, and the
 * measures of a flat piece they are held against. The one home of these rules: the scale solver ranks scales
 * by them, the kit build refuses what no one can build (the `adult` floor), the patterns swap parts too fine
 * for paper for a stated substitute, and the renderers size marks by the band's smallest label.
 *
 * Every length is mm on the printed sheet. The values are common practice, no source: they come from how
 * paper models are taught (classroom craft guidance gives larger parts for younger hands), rounded to what a
 * pair of school scissors and a fingertip handle at each age. A test measures the demo kits against them.
 */
import type { Piece, Vec2Mm } from './types';

/** The grade bands a kit is built for: school bands as classes record them, and adults. */
export const BUILD_GRADE_BANDS = ['K-2', '3-5', '6-8', '9-12', 'adult'] as const;
export type BuildGradeBand = (typeof BUILD_GRADE_BANDS)[number];

/** The band a kit is built for when nobody says (a middle-school class, the product's main audience). */
export const BUILD_GRADE_BAND_DEFAULT: BuildGradeBand = '6-8';

/** The band whose minimums are the floor: a kit below them cannot be built by anyone and is refused. */
export const BUILD_GRADE_BAND_FLOOR: BuildGradeBand = 'adult';

/** Plain words for a band, as a teacher reads it. */
export const BUILD_GRADE_BAND_WORDS: Record<BuildGradeBand, string> = {
  'K-2': 'grades K–2',
  '3-5': 'grades 3–5',
  '6-8': 'grades 6–8',
  '9-12': 'grades 9–12',
  adult: 'adults',
};

/** What a class of one band can build, mm on the printed sheet. */
export interface BuildabilityMinimums {
  /** Smallest piece: the narrowest width of its faces taken together (tabs left out). */
  pieceMm: number;
  /** Narrowest strip: the smallest width of any one face (a narrower face tears or crumples when cut). */
  stripMm: number;
  /** Smallest tab depth as cut: what a fingertip can press flat while the glue takes. */
  tabMm: number;
  /** Smallest distance between two folds of a piece that do not meet: each crease needs room of its own. */
  foldGapMm: number;
  /** Smallest printed label (tab and edge numbers, piece names): the text's font size, mm. */
  labelMm: number;
  /** Smallest cone or frustum (dish, nozzle) to roll and glue: its wide end's diameter. */
  coneDiameterMm: number;
}

/**
 * Minimums per band. Common practice, no source: the adult row keeps the engine's earlier limits (a 5 mm
 * piece, a 3 mm tab); each younger band roughly doubles down to K–2, whose pieces are cut along lines by
 * hands still learning scissors. Creasing two folds close together is harder than cutting a narrow strip, so
 * the fold gap is the larger of the two from grade 3 up. Labels: 2 mm (about 6 pt) is the smallest number an adult reads on a model;
 * 3 mm (about 8.5 pt) for grades 6–8; 5 mm (about 14 pt) for K–2, near the size of early-reader print.
 */
export const BUILDABILITY_MINIMUMS: Readonly<Record<BuildGradeBand, Readonly<BuildabilityMinimums>>> = {
  'K-2': { pieceMm: 40, stripMm: 12, tabMm: 8, foldGapMm: 15, labelMm: 5, coneDiameterMm: 60 },
  '3-5': { pieceMm: 25, stripMm: 8, tabMm: 6, foldGapMm: 10, labelMm: 4, coneDiameterMm: 40 },
  '6-8': { pieceMm: 15, stripMm: 6, tabMm: 5, foldGapMm: 8, labelMm: 3, coneDiameterMm: 25 },
  '9-12': { pieceMm: 10, stripMm: 5, tabMm: 4, foldGapMm: 6, labelMm: 2.5, coneDiameterMm: 18 },
  adult: { pieceMm: 5, stripMm: 3, tabMm: 3, foldGapMm: 3, labelMm: 2, coneDiameterMm: 12 },
};

/**
 * A rolled paper tube thinner than this is swapped for a drinking straw or a bamboo skewer: a pencil, the
 * usual thing a class rolls a tube around. From memory: a school pencil is about 7 mm across the flats.
 */
export const ROLL_DIAMETER_MIN_MM = 7;

/** The measures of a piece held against the minimums, mm (Infinity where a piece has none of that kind). */
export interface PieceMeasures {
  pieceMm: number;
  stripMm: number;
  tabMm: number;
  foldGapMm: number;
}

export type BuildabilityMeasure = keyof PieceMeasures;

/** One place a piece falls short of a band's minimum. */
export interface BuildabilityShortfall {
  pieceId: string;
  label: string;
  what: BuildabilityMeasure;
  measuredMm: number;
  minimumMm: number;
}

/**
 * A piece's size: the narrowest width of its faces taken together (their convex hull), mm, so the same
 * however the piece is turned on the sheet. Tabs are left out: they are not the part.
 */
export function pieceAcrossMm(piece: Pick<Piece, 'hinge'>): number {
  return polygonWidthMm(convexHull(piece.hinge.faces.flatMap((f) => f.polygonMm)));
}

/** The convex hull of points, counter-clockwise (Andrew's monotone chain). */
export function convexHull(points: readonly Vec2Mm[]): Vec2Mm[] {
  const sorted = [...points].sort((a, b) => a[0] - b[0] || a[1] - b[1]);
  if (sorted.length < 3) return sorted;
  const cross = (o: Vec2Mm, a: Vec2Mm, b: Vec2Mm) => (a[0] - o[0]) * (b[1] - o[1]) - (a[1] - o[1]) * (b[0] - o[0]);
  const chain = (pts: Vec2Mm[]) => {
    const out: Vec2Mm[] = [];
    for (const p of pts) {
      while (out.length >= 2 && cross(out[out.length - 2]!, out[out.length - 1]!, p) <= 0) out.pop();
      out.push(p);
    }
    out.pop();
    return out;
  };
  return [...chain(sorted), ...chain([...sorted].reverse())];
}

/**
 * The shallowest tab of a piece as cut, mm: each tab's own depth after neighbours trimmed it (GlueTab.depthMm),
 * or, for a tab that does not state it, the farthest reach of its polygon from the edge it starts on.
 * Infinity when the piece has no tabs.
 */
export function pieceTabDepthMm(piece: Pick<Piece, 'tabs'>): number {
  return pieceShallowestTab(piece)?.depthMm ?? Infinity;
}

/** The shallowest tab of a piece with its depth as cut (pieceTabDepthMm), or null when the piece has none. */
export function pieceShallowestTab(piece: Pick<Piece, 'tabs'>): { number: number; depthMm: number } | null {
  let best: { number: number; depthMm: number } | null = null;
  for (const t of piece.tabs) {
    const depthMm = t.depthMm ?? tabReachMm(t.polygonMm);
    if (!best || depthMm < best.depthMm) best = { number: t.number, depthMm };
  }
  return best;
}

function tabReachMm(polygonMm: readonly Vec2Mm[]): number {
  const [b, a] = [polygonMm[0], polygonMm[1]];
  if (!a || !b) return 0;
  const len = Math.hypot(b[0] - a[0], b[1] - a[1]) || 1;
  return Math.max(...polygonMm.map((p) => lineDistance(a, b, len, p)));
}

const lineDistance = (a: Vec2Mm, b: Vec2Mm, len: number, p: Vec2Mm) =>
  Math.abs((b[0] - a[0]) * (p[1] - a[1]) - (b[1] - a[1]) * (p[0] - a[0])) / len;

/**
 * The smallest width of a polygon, mm: over every edge direction, the farthest point from that edge's line
 * (rotating calipers; exact for convex faces, which every face of the engine is, and an upper bound otherwise).
 */
export function polygonWidthMm(polygonMm: readonly Vec2Mm[]): number {
  let min = Infinity;
  for (let i = 0; i < polygonMm.length; i++) {
    const a = polygonMm[i]!;
    const b = polygonMm[(i + 1) % polygonMm.length]!;
    const len = Math.hypot(b[0] - a[0], b[1] - a[1]);
    if (len < 1e-9) continue;
    let far = 0;
    for (const p of polygonMm) far = Math.max(far, lineDistance(a, b, len, p));
    min = Math.min(min, far);
  }
  return min;
}

/** The narrowest face of a piece, mm. */
export function pieceStripMm(piece: Pick<Piece, 'hinge'>): number {
  return Math.min(...piece.hinge.faces.map((f) => polygonWidthMm(f.polygonMm)));
}

/** Distance between two segments, mm (0 when they cross or touch). */
export function segmentDistanceMm(a0: Vec2Mm, a1: Vec2Mm, b0: Vec2Mm, b1: Vec2Mm): number {
  const cross = (o: Vec2Mm, p: Vec2Mm, q: Vec2Mm) => (p[0] - o[0]) * (q[1] - o[1]) - (p[1] - o[1]) * (q[0] - o[0]);
  const d1 = cross(a0, a1, b0);
  const d2 = cross(a0, a1, b1);
  const d3 = cross(b0, b1, a0);
  const d4 = cross(b0, b1, a1);
  if (((d1 > 0 && d2 < 0) || (d1 < 0 && d2 > 0)) && ((d3 > 0 && d4 < 0) || (d3 < 0 && d4 > 0))) return 0;
  return Math.min(
    pointSegmentMm(a0, b0, b1),
    pointSegmentMm(a1, b0, b1),
    pointSegmentMm(b0, a0, a1),
    pointSegmentMm(b1, a0, a1),
  );
}

function pointSegmentMm(p: Vec2Mm, a: Vec2Mm, b: Vec2Mm): number {
  const [dx, dy] = [b[0] - a[0], b[1] - a[1]];
  const len2 = dx * dx + dy * dy;
  const t = len2 === 0 ? 0 : Math.max(0, Math.min(1, ((p[0] - a[0]) * dx + (p[1] - a[1]) * dy) / len2));
  return Math.hypot(p[0] - a[0] - t * dx, p[1] - a[1] - t * dy);
}

/** Folds closer than this are taken to meet (at a shared corner), not to run side by side, mm. */
const FOLDS_MEET_MM = 1e-3;

/**
 * The smallest distance between two folds of a piece that do not meet, mm (tab folds included: a tab's crease
 * and the next fold across its face must both be made). Infinity when no two folds stand apart.
 */
export function pieceFoldGapMm(piece: Pick<Piece, 'folds'>): number {
  let min = Infinity;
  const folds = piece.folds;
  for (let i = 0; i < folds.length; i++) {
    for (let j = i + 1; j < folds.length; j++) {
      const [f, g] = [folds[i]!, folds[j]!];
      const d = segmentDistanceMm(f.fromMm, f.toMm, g.fromMm, g.toMm);
      if (d > FOLDS_MEET_MM) min = Math.min(min, d);
    }
  }
  return min;
}

/** Every measure of a piece. */
export function pieceMeasures(piece: Pick<Piece, 'hinge' | 'tabs' | 'folds'>): PieceMeasures {
  return {
    pieceMm: pieceAcrossMm(piece),
    stripMm: pieceStripMm(piece),
    tabMm: pieceTabDepthMm(piece),
    foldGapMm: pieceFoldGapMm(piece),
  };
}

const MEASURES: readonly BuildabilityMeasure[] = ['pieceMm', 'stripMm', 'tabMm', 'foldGapMm'];

/**
 * Where pieces fall short of a band's minimums, worst first (the smallest measured-to-minimum ratio): an empty
 * list means a class of that band can build every piece.
 */
export function buildabilityShortfalls(
  pieces: readonly Pick<Piece, 'id' | 'label' | 'hinge' | 'tabs' | 'folds'>[],
  band: BuildGradeBand,
): BuildabilityShortfall[] {
  const min = BUILDABILITY_MINIMUMS[band];
  const out: BuildabilityShortfall[] = [];
  for (const piece of pieces) {
    const m = pieceMeasures(piece);
    for (const what of MEASURES) {
      if (m[what] < min[what])
        out.push({ pieceId: piece.id, label: piece.label, what, measuredMm: m[what], minimumMm: min[what] });
    }
  }
  return out.sort((a, b) => a.measuredMm / a.minimumMm - b.measuredMm / b.minimumMm);
}

/** The highest band (youngest class) whose minimums every piece meets, or null when not even adults could. */
export function buildabilityBand(pieces: readonly Pick<Piece, 'id' | 'label' | 'hinge' | 'tabs' | 'folds'>[]) {
  return BUILD_GRADE_BANDS.find((band) => buildabilityShortfalls(pieces, band).length === 0) ?? null;
}

/** A length as printed in explanations: one decimal under 10 mm, whole millimetres above. */
export const buildabilityMm = (v: number) => `${v < 10 ? v.toFixed(1) : Math.round(v)} mm`;

/** A shortfall in plain words, e.g. "the Dish antenna would be 12 mm across (grades 6–8 need 15 mm)". */
export function buildabilityShortfallWords(s: BuildabilityShortfall, band: BuildGradeBand): string {
  const need = `${BUILD_GRADE_BAND_WORDS[band]} need ${buildabilityMm(s.minimumMm)}`;
  const got = buildabilityMm(s.measuredMm);
  switch (s.what) {
    case 'pieceMm':
      return `the ${s.label} would be ${got} across (${need})`;
    case 'stripMm':
      return `the ${s.label} would have a strip ${got} wide (${need})`;
    case 'tabMm':
      return `the ${s.label} would have tabs ${got} deep (${need})`;
    case 'foldGapMm':
      return `the ${s.label} would have folds ${got} apart (${need})`;
  }
}

/**
 * A shortfall as a note printed beside the piece it concerns (the piece's name is shown with it), e.g.
 * "Tab 12 is 3.1 mm deep; grades 3–5 need 6.0 mm". The tab named is the piece's shallowest.
 */
export function buildabilityNoteWords(
  s: BuildabilityShortfall,
  band: BuildGradeBand,
  piece: Pick<Piece, 'tabs'>,
): string {
  const need = `${BUILD_GRADE_BAND_WORDS[band]} need ${buildabilityMm(s.minimumMm)}`;
  const got = buildabilityMm(s.measuredMm);
  switch (s.what) {
    case 'pieceMm':
      return `The piece is ${got} across; ${need}`;
    case 'stripMm':
      return `Its narrowest strip is ${got} wide; ${need}`;
    case 'tabMm': {
      const tab = pieceShallowestTab(piece);
      return `${tab ? `Tab ${tab.number}` : 'A tab'} is ${got} deep; ${need}`;
    }
    case 'foldGapMm':
      return `Two of its folds are ${got} apart; ${need}`;
  }
}
