/**
 * What an imported mesh becomes as a kit at a scale on a sheet, shown before it is used: pieces, sheets, cut
 * length, glue tabs, edges left for tape, faces too big for the sheet, and the fold-back check (every piece
 * folded along its hinge tree lands back on the mesh). The same unfold and packer the kit pipeline runs.
 */
import { paperTabDepthMm } from '../geometry/paper';
import { sheetPackKit, sheetPieceRoomMm } from '../layout/sheet-packer';
import { sheetSize, type SheetSizeId } from '../layout/sheet-sizes';
import { meshShapeMmPerUnit, meshShapeUnfold } from '../mesh/mesh-model';
import type { MeshShape } from '../mesh/mesh-types';
import { meshExtents } from '../mesh/mesh-units';
import type { MeshUnfoldSummary } from '../mesh/mesh-unfold';

/** A folded-back piece may be off the mesh by this share of the mesh's size (issue's acceptance bound). */
export const MESH_FOLD_BACK_RELATIVE_MAX = 1e-6;

export interface MeshKitSummarySettings {
  scaleDenominator: number;
  sheetSizeId: SheetSizeId;
  paperGsm: number;
}

export interface MeshKitSummary extends MeshUnfoldSummary {
  sheetCount: number;
  /** The mesh's largest side at this scale, mm. */
  sizeMm: number;
  /** Depth of a full glue tab on this paper, mm. */
  tabDepthMm: number;
  /** Whether every piece folds back onto the mesh within MESH_FOLD_BACK_RELATIVE_MAX of its size. */
  foldBackOk: boolean;
}

/** The kit an imported mesh makes with these settings; InputError when its pieces do not fit any sheet. */
export function meshKitSummary(shape: MeshShape, settings: MeshKitSummarySettings): MeshKitSummary {
  const size = sheetSize(settings.sheetSizeId);
  const { pieces, summary } = meshShapeUnfold(shape, {
    scaleDenominator: settings.scaleDenominator,
    paperGsm: settings.paperGsm,
    pieceMaxMm: sheetPieceRoomMm(size, 'metric'),
  });
  const packed = sheetPackKit(pieces, { sheetSize: size, units: 'metric', copies: 1, paperGsm: settings.paperGsm });
  const sizeMm = Math.max(...meshExtents(shape.mesh.positions)) * meshShapeMmPerUnit(shape, settings.scaleDenominator);
  return {
    ...summary,
    pieceCount: packed.pieces.length,
    sheetCount: packed.sheets.length,
    sizeMm,
    tabDepthMm: paperTabDepthMm(settings.paperGsm),
    foldBackOk: summary.foldBackDeviationMm <= MESH_FOLD_BACK_RELATIVE_MAX * sizeMm,
  };
}
