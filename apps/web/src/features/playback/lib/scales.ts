import { ASTRONOMICAL_UNIT, EARTH_EQUATORIAL_RADIUS } from '@photon-ledger/srp-core';

/** Metres per scene unit: one Earth equatorial radius around the Earth, one AU around the Sun. */
export function sceneUnitMeters(centralBody: 'earth' | 'sun'): number {
  return centralBody === 'earth' ? EARTH_EQUATORIAL_RADIUS : ASTRONOMICAL_UNIT;
}

/**
 * The smallest 1, 2 or 5 × 10ⁿ at or above `value` (> 0): the printed scale of an arrow, so that
 * the largest vector over the run is at most one axis length long. 0 and non-finite values give 0.
 */
export function niceCeil(value: number): number {
  if (!(value > 0) || !Number.isFinite(value)) return 0;
  const exponent = Math.floor(Math.log10(value));
  const base = 10 ** exponent;
  // Relative tolerance 1e-9: log10 of an exact 1/2/5 decade value may land a hair off.
  for (const m of [1, 2, 5, 10]) if (m * base >= value * (1 - 1e-9)) return m * base;
  return 10 * base;
}

/** An arrow scale: the quantity (SI) that one axis length stands for. */
export interface ArrowScale {
  /** Value per axis length (SI); 0 when there is nothing to draw. */
  perAxisLength: number;
}

/** The scale of arrows whose largest magnitude over the run is `maxMagnitude`. */
export function arrowScale(maxMagnitude: number): ArrowScale {
  return { perAxisLength: niceCeil(maxMagnitude) };
}

/** Length of an arrow in axis lengths (0 when the scale is empty). */
export function arrowLength(magnitude: number, scale: ArrowScale): number {
  return scale.perAxisLength > 0 ? magnitude / scale.perAxisLength : 0;
}

/**
 * Distance of the camera from the centre (scene units) to see an orbit of largest radius
 * `maxRadius` (scene units) whole with a 50° field of view, but never inside the central body.
 */
export function cameraDistance(maxRadius: number, bodyRadius: number): number {
  const r = Math.max(maxRadius, bodyRadius * 1.5);
  return (r * 1.25) / Math.tan((25 * Math.PI) / 180);
}

/**
 * Size of a marker that stays visible at any orbit size: a fixed fraction of the orbit radius,
 * but at least `floor` scene units.
 */
export function markerSize(maxRadius: number, floor: number): number {
  return Math.max(maxRadius * 0.025, floor);
}
