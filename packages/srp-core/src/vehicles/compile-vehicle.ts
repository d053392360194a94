import { SrpError, requirePositive } from '../errors';
import { checkCoefficientTable } from '../mesh/coefficient-table';
import type { SrpCoefficientTable } from '../mesh/mesh-types';
import type { ReadonlyVec3 } from '../math/vec3';
import { COEFFICIENT_STRIDE, CompiledVehicle, HOT_ROW_STRIDE, TRACKING_STRIDE } from './compiled-vehicle';
import { requireDirection } from './flat-plate';
import { resolvePlateOptics } from './plate-optics';
import { resolveSailOptics, sailForceCoefficients } from './sail-optics';
import { packSunTracking } from './sun-tracking';
import { surfaceForceCoefficients } from './surface-optics';
import type {
  CannonballSpec,
  MeshTableSpec,
  PlateSpec,
  PlateVehicleSpec,
  SailSpec,
  VehicleSpec,
  VehicleSpecBase,
} from './vehicle-spec';

const TWO_PI = 2 * Math.PI;
/** Slack on the ±2π bounds of drive limits, for limits converted from ±360° in floating point. */
const ANGLE_SLACK = 1e-9;
/**
 * Smallest |n0 - a (a · n0)| of a tracking plate: below it the normal lies along the drive axis
 * (within ~1e-6 rad) and turning the drive cannot move it.
 */
const MIN_RADIAL_NORMAL = 1e-6;

function requireObject(value: unknown, field: string): asserts value is Record<string, unknown> {
  if (typeof value !== 'object' || value === null || Array.isArray(value)) {
    throw new SrpError('invalid_input', `${field} must be an object; got ${String(value)}`, { field, value });
  }
}

function requireName(value: unknown, field: string): string {
  if (typeof value !== 'string' || value.trim() === '') {
    throw new SrpError('invalid_input', `${field} must be a non-empty string; got ${String(value)}`, {
      field,
      value,
    });
  }
  return value;
}

/** Throws unless `value` is an array of three finite numbers; names the offending component. */
function requireVec3(value: unknown, field: string, unit: string): ReadonlyVec3 {
  if (!Array.isArray(value) || value.length !== 3) {
    throw new SrpError('invalid_input', `${field} must be [x, y, z] (${unit}); got ${JSON.stringify(value)}`, {
      field,
      value,
    });
  }
  for (let k = 0; k < 3; k += 1) {
    if (typeof value[k] !== 'number' || !Number.isFinite(value[k])) {
      throw new SrpError('invalid_input', `${field}.${k} must be a finite number (${unit}); got ${String(value[k])}`, {
        field: `${field}.${k}`,
        value: value[k],
      });
    }
  }
  return value as unknown as ReadonlyVec3;
}

/** A checked unit vector from a non-zero direction. */
function unitVec3(value: unknown, field: string): [number, number, number] {
  const v = requireVec3(value, field, 'unit-less');
  const length = requireDirection(v, field);
  return [v[0] / length, v[1] / length, v[2] / length];
}

function checkBase(spec: VehicleSpecBase): { massKg: number; com: Float64Array } {
  requireName(spec.name, 'name');
  if (spec.description !== undefined && typeof spec.description !== 'string') {
    throw new SrpError('invalid_input', 'description must be a string when given', {
      field: 'description',
      value: spec.description,
    });
  }
  requirePositive(spec.massKg, 'massKg', 'kg');
  const com = requireVec3(spec.centreOfMassM, 'centreOfMassM', 'm');
  return { massKg: spec.massKg, com: Float64Array.from(com) };
}

function checkLimits(limits: unknown, field: string): readonly [number, number] {
  if (!Array.isArray(limits) || limits.length !== 2) {
    throw new SrpError('invalid_input', `${field} must be [min, max] (rad); got ${JSON.stringify(limits)}`, {
      field,
      value: limits,
    });
  }
  for (let k = 0; k < 2; k += 1) {
    const v: unknown = limits[k];
    if (typeof v !== 'number' || !Number.isFinite(v)) {
      throw new SrpError('invalid_input', `${field}.${k} must be a finite angle (rad); got ${String(v)}`, {
        field: `${field}.${k}`,
        value: v,
      });
    }
    if (Math.abs(v) > TWO_PI + ANGLE_SLACK) {
      throw new SrpError('out_of_range', `${field}.${k} must be within [-2π, 2π] rad; got ${v}`, {
        field: `${field}.${k}`,
        value: v,
        limit: '[-2π, 2π]',
      });
    }
  }
  const [min, max] = limits as [number, number];
  if (min > max) {
    throw new SrpError('out_of_range', `${field}: min (${min}) must not exceed max (${max})`, {
      field,
      value: [min, max],
      limit: 'min ≤ max',
    });
  }
  if (max - min > TWO_PI + ANGLE_SLACK) {
    throw new SrpError('out_of_range', `${field}: max - min must not exceed 2π rad (one turn); got ${max - min}`, {
      field,
      value: [min, max],
      limit: 'max - min ≤ 2π',
    });
  }
  return [min, max];
}

