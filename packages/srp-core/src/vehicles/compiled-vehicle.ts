import type { SrpCoefficientTable } from '../mesh/mesh-types';
import type { VehicleKind } from './vehicle-spec';

/** Numbers per surface in `CompiledVehicle.tracking`; the layout is documented in sun-tracking.ts. */
export const TRACKING_STRIDE = 18;

/** Numbers per surface in `CompiledVehicle.coefficients`: c0, c1, c2 of the front, then of the back. */
export const COEFFICIENT_STRIDE = 6;

/**
 * Numbers per surface in `CompiledVehicle.hotRows`, the one row per surface that the evaluation
 * loop reads: 0-2 unit front normal n, 3-5 lever arm r (m), 6-8 r × n (m), 9-11 A·c0, A·c1, A·c2
 * of the front (m²), 12-14 the same for the back, 15 whether the surface tracks the Sun (1 or 0).
 * Interleaved rather than struct-of-arrays: one array to index per surface; measured at about a
 * quarter less time per 10-plate evaluation than the first layout (six separate arrays, area
 * multiplied in the loop).
 */
export const HOT_ROW_STRIDE = 16;

/**
 * A vehicle checked once and packed by `compileVehicle`: struct-of-arrays in `Float64Array`s
 * (one entry per surface) for readers, plus `hotRows`, the same data interleaved for the
 * evaluation loop; all vectors in the body frame, SI units. Every kind has
 * the same fields (a cannonball or a sail is one surface), so evaluation code sees one object
 * shape. Treat it as read-only.
 *
 * A plate-set vehicle has one surface per plate; a sail has one surface (its lit front faces
 * -normal); a cannonball has one surface with no plate data (`cannonballCrAreaM2` > 0); a mesh
 * has one surface named 'mesh' with no plate data (area 0, centroid at the body origin, the
 * reference of the table's torques) and its coefficient table (`meshTable`).
 */
export class CompiledVehicle {
  constructor(
    /** Which model this is. */
    readonly kind: VehicleKind,
    /** Display name. */
    readonly name: string,
    /** Mass (kg). */
    readonly massKg: number,
    /** Centre of mass (m), body frame, length 3. */
    readonly centreOfMassM: Float64Array,
    /** Surface names, in surface order (the plates' names, 'sail' or the cannonball's name). */
    readonly surfaceNames: readonly string[],
    /** Cr · A of a cannonball (m²); 0 for other kinds. */
    readonly cannonballCrAreaM2: number,
    /** Area of each surface (m²). */
    readonly areaM2: Float64Array,
    /** Unit front normal of each surface (stride 3), body frame; the reference normal of a tracking plate. */
    readonly normal: Float64Array,
    /** Centroid of each surface (m, stride 3), body frame. */
    readonly centroidM: Float64Array,
    /** Centroid minus centre of mass (m, stride 3), body frame: the lever arm of each surface's force. */
    readonly leverArmM: Float64Array,
    /** Flat-plate force coefficients (stride COEFFICIENT_STRIDE); a side that takes no light has zeros. */
    readonly coefficients: Float64Array,
    /** 1 for a Sun-tracking surface, 0 for a fixed one. */
    readonly tracks: Uint8Array,
    /** Tracking geometry (stride TRACKING_STRIDE), zeros for fixed surfaces. */
    readonly tracking: Float64Array,
    /** Sail area (m²) of a sail; 0 for other kinds. */
    readonly sailAreaM2: number,
    /** Unit sail normal (out of the back, along the ideal thrust), body frame; zeros for other kinds. */
    readonly sailNormal: Float64Array,
    /** The evaluation loop's copy of the above, one row of HOT_ROW_STRIDE numbers per surface. */
    readonly hotRows: Float64Array,
    /** The coefficient table of a mesh vehicle (checked); null for other kinds. */
    readonly meshTable: SrpCoefficientTable | null,
  ) {}

  /** Number of surfaces (the stride-6 per-surface output holds 6 × this many numbers). */
  get surfaceCount(): number {
    return this.areaM2.length;
  }
}
