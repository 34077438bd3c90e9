import { useRef } from 'react';
import { useFrame } from '@react-three/fiber';

interface Props {
  /** The fold percent the current frame shows. */
  foldPercent: number;
  /** Called once a frame showing foldPercent is on screen (the next animation frame after it was drawn). */
  onRendered(foldPercent: number, first: boolean): void;
}

/** Reports drawn frames, so tests and the page know when the canvas shows a given fold. */
export default function SceneReadySignal({ foldPercent, onRendered }: Props) {
  const reported = useRef<number | null>(null);
  const first = useRef(true);
  useFrame(() => {
    if (reported.current === foldPercent) return;
    reported.current = foldPercent;
    const isFirst = first.current;
    first.current = false;
    // useFrame runs before the frame is drawn; one animation frame later it has been.
    requestAnimationFrame(() => onRendered(foldPercent, isFirst));
  });
  return null;
}
