/*
 * The Sun direction as the mesh views set it, in the body frame: azimuth from +x towards +y in
 * the x-y plane, elevation above it towards +z. The coefficient table's grid uses the polar angle
 * from +z instead: θ = 90° − elevation, φ = azimuth.
 */

/** The Sun direction in the body frame (°). */
export interface MeshSunAngles {
  /** From +x towards +y, 0..360 (°). */
  azimuthDeg: number;
  /** Above the x-y plane towards +z, −90..90 (°). */
  elevationDeg: number;
}

/** Where the views start: three faces of a box lit at once. */
export const DEFAULT_MESH_SUN: MeshSunAngles = { azimuthDeg: 35, elevationDeg: 30 };

const RAD = Math.PI / 180;

/** Unit vector towards the Sun, body frame. */
export function sunVector({ azimuthDeg, elevationDeg }: MeshSunAngles): [number, number, number] {
  const az = azimuthDeg * RAD;
  const el = elevationDeg * RAD;
  return [Math.cos(el) * Math.cos(az), Math.cos(el) * Math.sin(az), Math.sin(el)];
}

/** The angles of a Sun direction given by the table's polar angle from +z and azimuth (°). */
export function anglesFromPolar(polarDeg: number, azimuthDeg: number): MeshSunAngles {
  return { azimuthDeg: ((azimuthDeg % 360) + 360) % 360, elevationDeg: 90 - polarDeg };
}
