/**
 * Unfolding prepared mesh faces into flat pieces.
 *
 * 1. Fold tree: a maximum spanning forest of the face graph (Kruskal) whose edge weight is the edge's length
 *    times (1 + cos θ)/2, θ the dihedral turn between the two faces: long, nearly flat edges become folds and
 *    the cuts are short, as in the minimum-perimeter cut-tree heuristic for polyhedron nets (W. Schlickenrieder,
 *    "Nets of Polyhedra", diploma thesis, TU Berlin, 1997; from memory), with the dihedral term added so sharp
 *    edges are cut first (common practice, no source). Edges between two parts (OBJ groups) are never folds
 *    (mesh-fold-forest.ts).
 * 2. Pieces: the tree is laid flat breadth-first from a root; each face is turned about its fold onto its
 *    parent's edge. A face that would overlap a face already in its piece, or make the piece larger than the
 *    sheet, is cut off there and starts a new piece with its subtree (greedy growth, as in the cut-and-grow
 *    unfolders of the paper-model literature; from memory). Overlap: candidates from an R-tree (rbush), then
 *    an exact separating-axis test on the faces' triangles with Shewchuk's robust orientation predicate
 *    (robust-predicates), faces touching along an edge or at a corner within `OVERLAP_TOLERANCE_RELATIVE`.
 * 3. Glue: every cut edge gets one tab, on whichever side fits the deeper tab clear of its piece's faces and
 *    earlier tabs (tab-fit shrinks and slants it); when neither side fits half the depth the paper wants, the
 *    edge is left plain to be taped, numbered on both sides, and counted.
 * Flat mm on the sheet, y up, outlines counter-clockwise; model mm at kit scale.
 */
import RBush from 'rbush';
import { orient2d } from 'robust-predicates';
import type { EdgeLabel, Piece, Vec2Mm, Vec3Mm } from '../geometry/types';
import { pieceFromNet, type NetFace, type NetTab } from '../geometry/piece-builder';
import { netEdgeLabel, tabFoldAngle, type NetEdge } from '../geometry/net-glue';
import { convexOverlap, tabFit } from '../geometry/tab-fit';
import { paperTabDepthMm } from '../geometry/paper';
import { hingeTreeFold } from '../geometry/hinge-tree';
import { pointsBounds, vec2Add, vec2Length, vec2Scale, vec2Sub, vec2Unit } from '../geometry/vec';
import type { MeshFace } from './mesh-faces';
import { meshExtents } from './mesh-units';
import { faceEdges, foldForest, type FaceEdges } from './mesh-fold-forest';

/**
 * Faces closer than this fraction of the mesh's size count as touching, not overlapping: the rounding of
 * hundreds of chained placements stays far below it (common practice, no source).
 */
export const OVERLAP_TOLERANCE_RELATIVE = 1e-7;
/** A tab cut to less than this share of the depth the paper wants is dropped and the edge taped. */
export const TAB_KEPT_SHARE_MIN = 0.5;

export interface MeshUnfoldOptions {
  /** Millimetres at kit scale per file unit (unit length × 1000 / scale denominator). */
  mmPerUnit: number;
  paperGsm: number;
  /** The largest piece a sheet takes inside its margins, mm (turned either way); tabs included. */
  pieceMaxMm: { widthMm: number; heightMm: number };
  /** Part names by group index (OBJ groups), printed on the pieces. */
  groups: string[];
}

export interface MeshUnfoldSummary {
  faceCount: number;
  pieceCount: number;
  /** Outline length of every piece, tabs included: what the scissors cut, mm. */
  cutLengthMm: number;
  tabCount: number;
  /** Cut edges left plain (no room for a tab): tape them. */
  tapedEdgeCount: number;
  /** Faces larger than the sheet on their own (the scale is too large for this sheet). */
  oversizeFaceCount: number;
  /** Largest distance between a folded-back piece vertex and the mesh, mm. */
  foldBackDeviationMm: number;
}

export interface MeshUnfold {
  pieces: Piece[];
  summary: MeshUnfoldSummary;
}

