import type { ReactNode } from 'react';
import { Canvas } from '@react-three/fiber';
import { OrbitControls } from '@react-three/drei';
import { sceneColours } from './scene-colours';
import type { SceneVec } from './scene-parts';

/** Props of ViewCanvas. */
export interface ViewCanvasProps {
  /** Accessible name of the view, e.g. "Orbit view". */
  label: string;
  /** Id of the caption that says what is drawn. */
  describedBy: string;
  /** Camera position (scene units); it looks at the origin with +z up. */
  cameraPosition: SceneVec;
  /** Near and far clipping distances (scene units). */
  near: number;
  far: number;
  children: ReactNode;
}

/**
 * A WebGL view for the playback: drawn on demand (only when something changes), with the drawing
 * buffer kept so that screenshots and headless browsers see the picture; drag to turn, wheel to zoom.
 */
export function ViewCanvas({ label, describedBy, cameraPosition, near, far, children }: ViewCanvasProps) {
  return (
    <Canvas
      role="img"
      aria-label={label}
      aria-describedby={describedBy}
      frameloop="demand"
      dpr={[1, 2]}
      gl={{ preserveDrawingBuffer: true, antialias: true }}
      camera={{ position: cameraPosition as [number, number, number], up: [0, 0, 1], fov: 50, near, far }}
      style={{ background: sceneColours.background }}
    >
      {children}
      <OrbitControls makeDefault enableDamping={false} target={[0, 0, 0]} />
    </Canvas>
  );
}
