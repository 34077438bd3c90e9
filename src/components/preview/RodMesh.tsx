import { useEffect, useMemo } from 'react';
import { CylinderGeometry, Quaternion, Vector3 } from 'three';
import type { Vec3Mm } from '../../lib/geometry/types';
import type { AssemblyPieceState } from '../../lib/preview/assembly-steps';
import { ROD_MATERIALS } from './piece-materials';

interface Props {
  /** The rod's name (the boom it stands for), for the scene graph. */
  name: string;
  fromMm: Vec3Mm;
  toMm: Vec3Mm;
  /** Drawn diameter, mm at kit scale. */
  diameterMm: number;
  /** Glued on already (wood), at its step (teal, like the current piece), or still to come (ghosted). */
  state: AssemblyPieceState;
}

/** A straw, skewer or dowel standing in for a boom too thin for paper: a plain cylinder from foot to tip. */
export default function RodMesh({ name, fromMm, toMm, diameterMm, state }: Props) {
  const pose = useMemo(() => {
    const from = new Vector3(...fromMm);
    const axis = new Vector3(...toMm).sub(from);
    const length = axis.length();
    const quaternion = new Quaternion().setFromUnitVectors(new Vector3(0, 1, 0), axis.clone().normalize());
    return { position: from.add(axis.multiplyScalar(0.5)), quaternion, length };
  }, [fromMm, toMm]);
  // A geometry object, not a <cylinderGeometry> element: SceneCanvas registers only the classes it needs.
  const geometry = useMemo(
    () => new CylinderGeometry(diameterMm / 2, diameterMm / 2, pose.length, 16),
    [diameterMm, pose.length],
  );
  useEffect(() => () => geometry.dispose(), [geometry]);
  return (
    <mesh
      name={name}
      position={pose.position}
      quaternion={pose.quaternion}
      geometry={geometry}
      material={ROD_MATERIALS[state]}
      renderOrder={state === 'later' ? 1 : 0}
    />
  );
}
