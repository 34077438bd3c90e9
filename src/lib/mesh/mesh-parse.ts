/** Reading an uploaded mesh file by its kind (the file name's extension), within the limits of mesh-limits.ts. */
import { InputError } from '../errors';
import { MESH_FILE_BYTES_MAX, MESH_FILE_KINDS, type MeshFileKind } from './mesh-limits';
import { objParse } from './mesh-obj';
import { stlParse } from './mesh-stl';
import type { ParsedMesh } from './mesh-types';

/** The kind of a mesh file from its name; InputError for any other extension. */
export function meshFileKind(fileName: string): MeshFileKind {
  const ext = /\.([a-z0-9]+)$/i.exec(fileName)?.[1]?.toLowerCase();
  const kind = MESH_FILE_KINDS.find((k) => k === ext);
  if (!kind) throw new InputError(`"${fileName}" is not a mesh file the importer reads: use a .stl or .obj file.`);
  return kind;
}

export function meshParse(bytes: Uint8Array, kind: MeshFileKind): ParsedMesh {
  if (bytes.length > MESH_FILE_BYTES_MAX)
    throw new InputError(
      `The file is ${bytes.length} bytes; the most accepted is ${MESH_FILE_BYTES_MAX} bytes (20 MB).`,
    );
  return kind === 'stl' ? stlParse(bytes) : objParse(bytes);
}
