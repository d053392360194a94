/**
 * The coefficient table of a mesh: force and torque per unit pressure over a grid of Sun
 * directions (layout in `SrpCoefficientTable`, mesh-types.ts), computed with self-shadowing by
 * `illuminateMesh`, and its interpolation for propagation.
 */
import { SrpError } from '../errors';
import type { ReadonlyVec3, Vec3 } from '../math/vec3';
import { createMeshIllumination, illuminateMesh, samplesPerSide } from './illuminate-mesh';
import type { MeshScene } from './mesh-scene';
import type { CoefficientTableSettings, SrpCoefficientTable } from './mesh-types';

const DEG = Math.PI / 180;
const TWO_PI = 2 * Math.PI;
/** Numbers per table node: force x, y, z (m²), torque x, y, z (m³). */
export const TABLE_NODE_STRIDE = 6;

/** Grid sizes of a table step. */
export interface CoefficientTableShape {
  /** Polar nodes, 180/step + 1 (both poles included). */
  polarCount: number;
  /** Azimuth nodes, 360/step (φ = 360° is φ = 0). */
  azimuthCount: number;
}

/**
 * Grid sizes for a step that divides 180°.
 * @throws SrpError naming `stepDeg` (not a positive divisor of 180 between 0.5° and 90°)
 */
export function coefficientTableShape(stepDeg: number, field = 'stepDeg'): CoefficientTableShape {
  const polarSteps = 180 / stepDeg;
  if (!Number.isFinite(stepDeg) || !(stepDeg >= 0.5 && stepDeg <= 90) || Math.abs(polarSteps - Math.round(polarSteps)) > 1e-9) {
    throw new SrpError('invalid_input', `${field} must divide 180 (°), between 0.5 and 90; got ${stepDeg}`, {
      field,
      value: stepDeg,
      limit: 'divides 180, in [0.5, 90]',
    });
  }
  const polar = Math.round(polarSteps);
  return { polarCount: polar + 1, azimuthCount: 2 * polar };
}

/** The unit Sun direction of node (i, j): s = (sin θ cos φ, sin θ sin φ, cos θ); exactly ±Z at the poles. */
export function tableNodeDirection(out: Vec3, stepDeg: number, polarCount: number, i: number, j: number): Vec3 {
  if (i === 0 || i === polarCount - 1) {
    out[0] = 0;
    out[1] = 0;
    out[2] = i === 0 ? 1 : -1;
    return out;
  }
  const theta = i * stepDeg * DEG;
  const phi = j * stepDeg * DEG;
  const st = Math.sin(theta);
  out[0] = st * Math.cos(phi);
  out[1] = st * Math.sin(phi);
  out[2] = Math.cos(theta);
  return out;
}

/** Hooks of a long table computation. */
export interface TableProgressHooks {
  /** Called after each polar row with the rows done and the rows asked for. */
  onProgress?: ((rowsDone: number, rowCount: number) => void) | undefined;
  /** Polled before each row; true stops the computation (the result says `cancelled`). */
  isCancelled?: (() => boolean) | undefined;
}

/** Rows of a table as computed by `computeCoefficientTableRows`. */
export interface CoefficientTableRows {
  /** The rows' values, layout of `SrpCoefficientTable.values` starting at `firstPolarRow`. */
  values: Float64Array;
  /** Rays cast (shadow and bounce). */
  rays: number;
  /** Swept-prism tests made (each spares a facet's n² shadow rays when it finds nothing). */
  sweeps: number;
  /** Whether `isCancelled` stopped it (the values are then incomplete). */
  cancelled: boolean;
}

function checkSettings(settings: CoefficientTableSettings): CoefficientTableShape {
  if (typeof settings !== 'object' || settings === null) {
    throw new SrpError('invalid_input', 'table settings must be {stepDeg, samplesPerFacet, specularBounce}', {
      field: 'table',
      value: settings,
    });
  }
  samplesPerSide(settings.samplesPerFacet, 'table.samplesPerFacet');
  if (typeof settings.specularBounce !== 'boolean') {
    throw new SrpError('invalid_input', 'table.specularBounce must be true or false', {
      field: 'table.specularBounce',
      value: settings.specularBounce,
    });
  }
  return coefficientTableShape(settings.stepDeg, 'table.stepDeg');
}

/**
 * Computes polar rows [firstPolarRow, endPolarRow) of a coefficient table (for splitting one
 * table over several jobs or workers; `assembleCoefficientTable` joins them). At a pole every
 * azimuth node is the same direction: it is computed once and copied.
 * @throws SrpError naming `table.stepDeg`, `table.samplesPerFacet`, `table.specularBounce`,
 *   `firstPolarRow` or `endPolarRow`
 */
