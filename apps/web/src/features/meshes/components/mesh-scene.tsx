import { useEffect, useLayoutEffect, useMemo, useRef, useState } from 'react';
import { Canvas, useThree } from '@react-three/fiber';
import { OrbitControls } from '@react-three/drei';
import { sceneArrowColours as axisColours } from '../lib/facet-colours';
import { BufferAttribute, BufferGeometry, Color, DoubleSide, EdgesGeometry, SRGBColorSpace, Vector3 } from 'three';
import { Arrow, AxisLabel } from '../../../components/three/scene-arrows';

/*
 * The 3D view of a mesh (three + @react-three/fiber, loaded lazily): the triangles as they are in
 * the body frame (+z up on screen), each facet in the colour it is given (lit, shadowed, turned
 * away); the body axes at the origin and an arrow of sunlight coming in along the Sun direction.
 * Plain materials only (MeshBasicMaterial with vertex colours), so it renders in headless
 * Chromium's software WebGL.
 */

/** Props of MeshScene. */
export interface MeshSceneProps {
  /** 9 per triangle (m, body frame). */
  positions: Float32Array;
  /** sRGB 0..1 per vertex (9 per triangle). */
  colours: Float32Array;
  /** Unit vector towards the Sun, body frame. */
  sunDir: readonly [number, number, number];
  /** Accessible name of the canvas. */
  label: string;
  /** Draw the feature edges (off for very large meshes). */
  edges: boolean;
}

type V3 = readonly [number, number, number];

function frameOf(positions: Float32Array): { centre: V3; radius: number } {
  if (positions.length === 0) return { centre: [0, 0, 0], radius: 1 };
  const min = [Infinity, Infinity, Infinity];
  const max = [-Infinity, -Infinity, -Infinity];
  for (let i = 0; i < positions.length; i += 3) {
    for (let k = 0; k < 3; k += 1) {
      const v = positions[i + k]!;
      if (v < min[k]!) min[k] = v;
      if (v > max[k]!) max[k] = v;
    }
  }
  // The origin (body axes) is in the frame too.
  for (let k = 0; k < 3; k += 1) {
    min[k] = Math.min(min[k]!, 0);
    max[k] = Math.max(max[k]!, 0);
  }
  const centre: V3 = [(min[0]! + max[0]!) / 2, (min[1]! + max[1]!) / 2, (min[2]! + max[2]!) / 2];
  const radius = Math.max(1e-3, Math.hypot(max[0]! - min[0]!, max[1]! - min[1]!, max[2]! - min[2]!) / 2);
  return { centre, radius };
}

/** Puts the camera on the mesh once (and when the mesh changes), looking at its centre with +z up. */
function CameraFit({ centre, radius }: { centre: V3; radius: number }) {
  const camera = useThree((s) => s.camera);
  const controls = useThree((s) => s.controls) as unknown as { target: Vector3; update: () => void } | null;
  const invalidate = useThree((s) => s.invalidate);
  useEffect(() => {
    const distance = radius * 3.1;
    const dir = new Vector3(1.2, -1.0, 0.8).normalize();
    camera.up.set(0, 0, 1);
    camera.position.set(centre[0] + dir.x * distance, centre[1] + dir.y * distance, centre[2] + dir.z * distance);
    camera.near = radius / 200;
    camera.far = radius * 200;
    camera.updateProjectionMatrix();
    camera.lookAt(centre[0], centre[1], centre[2]);
    if (controls) {
      controls.target.set(centre[0], centre[1], centre[2]);
      controls.update();
    }
    invalidate();
  }, [centre, radius, camera, controls, invalidate]);
  return null;
}