interface TriItem {
  minX: number;
  minY: number;
  maxX: number;
  maxY: number;
  tri: Vec2Mm[];
}

export function meshUnfold(positions: Float64Array, faces: MeshFace[], options: MeshUnfoldOptions): MeshUnfold {
  const k = options.mmPerUnit;
  const P = (v: number): Vec3Mm => [positions[v * 3]! * k, positions[v * 3 + 1]! * k, positions[v * 3 + 2]! * k];
  const sizeMm = Math.max(...meshExtents(positions)) * k || 1;
  const tol = OVERLAP_TOLERANCE_RELATIVE * sizeMm;
  const edges = faceEdges(faces, positions.length / 3, P);
  // Faces must leave room for a full tab on every side within the sheet.
  const margin = 2 * paperTabDepthMm(options.paperGsm);
  const sheet = {
    widthMm: Math.max(0, options.pieceMaxMm.widthMm - margin),
    heightMm: Math.max(0, options.pieceMaxMm.heightMm - margin),
  };
  const grown = growPieces(faces, P, edges, sheet, tol);
  const { tabsOf, labelsOf, taped } = glueCuts(grown, faces, P, edges, options.paperGsm, tol);
  // The overlap indexes are done with: let them go before the pieces are built, when the most is live.
  grown.indexes.length = 0;

  // 4. Pieces in the engine's shape, and the fold-back check; model coordinates are made one piece at a time.
  let deviation = 0;
  const out: Piece[] = grown.pieces.map((piece, n) => {
    const localId = new Map(piece.faces.map((f, i) => [f, i]));
    const group = faces[piece.faces[0]!]!.group;
    const name = options.groups[group] ?? 'Mesh';
    const net = piece.faces.map((f): NetFace => ({ flatMm: grown.placed[f]!, modelMm: faces[f]!.loop.map(P) }));
    const built = pieceFromNet({
      id: `mesh-${n + 1}`,
      partId: `mesh-part-${group + 1}`,
      partKind: 'body',
      label: `${name} ${n + 1}`,
      assemblyStep: group + 1,
      faces: net,
      joints: piece.joints.map((j) => ({ parent: localId.get(j.parent)!, child: localId.get(j.child)! })),
      tabs: tabsOf[n]!,
      edgeLabels: labelsOf[n]!,
    });
    for (const folded of hingeTreeFold(built.hinge, 1)) {
      const want = net[folded.id]!.modelMm;
      folded.polygonMm.forEach((p, i) => {
        const w = want[i]!;
        deviation = Math.max(deviation, Math.hypot(p[0] - w[0], p[1] - w[1], p[2] - w[2]));
      });
    }
    return built;
  });
  return {
    pieces: out,
    summary: {
      faceCount: faces.length,
      pieceCount: out.length,
      cutLengthMm: out.reduce((s, p) => s + perimeter(p.outlineMm), 0),
      tabCount: out.reduce((s, p) => s + p.tabs.length, 0),
      tapedEdgeCount: taped,
      oversizeFaceCount: grown.oversize,
      foldBackDeviationMm: deviation,
    },
  };
}

interface Grown {
  /** Each face's outline where it lies on the sheet. */
  placed: Vec2Mm[][];
  pieceOf: Int32Array;
  pieces: { faces: number[]; joints: { parent: number; child: number }[] }[];
  /** Each piece's triangles (and, once glued, tabs) for overlap searches. */
  indexes: RBush<TriItem>[];
  /** 1 for an edge that became a fold inside a piece. */
  folded: Uint8Array;
  oversize: number;
}

