import { describe, expect, it } from 'vitest';
import {
  budgetLineKeys,
  budgetLineResultSchema,
  budgetRequirementSchema,
  budgetRequirementsSchema,
  budgetLineUnits,
} from './budget';
import { fieldErrors } from './errors';

function errorsOf(schema: typeof budgetRequirementSchema | typeof budgetRequirementsSchema, value: unknown): Record<string, string> {
  const result = schema.safeParse(value);
  expect(result.success).toBe(false);
  return result.success ? {} : fieldErrors(result.error);
}

describe('budgetRequirementSchema', () => {
  it('accepts a delta-v ceiling and fills in a minimum margin of 0 %', () => {
    expect(budgetRequirementSchema.parse({ line: 'srp.deltaV.total', comparator: '<=', value: 2.5, unit: 'm/s' })).toEqual({
      line: 'srp.deltaV.total',
      comparator: '<=',
      value: 2.5,
      unit: 'm/s',
      minMarginPercent: 0,
    });
  });

  it('refuses an unknown line with a message naming line and listing the keys', () => {
    const errors = errorsOf(budgetRequirementSchema, { line: 'srp.deltaV', comparator: '<=', value: 1 });
    expect(errors.line).toMatch(/^line must be one of srp\.accel\.mean/);
  });

  it.each([
    [{ comparator: '<' }, 'comparator', /'<=' or '>='/],
    [{ value: 0 }, 'value', /must not be 0/],
    [{ value: Number.POSITIVE_INFINITY }, 'value', /finite number/],
    [{ unit: 'km/s' }, 'unit', /unit of srp\.deltaV\.total is m\/s/],
    [{ minMarginPercent: -5 }, 'minMarginPercent', /0 or more/],
  ])('refuses %o with a message naming %s', (patch, field, message) => {
    const errors = errorsOf(budgetRequirementSchema, { line: 'srp.deltaV.total', comparator: '<=', value: 2.5, ...patch });
    expect(errors[field]).toMatch(message);
  });

  it('refuses two requirements on one line, naming the second', () => {
    const r = { line: 'drift.raan', comparator: '<=', value: 0.1 };
    const errors = errorsOf(budgetRequirementsSchema, [r, { ...r, comparator: '>=' }]);
    expect(errors['1.line']).toMatch(/already has a requirement/);
  });

  it('gives every key a unit', () => {
    expect(budgetLineKeys.length).toBe(20);
    for (const key of budgetLineKeys) expect(budgetLineUnits[key].length).toBeGreaterThan(0);
  });
});

describe('budgetLineResultSchema', () => {
  it('accepts a passing line and a line without a value', () => {
    const pass = {
      key: 'srp.deltaV.total',
      label: 'Delta-v from SRP, integral of |a|',
      value: 1.2,
      unit: 'm/s',
      requirement: { comparator: '<=', value: 2, minMarginPercent: 10 },
      marginPercent: 40,
      pass: true,
      status: 'pass',
    };
    expect(budgetLineResultSchema.parse(pass)).toEqual(pass);
    const none = { key: 'sail.timeToTarget', label: 'x', value: null, unit: 's', note: 'not reached', status: 'no-requirement' };
    expect(budgetLineResultSchema.parse(none)).toEqual(none);
  });

  it('refuses an unknown status with a message naming status', () => {
    const result = budgetLineResultSchema.safeParse({ key: 'torque.max', label: 'x', value: 1, unit: 'N*m', status: 'ok' });
    expect(result.success).toBe(false);
    if (!result.success) expect(fieldErrors(result.error).status).toMatch(/status must be one of/);
  });
});
