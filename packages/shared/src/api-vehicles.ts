import { z } from 'zod';
import { missionParamsSchema } from './missions';
import { vehicleKinds, vehicleSpecSchema } from './vehicle';
import { scenarioSchema } from './scenario';
import { coefficientTableSummarySchema, meshFormats } from './api-meshes';

/*
 * Request and response schemas of the vehicle, upload, scenario and audit routes
 * (apps/api/src/routes/{vehicle,upload,scenario,audit}-routes.ts). Every path, query and body is
 * parsed with one of these; field messages name the field.
 */

const uuid = (field: string) => z.uuid({ error: `${field} must be a UUID` });

/** Who made a revision, an upload or an audit line; null when the user was deleted. */
export const authorRefSchema = z.object({ id: z.uuid(), displayName: z.string() }).nullable();
export type AuthorRef = z.infer<typeof authorRefSchema>;

const nameSchema = (what: string) =>
  z
    .string({ error: `name is required: the ${what}'s name in the mission` })
    .trim()
    .min(1, `name is required: the ${what}'s name in the mission`)
    .max(120, 'name must have at most 120 characters');

const noteSchema = z.string({ error: 'note must be text' }).max(2000, 'note must have at most 2000 characters');

/** A whole number ≥ 1 from a path or query string ("3") or a number. */
function positiveInt(field: string) {
  return z.coerce
    .number({ error: `${field} must be a whole number ≥ 1` })
    .int(`${field} must be a whole number ≥ 1`)
    .min(1, `${field} must be a whole number ≥ 1`);
}

// ---------------------------------------------------------------------------------------------
// Vehicles and revisions

/** Path of a vehicle. */
export const vehicleRouteParamsSchema = missionParamsSchema.extend({ vehicleId: uuid('vehicleId') });

/** Path of one revision of a vehicle. */
export const vehicleRevisionRouteParamsSchema = vehicleRouteParamsSchema.extend({ revision: positiveInt('revision') });

/** Body of `POST /api/missions/:missionId/vehicles`: a new vehicle and its revision 1. */
export const vehicleCreateSchema = z.object({
  /** Unique within the mission. */
  name: nameSchema('vehicle'),
  /** The vehicle (shared vehicle file schema). */
  spec: vehicleSpecSchema,
  /** Why this revision exists. */
  note: noteSchema.optional(),
});
export type VehicleCreate = z.infer<typeof vehicleCreateSchema>;

/** Body of `POST .../vehicles/:vehicleId/revisions`: the next immutable revision. */
export const vehicleRevisionCreateSchema = z.object({
  spec: vehicleSpecSchema,
  note: noteSchema.optional(),
  /** The revision the edit started from; anything but the latest is a 409 (someone saved in between). */
  basedOnRevision: z
    .number({ error: 'basedOnRevision must be the revision number the edit started from' })
    .int('basedOnRevision must be a whole number ≥ 1')
    .min(1, 'basedOnRevision must be a whole number ≥ 1'),
});
export type VehicleRevisionCreate = z.infer<typeof vehicleRevisionCreateSchema>;

/** Query of `GET .../vehicles/:vehicleId/compare`. */
export const vehicleCompareQuerySchema = z.object({ from: positiveInt('from'), to: positiveInt('to') });
export type VehicleCompareQuery = z.infer<typeof vehicleCompareQuerySchema>;

/** The listing columns of a revision (kept in columns so lists never read the spec). */
const listingColumns = {
  kind: z.enum(vehicleKinds),
  /** Total vehicle mass (kg). */
  massKg: z.number(),
  /** Plates of a plate model; 1 for a cannonball or a sail. */
  surfaceCount: z.number().int(),
  /** Sum of the surface areas (m²). */
  totalAreaM2: z.number(),
};

