/**
 * A repaired mesh as bytes for the database (imported_models.mesh) and back: a 4-byte tag and version, the
 * counts, the part names as UTF-8 JSON, then positions (float64), triangles (uint32) and each triangle's part
 * (uint16), all little-endian. Exact: positions keep every bit, so a mesh read back unfolds as it did before.
 */
import type { ParsedMesh } from './mesh-types';

const TAG = 0x314d574b; // "KWM1" read little-endian
const HEADER_BYTES = 20;

/** The mesh as bytes. */
export function meshEncode(mesh: ParsedMesh): Uint8Array {
  const names = new TextEncoder().encode(JSON.stringify(mesh.groups));
  const v = mesh.positions.length / 3;
  const t = mesh.triangles.length / 3;
  const bytes = new Uint8Array(HEADER_BYTES + names.length + v * 24 + t * 12 + t * 2);
  const view = new DataView(bytes.buffer);
  view.setUint32(0, TAG, true);
  view.setUint32(4, v, true);
  view.setUint32(8, t, true);
  view.setUint32(12, names.length, true);
  view.setUint32(16, 0, true);
  bytes.set(names, HEADER_BYTES);
  let at = HEADER_BYTES + names.length;
  for (const x of mesh.positions) {
    view.setFloat64(at, x, true);
    at += 8;
  }
  for (const i of mesh.triangles) {
    view.setUint32(at, i, true);
    at += 4;
  }
  for (const g of mesh.triangleGroup) {
    view.setUint16(at, g, true);
    at += 2;
  }
  return bytes;
}

/** The mesh of bytes written by meshEncode; throws Error on bytes it did not write (a stored row, never input). */
export function meshDecode(bytes: Uint8Array): ParsedMesh {
  const view = new DataView(bytes.buffer, bytes.byteOffset, bytes.byteLength);
  if (bytes.byteLength < HEADER_BYTES || view.getUint32(0, true) !== TAG)
    throw new Error('mesh-binary: not a stored mesh');
  const v = view.getUint32(4, true);
  const t = view.getUint32(8, true);
  const nameBytes = view.getUint32(12, true);
  if (bytes.byteLength !== HEADER_BYTES + nameBytes + v * 24 + t * 14) throw new Error('mesh-binary: wrong length');
  const groups = JSON.parse(
    new TextDecoder().decode(bytes.subarray(HEADER_BYTES, HEADER_BYTES + nameBytes)),
  ) as string[];
  let at = HEADER_BYTES + nameBytes;
  const positions = new Float64Array(v * 3);
  for (let i = 0; i < positions.length; i++, at += 8) positions[i] = view.getFloat64(at, true);
  const triangles = new Uint32Array(t * 3);
  for (let i = 0; i < triangles.length; i++, at += 4) triangles[i] = view.getUint32(at, true);
  const triangleGroup = new Uint16Array(t);
  for (let i = 0; i < t; i++, at += 2) triangleGroup[i] = view.getUint16(at, true);
  return { positions, triangles, triangleGroup, groups };
}
