/**
 * Everything on a sheet except the piece lines, as renderer-neutral primitives in sheet mm (y down): piece
 * labels, tab and edge numbers, alignment marks, tile guides, and the furniture (footer, check square,
 * legend, and the QR code or, for a kit with no page yet, a note in its place). The SVG and PDF renderers draw the same scene.
 */
import type { Piece, Vec2Mm } from '../geometry/types';
import { placementApply, placementApplyAngle, placementBoundsOfPoints } from '../layout/placement';
import {
  LABEL_BOX_HEIGHT_EM,
  labelBox,
  labelBoxesOverlap,
  labelCandidatePoints,
  labelPointInside,
} from './label-placement';
import { LABEL_LINE_CLEARANCE_MM, LabelObstacles, labelBoxGrown, labelBoxNearestPoint } from './label-obstacles';
import { GLUE_MARK_UNDERLINE_EM, glueMarkSizesMm, glueMarkUnderlined } from './glue-marks';
import { pieceLines } from './piece-lines';
import { assemblySteps } from '../preview/assembly-steps';
import type { LabelMeasure } from './label-placement';
import { textWidthMm } from './text-width';
import { polygonArea } from '../geometry/vec';
import { outlineOf } from '../geometry/piece-builder';
import {
  sheetFurnitureCheckSquareText,
  sheetFurnitureFooterText,
  sheetFurnitureLayout,
  SHEET_CUT_LIST_ROW_MM,
} from '../layout/sheet-furniture';
import { TILE_CAPTION_MM } from '../layout/tiling';
import { MM_PER_INCH } from '../layout/units';
import type { KitLayout, LaidOutSheet, Placement, RectMm } from '../layout/types';
import { GLUE_TINT, GUIDE_STYLE, LINE_STYLES, TEXT_COLOR } from './line-styles';
import { qrRects } from './qr';
import { gaugeScene } from './gauge-scene';

export interface SceneText {
  text: string;
  /** Centre of the text's left end (anchor start) or middle (anchor middle), mm. */
  atMm: Vec2Mm;
  /** Baseline direction, radians clockwise from +x on the sheet. */
  angleRad: number;
  sizeMm: number;
  bold: boolean;
  anchor: 'start' | 'middle';
  group: 'labels' | 'furniture';
  /** Present on a glue mark: its number, which side of the joint it is on, and the piece it is printed on. */
  mark?: SceneMark;
  /** True on a piece's step badge. */
  badge?: boolean;
  /** Present on a mark printed beside its piece: the point on the piece its leader line ends at, mm. */
  calloutMm?: Vec2Mm;
}
/** A glue mark's joint and side: the tab, or the edge the tab glues to. */
export interface SceneMark {
  number: number;
  side: 'tab' | 'edge';
  pieceId: string;
}
export interface SceneStroke {
  points: Vec2Mm[];
  widthMm: number;
  color: string;
  dashMm: readonly number[];
  group: 'labels' | 'furniture';
}
export interface SceneFill {
  rects: RectMm[];
  color: string;
  group: 'artwork' | 'furniture';
}
export interface SheetScene {
  texts: SceneText[];
  strokes: SceneStroke[];
  fills: SceneFill[];
}

const LABEL_SIZE_MM = 3.5;
const NUMBER_SIZE_MM = 2.6;
const FOOTER_SIZE_MM = 2.8;

/**
 * The scene of one sheet of a kit; pieces missing from `kit.pieces` are skipped. Label texts are placed so
 * their boxes (measured by `measure`: the renderer's font metrics, KitwrightSans's advance widths by default)
 * do not overlap.
 */