/** A vehicle in a list, with its latest revision's listing columns. */
export const vehicleListItemSchema = z.object({
  id: z.uuid(),
  missionId: z.uuid(),
  name: z.string(),
  ...listingColumns,
  /** Number of the latest revision. */
  revision: z.number().int(),
  latestRevisionId: z.uuid(),
  createdAt: z.iso.datetime(),
  updatedAt: z.iso.datetime(),
});
export type VehicleListItem = z.infer<typeof vehicleListItemSchema>;

/** Answer of `GET /api/missions/:missionId/vehicles`, by name. */
export const vehicleListSchema = z.object({ vehicles: z.array(vehicleListItemSchema) });
export type VehicleList = z.infer<typeof vehicleListSchema>;

/** A revision without its spec. */
export const vehicleRevisionSummarySchema = z.object({
  id: z.uuid(),
  vehicleId: z.uuid(),
  revision: z.number().int(),
  note: z.string(),
  author: authorRefSchema,
  createdAt: z.iso.datetime(),
  ...listingColumns,
  /** The plate-set upload this revision was made from, if any. */
  sourceUploadId: z.uuid().nullable(),
});
export type VehicleRevisionSummary = z.infer<typeof vehicleRevisionSummarySchema>;

/** One revision with its full spec, `GET .../revisions/:revision`. */
export const vehicleRevisionSchema = vehicleRevisionSummarySchema.extend({ spec: vehicleSpecSchema });
export type VehicleRevision = z.infer<typeof vehicleRevisionSchema>;

/** `GET .../vehicles/:vehicleId`: the vehicle, its revisions (newest first) and the latest spec. */
export const vehicleDetailSchema = vehicleListItemSchema.extend({
  revisions: z.array(vehicleRevisionSummarySchema),
  latestSpec: vehicleSpecSchema,
  /** A mesh vehicle's coefficient table (status and progress); absent for other kinds. */
  coefficientTable: coefficientTableSummarySchema.nullable().optional(),
});
export type VehicleDetail = z.infer<typeof vehicleDetailSchema>;

/** Answer of creating a vehicle or a revision (201). */
export const vehicleSavedSchema = z.object({ vehicle: vehicleListItemSchema, revision: vehicleRevisionSchema });
export type VehicleSaved = z.infer<typeof vehicleSavedSchema>;

/** What happened to one path between two revisions. */
export const vehicleChangeKinds = ['added', 'removed', 'changed'] as const;

/**
 * One change between two revisions. Plates are matched by name: `path` is `plates["north wing"]`
 * and `fields` lists the plate keys that differ, so a moved or edited plate reads as one change;
 * other paths are top-level keys (`massKg`, `centreOfMassM`).
 */
export const vehicleChangeSchema = z.object({
  path: z.string(),
  change: z.enum(vehicleChangeKinds),
  /** For a changed plate: its keys that differ (`areaM2`, `centroidM`...). */
  fields: z.array(z.string()).optional(),
  /** The value in the older revision (absent when added). */
  from: z.unknown().optional(),
  /** The value in the newer revision (absent when removed). */
  to: z.unknown().optional(),
});
export type VehicleChange = z.infer<typeof vehicleChangeSchema>;

/** Answer of `GET .../compare?from=&to=`. */
export const vehicleCompareSchema = z.object({
  vehicleId: z.uuid(),
  from: z.number().int(),
  to: z.number().int(),
  changes: z.array(vehicleChangeSchema),
});
export type VehicleCompare = z.infer<typeof vehicleCompareSchema>;

// ---------------------------------------------------------------------------------------------
// Uploads

/** Kinds of uploaded file. */
export const uploadKinds = ['plate-set', 'attitude-profile', 'mesh'] as const;
export const uploadKindSchema = z.enum(uploadKinds, { error: `kind must be one of ${uploadKinds.join(', ')}` });
export type UploadKindName = z.infer<typeof uploadKindSchema>;

/** Largest plate-set CSV accepted (bytes). */
export const PLATE_SET_MAX_BYTES = 2 * 1024 * 1024;
/** Largest attitude-profile CSV accepted (bytes). */
export const ATTITUDE_PROFILE_MAX_BYTES = 20 * 1024 * 1024;

