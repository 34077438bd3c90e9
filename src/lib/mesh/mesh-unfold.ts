/**
 * Unfolding prepared mesh faces into flat pieces.
 *
 * 1. Fold tree: a maximum spanning forest of the face graph (Kruskal) whose edge weight is the edge's length
 *    times (1 + cos θ)/2, θ the dihedral turn between the two faces: long, nearly flat edges become folds and
 *    the cuts are short, as in the minimum-perimeter cut-tree heuristic for polyhedron nets (W. Schlickenrieder,
 *    "Nets of Polyhedra", diploma thesis, TU Berlin, 1997; from memory), with the dihedral term added so sharp
 *    edges are cut first (common practice, no source). Edges between two parts (OBJ groups) are never folds.
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
import { netEdgeLabel, tabFoldAngle } from '../geometry/net-glue';
import { convexOverlap, tabFit } from '../geometry/tab-fit';
import { paperTabDepthMm } from '../geometry/paper';
import { hingeTreeFold } from '../geometry/hinge-tree';
import { pointsBounds, vec2Add, vec2Length, vec2Scale, vec2Sub, vec2Unit } from '../geometry/vec';
import type { MeshFace } from './mesh-faces';
import { meshExtents } from './mesh-units';

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
  face: number;
  tri: Vec2Mm[];
}

interface Adjacent {
  f: number;
  i: number;
  g: number;
  j: number;
  lengthMm: number;
  weight: number;
}

export function meshUnfold(positions: Float64Array, faces: MeshFace[], options: MeshUnfoldOptions): MeshUnfold {
  const k = options.mmPerUnit;
  const P = (v: number): Vec3Mm => [positions[v * 3]! * k, positions[v * 3 + 1]! * k, positions[v * 3 + 2]! * k];
  const F = faces.length;
  const local = faces.map((face) => faceLocal(face, P));
  const sizeMm = Math.max(...meshExtents(positions)) * k || 1;
  const tol = OVERLAP_TOLERANCE_RELATIVE * sizeMm;
  const adjacent = faceAdjacency(faces, positions.length / 3, P);
  const tree = foldForest(F, adjacent, faces);
  // Faces must leave room for a full tab on every side within the sheet.
  const margin = 2 * paperTabDepthMm(options.paperGsm);
  const sheet = {
    widthMm: Math.max(0, options.pieceMaxMm.widthMm - margin),
    heightMm: Math.max(0, options.pieceMaxMm.heightMm - margin),
  };

  // 2. Grow pieces.
  const placed: (Vec2Mm[] | null)[] = new Array(F).fill(null);
  const pieceOf = new Int32Array(F).fill(-1);
  const waiting = new Uint8Array(F);
  const pieces: { faces: number[]; joints: { parent: number; child: number }[]; index: RBush<TriItem> }[] = [];
  const jointEdges = new Set<Adjacent>();
  let oversize = 0;
  for (let seed = 0; seed < F; seed++) {
    if (pieceOf[seed] !== -1) continue;
    const roots = [seed];
    while (roots.length > 0) {
      const root = roots.pop()!;
      const id = pieces.length;
      const index = new RBush<TriItem>();
      const piece = { faces: [root], joints: [] as { parent: number; child: number }[], index };
      pieces.push(piece);
      const rootFlat = local[root]!.loop;
      placed[root] = rootFlat;
      pieceOf[root] = id;
      const box = pointsBounds(rootFlat);
      if (!fitsSheet(box, sheet)) oversize++;
      index.load(triItems(root, local[root]!.tris, IDENTITY));
      for (let q = 0; q < piece.faces.length; q++) {
        const f = piece.faces[q]!;
        for (const adj of tree[f]!) {
          const [g, i, j] = adj.f === f ? [adj.g, adj.i, adj.j] : [adj.f, adj.j, adj.i];
          if (pieceOf[g] !== -1 || waiting[g]) continue;
          const parentLoop = placed[f]!;
          const a = parentLoop[i]!,
            b = parentLoop[(i + 1) % parentLoop.length]!;
          const gl = local[g]!;
          // Child edge j runs b → a in its own plane.
          const motion = rigidOnto(gl.loop[j]!, gl.loop[(j + 1) % gl.loop.length]!, b, a);
          const loop = gl.loop.map((pt) => rigidApply(motion, pt));
          loop[j] = b;
          loop[(j + 1) % loop.length] = a;
          const items = triItems(g, gl.tris, motion);
          const grown = boundsUnion(box, pointsBounds(loop));
          if (!fitsSheet(grown, sheet) || overlapsPiece(items, index, tol)) {
            roots.push(g);
            waiting[g] = 1;
            continue;
          }
          Object.assign(box, grown);
          placed[g] = loop;
          pieceOf[g] = id;
          piece.faces.push(g);
          piece.joints.push({ parent: f, child: g });
          jointEdges.add(adj);
          index.load(items);
        }
      }
    }
  }

  // 3. Glue on every cut edge.
  const netFaces: NetFace[] = faces.map((face, f) => ({ flatMm: placed[f]!, modelMm: face.loop.map(P) }));
  const tabsOf: NetTab[][] = pieces.map(() => []);
  const labelsOf: EdgeLabel[][] = pieces.map(() => []);
  let number = 0;
  let taped = 0;
  for (const adj of adjacent) {
    if (jointEdges.has(adj)) continue;
    number++;
    const sides = [
      { on: { face: adj.f, edge: adj.i }, partner: { face: adj.g, edge: adj.j } },
      { on: { face: adj.g, edge: adj.j }, partner: { face: adj.f, edge: adj.i } },
    ];
    const want = paperTabDepthMm(options.paperGsm, adj.lengthMm);
    let best: { side: (typeof sides)[number]; polygonMm: Vec2Mm[]; depthMm: number } | null = null;
    for (const side of sides) {
      const loop = placed[side.on.face]!;
      const a = loop[side.on.edge]!,
        b = loop[(side.on.edge + 1) % loop.length]!;
      const index = pieces[pieceOf[side.on.face]!]!.index;
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
      for (const side of sides) labelsOf[pieceOf[side.on.face]!]!.push(netEdgeLabel(netFaces, side.on, number));
      continue;
    }
    const { on, partner } = best.side;
    const loop = placed[on.face]!;
    const a = loop[on.edge]!,
      b = loop[(on.edge + 1) % loop.length]!;
    const out = vec2Unit(vec2Sub(b, a));
    const labelAtMm = vec2Add(vec2Scale(vec2Add(a, b), 0.5), vec2Scale([out[1], -out[0]], best.depthMm / 2));
    tabsOf[pieceOf[on.face]!]!.push({
      number,
      polygonMm: best.polygonMm,
      depthMm: best.depthMm,
      labelAtMm,
      fold: { fromMm: a, toMm: b, angleRad: tabFoldAngle(netFaces, on, partner) },
    });
    labelsOf[pieceOf[partner.face]!]!.push(netEdgeLabel(netFaces, partner, number));
    const bb = pointsBounds(best.polygonMm);
    pieces[pieceOf[on.face]!]!.index.insert({ ...bb, face: -1, tri: best.polygonMm });
  }

  // 4. Pieces in the engine's shape, and the fold-back check.
  const out: Piece[] = pieces.map((piece, n) => {
    const localId = new Map(piece.faces.map((f, i) => [f, i]));
    const group = faces[piece.faces[0]!]!.group;
    const name = options.groups[group] ?? 'Mesh';
    return pieceFromNet({
      id: `mesh-${n + 1}`,
      partId: `mesh-part-${group + 1}`,
      partKind: 'body',
      label: `${name} ${n + 1}`,
      assemblyStep: group + 1,
      faces: piece.faces.map((f) => netFaces[f]!),
      joints: piece.joints.map((j) => ({ parent: localId.get(j.parent)!, child: localId.get(j.child)! })),
      tabs: tabsOf[n]!,
      edgeLabels: labelsOf[n]!,
    });
  });
  let deviation = 0;
  for (const [n, piece] of out.entries()) {
    const model = pieces[n]!.faces.map((f) => netFaces[f]!.modelMm);
    for (const folded of hingeTreeFold(piece.hinge, 1)) {
      const want = model[folded.id]!;
      folded.polygonMm.forEach((p, i) => {
        const w = want[i]!;
        deviation = Math.max(deviation, Math.hypot(p[0] - w[0], p[1] - w[1], p[2] - w[2]));
      });
    }
  }
  return {
    pieces: out,
    summary: {
      faceCount: F,
      pieceCount: out.length,
      cutLengthMm: out.reduce((s, p) => s + perimeter(p.outlineMm), 0),
      tabCount: out.reduce((s, p) => s + p.tabs.length, 0),
      tapedEdgeCount: taped,
      oversizeFaceCount: oversize,
      foldBackDeviationMm: deviation,
    },
  };
}

interface FaceLocal {
  loop: Vec2Mm[];
  /** The face's triangles in its own plane, three points each. */
  tris: Vec2Mm[][];
}