export function sheetScene(kit: KitLayout, sheet: LaidOutSheet, measure: LabelMeasure = textWidthMm): SheetScene {
  const scene: SheetScene = { texts: [], strokes: [], fills: [] };
  const byId = new Map(kit.pieces.map((p) => [p.id, p]));
  for (const placement of sheet.placements) if (placement.tile) sceneTileGuides(scene, placement);
  const labels = new SceneLabels(scene, measure, sceneObstacles(kit, sheet, byId, scene, measure));
  const gauges = gaugeScene(sheet);
  for (const t of gauges.texts) labels.reserve(t);
  scene.strokes.push(...gauges.strokes);
  // Registration letters and glue marks have fixed homes (their cross, tab or edge); piece names and step
  // badges can move, so they are placed last.
  for (const m of sheet.alignmentMarks) sceneAlignmentLetter(labels, m.atMm, m.letter);
  const markSizes = glueMarkSizesMm(kit.smallestLabelMm);
  const callouts: SceneCallout[] = [];
  for (const placement of sheet.placements) {
    const piece = byId.get(placement.pieceId);
    if (piece) scenePieceMarks(labels, piece, placement, markSizes, callouts);
  }
  const onFreePaper = sceneFreePaper(sheet, byId);
  for (const c of callouts)
    if (!labels.tryCallout(c.callout, c.targets, (b) => c.fits(b) && onFreePaper(b))) labels.reserve(c.fallback);
  const badges = sceneStepBadges(kit.pieces);
  for (const placement of sheet.placements) {
    const piece = byId.get(placement.pieceId);
    if (piece) scenePieceName(labels, piece, placement);
  }
  for (const placement of sheet.placements) {
    const piece = byId.get(placement.pieceId);
    const badge = piece && badges.get(piece.id);
    if (piece && badge) sceneStepBadge(labels, piece, placement, badge, markSizes);
  }
  for (const mark of sheet.alignmentMarks)
    scene.strokes.push(...sceneAlignmentCross(mark.atMm).map((points) => ({ ...ALIGNMENT_STYLE, points })));
  sceneFurniture(scene, kit, sheet, measure);
  return scene;
}

/**
 * A test that a box lies on blank paper: inside the printable area and outside every placed piece (a box
 * that crosses no line is wholly inside or wholly outside each outline, so its centre decides).
 */
function sceneFreePaper(sheet: LaidOutSheet, byId: ReadonlyMap<string, Piece>): (box: Vec2Mm[]) => boolean {
  const outlines = sheet.placements.flatMap((placement) => {
    const piece = byId.get(placement.pieceId);
    if (!piece) return [];
    const outline = piece.outlineMm.map((p) => placementApply(placement, p));
    return [{ outline, bounds: placementBoundsOfPoints(outline) }];
  });
  return (box) => {
    if (!box.every((p) => inside(p, sheet.printableMm))) return false;
    const c: Vec2Mm = [(box[0]![0] + box[2]![0]) / 2, (box[0]![1] + box[2]![1]) / 2];
    return !outlines.some(({ outline, bounds: r }) => inside(c, r) && labelPointInside(c, outline));
  };
}

const ALIGNMENT_STYLE = { widthMm: 0.25, color: TEXT_COLOR, dashMm: [], group: 'labels' as const };
/** Half the length of a registration cross's arms, mm. */
const ALIGNMENT_ARM_MM = 3;

/** The two strokes of a registration cross centred on a point. */
function sceneAlignmentCross([x, y]: Vec2Mm): Vec2Mm[][] {
  const arm = ALIGNMENT_ARM_MM;
  return [
    [
      [x - arm, y],
      [x + arm, y],
    ],
    [
      [x, y - arm],
      [x, y + arm],
    ],
  ];
}

/** A registration cross's letter in the first clear spot round the cross. */
function sceneAlignmentLetter(labels: SceneLabels, at: Vec2Mm, letter: string) {
  // Above right first, then the other quarters, then farther out.
  const homes: [Vec2Mm, SceneText['anchor']][] = [0.6, 2.5, 5].flatMap((gap) => {
    const d = ALIGNMENT_ARM_MM + gap;
    return [
      [[at[0] + d, at[1] - d], 'start'],
      [[at[0] + d, at[1] + d], 'start'],
      [[at[0] - d, at[1] - d], 'middle'],
      [[at[0] - d, at[1] + d], 'middle'],
    ] as [Vec2Mm, SceneText['anchor']][];
  });
  const candidates = homes.map(([p, anchor]) => text(letter, p, NUMBER_SIZE_MM, 'labels', { bold: true, anchor }));
  if (!labels.tryPlace(candidates)) labels.reserve(candidates[0]!);
}

/**
 * Everything drawn on the sheet that a label must not cover: every piece's cut outline and folds (clipped to
 * its tile), registration crosses, tile guides and their captions, and the furniture (footer, check square,
 * legend, QR code, cut list) with its gap.
 */