/** 2. Grow pieces along the fold forest. */
function growPieces(
  faces: MeshFace[],
  P: (v: number) => Vec3Mm,
  edges: FaceEdges,
  sheet: MeshUnfoldOptions['pieceMaxMm'],
  tol: number,
): Grown {
  const F = faces.length;
  const tree = foldForest(faces, edges);
  const grown: Grown = {
    placed: new Array<Vec2Mm[]>(F),
    pieceOf: new Int32Array(F).fill(-1),
    pieces: [],
    indexes: [],
    folded: new Uint8Array(edges.count),
    oversize: 0,
  };
  const { placed, pieceOf, pieces } = grown;
  const waiting = new Uint8Array(F);
  for (let seed = 0; seed < F; seed++) {
    if (pieceOf[seed] !== -1) continue;
    const roots = [seed];
    while (roots.length > 0) {
      const root = roots.pop()!;
      const id = pieces.length;
      const index = new RBush<TriItem>();
      const piece = { faces: [root], joints: [] as { parent: number; child: number }[] };
      pieces.push(piece);
      grown.indexes.push(index);
      const rootFlat = layFlat(faces[root]!, P);
      placed[root] = rootFlat.outline;
      pieceOf[root] = id;
      const box = pointsBounds(rootFlat.outline);
      if (!fitsSheet(box, sheet)) grown.oversize++;
      index.load(rootFlat.tris.map(triItem));
      for (let q = 0; q < piece.faces.length; q++) {
        const f = piece.faces[q]!;
        for (let s = tree.start[f]!; s < tree.start[f + 1]!; s++) {
          const e = tree.edge[s]!;
          const [g, i, j] =
            edges.f[e] === f ? [edges.g[e]!, edges.i[e]!, edges.j[e]!] : [edges.f[e]!, edges.j[e]!, edges.i[e]!];
          if (pieceOf[g] !== -1 || waiting[g]) continue;
          const [a, b] = edgeEnds(placed[f]!, i);
          // Child edge j runs b → a.
          const flat = layFlat(faces[g]!, P, { edge: j, from: b, to: a });
          const items = flat.tris.map(triItem);
          const bigger = boundsUnion(box, pointsBounds(flat.outline));
          if (!fitsSheet(bigger, sheet) || overlapsPiece(items, index, tol)) {
            roots.push(g);
            waiting[g] = 1;
            continue;
          }
          Object.assign(box, bigger);
          placed[g] = flat.outline;
          pieceOf[g] = id;
          piece.faces.push(g);
          piece.joints.push({ parent: f, child: g });
          grown.folded[e] = 1;
          index.load(items);
        }
      }
    }
  }
  return grown;
}

/**
 * 3. Glue on every cut edge: a tab on one side, or both sides numbered for tape. Model coordinates are made
 * for the edge's two faces only (the tab's fold angle needs them).
 */
function glueCuts(
  grown: Grown,
  faces: MeshFace[],
  P: (v: number) => Vec3Mm,
  edges: FaceEdges,
  paperGsm: number,
  tol: number,
): { tabsOf: NetTab[][]; labelsOf: EdgeLabel[][]; taped: number } {
  const { placed, pieceOf, indexes } = grown;
  const tabsOf: NetTab[][] = grown.pieces.map(() => []);
  const labelsOf: EdgeLabel[][] = grown.pieces.map(() => []);
  let number = 0;
  let taped = 0;
  for (let e = 0; e < edges.count; e++) {
    if (grown.folded[e]) continue;
    number++;
    // The edge's two sides, as faces 0 and 1 of a two-face net.
    const faceIds = [edges.f[e]!, edges.g[e]!];
    const net = faceIds.map((f): NetFace => ({ flatMm: placed[f]!, modelMm: faces[f]!.loop.map(P) }));
    const sides: NetEdge[] = [
      { face: 0, edge: edges.i[e]! },
      { face: 1, edge: edges.j[e]! },
    ];
    const pieceAt = (side: number) => pieceOf[faceIds[side]!]!;
    const want = paperTabDepthMm(paperGsm, edges.lengthMm[e]);
    let best: { side: number; polygonMm: Vec2Mm[]; depthMm: number } | null = null;
    for (const side of [0, 1]) {
      const [a, b] = edgeEnds(net[side]!.flatMm, sides[side]!.edge);
      const index = indexes[pieceAt(side)]!;
      if (!tabCanReach(index, a, b, want * TAB_KEPT_SHARE_MIN, tol)) continue;
      const reach = tabReach(a, b, want);
      const near = index
        .search(pointsBounds(reach))
        .map((n) => n.tri)
        .filter((o) => convexOverlap(reach, o));
      const fit = tabFit(a, b, want, near, want * TAB_KEPT_SHARE_MIN);
      if (!best || fit.depthMm > best.depthMm * 1.01) best = { side, ...fit };
      if (fit.depthMm >= want * 0.999) break;
    }
    if (!best || best.depthMm < want * TAB_KEPT_SHARE_MIN) {
      taped++;
      for (const side of [0, 1]) labelsOf[pieceAt(side)]!.push(netEdgeLabel(net, sides[side]!, number));
      continue;
    }
    const on = best.side,
      partner = 1 - on;
    const [a, b] = edgeEnds(net[on]!.flatMm, sides[on]!.edge);
    const out = vec2Unit(vec2Sub(b, a));
    const labelAtMm = vec2Add(vec2Scale(vec2Add(a, b), 0.5), vec2Scale([out[1], -out[0]], best.depthMm / 2));
    tabsOf[pieceAt(on)]!.push({
      number,
      polygonMm: best.polygonMm,
      depthMm: best.depthMm,
      labelAtMm,
      fold: { fromMm: a, toMm: b, angleRad: tabFoldAngle(net, sides[on]!, sides[partner]!) },
    });
    labelsOf[pieceAt(partner)]!.push(netEdgeLabel(net, sides[partner]!, number));
    indexes[pieceAt(on)]!.insert(triItem(best.polygonMm));
  }
  return { tabsOf, labelsOf, taped };
}

