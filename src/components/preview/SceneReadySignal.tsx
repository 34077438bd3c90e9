import { useRef, type RefObject } from 'react';
import { useFrame } from '@react-three/fiber';

/** What a drawn frame shows: the fold percent and how many view actions had been applied (ViewRig). */
export interface FrameShown {
  foldPercent: number;
  viewVersion: number;
}

interface Props {
  /** The fold percent the current frame shows. */
  foldPercent: number;
  /** The count of view actions ViewRig has applied; a view without one reports 0. */
  viewVersion?: RefObject<number>;
  /** Called once a frame showing a new fold or view is on screen (the next animation frame after it was drawn). */
  onRendered(shown: FrameShown, first: boolean): void;
}

/** Reports drawn frames, so tests and the page know when the canvas shows a given fold or view. */
export default function SceneReadySignal({ foldPercent, viewVersion, onRendered }: Props) {
  const reported = useRef<FrameShown | null>(null);
  useFrame(() => {
    const shown = { foldPercent, viewVersion: viewVersion?.current ?? 0 };
    const last = reported.current;
    if (last && last.foldPercent === shown.foldPercent && last.viewVersion === shown.viewVersion) return;
    reported.current = shown;
    // useFrame runs before the frame is drawn; one animation frame later it has been.
    requestAnimationFrame(() => onRendered(shown, last === null));
  });
  return null;
}
