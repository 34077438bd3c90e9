/**
 * The one adapter from the model engine to three.js: a piece folded by a fraction (hinge-tree.ts) or an
 * assembled ModelMesh becomes BufferGeometry. Positions stay in model space, mm at kit scale (z up).
 */
import { BufferGeometry, Float32BufferAttribute, ShapeUtils, Vector2 } from 'three';
import { hingeTreeFold } from '../geometry/hinge-tree';
import type { CurvedDevelopment, GlueTab, HingeFace, ModelMesh, Piece, Vec2Mm } from '../geometry/types';
import { pieceTabsFold } from './tab-fold';

/** Three vertex indices into a face polygon, counter-clockwise in flat coordinates. */
export type FaceTriangle = [number, number, number];

export interface PieceGeometry {
  /** The faces as triangles (indexed, with vertex normals). */
  surface: BufferGeometry;
  /** Every face's boundary as line segments: the cut outline and the fold lines. */
  edges: BufferGeometry;
}

// Triangulation depends only on the flat face, so it is done once per face object, not per fold fraction.
const trianglesByFace = new WeakMap<HingeFace | GlueTab, FaceTriangle[]>();

/**
 * Triangles of a flat face polygon: a strip between its two rulings chains for curved pieces (so no triangle
 * spans across a rolled tube or cone), ear clipping otherwise; an n-gon always gives n − 2 triangles, and
 * fewer than 3 points give none.
 */
export function faceTriangles(polygonMm: readonly Vec2Mm[], curved?: CurvedDevelopment): FaceTriangle[] {
  if (polygonMm.length < 3) return [];
  if (curved) {
    const strip = faceStripTriangles(polygonMm, curved);
    if (strip) return strip;
  }
  const contour = polygonMm.map(([x, y]) => new Vector2(x, y));
  return ShapeUtils.triangulateShape(contour, []).map((t) => orientCcw(polygonMm, [t[0]!, t[1]!, t[2]!]));
}

/**
 * Zips the polygon's two chains of rulings (tube: x is constant along a ruling; cone: the angle about the
 * apex) into a triangle strip; null when the polygon is not two chains monotone in that parameter.
 */
function faceStripTriangles(polygonMm: readonly Vec2Mm[], curved: CurvedDevelopment): FaceTriangle[] | null {
  const ruling = curved.kind === 'tube' ? (p: Vec2Mm) => p[0] : (p: Vec2Mm) => Math.atan2(p[1], p[0]);
  const t = polygonMm.map(ruling);
  let k = 0;
  while (k + 1 < t.length && t[k + 1]! > t[k]!) k++;
  const a = Array.from({ length: k + 1 }, (_, i) => i);
  const b = Array.from({ length: t.length - k - 1 }, (_, i) => t.length - 1 - i);
  if (a.length < 2 || b.length < 1) return null;
  const isApex = b.length === 1;
  if (!isApex && b.some((v, i) => i > 0 && t[v]! < t[b[i - 1]!]! - 1e-12)) return null;
  const triangles: FaceTriangle[] = [];
  let i = 0,
    j = 0;
  while (i < a.length - 1 || j < b.length - 1) {
    const advanceA = j === b.length - 1 || (i < a.length - 1 && t[a[i + 1]!]! <= t[b[j + 1]!]!);
    triangles.push(orientCcw(polygonMm, advanceA ? [a[i]!, a[i + 1]!, b[j]!] : [a[i]!, b[j + 1]!, b[j]!]));
    if (advanceA) i++;
    else j++;
  }
  return triangles;
}

function orientCcw(p: readonly Vec2Mm[], [i, j, k]: FaceTriangle): FaceTriangle {
  const [a, b, c] = [p[i]!, p[j]!, p[k]!];
  const cross = (b[0] - a[0]) * (c[1] - a[1]) - (b[1] - a[1]) * (c[0] - a[0]);
  return cross < 0 ? [i, k, j] : [i, j, k];
}

function cachedTriangles(face: HingeFace | GlueTab, curved?: CurvedDevelopment): FaceTriangle[] {
  let triangles = trianglesByFace.get(face);
  if (!triangles) {
    triangles = faceTriangles(face.polygonMm, curved);
    trianglesByFace.set(face, triangles);
  }
  return triangles;
}

/** The piece folded by fraction (0 flat … 1 assembled, clamped) as a surface and its edges, model mm. */
export function pieceGeometry(piece: Piece, fraction: number): PieceGeometry {
  const flatById = new Map(piece.hinge.faces.map((f) => [f.id, f]));
  const positions: number[] = [];
  const index: number[] = [];
  const lines: number[] = [];
  for (const folded of hingeTreeFold(piece.hinge, fraction)) {
    const flat = flatById.get(folded.id)!;
    const base = positions.length / 3;
    const poly = folded.polygonMm;
    poly.forEach((p, i) => {
      positions.push(p[0], p[1], p[2]);
      const q = poly[(i + 1) % poly.length]!;
      lines.push(p[0], p[1], p[2], q[0], q[1], q[2]);
    });
    for (const [i, j, k] of cachedTriangles(flat, piece.hinge.curved)) index.push(base + i, base + j, base + k);
  }
  const surface = new BufferGeometry();
  surface.setAttribute('position', new Float32BufferAttribute(positions, 3));
  surface.setIndex(index);
  surface.computeVertexNormals();
  const edges = new BufferGeometry();
  edges.setAttribute('position', new Float32BufferAttribute(lines, 3));
  return { surface, edges };
}

/**
 * The piece's glue tabs folded by fraction (tab-fold.ts) as one indexed surface, model mm; tabs that
 * pieceTabsFold leaves out are missing here too, and a piece without tabs gives an empty geometry.
 */
export function pieceTabsGeometry(piece: Piece, fraction: number): BufferGeometry {
  const positions: number[] = [];
  const index: number[] = [];
  for (const folded of pieceTabsFold(piece, fraction)) {
    const tab = piece.tabs.find((t) => t.number === folded.number)!;
    const base = positions.length / 3;
    for (const p of folded.polygonMm) positions.push(p[0], p[1], p[2]);
    for (const [i, j, k] of cachedTriangles(tab, piece.hinge.curved)) index.push(base + i, base + j, base + k);
  }
  const geometry = new BufferGeometry();
  geometry.setAttribute('position', new Float32BufferAttribute(positions, 3));
  geometry.setIndex(index);
  if (index.length > 0) geometry.computeVertexNormals();
  return geometry;
}

/** The assembled mesh (model mm) as indexed BufferGeometry with vertex normals; empty mesh → empty geometry. */
export function modelMeshGeometry(mesh: ModelMesh): BufferGeometry {
  const geometry = new BufferGeometry();
  geometry.setAttribute('position', new Float32BufferAttribute(mesh.positions, 3));
  geometry.setIndex(Array.from(mesh.indices));
  if (mesh.indices.length > 0) geometry.computeVertexNormals();
  return geometry;
}
