/**
 * Checking a parsed mesh for what paper can fold, and making the safe repairs: weld duplicate vertices within
 * a tolerance, drop zero-area and repeated triangles, make the winding agree across every shared edge, turn
 * closed shells outward (positive signed volume). What is found is counted; what cannot be folded is a
 * problem naming the first place it happens: an edge shared by more than two triangles, a one-sided surface
 * (no consistent winding), a surface passing through itself. Open boundaries are allowed: they become free
 * paper edges. Coordinates stay in the file's unit.
 */
import type { ParsedMesh } from './mesh-types';
import { meshEdges, type MeshEdges } from './mesh-edges';
import { meshSelfIntersection } from './mesh-self-intersection';
import { triangleCross, vertexDistance } from './mesh-triangle';
import { meshExtents } from './mesh-units';

/**
 * Vertices closer than this fraction of the bounding box's diagonal are one vertex: float32 STL keeps about
 * seven significant digits, so copies of one corner differ by about 1e-7 of the size (common practice, no source).
 */
export const MESH_WELD_TOLERANCE_RELATIVE = 1e-6;

export interface MeshFindings {
  trianglesRead: number;
  duplicateVerticesMerged: number;
  degenerateTriangles: number;
  duplicateTriangles: number;
  openBoundaryEdges: number;
  nonManifoldEdges: number;
  nonManifoldVertices: number;
  windingFlipped: number;
  shells: number;
  shellsTurnedOutward: number;
  selfIntersections: number;
  /** Triangle pairs of different shells that cross (parts pushed into each other): reported, not refused. */
  shellsCrossing: number;
}

export type MeshProblemCode = 'non_manifold_edge' | 'one_sided_surface' | 'self_intersection' | 'no_faces_left';

export interface MeshProblem {
  code: MeshProblemCode;
  message: string;
}

export interface MeshCheck {
  mesh: ParsedMesh;
  findings: MeshFindings;
  /** What was repaired, as sentences for the teacher. */
  repairs: string[];
  /** What stops the mesh becoming a kit, first problem first; empty when it can be unfolded. */
  problems: MeshProblem[];
  /** Shell index per triangle of `mesh`. */
  triangleShell: Uint32Array;
}

export function meshCheck(parsed: ParsedMesh): MeshCheck {
  const trianglesRead = parsed.triangles.length / 3;
  const { positions, remap, merged } = weld(parsed.positions);
  const diag = boundsDiagonal(positions);
  const kept: number[] = [];
  const keptGroup: number[] = [];
  let degenerate = 0;
  let duplicates = 0;
  const seen = new Set<string>();
  for (let t = 0; t < trianglesRead; t++) {
    const a = remap[parsed.triangles[t * 3]!]!,
      b = remap[parsed.triangles[t * 3 + 1]!]!,
      c = remap[parsed.triangles[t * 3 + 2]!]!;
    if (a === b || b === c || a === c || triangleFlat(positions, a, b, c, diag)) {
      degenerate++;
      continue;
    }
    const key = [a, b, c].sort((x, y) => x - y).join(',');
    if (seen.has(key)) {
      duplicates++;
      continue;
    }
    seen.add(key);
    kept.push(a, b, c);
    keptGroup.push(parsed.triangleGroup[t]!);
  }
  const triangles = Uint32Array.from(kept);
  const findings: MeshFindings = {
    trianglesRead,
    duplicateVerticesMerged: merged,
    degenerateTriangles: degenerate,
    duplicateTriangles: duplicates,
    openBoundaryEdges: 0,
    nonManifoldEdges: 0,
    nonManifoldVertices: 0,
    windingFlipped: 0,
    shells: 0,
    shellsTurnedOutward: 0,
    selfIntersections: 0,
    shellsCrossing: 0,
  };
  const problems: MeshProblem[] = [];
  const mesh: ParsedMesh = {
    positions,
    triangles,
    triangleGroup: Uint16Array.from(keptGroup),
    groups: parsed.groups,
  };
  if (triangles.length === 0) {
    problems.push({ code: 'no_faces_left', message: 'No triangle of this mesh has any area: nothing to unfold.' });
    return { mesh, findings, repairs: repairsSaid(findings), problems, triangleShell: new Uint32Array(0) };
  }
  const edges = meshEdges(triangles, positions.length / 3);
  findings.openBoundaryEdges = edges.boundaryCount;
  findings.nonManifoldEdges = edges.nonManifold.length;
  if (edges.nonManifold.length > 0) {
    const [a, b, n] = edges.nonManifold[0]!;
    problems.push({
      code: 'non_manifold_edge',
      message: `The edge from ${pointWords(positions, a)} to ${pointWords(positions, b)} is shared by ${n} triangles; paper can join only two faces along a fold. Separate the parts that meet there.`,
    });
  }
  findings.nonManifoldVertices = nonManifoldVertexCount(triangles, edges, positions.length / 3);
  const orient = orientShells(triangles, positions, edges);
  findings.windingFlipped = orient.flipped;
  findings.shells = orient.shells;
  findings.shellsTurnedOutward = orient.turnedOutward;
  if (orient.oneSidedAt !== null)
    problems.push({
      code: 'one_sided_surface',
      message: `This surface has only one side (its faces cannot all be wound the same way, first near ${pointWords(positions, orient.oneSidedAt)}); a paper model needs an inside and an outside.`,
    });
  const crossing = meshSelfIntersection(positions, triangles, orient.triangleShell);
  findings.selfIntersections = crossing.count;
  findings.shellsCrossing = crossing.betweenShells;
  if (crossing.first)
    problems.push({
      code: 'self_intersection',
      message: `The surface passes through itself (${crossing.count}${crossing.count >= crossing.cap ? ' or more' : ''} crossing triangle pairs, the first near ${pointWords(positions, crossing.first)}); paper faces cannot pass through each other.`,
    });
  return { mesh, findings, repairs: repairsSaid(findings), problems, triangleShell: orient.triangleShell };
}

