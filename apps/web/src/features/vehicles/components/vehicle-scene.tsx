import { useEffect, useMemo, useState } from 'react';
import { Canvas, useThree } from '@react-three/fiber';
import { Edges, Html, OrbitControls } from '@react-three/drei';
import { DoubleSide, Matrix4, Quaternion, Vector3, BackSide, FrontSide } from 'three';
import type { PreviewSurface, SrpPreview } from '../lib/srp-preview';
import { arrowColours, opticsSwatches } from '../lib/optics-palette';
import { Arrow, AxisLabel } from '../../../components/three/scene-arrows';

/*
 * The 3D view of a vehicle (three + @react-three/fiber, loaded lazily). The body frame is drawn
 * as it is: +z up on screen. Plates are squares of their area at their centroids, front and back
 * coloured by optics; arrows show normals, per-plate SRP forces, the total force and the torque
 * about the centre of mass. Arrow lengths are scaled to the vehicle's size; the numbers are in the
 * panel beside it.
 */

/** Props of VehicleScene. */
export interface VehicleSceneProps {
  preview: SrpPreview | null;
  /** Accessible name of the canvas. */
  label: string;
  /** Index of the plate under the pointer (null: none). */
  onHoverPlate?: (index: number | null) => void;
  /** Plate to highlight. */
  highlighted?: number | null;
}

type V3 = readonly [number, number, number];

const length = (v: V3) => Math.hypot(v[0], v[1], v[2]);

/** Where the vehicle is and how big: the centre of its surfaces' bounding box and a radius (m). */
function frameOf(preview: SrpPreview | null): { centre: V3; radius: number } {
  if (!preview || preview.surfaces.length === 0) return { centre: [0, 0, 0], radius: 1.5 };
  if (preview.kind === 'cannonball') {
    // Room around the sphere for the force arrow to stick out of it.
    return { centre: preview.centreOfMassM, radius: Math.max(1, preview.cannonballRadiusM * 1.9) };
  }
  const min = [Infinity, Infinity, Infinity];
  const max = [-Infinity, -Infinity, -Infinity];
  for (const s of preview.surfaces) {
    const half = Math.sqrt(s.areaM2) / 2;
    for (let k = 0; k < 3; k += 1) {
      min[k] = Math.min(min[k]!, s.centroidM[k]! - half);
      max[k] = Math.max(max[k]!, s.centroidM[k]! + half);
    }
  }
  for (let k = 0; k < 3; k += 1) {
    min[k] = Math.min(min[k]!, preview.centreOfMassM[k]!);
    max[k] = Math.max(max[k]!, preview.centreOfMassM[k]!);
  }
  const centre: V3 = [(min[0]! + max[0]!) / 2, (min[1]! + max[1]!) / 2, (min[2]! + max[2]!) / 2];
  const radius = Math.max(1, Math.hypot(max[0]! - min[0]!, max[1]! - min[1]!, max[2]! - min[2]!) / 2);
  return { centre, radius };
}

/** The rotation that carries +z onto `normal` and +y onto the in-plane direction nearest `up`. */
function plateQuaternion(normal: V3, up: V3 | null): Quaternion {
  const z = new Vector3(...normal).normalize();
  let ref = up ? new Vector3(...up) : new Vector3(0, 0, 1);
  if (Math.abs(ref.clone().normalize().dot(z)) > 0.99) ref = new Vector3(1, 0, 0);
  if (Math.abs(ref.clone().normalize().dot(z)) > 0.99) ref = new Vector3(0, 1, 0);
  const y = ref.sub(z.clone().multiplyScalar(ref.dot(z))).normalize();
  const x = new Vector3().crossVectors(y, z).normalize();
  return new Quaternion().setFromRotationMatrix(new Matrix4().makeBasis(x, y, z));
}

