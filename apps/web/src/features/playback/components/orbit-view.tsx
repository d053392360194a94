import { useMemo } from 'react';
import { Line } from '@react-three/drei';
import { Color, Quaternion, Vector3 } from 'three';
import { SUN_RADIUS, type Epoch } from '@photon-ledger/srp-core';
import { planetOrbit, planetPosition, type DrawnPlanet } from '../lib/ephemeris';
import { cameraDistance, markerSize, sceneUnitMeters } from '../lib/scales';
import { createPlaybackState, stateAt, type PlaybackData, type PlaybackState, type Vec3 } from '../lib/series-track';
import { Arrow, SceneLabel, type SceneVec } from './scene-parts';
import { sceneColours } from './scene-colours';
import { ViewCanvas } from './view-canvas';

/** Points of the drawn path at most (the path is resampled evenly in time). */
const PATH_POINTS = 4000;
/** Sail-direction arrows drawn along a heliocentric path. */
const SAIL_ARROWS = 24;

/** The path as scene points, sampled evenly in time with the playback's own interpolation. */
function pathPoints(data: PlaybackData, unitM: number): [number, number, number][] {
  const n = Math.max(2, Math.min(PATH_POINTS, data.pointCount));
  const state = createPlaybackState();
  const out: [number, number, number][] = [];
  for (let i = 0; i < n; i += 1) {
    const t = data.tStart + ((data.tEnd - data.tStart) * i) / (n - 1);
    const p = stateAt(state, data, t).positionM;
    out.push([p[0] / unitM, p[1] / unitM, p[2] / unitM]);
  }
  return out;
}

function largestRadius(points: readonly SceneVec[]): number {
  return points.reduce((m, p) => Math.max(m, Math.hypot(p[0], p[1], p[2])), 0);
}

const scaled = (v: Vec3, s: number): [number, number, number] => [v[0] / s, v[1] / s, v[2] / s];

/** Marker colour: sodium in full Sun, fading to the dimmed tone as the visible solar disc shrinks. */
function markerColour(illuminatedFraction: number): string {
  const c = new Color(sceneColours.dimmed).lerp(new Color(sceneColours.sodium), Math.min(1, Math.max(0, illuminatedFraction)));
  return `#${c.getHexString()}`;
}

const Y = new Vector3(0, 1, 0);

/** Props of OrbitView. */
export interface OrbitViewProps {
  centralBody: 'earth' | 'sun';
  data: PlaybackData;
  state: PlaybackState;
  epoch: Epoch;
  /** Unit vector Earth → Sun in EQJ at the current time (Earth-centred runs only). */
  sunDirectionEci: Vec3 | null;
  /** Id of the caption that lists what is drawn. */
  describedBy: string;
}

/** The orbit in the run's inertial frame (EQJ, +z north) around the Earth or the Sun. */
export function OrbitView(props: OrbitViewProps) {
  const unitM = sceneUnitMeters(props.centralBody);
  const points = useMemo(() => pathPoints(props.data, unitM), [props.data, unitM]);
  const extent = useMemo(() => largestRadius(points), [points]);
  const bodyRadius = props.centralBody === 'earth' ? 1 : SUN_RADIUS / unitM;
  const viewRadius = props.centralBody === 'sun' ? Math.max(extent, 1.6) : extent;
  const distance = cameraDistance(viewRadius, bodyRadius);
  const camera: SceneVec =
    props.centralBody === 'earth'
      ? [distance * 0.55, -distance * 0.72, distance * 0.42]
      : // Above the ecliptic (its north pole is (0, −sin ε, cos ε) in EQJ), tilted a little.
        [distance * 0.15, -distance * 0.62, distance * 0.77];
  return (
    <ViewCanvas label="Orbit view" describedBy={props.describedBy} cameraPosition={camera} near={distance / 1000} far={distance * 20}>
      {props.centralBody === 'earth' ? (
        <EarthScene {...props} points={points} extent={extent} unitM={unitM} />
      ) : (
        <SunScene {...props} points={points} extent={viewRadius} unitM={unitM} />
      )}
    </ViewCanvas>
  );
}

