import { useEffect, useMemo } from 'react';
import type { Piece } from '../../lib/geometry/types';
import { pieceGeometry } from '../../lib/preview/to-buffer-geometry';
import { PIECE_MATERIALS } from './piece-materials';

export type PieceState = 'built' | 'current' | 'later';

interface Props {
  piece: Piece;
  /** 0 flat … 1 folded. */
  fraction: number;
  state: PieceState;
}

/** One piece folded by `fraction`: its surface and its face edges; geometry rebuilt only when the fraction changes. */
export default function PieceMesh({ piece, fraction, state }: Props) {
  const geometry = useMemo(() => pieceGeometry(piece, fraction), [piece, fraction]);
  useEffect(
    () => () => {
      geometry.surface.dispose();
      geometry.edges.dispose();
    },
    [geometry],
  );
  return (
    <group name={piece.id}>
      <mesh geometry={geometry.surface} material={PIECE_MATERIALS[state]} renderOrder={state === 'later' ? 1 : 0} />
      <lineSegments
        geometry={geometry.edges}
        material={state === 'later' ? PIECE_MATERIALS.edgeLater : PIECE_MATERIALS.edge}
      />
    </group>
  );
}