function sceneObstacles(
  kit: KitLayout,
  sheet: LaidOutSheet,
  byId: ReadonlyMap<string, Piece>,
  scene: SheetScene,
  measure: LabelMeasure,
): LabelObstacles {
  const obstacles = new LabelObstacles(LABEL_LINE_CLEARANCE_MM);
  for (const placement of sheet.placements) {
    const piece = byId.get(placement.pieceId);
    if (!piece) continue;
    const lines = pieceLines(piece, placement, (polylines) =>
      polylines.map((line) => line.map((p) => placementApply(placement, p))),
    );
    for (const line of [...lines.cut, ...lines.mountain, ...lines.valley]) obstacles.addPolyline(line);
  }
  for (const m of sheet.alignmentMarks) for (const arm of sceneAlignmentCross(m.atMm)) obstacles.add(arm);
  for (const stroke of scene.strokes) obstacles.addPolyline(stroke.points);
  for (const t of scene.texts) obstacles.add(sceneTextBox(t, measure));
  const furniture = sheetFurnitureLayout(sheet.printableMm, kit.units, sheet.number === 1, kit.cutList.length);
  for (const r of furniture.obstacles) obstacles.add(rectCorners(r));
  return obstacles;
}

function rectCorners(r: RectMm): Vec2Mm[] {
  return [
    [r.xMm, r.yMm],
    [r.xMm + r.widthMm, r.yMm],
    [r.xMm + r.widthMm, r.yMm + r.heightMm],
    [r.xMm, r.yMm + r.heightMm],
  ];
}

/** The box a text covers on the sheet, measured with `measure`. */
export function sceneTextBox(t: SceneText, measure: LabelMeasure): Vec2Mm[] {
  return labelBox(t.atMm, t.angleRad, measure(t.text, t.sizeMm, t.bold), t.sizeMm * LABEL_BOX_HEIGHT_EM, t.anchor);
}

function text(
  value: string,
  atMm: Vec2Mm,
  sizeMm: number,
  group: SceneText['group'],
  extra: Partial<SceneText> = {},
): SceneText {
  return { text: value, atMm, angleRad: 0, sizeMm, bold: false, anchor: 'middle', group, ...extra };
}

function inside(p: Vec2Mm, w?: RectMm): boolean {
  return !w || (p[0] >= w.xMm && p[0] <= w.xMm + w.widthMm && p[1] >= w.yMm && p[1] <= w.yMm + w.heightMm);
}

/** Upright text: a baseline pointing left is turned half a turn so numbers never read upside down. */
function upright(angleRad: number): number {
  let a = Math.atan2(Math.sin(angleRad), Math.cos(angleRad));
  if (a > Math.PI / 2 + 1e-9) a -= Math.PI;
  if (a <= -Math.PI / 2 - 1e-9) a += Math.PI;
  return a;
}

/** The label texts of a sheet and their boxes, so each new label can be kept clear of the drawing and of the ones before. */
class SceneLabels {
  private readonly placed = new LabelObstacles(0);
  /** Callout leaders drawn so far: later labels keep clear of them like of any line. */
  private readonly leaders = new LabelObstacles(LABEL_LINE_CLEARANCE_MM);
  private readonly widths = new Map<string, number>();
  constructor(
    readonly scene: SheetScene,
    readonly measure: LabelMeasure,
    readonly obstacles: LabelObstacles,
  ) {}

  box(t: SceneText): Vec2Mm[] {
    const key = `${t.bold ? 'b' : 'r'}${t.sizeMm}|${t.text}`;
    let width = this.widths.get(key);
    if (width === undefined) this.widths.set(key, (width = this.measure(t.text, t.sizeMm, t.bold)));
    return labelBox(t.atMm, t.angleRad, width, t.sizeMm * LABEL_BOX_HEIGHT_EM, t.anchor);
  }

  /** Adds a text at its own place whatever it covers (the last resort of a mark that must print). */
  reserve(t: SceneText) {
    this.push(t, this.box(t));
  }

  /**
   * Adds the first of the candidate texts whose box is clear of every label and drawn element and passes
   * `fits`; false when none is.
   */
  tryPlace(candidates: Iterable<SceneText>, fits: (box: Vec2Mm[]) => boolean = () => true): boolean {
    for (const t of candidates) {
      const box = this.box(t);
      if (fits(box) && !this.placed.hits(box) && !this.obstacles.hits(box) && !this.leaders.hits(box)) {
        this.push(t, box);
        return true;
      }
    }
    return false;
  }

