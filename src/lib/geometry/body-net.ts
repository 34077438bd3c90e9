/**
 * The flat pattern of a body. Bodies of up to BODY_HINGED_CAP_SIDES_MAX sides are one piece: the side walls
 * as a strip (wall i left to right, printed side out), the top and bottom caps hinged to the wall nearest
 * the strip's middle, a tab on one edge of every glued pair. Many-sided bodies (and any body whose hinged
 * caps would crowd a tab under the buildability floor's tab, or whose one-piece net exceeds BODY_ONE_PIECE_MAX_MM) are
 * three pieces: the wall strip with a toothed glue ring
 * along its top and bottom edges, and two separate caps glued onto the rings. Flat mm, y up; model mm at
 * kit scale.
 */
import type { Body } from './model-schema';
import { bodyFaces, type BodyFace } from './body-shape';
import { faceFrame, pieceFromNet, type NetFace, type NetTab } from './piece-builder';
import { netEdgeLabel, netGluePair, tabFoldAngle, type NetEdge } from './net-glue';
import { paperTabDepthMm } from './paper';
import { BUILD_GRADE_BAND_FLOOR, BUILDABILITY_MINIMUMS, type BuildGradeBand } from './buildability';
import { bodyRingTeeth } from './body-ring';
import { bodyPatternShape } from './body-pattern-facets';
import type { EdgeLabel, Piece, PlaneFrame, Vec2Mm, Vec3Mm } from './types';
import { pointsBounds, vec2Length, vec2Sub, vec3Dot, vec3Sub } from './vec';

/** Most sides for which the caps hinge to the wall strip (one-piece net); above it caps are separate pieces. */
export const BODY_HINGED_CAP_SIDES_MAX = 8;
/**
 * Largest one-piece net, mm (either way round): the printable area A4 and US Letter share inside a 10 mm
 * margin (ISO 216 A4 210 × 297 mm, ASME Y14.1 Letter 215.9 × 279.4 mm). A larger net is tiled on office
 * paper, and caps hinged out of the strip's side make that a 2-D grid of tiles with corner overlaps; with
 * separate caps the strip tiles along its length and the caps go whole on other sheets.
 */
export const BODY_ONE_PIECE_MAX_MM = [190, 259.4] as const;

export interface BodySpot {
  piece: Piece;
  frame: PlaneFrame;
}

export interface BodyNet {
  /** The wall strip (the whole net when the caps hinge to it) first, then the separate caps if any. */
  pieces: Piece[];
  /** Where each face of the pattern lies ("side:0", "top", …): its piece and the flat ↦ model frame of it. */
  faceSpots: Map<string, BodySpot>;
  /** The model's own faces (full facet count), where appendages stand. */
  faces: BodyFace[];
  /** The pattern face holding `pointMm` (model mm) of the model's face `ref`, for marks glued there. */
  faceSpotAt(ref: string, pointMm: Vec3Mm): BodySpot;
}

/**
 * The body pattern at 1:scaleDenominator on paper of `gsm` for a class of `band`, with a cylinder's facets
 * capped by bodyPatternFacets; tab numbers come from `nextNumber`, in order.
 */
export function bodyNet(
  body: Body,
  scaleDenominator: number,
  gsm: number,
  band: BuildGradeBand,
  nextNumber: () => number,
  assemblyStep: number,
): BodyNet {
  const shape = bodyPatternShape(body, scaleDenominator, band);
  const faces = bodyFaces(shape, scaleDenominator);
  const modelFaces = shape === body ? faces : bodyFaces(body, scaleDenominator);
  const n = faces.length - 2;
  const hinged = n <= BODY_HINGED_CAP_SIDES_MAX ? bodyNetHinged(faces, gsm, assemblyStep) : null;
  const built =
    hinged && !hinged.crowded && bodyNetFitsOfficePaper(hinged.pieces[0]!)
      ? hinged
      : bodyNetRinged(faces, gsm, assemblyStep);
  // Tabs were numbered 1, 2, … locally; take kit-wide numbers in the same order.
  const global = new Map<number, number>();
  for (const p of built.pieces) for (const t of p.tabs) global.set(t.number, nextNumber());
  const renumber = (p: Piece): Piece => ({
    ...p,
    tabs: p.tabs.map((t) => ({ ...t, number: global.get(t.number)! })),
    folds: p.folds.map((f) => (f.tabNumber === undefined ? f : { ...f, tabNumber: global.get(f.tabNumber)! })),
    edgeLabels: p.edgeLabels.map((l) => ({ ...l, number: global.get(l.number)! })),
  });
  const pieces = built.pieces.map(renumber);
  const faceSpots = new Map<string, BodySpot>();
  built.spots.forEach((s, i) => faceSpots.set(faces[i]!.ref, { piece: pieces[s.piece]!, frame: s.frame }));
  const faceSpotAt = (ref: string, pointMm: Vec3Mm): BodySpot => {
    if (shape === body || !ref.startsWith('side:')) return faceSpots.get(ref)!;
    // Pattern wall j spans azimuths (2j ∓ 1)π/n about its centre 2jπ/n (bodyBaseM's corners).
    const j = Math.round((Math.atan2(pointMm[1], pointMm[0]) * n) / (2 * Math.PI));
    return faceSpots.get(`side:${((j % n) + n) % n}`)!;
  };
  return { pieces, faceSpots, faces: modelFaces, faceSpotAt };
}