function repairsSaid(f: MeshFindings): string[] {
  const out: string[] = [];
  if (f.duplicateVerticesMerged > 0) out.push(`Merged ${f.duplicateVerticesMerged} duplicate vertices.`);
  if (f.degenerateTriangles > 0) out.push(`Dropped ${f.degenerateTriangles} triangles with no area.`);
  if (f.duplicateTriangles > 0) out.push(`Dropped ${f.duplicateTriangles} repeated triangles.`);
  if (f.windingFlipped > 0) out.push(`Turned ${f.windingFlipped} triangles to wind like their neighbours.`);
  if (f.shellsTurnedOutward > 0) out.push(`Turned ${f.shellsTurnedOutward} inside-out shells outward.`);
  return out;
}

function pointWords(positions: Float64Array, v: number): string {
  const r = (x: number) => Number(x.toPrecision(6));
  return `(${r(positions[v * 3]!)}, ${r(positions[v * 3 + 1]!)}, ${r(positions[v * 3 + 2]!)})`;
}

function boundsDiagonal(p: Float64Array): number {
  return Math.hypot(...meshExtents(p)) || 1;
}

/** A triangle whose height over its longest side is within the weld tolerance has no area worth a face. */
function triangleFlat(p: Float64Array, a: number, b: number, c: number, diag: number): boolean {
  const longest = Math.max(vertexDistance(p, a, b), vertexDistance(p, b, c), vertexDistance(p, c, a));
  return Math.hypot(...triangleCross(p, a, b, c)) / longest <= MESH_WELD_TOLERANCE_RELATIVE * diag;
}

/**
 * Vertices within the tolerance become the first of them: a hash grid of tolerance-sized cells, each vertex
 * compared with the kept vertices of the 27 cells around it.
 */
function weld(input: Float64Array): { positions: Float64Array; remap: Uint32Array; merged: number } {
  const n = input.length / 3;
  const tol = MESH_WELD_TOLERANCE_RELATIVE * boundsDiagonal(input);
  const cells = new Map<number, number[]>();
  const out: number[] = [];
  const remap = new Uint32Array(n);
  const cellKey = (ix: number, iy: number, iz: number) => ((ix * 73856093) ^ (iy * 19349663) ^ (iz * 83492791)) | 0;
  for (let i = 0; i < n; i++) {
    const x = input[i * 3]!,
      y = input[i * 3 + 1]!,
      z = input[i * 3 + 2]!;
    const ix = Math.floor(x / tol),
      iy = Math.floor(y / tol),
      iz = Math.floor(z / tol);
    let found = -1;
    for (let dx = -1; dx <= 1 && found < 0; dx++)
      for (let dy = -1; dy <= 1 && found < 0; dy++)
        for (let dz = -1; dz <= 1 && found < 0; dz++) {
          for (const k of cells.get(cellKey(ix + dx, iy + dy, iz + dz)) ?? []) {
            if (Math.hypot(out[k * 3]! - x, out[k * 3 + 1]! - y, out[k * 3 + 2]! - z) <= tol) {
              found = k;
              break;
            }
          }
        }
    if (found < 0) {
      found = out.length / 3;
      out.push(x, y, z);
      const key = cellKey(ix, iy, iz);
      const list = cells.get(key);
      if (list) list.push(found);
      else cells.set(key, [found]);
    }
    remap[i] = found;
  }
  return { positions: Float64Array.from(out), remap, merged: n - out.length / 3 };
}