export function computeCoefficientTableRows(
  scene: MeshScene,
  settings: CoefficientTableSettings,
  firstPolarRow: number,
  endPolarRow: number,
  hooks: TableProgressHooks = {},
): CoefficientTableRows {
  const { polarCount, azimuthCount } = checkSettings(settings);
  if (!Number.isInteger(firstPolarRow) || firstPolarRow < 0 || firstPolarRow >= polarCount) {
    throw new SrpError('out_of_range', `firstPolarRow must be an integer in [0, ${polarCount - 1}]; got ${firstPolarRow}`, {
      field: 'firstPolarRow',
      value: firstPolarRow,
      limit: `[0, ${polarCount - 1}]`,
    });
  }
  if (!Number.isInteger(endPolarRow) || endPolarRow <= firstPolarRow || endPolarRow > polarCount) {
    throw new SrpError('out_of_range', `endPolarRow must be an integer in [${firstPolarRow + 1}, ${polarCount}]; got ${endPolarRow}`, {
      field: 'endPolarRow',
      value: endPolarRow,
      limit: `[${firstPolarRow + 1}, ${polarCount}]`,
    });
  }
  const rowCount = endPolarRow - firstPolarRow;
  const values = new Float64Array(TABLE_NODE_STRIDE * azimuthCount * rowCount);
  const illumination = createMeshIllumination(scene);
  const options = { samplesPerFacet: settings.samplesPerFacet, specularBounce: settings.specularBounce };
  const sun: Vec3 = [0, 0, 0];
  let rays = 0;
  let sweeps = 0;
  for (let i = firstPolarRow; i < endPolarRow; i += 1) {
    if (hooks.isCancelled?.()) return { values, rays, sweeps, cancelled: true };
    const pole = i === 0 || i === polarCount - 1;
    for (let j = 0; j < azimuthCount; j += 1) {
      const o = TABLE_NODE_STRIDE * ((i - firstPolarRow) * azimuthCount + j);
      if (pole && j > 0) {
        values.copyWithin(o, o - TABLE_NODE_STRIDE * j, o - TABLE_NODE_STRIDE * j + TABLE_NODE_STRIDE);
        continue;
      }
      illuminateMesh(scene, tableNodeDirection(sun, settings.stepDeg, polarCount, i, j), options, illumination);
      rays += illumination.rays;
      sweeps += illumination.sweeps;
      const f = illumination.forcePerPressure;
      const t = illumination.torquePerPressure;
      values[o] = f[0];
      values[o + 1] = f[1];
      values[o + 2] = f[2];
      values[o + 3] = t[0];
      values[o + 4] = t[1];
      values[o + 5] = t[2];
    }
    hooks.onProgress?.(i + 1 - firstPolarRow, rowCount);
  }
  return { values, rays, sweeps, cancelled: false };
}

/**
 * Joins row blocks (in polar order, covering every row once) into a table.
 * @throws SrpError naming `rows` when their total length does not fill the grid
 */
export function assembleCoefficientTable(stepDeg: number, rowsInOrder: readonly Float64Array[]): SrpCoefficientTable {
  const { polarCount, azimuthCount } = coefficientTableShape(stepDeg);
  const expected = TABLE_NODE_STRIDE * polarCount * azimuthCount;
  const total = rowsInOrder.reduce((sum, r) => sum + r.length, 0);
  if (total !== expected) {
    throw new SrpError('invalid_input', `rows hold ${total} numbers; a ${stepDeg}° table needs ${expected} (${polarCount} × ${azimuthCount} nodes × 6)`, {
      field: 'rows',
      value: total,
      limit: `= ${expected}`,
    });
  }
  const values = new Float64Array(expected);
  let at = 0;
  for (const r of rowsInOrder) {
    values.set(r, at);
    at += r.length;
  }
  return { stepDeg, polarCount, azimuthCount, values };
}

/** The whole table on this thread (see `computeCoefficientTableRows`). */
export function computeCoefficientTable(
  scene: MeshScene,
  settings: CoefficientTableSettings,
  hooks: TableProgressHooks = {},
): SrpCoefficientTable & { rays: number; sweeps: number; cancelled: boolean } {
  const { polarCount } = checkSettings(settings);
  const rows = computeCoefficientTableRows(scene, settings, 0, polarCount, hooks);
  const table = assembleCoefficientTable(settings.stepDeg, [rows.values]);
  return { ...table, rays: rows.rays, sweeps: rows.sweeps, cancelled: rows.cancelled };
}

/**
 * Checks a table's shape and numbers (for tables that crossed a boundary).
 * @throws SrpError naming `<field>.stepDeg`, `<field>.polarCount`, `<field>.azimuthCount`,
 *   `<field>.values` or `<field>.values.<k>`
 */
