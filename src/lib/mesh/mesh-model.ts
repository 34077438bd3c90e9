/**
 * An imported mesh as the engine's Model: the model is a box of the mesh's bounding size (what the scale
 * solver, spans and summaries read) carrying the mesh itself (Model.mesh), from which the paper pieces
 * (modelPatterns) and the solid for STL, preview and stake-out (modelMesh) are made in place of the box's.
 * Model space as everywhere: mm at kit scale, the footprint centred on the origin, standing on z = 0.
 */
import type { Model } from '../geometry/model-schema';
import type { ModelMesh } from '../geometry/types';
import { MODEL_SCHEMA_VERSION } from '../geometry/model-schema';
import { meshFaces } from './mesh-faces';
import type { MeshShape } from './mesh-types';
import { meshUnfold, type MeshUnfold } from './mesh-unfold';
import { meshExtents, MESH_UNIT_METRES } from './mesh-units';

/** A side thinner than this share of the longest is given this share in the box (a flat plate has no depth). */
const BOX_SIDE_SHARE_MIN = 1e-3;

/** The model of an imported mesh, listed and printed under `name`. */
export function meshModelOf(shape: MeshShape, name: string): Model {
  const m = MESH_UNIT_METRES[shape.unit];
  const extents = meshExtents(shape.mesh.positions).map((e) => e * m);
  const floor = Math.max(...extents) * BOX_SIDE_SHARE_MIN;
  const [widthM, depthM, heightM] = extents.map((e) => Math.max(e, floor));
  return {
    schemaVersion: MODEL_SCHEMA_VERSION,
    name,
    body: { kind: 'box', widthM, depthM, heightM },
    appendages: [],
    mesh: shape,
  };
}

/** Millimetres at 1:N per file unit. */
export function meshShapeMmPerUnit(shape: MeshShape, scaleDenominator: number): number {
  return (MESH_UNIT_METRES[shape.unit] * 1000) / scaleDenominator;
}

/** Sheet room of a piece when the caller gives none: no cut for size (the sheet packer cuts at folds to fit). */
const PIECE_MAX_UNBOUNDED_MM = { widthMm: Number.MAX_VALUE, heightMm: Number.MAX_VALUE };

export interface MeshPatternOptions {
  scaleDenominator: number;
  paperGsm: number;
  /** The largest piece the sheet takes; pieces are cut along folds to fit it. */
  pieceMaxMm?: { widthMm: number; heightMm: number };
  /** The model's name: printed on the pieces of a mesh of one part (an STL's solid name is rarely meant for people). */
  name?: string;
}

/** The mesh unfolded into paper pieces at 1:N (src/lib/mesh/mesh-unfold.ts), with what the unfold did. */
export function meshShapeUnfold(shape: MeshShape, options: MeshPatternOptions): MeshUnfold {
  return meshUnfold(placed(shape), meshFaces(shape.mesh), {
    mmPerUnit: meshShapeMmPerUnit(shape, options.scaleDenominator),
    paperGsm: options.paperGsm,
    pieceMaxMm: options.pieceMaxMm ?? PIECE_MAX_UNBOUNDED_MM,
    groups: shape.mesh.groups.length === 1 && options.name ? [options.name] : shape.mesh.groups,
  });
}

/** The mesh as the closed solid the STL, the preview and the stake-out read, at 1:N. */
export function meshShapeSolid(shape: MeshShape, scaleDenominator: number): ModelMesh {
  const k = meshShapeMmPerUnit(shape, scaleDenominator);
  return { positions: Float32Array.from(placed(shape), (x) => x * k), indices: Uint32Array.from(shape.mesh.triangles) };
}

/** The positions in file numbers moved into model space: footprint centred on the origin, lowest point on z = 0. */
function placed(shape: MeshShape): Float64Array {
  const p = shape.mesh.positions;
  const lo = [Infinity, Infinity, Infinity];
  const hi = [-Infinity, -Infinity, -Infinity];
  for (let i = 0; i < p.length; i++) {
    lo[i % 3] = Math.min(lo[i % 3]!, p[i]!);
    hi[i % 3] = Math.max(hi[i % 3]!, p[i]!);
  }
  const origin = [(lo[0]! + hi[0]!) / 2, (lo[1]! + hi[1]!) / 2, lo[2]!];
  return p.map((x, i) => x - origin[i % 3]!);
}
