import { Line } from '@react-three/drei';
import { arrowLength, type ArrowScale } from '../lib/scales';
import type { Vec3 } from '../lib/series-track';
import { Arrow, SceneLabel } from './scene-parts';
import { sceneColours } from './scene-colours';
import { ViewCanvas } from './view-canvas';

/** Props of BodyView. */
export interface BodyViewProps {
  /** SRP force on the vehicle in body axes (N). */
  forceBodyN: Vec3;
  /** SRP torque about the centre of mass in body axes (N·m). */
  torqueBodyNm: Vec3;
  forceScale: ArrowScale;
  torqueScale: ArrowScale;
  /** Id of the caption that says what is drawn and at what scale. */
  describedBy: string;
}

const AXES: { label: string; dir: [number, number, number] }[] = [
  { label: '+X body', dir: [1, 0, 0] },
  { label: '+Y body', dir: [0, 1, 0] },
  { label: '+Z body', dir: [0, 0, 1] },
];

/** Body axes with the SRP force and torque vectors of the current time, to the printed scales. */
export function BodyView({ forceBodyN, torqueBodyNm, forceScale, torqueScale, describedBy }: BodyViewProps) {
  const forceLength = arrowLength(Math.hypot(...forceBodyN), forceScale);
  const torqueLength = arrowLength(Math.hypot(...torqueBodyNm), torqueScale);
  const tip = (v: Vec3, length: number): [number, number, number] => {
    const n = Math.hypot(...v) || 1;
    return [(v[0] / n) * length, (v[1] / n) * length, (v[2] / n) * length];
  };
  return (
    <ViewCanvas label="Body view" describedBy={describedBy} cameraPosition={[1.9, -2.4, 1.55]} near={0.01} far={100}>
      {AXES.map(({ label, dir }) => (
        <group key={label}>
          <Line points={[[0, 0, 0], dir]} color={sceneColours.inkWash} lineWidth={1.5} />
          <Line points={[[0, 0, 0], [-dir[0] * 0.4, -dir[1] * 0.4, -dir[2] * 0.4]]} color={sceneColours.inkSoft} lineWidth={1} dashed dashSize={0.05} gapSize={0.04} />
          <SceneLabel position={[dir[0] * 1.05, dir[1] * 1.05, dir[2] * 1.05]}>{label}</SceneLabel>
        </group>
      ))}
      <mesh>
        <boxGeometry args={[0.12, 0.12, 0.12]} />
        <meshBasicMaterial color={sceneColours.inkSoft} />
      </mesh>
      <Arrow direction={forceBodyN} length={forceLength} colour={sceneColours.sodium} radius={0.018} />
      {forceLength > 0 && (
        <SceneLabel position={tip(forceBodyN, forceLength + 0.08)} tone="sodium">
          F srp
        </SceneLabel>
      )}
      <Arrow direction={torqueBodyNm} length={torqueLength} colour={sceneColours.sage} radius={0.018} />
      {torqueLength > 0 && (
        <SceneLabel position={tip(torqueBodyNm, torqueLength + 0.08)} tone="sage">
          τ srp
        </SceneLabel>
      )}
    </ViewCanvas>
  );
}