interface SceneProps extends OrbitViewProps {
  points: [number, number, number][];
  /** Largest radius of the drawn path (scene units). */
  extent: number;
  unitM: number;
}

/** Inertial axes: short lines with labels, so the reader knows which way is +x (equinox) and +z (north). */
function InertialAxes({ length }: { length: number }) {
  return (
    <>
      <Line points={[[0, 0, 0], [length, 0, 0]]} color={sceneColours.inkSoft} lineWidth={1} />
      <Line points={[[0, 0, 0], [0, 0, length]]} color={sceneColours.inkSoft} lineWidth={1} />
      <SceneLabel position={[length, 0, 0]}>+x EQJ</SceneLabel>
      <SceneLabel position={[0, 0, length]}>+z EQJ (north)</SceneLabel>
    </>
  );
}

function EarthScene({ state, sunDirectionEci, points, extent, unitM }: SceneProps) {
  const r = scaled(state.positionM, unitM);
  const size = markerSize(extent, 0.06);
  const sun: Vec3 = sunDirectionEci ?? [1, 0, 0];
  const shadowLength = extent * 1.15;
  const shadowQuaternion = useMemo(
    () => new Quaternion().setFromUnitVectors(Y, new Vector3(-sun[0], -sun[1], -sun[2]).normalize()),
    [sun[0], sun[1], sun[2]],
  );
  const sunArrowLength = Math.max(2.2, extent * 0.55);
  const rNorm = Math.hypot(r[0], r[1], r[2]) || 1;
  const equator = useMemo(() => {
    const ring: [number, number, number][] = [];
    for (let i = 0; i <= 96; i += 1) ring.push([1.003 * Math.cos((2 * Math.PI * i) / 96), 1.003 * Math.sin((2 * Math.PI * i) / 96), 0]);
    return ring;
  }, []);
  return (
    <>
      <ambientLight intensity={0.7} />
      <directionalLight position={[sun[0] * 10, sun[1] * 10, sun[2] * 10]} intensity={2.4} />
      <mesh>
        <sphereGeometry args={[1, 64, 32]} />
        <meshLambertMaterial color={sceneColours.sage} />
      </mesh>
      <Line points={equator} color={sceneColours.sageWash} lineWidth={1} />
      <InertialAxes length={Math.max(1.8, extent * 0.3)} />
      {/* The shadow drawn as a cylinder of the Earth's radius behind it (display only). */}
      <mesh position={[-sun[0] * shadowLength * 0.5, -sun[1] * shadowLength * 0.5, -sun[2] * shadowLength * 0.5]} quaternion={shadowQuaternion}>
        <cylinderGeometry args={[1, 1, shadowLength, 48, 1, true]} />
        <meshBasicMaterial color="#000000" transparent opacity={0.24} depthWrite={false} side={2} />
      </mesh>
      <Arrow direction={sun} length={sunArrowLength} colour={sceneColours.sodium} radius={extent * 0.006} />
      <SceneLabel position={[sun[0] * sunArrowLength, sun[1] * sunArrowLength, sun[2] * sunArrowLength]} tone="sodium">
        to the Sun
      </SceneLabel>
      <Line points={points} color={sceneColours.paper} lineWidth={1.2} transparent opacity={0.75} />
      <mesh position={r}>
        <sphereGeometry args={[size, 24, 16]} />
        <meshBasicMaterial color={markerColour(state.illuminatedFraction)} />
      </mesh>
      <Arrow
        origin={r}
        direction={[-r[0] / rNorm, -r[1] / rNorm, -r[2] / rNorm]}
        length={extent * 0.2}
        colour={sceneColours.sageWash}
        radius={extent * 0.004}
      />
      <SceneLabel position={[r[0] * 0.8, r[1] * 0.8, r[2] * 0.8]} tone="sage">
        nadir
      </SceneLabel>
      <SceneLabel position={[r[0] + size, r[1] + size, r[2] + size]}>vehicle</SceneLabel>
    </>
  );
}

