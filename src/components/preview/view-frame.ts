import { Box3, Vector3 } from 'three';
import type { Piece } from '../../lib/geometry/types';
import { pieceGeometry } from '../../lib/preview/to-buffer-geometry';

export interface ViewFrame {
  target: [number, number, number];
  /** Where the camera starts and returns on reset, model mm. */
  cameraPosition: [number, number, number];
  /** Radius of the sphere round everything shown flat or folded, mm. */
  radiusMm: number;
}

/** Vertical field of view of the preview camera, degrees. */
export const VIEW_FOV_DEG = 40;

/**
 * A camera placement that shows the pieces both flat and folded: looking at the centre of their joint
 * bounding box from the front-right and a little above, far enough for the bounding sphere to fit the view.
 */
export function viewFrame(pieces: readonly Piece[]): ViewFrame {
  const box = new Box3();
  for (const piece of pieces) {
    for (const f of [0, 1]) {
      const { surface, edges } = pieceGeometry(piece, f);
      surface.computeBoundingBox();
      box.union(surface.boundingBox!);
      surface.dispose();
      edges.dispose();
    }
  }
  return viewFrameOfBox(box);
}

/** The preview camera for a frame (z up), as @react-three/fiber's `camera` prop takes it. */
export function viewCamera(frame: ViewFrame) {
  return {
    fov: VIEW_FOV_DEG,
    up: [0, 0, 1] as [number, number, number],
    position: frame.cameraPosition,
    near: frame.radiusMm / 100,
    far: frame.radiusMm * 100,
  };
}

/** The same camera placement for points (any unit: the frame comes out in the points' unit). */
export function viewFrameOfPoints(points: readonly (readonly [number, number, number])[]): ViewFrame {
  return viewFrameOfBox(new Box3().setFromPoints(points.map((p) => new Vector3(...p))));
}

function viewFrameOfBox(box: Box3): ViewFrame {
  if (box.isEmpty()) return { target: [0, 0, 0], cameraPosition: [0, -100, 50], radiusMm: 50 };
  const centre = box.getCenter(new Vector3());
  const radiusMm = Math.max(1, box.getSize(new Vector3()).length() / 2);
  const distance = (radiusMm / Math.sin(((VIEW_FOV_DEG / 2) * Math.PI) / 180)) * 1.05;
  const direction = new Vector3(0.55, -0.75, 0.38).normalize();
  const camera = centre.clone().addScaledVector(direction, distance);
  return { target: centre.toArray(), cameraPosition: camera.toArray(), radiusMm };
}
