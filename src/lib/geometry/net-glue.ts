/**
 * Glue for a flat net: for a pair of cut edges that meet in the assembled part, one tab on one of them and
 * the matching number just inside the other. Flat mm, y up; model mm at kit scale.
 */
import type { EdgeLabel, Vec2Mm } from './types';
import type { NetFace, NetTab } from './piece-builder';
import { tabFit } from './tab-fit';
import {
  polygonNormal3,
  vec2Add,
  vec2Length,
  vec2Scale,
  vec2Sub,
  vec2Unit,
  vec3Cross,
  vec3Dot,
  vec3Sub,
  vec3Unit,
} from './vec';

export interface NetEdge {
  face: number;
  /** Edge from vertex `edge` to `edge + 1` of the face's polygon. */
  edge: number;
}

/** How far inside its edge a partner number is printed, mm (common practice, no source). */
export const EDGE_LABEL_INSET_MM = 2.5;

/**
 * A tab on whichever of the two edges leaves room for the deeper one (first edge on a tie), fitted clear of
 * `obstacles` (or of the obstacles given for the edge it goes on, when the two edges end up on different
 * pieces), and the partner edge's label; the tab's fold angle lays it against the partner face.
 */
export function netGluePair(
  faces: NetFace[],
  first: NetEdge,
  second: NetEdge,
  number: number,
  depthWantedMm: number,
  obstacles: Vec2Mm[][] | ((on: NetEdge) => Vec2Mm[][]),
): { tab: NetTab; label: EdgeLabel } {
  const options = [
    [first, second],
    [second, first],
  ] as const;
  let best: { tab: NetTab; label: EdgeLabel; depth: number } | null = null;
  for (const [on, partner] of options) {
    const [a, b] = edgeFlat(faces, on);
    const fit = tabFit(a, b, depthWantedMm, typeof obstacles === 'function' ? obstacles(on) : obstacles);
    if (best && fit.depthMm <= best.depth * 1.01) continue;
    const tab: NetTab = {
      number,
      polygonMm: fit.polygonMm,
      depthMm: fit.depthMm,
      labelAtMm: vec2Add(midpoint(a, b), vec2Scale(outward(a, b), fit.depthMm / 2)),
      fold: { fromMm: a, toMm: b, angleRad: tabFoldAngle(faces, on, partner) },
    };
    best = { tab, label: netEdgeLabel(faces, partner, number), depth: fit.depthMm };
    if (fit.depthMm >= depthWantedMm * 0.999) break;
  }
  return { tab: best!.tab, label: best!.label };
}

function edgeFlat(faces: NetFace[], e: NetEdge): [Vec2Mm, Vec2Mm] {
  const p = faces[e.face]!.flatMm;
  return [p[e.edge]!, p[(e.edge + 1) % p.length]!];
}

const midpoint = (a: Vec2Mm, b: Vec2Mm): Vec2Mm => [(a[0] + b[0]) / 2, (a[1] + b[1]) / 2];
const outward = (a: Vec2Mm, b: Vec2Mm): Vec2Mm => {
  const d = vec2Unit(vec2Sub(b, a));
  return [d[1], -d[0]];
};

/** The number printed just inside edge `e` (the partner of a tab), reading along it. */
export function netEdgeLabel(faces: NetFace[], e: NetEdge, number: number): EdgeLabel {
  const [a, b] = edgeFlat(faces, e);
  const inset = Math.min(EDGE_LABEL_INSET_MM, vec2Length(vec2Sub(b, a)) / 4);
  const atMm = vec2Sub(midpoint(a, b), vec2Scale(outward(a, b), inset));
  return { number, atMm, angleRad: Math.atan2(b[1] - a[1], b[0] - a[0]) };
}

/** The tab (right of a→b) folds about a→b by the dihedral that brings it onto the partner face, radians. */
export function tabFoldAngle(faces: NetFace[], on: NetEdge, partner: NetEdge): number {
  const f = faces[on.face]!,
    g = faces[partner.face]!;
  const axis = vec3Unit(vec3Sub(f.modelMm[(on.edge + 1) % f.modelMm.length]!, f.modelMm[on.edge]!));
  const nf = polygonNormal3(f.modelMm),
    ng = polygonNormal3(g.modelMm);
  return Math.atan2(vec3Dot(vec3Cross(nf, ng), axis), vec3Dot(nf, ng));
}
