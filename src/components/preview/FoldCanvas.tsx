import { useCallback, useMemo, useRef, type KeyboardEvent, type RefObject } from 'react';
import type { Piece } from '../../lib/geometry/types';
import type { AssemblyRod, AssemblyStep } from '../../lib/preview/assembly-steps';
import FoldScene from './FoldScene';
import type { FrameShown } from './SceneReadySignal';
import SceneCanvas from './SceneCanvas';
import { viewCommandRun, viewKeyCommand, type ViewActions } from '../../lib/preview/view-keys';
import { viewCamera, viewFrame } from './view-frame';

export interface FoldCanvasProps {
  pieces: readonly Piece[];
  rods: readonly AssemblyRod[];
  foldPercent: number;
  foldWholeKit: boolean;
  /** The step shown: its piece folds by the slider, earlier pieces stand built, later ones are ghosted. */
  step: AssemblyStep | undefined;
  actionsRef: RefObject<ViewActions | null>;
  /** Accessible name of the view region. */
  label: string;
  /** id of the element listing the view's keys. */
  hintId: string;
}

/**
 * The WebGL view (loaded lazily, with three.js): a focusable region whose keys orbit, zoom and reset; it
 * sets data-scene-ready and fires the window event 'kitwright:scene-ready' after its first frame. Once a
 * frame is on screen it sets data-rendered-fold to the fold percent it shows and data-rendered-view to the
 * number of view actions (keys and buttons) applied before it, so tests wait for the frame, not a delay.
 */
export default function FoldCanvas({
  pieces,
  rods,
  foldPercent,
  foldWholeKit,
  step,
  actionsRef,
  label,
  hintId,
}: FoldCanvasProps) {
  const wrapper = useRef<HTMLDivElement>(null);
  const viewVersion = useRef(0);
  const frame = useMemo(() => viewFrame(pieces), [pieces]);
  const onKeyDown = useCallback(
    (e: KeyboardEvent<HTMLDivElement>) => {
      if (e.altKey || e.ctrlKey || e.metaKey) return;
      const command = viewKeyCommand(e.key);
      if (!command || !actionsRef.current) return;
      e.preventDefault();
      viewCommandRun(actionsRef.current, command);
    },
    [actionsRef],
  );
  const onRendered = useCallback((shown: FrameShown, first: boolean) => {
    const el = wrapper.current;
    if (!el) return;
    el.dataset.renderedFold = String(shown.foldPercent);
    el.dataset.renderedView = String(shown.viewVersion);
    if (first) {
      el.dataset.sceneReady = 'true';
      window.dispatchEvent(new CustomEvent('kitwright:scene-ready', { detail: { foldPercent: shown.foldPercent } }));
    }
  }, []);
  return (
    <div
      ref={wrapper}
      role="region"
      aria-label={label}
      aria-describedby={hintId}
      tabIndex={0}
      onKeyDown={onKeyDown}
      data-testid="fold-canvas"
      className="h-full w-full cursor-grab rounded-lg active:cursor-grabbing"
    >
      <SceneCanvas frameloop="demand" dpr={[1, 2]} camera={viewCamera(frame)}>
        <FoldScene
          pieces={pieces}
          rods={rods}
          foldPercent={foldPercent}
          foldWholeKit={foldWholeKit}
          step={step}
          frame={frame}
          actionsRef={actionsRef}
          viewVersion={viewVersion}
          onRendered={onRendered}
        />
      </SceneCanvas>
    </div>
  );
}
