import { vehicleSpecSchema, type VehicleSpec } from '@photon-ledger/shared';
import {
  ASTRONOMICAL_UNIT,
  SOLAR_CONSTANT,
  compileVehicle,
  createSrpResult,
  evaluateSrp,
  radiationPressureAt,
  surfaceNormalBody,
  type Vec3,
} from '@photon-ledger/srp-core';
import { vehicleFromFile } from '@photon-ledger/srp-core/io';
import { opticsSwatchKey, type OpticsSwatchKey } from './optics-palette';

/*
 * What the 3D view and the numbers panel show: the vehicle evaluated by srp-core in the browser,
 * at 1 au with the default solar constant, in full Sun, for a Sun direction set in the body frame.
 */

/** The Sun direction as the user sets it: angles in the body frame (°). */
export interface SunAngles {
  /** From +x towards +y, in the x-y plane (°). */
  azimuthDeg: number;
  /** Above the x-y plane towards +z (°). */
  elevationDeg: number;
}

/** Unit vector from the spacecraft to the Sun, body frame. */
export function sunDirectionBody({ azimuthDeg, elevationDeg }: SunAngles): Vec3 {
  const az = (azimuthDeg * Math.PI) / 180;
  const el = (elevationDeg * Math.PI) / 180;
  return [Math.cos(el) * Math.cos(az), Math.cos(el) * Math.sin(az), Math.sin(el)];
}

/** One surface as drawn. */
export interface PreviewSurface {
  name: string;
  /** Index of the plate in the draft, for a plate model; null for a cannonball or a sail. */
  plateIndex: number | null;
  areaM2: number;
  /** Centroid (m), body frame. */
  centroidM: Vec3;
  /** Unit front normal for this Sun direction (a tracking plate turned), body frame. */
  normal: Vec3;
  /** Unit drive axis of a Sun-tracking plate, body frame; null for a fixed surface. */
  trackingAxis: Vec3 | null;
  /** Colour of the face the normal points out of. */
  front: OpticsSwatchKey;
  /** Colour of the other face. */
  back: OpticsSwatchKey;
  /** SRP force on this surface (N), body frame. */
  forceN: Vec3;
  /** Torque of this surface's force about the centre of mass (N·m), body frame. */
  torqueNm: Vec3;
}

/** The evaluated vehicle. */
export interface SrpPreview {
  kind: VehicleSpec['kind'];
  massKg: number;
  /** Centre of mass (m), body frame. */
  centreOfMassM: Vec3;
  surfaces: PreviewSurface[];
  /** Sphere radius of a cannonball (m), from its area; 0 otherwise. */
  cannonballRadiusM: number;
  /** Unit vector to the Sun, body frame. */
  sunDirBody: Vec3;
  /** Radiation pressure used (Pa). */
  pressurePa: number;
  /** Total SRP force (N), body frame. */
  forceN: Vec3;
  /** Total SRP torque about the centre of mass (N·m), body frame. */
  torqueNm: Vec3;
  /** Plates of the draft left out because they are not valid yet. */
  platesLeftOut: number;
  /** True when the vehicle's own mass or centre of mass is not valid yet and a stand-in was used. */
  usedStandIns: boolean;
}

/** Radiation pressure at 1 au with the default solar constant (Pa). */
export const PRESSURE_AT_1AU_PA = radiationPressureAt(ASTRONOMICAL_UNIT);
/** The solar constant used (W/m²). */
export const PREVIEW_SOLAR_CONSTANT = SOLAR_CONSTANT;

const finiteVec = (v: unknown): boolean =>
  Array.isArray(v) && v.length === 3 && v.every((c) => typeof c === 'number' && Number.isFinite(c));

/**
 * The part of a candidate spec that can be drawn: the spec itself when valid; otherwise the
 * valid plates only, with stand-ins for an unfinished name (a label), mass (1 kg) or centre of mass
 * (the origin), so the view follows the user while a form is half filled in. Null when nothing
 * drawable is left (a cannonball or a sail whose own fields are wrong, or no valid plate).
 */
export function previewableSpec(candidate: Record<string, unknown>): {
  spec: VehicleSpec;
  keptPlates: number[];
  platesLeftOut: number;
  usedStandIns: boolean;
} | null {
  const first = vehicleSpecSchema.safeParse(candidate);
  const plates = Array.isArray(candidate.plates) ? (candidate.plates as unknown[]) : [];
  if (first.success) return { spec: first.data, keptPlates: plates.map((_, i) => i), platesLeftOut: 0, usedStandIns: false };

  const badPlates = new Set<number>();
  for (const issue of first.error.issues) {
    if (issue.path[0] === 'plates' && typeof issue.path[1] === 'number') badPlates.add(issue.path[1]);
  }
  const massOk = typeof candidate.massKg === 'number' && candidate.massKg > 0 && Number.isFinite(candidate.massKg);
  const comOk = finiteVec(candidate.centreOfMassM);
  const keptPlates = plates.map((_, i) => i).filter((i) => !badPlates.has(i));
  const patched: Record<string, unknown> = {
    ...candidate,
    name: 'preview',
    massKg: massOk ? candidate.massKg : 1,
    centreOfMassM: comOk ? candidate.centreOfMassM : [0, 0, 0],
  };
  delete patched.description;
  if (candidate.kind === 'plates') patched.plates = keptPlates.map((i) => plates[i]);
  const second = vehicleSpecSchema.safeParse(patched);
  if (!second.success) return null;
  return {
    spec: second.data,
    keptPlates: candidate.kind === 'plates' ? keptPlates : [],
    platesLeftOut: plates.length - keptPlates.length,
    usedStandIns: !massOk || !comOk,
  };
}

