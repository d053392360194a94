import {
  attitudeLawSchema,
  forceCommandSchema,
  initialOrbitSchema,
  vehicleSpecSchema,
  type ForceCommand,
} from '@photon-ledger/shared';
import {
  ASTRONOMICAL_UNIT,
  SOLAR_CONSTANT,
  attitudeAt,
  centreOfPressureBody,
  compileVehicle,
  createAttitudeLaw,
  createQuat,
  createSrpInertialResult,
  earthMoonShadowFraction,
  formatUtc,
  irradianceAt,
  moonPositionEci,
  astroTimeAt,
  normVec3,
  parseUtcEpoch,
  propagateKepler,
  radiationPressureAt,
  rotateInertialToBody,
  secondsBetween,
  srpResultToInertial,
  evaluateSrp,
  sunPositionEci,
  SURFACE_STRIDE,
  INERTIAL_FRAME_LABEL,
  type Quat,
  type Vec3,
} from '../../src/index';
import { attitudeFromDefinition, orbitFromFile, vehicleFromFile } from '../../io/index';
import { parseWith } from '../cli-error';
import { readJson } from '../read-input';
import { CAUTION } from '../caution';

const round = (v: readonly number[]) => v.map((c) => Number(c.toPrecision(10)));

/** Where the Sun is for the vehicle at one instant, and how much of it is visible. */
interface Geometry {
  sunDirBody: Vec3;
  sunDistanceM: number;
  illuminatedFraction: number;
  attitude: Quat | null;
  epochUtc: string | null;
}

function geometryFromOrbit(o: ForceCommand): Geometry {
  const orbit = orbitFromFile(readJson(initialOrbitSchema, o.orbit!, '--orbit'));
  const lawDef = readJson(attitudeLawSchema, o.attitude!, '--attitude');
  if (lawDef.law === 'tabulated' && !lawDef.rows) {
    throw new Error('--attitude: a tabulated law on the command line must carry its rows inline');
  }
  const law = createAttitudeLaw(attitudeFromDefinition(lawDef), 'attitude');
  const at = o.at ? parseUtcEpoch(o.at, 'at') : orbit.epoch;
  const dt = secondsBetween(orbit.epoch, at);
  const state = propagateKepler(new Float64Array(6), orbit.state, dt, orbit.mu);
  const r: Vec3 = [state[0]!, state[1]!, state[2]!];
  const v: Vec3 = [state[3]!, state[4]!, state[5]!];
  const time = astroTimeAt(at);
  const sunPos: Vec3 = orbit.centralBody === 'earth' ? sunPositionEci([0, 0, 0], time) : [0, 0, 0];
  const moonPos = orbit.centralBody === 'earth' ? moonPositionEci([0, 0, 0], time) : null;
  const satToSun: Vec3 = [sunPos[0] - r[0], sunPos[1] - r[1], sunPos[2] - r[2]];
  const distance = normVec3(satToSun);
  const sunDirInertial: Vec3 = [satToSun[0] / distance, satToSun[1] / distance, satToSun[2] / distance];
  const attitude = attitudeAt(createQuat(), law, dt, r, v, sunPos);
  const illuminatedFraction = orbit.centralBody === 'earth' ? earthMoonShadowFraction(o.shadow, r, sunPos, moonPos) : 1;
  return {
    sunDirBody: rotateInertialToBody([0, 0, 0], attitude, sunDirInertial),
    sunDistanceM: distance,
    illuminatedFraction,
    attitude,
    epochUtc: formatUtc(at),
  };
}

/** `photon-ledger force`: SRP force and torque on a vehicle at one instant, as JSON. */
export function forceCommand(raw: Record<string, unknown>): string {
  const o = parseWith(forceCommandSchema, raw, 'options');
  const vehicle = compileVehicle(vehicleFromFile(readJson(vehicleSpecSchema, o.vehicle, '--vehicle')));
  const g: Geometry = o['sun-dir-body']
    ? (() => {
        const [x, y, z] = o['sun-dir-body'];
        const n = Math.hypot(x, y, z);
        return { sunDirBody: [x / n, y / n, z / n], sunDistanceM: o['distance-au'] * ASTRONOMICAL_UNIT, illuminatedFraction: 1, attitude: null, epochUtc: null };
      })()
    : geometryFromOrbit(o);
  const s0 = o.s0 ?? SOLAR_CONSTANT;
  const pressurePa = radiationPressureAt(g.sunDistanceM, s0);
  const result = createSrpInertialResult(vehicle, { perSurface: o['per-surface'] });
  evaluateSrp(result.body, vehicle, g.sunDirBody, pressurePa, g.illuminatedFraction);
  if (g.attitude) srpResultToInertial(result, result.body, g.attitude);
  const cop = centreOfPressureBody([0, 0, 0], result.body, vehicle);
  const force = result.body.forceBody;
  const surfaces = (o['per-surface'] ? vehicle.surfaceNames : []).map((name, i) => {
    const s = result.body.surfacesBody.subarray(i * SURFACE_STRIDE, i * SURFACE_STRIDE + 6);
    return { name, forceBodyN: round([s[0]!, s[1]!, s[2]!]), torqueBodyNm: round([s[3]!, s[4]!, s[5]!]) };
  });
  return JSON.stringify(
    {
      caution: CAUTION,
      vehicle: { name: vehicle.name, kind: vehicle.kind, massKg: vehicle.massKg },
      inputs: {
        epochUtc: g.epochUtc,
        sunDirBody: round(g.sunDirBody),
        sunDistanceAu: Number((g.sunDistanceM / ASTRONOMICAL_UNIT).toPrecision(10)),
        solarConstantWM2: s0,
        irradianceWM2: Number(irradianceAt(g.sunDistanceM, s0).toPrecision(10)),
        pressurePa: Number(pressurePa.toPrecision(10)),
        illuminatedFraction: Number(g.illuminatedFraction.toPrecision(10)),
        shadowModel: g.attitude ? o.shadow : 'none',
        attitudeQuaternion: g.attitude ? round(g.attitude) : null,
        inertialFrame: INERTIAL_FRAME_LABEL,
      },
      total: {
        forceBodyN: round(force),
        torqueBodyNm: round(result.body.torqueBody),
        forceMagnitudeN: Number(normVec3(force).toPrecision(10)),
        accelerationMS2: Number((normVec3(force) / vehicle.massKg).toPrecision(10)),
        forceInertialN: g.attitude ? round(result.forceInertial) : null,
        torqueInertialNm: g.attitude ? round(result.torqueInertial) : null,
      },
      centreOfPressureBodyM: cop ? round(cop) : null,
      ...(o['per-surface'] ? { surfaces } : {}),
    },
    null,
    2,
  );
}