export function checkCoefficientTable(table: SrpCoefficientTable, field = 'table'): SrpCoefficientTable {
  if (typeof table !== 'object' || table === null) {
    throw new SrpError('invalid_input', `${field} must be a coefficient table {stepDeg, polarCount, azimuthCount, values}`, {
      field,
      value: table,
    });
  }
  const { polarCount, azimuthCount } = coefficientTableShape(table.stepDeg, `${field}.stepDeg`);
  if (table.polarCount !== polarCount) {
    throw new SrpError('invalid_input', `${field}.polarCount must be 180/stepDeg + 1 = ${polarCount}; got ${table.polarCount}`, {
      field: `${field}.polarCount`,
      value: table.polarCount,
      limit: `= ${polarCount}`,
    });
  }
  if (table.azimuthCount !== azimuthCount) {
    throw new SrpError('invalid_input', `${field}.azimuthCount must be 360/stepDeg = ${azimuthCount}; got ${table.azimuthCount}`, {
      field: `${field}.azimuthCount`,
      value: table.azimuthCount,
      limit: `= ${azimuthCount}`,
    });
  }
  const expected = TABLE_NODE_STRIDE * polarCount * azimuthCount;
  if (!(table.values instanceof Float64Array) || table.values.length !== expected) {
    throw new SrpError('invalid_input', `${field}.values must be a Float64Array of ${expected} numbers (6 per node); got ${table.values?.length}`, {
      field: `${field}.values`,
      value: table.values?.length,
      limit: `= ${expected}`,
    });
  }
  for (let k = 0; k < expected; k += 1) {
    if (!Number.isFinite(table.values[k])) {
      throw new SrpError('invalid_input', `${field}.values.${k} must be a finite number; got ${table.values[k]}`, {
        field: `${field}.values.${k}`,
        value: table.values[k],
      });
    }
  }
  return table;
}

/**
 * Force and origin-torque per unit pressure for a Sun direction, bilinear in (θ, φ) between the
 * four surrounding nodes, φ wrapping at 360°. At a pole all φ nodes hold the same direction's
 * values, so the blend is continuous there. The table is not checked here (hot path): check
 * it once with `checkCoefficientTable` (compileVehicle does). Allocates nothing.
 *
 * Measured error (coefficient-table.test.ts: 420-triangle box-wing with a dish shading the bus,
 * 4 samples per facet, 400 random directions, |ΔF| / |F| against `illuminateMesh`): 5° table max
 * 7.6 %, RMS 0.71 %; 10° table max 10.1 %, RMS 1.34 %. The maximum sits where the Sun is within
 * a cell of edge-on to the two-sided wings (|cos θ| has a kink there that bilinear interpolation
 * rounds off); with 64 samples per facet it is still 6.4 % (5°), so it is the kink, not the
 * shadow sampling. Away from such kinks the error is second order in the step.
 * @param out receives force x, y, z (m²) then torque x, y, z (m³) at out[0..5]
 * @param sunDirBody unit vector to the Sun, body frame (not checked; callers have checked it)
 * @returns `out`
 */
export function interpolateCoefficientTable(
  out: Float64Array,
  table: SrpCoefficientTable,
  sunDirBody: ReadonlyVec3,
): Float64Array {
  const step = table.stepDeg * DEG;
  const polarCount = table.polarCount;
  const azimuthCount = table.azimuthCount;
  const values = table.values;
  const z = sunDirBody[2];
  // Clamped: a unit vector normalised in floating point may have |z| a few ulps above 1.
  const theta = Math.acos(z > 1 ? 1 : z < -1 ? -1 : z);
  let phi = Math.atan2(sunDirBody[1], sunDirBody[0]);
  if (phi < 0) phi += TWO_PI;
  const u = theta / step;
  let i0 = Math.floor(u);
  if (i0 > polarCount - 2) i0 = polarCount - 2;
  const fu = u - i0;
  const v = phi / step;
  let j0 = Math.floor(v);
  const fv = v - j0;
  if (j0 >= azimuthCount) j0 -= azimuthCount; // φ rounding up to 2π
  const j1 = j0 + 1 === azimuthCount ? 0 : j0 + 1;
  const w00 = (1 - fu) * (1 - fv);
  const w01 = (1 - fu) * fv;
  const w10 = fu * (1 - fv);
  const w11 = fu * fv;
  const r0 = 6 * i0 * azimuthCount;
  const r1 = r0 + 6 * azimuthCount;
  const a = r0 + 6 * j0;
  const b = r0 + 6 * j1;
  const c = r1 + 6 * j0;
  const d = r1 + 6 * j1;
  for (let k = 0; k < 6; k += 1) {
    out[k] = w00 * values[a + k]! + w01 * values[b + k]! + w10 * values[c + k]! + w11 * values[d + k]!;
  }
  return out;
}
