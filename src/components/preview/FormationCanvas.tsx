import { useCallback, useEffect, useMemo, useRef } from 'react';
import {
  ArrowHelper,
  BufferGeometry,
  Color,
  Float32BufferAttribute,
  GridHelper,
  LineBasicMaterial,
  MeshStandardMaterial,
  SphereGeometry,
  Vector3,
} from 'three';
import { formationArrow, formationSizeCm, type FormationDetail } from '../../lib/preview/formation-event';
import type { ViewActions } from '../../lib/preview/view-keys';
import SceneCanvas from './SceneCanvas';
import SceneReadySignal, { type FrameShown } from './SceneReadySignal';
import ViewRig from './ViewRig';
import { viewCamera, viewFrameOfPoints } from './view-frame';

/** Edges are drawn between every pair of sensors up to this many (a tetrahedron has 6). */
const EDGES_MAX_POINTS = 8;

/**
 * The WebGL formation view (loaded lazily, with three.js), in cm: sensors, the edges between them, a grid
 * on z = 0 for the table and the gradient arrow. Sets data-scene-ready after its first frame and
 * data-arrow ("shown" or "none") for tests and readers of the page.
 */
export default function FormationCanvas({ formation }: { formation: FormationDetail }) {
  const wrapper = useRef<HTMLDivElement>(null);
  const actionsRef = useRef<ViewActions | null>(null);
  const positions = useMemo(() => formation.points.map((p) => p.positionCm), [formation]);
  const size = Math.max(1, formationSizeCm(formation.points));
  const arrow = formationArrow(formation.gradient, size * 0.6);
  const frame = useMemo(
    () => viewFrameOfPoints(arrow ? [...positions, arrow.toCm] : positions),
    [positions, arrow?.toCm[0], arrow?.toCm[1], arrow?.toCm[2]],
  );
  const version = useRef(0);
  const last = useRef<FormationDetail | null>(null);
  if (last.current !== formation) {
    last.current = formation;
    version.current += 1;
  }
  const objects = useMemo(() => {
    const ball = new SphereGeometry(size * 0.03, 24, 16);
    const ballMaterial = new MeshStandardMaterial({ color: new Color('#0d6b62') });
    const pairs: number[] = [];
    if (positions.length <= EDGES_MAX_POINTS)
      positions.forEach((a, i) => positions.slice(i + 1).forEach((b) => pairs.push(...a, ...b)));
    const edges = new BufferGeometry();
    edges.setAttribute('position', new Float32BufferAttribute(pairs, 3));
    const edgeMaterial = new LineBasicMaterial({ color: new Color('#46505f') });
    const grid = new GridHelper(size * 2, 10, '#b9b2a0', '#ddd6c4');
    grid.rotation.x = Math.PI / 2;
    grid.position.set(frame.target[0], frame.target[1], 0);
    const helper = arrow
      ? new ArrowHelper(
          new Vector3(...arrow.toCm).sub(new Vector3(...arrow.fromCm)).normalize(),
          new Vector3(...arrow.fromCm),
          size * 0.6,
          '#b3261e',
          size * 0.12,
          size * 0.06,
        )
      : null;
    return { ball, ballMaterial, edges, edgeMaterial, grid, helper };
  }, [positions, size, arrow?.toCm[0], arrow?.toCm[1], arrow?.toCm[2], frame]);
  useEffect(
    () => () => {
      objects.ball.dispose();
      objects.ballMaterial.dispose();
      objects.edges.dispose();
      objects.edgeMaterial.dispose();
      objects.grid.dispose();
      objects.helper?.dispose();
    },
    [objects],
  );
  const onRendered = useCallback((_shown: FrameShown, first: boolean) => {
    const el = wrapper.current;
    if (!el) return;
    if (first) el.dataset.sceneReady = 'true';
  }, []);
  return (
    <div
      ref={wrapper}
      role="img"
      aria-label="3D view of the sensors and the gradient arrow"
      data-testid="formation-canvas"
      data-arrow={arrow ? 'shown' : 'none'}
      className="h-full w-full cursor-grab active:cursor-grabbing"
    >
      <SceneCanvas frameloop="demand" dpr={[1, 2]} camera={viewCamera(frame)}>
        <color attach="background" args={['#fbf9f4']} />
        <hemisphereLight position={[0, 0, 1]} args={['#ffffff', '#b9b2a0', 1.6]} />
        <directionalLight position={[size * 2, -size * 3, size * 4]} intensity={1.8} />
        {positions.map((p, i) => (
          <mesh key={i} geometry={objects.ball} material={objects.ballMaterial} position={p} />
        ))}
        <lineSegments geometry={objects.edges} material={objects.edgeMaterial} />
        <primitive object={objects.grid} />
        {objects.helper && <primitive object={objects.helper} />}
        <ViewRig frame={frame} actionsRef={actionsRef} />
        <SceneReadySignal foldPercent={version.current} onRendered={onRendered} />
      </SceneCanvas>
    </div>
  );
}