function allocate(n: number, kind: VehicleSpec['kind'], name: string, massKg: number, com: Float64Array, names: string[]) {
  return {
    kind,
    name,
    massKg,
    com,
    names,
    area: new Float64Array(n),
    normal: new Float64Array(3 * n),
    centroid: new Float64Array(3 * n),
    lever: new Float64Array(3 * n),
    coefficients: new Float64Array(COEFFICIENT_STRIDE * n),
    tracks: new Uint8Array(n),
    tracking: new Float64Array(TRACKING_STRIDE * n),
  };
}

type Packed = ReturnType<typeof allocate>;

function setRow(a: Float64Array, row: number, v: ReadonlyVec3): void {
  a[3 * row] = v[0];
  a[3 * row + 1] = v[1];
  a[3 * row + 2] = v[2];
}

function finish(
  p: Packed,
  crArea: number,
  sailArea: number,
  sailNormal: Float64Array,
  meshTable: SrpCoefficientTable | null = null,
): CompiledVehicle {
  const n = p.area.length;
  const hot = new Float64Array(HOT_ROW_STRIDE * n);
  for (let i = 0; i < n; i += 1) {
    const h = HOT_ROW_STRIDE * i;
    const i3 = 3 * i;
    for (let k = 0; k < 3; k += 1) {
      p.lever[i3 + k] = p.centroid[i3 + k]! - p.com[k]!;
      hot[h + k] = p.normal[i3 + k]!;
      hot[h + 3 + k] = p.lever[i3 + k]!;
    }
    const [rx, ry, rz] = [p.lever[i3]!, p.lever[i3 + 1]!, p.lever[i3 + 2]!];
    const [nx, ny, nz] = [p.normal[i3]!, p.normal[i3 + 1]!, p.normal[i3 + 2]!];
    hot[h + 6] = ry * nz - rz * ny;
    hot[h + 7] = rz * nx - rx * nz;
    hot[h + 8] = rx * ny - ry * nx;
    for (let k = 0; k < COEFFICIENT_STRIDE; k += 1) {
      hot[h + 9 + k] = p.area[i]! * p.coefficients[COEFFICIENT_STRIDE * i + k]!;
    }
    hot[h + 15] = p.tracks[i]!;
  }
  return new CompiledVehicle(
    p.kind,
    p.name,
    p.massKg,
    p.com,
    p.names,
    crArea,
    p.area,
    p.normal,
    p.centroid,
    p.lever,
    p.coefficients,
    p.tracks,
    p.tracking,
    sailArea,
    sailNormal,
    hot,
    meshTable,
  );
}

/**
 * Cannonball model: F = -P Cr A s (s the unit vector to the Sun), through the centre of mass.
 * Source: Montenbruck & Gill, Satellite Orbits (Springer, 2000), §3.4.1, eq. (3.75) (equation
 * number from memory).
 */
function compileCannonball(spec: CannonballSpec): CompiledVehicle {
  const { massKg, com } = checkBase(spec);
  requirePositive(spec.areaM2, 'areaM2', 'm^2');
  requirePositive(spec.cr, 'cr', 'unit-less');
  if (spec.cr > 2) {
    throw new SrpError(
      'out_of_range',
      `cr must be in (0, 2] (2 is a mirror facing the Sun, the most light can push a projected area); got ${spec.cr}`,
      { field: 'cr', value: spec.cr, limit: '(0, 2]' },
    );
  }
  const p = allocate(1, 'cannonball', spec.name, massKg, com, [spec.name]);
  p.area[0] = spec.areaM2;
  setRow(p.centroid, 0, [com[0]!, com[1]!, com[2]!]);
  return finish(p, spec.cr * spec.areaM2, 0, new Float64Array(3));
}

