import { z } from 'zod';

/**
 * Budget line keys and their units, in report order. The same closed set as srp-core's
 * `budgetLineKeys` (budgets/budget-line.ts); a test there keeps the two equal.
 */
export const budgetLineUnits = {
  'srp.accel.mean': 'm/s^2',
  'srp.accel.max': 'm/s^2',
  'srp.accel.rms': 'm/s^2',
  'srp.deltaV.total': 'm/s',
  'srp.deltaV.alongTrack': 'm/s',
  'srp.deltaV.alongTrackAbs': 'm/s',
  'drift.a': 'm/day',
  'drift.e': '1/day',
  'drift.i': 'deg/day',
  'drift.raan': 'deg/day',
  'torque.mean': 'N*m',
  'torque.max': 'N*m',
  'torque.rms': 'N*m',
  'momentum.peak': 'N*m*s',
  'momentum.dumpsPerDay': '1/day',
  'momentum.timeBetweenDumps': 's',
  'sail.characteristicAccel': 'm/s^2',
  'sail.lightnessNumber': '-',
  'sail.loading': 'kg/m^2',
  'sail.timeToTarget': 's',
} as const;

/** Every budget line key. */
export const budgetLineKeys = Object.keys(budgetLineUnits) as [BudgetLineKey, ...BudgetLineKey[]];
/** One budget line key, e.g. 'srp.deltaV.total'. */
export type BudgetLineKey = keyof typeof budgetLineUnits;

/** Validates a line key; the message lists the accepted ones. */
export const budgetLineKeySchema = z.enum(budgetLineKeys, {
  error: `line must be one of ${budgetLineKeys.join(', ')}`,
});

/** How a value must compare with its requirement: '<=' a ceiling, '>=' a floor. */
export const budgetComparators = ['<=', '>='] as const;
/** Validates `comparator`. */
export const budgetComparatorSchema = z.enum(budgetComparators, { error: "comparator must be '<=' or '>='" });

/** A requirement on one budget line, in the line's unit. */
export const budgetRequirementSchema = z
  .object({
    /** The line it applies to. */
    line: budgetLineKeySchema,
    /** '<=' or '>='. */
    comparator: budgetComparatorSchema,
    /** The limit, in the line's unit; not 0, since the margin is a percentage of it. */
    value: z
      .number({ error: "value must be a finite number in the line's unit" })
      .refine((v) => v !== 0, 'value must not be 0: the margin is a percentage of the requirement'),
    /** The unit the value is in; if given, it must be the line's unit (nothing is converted). */
    unit: z.string({ error: 'unit must be text, the unit of the line' }).optional(),
    /** Margin the value must keep (%), 0 or more; default 0. */
    minMarginPercent: z
      .number({ error: 'minMarginPercent must be a finite number (%)' })
      .gte(0, 'minMarginPercent must be 0 or more (%)')
      .default(0),
  })
  .superRefine((r, ctx) => {
    const unit = budgetLineUnits[r.line];
    if (r.unit !== undefined && r.unit !== unit) {
      ctx.addIssue({ code: 'custom', path: ['unit'], message: `unit of ${r.line} is ${unit}; give the value in ${unit}` });
    }
  });
/** A parsed requirement (minMarginPercent filled in). */
export type BudgetRequirement = z.infer<typeof budgetRequirementSchema>;

/** Requirements of a run: at most one per line. */
export const budgetRequirementsSchema = z.array(budgetRequirementSchema).superRefine((list, ctx) => {
  const seen = new Set<string>();
  list.forEach((r, i) => {
    if (seen.has(r.line)) {
      ctx.addIssue({ code: 'custom', path: [i, 'line'], message: `line ${r.line} already has a requirement: give one per line` });
    }
    seen.add(r.line);
  });
});

/** Where a line stands against its requirement. */
export const budgetLineStatuses = ['pass', 'fail', 'no-requirement', 'no-value'] as const;
export const budgetLineStatusSchema = z.enum(budgetLineStatuses, {
  error: `status must be one of ${budgetLineStatuses.join(', ')}`,
});

/** One computed budget line, as srp-core's computeBudget returns it. */
export const budgetLineResultSchema = z.object({
  key: budgetLineKeySchema,
  label: z.string({ error: 'label must be text' }),
  /** The figure in `unit`; null when there is none (target not reached, no dump within the span). */
  value: z.number({ error: 'value must be a finite number or null' }).nullable(),
  unit: z.string({ error: 'unit must be text' }),
  /** Why the value is null, or what it assumes. */
  note: z.string({ error: 'note must be text' }).optional(),
  requirement: z
    .object({
      comparator: budgetComparatorSchema,
      value: z.number({ error: 'requirement.value must be a finite number' }),
      minMarginPercent: z.number({ error: 'requirement.minMarginPercent must be a finite number (%)' }),
    })
    .optional(),
  /** Margin (%): '<=' (req − value)/|req|·100, '>=' (value − req)/|req|·100. */
  marginPercent: z.number({ error: 'marginPercent must be a finite number (%)' }).optional(),
  pass: z.boolean({ error: 'pass must be true or false' }).optional(),
  status: budgetLineStatusSchema,
});
/** A computed budget line. */
export type BudgetLineResult = z.infer<typeof budgetLineResultSchema>;

/** The name the scenario schema uses for `budgetRequirementSchema`. */
export const requirementSchema = budgetRequirementSchema;
