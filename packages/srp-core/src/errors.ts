/** The closed set of reasons srp-core refuses or fails a computation. */
export const srpErrorCodes = [
  /** A value is not usable at all (not a finite number, a zero-length direction). */
  'invalid_input',
  /** A finite value lies outside its physical domain (a negative area, a fraction above 1). */
  'out_of_range',
  /** Surface optics fractions do not add up to 1. */
  'optics_sum',
  /** An iterative method (root finding, integration) did not meet its tolerance. */
  'not_converged',
] as const;
export type SrpErrorCode = (typeof srpErrorCodes)[number];

/** What was wrong, in a form a caller can map back onto its own field names. */
export interface SrpErrorDetails {
  /** Path of the offending input, dot-separated (`distanceM`, `plate.front.specular`). */
  field: string;
  /** The value that was refused. */
  value: unknown;
  /** The bound or rule the value broke, when there is one (`> 0`, `[0, 1]`, `1 ± 1e-9`). */
  limit?: number | string;
}

/** The one error class srp-core throws; it never returns a silent NaN instead. */
export class SrpError extends Error {
  override readonly name = 'SrpError';
  readonly code: SrpErrorCode;
  readonly details: SrpErrorDetails;

  constructor(code: SrpErrorCode, message: string, details: SrpErrorDetails) {
    super(message);
    this.code = code;
    this.details = details;
  }
}

/**
 * Throws unless `value` is a finite number greater than 0.
 * @returns the value, for use in expressions
 */
export function requirePositive(value: number, field: string, unit: string): number {
  if (!Number.isFinite(value)) {
    throw new SrpError(
      'invalid_input',
      `${field} must be a finite number (${unit}) greater than 0; got ${String(value)}`,
      { field, value, limit: '> 0' },
    );
  }
  if (value <= 0) {
    throw new SrpError('out_of_range', `${field} must be greater than 0 (${unit}); got ${value}`, {
      field,
      value,
      limit: '> 0',
    });
  }
  return value;
}
