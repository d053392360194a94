import { z } from 'zod';
import { missionParamsSchema } from './missions';
import { meshGroupOpticsSchema, meshTableSettingsSchema } from './vehicle';

/*
 * Request and response schemas of the mesh and coefficient-table routes
 * (apps/api/src/routes/mesh-routes.ts). A mesh is imported from an OBJ or STL file into the body
 * frame in metres; a coefficient table holds the SRP force and torque per unit pressure over a
 * grid of Sun directions, computed by queued jobs and cached by mesh, optics and settings.
 */

const uuid = (field: string) => z.uuid({ error: `${field} must be a UUID` });

/** Mesh file formats read (told apart by content: binary STL by its size rule, else by keywords). */
export const meshFormats = ['obj', 'stl-ascii', 'stl-binary'] as const;
export type MeshFormat = (typeof meshFormats)[number];

/** Length units a mesh file may be written in. */
export const meshUnits = ['m', 'mm'] as const;
export type MeshUnit = (typeof meshUnits)[number];

/** Largest mesh file accepted (bytes). */
export const MESH_MAX_BYTES = 32 * 1024 * 1024;
/** Most triangles accepted in one mesh (after polygons are fanned into triangles). */
export const MESH_MAX_TRIANGLES = 200_000;

/** Path of a mesh. */
export const meshRouteParamsSchema = missionParamsSchema.extend({ meshId: uuid('meshId') });
/** Path of a coefficient table. */
export const coefficientTableRouteParamsSchema = missionParamsSchema.extend({ tableId: uuid('tableId') });

/** A form field holding JSON (multipart fields arrive as strings). */
function jsonField(field: string) {
  return (v: unknown) => {
    if (typeof v !== 'string') return v;
    if (v.trim() === '') return undefined;
    try {
      return JSON.parse(v) as unknown;
    } catch {
      return `${field}: not JSON`;
    }
  };
}

function formVec3(field: string, unit: string) {
  const c = z.number({ error: `${field} components must be finite numbers (${unit})` });
  return z.preprocess(
    jsonField(field),
    z.tuple([c, c, c], { error: `${field} must be [x, y, z] (${unit}), e.g. [0, 0, 0]` }).default([0, 0, 0]),
  );
}

/**
 * Form fields of `POST /api/missions/:missionId/meshes` (beside the `file`). The file's
 * coordinates are scaled by `units`, then rotated by `rotationDeg` (about the body X, then Y, then
 * Z axis, right-handed, fixed axes), then shifted by `translationM`, giving the body frame in metres.
 */
export const meshImportFormSchema = z.object({
  /** Name of the mesh in the mission; default the file name. */
  name: z.preprocess(
    (v) => (typeof v === 'string' && v.trim() === '' ? undefined : v),
    z.string().trim().min(1).max(120, 'name must have at most 120 characters').optional(),
  ),
  /** Units of the file's coordinates. */
  units: z.enum(meshUnits, { error: `units must be one of ${meshUnits.join(', ')}` }),
  /** Rotation into the body frame (°), about X, then Y, then Z (fixed axes). */
  rotationDeg: formVec3('rotationDeg', '°'),
  /** Translation into the body frame (m), applied after scaling and rotating. */
  translationM: formVec3('translationM', 'm'),
});
export type MeshImportForm = z.infer<typeof meshImportFormSchema>;

/** One group of facets (OBJ `g`/`o`/`usemtl` name, STL `solid` name; `default` when unnamed). */
export const meshGroupSchema = z.object({
  name: z.string(),
  triangleCount: z.number().int(),
  /** Sum of the group's triangle areas (m²). */
  areaM2: z.number(),
});
export type MeshGroup = z.infer<typeof meshGroupSchema>;