interface BuiltNet {
  pieces: Piece[];
  /** Per body face (sides, top, bottom): index into pieces and the face's frame. */
  spots: { piece: number; frame: PlaneFrame }[];
  /** Whether a neighbour trimmed some tab below both the buildability floor's tab and the depth its edge allows. */
  crowded: boolean;
}

/** The wall strip's faces: wall i as a rectangle from x = starts[i], printed side out. */
function wallStrip(sides: BodyFace[]): { net: NetFace[]; starts: number[]; widths: number[]; heightMm: number } {
  const heightMm = sides[0]!.polygonMm[2]![2];
  const widths = sides.map((f) => vec2Length(vec2Sub(xy(f.polygonMm[1]!), xy(f.polygonMm[0]!))));
  const starts: number[] = [];
  widths.reduce((x, w) => (starts.push(x), x + w), 0);
  const net: NetFace[] = sides.map((f, i) => ({
    flatMm: [
      [starts[i]!, 0],
      [starts[i]! + widths[i]!, 0],
      [starts[i]! + widths[i]!, heightMm],
      [starts[i]!, heightMm],
    ],
    modelMm: f.polygonMm,
  }));
  return { net, starts, widths, heightMm };
}

function bodyNetHinged(faces: BodyFace[], gsm: number, assemblyStep: number): BuiltNet {
  const n = faces.length - 2;
  const sides = faces.slice(0, n);
  const { net, starts, widths, heightMm } = wallStrip(sides);
  const total = widths.reduce((s, w) => s + w, 0);
  let c = 0;
  sides.forEach((_, i) => {
    if (Math.abs(starts[i]! + widths[i]! / 2 - total / 2) < Math.abs(starts[c]! + widths[c]! / 2 - total / 2)) c = i;
  });
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
  const pairs: [NetEdge, NetEdge][] = [
    [
      { face: n - 1, edge: 1 },
      { face: 0, edge: 3 },
    ],
  ];
  for (let j = 0; j < n; j++) {
    if (j === c) continue;
    pairs.push([
      { face: j, edge: 2 },
      { face: n, edge: j },
    ]);
    // The bottom cap lists the base vertices in reverse, so wall j's bottom edge is its edge n − 2 − j.
    pairs.push([
      { face: j, edge: 0 },
      { face: n + 1, edge: (2 * n - 2 - j) % n },
    ]);
  }
  const obstacles: Vec2Mm[][] = net.map((f) => f.flatMm);
  const tabs: NetTab[] = [];
  const edgeLabels: EdgeLabel[] = [];
  let crowded = false;
  pairs.forEach(([first, second], k) => {
    const edgeMm = vec2Length(
      vec2Sub(net[first.face]!.flatMm[(first.edge + 1) % 4]!, net[first.face]!.flatMm[first.edge]!),
    );
    const want = paperTabDepthMm(gsm, edgeMm);
    const { tab, label } = netGluePair(net, first, second, k + 1, want, obstacles);
    if ((tab.depthMm ?? 0) < 0.999 * Math.min(want, BUILDABILITY_MINIMUMS[BUILD_GRADE_BAND_FLOOR].tabMm))
      crowded = true;
    tabs.push(tab);
    edgeLabels.push(label);
    obstacles.push(tab.polygonMm);
  });
  const piece = pieceFromNet({
    id: 'body',
    partId: 'body',
    partKind: 'body',
    label: 'Body',
    assemblyStep,
    faces: net,
    joints,
    tabs,
    edgeLabels,
  });
  return { pieces: [piece], spots: net.map((f) => ({ piece: 0, frame: faceFrame(f) })), crowded };
}

