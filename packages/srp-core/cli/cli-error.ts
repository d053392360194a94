import type { z } from 'zod';
import { fieldErrors } from '@photon-ledger/shared';

/** A mistake in the command line or an input file: printed as one message, exit code 2. */
export class CliError extends Error {
  override readonly name = 'CliError';
}

/**
 * Parses `value` with a shared schema; on failure throws a CliError listing every offending field
 * as `source: path: message`.
 */
export function parseWith<S extends z.ZodType>(schema: S, value: unknown, source: string): z.infer<S> {
  const result = schema.safeParse(value);
  if (result.success) return result.data;
  const lines = Object.entries(fieldErrors(result.error)).map(([field, message]) => `  ${source}: ${field}: ${message}`);
  throw new CliError(`invalid ${source}:\n${lines.join('\n')}`);
}
