/** Small measures of one triangle of an indexed mesh (positions x, y, z per vertex). */

/** (b − a) × (c − a): its length is twice the triangle's area, its direction the normal of a → b → c. */
export function triangleCross(p: Float64Array, a: number, b: number, c: number): [number, number, number] {
  const ux = p[b * 3]! - p[a * 3]!,
    uy = p[b * 3 + 1]! - p[a * 3 + 1]!,
    uz = p[b * 3 + 2]! - p[a * 3 + 2]!;
  const vx = p[c * 3]! - p[a * 3]!,
    vy = p[c * 3 + 1]! - p[a * 3 + 1]!,
    vz = p[c * 3 + 2]! - p[a * 3 + 2]!;
  return [uy * vz - uz * vy, uz * vx - ux * vz, ux * vy - uy * vx];
}

/** Distance between vertices a and b. */
export function vertexDistance(p: Float64Array, a: number, b: number): number {
  return Math.hypot(p[b * 3]! - p[a * 3]!, p[b * 3 + 1]! - p[a * 3 + 1]!, p[b * 3 + 2]! - p[a * 3 + 2]!);
}