/** Wall strip with a toothed glue ring on its top and bottom edges, and the two caps as their own pieces. */
function bodyNetRinged(faces: BodyFace[], gsm: number, assemblyStep: number): BuiltNet {
  const n = faces.length - 2;
  const sides = faces.slice(0, n);
  const { net, heightMm } = wallStrip(sides);
  const capNets = [faces[n]!, faces[n + 1]!].map((f): NetFace => ({
    modelMm: f.polygonMm,
    flatMm: f.polygonMm.map((p) => {
      const d = vec3Sub(p, f.centreMm);
      return [vec3Dot(d, f.uAxis), vec3Dot(d, f.vAxis)] as Vec2Mm;
    }),
  }));
  const all = [...net, ...capNets];
  const apothemMm = Math.min(
    ...capNets[0]!.flatMm.map((p, i, poly) => lineDistance([0, 0], p, poly[(i + 1) % poly.length]!)),
  );
  // Local numbers: the seam 1, then wall j's top tooth 2 + j and its bottom tooth 2 + n + j. Wall j's top
  // edge meets the top cap's edge j; the bottom cap lists the base vertices in reverse (edge n − 2 − j).
  const capEdge = (k: number, j: number): NetEdge => ({ face: n + k, edge: k === 0 ? j : (2 * n - 2 - j) % n });
  const rings = (['top', 'bottom'] as const).map((side, k) =>
    bodyRingTeeth(
      net,
      side,
      paperTabDepthMm(gsm),
      apothemMm,
      2 + k * n,
      sides.map((_, j) => tabFoldAngle(all, { face: j, edge: side === 'top' ? 2 : 0 }, capEdge(k, j))),
    ),
  );
  const obstacles: Vec2Mm[][] = [...net.map((f) => f.flatMm), ...rings.flatMap((r) => r.teethMm)];
  const seamWant = paperTabDepthMm(gsm, heightMm);
  const seam = netGluePair(net, { face: n - 1, edge: 1 }, { face: 0, edge: 3 }, 1, seamWant, obstacles);
  const wall = pieceFromNet({
    id: 'body',
    partId: 'body',
    partKind: 'body',
    label: 'Body wall',
    assemblyStep,
    faces: net,
    joints: sides.slice(1).map((_, i) => ({ parent: i, child: i + 1 })),
    tabs: [seam.tab, ...rings.flatMap((r) => r.tabs)],
    edgeLabels: [seam.label],
  });
  const caps = capNets.map((cap, k) =>
    pieceFromNet({
      id: k === 0 ? 'body-top' : 'body-bottom',
      partId: 'body',
      partKind: 'body',
      label: k === 0 ? 'Top cap' : 'Bottom cap',
      assemblyStep,
      faces: [cap],
      joints: [],
      tabs: [],
      // The cap's flat coordinates are the same in `all` and in its own piece.
      edgeLabels: sides.map((_, j) => netEdgeLabel(all, capEdge(k, j), 2 + k * n + j)),
    }),
  );
  const spots = [
    ...net.map((f) => ({ piece: 0, frame: faceFrame(f) })),
    ...capNets.map((f, k) => ({ piece: 1 + k, frame: faceFrame(f) })),
  ];
  return { pieces: [wall, ...caps], spots, crowded: false };
}

function bodyNetFitsOfficePaper(piece: Piece): boolean {
  const b = pointsBounds(piece.outlineMm);
  const [w, h] = [b.maxX - b.minX, b.maxY - b.minY];
  const [a, c] = BODY_ONE_PIECE_MAX_MM;
  return (w <= a && h <= c) || (h <= a && w <= c);
}

function lineDistance(p: Vec2Mm, a: Vec2Mm, b: Vec2Mm): number {
  const d = vec2Sub(b, a);
  return Math.abs(d[0] * (p[1] - a[1]) - d[1] * (p[0] - a[0])) / (vec2Length(d) || 1);
}

const xy = (p: readonly number[]): Vec2Mm => [p[0]!, p[1]!];
