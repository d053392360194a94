import { z } from 'zod';
import {
  budgetComparatorSchema,
  budgetLineKeySchema,
  budgetLineResultSchema,
  budgetRequirementSchema,
} from './budget';
import { runEventSchema } from './runs';

// Request and response schemas of the result, requirement and export routes
// (apps/api/src/routes/result-routes.ts, requirement-routes.ts, export-routes.ts).

const uuid = (field: string) => z.uuid({ message: `${field} must be a UUID` });

/** Query strings give '' for `?x=`: read as absent. */
const blankToUndefined = (v: unknown) => (v === '' ? undefined : v);

/** An optional number from a query string; the message names the field and its unit. */
const queryNumber = (field: string, unit: string) =>
  z.preprocess(
    blankToUndefined,
    z.coerce
      .number({ error: `${field} must be a number (${unit})` })
      .refine(Number.isFinite, `${field} must be a finite number (${unit})`)
      .optional(),
  );

/** A whole number from a query string within [min, max], `fallback` when absent (or optional without one). */
function queryInt(field: string, min: number, max: number, fallback: number): z.ZodType<number>;
function queryInt(field: string, min: number, max: number): z.ZodType<number | undefined>;
function queryInt(field: string, min: number, max: number, fallback?: number): z.ZodType<number | undefined> {
  const message = `${field} must be a whole number from ${min} to ${max}`;
  const number = z.coerce.number({ error: message }).int(message).min(min, message).max(max, message);
  return z.preprocess(blankToUndefined, fallback === undefined ? number.optional() : number.default(fallback));
}

/** `fromT <= toT` when both are given. */
function refineTimeRange(q: { fromT?: number | undefined; toT?: number | undefined }, ctx: z.RefinementCtx): void {
  if (q.fromT !== undefined && q.toT !== undefined && q.fromT > q.toT) {
    ctx.addIssue({ code: 'custom', path: ['toT'], message: 'toT must not be before fromT (s from the epoch)' });
  }
}

/** Path of every run-result route: `/api/missions/:missionId/runs/:runId/...`. */
export const resultRunParamsSchema = z.object({ missionId: uuid('missionId'), runId: uuid('runId') });
export type ResultRunParams = z.infer<typeof resultRunParamsSchema>;

/** `GET .../runs/:runId/events`. */
export const runEventsSchema = z.object({ runId: z.uuid(), events: z.array(runEventSchema) });
export type RunEvents = z.infer<typeof runEventsSchema>;

/** Largest page of `GET .../samples`. */
export const MAX_SAMPLE_PAGE_ROWS = 5000;

/**
 * Query of `GET .../runs/:runId/samples`: rows with fromT ≤ t ≤ toT (s from the epoch), after the
 * row index `after` (the previous page's `nextAfter`), at most `limit` of them.
 */
export const samplePageQuerySchema = z
  .object({
    /** Only rows at or after this time (s from the epoch). */
    fromT: queryNumber('fromT', 's from the epoch'),
    /** Only rows at or before this time (s from the epoch). */
    toT: queryNumber('toT', 's from the epoch'),
    /** Keyset cursor: only rows whose index (0-based, in the whole run) is greater than this. */
    after: queryInt('after', -1, Number.MAX_SAFE_INTEGER),
    /** Rows per page, 1 to 5000 (default 1000). */
    limit: queryInt('limit', 1, MAX_SAMPLE_PAGE_ROWS, 1000),
  })
  .superRefine(refineTimeRange);
export type SamplePageQuery = z.infer<typeof samplePageQuerySchema>;

/** A page of samples: `rows[i]` holds one value per entry of `columns` (the summary's columns, SI units in the names). */
export const samplePageSchema = z.object({
  runId: z.uuid(),
  columns: z.array(z.string()),
  rows: z.array(z.array(z.number())),
  /** Index (in the whole run) of rows[0]; null for an empty page. */
  firstIndex: z.number().int().nullable(),
  /** Pass as `after` for the next page; null when this page is the last. */
  nextAfter: z.number().int().nullable(),
  /** Rows in the whole run. */
  sampleCount: z.number().int(),
});
export type SamplePage = z.infer<typeof samplePageSchema>;