/** A stored mesh, `GET .../meshes/:meshId` (the geometry itself is `.../geometry`). */
export const meshSummarySchema = z.object({
  id: z.uuid(),
  missionId: z.uuid(),
  /** The upload holding the original file (with its size and SHA-256). */
  uploadId: z.uuid(),
  name: z.string(),
  fileName: z.string(),
  format: z.enum(meshFormats),
  units: z.enum(meshUnits),
  rotationDeg: z.tuple([z.number(), z.number(), z.number()]),
  translationM: z.tuple([z.number(), z.number(), z.number()]),
  triangleCount: z.number().int(),
  /** Degenerate triangles (zero area, repeated or collinear corners) dropped on import. */
  droppedDegenerate: z.number().int(),
  groups: z.array(meshGroupSchema),
  /** Sum of the triangle areas (m²). */
  totalAreaM2: z.number(),
  /** Axis-aligned bounds in the body frame (m). */
  boundsM: z.object({ min: z.tuple([z.number(), z.number(), z.number()]), max: z.tuple([z.number(), z.number(), z.number()]) }),
  /** SHA-256 of the imported geometry (body frame, float64), the cache key's first part. */
  geometrySha256: z.string(),
  createdAt: z.iso.datetime(),
  createdBy: z.object({ id: z.uuid(), displayName: z.string() }).nullable(),
});
export type MeshSummary = z.infer<typeof meshSummarySchema>;

/** Answer of `GET /api/missions/:missionId/meshes`, newest first. */
export const meshListSchema = z.object({ meshes: z.array(meshSummarySchema) });
export type MeshList = z.infer<typeof meshListSchema>;

/**
 * `GET .../meshes/:meshId/geometry` answers `application/octet-stream`, little-endian:
 * triangleCount × 9 float32 vertex coordinates (m, body frame, v0 v1 v2 per triangle, counter-
 * clockwise seen from outside), then triangleCount uint32 group indices (into `groups`).
 * The triangle count is in the `X-Triangle-Count` header.
 */
export const MESH_GEOMETRY_CONTENT_TYPE = 'application/octet-stream';

/** Body of `POST .../meshes/:meshId/tables`: ask for (or find the cached) table of these optics. */
export const coefficientTableRequestSchema = z.object({
  optics: z.object({
    default: meshGroupOpticsSchema,
    groups: z.record(z.string().min(1).max(120), meshGroupOpticsSchema).optional(),
  }),
  table: meshTableSettingsSchema.prefault({}),
});
export type CoefficientTableRequest = z.infer<typeof coefficientTableRequestSchema>;

/** States of a coefficient table's computation. */
export const coefficientTableStatuses = ['queued', 'running', 'succeeded', 'failed', 'cancelled'] as const;
export type CoefficientTableStatus = (typeof coefficientTableStatuses)[number];

/** A coefficient table's state, `GET .../coefficient-tables/:tableId`. */
export const coefficientTableSummarySchema = z.object({
  id: z.uuid(),
  missionId: z.uuid(),
  meshId: z.uuid(),
  /** SHA-256 over the geometry, the resolved optics and the settings: equal keys share one table. */
  cacheKey: z.string(),
  settings: z.object({ stepDeg: z.number(), samplesPerFacet: z.number().int(), specularBounce: z.boolean() }),
  status: z.enum(coefficientTableStatuses),
  /** Fraction of the grid done, 0..1. */
  progress: z.number(),
  /** Jobs the grid was split into (bands of polar rows), and how many are done. */
  chunkCount: z.number().int(),
  chunksDone: z.number().int(),
  error: z.string().nullable(),
  /** Cost once succeeded: shadow rays cast, rays per second of compute, and compute time summed over chunks. */
  stats: z.object({ rays: z.number(), raysPerSecond: z.number(), computeMs: z.number() }).nullable(),
  createdAt: z.iso.datetime(),
  finishedAt: z.iso.datetime().nullable(),
});
export type CoefficientTableSummary = z.infer<typeof coefficientTableSummarySchema>;

/**
 * `GET .../coefficient-tables/:tableId/data` (succeeded tables): node (i, j) is the Sun direction
 * at polar angle i·stepDeg from body +Z and azimuth j·stepDeg from +X toward +Y; `values` holds 6
 * numbers per node at index 6(i·azimuthCount + j): force per unit pressure (m², N/Pa) Fx, Fy, Fz
 * and torque about the body-frame origin per unit pressure (m³, N·m/Pa) Tx, Ty, Tz, body frame,
 * in full sunlight.
 */
export const coefficientTableDataSchema = z.object({
  id: z.uuid(),
  stepDeg: z.number(),
  polarCount: z.number().int(),
  azimuthCount: z.number().int(),
  values: z.array(z.number()),
});
export type CoefficientTableData = z.infer<typeof coefficientTableDataSchema>;

/** Payload of a `coefficient-table-chunk` job: one band of polar rows of a table. */
export const coefficientTableChunkJobSchema = z.object({ chunkId: uuid('chunkId') });
export type CoefficientTableChunkJob = z.infer<typeof coefficientTableChunkJobSchema>;
