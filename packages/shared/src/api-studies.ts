/**
 * Trade studies (request and response schemas; routes in apps/api/src/routes/study-routes.ts).
 * A study varies numeric fields of a base vehicle revision and scenario, named by dot path
 * (`vehicle.massKg`, `vehicle.plates.3.front.specular`, `scenario.attitude.coneDeg`), either as a
 * sweep (lists or ranges, combined as a full grid) or as a seeded Monte Carlo dispersion.
 */
import { z } from 'zod';
import { budgetLineKeySchema } from './budget';
import { missionParamsSchema } from './missions';

/** Most cases one study may have (a grid or a sample count). */
export const MAX_STUDY_CASES = 5000;

const finite = (field: string) => z.number({ error: `${field} must be a number` }).refine(Number.isFinite, `${field} must be finite`);

/** A field path: `vehicle.` or `scenario.` then keys and array indices joined by dots. */
export const studyPathSchema = z
  .string({ error: 'path must be a string' })
  .regex(/^(vehicle|scenario)(\.[A-Za-z0-9_]+)+$/, "path must start with 'vehicle.' or 'scenario.' followed by field names and indices joined by dots");

/** A swept parameter: explicit values, or a range of `steps` evenly spaced values from..to (inclusive). */
export const sweepParameterSchema = z.union(
  [
    z.strictObject({ path: studyPathSchema, values: z.array(finite('values[]')).min(1, 'values must list at least one value').max(MAX_STUDY_CASES) }),
    z.strictObject({
      path: studyPathSchema,
      from: finite('from'),
      to: finite('to'),
      steps: z.int({ error: 'steps must be a whole number' }).min(1, 'steps must be at least 1').max(MAX_STUDY_CASES),
    }),
  ],
  { error: 'a swept parameter is {path, values} or {path, from, to, steps}' },
);
export type SweepParameter = z.infer<typeof sweepParameterSchema>;

/** A distribution of a dispersed parameter. */
export const distributionSchema = z.discriminatedUnion(
  'kind',
  [
    z.strictObject({ kind: z.literal('normal'), mean: finite('mean'), sd: finite('sd').refine((v) => v >= 0, 'sd must be at least 0') }),
    z
      .strictObject({ kind: z.literal('uniform'), min: finite('min'), max: finite('max') })
      .refine((d) => d.max >= d.min, { message: 'max must be at least min', path: ['max'] }),
  ],
  { error: "distribution.kind must be 'normal' (mean, sd) or 'uniform' (min, max)" },
);
export type Distribution = z.infer<typeof distributionSchema>;

/** Optical fraction names whose three values must sum to 1. */
export const opticalFractionKeys = ['absorbed', 'specular', 'diffuse'] as const;

/**
 * A dispersed parameter. Rule for optical fractions (`...absorbed|specular|diffuse`): the drawn
 * value is clamped to [0, 1 − third], where "third" is the fraction that is neither dispersed nor
 * the companion; the `companion` fraction (required) takes the rest, 1 − drawn − third, so the
 * three still sum to 1. `driftPerYear` models degradation honestly and simply: the value used is
 * the one at mid-mission, drawn + driftPerYear × (spanDays / 365.25) / 2 (before the companion rule).
 */
export const dispersedParameterSchema = z.strictObject({
  path: studyPathSchema,
  distribution: distributionSchema,
  companion: z.enum(opticalFractionKeys, { error: 'companion must be absorbed, specular or diffuse' }).optional(),
  driftPerYear: finite('driftPerYear').optional(),
});
export type DispersedParameter = z.infer<typeof dispersedParameterSchema>;

/** How the cases are made. */
export const studyDesignSchema = z.discriminatedUnion(
  'kind',
  [
    z.strictObject({
      kind: z.literal('grid'),
      /** Cartesian product of every parameter's values (one parameter: its list). */
      parameters: z.array(sweepParameterSchema).min(1, 'name at least one parameter').max(6, 'at most 6 parameters'),
    }),
    z.strictObject({
      kind: z.literal('monte-carlo'),
      samples: z.int({ error: 'samples must be a whole number' }).min(2, 'samples must be at least 2').max(MAX_STUDY_CASES, `samples must be at most ${MAX_STUDY_CASES}`),
      /** Same seed, same cases (and so the same results). */
      seed: z.string({ error: 'seed must be a string' }).min(1, 'seed must not be empty').max(100),
      parameters: z.array(dispersedParameterSchema).min(1, 'name at least one parameter').max(20, 'at most 20 parameters'),
    }),
  ],
  { error: "design.kind must be 'grid' or 'monte-carlo'" },
);
export type StudyDesign = z.infer<typeof studyDesignSchema>;

/** POST /missions/:missionId/studies */
export const studyCreateSchema = z.strictObject({
  name: z.string({ error: 'name must be a string' }).trim().min(1, 'name must not be empty').max(200),
  scenarioId: z.uuid({ error: 'scenarioId must be the UUID of a scenario of this mission' }),
  design: studyDesignSchema,
  lines: z.array(budgetLineKeySchema).min(1, 'choose at least one budget line to compare').max(20),
});
export type StudyCreate = z.infer<typeof studyCreateSchema>;

export const studyParamsSchema = missionParamsSchema.extend({ studyId: z.uuid({ error: 'studyId must be a UUID' }) });

export const studyCaseStatuses = ['queued', 'running', 'succeeded', 'failed', 'cancelled'] as const;
export const studyCaseStatusSchema = z.enum(studyCaseStatuses, { error: `status must be one of ${studyCaseStatuses.join(', ')}` });
export type StudyCaseStatus = z.infer<typeof studyCaseStatusSchema>;