const edgeEnds = (loop: Vec2Mm[], edge: number): [Vec2Mm, Vec2Mm] => [loop[edge]!, loop[(edge + 1) % loop.length]!];

interface FlatFace {
  /** The outline, counter-clockwise. */
  outline: Vec2Mm[];
  /** The triangles, three corners each, sharing the outline's points; a one-triangle face's is its outline. */
  tris: Vec2Mm[][];
}

/**
 * The face laid flat, one point per vertex: in its own plane (origin at its first outline vertex, x along
 * xAxis, y = normal × x), or, given `onto`, turned and moved so that outline edge `onto.edge` runs from
 * `onto.from` to `onto.to`, those two corners being the very points given. Triangle vertices off the outline
 * (inside a merged face, or dropped from a straight edge) get points of their own after the outline's.
 */
function layFlat(
  face: MeshFace,
  P: (v: number) => Vec3Mm,
  onto?: { edge: number; from: Vec2Mm; to: Vec2Mm },
): FlatFace {
  const { loop, triangles } = face;
  const o = P(loop[0]!);
  const n = face.normal,
    x = face.xAxis;
  const y: Vec3Mm = [n[1] * x[2] - n[2] * x[1], n[2] * x[0] - n[0] * x[2], n[0] * x[1] - n[1] * x[0]];
  const flat = (v: number): Vec2Mm => {
    const p = P(v);
    const d = [p[0] - o[0], p[1] - o[1], p[2] - o[2]] as const;
    return [d[0] * x[0] + d[1] * x[1] + d[2] * x[2], d[0] * y[0] + d[1] * y[1] + d[2] * y[2]];
  };
  const single = triangles.length === 3 && loop.length === 3 && triangles.every((v, i) => v === loop[i]);
  const vertices = [...loop];
  const corner = new Map<number, number>();
  if (!single) {
    loop.forEach((v, i) => corner.set(v, i));
    for (const v of triangles) if (!corner.has(v)) corner.set(v, vertices.push(v) - 1);
  }
  const points = vertices.map(flat);
  if (onto) {
    const j = onto.edge,
      j1 = (j + 1) % loop.length;
    const motion = rigidOnto(points[j]!, points[j1]!, onto.from, onto.to);
    points.forEach((p, c) => (points[c] = c === j ? onto.from : c === j1 ? onto.to : rigidApply(motion, p)));
  }
  const outline = points.length === loop.length ? points : points.slice(0, loop.length);
  if (single) return { outline, tris: [outline] };
  const tris: Vec2Mm[][] = [];
  for (let t = 0; t < triangles.length; t += 3)
    tris.push([0, 1, 2].map((c) => points[corner.get(triangles[t + c]!)!]!));
  return { outline, tris };
}

