import { z } from 'zod';

/** Machine-readable error codes returned by the API. */
export const errorCodes = [
  'validation_failed',
  'unauthenticated',
  'forbidden',
  'not_found',
  'conflict',
  'rate_limited',
  'internal',
] as const;
export const errorCodeSchema = z.enum(errorCodes);
export type ErrorCode = z.infer<typeof errorCodeSchema>;

/** The one error shape of every API response that is not a success. */
export const apiErrorSchema = z.object({
  error: z.object({
    code: errorCodeSchema,
    message: z.string(),
    /** Field path (dot-separated) to the message for that field. */
    fields: z.record(z.string(), z.string()).optional(),
  }),
});
export type ApiError = z.infer<typeof apiErrorSchema>;

/**
 * Flattens zod issues into `{ "path.to.field": "message" }`, keeping the first message per field,
 * so that forms and API clients can show each message beside its field.
 */
export function fieldErrors(error: z.ZodError): Record<string, string> {
  const out: Record<string, string> = {};
  for (const issue of error.issues) {
    const key = issue.path.length > 0 ? issue.path.map(String).join('.') : '(root)';
    if (!(key in out)) out[key] = issue.message;
  }
  return out;
}
