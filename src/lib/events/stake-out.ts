/**
 * The stake-out of a big build: a model laid flat on a venue at 1:N, with the centre stake, every boom's line
 * and tip and every body corner given as a distance and bearing from the centre stake and as x/y offsets from
 * a baseline. Venue frame, metres: the baseline runs along the venue's near long edge from its left corner
 * (x along it, y straight across the venue); "plan north" is +y, so a bearing is the azimuth clockwise from +y.
 */
import type { Model } from '../geometry/model-schema';
import type { Vec2Mm, Vec3Mm } from '../geometry/types';
import { bodyFaces } from '../geometry/body-shape';
import { appendageDirection, appendageFootMm } from '../geometry/appendage-frame';
import { modelMesh } from '../geometry/model-mesh';
import { vec3Combine, vec3Cross } from '../geometry/vec';
import { pieceOrientationHull } from '../layout/piece-orientation';
import { MM_PER_FOOT } from '../layout/units';
import { solveVenueScale, type Venue, type VenueScale } from '../layout/venues';
import { THREAD_TIE_OFF_ALLOWANCE_MM } from '../geometry/wire-boom';

/** Laid-out boom length from which a boom is staked with rope, not thread, mm (common practice, no source). */
export const ROPE_FROM_MM = 2000;
/** Rope added to each boom for its two knots (body and tip stake), mm: 0.5 m a knot (common practice, no source). */
export const ROPE_KNOT_ALLOWANCE_MM = 1000;
/** A boom whose line on the ground is shorter than this share of its length stands up: it is not staked. */
const UPRIGHT_SHARE = 0.02;

export interface StakeOutPoint {
  label: string;
  kind: 'boom-tip' | 'body-corner';
  /** Offsets from the baseline's start corner, m. */
  xM: number;
  yM: number;
  /** From the centre stake, m, and azimuth clockwise from plan north, degrees in [0, 360). */
  distanceM: number;
  bearingDeg: number;
}

export interface StakeOutBoom {
  label: string;
  kind: 'wire-boom' | 'rigid-boom';
  /** Foot on the body and tip, venue m. */
  footM: Vec2Mm;
  tipM: Vec2Mm;
  /** Laid-out length at the scale, m. */
  lengthM: number;
  /** Rope or thread to cut for a wire boom (length plus the knot allowance), m; null for a rigid boom. */
  cutLengthM: number | null;
  /** The allowance included in cutLengthM, m, and whether it is rope or thread. */
  allowanceM: number;
  material: 'rope' | 'thread' | 'pole';
}

export interface StakeOut {
  scaleDenominator: number;
  /** Venue length (along the baseline) and width, m. */
  venueM: [number, number];
  centreM: Vec2Mm;
  bodyOutlineM: Vec2Mm[];
  /** Convex outline of every solid part (body, panels, dishes, rigid booms) on the ground, m. */
  footprintOutlineM: Vec2Mm[];
  booms: StakeOutBoom[];
  points: StakeOutPoint[];
  /** Booms that stand up from the ground plane (not staked), by label. */
  upright: string[];
  /** Laid-out extents of everything, m (along the baseline, across). */
  extentM: [number, number];
  /** True when everything lies inside the venue with its border (VENUE_MARGIN_FRACTION). */
  fits: boolean;
  /** The scale solver's answer for this venue: the largest scale that fits and its words. */
  venueScale: VenueScale;
}

/** Metres to international feet (1 ft = 0.3048 m exactly; NIST SP 811 (2008), Appendix B). */
export function stakeOutFeet(lengthM: number): number {
  return (lengthM * 1000) / MM_PER_FOOT;
}

/** Distance (m) and azimuth (degrees clockwise from +y, [0, 360)) from `from` to `to`; 0 and 0 when they coincide. */
export function stakeOutInverse(from: Vec2Mm, to: Vec2Mm): { distanceM: number; bearingDeg: number } {
  const dx = to[0] - from[0];
  const dy = to[1] - from[1];
  const distanceM = Math.hypot(dx, dy);
  if (distanceM === 0) return { distanceM: 0, bearingDeg: 0 };
  const deg = (Math.atan2(dx, dy) * 180) / Math.PI;
  return { distanceM, bearingDeg: deg < 0 ? deg + 360 : deg };
}

/** An azimuth as a quadrant bearing, "N 30°00′ E", rounded to the minute; due directions read "N", "E", "S", "W". */
export function stakeOutQuadrant(bearingDeg: number): string {
  const az = ((bearingDeg % 360) + 360) % 360;
  const minutes = Math.round(az * 60) % (360 * 60);
  const [ns, ew, angle] =
    minutes <= 90 * 60
      ? ['N', 'E', minutes]
      : minutes <= 180 * 60
        ? ['S', 'E', 180 * 60 - minutes]
        : minutes <= 270 * 60
          ? ['S', 'W', minutes - 180 * 60]
          : ['N', 'W', 360 * 60 - minutes];
  if (angle === 0) return ns;
  if (angle === 90 * 60) return ew;
  return `${ns} ${Math.floor(angle / 60)}°${String(angle % 60).padStart(2, '0')}′ ${ew}`;
}

/**
 * The stake-out of a parsed model at 1:scaleDenominator on a venue: the model's two longest extents lie on the
 * ground (the longer along the baseline), seen from the third axis's + side, the whole layout centred on the venue.
 */
