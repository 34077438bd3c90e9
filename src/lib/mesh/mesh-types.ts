/**
 * The shapes a mesh passes through on its way to paper: as parsed from a file (a triangle soup or an indexed
 * mesh in the file's own, unknown unit), then repaired. Coordinates are plain numbers in the file's unit until
 * the unit question is answered.
 */
import { MESH_UNITS, type MeshUnit } from './mesh-units';

/** A mesh as read from a file: positions x, y, z per vertex; three vertex indices per triangle. */
export interface ParsedMesh {
  positions: Float64Array;
  triangles: Uint32Array;
  /** Index into `groups` per triangle (OBJ `g`/`o` names; STL files have one group, the solid's name). */
  triangleGroup: Uint16Array;
  groups: string[];
}

/**
 * An imported mesh as a model carries it (Model.mesh): the repaired mesh in its file's numbers, the unit those
 * numbers are in, and the SHA-256 of its stored bytes, which content hashes use in place of the arrays. Made
 * by the server from an upload (src/lib/models), never taken from a request: JSON cannot hold typed arrays.
 */
export interface MeshShape {
  digest: string;
  unit: MeshUnit;
  mesh: ParsedMesh;
}

/** Whether a value is a MeshShape (typed arrays and all): what a model from a request can never be. */
export function isMeshShape(value: unknown): value is MeshShape {
  if (!value || typeof value !== 'object') return false;
  const v = value as Partial<MeshShape>;
  return (
    typeof v.digest === 'string' &&
    (MESH_UNITS as readonly unknown[]).includes(v.unit) &&
    v.mesh?.positions instanceof Float64Array &&
    v.mesh.triangles instanceof Uint32Array &&
    v.mesh.triangleGroup instanceof Uint16Array &&
    Array.isArray(v.mesh.groups)
  );
}