/**
 * Columns the series route derives from each sample, besides the stored ones:
 * - `r_m`, `v_m_s`: |r| (m), |v| (m/s);
 * - `srp_a_mag_m_s2`, `srp_t_mag_n_m`: |a_srp| (m/s²), |τ_srp| (N·m);
 * - `a_m`, `e`, `i_deg`, `raan_deg`: osculating semi-major axis (m), eccentricity (-), inclination
 *   and right ascension of the ascending node (deg, 0 for an equatorial orbit) of the sample's
 *   state about the run's central body;
 * - `h_x_body_n_m_s`, `h_y_body_n_m_s`, `h_z_body_n_m_s`, `h_mag_n_m_s`: wheel momentum
 *   H = ∫τ_srp dt in body axes (N·m·s) from the start of the run, reset to 0 at each dump when the
 *   scenario sets a wheel capacity and dump threshold (dumps add the points just before and after).
 */
export const derivedSeriesColumns = [
  'r_m',
  'v_m_s',
  'srp_a_mag_m_s2',
  'srp_t_mag_n_m',
  'a_m',
  'e',
  'i_deg',
  'raan_deg',
  'h_x_body_n_m_s',
  'h_y_body_n_m_s',
  'h_z_body_n_m_s',
  'h_mag_n_m_s',
] as const;
export type DerivedSeriesColumn = (typeof derivedSeriesColumns)[number];

/** Default and largest points per column of `GET .../series`. */
export const DEFAULT_SERIES_POINTS = 2000;
export const MAX_SERIES_POINTS = 20_000;
/** Most columns one series request may ask for. */
export const MAX_SERIES_COLUMNS = 16;

/**
 * Query of `GET .../runs/:runId/series`: `columns` comma-separated (stored columns of the
 * summary, or derived ones), at most `maxPoints` points per column between fromT and toT.
 */
export const seriesQuerySchema = z
  .object({
    columns: z
      .string({ error: 'columns must list column names separated by commas, e.g. srp_a_mag_m_s2,r_m' })
      .transform((s) => s.split(',').map((c) => c.trim()).filter((c) => c !== ''))
      .pipe(
        z
          .array(z.string().regex(/^[a-z0-9_]{1,64}$/, 'columns must be names of lower-case letters, digits and _'))
          .min(1, 'columns must name at least one column')
          .max(MAX_SERIES_COLUMNS, `columns may name at most ${MAX_SERIES_COLUMNS} columns`)
          .refine((list) => new Set(list).size === list.length, 'columns must not name a column twice'),
      ),
    /** Points per column at most, 4 to 20000 (default 2000). */
    maxPoints: queryInt('maxPoints', 4, MAX_SERIES_POINTS, DEFAULT_SERIES_POINTS),
    fromT: queryNumber('fromT', 's from the epoch'),
    toT: queryNumber('toT', 's from the epoch'),
  })
  .superRefine(refineTimeRange);
export type SeriesQuery = z.infer<typeof seriesQuerySchema>;

/** One decimated column: in each time bucket its minimum and its maximum, in time order. */
export const seriesColumnSchema = z.object({
  column: z.string(),
  /** Unit of the values ('-' for none). */
  unit: z.string(),
  derived: z.boolean(),
  /** Times of the points (s from the epoch), non-decreasing. */
  t: z.array(z.number()),
  values: z.array(z.number()),
});
export type SeriesColumn = z.infer<typeof seriesColumnSchema>;

/** `GET .../runs/:runId/series`. */
export const seriesSchema = z.object({
  runId: z.uuid(),
  /** The time range covered (s from the epoch). */
  fromT: z.number(),
  toT: z.number(),
  maxPoints: z.number().int(),
  /** Equal time buckets; each keeps at most 2 points per column. */
  bucketCount: z.number().int(),
  /** Samples read in the range. */
  rowsInRange: z.number().int(),
  series: z.array(seriesColumnSchema),
  /** With momentum columns: the dump level to draw (null when the scenario sets none) and the dumps in the range. */
  momentum: z
    .object({
      dumpLevelNms: z.number().nullable(),
      dumpCriterion: z.enum(['norm', 'axis']),
      dumpsInRange: z.number().int(),
    })
    .nullable(),
});
export type Series = z.infer<typeof seriesSchema>;

const timeStatisticsSchema = z.object({ mean: z.number(), max: z.number(), rms: z.number() });

/** Counts of budget lines by status. */
export const budgetStatusCountsSchema = z.object({
  pass: z.number().int(),
  fail: z.number().int(),
  noRequirement: z.number().int(),
  noValue: z.number().int(),
});