  /**
   * For a mark its piece has no room for (a part too small for its kit's readers): the mark upright on clear
   * paper near the first target, with a thin leader line from the mark to one of `targets` that no label
   * covers; false when nothing within CALLOUT_RADII_MM is clear.
   */
  tryCallout(t: SceneText, targets: readonly Vec2Mm[], fits: (box: Vec2Mm[]) => boolean): boolean {
    const home = targets[0]!;
    const free = targets.filter((p) => !this.placed.hits([p, p]));
    for (const r of CALLOUT_RADII_MM)
      for (let k = 0; k < CALLOUT_DIRECTIONS; k++) {
        const a = (2 * Math.PI * k) / CALLOUT_DIRECTIONS;
        const candidate = { ...t, atMm: [home[0] + r * Math.cos(a), home[1] + r * Math.sin(a)] as Vec2Mm };
        const box = this.box(candidate);
        if (!fits(box) || this.placed.hits(box) || this.obstacles.hits(box) || this.leaders.hits(box)) continue;
        // The leader runs from the box's nearest side to a point of the mark's place and crosses no label.
        for (const target of free) {
          const leader: Vec2Mm[] = [labelBoxNearestPoint(box, target), target];
          if (this.placed.hits(leader)) continue;
          this.push({ ...candidate, calloutMm: target }, box);
          this.scene.strokes.push({
            points: leader,
            widthMm: CALLOUT_LEADER_MM,
            color: TEXT_COLOR,
            dashMm: [],
            group: 'labels',
          });
          this.leaders.add(leader);
          return true;
        }
      }
    return false;
  }

  private push(t: SceneText, box: Vec2Mm[]) {
    this.scene.texts.push(t);
    this.placed.add(box);
    if (t.mark && glueMarkUnderlined(t.text)) {
      // The underline runs under the digits along the baseline: within the box, so it needs no room of its own.
      const [c, s] = [Math.cos(t.angleRad), Math.sin(t.angleRad)];
      const width = this.measure(t.text, t.sizeMm, t.bold);
      const [x0, x1] = t.anchor === 'middle' ? [-width / 2, width / 2] : [0, width];
      const down = GLUE_MARK_UNDERLINE_EM.offset * t.sizeMm;
      const at = (x: number): Vec2Mm => [t.atMm[0] + c * x - s * down, t.atMm[1] + s * x + c * down];
      this.scene.strokes.push({
        points: [at(x0), at(x1)],
        widthMm: GLUE_MARK_UNDERLINE_EM.width * t.sizeMm,
        color: TEXT_COLOR,
        dashMm: [],
        group: 'labels',
      });
    }
  }
}

/** Distances from its home tried for a mark printed beside its piece, mm, nearest first. */
const CALLOUT_RADII_MM = [4, 6, 8, 11, 14, 18, 23, 30, 40, 50, 65, 80, 100, 125];
/** Directions tried round the home at each distance. */
const CALLOUT_DIRECTIONS = 36;
/** Width of a callout's leader line, mm. */
const CALLOUT_LEADER_MM = 0.15;

/** Shifts along its edge tried for a glue mark, mm, nearest first. */
const MARK_SHIFTS_MM = [0, 1.5, -1.5, 3, -3, 4.5, -4.5, 6, -6];
/** Moves of a tab's mark across its fold (+ away from it) and of an edge's mark into its face, mm. */
const TAB_MARK_ACROSS_MM = [0, 0.8, -0.8];
const EDGE_MARK_INSET_MM = [0, 1, 2, 3.5, -0.8];

/** A mark its piece had no room for, to print beside the piece once every piece's own marks are placed. */
interface SceneCallout {
  /** Points on the piece the leader may end at, best first (the mark's home first). */
  targets: Vec2Mm[];
  callout: SceneText;
  /** Printed at its home whatever it covers when no clear spot is found (so no joint loses a mark). */
  fallback: SceneText;
  fits: (box: Vec2Mm[]) => boolean;
}

