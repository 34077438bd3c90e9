/**
 * Label placement on the pieces: glue marks on tabs and the edges they glue to, piece names and step badges,
 * each upright and clear of every line and label, sized down to the kit's smallest label.
 */
import type { Piece, Vec2Mm } from '../geometry/types';
import { placementApply, placementApplyAngle } from '../layout/placement';
import { labelBoxesOverlap, labelCandidatePoints, labelPointInside } from './label-placement';
import { labelBoxGrown } from './label-obstacles';
import { assemblySteps } from '../preview/assembly-steps';
import { polygonArea } from '../geometry/vec';
import { outlineOf } from '../geometry/piece-builder';
import type { Placement, RectMm, SheetVec2Mm } from '../layout/types';
import { type SceneMark, type SceneText, sceneRectContains as inside, sceneText as text } from './scene-types';
import { SceneLabels } from './scene-labels';

const LABEL_SIZE_MM = 3.5;

/** Upright text: a baseline pointing left is turned half a turn so numbers never read upside down. */
export function upright(angleRad: number): number {
  let a = Math.atan2(Math.sin(angleRad), Math.cos(angleRad));
  if (a > Math.PI / 2 + 1e-9) a -= Math.PI;
  if (a <= -Math.PI / 2 - 1e-9) a += Math.PI;
  return a;
}

/** Shifts along its edge tried for a glue mark, mm, nearest first. */
const MARK_SHIFTS_MM = [0, 1.5, -1.5, 3, -3, 4.5, -4.5, 6, -6];
/** Moves of a tab's mark across its fold (+ away from it) and of an edge's mark into its face, mm. */
const TAB_MARK_ACROSS_MM = [0, 0.8, -0.8];
const EDGE_MARK_INSET_MM = [0, 1, 2, 3.5, -0.8];

/** How far inside its tab or face a callout's leader ends, mm (common practice, no source: a hair past rounding). */
const LEADER_END_INSET_MM = 0.05;

/** A mark its piece had no room for, to print beside the piece once every piece's own marks are placed. */
export interface SceneCallout {
  /** Points on the piece the leader may end at, best first (the mark's home first). */
  targets: SheetVec2Mm[];
  callout: SceneText;
  /** Printed at its home whatever it covers when no clear spot is found (so no joint loses a mark). */
  fallback: SceneText;
  fits: (box: SheetVec2Mm[]) => boolean;
}

/**
 * The glue marks of a placed piece: on each tab, reading along its fold line, and inside each edge a tab
 * glues to, reading along that edge; both upright on the sheet, underlined when they read as another number
 * upside down, as large as the room allows down to the smallest mark size, kept clear of every line and
 * label. A mark with no room on its piece is queued in `callouts`.
 */