/** The face in its own plane: origin at its first outline vertex, x along xAxis, y = normal × x. */
function faceLocal(face: MeshFace, P: (v: number) => Vec3Mm): FaceLocal {
  const o = P(face.loop[0]!);
  const n = face.normal,
    x = face.xAxis;
  const y: Vec3Mm = [n[1] * x[2] - n[2] * x[1], n[2] * x[0] - n[0] * x[2], n[0] * x[1] - n[1] * x[0]];
  const flat = (v: number): Vec2Mm => {
    const p = P(v);
    const d = [p[0] - o[0], p[1] - o[1], p[2] - o[2]] as const;
    return [d[0] * x[0] + d[1] * x[1] + d[2] * x[2], d[0] * y[0] + d[1] * y[1] + d[2] * y[2]];
  };
  const tris: Vec2Mm[][] = [];
  for (let t = 0; t < face.triangles.length; t += 3)
    tris.push([flat(face.triangles[t]!), flat(face.triangles[t + 1]!), flat(face.triangles[t + 2]!)]);
  return { loop: face.loop.map(flat), tris };
}

/** Every pair of face edges that are one edge of the mesh (the second runs the other way). */
function faceAdjacency(faces: MeshFace[], vertexCount: number, P: (v: number) => Vec3Mm): Adjacent[] {
  const byEdge = new Map<number, [number, number]>();
  faces.forEach((face, f) => {
    const L = face.loop;
    for (let i = 0; i < L.length; i++) byEdge.set(L[i]! * vertexCount + L[(i + 1) % L.length]!, [f, i]);
  });
  const out: Adjacent[] = [];
  faces.forEach((face, f) => {
    const L = face.loop;
    for (let i = 0; i < L.length; i++) {
      const a = L[i]!,
        b = L[(i + 1) % L.length]!;
      const other = byEdge.get(b * vertexCount + a);
      if (!other || other[0] <= f) continue;
      const [g, j] = other;
      const pa = P(a),
        pb = P(b);
      const lengthMm = Math.hypot(pb[0] - pa[0], pb[1] - pa[1], pb[2] - pa[2]);
      const nf = face.normal,
        ng = faces[g]!.normal;
      const cos = nf[0] * ng[0] + nf[1] * ng[1] + nf[2] * ng[2];
      out.push({ f, i, g, j, lengthMm, weight: (lengthMm * (1 + cos)) / 2 });
    }
  });
  return out;
}

