/**
 * Wavefront OBJ reading: `v x y z [w]` vertices, `f` faces of three or more corners written `v`, `v/vt`,
 * `v//vn` or `v/vt/vn` (texture and normal indices are read past: a paper kit has no use for them), 1-based
 * indices with negative ones counting back from the latest vertex, and `g`/`o` names kept as part names. Other
 * statements (vt, vn, usemtl, mtllib, s, l, p …) are skipped. As in the format's published description
 * (Wavefront Technologies, "Object Files (.obj)", Advanced Visualizer manual, appendix B1; from memory).
 * Polygons are split into triangles by ear clipping in their best-fit plane; the count of triangles is
 * checked against the limit as each face is read.
 */
import { InputError } from '../errors';
import { MESH_TRIANGLES_MAX } from './mesh-limits';
import { finiteNumber } from './mesh-stl';
import type { ParsedMesh } from './mesh-types';
import { polygonTriangulate } from './polygon-triangulate';

/** Group names are cut to this many characters (they are printed on pieces). */
const GROUP_NAME_MAX = 60;
const GROUPS_MAX = 1000;

export function objParse(bytes: Uint8Array): ParsedMesh {
  if (bytes.length === 0) throw new InputError('The file is empty (0 bytes).');
  const text = new TextDecoder().decode(bytes);
  const positions: number[] = [];
  const triangles: number[] = [];
  const triangleGroup: number[] = [];
  const groups: string[] = [];
  const groupIndex = new Map<string, number>();
  let group = -1;
  let lineNo = 0;
  let pos = 0;
  const groupUse = (name: string) => {
    const clean = name.replace(/[^\p{L}\p{N} _.-]/gu, '').slice(0, GROUP_NAME_MAX) || 'Part';
    let g = groupIndex.get(clean);
    if (g === undefined) {
      if (groups.length >= GROUPS_MAX)
        throw new InputError(`This OBJ has more than ${GROUPS_MAX} groups (line ${lineNo}).`);
      g = groups.length;
      groups.push(clean);
      groupIndex.set(clean, g);
    }
    group = g;
  };
  while (pos < text.length) {
    let end = text.indexOf('\n', pos);
    if (end < 0) end = text.length;
    let line = text.slice(pos, end);
    pos = end + 1;
    lineNo++;
    const hash = line.indexOf('#');
    if (hash >= 0) line = line.slice(0, hash);
    line = line.trim();
    if (line === '') continue;
    const words = line.split(/\s+/);
    const word = words[0]!;
    if (word === 'v') {
      if (words.length < 4)
        throw new InputError(`Line ${lineNo} of this OBJ has a vertex with fewer than three coordinates.`);
      for (let k = 1; k <= 3; k++) positions.push(finiteNumber(words[k]!, lineNo));
    } else if (word === 'f') {
      if (words.length < 4)
        throw new InputError(`Line ${lineNo} of this OBJ has a face with fewer than three corners.`);
      const vertexCount = positions.length / 3;
      const corners = words.slice(1).map((w) => objIndex(w, vertexCount, lineNo));
      if (group < 0) groupUse('Mesh');
      const tris = corners.length === 3 ? [0, 1, 2] : polygonTriangulate(corners.map((c) => vertexAt(positions, c)));
      if (triangles.length / 3 + tris.length / 3 > MESH_TRIANGLES_MAX)
        throw new InputError(
          `This OBJ has more than ${MESH_TRIANGLES_MAX.toLocaleString('en-US')} triangles (reached at line ${lineNo}), the most a kit can take. Simplify the mesh first.`,
        );
      for (const k of tris) triangles.push(corners[k]!);
      for (let k = 0; k < tris.length / 3; k++) triangleGroup.push(group);
    } else if (word === 'g' || word === 'o') {
      groupUse(words.slice(1).join(' '));
    }
  }
  if (triangles.length === 0) throw new InputError('This OBJ has no faces (no "f" lines).');
  return {
    positions: Float64Array.from(positions),
    triangles: Uint32Array.from(triangles),
    triangleGroup: Uint16Array.from(triangleGroup),
    groups,
  };
}

/**
 * A face corner's vertex index, 0-based. Positive indices count from 1; negative ones count back from the
 * latest vertex defined so far (-1 is the latest). Index 0 and indices past the vertex list are refused.
 */
function objIndex(word: string, vertexCount: number, lineNo: number): number {
  const first = word.split('/')[0]!;
  if (!/^-?\d+$/.test(first))
    throw new InputError(`Line ${lineNo} of this OBJ has a face corner "${word}" that is not an index.`);
  const n = Number(first);
  if (n === 0) throw new InputError(`Line ${lineNo} of this OBJ uses vertex index 0; OBJ indices start at 1.`);
  const index = n > 0 ? n - 1 : vertexCount + n;
  if (index < 0 || index >= vertexCount)
    throw new InputError(
      `Line ${lineNo} of this OBJ refers to vertex ${n}, but only ${vertexCount} vertices are defined before it.`,
    );
  return index;
}

function vertexAt(positions: number[], i: number): [number, number, number] {
  return [positions[i * 3]!, positions[i * 3 + 1]!, positions[i * 3 + 2]!];
}