function compilePlate(p: Packed, i: number, plate: PlateSpec, field: string, seen: Map<string, number>): void {
  requireObject(plate, field);
  const name = requireName(plate.name, `${field}.name`);
  const first = seen.get(name);
  if (first !== undefined) {
    throw new SrpError(
      'invalid_input',
      `${field}.name '${name}' is already used by plates.${first}; plate names must be unique`,
      { field: `${field}.name`, value: name },
    );
  }
  seen.set(name, i);
  p.names.push(name);
  p.area[i] = requirePositive(plate.areaM2, `${field}.areaM2`, 'm^2');
  const normal = unitVec3(plate.normal, `${field}.normal`);
  setRow(p.normal, i, normal);
  setRow(p.centroid, i, requireVec3(plate.centroidM, `${field}.centroidM`, 'm'));
  const optics = resolvePlateOptics(plate.front, plate.back, field);
  surfaceForceCoefficients(p.coefficients, COEFFICIENT_STRIDE * i, optics.front);
  if (optics.back) surfaceForceCoefficients(p.coefficients, COEFFICIENT_STRIDE * i + 3, optics.back);

  if (plate.trackingAxis === undefined) {
    if (plate.trackingLimitsRad !== undefined) {
      throw new SrpError(
        'invalid_input',
        `${field}.trackingLimitsRad is given but ${field}.trackingAxis is not: limits apply to a Sun-tracking plate`,
        { field: `${field}.trackingLimitsRad`, value: plate.trackingLimitsRad },
      );
    }
    return;
  }
  const axis = unitVec3(plate.trackingAxis, `${field}.trackingAxis`);
  const an = axis[0] * normal[0] + axis[1] * normal[1] + axis[2] * normal[2];
  const radial = Math.sqrt(Math.max(0, 1 - an * an)); // clamp: rounding can push an² past 1
  if (radial < MIN_RADIAL_NORMAL) {
    throw new SrpError(
      'invalid_input',
      `${field}.trackingAxis is parallel to ${field}.normal: turning about it cannot move the normal; ` +
        'use an axis in the plane of the plate',
      { field: `${field}.trackingAxis`, value: plate.trackingAxis },
    );
  }
  const limits =
    plate.trackingLimitsRad === undefined ? undefined : checkLimits(plate.trackingLimitsRad, `${field}.trackingLimitsRad`);
  p.tracks[i] = 1;
  packSunTracking(p.tracking, i, normal, axis, limits);
}

function compilePlates(spec: PlateVehicleSpec): CompiledVehicle {
  const { massKg, com } = checkBase(spec);
  if (!Array.isArray(spec.plates) || spec.plates.length === 0) {
    throw new SrpError('invalid_input', 'plates must be a non-empty list of plates', {
      field: 'plates',
      value: spec.plates,
    });
  }
  const n = spec.plates.length;
  const p = allocate(n, 'plates', spec.name, massKg, com, []);
  const seen = new Map<string, number>();
  for (let i = 0; i < n; i += 1) compilePlate(p, i, spec.plates[i]!, `plates.${i}`, seen);
  return finish(p, 0, 0, new Float64Array(3));
}

function compileSail(spec: SailSpec): CompiledVehicle {
  const { massKg, com } = checkBase(spec);
  requirePositive(spec.areaM2, 'areaM2', 'm^2');
  const n = unitVec3(spec.normal, 'normal');
  const centroid = requireVec3(spec.centroidM, 'centroidM', 'm');
  const optics = resolveSailOptics(spec.optics, 'optics');
  const p = allocate(1, 'sail', spec.name, massKg, com, ['sail']);
  p.area[0] = spec.areaM2;
  // The lit, reflective front faces the Sun: its outward normal is -n.
  setRow(p.normal, 0, [-n[0], -n[1], -n[2]]);
  setRow(p.centroid, 0, centroid);
  sailForceCoefficients(p.coefficients, 0, optics);
  return finish(p, 0, spec.areaM2, Float64Array.from(n));
}

/**
 * A mesh vehicle through its coefficient table: one surface 'mesh' without plate data (zero
 * coefficients), centred on the body origin, which the table's torques are taken about.
 */
function compileMesh(spec: MeshTableSpec): CompiledVehicle {
  const { massKg, com } = checkBase(spec);
  const table = checkCoefficientTable(spec.table, 'table');
  const p = allocate(1, 'mesh', spec.name, massKg, com, ['mesh']);
  return finish(p, 0, 0, new Float64Array(3), table);
}

/**
 * Checks a vehicle spec once and packs it for `evaluateSrp` (allocates; not for hot paths).
 * Normals and axes are normalised here.
 * @param spec a plain vehicle description (see `VehicleSpec`), SI units, body frame
 * @returns the compiled vehicle
 * @throws SrpError whose `details.field` is the path of the offending input, dot-separated as in
 *   the vehicle file (`massKg`, `plates.3.front.specular`, `plates.1.trackingLimitsRad`,
 *   `optics.r`,
 *   `table.values.12` for a mesh vehicle's coefficient table)
 */
export function compileVehicle(spec: VehicleSpec): CompiledVehicle {
  requireObject(spec, 'vehicle');
  switch (spec.kind) {
    case 'cannonball':
      return compileCannonball(spec);
    case 'plates':
      return compilePlates(spec);
    case 'sail':
      return compileSail(spec);
    case 'mesh':
      return compileMesh(spec);
    default: {
      const kind: unknown = (spec as { kind?: unknown }).kind;
      throw new SrpError('invalid_input', `kind must be 'cannonball', 'plates', 'sail' or 'mesh'; got ${String(kind)}`, {
        field: 'kind',
        value: kind,
        limit: 'cannonball | plates | sail | mesh',
      });
    }
  }
}