/** Path of an upload. */
export const uploadRouteParamsSchema = missionParamsSchema.extend({ uploadId: uuid('uploadId') });

/** Query of `GET /api/missions/:missionId/uploads`. */
export const uploadListQuerySchema = z.object({ kind: uploadKindSchema.optional() });
export type UploadListQuery = z.infer<typeof uploadListQuerySchema>;

/** A text form field that may be left empty (multipart fields arrive as strings). */
const blankToUndefined = (v: unknown) => (typeof v === 'string' && v.trim() === '' ? undefined : v);
/** A number typed into a form field. */
function formNumber(field: string, unit: string, positive = false) {
  const number = z.number({ error: `${field} must be a number (${unit})` });
  return z.preprocess(
    (v) => (typeof v === 'string' ? Number(v.trim()) : v),
    positive ? number.positive(`${field} must be greater than 0 (${unit})`) : number,
  );
}

/**
 * Form fields of `POST .../uploads/plate-set` (beside the `file`): either `vehicleId` and
 * `basedOnRevision` (a new revision of that vehicle keeping its name, mass and centre of mass,
 * with the file's plates), or `name` and `massKg` (and optionally `comX`, `comY`, `comZ`, the
 * centre of mass in m, body frame; default the origin) for a new vehicle.
 */
export const plateSetUploadFormSchema = z
  .object({
    vehicleId: z.preprocess(blankToUndefined, uuid('vehicleId').optional()),
    basedOnRevision: z.preprocess(blankToUndefined, positiveInt('basedOnRevision').optional()),
    name: z.preprocess(blankToUndefined, nameSchema('vehicle').optional()),
    description: z.preprocess(blankToUndefined, z.string().max(4000, 'description must have at most 4000 characters').optional()),
    massKg: z.preprocess(blankToUndefined, formNumber('massKg', 'kg', true).optional()),
    comX: z.preprocess(blankToUndefined, formNumber('comX', 'm').optional()),
    comY: z.preprocess(blankToUndefined, formNumber('comY', 'm').optional()),
    comZ: z.preprocess(blankToUndefined, formNumber('comZ', 'm').optional()),
    note: z.preprocess(blankToUndefined, noteSchema.optional()),
  })
  .superRefine((f, ctx) => {
    const com = [f.comX, f.comY, f.comZ];
    if (f.vehicleId !== undefined) {
      if (f.basedOnRevision === undefined) {
        ctx.addIssue({ code: 'custom', path: ['basedOnRevision'], message: 'basedOnRevision is required with vehicleId: the revision the new plates replace' });
      }
      for (const key of ['name', 'massKg', 'comX', 'comY', 'comZ', 'description'] as const) {
        if (f[key] !== undefined) {
          ctx.addIssue({ code: 'custom', path: [key], message: `${key} is for a new vehicle; with vehicleId the vehicle keeps its own (only its plates are replaced)` });
        }
      }
      return;
    }
    if (f.name === undefined) ctx.addIssue({ code: 'custom', path: ['name'], message: 'name is required for a new vehicle (or give vehicleId to revise one)' });
    if (f.massKg === undefined) ctx.addIssue({ code: 'custom', path: ['massKg'], message: 'massKg is required for a new vehicle (kg)' });
    if (f.basedOnRevision !== undefined) {
      ctx.addIssue({ code: 'custom', path: ['basedOnRevision'], message: 'basedOnRevision goes with vehicleId' });
    }
    if (com.some((c) => c !== undefined) && com.some((c) => c === undefined)) {
      const missing = (['comX', 'comY', 'comZ'] as const).find((_, i) => com[i] === undefined)!;
      ctx.addIssue({ code: 'custom', path: [missing], message: `${missing} is required with the other centre-of-mass components (m)` });
    }
  })
  .transform((f) =>
    f.vehicleId !== undefined
      ? { target: 'existing' as const, vehicleId: f.vehicleId, basedOnRevision: f.basedOnRevision!, note: f.note }
      : {
          target: 'new' as const,
          name: f.name!,
          description: f.description,
          massKg: f.massKg!,
          centreOfMassM: [f.comX ?? 0, f.comY ?? 0, f.comZ ?? 0] as [number, number, number],
          note: f.note,
        },
  );