function Plate({
  surface,
  index,
  highlighted,
  onHover,
}: {
  surface: PreviewSurface;
  index: number;
  highlighted: boolean;
  onHover?: ((index: number | null) => void) | undefined;
}) {
  const side = Math.sqrt(surface.areaM2);
  const quaternion = useMemo(() => plateQuaternion(surface.normal, surface.trackingAxis), [surface.normal, surface.trackingAxis]);
  const front = opticsSwatches[surface.front].colour;
  const back = opticsSwatches[surface.back].colour;
  const hover = onHover
    ? {
        onPointerOver: (e: { stopPropagation: () => void }) => {
          e.stopPropagation();
          onHover(surface.plateIndex ?? index);
        },
        onPointerOut: () => onHover(null),
      }
    : {};
  return (
    <group position={[surface.centroidM[0], surface.centroidM[1], surface.centroidM[2]]} quaternion={quaternion}>
      <mesh {...hover}>
        <planeGeometry args={[side, side]} />
        <meshStandardMaterial color={front} side={FrontSide} roughness={0.55} metalness={0.05} />
        <Edges color={highlighted ? arrowColours.plateForce : '#10282c'} lineWidth={highlighted ? 2 : 1} />
      </mesh>
      <mesh>
        <planeGeometry args={[side, side]} />
        <meshStandardMaterial color={back} side={BackSide} roughness={0.8} />
      </mesh>
      {highlighted && (
        <Html center position={[0, side / 2 + 0.1, 0]} style={{ pointerEvents: 'none' }}>
          <span className="rounded bg-ink px-1.5 py-0.5 text-xs whitespace-nowrap text-paper">{surface.name}</span>
        </Html>
      )}
    </group>
  );
}

/** Moves the camera and the orbit target when the vehicle's size or place changes a lot. */
function CameraFit({ centre, radius }: { centre: V3; radius: number }) {
  const camera = useThree((s) => s.camera);
  const controls = useThree((s) => s.controls) as unknown as { target: Vector3; update: () => void } | null;
  const invalidate = useThree((s) => s.invalidate);
  // Buckets of the radius (factors of 1.5) so that typing does not make the camera jump.
  const bucket = Math.round(Math.log(radius) / Math.log(1.5));
  const [cx, cy, cz] = centre.map((c) => Math.round(c / (radius * 0.5)));
  useEffect(() => {
    const distance = radius * 3.0;
    const dir = new Vector3(1.25, -0.95, 0.75).normalize();
    camera.up.set(0, 0, 1);
    camera.position.set(centre[0] + dir.x * distance, centre[1] + dir.y * distance, centre[2] + dir.z * distance);
    camera.near = radius / 100;
    camera.far = radius * 100;
    camera.updateProjectionMatrix();
    camera.lookAt(centre[0], centre[1], centre[2]);
    if (controls) {
      controls.target.set(centre[0], centre[1], centre[2]);
      controls.update();
    }
    invalidate();
    // Keyed on the buckets on purpose: small edits keep the user’s view.
  }, [bucket, cx, cy, cz, camera, controls, invalidate]);
  return null;
}