/**
 * The glue marks of a placed piece: on each tab, reading along its fold line, and inside each edge a tab
 * glues to, reading along that edge; both upright on the sheet, underlined when they read as another number
 * upside down, as large as the room allows down to the smallest mark size, kept clear of every line and
 * label. A mark with no room on its piece is queued in `callouts`.
 */
function scenePieceMarks(
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
  const inWindow = (b: Vec2Mm[]) => b.every((p) => inside(p, window));
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
    const fitsZone = (b: Vec2Mm[]) => inWindow(b) && (!placedZone || b.every((p) => labelPointInside(p, placedZone)));
    if (labels.tryPlace(candidates(), fitsZone)) return;
    const at = placementApply(placement, home);
    const smallest = sizesMm[sizesMm.length - 1]!;
    const targets: Vec2Mm[] = [];
    // A leader may end a little either side of the home (a part's mark on a face can sit on its edge).
    for (const a of [...across, ...across.map((x) => -x)])
      for (const d of MARK_SHIFTS_MM) {
        const flat: Vec2Mm = [home[0] + c * d + acrossDir[0] * a, home[1] + s * d + acrossDir[1] * a];
        if (within(flat)) targets.push(placementApply(placement, flat));
      }
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
function scenePieceName(labels: SceneLabels, piece: Piece, placement: Placement) {
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
function sceneStepBadge(labels: SceneLabels, piece: Piece, placement: Placement, badge: string, sizesMm: number[]) {
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
function sceneStepBadges(pieces: readonly Piece[]): Map<string, string> {
  let badges = stepBadgeCache.get(pieces);
  if (badges) return badges;
  const numbers = new Map<string, number[]>();
  for (const step of assemblySteps(pieces))
    for (const id of step.pieceIds) numbers.set(id, [...(numbers.get(id) ?? []), step.number]);
  badges = new Map([...numbers].map(([id, ns]) => [id, sceneStepBadgeText(ns)]));
  stepBadgeCache.set(pieces, badges);
  return badges;
}

const nameRegionCache = new WeakMap<Piece, { region: Vec2Mm[]; points: Vec2Mm[] }[]>();

/**
 * Where a piece's name may go, in its own flat coordinates: its four largest faces, then (last resort for
 * pieces whose faces are all narrow, like a many-sided wall strip) the union of its faces — across folds,
 * never on tabs — each with its candidate points. Placements are rigid motions, so the regions and points
 * are computed once per piece and moved onto each sheet, copy and tile.
 */
function sceneNameRegions(piece: Piece): { region: Vec2Mm[]; points: Vec2Mm[] }[] {
  const cached = nameRegionCache.get(piece);
  if (cached) return cached;
  const faces = piece.hinge.faces
    .map((f) => f.polygonMm)
    .filter((f) => f.length >= 3)
    .sort((a, b) => Math.abs(polygonArea(b)) - Math.abs(polygonArea(a)))
    .slice(0, 4);
  const union = outlineOf(piece.hinge.faces.map((f) => [...f.polygonMm]));
  const regions = [...faces, union].map((region) => ({ region: [...region], points: labelCandidatePoints(region) }));
  nameRegionCache.set(piece, regions);
  return regions;
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
function sceneInside(region: readonly Vec2Mm[], window?: RectMm): (box: Vec2Mm[]) => boolean {
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
    if (!box.every((p) => inside(p, window) && labelPointInside(p, region))) return false;
    const xs = box.map((p) => p[0]);
    const ys = box.map((p) => p[1]);
    const [x0, x1, y0, y1] = [Math.min(...xs), Math.max(...xs), Math.min(...ys), Math.max(...ys)];
    // Only edges whose box meets the text's box can cross it.
    return !edges.some(
      (e) => e.maxX >= x0 && e.minX <= x1 && e.maxY >= y0 && e.minY <= y1 && labelBoxesOverlap(box, [e.a, e.b]),
    );
  };
}

function sceneTileGuides(scene: SheetScene, placement: Placement) {
  const tile = placement.tile!;
  const w = tile.windowMm;
  const o = tile.overlapMm;
  const strips: RectMm[] = [];
  if (tile.col + 1 < tile.cols)
    strips.push({ xMm: w.xMm + w.widthMm - o, yMm: w.yMm, widthMm: o, heightMm: w.heightMm });
  if (tile.row + 1 < tile.rows)
    strips.push({ xMm: w.xMm, yMm: w.yMm + w.heightMm - o, widthMm: w.widthMm, heightMm: o });
  if (strips.length) scene.fills.push({ rects: strips, color: GLUE_TINT, group: 'artwork' });
  const r = w.xMm + w.widthMm;
  const b = w.yMm + w.heightMm;
  scene.strokes.push({
    ...GUIDE_STYLE,
    group: 'furniture',
    points: [
      [w.xMm, w.yMm],
      [r, w.yMm],
      [r, b],
      [w.xMm, b],
      [w.xMm, w.yMm],
    ],
  });
  const step = strips.length
    ? ': glue the shaded strip under the next tile, letters on letters'
    : ': lay it over the tiles before it';
  const where = `Tile row ${tile.row + 1} of ${tile.rows}, column ${tile.col + 1} of ${tile.cols}${step}`;
  scene.texts.push(text(where, [w.xMm, b + TILE_CAPTION_MM / 2], 2.2, 'furniture', { anchor: 'start' }));
}

function sceneFurniture(scene: SheetScene, kit: KitLayout, sheet: LaidOutSheet, measure: LabelMeasure) {
  const first = sheet.number === 1;
  const layout = sheetFurnitureLayout(sheet.printableMm, kit.units, first, kit.cutList.length);
  const { footer, checkSquare: sq } = layout;
  const footerText = sheetFurnitureFooterText(kit, sheet, kit.sheets.length);
  scene.texts.push(
    text(footerText, [footer.xMm, footer.yMm + footer.heightMm / 2], FOOTER_SIZE_MM, 'furniture', { anchor: 'start' }),
  );
  const r = sq.xMm + sq.widthMm;
  const b = sq.yMm + sq.heightMm;
  scene.strokes.push({
    widthMm: 0.25,
    color: TEXT_COLOR,
    dashMm: [],
    group: 'furniture',
    points: [
      [sq.xMm, sq.yMm],
      [r, sq.yMm],
      [r, b],
      [sq.xMm, b],
      [sq.xMm, sq.yMm],
    ],
  });
  const [size, hint] = sheetFurnitureCheckSquareText(kit.units);
  scene.texts.push(
    text(size, [sq.xMm + sq.widthMm / 2, sq.yMm + sq.heightMm / 2 - 2.5], 3, 'furniture', { bold: true }),
  );
  scene.texts.push(text(hint, [sq.xMm + sq.widthMm / 2, sq.yMm + sq.heightMm / 2 + 2.5], 2.3, 'furniture'));
  if (layout.legend) sceneLegend(scene, layout.legend);
  if (layout.cutList) sceneCutList(scene, kit, layout.cutList);
  if (layout.qr && kit.qrUrl) {
    scene.fills.push({ rects: qrRects(kit.qrUrl, layout.qr), color: TEXT_COLOR, group: 'furniture' });
    scene.texts.push(
      text(
        QR_CAPTION,
        [layout.qr.xMm + layout.qr.widthMm / 2, layout.qr.yMm + layout.qr.heightMm + 2],
        2.4,
        'furniture',
      ),
    );
  } else if (layout.qr) sceneQrPreviewNote(scene, layout.qr, measure);
}

/** Caption under the QR code of a saved kit. */
export const QR_CAPTION = 'Kit page';
/** Printed where the QR code goes while a kit has no page yet: a heading, then a line wrapped to the box. */
export const QR_PREVIEW_NOTE = ['Preview only', 'Save the kit to give it a QR code.'] as const;
const QR_NOTE_HEADING_MM = 2.8;
const QR_NOTE_SIZE_MM = 2.4;
/** Line pitch of the note, in em (common practice, no source: about 1.3 × the size for short captions). */
const QR_NOTE_LEADING_EM = 1.3;

/** The preview note centred in the QR code's square, its second line wrapped at words to the square's width. */
function sceneQrPreviewNote(scene: SheetScene, box: RectMm, measure: LabelMeasure) {
  const [heading, body] = QR_PREVIEW_NOTE;
  const lines = sceneWrapWords(body, box.widthMm, QR_NOTE_SIZE_MM, measure);
  const pitch = QR_NOTE_SIZE_MM * QR_NOTE_LEADING_EM;
  const headingPitch = QR_NOTE_HEADING_MM * QR_NOTE_LEADING_EM;
  const x = box.xMm + box.widthMm / 2;
  let y = box.yMm + (box.heightMm - headingPitch - pitch * lines.length) / 2 + headingPitch / 2;
  scene.texts.push(text(heading, [x, y], QR_NOTE_HEADING_MM, 'furniture', { bold: true }));
  y += (headingPitch + pitch) / 2;
  for (const line of lines) {
    scene.texts.push(text(line, [x, y], QR_NOTE_SIZE_MM, 'furniture'));
    y += pitch;
  }
}

/** Words packed greedily into lines no wider than widthMm (a word longer than that gets a line of its own). */
export function sceneWrapWords(value: string, widthMm: number, sizeMm: number, measure: LabelMeasure): string[] {
  const lines: string[] = [];
  for (const word of value.split(/\s+/).filter(Boolean)) {
    const last = lines[lines.length - 1];
    const joined = last === undefined ? word : `${last} ${word}`;
    if (last !== undefined && measure(joined, sizeMm, false) <= widthMm) lines[lines.length - 1] = joined;
    else lines.push(word);
  }
  return lines;
}

/** Column offsets of the cut-list table from its left edge, mm: part, size, quantity, sheets. */
const CUT_LIST_COLUMNS_MM = [0, 72, 122, 138] as const;
export const CUT_LIST_TITLE = 'Cut list';
export const CUT_LIST_HEADER = ['Part', 'Size', 'Qty', 'Sheets'] as const;

/** The cut list as a table: title, header, then one row per part (size in the kit's units). */
function sceneCutList(scene: SheetScene, kit: KitLayout, box: RectMm) {
  const row = SHEET_CUT_LIST_ROW_MM;
  const size = (w: number, h: number) =>
    kit.units === 'us'
      ? `${(w / MM_PER_INCH).toFixed(1)} × ${(h / MM_PER_INCH).toFixed(1)} in`
      : `${Math.round(w)} × ${Math.round(h)} mm`;
  const cells = (y: number, values: readonly string[], bold = false) =>
    values.forEach((v, i) =>
      scene.texts.push(text(v, [box.xMm + CUT_LIST_COLUMNS_MM[i]!, y], 2.8, 'furniture', { anchor: 'start', bold })),
    );
  let y = box.yMm + row / 2;
  scene.texts.push(text(CUT_LIST_TITLE, [box.xMm, y], 3, 'furniture', { bold: true, anchor: 'start' }));
  y += row;
  cells(y, CUT_LIST_HEADER, true);
  scene.strokes.push({
    widthMm: 0.2,
    color: TEXT_COLOR,
    dashMm: [],
    group: 'furniture',
    points: [
      [box.xMm, y + row / 2],
      [box.xMm + box.widthMm, y + row / 2],
    ],
  });
  for (const r of kit.cutList) {
    y += row;
    cells(y, [r.part, size(r.widthMm, r.heightMm), String(r.quantity), r.sheets.join(', ')]);
  }
}

/** The legend rows, also used by tests to check the font covers them. */
export const LEGEND_TITLE = 'How to read this kit';
export const LEGEND_NOTES = ['Tab 7 glues under the edge marked 7', 'Grey tint: glue area · tiles: letter on letter'];

function sceneLegend(scene: SheetScene, box: RectMm) {
  const row = 5.6;
  let y = box.yMm + 2.5;
  scene.texts.push(text(LEGEND_TITLE, [box.xMm, y], 3, 'furniture', { bold: true, anchor: 'start' }));
  for (const style of [LINE_STYLES.cut, LINE_STYLES.mountain, LINE_STYLES.valley]) {
    y += row;
    scene.strokes.push({
      widthMm: style.widthMm,
      color: style.color,
      dashMm: style.dashMm,
      group: 'furniture',
      points: [
        [box.xMm, y],
        [box.xMm + 16, y],
      ],
    });
    scene.texts.push(text(`${style.label}: ${style.action}`, [box.xMm + 19, y], 2.6, 'furniture', { anchor: 'start' }));
  }
  for (const note of LEGEND_NOTES) {
    y += row;
    scene.texts.push(text(note, [box.xMm, y], 2.5, 'furniture', { anchor: 'start' }));
  }
}
