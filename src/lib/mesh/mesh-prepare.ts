/**
 * The importer's pipeline from file bytes to paper pieces: parse (limits first), check and repair, merge
 * coplanar triangles into faces, then — once the unit and the kit's scale are known — unfold.
 */
import { InputError } from '../errors';
import { meshParse, meshFileKind } from './mesh-parse';
import { meshCheck, type MeshCheck } from './mesh-repair';
import { meshFaces, MESH_COPLANAR_ANGLE_DEG, type MeshFace } from './mesh-faces';
import { meshExtents, meshUnitGuess, MESH_UNIT_METRES, type MeshUnit } from './mesh-units';
import { meshUnfold, type MeshUnfold } from './mesh-unfold';

export interface MeshPrepared {
  check: MeshCheck;
  faces: MeshFace[];
  /** Bounding-box extents in file numbers. */
  extents: [number, number, number];
  unitGuess: MeshUnit;
}

/** Parses and checks a mesh file; InputError for a malformed file or a mesh paper cannot fold (first problem named). */
export function meshPrepare(bytes: Uint8Array, fileName: string, angleDeg = MESH_COPLANAR_ANGLE_DEG): MeshPrepared {
  const parsed = meshParse(bytes, meshFileKind(fileName));
  const check = meshCheck(parsed);
  const first = check.problems[0];
  if (first) throw new InputError(first.message, { file: check.problems.map((p) => p.message) });
  const extents = meshExtents(check.mesh.positions);
  return { check, faces: meshFaces(check.mesh, angleDeg), extents, unitGuess: meshUnitGuess(Math.max(...extents)) };
}

/** What an upload's check found, as the import route keeps it: the repaired mesh and plain facts (no faces). */
export interface MeshImported {
  mesh: MeshPrepared['check']['mesh'];
  findings: MeshPrepared['check']['findings'];
  repairs: string[];
  faceCount: number;
  extents: [number, number, number];
  unitGuess: MeshUnit;
}

/** Parses and checks an uploaded file for the import route (CPU work: the pool runs it). */
export function meshImport(bytes: Uint8Array, fileName: string): MeshImported {
  const { check, faces, extents, unitGuess } = meshPrepare(bytes, fileName);
  return {
    mesh: check.mesh,
    findings: check.findings,
    repairs: check.repairs,
    faceCount: faces.length,
    extents,
    unitGuess,
  };
}

export interface MeshKitSettings {
  unit: MeshUnit;
  scaleDenominator: number;
  paperGsm: number;
  pieceMaxMm: { widthMm: number; heightMm: number };
}

/** The prepared mesh unfolded at a kit's scale: mm at kit scale per file unit = unit in m × 1000 / N. */
export function meshPreparedUnfold(prepared: MeshPrepared, settings: MeshKitSettings): MeshUnfold {
  return meshUnfold(prepared.check.mesh.positions, prepared.faces, {
    mmPerUnit: (MESH_UNIT_METRES[settings.unit] * 1000) / settings.scaleDenominator,
    paperGsm: settings.paperGsm,
    pieceMaxMm: settings.pieceMaxMm,
    groups: prepared.check.mesh.groups,
  });
}
