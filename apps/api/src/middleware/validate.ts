import type { z } from 'zod';
import { fieldErrors } from '@photon-ledger/shared';
import { AppError } from '../errors/app-error';

/**
 * Parses one part of a request with a shared schema; a failure becomes a 400 whose `fields`
 * name every offending field.
 */
export function parseInput<S extends z.ZodType>(schema: S, value: unknown, part: 'body' | 'query' | 'path'): z.infer<S> {
  const result = schema.safeParse(value ?? {});
  if (result.success) return result.data;
  const fields = fieldErrors(result.error);
  const names = Object.keys(fields).join(', ');
  throw new AppError('validation_failed', `invalid ${part}: check ${names}`, { fields });
}
