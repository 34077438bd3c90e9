import { useEffect, useLayoutEffect, useRef, useState, type ReactNode } from 'react';
import { createRoot, events, extend, type ReconcilerRoot, type RenderProps } from '@react-three/fiber';
import { Color, DirectionalLight, Group, HemisphereLight, LineSegments, Mesh } from 'three';

// Only the three.js classes the scene writes as JSX. @react-three/fiber's own <Canvas> registers the whole
// THREE namespace, which keeps every class of three.js in the bundle (about 60 kB gzip more).
extend({ Color, DirectionalLight, Group, HemisphereLight, LineSegments, Mesh });

type Size = { width: number; height: number; top: number; left: number };
type Props = Pick<RenderProps<HTMLCanvasElement>, 'camera' | 'dpr' | 'frameloop'> & { children: ReactNode };

/**
 * A WebGL canvas filling its parent that renders three.js JSX children through @react-three/fiber's
 * createRoot, with pointer events on the wrapper and a resize observer. A failure to start WebGL is thrown
 * to the nearest error boundary.
 */
export default function SceneCanvas({ children, camera, dpr, frameloop }: Props) {
  const wrapper = useRef<HTMLDivElement>(null);
  const canvas = useRef<HTMLCanvasElement>(null);
  const root = useRef<ReconcilerRoot<HTMLCanvasElement> | null>(null);
  const [size, setSize] = useState<Size | null>(null);
  const [failure, setFailure] = useState<unknown>(null);
  if (failure) throw failure;

  useLayoutEffect(() => {
    const el = wrapper.current!;
    const measure = () => {
      const r = el.getBoundingClientRect();
      setSize((s) =>
        s && s.width === r.width && s.height === r.height && s.top === r.top && s.left === r.left
          ? s
          : { width: r.width, height: r.height, top: r.top, left: r.left },
      );
    };
    measure();
    const observer = new ResizeObserver(measure);
    observer.observe(el);
    return () => observer.disconnect();
  }, []);

  useLayoutEffect(() => {
    if (!size || size.width === 0 || size.height === 0) return;
    root.current ??= createRoot(canvas.current!);
    const current = root.current;
    current
      .configure({
        camera,
        dpr,
        frameloop,
        size,
        events,
        onCreated: (state) => state.events.connect?.(wrapper.current),
      })
      .then(() => current.render(children))
      .catch(setFailure);
  });

  useEffect(
    () => () => {
      root.current?.unmount();
      root.current = null;
    },
    [],
  );

  return (
    <div
      ref={wrapper}
      aria-hidden="true"
      style={{ position: 'relative', width: '100%', height: '100%', overflow: 'hidden' }}
    >
      <canvas ref={canvas} style={{ display: 'block' }} />
    </div>
  );
}
