import { useEffect, useMemo } from 'react';
import type { Piece } from '../../lib/geometry/types';
import { pieceGeometry, pieceTabsGeometry } from '../../lib/preview/to-buffer-geometry';
import { PIECE_MATERIALS } from './piece-materials';

export type PieceState = 'built' | 'current' | 'later';

interface Props {
  piece: Piece;
  /** 0 flat … 1 folded. */
  fraction: number;
  state: PieceState;
}

/**
 * One piece folded by `fraction`: its surface, its face edges and, in the current step, its glue tabs;
 * geometry is rebuilt only when the fraction (or, for the tabs, the step) changes.
 */
export default function PieceMesh({ piece, fraction, state }: Props) {
  const geometry = useMemo(() => pieceGeometry(piece, fraction), [piece, fraction]);
  const tabs = useMemo(
    () => (state === 'current' ? pieceTabsGeometry(piece, fraction) : null),
    [piece, fraction, state],
  );
  useEffect(
    () => () => {
      geometry.surface.dispose();
      geometry.edges.dispose();
    },
    [geometry],
  );
  useEffect(() => () => tabs?.dispose(), [tabs]);
  return (
    <group name={piece.id}>
      <mesh geometry={geometry.surface} material={PIECE_MATERIALS[state]} renderOrder={state === 'later' ? 1 : 0} />
      {tabs && <mesh geometry={tabs} material={PIECE_MATERIALS.tab} />}
      <lineSegments
        geometry={geometry.edges}
        material={state === 'later' ? PIECE_MATERIALS.edgeLater : PIECE_MATERIALS.edge}
      />
    </group>
  );
}