type Rigid = { c: number; s: number; tx: number; ty: number };

/** The rotation + translation taking p0 → q0 and the direction p0→p1 onto q0→q1. */
function rigidOnto(p0: Vec2Mm, p1: Vec2Mm, q0: Vec2Mm, q1: Vec2Mm): Rigid {
  const angle = Math.atan2(q1[1] - q0[1], q1[0] - q0[0]) - Math.atan2(p1[1] - p0[1], p1[0] - p0[0]);
  const c = Math.cos(angle),
    s = Math.sin(angle);
  return { c, s, tx: q0[0] - (c * p0[0] - s * p0[1]), ty: q0[1] - (s * p0[0] + c * p0[1]) };
}

const rigidApply = (m: Rigid, p: Vec2Mm): Vec2Mm => [m.c * p[0] - m.s * p[1] + m.tx, m.s * p[0] + m.c * p[1] + m.ty];

/**
 * The index entry of a triangle or tab. Its fields are written out, not spread from pointsBounds: V8 gave
 * every spread copy a hidden class of its own, some 200 bytes more per triangle.
 */
function triItem(tri: Vec2Mm[]): TriItem {
  const { minX, minY, maxX, maxY } = pointsBounds(tri);
  return { minX, minY, maxX, maxY, tri };
}

function overlapsPiece(items: TriItem[], index: RBush<TriItem>, tol: number): boolean {
  for (const item of items) {
    const box = { minX: item.minX + tol, minY: item.minY + tol, maxX: item.maxX - tol, maxY: item.maxY - tol };
    if (box.minX > box.maxX || box.minY > box.maxY) continue;
    for (const other of index.search(box)) if (trianglesOverlap(item.tri, other.tri, tol)) return true;
  }
  return false;
}

/**
 * Whether two counter-clockwise triangles share interior: for convex polygons, disjoint interiors have a
 * separating line along one of their edges (separating axis theorem). A point within `tol` of the line
 * counts as on it, so triangles touching along an edge or at a corner do not overlap.
 */
export function trianglesOverlap(p: readonly Vec2Mm[], q: readonly Vec2Mm[], tol: number): boolean {
  return !(separatedBy(p, q, tol) || separatedBy(q, p, tol));
}

function separatedBy(p: readonly Vec2Mm[], q: readonly Vec2Mm[], tol: number): boolean {
  for (let i = 0; i < 3; i++) {
    const a = p[i]!,
      b = p[(i + 1) % 3]!;
    const limit = tol * Math.hypot(b[0] - a[0], b[1] - a[1]);
    // robust-predicates' orient2d is negative when the third point is left of a→b (inside a CCW triangle).
    let outside = true;
    for (let k = 0; k < 3 && outside; k++) outside = -orient2d(a[0], a[1], b[0], b[1], q[k]![0], q[k]![1]) <= limit;
    if (outside) return true;
  }
  return false;
}

function fitsSheet(
  box: { minX: number; minY: number; maxX: number; maxY: number },
  max: MeshUnfoldOptions['pieceMaxMm'],
): boolean {
  const w = box.maxX - box.minX,
    h = box.maxY - box.minY;
  const big = Math.max(max.widthMm, max.heightMm),
    small = Math.min(max.widthMm, max.heightMm);
  return Math.max(w, h) <= big && Math.min(w, h) <= small;
}

function boundsUnion(
  a: { minX: number; minY: number; maxX: number; maxY: number },
  b: { minX: number; minY: number; maxX: number; maxY: number },
) {
  return {
    minX: Math.min(a.minX, b.minX),
    minY: Math.min(a.minY, b.minY),
    maxX: Math.max(a.maxX, b.maxX),
    maxY: Math.max(a.maxY, b.maxY),
  };
}

