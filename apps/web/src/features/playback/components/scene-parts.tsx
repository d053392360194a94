import type { ReactNode } from 'react';
import { Html } from '@react-three/drei';

import type { SceneVec } from '../../../components/three/scene-arrows';

export type { SceneVec } from '../../../components/three/scene-arrows';
export { Arrow } from '../../../components/three/scene-arrows';

/** Props of SceneLabel. */
export interface SceneLabelProps {
  position: SceneVec;
  children: ReactNode;
  /** Text colour class; paper on ink unless given. */
  tone?: 'paper' | 'sodium' | 'sage';
}

const toneClass = { paper: 'text-paper', sodium: 'text-sodium-wash', sage: 'text-sage-wash' } as const;

/** A small text label pinned to a point of the scene (a DOM overlay: no font is fetched). */
export function SceneLabel({ position, children, tone = 'paper' }: SceneLabelProps) {
  return (
    <Html position={position as [number, number, number]} zIndexRange={[10, 0]} style={{ pointerEvents: 'none' }}>
      <span
        aria-hidden="true"
        className={`block -translate-y-1/2 translate-x-1.5 text-[11px] leading-none font-medium whitespace-nowrap ${toneClass[tone]}`}
      >
        {children}
      </span>
    </Html>
  );
}