const PLANETS: readonly DrawnPlanet[] = ['venus', 'earth', 'mars'];
const PLANET_LABEL: Record<DrawnPlanet, string> = { venus: 'Venus', earth: 'Earth', mars: 'Mars' };

function SunScene({ data, state, epoch, points, extent, unitM }: SceneProps) {
  const r = scaled(state.positionM, unitM);
  const size = markerSize(extent, 0.015);
  const orbits = useMemo(
    () => PLANETS.map((p) => ({ planet: p, points: planetOrbit(epoch, p).map((v) => scaled(v, unitM)) })),
    [epoch, unitM],
  );
  const sailArrows = useMemo(() => {
    const state2 = createPlaybackState();
    const out: { at: [number, number, number]; dir: [number, number, number] }[] = [];
    for (let i = 0; i < SAIL_ARROWS; i += 1) {
      const t = data.tStart + ((data.tEnd - data.tStart) * (i + 0.5)) / SAIL_ARROWS;
      const s = stateAt(state2, data, t);
      out.push({ at: scaled(s.positionM, unitM), dir: [...s.srpAccelInertialMps2] });
    }
    return out;
  }, [data, unitM]);
  // Planet positions on the scrubbed date: one ephemeris call per planet and time step.
  const tRounded = Math.round(state.tSeconds / 3600) * 3600;
  const planetsNow = useMemo(() => PLANETS.map((p) => ({ planet: p, at: scaled(planetPosition(epoch, p, tRounded), unitM) })), [epoch, tRounded, unitM]);
  const sunRadius = SUN_RADIUS / unitM;
  const a = state.srpAccelInertialMps2;
  return (
    <>
      <ambientLight intensity={1} />
      <mesh>
        <sphereGeometry args={[sunRadius, 24, 16]} />
        <meshBasicMaterial color={sceneColours.sodiumWash} />
      </mesh>
      {/* A halo of fixed size marks where the (to-scale, tiny) Sun is. */}
      <mesh>
        <sphereGeometry args={[extent * 0.03, 24, 16]} />
        <meshBasicMaterial color={sceneColours.sodium} transparent opacity={0.45} depthWrite={false} />
      </mesh>
      <SceneLabel position={[extent * 0.04, 0, 0]} tone="sodium">
        Sun
      </SceneLabel>
      <InertialAxes length={extent * 0.35} />
      {orbits.map(({ planet, points: orbit }) => (
        <Line key={planet} points={orbit} color={sceneColours.ruleStrong} lineWidth={1} transparent opacity={0.5} />
      ))}
      {planetsNow.map(({ planet, at }) => (
        <group key={planet}>
          <mesh position={at}>
            <sphereGeometry args={[extent * 0.012, 16, 12]} />
            <meshBasicMaterial color={sceneColours.ruleStrong} />
          </mesh>
          <SceneLabel position={at}>{PLANET_LABEL[planet]}</SceneLabel>
        </group>
      ))}
      <Line points={points} color={sceneColours.paper} lineWidth={1.4} />
      {sailArrows.map(({ at, dir }, i) => (
        <Arrow key={i} origin={at} direction={dir} length={extent * 0.07} colour={sceneColours.sage} radius={extent * 0.0025} />
      ))}
      <mesh position={r}>
        <sphereGeometry args={[size, 24, 16]} />
        <meshBasicMaterial color={markerColour(state.illuminatedFraction)} />
      </mesh>
      <Arrow origin={r} direction={[a[0], a[1], a[2]]} length={extent * 0.14} colour={sceneColours.sodium} radius={extent * 0.004} />
      <SceneLabel position={[r[0] + size, r[1] + size, r[2] + size]}>vehicle</SceneLabel>
    </>
  );
}
