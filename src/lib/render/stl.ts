/**
 * The assembled model as STL for 3D printers, through three's STLExporter: binary (80-byte header, triangle
 * count, 50 bytes per triangle) or ASCII. Units are mm at kit scale, which slicers assume for STL.
 */
import { BufferAttribute, BufferGeometry, Mesh } from 'three';
import { STLExporter } from 'three/examples/jsm/exporters/STLExporter.js';
import type { ModelMesh } from '../geometry/types';

const exporter = new STLExporter();

function stlMesh(mesh: ModelMesh): Mesh {
  const geometry = new BufferGeometry();
  geometry.setAttribute('position', new BufferAttribute(mesh.positions, 3));
  geometry.setIndex(new BufferAttribute(mesh.indices, 1));
  return new Mesh(geometry);
}

/** Binary STL bytes of a mesh; an empty mesh gives a valid file with zero triangles. */
export function stlBinary(mesh: ModelMesh): Uint8Array {
  const view = exporter.parse(stlMesh(mesh), { binary: true });
  return new Uint8Array(view.buffer, view.byteOffset, view.byteLength);
}

/** ASCII STL text of a mesh, solid name "kitwright". */
export function stlAscii(mesh: ModelMesh): string {
  return exporter.parse(stlMesh(mesh), { binary: false });
}
