import type { RefObject } from 'react';
import type { Piece } from '../../lib/geometry/types';
import { assemblyStepPieceState, type AssemblyRod, type AssemblyStep } from '../../lib/preview/assembly-steps';
import PieceMesh, { type PieceState } from './PieceMesh';
import RodMesh from './RodMesh';
import ViewRig from './ViewRig';
import SceneReadySignal, { type FrameShown } from './SceneReadySignal';
import type { ViewActions } from '../../lib/preview/view-keys';
import type { ViewFrame } from './view-frame';

interface Props {
  pieces: readonly Piece[];
  /** Rods standing in for booms too thin for paper, drawn in place. */
  rods: readonly AssemblyRod[];
  foldPercent: number;
  /** Fold every piece by the slider; otherwise only the current step's, the others shown assembled. */
  foldWholeKit: boolean;
  /** The current step (from the same module as the PDF's instructions); later pieces are ghosted. */
  step: AssemblyStep | undefined;
  frame: ViewFrame;
  actionsRef: RefObject<ViewActions | null>;
  viewVersion: RefObject<number>;
  onRendered(shown: FrameShown, first: boolean): void;
}

const stateOf = (piece: Piece, step: AssemblyStep | undefined): PieceState => assemblyStepPieceState(step, piece.id);

/**
 * The lit scene inside the canvas: every piece folded by the slider, each rod in place (teal at its step),
 * the orbit rig and the ready signal.
 */
export default function FoldScene({
  pieces,
  rods,
  foldPercent,
  foldWholeKit,
  step,
  frame,
  actionsRef,
  viewVersion,
  onRendered,
}: Props) {
  const fraction = foldPercent / 100;
  return (
    <>
      <color attach="background" args={['#fbf9f4']} />
      <hemisphereLight position={[0, 0, 1]} args={['#ffffff', '#b9b2a0', 1.6]} />
      <directionalLight position={[frame.radiusMm * 2, -frame.radiusMm * 3, frame.radiusMm * 4]} intensity={1.8} />
      {pieces.map((p) => (
        <PieceMesh
          key={p.id}
          piece={p}
          fraction={foldWholeKit || stateOf(p, step) === 'current' ? fraction : 1}
          state={stateOf(p, step)}
        />
      ))}
      {rods.map((r) => (
        <RodMesh
          key={r.partId}
          name={r.partId}
          fromMm={r.fromMm}
          toMm={r.toMm}
          diameterMm={r.diameterMm}
          state={assemblyStepPieceState(step, r.partId)}
        />
      ))}
      <ViewRig frame={frame} actionsRef={actionsRef} viewVersion={viewVersion} />
      <SceneReadySignal foldPercent={foldPercent} viewVersion={viewVersion} onRendered={onRendered} />
    </>
  );
}
