/**
 * The one rule that puts a piece's flat coordinates (mm, y up) on a sheet (mm, y down), described in
 * src/lib/layout/types.ts, and the bounding boxes that follow from it.
 */
import type { Piece, Vec2Mm } from '../geometry/types';
import type { Placement, RectMm, SheetVec2Mm } from './types';

type PlacementPose = Pick<Placement, 'xMm' | 'yMm' | 'rotationRad' | 'mirrored'>;

/** A flat point (mm, y up) placed on the sheet (mm from the top-left corner, y down). */
export function placementApply(placement: PlacementPose, p: Vec2Mm): SheetVec2Mm {
  const qx = placement.mirrored ? -p[0] : p[0];
  const qy = -p[1];
  const c = Math.cos(placement.rotationRad);
  const s = Math.sin(placement.rotationRad);
  return [c * qx - s * qy + placement.xMm, s * qx + c * qy + placement.yMm];
}

/**
 * A direction given as radians from +x in flat coordinates, as radians on the sheet measured clockwise
 * from +x (the angle SVG's rotate() takes, in radians).
 */
export function placementApplyAngle(placement: PlacementPose, angleRad: number): number {
  const origin = placementApply({ ...placement, xMm: 0, yMm: 0 }, [0, 0]);
  const tip = placementApply({ ...placement, xMm: 0, yMm: 0 }, [Math.cos(angleRad), Math.sin(angleRad)]);
  return Math.atan2(tip[1] - origin[1], tip[0] - origin[0]);
}

/** The axis-aligned box around some points, mm; an empty list gives a zero box at the origin. */
export function placementBoundsOfPoints(points: readonly SheetVec2Mm[]): RectMm {
  if (points.length === 0) return { xMm: 0, yMm: 0, widthMm: 0, heightMm: 0 };
  let minX = Infinity;
  let minY = Infinity;
  let maxX = -Infinity;
  let maxY = -Infinity;
  for (const [x, y] of points) {
    if (x < minX) minX = x;
    if (y < minY) minY = y;
    if (x > maxX) maxX = x;
    if (y > maxY) maxY = y;
  }
  return { xMm: minX, yMm: minY, widthMm: maxX - minX, heightMm: maxY - minY };
}

/** A piece's cut outline placed on the sheet, mm, y down. */
export function placementOutline(placement: PlacementPose, piece: Pick<Piece, 'outlineMm'>): SheetVec2Mm[] {
  return piece.outlineMm.map((p) => placementApply(placement, p));
}

/** The box around a placed piece's outline on the sheet, mm (tabs included, since they are in the outline). */
export function placementBounds(placement: PlacementPose, piece: Pick<Piece, 'outlineMm'>): RectMm {
  return placementBoundsOfPoints(placementOutline(placement, piece));
}

/**
 * The pose that rotates a piece by rotationRad and puts the top-left corner of its box at (xMm, yMm) on the
 * sheet.
 */
export function placementAtCorner(
  piece: Pick<Piece, 'outlineMm'>,
  rotationRad: number,
  xMm: number,
  yMm: number,
  mirrored = false,
): PlacementPose {
  const box = placementBounds({ xMm: 0, yMm: 0, rotationRad, mirrored }, piece);
  return { xMm: xMm - box.xMm, yMm: yMm - box.yMm, rotationRad, mirrored };
}