const unit = (v: readonly number[]): Vec3 => {
  const n = Math.hypot(v[0]!, v[1]!, v[2]!);
  return [v[0]! / n, v[1]! / n, v[2]! / n];
};

/**
 * Evaluates a drawable spec (from `previewableSpec`) for a Sun direction.
 * @param keptPlates draft index of each plate of `spec`, in order
 */
export function evaluatePreview(
  spec: VehicleSpec,
  keptPlates: readonly number[],
  sun: SunAngles,
  extras: { platesLeftOut: number; usedStandIns: boolean } = { platesLeftOut: 0, usedStandIns: false },
): SrpPreview {
  const vehicle = compileVehicle(vehicleFromFile(spec));
  const sunDirBody = sunDirectionBody(sun);
  const result = createSrpResult(vehicle, { perSurface: true });
  evaluateSrp(result, vehicle, sunDirBody, PRESSURE_AT_1AU_PA, 1);
  const buffer = result.surfacesBody;
  const surfaces: PreviewSurface[] = [];
  for (let i = 0; i < vehicle.surfaceCount; i += 1) {
    const o = 6 * i;
    const forceN: Vec3 = [buffer[o]!, buffer[o + 1]!, buffer[o + 2]!];
    const torqueNm: Vec3 = [buffer[o + 3]!, buffer[o + 4]!, buffer[o + 5]!];
    const centroidM: Vec3 = [vehicle.centroidM[3 * i]!, vehicle.centroidM[3 * i + 1]!, vehicle.centroidM[3 * i + 2]!];
    if (spec.kind === 'plates') {
      const plate = spec.plates[i]!;
      surfaces.push({
        name: plate.name,
        plateIndex: keptPlates[i] ?? null,
        areaM2: plate.areaM2,
        centroidM,
        normal: surfaceNormalBody([0, 0, 0], vehicle, i, sunDirBody),
        trackingAxis: plate.trackingAxis ? unit(plate.trackingAxis) : null,
        front: opticsSwatchKey(plate.front),
        back: plate.back === undefined ? 'none' : opticsSwatchKey(plate.back),
        forceN,
        torqueNm,
      });
    } else if (spec.kind === 'sail') {
      surfaces.push({
        name: 'sail',
        plateIndex: null,
        areaM2: spec.areaM2,
        centroidM: [...spec.centroidM],
        normal: unit(spec.normal),
        trackingAxis: null,
        // A sail's normal points out of its back; the reflective front faces the other way.
        front: 'sail-back',
        back: 'sail-front',
        forceN,
        torqueNm,
      });
    } else if (spec.kind === 'cannonball') {
      surfaces.push({
        name: spec.name,
        plateIndex: null,
        areaM2: spec.areaM2,
        centroidM: [...spec.centreOfMassM],
        normal: [...sunDirBody],
        trackingAxis: null,
        front: 'cannonball',
        back: 'cannonball',
        forceN,
        torqueNm,
      });
    }
  }
  return {
    kind: spec.kind,
    massKg: spec.massKg,
    centreOfMassM: [...spec.centreOfMassM],
    surfaces,
    cannonballRadiusM: spec.kind === 'cannonball' ? Math.sqrt(spec.areaM2 / Math.PI) : 0,
    sunDirBody,
    pressurePa: PRESSURE_AT_1AU_PA,
    forceN: [...result.forceBody],
    torqueNm: [...result.torqueBody],
    platesLeftOut: extras.platesLeftOut,
    usedStandIns: extras.usedStandIns,
  };
}

/** The preview of a draft's candidate spec, or null when nothing is drawable yet. */
export function previewOf(candidate: Record<string, unknown>, sun: SunAngles): SrpPreview | null {
  // A mesh vehicle needs its coefficient table (computed by the API): its view is the mesh's own.
  if (candidate.kind === 'mesh') return null;
  const drawable = previewableSpec(candidate);
  if (!drawable) return null;
  try {
    return evaluatePreview(drawable.spec, drawable.keptPlates, sun, drawable);
  } catch {
    // The schema and compileVehicle agree on what is valid; a refusal here leaves the view empty
    // rather than breaking the page.
    return null;
  }
}