/** Kruskal's maximum spanning forest over faces of one group; tree edges listed per face. */
function foldForest(F: number, adjacent: Adjacent[], faces: MeshFace[]): Adjacent[][] {
  const parent = new Int32Array(F);
  for (let i = 0; i < F; i++) parent[i] = i;
  const find = (x: number): number => {
    while (parent[x] !== x) x = parent[x] = parent[parent[x]!]!;
    return x;
  };
  const tree: Adjacent[][] = Array.from({ length: F }, () => []);
  const order = [...adjacent].sort((p, q) => q.weight - p.weight);
  for (const e of order) {
    if (faces[e.f]!.group !== faces[e.g]!.group) continue;
    const rf = find(e.f),
      rg = find(e.g);
    if (rf === rg) continue;
    parent[rf] = rg;
    tree[e.f]!.push(e);
    tree[e.g]!.push(e);
  }
  return tree;
}

type Rigid = { c: number; s: number; tx: number; ty: number };
const IDENTITY: Rigid = { c: 1, s: 0, tx: 0, ty: 0 };

/** The rotation + translation taking p0 → q0 and the direction p0→p1 onto q0→q1. */
function rigidOnto(p0: Vec2Mm, p1: Vec2Mm, q0: Vec2Mm, q1: Vec2Mm): Rigid {
  const angle = Math.atan2(q1[1] - q0[1], q1[0] - q0[0]) - Math.atan2(p1[1] - p0[1], p1[0] - p0[0]);
  const c = Math.cos(angle),
    s = Math.sin(angle);
  return { c, s, tx: q0[0] - (c * p0[0] - s * p0[1]), ty: q0[1] - (s * p0[0] + c * p0[1]) };
}

const rigidApply = (m: Rigid, p: Vec2Mm): Vec2Mm => [m.c * p[0] - m.s * p[1] + m.tx, m.s * p[0] + m.c * p[1] + m.ty];

function triItems(face: number, tris: Vec2Mm[][], m: Rigid): TriItem[] {
  return tris.map((t) => {
    const tri = t.map((p) => rigidApply(m, p));
    return { ...pointsBounds(tri), face, tri };
  });
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