export function scenePieceMarks(
  labels: SceneLabels,
  piece: Piece,
  placement: Placement,
  sizesMm: readonly number[],
  callouts: SceneCallout[],
) {
  const window = placement.tile?.windowMm;
  // A mark prints on the tile whose visible part holds its home, so a tiled piece shows it once.
  const visible = sceneNameWindow(placement);
  const faces = piece.hinge.faces.map((f) => f.polygonMm);
  const tabPolys = piece.tabs.map((t) => t.polygonMm);
  const inWindow = (b: SheetVec2Mm[]) => b.every((p) => inside(p, window));
  const place = (
    mark: SceneMark,
    home: Vec2Mm,
    angleFlat: number,
    across: readonly number[],
    acrossDir: Vec2Mm,
    within: (flat: Vec2Mm) => boolean,
    zone?: readonly Vec2Mm[],
  ) => {
    if (!inside(placementApply(placement, home), visible)) return;
    const angleRad = upright(placementApplyAngle(placement, angleFlat));
    const [c, s] = [Math.cos(angleFlat), Math.sin(angleFlat)];
    const value = String(mark.number);
    function* candidates(): Generator<SceneText> {
      for (const size of sizesMm)
        for (const a of across)
          for (const d of MARK_SHIFTS_MM) {
            const flat: Vec2Mm = [home[0] + c * d + acrossDir[0] * a, home[1] + s * d + acrossDir[1] * a];
            if (!within(flat)) continue;
            yield text(value, placementApply(placement, flat), size, 'labels', { angleRad, mark });
          }
    }
    // A tab without a fold line (a rolled part's overlap strip) has no drawn edge on its face's side: its
    // mark's whole box must lie within it.
    const placedZone = zone?.map((p) => placementApply(placement, p));
    const fitsZone = (b: SheetVec2Mm[]) =>
      inWindow(b) && (!placedZone || b.every((p) => labelPointInside(p, placedZone)));
    if (labels.tryPlace(candidates(), fitsZone)) return;
    const at = placementApply(placement, home);
    const smallest = sizesMm[sizesMm.length - 1]!;
    const targets: SheetVec2Mm[] = [];
    // A leader may end a little either side of the home (a part's mark on a face can sit on its edge), at a
    // point inside its place by LEADER_END_INSET_MM each way: an edge mark's home lies on the edge itself,
    // where rounding can put the leader's end a hair outside the face.
    const e = LEADER_END_INSET_MM;
    const clearlyWithin = (p: Vec2Mm) =>
      [p, [p[0] + e, p[1]], [p[0] - e, p[1]], [p[0], p[1] + e], [p[0], p[1] - e]].every((q) => within(q as Vec2Mm));
    const near: SheetVec2Mm[] = [];
    for (const a of [...across, ...across.map((x) => -x)])
      for (const d of MARK_SHIFTS_MM) {
        const flat: Vec2Mm = [home[0] + c * d + acrossDir[0] * a, home[1] + s * d + acrossDir[1] * a];
        if (clearlyWithin(flat)) targets.push(placementApply(placement, flat));
        else if (within(flat)) near.push(placementApply(placement, flat));
      }
    targets.push(...near);
    callouts.push({
      targets: targets.length ? targets : [at],
      callout: text(value, at, smallest, 'labels', { angleRad: 0, mark }),
      fallback: text(value, at, smallest, 'labels', { angleRad, mark }),
      fits: inWindow,
    });
  };
  piece.tabs.forEach((tab, i) => {
    const fold = piece.folds.find((f) => f.tabNumber === tab.number);
    const along = fold ? Math.atan2(fold.toMm[1] - fold.fromMm[1], fold.toMm[0] - fold.fromMm[0]) : 0;
    // A tab lies right of its fold's direction, so "away from the fold" is the right-hand normal.
    const away: Vec2Mm = [Math.sin(along), -Math.cos(along)];
    const poly = tabPolys[i]!;
    place(
      { number: tab.number, side: 'tab', pieceId: piece.id },
      tab.labelAtMm,
      along,
      TAB_MARK_ACROSS_MM,
      away,
      (p) => labelPointInside(p, poly),
      fold ? undefined : poly,
    );
  });
  for (const label of piece.edgeLabels) {
    // Edge labels sit left of their baseline's direction (inside the face), so "inward" is the left normal.
    const inward: Vec2Mm = [-Math.sin(label.angleRad), Math.cos(label.angleRad)];
    place(
      { number: label.number, side: 'edge', pieceId: piece.id },
      label.atMm,
      label.angleRad,
      EDGE_MARK_INSET_MM,
      inward,
      (p) => faces.some((f) => labelPointInside(p, f)) && !tabPolys.some((t) => labelPointInside(p, t)),
    );
  }
}

/** Piece names tried, mm: large first; below the last the name is left off. */
const NAME_SIZES_MM = [LABEL_SIZE_MM, 3, 2.6, 2.2, 1.8, 1.5, 1.2];

/** The name and its shorter forms, dropping leading words but keeping two ("Wire boom +X anchor" → "+X anchor"). */
export function sceneLabelAbbreviations(label: string): string[] {
  const words = label.split(/\s+/).filter(Boolean);
  return words.slice(0, Math.max(1, words.length - 1)).map((_, i) => words.slice(i).join(' '));
}

