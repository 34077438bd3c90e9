/**
 * Limits on an uploaded mesh file, in one place: the upload route, the parsers and the builder's form
 * import them. A kit of 100,000 faces is already far more than a class can cut; the byte cap admits an
 * ASCII STL of roughly 80,000 facets or a binary STL of 100,000 with room to spare.
 */

/** Largest mesh file accepted, bytes (20 MB). */
export const MESH_FILE_BYTES_MAX = 20_000_000;

/** Most triangles a mesh may have (after OBJ polygons are split into triangles). */
export const MESH_TRIANGLES_MAX = 100_000;

/** The file kinds the importer reads, by extension. */
export const MESH_FILE_KINDS = ['stl', 'obj'] as const;
export type MeshFileKind = (typeof MESH_FILE_KINDS)[number];