/** Where a study stands: cases still queued or running, all finished, or cancelled. */
export const studyStatuses = ['running', 'finished', 'cancelling', 'cancelled'] as const;

export const studyProgressSchema = z.object({
  total: z.int(),
  queued: z.int(),
  running: z.int(),
  succeeded: z.int(),
  failed: z.int(),
  cancelled: z.int(),
  /** Finished cases (succeeded + failed + cancelled) over the total. */
  fractionDone: z.number(),
});

export const studySchema = z.object({
  id: z.uuid(),
  missionId: z.uuid(),
  name: z.string(),
  scenarioId: z.uuid().nullable(),
  scenarioName: z.string(),
  vehicleRevisionId: z.uuid(),
  design: studyDesignSchema,
  lines: z.array(budgetLineKeySchema),
  /** The parameter paths, in table order (companion fields after the dispersed ones). */
  parameterPaths: z.array(z.string()),
  status: z.enum(studyStatuses),
  cancelRequested: z.boolean(),
  progress: studyProgressSchema,
  createdBy: z.uuid().nullable(),
  createdAt: z.string(),
});
export type Study = z.infer<typeof studySchema>;
export const studyListSchema = z.object({ studies: z.array(studySchema) });
export type StudyList = z.infer<typeof studyListSchema>;

export const studyCaseSchema = z.object({
  /** The case's id: the subject of comments on this case (subjectType 'case'). */
  id: z.uuid(),
  index: z.int(),
  status: studyCaseStatusSchema,
  parameters: z.record(z.string(), z.number()),
  lines: z.record(z.string(), z.number().nullable()).nullable(),
  errorMessage: z.string().nullable(),
});
export type StudyCase = z.infer<typeof studyCaseSchema>;

const sortKey = z
  .string()
  .regex(/^(index|line:[A-Za-z.]+|param:(vehicle|scenario)(\.[A-Za-z0-9_]+)+)$/, "sort must be 'index', 'line:<budget line>' or 'param:<path>'");

/** GET .../cases: sort by index, a line or a parameter; filter by status and by a line's range. */
export const studyCaseQuerySchema = z.strictObject({
  sort: sortKey.default('index'),
  dir: z.enum(['asc', 'desc'], { error: "dir must be 'asc' or 'desc'" }).default('asc'),
  status: studyCaseStatusSchema.optional(),
  line: budgetLineKeySchema.optional(),
  min: z.coerce.number({ error: 'min must be a number' }).optional(),
  max: z.coerce.number({ error: 'max must be a number' }).optional(),
  limit: z.coerce.number().int().min(1, 'limit must be 1 to 5000').max(MAX_STUDY_CASES, 'limit must be 1 to 5000').default(200),
  offset: z.coerce.number().int().min(0, 'offset must be at least 0').default(0),
});
export type StudyCaseQuery = z.infer<typeof studyCaseQuerySchema>;
export const studyCasePageSchema = z.object({ total: z.int(), cases: z.array(studyCaseSchema) });
export type StudyCasePage = z.infer<typeof studyCasePageSchema>;

/** CSV export takes the same sort and filters as the table, without paging. */
export const studyCsvQuerySchema = studyCaseQuerySchema.omit({ limit: true, offset: true });

/** Percentiles by linear interpolation between closest ranks (R-7: p at rank 1 + p(n − 1) of the sorted values). */
export const PERCENTILE_METHOD = 'linear interpolation between closest ranks (rank 1 + p·(n−1) of the sorted values; Hyndman–Fan type 7)';

export const lineStatisticsSchema = z.object({
  line: budgetLineKeySchema,
  unit: z.string(),
  /** Cases with a value. */
  count: z.int(),
  mean: z.number().nullable(),
  /** Sample standard deviation (n − 1). */
  sd: z.number().nullable(),
  /** Standard error of the mean, sd / √count. */
  standardError: z.number().nullable(),
  min: z.number().nullable(),
  max: z.number().nullable(),
  p95: z.number().nullable(),
  p99: z.number().nullable(),
});
export const studyStatisticsSchema = z.object({
  caution: z.string(),
  percentileMethod: z.string(),
  succeeded: z.int(),
  total: z.int(),
  lines: z.array(lineStatisticsSchema),
});
export type StudyStatistics = z.infer<typeof studyStatisticsSchema>;

export const lineDirectionSchema = z.enum(['min', 'max'], { error: "direction must be 'min' or 'max'" });
export const studyParetoQuerySchema = z.strictObject({
  x: budgetLineKeySchema,
  xDir: lineDirectionSchema.default('min'),
  y: budgetLineKeySchema,
  yDir: lineDirectionSchema.default('min'),
});
export const studyParetoSchema = z.object({ x: budgetLineKeySchema, xDir: lineDirectionSchema, y: budgetLineKeySchema, yDir: lineDirectionSchema, cases: z.array(studyCaseSchema) });
export type StudyPareto = z.infer<typeof studyParetoSchema>;

export const studyBestQuerySchema = z.strictObject({ line: budgetLineKeySchema, dir: lineDirectionSchema.default('min') });
export const studyBestSchema = z.object({ line: budgetLineKeySchema, dir: lineDirectionSchema, case: studyCaseSchema.nullable() });
export type StudyBest = z.infer<typeof studyBestSchema>;

/** The study-case job payload. */
export const studyCaseJobSchema = z.object({ caseId: z.uuid({ error: 'caseId must be a UUID' }) });
