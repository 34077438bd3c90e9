/**
 * The unit question: a mesh file stores bare numbers. The teacher says which unit they are in; the importer
 * offers a guess from the size, and shows the real size it implies.
 */
export const MESH_UNITS = ['mm', 'cm', 'm', 'in'] as const;
export type MeshUnit = (typeof MESH_UNITS)[number];

/** Metres per unit; the inch is exactly 25.4 mm (international yard and pound agreement, 1959). */
export const MESH_UNIT_METRES: Record<MeshUnit, number> = { mm: 0.001, cm: 0.01, m: 1, in: 0.0254 };

/**
 * The unit a mesh was probably drawn in, from its largest extent in file numbers: above 100 most files are
 * millimetres (3D-printing files are), 10–100 reads as centimetres, smaller as metres (a spacecraft drawn in
 * metres spans a few to a few tens of units). Common practice, no source; the teacher confirms it.
 */
export function meshUnitGuess(largestExtent: number): MeshUnit {
  if (largestExtent > 100) return 'mm';
  if (largestExtent > 10) return 'cm';
  return 'm';
}

/** The mesh's bounding-box extents x, y, z in file numbers. */
export function meshExtents(positions: Float64Array): [number, number, number] {
  const lo = [Infinity, Infinity, Infinity],
    hi = [-Infinity, -Infinity, -Infinity];
  for (let i = 0; i < positions.length; i++) {
    lo[i % 3] = Math.min(lo[i % 3]!, positions[i]!);
    hi[i % 3] = Math.max(hi[i % 3]!, positions[i]!);
  }
  return [hi[0]! - lo[0]!, hi[1]! - lo[1]!, hi[2]! - lo[2]!];
}

/** Real size in metres of the extents in `unit`. */
export function meshRealSizeM(extents: readonly [number, number, number], unit: MeshUnit): [number, number, number] {
  const k = MESH_UNIT_METRES[unit];
  return [extents[0] * k, extents[1] * k, extents[2] * k];
}
