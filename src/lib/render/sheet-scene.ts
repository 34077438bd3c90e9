/**
 * Everything on a sheet except the piece lines, as renderer-neutral primitives in sheet mm (y down): piece
 * labels, tab and edge numbers, alignment marks, tile guides, and the furniture (footer, check square,
 * legend, and the QR code or, for a kit with no page yet, a note in its place). The SVG and PDF renderers draw the same scene.
 */
import type { Piece } from '../geometry/types';
import { placementApply, placementBoundsOfPoints } from '../layout/placement';
import { type LabelMeasure, labelPointInside } from './label-placement';
import { LABEL_LINE_CLEARANCE_MM, LabelObstacles } from './label-obstacles';
import { glueMarkSizesMm } from './glue-marks';
import { pieceLines } from './piece-lines';
import { textWidthMm } from './text-width';
import { sheetFurnitureLayout } from '../layout/sheet-furniture';
import type { KitLayout, LaidOutSheet, RectMm, SheetVec2Mm } from '../layout/types';
import { gaugeScene } from './gauge-scene';
import { type SheetScene, sceneRectContains as inside } from './scene-types';
import { SceneLabels, sceneTextBox } from './scene-labels';
import { ALIGNMENT_STYLE, sceneAlignmentCross, sceneAlignmentLetter, sceneTileGuides } from './scene-tile-guides';
import { sceneFurniture } from './scene-footer';
import {
  type SceneCallout,
  scenePieceMarks,
  scenePieceName,
  sceneStepBadge,
  sceneStepBadges,
} from './scene-piece-labels';

/**
 * The scene of one sheet of a kit; pieces missing from `kit.pieces` are skipped. Label texts are placed so
 * their boxes (measured by `measure`: the renderer's font metrics, KitwrightSans's advance widths by default)
 * do not overlap.
 */
export function sheetScene(kit: KitLayout, sheet: LaidOutSheet, measure: LabelMeasure = textWidthMm): SheetScene {
  const scene: SheetScene = { texts: [], strokes: [], fills: [] };
  const byId = new Map(kit.pieces.map((p) => [p.id, p]));
  for (const placement of sheet.placements) if (placement.tile) sceneTileGuides(scene, placement, measure);
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
function sceneFreePaper(sheet: LaidOutSheet, byId: ReadonlyMap<string, Piece>): (box: SheetVec2Mm[]) => boolean {
  const outlines = sheet.placements.flatMap((placement) => {
    const piece = byId.get(placement.pieceId);
    if (!piece) return [];
    const outline = piece.outlineMm.map((p) => placementApply(placement, p));
    return [{ outline, bounds: placementBoundsOfPoints(outline) }];
  });
  return (box) => {
    if (!box.every((p) => inside(p, sheet.printableMm))) return false;
    const c: SheetVec2Mm = [(box[0]![0] + box[2]![0]) / 2, (box[0]![1] + box[2]![1]) / 2];
    return !outlines.some(({ outline, bounds: r }) => inside(c, r) && labelPointInside(c, outline));
  };
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

function rectCorners(r: RectMm): SheetVec2Mm[] {
  return [
    [r.xMm, r.yMm],
    [r.xMm + r.widthMm, r.yMm],
    [r.xMm + r.widthMm, r.yMm + r.heightMm],
    [r.xMm, r.yMm + r.heightMm],
  ];
}