/** Vertices where triangles meet in more than one fan (two parts touching at a point). */
function nonManifoldVertexCount(triangles: Uint32Array, edges: MeshEdges, vertexCount: number): number {
  // Corners (triangle t, corner k) joined across manifold edges; a vertex's corners in more than one set = fans.
  const parent = new Uint32Array(triangles.length);
  for (let i = 0; i < parent.length; i++) parent[i] = i;
  const find = (x: number): number => {
    while (parent[x] !== x) x = parent[x] = parent[parent[x]!]!;
    return x;
  };
  const cornerOf = (t: number, v: number) => t * 3 + (triangles[t * 3] === v ? 0 : triangles[t * 3 + 1] === v ? 1 : 2);
  for (const [h1, h2] of edges.pairs) {
    const t1 = Math.floor(h1 / 3),
      t2 = Math.floor(h2 / 3);
    for (const v of [triangles[h1]!, triangles[t1 * 3 + ((h1 + 1) % 3)]!]) {
      const r1 = find(cornerOf(t1, v)),
        r2 = find(cornerOf(t2, v));
      if (r1 !== r2) parent[r1] = r2;
    }
  }
  const firstRoot = new Int32Array(vertexCount).fill(-1);
  const bad = new Uint8Array(vertexCount);
  for (let c = 0; c < triangles.length; c++) {
    const v = triangles[c]!;
    const r = find(c);
    if (firstRoot[v] === -1) firstRoot[v] = r;
    else if (firstRoot[v] !== r) bad[v] = 1;
  }
  return bad.reduce((s, b) => s + b, 0);
}

/**
 * Shells by breadth-first search across manifold edges; a neighbour whose shared edge runs the same way is
 * flipped. In each shell the smaller side is the one flipped; a closed shell with negative signed volume is
 * then turned over whole. Writes the flips into `triangles`.
 */
function orientShells(
  triangles: Uint32Array,
  positions: Float64Array,
  edges: MeshEdges,
): { flipped: number; shells: number; turnedOutward: number; oneSidedAt: number | null; triangleShell: Uint32Array } {
  const count = triangles.length / 3;
  const flip = new Int8Array(count).fill(-1);
  const shell = new Uint32Array(count);
  let shells = 0,
    flipped = 0,
    turnedOutward = 0;
  let oneSidedAt: number | null = null;
  for (let seed = 0; seed < count; seed++) {
    if (flip[seed] !== -1) continue;
    const members: number[] = [seed];
    flip[seed] = 0;
    shell[seed] = shells;
    let closed = true;
    for (let q = 0; q < members.length; q++) {
      const t = members[q]!;
      for (let k = 0; k < 3; k++) {
        const h = t * 3 + k;
        const other = edges.partner[h]!;
        if (other < 0) {
          closed = false;
          continue;
        }
        const u = Math.floor(other / 3);
        // Half-edges of a consistently wound pair run opposite ways; `same` says they do not.
        const same = triangles[h] === triangles[other] ? 1 : 0;
        const want = flip[t]! ^ same;
        if (flip[u] === -1) {
          flip[u] = want;
          shell[u] = shells;
          members.push(u);
        } else if (flip[u] !== want && oneSidedAt === null) oneSidedAt = triangles[h]!;
      }
    }
    const flips = members.filter((t) => flip[t] === 1).length;
    const invert = flips * 2 > members.length ? 1 : 0;
    let volume = 0;
    for (const t of members) {
      if ((flip[t]! ^ invert) === 1) {
        const b = triangles[t * 3 + 1]!;
        triangles[t * 3 + 1] = triangles[t * 3 + 2]!;
        triangles[t * 3 + 2] = b;
      }
      volume += signedVolume6(positions, triangles, t);
    }
    flipped += invert ? members.length - flips : flips;
    if (closed && oneSidedAt === null && volume < 0) {
      for (const t of members) {
        const b = triangles[t * 3 + 1]!;
        triangles[t * 3 + 1] = triangles[t * 3 + 2]!;
        triangles[t * 3 + 2] = b;
      }
      turnedOutward++;
    }
    shells++;
  }
  return { flipped, shells, turnedOutward, oneSidedAt, triangleShell: shell };
}

/** Six times the signed volume of the tetrahedron (origin, triangle t): the divergence theorem's term. */
function signedVolume6(p: Float64Array, triangles: Uint32Array, t: number): number {
  const a = triangles[t * 3]! * 3,
    b = triangles[t * 3 + 1]! * 3,
    c = triangles[t * 3 + 2]! * 3;
  return (
    p[a]! * (p[b + 1]! * p[c + 2]! - p[b + 2]! * p[c + 1]!) -
    p[a + 1]! * (p[b]! * p[c + 2]! - p[b + 2]! * p[c]!) +
    p[a + 2]! * (p[b]! * p[c + 1]! - p[b + 1]! * p[c]!)
  );
}
