import { useMemo } from 'react';
import { Html } from '@react-three/drei';
import { Quaternion, Vector3 } from 'three';

/** [x, y, z] in scene units. */
export type SceneVec = readonly [number, number, number];

const UP = new Vector3(0, 1, 0);

/** Props of Arrow. */
export interface ArrowProps {
  /** Tail (scene units). */
  origin?: SceneVec;
  /** Direction (any length; normalised here). */
  direction: SceneVec;
  /** Tail to tip (scene units); nothing is drawn at 0. */
  length: number;
  colour: string;
  /** Shaft radius (scene units). */
  radius: number;
  /** Drawn on top of everything else (for arrows inside bodies). */
  overlay?: boolean;
}

/** A solid arrow (cylinder shaft and cone head) from `origin` along `direction`. */
export function Arrow({ origin = [0, 0, 0], direction, length, colour, radius, overlay = false }: ArrowProps) {
  const [dx, dy, dz] = direction;
  const quaternion = useMemo(() => {
    const dir = new Vector3(dx, dy, dz);
    if (dir.lengthSq() === 0) return null;
    return new Quaternion().setFromUnitVectors(UP, dir.normalize());
  }, [dx, dy, dz]);
  if (!quaternion || !(length > 0) || !Number.isFinite(length)) return null;
  const head = Math.min(length * 0.35, radius * 7);
  const shaft = length - head;
  return (
    <group position={origin as [number, number, number]} quaternion={quaternion} renderOrder={overlay ? 10 : 0}>
      <mesh position={[0, shaft / 2, 0]}>
        <cylinderGeometry args={[radius, radius, shaft, 12]} />
        <meshBasicMaterial color={colour} depthTest={!overlay} />
      </mesh>
      <mesh position={[0, shaft + head / 2, 0]}>
        <coneGeometry args={[radius * 2.6, head, 16]} />
        <meshBasicMaterial color={colour} depthTest={!overlay} />
      </mesh>
    </group>
  );
}

/** A body-axis name (x, y, z) pinned next to an axis tip (a DOM overlay: no font is fetched). */
export function AxisLabel({ position, text }: { position: SceneVec; text: string }) {
  return (
    <Html center position={[position[0], position[1], position[2]]} style={{ pointerEvents: 'none' }}>
      <span className="font-mono text-[11px] text-ink-soft">{text}</span>
    </Html>
  );
}