function SceneContent({ preview, onHoverPlate, highlighted }: Omit<VehicleSceneProps, 'label'>) {
  const { centre, radius } = frameOf(preview);
  const sun = preview?.sunDirBody ?? ([0.7, 0.5, 0.5] as V3);
  const sunPosition: V3 = [centre[0] + sun[0] * radius * 1.2, centre[1] + sun[1] * radius * 1.2, centre[2] + sun[2] * radius * 1.2];
  const thin = radius * 0.012;

  // One scale for every force arrow (total the longest at 0.9 radius), one for the torque.
  const forceScale = useMemo(() => {
    if (!preview) return 0;
    let max = length(preview.forceN);
    for (const s of preview.surfaces) max = Math.max(max, length(s.forceN));
    return max > 0 ? (radius * 0.9) / max : 0;
  }, [preview, radius]);
  const torque = preview ? length(preview.torqueNm) : 0;
  const com = preview?.centreOfMassM ?? ([0, 0, 0] as V3);
  const axisLength = radius * 0.45;

  return (
    <>
      <ambientLight intensity={0.9} />
      <directionalLight position={[sunPosition[0], sunPosition[1], sunPosition[2]]} intensity={2.4} />
      <CameraFit centre={centre} radius={radius} />
      <OrbitControls makeDefault enableDamping={false} />

      {/* body axes at the origin */}
      <Arrow origin={[0, 0, 0]} direction={[1, 0, 0]} length={axisLength} colour="#9a4a3c" radius={thin * 0.6} />
      <Arrow origin={[0, 0, 0]} direction={[0, 1, 0]} length={axisLength} colour="#4d5e43" radius={thin * 0.6} />
      <Arrow origin={[0, 0, 0]} direction={[0, 0, 1]} length={axisLength} colour="#2e4a7a" radius={thin * 0.6} />
      <AxisLabel position={[axisLength * 1.15, 0, 0]} text="x" />
      <AxisLabel position={[0, axisLength * 1.15, 0]} text="y" />
      <AxisLabel position={[0, 0, axisLength * 1.15]} text="z" />

      {/* the Sun, off along its direction */}
      <mesh position={[sunPosition[0], sunPosition[1], sunPosition[2]]}>
        <sphereGeometry args={[radius * 0.09, 20, 14]} />
        <meshBasicMaterial color={arrowColours.sun} />
      </mesh>
      <Arrow
        origin={[sunPosition[0], sunPosition[1], sunPosition[2]]}
        direction={[-sun[0], -sun[1], -sun[2]]}
        length={radius * 0.45}
        colour={arrowColours.sun}
        radius={thin}
      />

      {preview && (
        <>
          {preview.kind === 'cannonball' ? (
            <mesh position={[com[0], com[1], com[2]]}>
              <sphereGeometry args={[preview.cannonballRadiusM, 40, 24]} />
              <meshStandardMaterial color={opticsSwatches.cannonball.colour} roughness={0.6} side={DoubleSide} transparent opacity={0.55} depthWrite={false} />
            </mesh>
          ) : (
            preview.surfaces.map((s, i) => (
              <Plate key={`${s.name}-${i}`} surface={s} index={i} highlighted={highlighted === (s.plateIndex ?? i)} onHover={onHoverPlate} />
            ))
          )}
          {preview.kind !== 'cannonball' &&
            preview.surfaces.map((s, i) => (
              <group key={`arrows-${s.name}-${i}`}>
                <Arrow origin={s.centroidM} direction={s.normal} length={Math.max(Math.sqrt(s.areaM2) * 0.35, radius * 0.08)} colour={arrowColours.normal} radius={thin * 0.7} />
                {preview.kind === 'plates' && (
                  <Arrow origin={s.centroidM} direction={s.forceN} length={length(s.forceN) * forceScale} colour={arrowColours.plateForce} radius={thin} />
                )}
              </group>
            ))}
          {/* centre of mass, total force and torque about it */}
          <mesh position={[com[0], com[1], com[2]]}>
            <sphereGeometry args={[radius * 0.035, 16, 12]} />
            <meshBasicMaterial color="#10282c" />
          </mesh>
          <Arrow origin={com} direction={preview.forceN} length={length(preview.forceN) * forceScale} colour={arrowColours.totalForce} radius={thin * 1.6} />
          <Arrow origin={com} direction={preview.torqueNm} length={torque > 0 ? radius * 0.6 : 0} colour={arrowColours.torque} radius={thin * 1.3} />
        </>
      )}
    </>
  );
}

/** The canvas: renders in headless Chromium (SwiftShader) and keeps its pixels for a test to read back. */
export default function VehicleScene({ preview, label, onHoverPlate, highlighted }: VehicleSceneProps) {
  const [canvas, setCanvas] = useState<HTMLCanvasElement | null>(null);
  useEffect(() => {
    if (!canvas) return;
    canvas.setAttribute('role', 'img');
    canvas.setAttribute('aria-label', label);
  }, [canvas, label]);
  return (
    <Canvas
      ref={setCanvas}
      frameloop="demand"
      dpr={[1, 2]}
      gl={{ preserveDrawingBuffer: true, antialias: true }}
      camera={{ fov: 40, position: [5, -3.8, 3], up: [0, 0, 1] }}
      fallback={<span>{label}: WebGL is not available in this browser.</span>}
    >
      <SceneContent preview={preview} onHoverPlate={onHoverPlate} highlighted={highlighted} />
    </Canvas>
  );
}
