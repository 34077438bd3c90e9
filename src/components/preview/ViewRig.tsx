import { useEffect, useRef, type RefObject } from 'react';
import { useThree } from '@react-three/fiber';
// The file itself, not drei's barrel: the barrel drags in dynamic-import chunks (video, face tracking) we never load.
import { OrbitControls } from '@react-three/drei/core/OrbitControls';
import type { OrbitControls as OrbitControlsImpl } from 'three-stdlib';
import { Vector3 } from 'three';
import type { ViewActions } from '../../lib/preview/view-keys';
import type { ViewFrame } from './view-frame';

// Scratch vectors reused by every action: nothing is allocated per keystroke or per frame.
const UP = new Vector3(0, 0, 1);
const offset = new Vector3();
const side = new Vector3();
const ELEVATION_LIMIT_RAD = 0.05;

interface Props {
  frame: ViewFrame;
  actionsRef: RefObject<ViewActions | null>;
  /** Counted up by every view action applied (keys and buttons), for SceneReadySignal to report. */
  viewVersion?: RefObject<number>;
}

/** Orbit controls (drag, wheel, pinch) plus the same moves as actions for the keyboard and the buttons. */
export default function ViewRig({ frame, actionsRef, viewVersion }: Props) {
  const controls = useRef<OrbitControlsImpl>(null);
  const camera = useThree((s) => s.camera);
  const invalidate = useThree((s) => s.invalidate);

  useEffect(() => {
    const c = controls.current;
    if (!c) return;
    const apply = () => {
      camera.position.copy(c.target).add(offset);
      c.update();
      if (viewVersion) viewVersion.current += 1;
      invalidate();
    };
    actionsRef.current = {
      rotate(azimuthRad, elevationRad) {
        offset.copy(camera.position).sub(c.target).applyAxisAngle(UP, azimuthRad);
        // Keep the camera off the poles so "up" stays meaningful; turning about offset × up by a positive
        // angle moves the camera toward up, so the turn is the drop in polar angle.
        const polar = offset.angleTo(UP);
        const next = Math.min(Math.PI - ELEVATION_LIMIT_RAD, Math.max(ELEVATION_LIMIT_RAD, polar - elevationRad));
        side.crossVectors(offset, UP).normalize();
        if (side.lengthSq() > 0) offset.applyAxisAngle(side, polar - next);
        apply();
      },
      zoom(factor) {
        offset.copy(camera.position).sub(c.target);
        const length = Math.min(c.maxDistance, Math.max(c.minDistance, offset.length() * factor));
        offset.setLength(length);
        apply();
      },
      reset() {
        c.target.set(...frame.target);
        offset.set(...frame.cameraPosition).sub(c.target);
        apply();
      },
    };
    return () => {
      actionsRef.current = null;
    };
  }, [camera, invalidate, frame, actionsRef, viewVersion]);

  return (
    <OrbitControls
      ref={controls}
      target={frame.target}
      minDistance={frame.radiusMm * 0.2}
      maxDistance={frame.radiusMm * 20}
      enableDamping={false}
    />
  );
}