export type PlateSetUploadForm = z.infer<typeof plateSetUploadFormSchema>;

/** What a stored plate-set upload holds. */
export const plateSetUploadSummarySchema = z.object({
  plateCount: z.number().int(),
  /** Sum of plate areas (m²). */
  totalAreaM2: z.number(),
  vehicleId: z.uuid(),
  /** The revision made from the file. */
  revision: z.number().int(),
});

/** What a stored attitude profile holds (times in s from its own t = 0). */
export const attitudeProfileUploadSummarySchema = z.object({
  rowCount: z.number().int(),
  startSeconds: z.number(),
  endSeconds: z.number(),
  /** The instant of t = 0 (first row) for a `time_utc` file; absent for a `t_s` file. */
  epochUtc: z.string().optional(),
  timeColumn: z.enum(['time_utc', 't_s']),
});

/** What a stored mesh file holds: the mesh imported from it (`GET .../meshes/:meshId`). */
export const meshUploadSummarySchema = z.object({
  meshId: z.uuid(),
  format: z.enum(meshFormats),
  triangleCount: z.number().int(),
  droppedDegenerate: z.number().int(),
});

const uploadBase = {
  id: z.uuid(),
  missionId: z.uuid(),
  /** The name the file had on the uploader's machine. */
  fileName: z.string(),
  contentType: z.string(),
  sizeBytes: z.number().int(),
  /** SHA-256 of the bytes, lower-case hex. */
  sha256: z.string().regex(/^[0-9a-f]{64}$/),
  author: authorRefSchema,
  createdAt: z.iso.datetime(),
};

/** An upload as listed (never with its bytes). */
export const uploadSchema = z.discriminatedUnion('kind', [
  z.object({ kind: z.literal('plate-set'), ...uploadBase, summary: plateSetUploadSummarySchema }),
  z.object({ kind: z.literal('attitude-profile'), ...uploadBase, summary: attitudeProfileUploadSummarySchema }),
  z.object({ kind: z.literal('mesh'), ...uploadBase, summary: meshUploadSummarySchema }),
]);
export type Upload = z.infer<typeof uploadSchema>;

/** Answer of `GET /api/missions/:missionId/uploads`, newest first. */
export const uploadListSchema = z.object({ uploads: z.array(uploadSchema) });
export type UploadList = z.infer<typeof uploadListSchema>;

/** Answer of a plate-set upload (201): the upload and the revision made from it. */
export const plateSetUploadResultSchema = z.object({
  upload: uploadSchema,
  vehicle: vehicleListItemSchema,
  revision: vehicleRevisionSchema,
});
export type PlateSetUploadResult = z.infer<typeof plateSetUploadResultSchema>;

/** Answer of an attitude-profile upload (201); `upload.id` is a tabulated law's `profileId`. */
export const attitudeProfileUploadResultSchema = z.object({ upload: uploadSchema });
export type AttitudeProfileUploadResult = z.infer<typeof attitudeProfileUploadResultSchema>;

// ---------------------------------------------------------------------------------------------
// Scenarios

/** Path of a scenario. */
export const scenarioRouteParamsSchema = missionParamsSchema.extend({ scenarioId: uuid('scenarioId') });

/**
 * Body of `POST /api/missions/:missionId/scenarios` and `PUT .../:scenarioId`. The spec names its
 * vehicle as `{ ref: <vehicle revision id> }`; requirements are set per mission by a lead and so
 * must be empty here. Whether the revision, the attitude profile and the central body fit the
 * mission is checked against the database by the service.
 */