function MeshBody({ positions, colours, edges }: { positions: Float32Array; colours: Float32Array; edges: boolean }) {
  const invalidate = useThree((s) => s.invalidate);
  const geometry = useMemo(() => {
    const g = new BufferGeometry();
    g.setAttribute('position', new BufferAttribute(positions, 3));
    g.setAttribute('color', new BufferAttribute(new Float32Array(positions.length), 3));
    g.computeBoundingSphere();
    return g;
  }, [positions]);
  const edgeGeometry = useMemo(() => (edges ? new EdgesGeometry(geometry, 25) : null), [geometry, edges]);
  useEffect(() => () => geometry.dispose(), [geometry]);
  useEffect(() => () => edgeGeometry?.dispose(), [edgeGeometry]);
  // Colours arrive in sRGB; three works in linear and converts on output.
  const scratch = useRef(new Color());
  useLayoutEffect(() => {
    const attribute = geometry.getAttribute('color') as BufferAttribute;
    const target = attribute.array as Float32Array;
    const c = scratch.current;
    for (let i = 0; i + 2 < colours.length && i + 2 < target.length; i += 3) {
      c.setRGB(colours[i]!, colours[i + 1]!, colours[i + 2]!, SRGBColorSpace);
      target[i] = c.r;
      target[i + 1] = c.g;
      target[i + 2] = c.b;
    }
    attribute.needsUpdate = true;
    invalidate();
  }, [colours, geometry, invalidate]);
  return (
    <>
      <mesh geometry={geometry}>
        <meshBasicMaterial vertexColors side={DoubleSide} polygonOffset polygonOffsetFactor={1} polygonOffsetUnits={1} />
      </mesh>
      {edgeGeometry && (
        <lineSegments geometry={edgeGeometry}>
          <lineBasicMaterial color="#10282c" transparent opacity={0.35} />
        </lineSegments>
      )}
    </>
  );
}

function SceneContent({ positions, colours, sunDir, edges }: Omit<MeshSceneProps, 'label'>) {
  const { centre, radius } = useMemo(() => frameOf(positions), [positions]);
  const thin = radius * 0.01;
  const axisLength = radius * 0.5;
  const sunStart: V3 = [centre[0] + sunDir[0] * radius * 1.5, centre[1] + sunDir[1] * radius * 1.5, centre[2] + sunDir[2] * radius * 1.5];
  return (
    <>
      <CameraFit centre={centre} radius={radius} />
      <OrbitControls makeDefault enableDamping={false} />
      <MeshBody positions={positions} colours={colours} edges={edges} />

      <Arrow origin={[0, 0, 0]} direction={[1, 0, 0]} length={axisLength} colour={axisColours.x} radius={thin * 0.7} />
      <Arrow origin={[0, 0, 0]} direction={[0, 1, 0]} length={axisLength} colour={axisColours.y} radius={thin * 0.7} />
      <Arrow origin={[0, 0, 0]} direction={[0, 0, 1]} length={axisLength} colour={axisColours.z} radius={thin * 0.7} />
      <AxisLabel position={[axisLength * 1.15, 0, 0]} text="x" />
      <AxisLabel position={[0, axisLength * 1.15, 0]} text="y" />
      <AxisLabel position={[0, 0, axisLength * 1.15]} text="z" />

      {/* sunlight: a small Sun off along its direction and an arrow of light coming in */}
      <mesh position={[sunStart[0], sunStart[1], sunStart[2]]}>
        <sphereGeometry args={[radius * 0.07, 20, 14]} />
        <meshBasicMaterial color={axisColours.sun} />
      </mesh>
      <Arrow origin={sunStart} direction={[-sunDir[0], -sunDir[1], -sunDir[2]]} length={radius * 0.5} colour={axisColours.sun} radius={thin * 1.2} />
    </>
  );
}

/** The canvas; keeps its pixels so a browser test can read them back. */
export default function MeshScene({ positions, colours, sunDir, label, edges }: MeshSceneProps) {
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
      camera={{ fov: 38, position: [5, -4, 3], up: [0, 0, 1] }}
      fallback={<span>{label}: WebGL is not available in this browser.</span>}
    >
      <SceneContent positions={positions} colours={colours} sunDir={sunDir} edges={edges} />
    </Canvas>
  );
}