/**
 * The piece's name inside its largest faces (or anywhere inside its outline), at the point farthest from
 * the edges that leaves it clear of every label already placed; shrunk, then shortened, to fit.
 */
export function scenePieceName(labels: SceneLabels, piece: Piece, placement: Placement) {
  const window = sceneNameWindow(placement);
  const spots = sceneNameRegions(piece).map(({ region, points }) => {
    const placed = region.map((p) => placementApply(placement, p));
    return {
      within: sceneInside(placed, window),
      points: points.map((p) => placementApply(placement, p)).filter((p) => inside(p, window)),
    };
  });
  // Down to 1.8 mm the full name comes first at every size, then the shorter forms; below that the largest
  // size that fits wins, whichever form it takes. Upright text first, then reading up the sheet for tall,
  // narrow pieces.
  const names = sceneLabelAbbreviations(piece.label);
  const tries: [string, number][] = [
    ...names.flatMap((n) => NAME_SIZES_MM.filter((s) => s >= 1.8).map((s) => [n, s] as [string, number])),
    ...NAME_SIZES_MM.filter((s) => s < 1.8).flatMap((s) => names.map((n) => [n, s] as [string, number])),
  ];
  for (const [name, size] of tries)
    for (const angleRad of [0, -Math.PI / 2])
      for (const { within, points } of spots) {
        const candidates = points.map((p) => text(name, p, size, 'labels', { bold: true, angleRad }));
        if (labels.tryPlace(candidates, within)) return;
      }
}

/**
 * The step badge of a placed piece ("Step 3", "Steps 2–4"): the instructions page's step numbers, printed
 * inside the piece's faces clear of its name, its marks and every line; left off when nothing is clear.
 */
export function sceneStepBadge(
  labels: SceneLabels,
  piece: Piece,
  placement: Placement,
  badge: string,
  sizesMm: number[],
) {
  const window = sceneNameWindow(placement);
  const spots = sceneNameRegions(piece).map(({ region, points }) => ({
    within: sceneInside(
      region.map((p) => placementApply(placement, p)),
      window,
    ),
    points: points.map((p) => placementApply(placement, p)).filter((p) => inside(p, window)),
  }));
  for (const size of sizesMm)
    for (const angleRad of [0, -Math.PI / 2])
      for (const { within, points } of spots) {
        const candidates = points.map((p) => text(badge, p, size, 'labels', { angleRad, badge: true }));
        if (labels.tryPlace(candidates, within)) return;
      }
}

/** The badge words for a piece's steps: "Step 3", "Steps 2–4" (a run) or "Steps 2, 5". */
export function sceneStepBadgeText(stepNumbers: readonly number[]): string {
  if (stepNumbers.length === 0) return '';
  if (stepNumbers.length === 1) return `Step ${stepNumbers[0]}`;
  const run = stepNumbers.every((n, i) => i === 0 || n === stepNumbers[i - 1]! + 1);
  return run ? `Steps ${stepNumbers[0]}–${stepNumbers.at(-1)}` : `Steps ${stepNumbers.join(', ')}`;
}

const stepBadgeCache = new WeakMap<readonly Piece[], Map<string, string>>();

/** Each piece's badge text from the kit's assembly steps (computed once per kit). */
export function sceneStepBadges(pieces: readonly Piece[]): Map<string, string> {
  let badges = stepBadgeCache.get(pieces);
  if (badges) return badges;
  const numbers = new Map<string, number[]>();
  for (const step of assemblySteps(pieces))
    for (const id of step.pieceIds) numbers.set(id, [...(numbers.get(id) ?? []), step.number]);
  badges = new Map([...numbers].map(([id, ns]) => [id, sceneStepBadgeText(ns)]));
  stepBadgeCache.set(pieces, badges);
  return badges;
}

type NameRegion = { readonly region: Vec2Mm[]; readonly points: Vec2Mm[] };

const nameRegionCache = new WeakMap<Piece, readonly NameRegion[]>();
/**
 * Name regions by the piece's face outlines (sceneFacesKey: equal keys mean equal faces): each build makes
 * new pieces, mostly of shapes an earlier build of the process already had.
 */