export const scenarioBodySchema = z
  .object({
    /** Unique within the mission. */
    name: nameSchema('scenario'),
    spec: scenarioSchema,
  })
  .superRefine((body, ctx) => {
    const vehicle = body.spec.vehicle;
    if (!('ref' in vehicle)) {
      ctx.addIssue({
        code: 'custom',
        path: ['spec', 'vehicle', 'ref'],
        message: 'spec.vehicle must be { ref: <vehicle revision id> } naming a revision of a vehicle of this mission',
      });
    } else if (!z.uuid().safeParse(vehicle.ref).success) {
      ctx.addIssue({ code: 'custom', path: ['spec', 'vehicle', 'ref'], message: 'spec.vehicle.ref must be a vehicle revision id (UUID)' });
    }
    if (body.spec.requirements.length > 0) {
      ctx.addIssue({
        code: 'custom',
        path: ['spec', 'requirements'],
        message: 'spec.requirements must be empty: requirements are set per mission by a lead (requirements routes)',
      });
    }
  });
export type ScenarioBody = z.infer<typeof scenarioBodySchema>;

/** A scenario in a list. */
export const scenarioListItemSchema = z.object({
  id: z.uuid(),
  missionId: z.uuid(),
  name: z.string(),
  vehicleRevisionId: z.uuid(),
  /** The vehicle and revision the scenario uses. */
  vehicle: z.object({ id: z.uuid(), name: z.string(), revision: z.number().int() }),
  centralBody: z.enum(['earth', 'sun']),
  spanDays: z.number(),
  attitudeLaw: z.string(),
  /** Runs made from it; a scenario with runs cannot be deleted. */
  runCount: z.number().int(),
  author: authorRefSchema,
  createdAt: z.iso.datetime(),
  updatedAt: z.iso.datetime(),
});
export type ScenarioListItem = z.infer<typeof scenarioListItemSchema>;

/** Answer of `GET /api/missions/:missionId/scenarios`, by name. */
export const scenarioListSchema = z.object({ scenarios: z.array(scenarioListItemSchema) });
export type ScenarioList = z.infer<typeof scenarioListSchema>;

/** One scenario with its spec. */
export const scenarioDetailSchema = scenarioListItemSchema.extend({ spec: scenarioSchema });
export type ScenarioDetail = z.infer<typeof scenarioDetailSchema>;

// ---------------------------------------------------------------------------------------------
// Audit log

/** Query of `GET /api/missions/:missionId/audit`: newest first, `before` an entry id for the next page. */
export const auditQuerySchema = z.object({
  limit: z.coerce
    .number({ error: 'limit must be a whole number from 1 to 200' })
    .int('limit must be a whole number from 1 to 200')
    .min(1, 'limit must be a whole number from 1 to 200')
    .max(200, 'limit must be a whole number from 1 to 200')
    .default(50),
  before: z
    .string({ error: 'before must be an audit entry id' })
    .regex(/^[1-9]\d{0,17}$/, 'before must be an audit entry id (a positive whole number)')
    .optional(),
});
export type AuditQuery = z.infer<typeof auditQuerySchema>;

/** One audit line. */
export const auditEntrySchema = z.object({
  /** Increasing id (a string: PostgreSQL bigint). */
  id: z.string(),
  at: z.iso.datetime(),
  user: authorRefSchema,
  /** Verb in kebab-case: `vehicle-created`, `scenario-updated`... */
  action: z.string(),
  entityType: z.string(),
  entityId: z.string(),
  detail: z.record(z.string(), z.unknown()),
});
export type AuditEntry = z.infer<typeof auditEntrySchema>;

/** A page of the audit log; `nextBefore` is the `before` of the next page, null at the end. */
export const auditPageSchema = z.object({ entries: z.array(auditEntrySchema), nextBefore: z.string().nullable() });
export type AuditPage = z.infer<typeof auditPageSchema>;