/**
 * `GET .../runs/:runId/budget`: the run's budget with the mission's current requirements applied,
 * and the figures behind it (SI units as in srp-core's SrpBudget).
 */
export const runBudgetReportSchema = z.object({
  runId: z.uuid(),
  caution: z.string(),
  epochUtc: z.string(),
  spanSeconds: z.number(),
  sampleCount: z.number().int(),
  /** When the requirements were read (ISO 8601 UTC): they may change after the run. */
  requirementsAsOf: z.iso.datetime(),
  lines: z.array(budgetLineResultSchema),
  counts: budgetStatusCountsSchema,
  /** Of |a_srp| (m/s²). */
  srpAcceleration: timeStatisticsSchema,
  perturbations: z.array(
    z.object({
      force: z.string(),
      meanAccel: z.number(),
      maxAccel: z.number(),
      srpToMeanRatio: z.number().nullable(),
      srpToMaxRatio: z.number().nullable(),
    }),
  ),
  /** Delta-v integrals (m/s). */
  deltaV: z.object({ total: z.number(), alongTrack: z.number(), alongTrackAbs: z.number() }),
  drift: z.object({
    semiMajorAxisMPerDay: z.number().nullable(),
    eccentricityPerDay: z.number().nullable(),
    inclinationDegPerDay: z.number().nullable(),
    raanDegPerDay: z.number().nullable(),
    equatorial: z.boolean(),
  }),
  /** SRP torque (N·m): |τ| and per body axis. */
  torque: z.object({ magnitude: timeStatisticsSchema, axes: z.tuple([timeStatisticsSchema, timeStatisticsSchema, timeStatisticsSchema]) }),
  /** Null when the scenario set no wheel capacity; dump times are left out (see the series route). */
  momentum: z
    .object({
      dumpCriterion: z.enum(['norm', 'axis']),
      dumpLevelNms: z.number(),
      dumpCount: z.number().int(),
      dumpsPerDay: z.number(),
      meanTimeBetweenDumpsSeconds: z.number().nullable(),
      peakMomentumNms: z.number(),
      peakAxisMomentumNms: z.tuple([z.number(), z.number(), z.number()]),
      finalMomentumBody: z.tuple([z.number(), z.number(), z.number()]),
    })
    .nullable(),
  /** Null for a vehicle that is not a sail. */
  sail: z
    .object({
      characteristicAccelMps2: z.number(),
      lightnessNumber: z.number(),
      sailLoadingKgM2: z.number().nullable(),
      targetHeliocentricRadiusM: z.number().nullable(),
      timeToTargetSeconds: z.number().nullable(),
    })
    .nullable(),
});
export type RunBudgetReport = z.infer<typeof runBudgetReportSchema>;

/** Path of `PUT|DELETE /api/missions/:missionId/requirements/:line`. */
export const requirementParamsSchema = z.object({ missionId: uuid('missionId'), line: budgetLineKeySchema });
export type RequirementParams = z.infer<typeof requirementParamsSchema>;

/**
 * Body of `PUT .../requirements/:line`, checked together with the line from the path:
 * { comparator, value, unit?, minMarginPercent?, note? } (the shared budgetRequirementSchema plus a note).
 */
export const requirementUpsertSchema = z.intersection(
  budgetRequirementSchema,
  z.object({
    /** Why this limit (source document, rationale). */
    note: z.string({ error: 'note must be text' }).max(2000, 'note must be at most 2000 characters').optional(),
  }),
);
export type RequirementUpsert = z.infer<typeof requirementUpsertSchema>;

/** A mission's requirement on one budget line. */
export const missionRequirementSchema = z.object({
  id: z.uuid(),
  line: budgetLineKeySchema,
  label: z.string(),
  unit: z.string(),
  comparator: budgetComparatorSchema,
  value: z.number(),
  minMarginPercent: z.number(),
  note: z.string(),
  setBy: z.uuid().nullable(),
  updatedAt: z.iso.datetime(),
});
export type MissionRequirement = z.infer<typeof missionRequirementSchema>;

/** `GET .../requirements`: in budget line order. */
export const missionRequirementListSchema = z.object({ requirements: z.array(missionRequirementSchema) });
export type MissionRequirementList = z.infer<typeof missionRequirementListSchema>;

/** Columns of the budget CSV export, in order. */
export const budgetCsvColumns = [
  'key',
  'label',
  'value',
  'unit',
  'comparator',
  'requirement',
  'min_margin_percent',
  'margin_percent',
  'status',
] as const;
