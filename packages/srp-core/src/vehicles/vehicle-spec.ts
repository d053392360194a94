/**
 * A vehicle as a caller describes it (a plain object, e.g. parsed from a vehicle file), before
 * `compileVehicle` checks and packs it. SI units, with the unit in the field name as in the file
 * format of packages/shared (`vehicleSpecSchema`), which this mirrors; the one difference is that
 * tracking limits are in radians here (`trackingLimitsRad`) and in degrees in the file.
 * All vectors are in the body frame.
 */
import type { ReadonlyVec3 } from '../math/vec3';
import type { SrpCoefficientTable } from '../mesh/mesh-types';
import type { SurfaceOpticsInput } from './plate-optics';
import type { SailOpticsPresetName } from './sail-optics';

/** Fields every vehicle kind has. */
export interface VehicleSpecBase {
  /** Display name, non-empty. */
  name: string;
  /** Free text; not used by the physics. */
  description?: string | undefined;
  /** Vehicle mass (kg), > 0. */
  massKg: number;
  /** Centre of mass (m), body frame; torques are taken about it. */
  centreOfMassM: ReadonlyVec3;
}

/**
 * A sphere-like vehicle: force P Cr A along the light direction, no torque.
 */
export interface CannonballSpec extends VehicleSpecBase {
  kind: 'cannonball';
  /** Reference (projected) area (m²), > 0. */
  areaM2: number;
  /** Radiation pressure coefficient Cr, in (0, 2]: 1 absorbs all light, 2 is a mirror facing the Sun. */
  cr: number;
}

/** One flat plate of a plate-set vehicle. */
export interface PlateSpec {
  /** Name, unique within the vehicle (per-surface outputs are reported by it). */
  name: string;
  /** Area (m²), > 0. */
  areaM2: number;
  /**
   * Outward normal of the front face (m/m, any non-zero length; normalised on compiling). For a
   * Sun-tracking plate: the reference normal, at drive angle 0.
   */
  normal: ReadonlyVec3;
  /** Centroid (m), body frame. A tracking plate turns about an axis through it. */
  centroidM: ReadonlyVec3;
  /** Optics of the front face. */
  front: SurfaceOpticsInput;
  /** Optics of the back face; absent means the back takes no light (e.g. a face of the bus). */
  back?: SurfaceOpticsInput | undefined;
  /** Solar-array drive axis (any non-zero length), body frame; present makes the plate track the Sun. */
  trackingAxis?: ReadonlyVec3 | undefined;
  /**
   * Drive angle limits [min, max] (rad), right-handed about `trackingAxis` from `normal`,
   * min ≤ max, max - min ≤ 2π, each in [-2π, 2π]; absent means no limits.
   */
  trackingLimitsRad?: readonly [number, number] | undefined;
}

/** A vehicle made of flat plates (a box-wing satellite, say). */
export interface PlateVehicleSpec extends VehicleSpecBase {
  kind: 'plates';
  /** The plates, at least one. */
  plates: readonly PlateSpec[];
}

/**
 * Optical coefficients of a non-ideal flat sail, McInnes, Solar Sailing (1999), §2.6.
 */
export interface SailOpticalCoefficients {
  /** Reflectivity r of the front, in [0, 1]. */
  r: number;
  /** Specular fraction s of the reflected light, in [0, 1]. */
  s: number;
  /** Infrared emissivity εf of the front, in [0, 1]. */
  emissivityFront: number;
  /** Infrared emissivity εb of the back, in [0, 1]; not both emissivities 0. */
  emissivityBack: number;
  /** Non-Lambertian coefficient Bf of the front, in [0, 1] (2/3 for a Lambertian surface). */
  nonLambertianFront: number;
  /** Non-Lambertian coefficient Bb of the back, in [0, 1] (2/3 for a Lambertian surface). */
  nonLambertianBack: number;
}

/** Sail optics: a perfect reflector, a named published coefficient set, or explicit coefficients. */
export type SailOpticsInput = 'ideal' | SailOpticsPresetName | SailOpticalCoefficients;

/** A flat solar sail (one membrane); the attitude law decides where its normal points. */
export interface SailSpec extends VehicleSpecBase {
  kind: 'sail';
  /** Sail (membrane) area (m²), > 0. */
  areaM2: number;
  /**
   * Sail normal (any non-zero length), body frame, pointing out of the BACK of the sail: along the
   * thrust of an ideal sail, away from the Sun when the reflective front is lit. This is McInnes's
   * n; the cone angle is the angle between it and the sunlight direction. (A plate's `normal`
   * points out of its lit front instead.)
   */
  normal: ReadonlyVec3;
  /** Centre of the sail membrane (m), body frame. */
  centroidM: ReadonlyVec3;
  /** The sail's optical model. */
  optics: SailOpticsInput;
}

/**
 * A vehicle described by a triangle mesh, through its coefficient table (computed beforehand with
 * self-shadowing, see mesh/coefficient-table.ts): SRP is interpolated from the table for the Sun
 * direction in the body frame.
 */
export interface MeshTableSpec extends VehicleSpecBase {
  kind: 'mesh';
  /** The mesh's coefficient table (torques about the body-frame origin). */
  table: SrpCoefficientTable;
}

/** Any vehicle, told apart by `kind`. */
export type VehicleSpec = CannonballSpec | PlateVehicleSpec | SailSpec | MeshTableSpec;

/** The vehicle kinds. */
export type VehicleKind = VehicleSpec['kind'];