export function stakeOutPlan(model: Model, venue: Venue, scaleDenominator: number): StakeOut {
  const venueScale = solveVenueScale(model, venue);
  const n = scaleDenominator;
  const faces = bodyFaces(model.body, 1);
  const mesh = modelMesh(model, 1);
  const meshPoints: Vec3Mm[] = [];
  for (let i = 0; i < mesh.positions.length; i += 3)
    meshPoints.push([mesh.positions[i]!, mesh.positions[i + 1]!, mesh.positions[i + 2]!]);
  const bodyPoints = faces.flatMap((f) => f.polygonMm);
  const booms = model.appendages.flatMap((a) => {
    if (a.kind !== 'wire-boom' && a.kind !== 'rigid-boom') return [];
    const face = faces.find((f) => f.ref === a.face)!;
    const foot = appendageFootMm(a, face, 1);
    const tip = vec3Combine([1, foot], [a.lengthM * 1000, appendageDirection(a.orientation, face)]);
    return [{ a, foot, tip }];
  });
  // Ground axes: the two longest extents of everything (a longer, b shorter), seen from c = a × b's + side.
  const all = [...meshPoints, ...booms.map((b) => b.tip)];
  const extent = [0, 1, 2].map((i) => Math.max(...all.map((p) => p[i]!)) - Math.min(...all.map((p) => p[i]!)));
  const [ia, ib] = [0, 1, 2].sort((p, q) => extent[q]! - extent[p]! || p - q);
  const axis = (i: number): Vec3Mm => [i === 0 ? 1 : 0, i === 1 ? 1 : 0, i === 2 ? 1 : 0];
  const ea = axis(ia!);
  const ec = axis(3 - ia! - ib!);
  const eb = vec3Cross(ec, ea);
  const ground = (p: Vec3Mm): Vec2Mm => [
    (p[0] * ea[0] + p[1] * ea[1] + p[2] * ea[2]) / n / 1000,
    (p[0] * eb[0] + p[1] * eb[1] + p[2] * eb[2]) / n / 1000,
  ];
  const bodyOutline = pieceOrientationHull(bodyPoints.map(ground));
  const footprint = pieceOrientationHull(meshPoints.map(ground));
  const tips = booms.map((b) => ground(b.tip));
  const spread = [...footprint, ...tips];
  const [minX, maxX] = [Math.min(...spread.map((p) => p[0])), Math.max(...spread.map((p) => p[0]))];
  const [minY, maxY] = [Math.min(...spread.map((p) => p[1])), Math.max(...spread.map((p) => p[1]))];
  const lengthM = Math.max(venue.lengthMm, venue.widthMm) / 1000;
  const widthM = Math.min(venue.lengthMm, venue.widthMm) / 1000;
  const shift: Vec2Mm = [lengthM / 2 - (minX + maxX) / 2, widthM / 2 - (minY + maxY) / 2];
  const place = (p: Vec2Mm): Vec2Mm => [p[0] + shift[0], p[1] + shift[1]];
  const bodyCentre = ground(vec3Combine(...bodyPoints.map((p) => [1 / bodyPoints.length, p] as [number, Vec3Mm])));
  const centreM = place(bodyCentre);
  const point = (label: string, kind: StakeOutPoint['kind'], at: Vec2Mm): StakeOutPoint => ({
    label,
    kind,
    xM: at[0],
    yM: at[1],
    ...stakeOutInverse(centreM, at),
  });
  const upright: string[] = [];
  const staked: StakeOutBoom[] = [];
  booms.forEach(({ a, foot }, i) => {
    const footM = place(ground(foot));
    const tipM = place(tips[i]!);
    const lineM = Math.hypot(tipM[0] - footM[0], tipM[1] - footM[1]);
    const laidOutM = a.lengthM / n;
    if (lineM < UPRIGHT_SHARE * laidOutM) {
      upright.push(a.label);
      return;
    }
    const rope = laidOutM * 1000 >= ROPE_FROM_MM;
    const allowanceM =
      a.kind === 'wire-boom' ? (rope ? ROPE_KNOT_ALLOWANCE_MM : THREAD_TIE_OFF_ALLOWANCE_MM) / 1000 : 0;
    staked.push({
      label: a.label,
      kind: a.kind as StakeOutBoom['kind'],
      footM,
      tipM,
      lengthM: laidOutM,
      cutLengthM: a.kind === 'wire-boom' ? laidOutM + allowanceM : null,
      allowanceM,
      material: a.kind === 'rigid-boom' ? 'pole' : rope ? 'rope' : 'thread',
    });
  });
  const bodyOutlineM = bodyOutline.map(place);
  const points = [
    ...staked.map((b) => point(b.label, 'boom-tip', b.tipM)),
    ...bodyOutlineM.map((p, i) => point(`Body corner ${i + 1}`, 'body-corner', p)),
  ];
  return {
    scaleDenominator: n,
    venueM: [lengthM, widthM],
    centreM,
    bodyOutlineM,
    footprintOutlineM: footprint.map(place),
    booms: staked,
    points,
    upright,
    extentM: [maxX - minX, maxY - minY],
    fits: n >= venueScale.scaleDenominator,
    venueScale,
  };
}