const nameRegionsByFaces = new Map<string, readonly NameRegion[]>();
const NAME_REGIONS_KEPT = 512;

/**
 * Where a piece's name may go, in its own flat coordinates: its four largest faces, then (last resort for
 * pieces whose faces are all narrow, like a many-sided wall strip) the union of its faces — across folds,
 * never on tabs — each with its candidate points. Placements are rigid motions, so the regions and points
 * are computed once per piece shape and moved onto each sheet, copy and tile.
 */
function sceneNameRegions(piece: Piece): readonly NameRegion[] {
  const cached = nameRegionCache.get(piece);
  if (cached) return cached;
  const key = sceneFacesKey(piece);
  let regions = nameRegionsByFaces.get(key);
  if (!regions) {
    regions = sceneNameRegionsOf(piece);
    if (nameRegionsByFaces.size >= NAME_REGIONS_KEPT)
      nameRegionsByFaces.delete(nameRegionsByFaces.keys().next().value!);
    nameRegionsByFaces.set(key, regions);
  }
  nameRegionCache.set(piece, regions);
  return regions;
}

/** Every coordinate of the piece's faces in order, written out exactly (-0 apart from 0). */
function sceneFacesKey(piece: Piece): string {
  let key = '';
  for (const face of piece.hinge.faces) {
    for (const [x, y] of face.polygonMm) key += `${Object.is(x, -0) ? '-0' : x},${Object.is(y, -0) ? '-0' : y} `;
    key += '|';
  }
  return key;
}

function sceneNameRegionsOf(piece: Piece): NameRegion[] {
  const faces = piece.hinge.faces
    .map((f) => f.polygonMm)
    .filter((f) => f.length >= 3)
    .sort((a, b) => Math.abs(polygonArea(b)) - Math.abs(polygonArea(a)))
    .slice(0, 4);
  const union = outlineOf(piece.hinge.faces.map((f) => [...f.polygonMm]));
  return [...faces, union].map((region) => ({ region: [...region], points: labelCandidatePoints(region) }));
}

/** Clear paper kept round a piece's name inside its face, mm (common practice, no source). */
const NAME_PADDING_MM = 0.6;

/** Where a piece's name may go: its tile's window less the overlap strips the next tiles cover. */
function sceneNameWindow(placement: Placement): RectMm | undefined {
  const t = placement.tile;
  if (!t) return undefined;
  const right = t.col + 1 < t.cols ? t.overlapMm : 0;
  const below = t.row + 1 < t.rows ? t.overlapMm : 0;
  return { ...t.windowMm, widthMm: t.windowMm.widthMm - right, heightMm: t.windowMm.heightMm - below };
}

/** A test that a text box lies inside a polygon (and the window): corners inside, no edge crossing it. */
function sceneInside(region: readonly SheetVec2Mm[], window?: RectMm): (box: SheetVec2Mm[]) => boolean {
  const edges = region.map((a, i) => {
    const b = region[(i + 1) % region.length]!;
    return {
      a,
      b,
      minX: Math.min(a[0], b[0]),
      maxX: Math.max(a[0], b[0]),
      minY: Math.min(a[1], b[1]),
      maxY: Math.max(a[1], b[1]),
    };
  });
  return (tight) => {
    const box = labelBoxGrown(tight, NAME_PADDING_MM);
    let x0 = Infinity;
    let x1 = -Infinity;
    let y0 = Infinity;
    let y1 = -Infinity;
    for (const p of box) {
      if (!inside(p, window) || !labelPointInside(p, region)) return false;
      x0 = Math.min(x0, p[0]);
      x1 = Math.max(x1, p[0]);
      y0 = Math.min(y0, p[1]);
      y1 = Math.max(y1, p[1]);
    }
    // Only edges whose box meets the text's box can cross it.
    return !edges.some(
      (e) => e.maxX >= x0 && e.minX <= x1 && e.maxY >= y0 && e.minY <= y1 && labelBoxesOverlap(box, [e.a, e.b]),
    );
  };
}
