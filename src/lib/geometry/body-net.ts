/**
 * The one-piece net of a body: the side walls as a strip (wall i left to right, printed side out), the top
 * and bottom caps hinged to the wall nearest the strip's middle, a tab on one edge of every glued pair.
 * Flat mm, y up; model mm at kit scale.
 */
import type { Body } from './model-schema';
import { bodyFaces, type BodyFace } from './body-shape';
import { faceFrame, pieceFromNet, type NetFace, type NetTab } from './piece-builder';
import { netGluePair, type NetEdge } from './net-glue';
import { paperTabDepthMm } from './paper';
import type { EdgeLabel, Piece, PlaneFrame, Vec2Mm } from './types';
import { vec2Length, vec2Sub, vec3Dot, vec3Sub } from './vec';

export interface BodyNet {
  piece: Piece;
  /** Each body face's flat placement in the net (flat ↦ model), by face ref ("side:0", "top", …). */
  frames: Map<string, PlaneFrame>;
  faces: BodyFace[];
}

/** The body net at 1:scaleDenominator on paper of `gsm`; tab numbers come from `nextNumber`. */
export function bodyNet(body: Body, scaleDenominator: number, gsm: number, nextNumber: () => number, assemblyStep: number): BodyNet {
  const faces = bodyFaces(body, scaleDenominator);
  const n = faces.length - 2;
  const sides = faces.slice(0, n);
  const heightMm = sides[0]!.polygonMm[2]![2];
  const widths = sides.map((f) => vec2Length(vec2Sub(xy(f.polygonMm[1]!), xy(f.polygonMm[0]!))));
  const starts: number[] = [];
  widths.reduce((x, w) => (starts.push(x), x + w), 0);
  const total = widths.reduce((s, w) => s + w, 0);
  let c = 0;
  sides.forEach((_, i) => {
    if (Math.abs(starts[i]! + widths[i]! / 2 - total / 2) < Math.abs(starts[c]! + widths[c]! / 2 - total / 2)) c = i;
  });

  const net: NetFace[] = sides.map((f, i) => ({
    flatMm: [[starts[i]!, 0], [starts[i]! + widths[i]!, 0], [starts[i]! + widths[i]!, heightMm], [starts[i]!, heightMm]],
    modelMm: f.polygonMm,
  }));
  const hinge = sides[c]!;
  const cap = (face: BodyFace, top: boolean): NetFace => ({
    modelMm: face.polygonMm,
    flatMm: face.polygonMm.map((p) => {
      const d = vec3Sub(p, top ? hinge.polygonMm[3]! : hinge.polygonMm[0]!);
      const across = vec3Dot(d, hinge.normal);
      return [starts[c]! + vec3Dot(d, hinge.uAxis), top ? heightMm - across : across] as Vec2Mm;
    }),
  });
  net.push(cap(faces[n]!, true), cap(faces[n + 1]!, false));

  const joints = [
    ...sides.slice(1).map((_, i) => ({ parent: i, child: i + 1 })),
    { parent: c, child: n },
    { parent: c, child: n + 1 },
  ];
  // Glued pairs: the strip's closing edge, then every wall's top and bottom edge except the hinge wall's.
  const pairs: [NetEdge, NetEdge][] = [[{ face: n - 1, edge: 1 }, { face: 0, edge: 3 }]];
  for (let j = 0; j < n; j++) {
    if (j === c) continue;
    pairs.push([{ face: j, edge: 2 }, { face: n, edge: j }]);
    // The bottom cap lists the base vertices in reverse, so wall j's bottom edge is its edge n − 2 − j.
    pairs.push([{ face: j, edge: 0 }, { face: n + 1, edge: (2 * n - 2 - j) % n }]);
  }
  const obstacles: Vec2Mm[][] = net.map((f) => f.flatMm);
  const tabs: NetTab[] = [];
  const edgeLabels: EdgeLabel[] = [];
  for (const [first, second] of pairs) {
    const edgeMm = vec2Length(vec2Sub(net[first.face]!.flatMm[(first.edge + 1) % 4]!, net[first.face]!.flatMm[first.edge]!));
    const { tab, label } = netGluePair(net, first, second, nextNumber(), paperTabDepthMm(gsm, edgeMm), obstacles);
    tabs.push(tab);
    edgeLabels.push(label);
    obstacles.push(tab.polygonMm);
  }
  const piece = pieceFromNet({ id: 'body', partId: 'body', partKind: 'body', label: 'Body', assemblyStep, faces: net, joints, tabs, edgeLabels });
  const frames = new Map<string, PlaneFrame>(faces.map((f, i) => [f.ref, faceFrame(net[i]!)]));
  return { piece, frames, faces };
}

const xy = (p: readonly number[]): Vec2Mm => [p[0]!, p[1]!];
