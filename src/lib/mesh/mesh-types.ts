/**
 * The shapes a mesh passes through on its way to paper: as parsed from a file (a triangle soup or an indexed
 * mesh in the file's own, unknown unit), then repaired. Coordinates are plain numbers in the file's unit until
 * the unit question is answered.
 */

/** A mesh as read from a file: positions x, y, z per vertex; three vertex indices per triangle. */
export interface ParsedMesh {
  positions: Float64Array;
  triangles: Uint32Array;
  /** Index into `groups` per triangle (OBJ `g`/`o` names; STL files have one group, the solid's name). */
  triangleGroup: Uint16Array;
  groups: string[];
}
