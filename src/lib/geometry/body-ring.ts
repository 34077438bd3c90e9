/**
 * The toothed glue ring along the top or bottom edge of a body's wall strip: one tooth per wall, each folding
 * about its own wall edge onto the cap's underside. Teeth lean in by π/n plus a clearance at each side, so
 * once folded the n teeth of a regular n-gon meet as wedges round the cap centre and never overlap (two
 * neighbouring edges turn by 2π/n; each tooth side gives up half of it); flat, their tips lean apart.
 * Each tooth is a tab of its own with its own number, so every tooth and the cap edge it glues to carry
 * the same mark. Flat mm of the strip, y up; walls left to right from x = 0, bottom edge at y = 0.
 */
import type { NetFace, NetTab } from './piece-builder';
import type { Vec2Mm } from './types';

/** Extra lean of each tooth side beyond π/n, radians, for the paper's thickness (common practice, no source). */
export const BODY_RING_CLEARANCE_RAD = (1 * Math.PI) / 180;
/** Teeth reach at most this fraction of the cap's apothem, so their tips stay clear of the centre. */
export const BODY_RING_REACH_FRACTION = 0.6;
/** A tooth's tip keeps at least this fraction of its base width (common practice, no source). */
export const BODY_RING_TIP_FRACTION = 0.3;

export interface BodyRing {
  /** One tab per tooth (wall j's tooth numbered firstNumber + j), each folding about its own wall edge. */
  tabs: NetTab[];
  /** Each tooth as its own convex quadrilateral (CCW), for clearance checks. */
  teethMm: Vec2Mm[][];
}

/**
 * The ring on `side` of the strip `walls` (their flat rectangles), teeth as deep as `depthWantedMm` allows
 * within the cap's `apothemMm`, numbered from `firstNumber`, wall j's tooth folding by foldAnglesRad[j]; no
 * walls gives an empty ring.
 */
export function bodyRingTeeth(
  walls: readonly NetFace[],
  side: 'top' | 'bottom',
  depthWantedMm: number,
  apothemMm: number,
  firstNumber: number,
  foldAnglesRad: readonly number[],
): BodyRing {
  const n = walls.length;
  const xs = [...walls.map((w) => w.flatMm[0]![0]), walls[n - 1]!.flatMm[1]![0]];
  const y = side === 'top' ? walls[0]!.flatMm[2]![1] : 0;
  const out = side === 'top' ? 1 : -1;
  const lean = Math.PI / n + BODY_RING_CLEARANCE_RAD;
  const narrowest = Math.min(...xs.slice(1).map((x, i) => x - xs[i]!));
  const depthMm = Math.min(
    depthWantedMm,
    BODY_RING_REACH_FRACTION * apothemMm,
    ((1 - BODY_RING_TIP_FRACTION) * narrowest) / (2 * Math.tan(lean)),
  );
  const inset = depthMm * Math.tan(lean);
  const teethMm: Vec2Mm[][] = [];
  const tabs: NetTab[] = [];
  for (let j = 0; j < n; j++) {
    const [l, r] = [xs[j]!, xs[j + 1]!];
    // Counter-clockwise: base along the wall edge (reversed from the wall's own direction), then the tip.
    const tooth: Vec2Mm[] =
      side === 'top'
        ? [
            [l, y],
            [r, y],
            [r - inset, y + depthMm],
            [l + inset, y + depthMm],
          ]
        : [
            [r, y],
            [l, y],
            [l + inset, y - depthMm],
            [r - inset, y - depthMm],
          ];
    teethMm.push(tooth);
    // The tooth lies right of its fold line's direction, as every tab does.
    const [fromMm, toMm]: [Vec2Mm, Vec2Mm] =
      side === 'top'
        ? [
            [r, y],
            [l, y],
          ]
        : [
            [l, y],
            [r, y],
          ];
    tabs.push({
      number: firstNumber + j,
      polygonMm: tooth,
      labelAtMm: [(l + r) / 2, y + (out * depthMm) / 2],
      depthMm,
      fold: { fromMm, toMm, angleRad: foldAnglesRad[j]! },
    });
  }
  return { tabs, teethMm };
}