/** tab-fit's gentlest side slant, radians from the edge's perpendicular. */
const TAB_SLANT_MIN_RAD = Math.PI / 6;
/** tab-fit's clearance probe leans its sides out by up to 3° more. */
const TAB_PROBE_SLANT_RAD = TAB_SLANT_MIN_RAD - (3 * Math.PI) / 180;

/**
 * The convex region every tab tab-fit may try on edge a→b lies in: right of the edge, at most `depthMm` from
 * it, inside sides slanted in by the probe's gentlest slant. Obstacles outside it cannot shorten the tab.
 */
function tabReach(a: Vec2Mm, b: Vec2Mm, depthMm: number): Vec2Mm[] {
  const len = vec2Length(vec2Sub(b, a));
  const dir = vec2Unit(vec2Sub(b, a));
  const out: Vec2Mm = [dir[1], -dir[0]];
  const lean = Math.tan(TAB_PROBE_SLANT_RAD);
  if (2 * depthMm * lean < len) {
    const a2 = vec2Add(vec2Add(a, vec2Scale(out, depthMm)), vec2Scale(dir, depthMm * lean));
    const b2 = vec2Sub(vec2Add(b, vec2Scale(out, depthMm)), vec2Scale(dir, depthMm * lean));
    return [b, a, a2, b2];
  }
  return [b, a, vec2Add(vec2Scale(vec2Add(a, b), 0.5), vec2Scale(out, len / 2 / lean))];
}

/**
 * A necessary condition for a tab of `depthMm` on edge a→b (right side): each tab side leans in from its end
 * by at least the slant that clears the paper already at that corner, and a trapezoid with slants s and t
 * reaches at most 0.98·|ab| / (tan s + tan t) deep (tab-fit's cap). Edges failing it skip the costly fit: at
 * the narrow gaps a fine mesh leaves between neighbouring faces, no tab fits.
 */
function tabCanReach(index: RBush<TriItem>, a: Vec2Mm, b: Vec2Mm, depthMm: number, tol: number): boolean {
  const freeA = freeAngleAt(index, a, b, -1, tol);
  const freeB = freeAngleAt(index, b, a, 1, tol);
  const slant = (free: number) => Math.max(TAB_SLANT_MIN_RAD, Math.PI / 2 - free);
  if (slant(freeA) >= Math.PI / 2 || slant(freeB) >= Math.PI / 2) return false;
  return (0.98 * vec2Length(vec2Sub(b, a))) / (Math.tan(slant(freeA)) + Math.tan(slant(freeB))) >= depthMm;
}

/**
 * The free angle at corner `at`, turning from the direction toward `toward` (clockwise for turn −1,
 * counter-clockwise for +1) to the first edge of a face or tab of the piece that has a corner there.
 */
function freeAngleAt(index: RBush<TriItem>, at: Vec2Mm, toward: Vec2Mm, turn: 1 | -1, tol: number): number {
  const base = Math.atan2(toward[1] - at[1], toward[0] - at[0]);
  let free = 2 * Math.PI;
  for (const item of index.search({ minX: at[0] - tol, minY: at[1] - tol, maxX: at[0] + tol, maxY: at[1] + tol })) {
    const poly = item.tri;
    for (let i = 0; i < poly.length; i++) {
      const p = poly[i]!;
      if (Math.abs(p[0] - at[0]) > tol || Math.abs(p[1] - at[1]) > tol) continue;
      for (let side = 0; side < 2; side++) {
        const q = poly[(i + (side === 0 ? 1 : poly.length - 1)) % poly.length]!;
        let angle = turn * (Math.atan2(q[1] - at[1], q[0] - at[0]) - base);
        angle = ((angle % (2 * Math.PI)) + 2 * Math.PI) % (2 * Math.PI);
        if (angle > 1e-9 && angle < 2 * Math.PI - 1e-9) free = Math.min(free, angle);
      }
    }
  }
  return free;
}

function perimeter(outline: readonly Vec2Mm[]): number {
  let s = 0;
  for (let i = 0; i < outline.length; i++) s += vec2Length(vec2Sub(outline[(i + 1) % outline.length]!, outline[i]!));
  return s;
}
