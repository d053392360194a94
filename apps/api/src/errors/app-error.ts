import type { ErrorCode } from '@photon-ledger/shared';

const statusOf: Record<ErrorCode, number> = {
  validation_failed: 400,
  unauthenticated: 401,
  forbidden: 403,
  not_found: 404,
  conflict: 409,
  rate_limited: 429,
  internal: 500,
};

/** The application's one error: a code from the shared closed set, a message, an HTTP status. */
export class AppError extends Error {
  readonly code: ErrorCode;
  readonly status: number;
  readonly fields: Record<string, string> | undefined;

  constructor(
    code: ErrorCode,
    message: string,
    options: { fields?: Record<string, string>; cause?: unknown; status?: number } = {},
  ) {
    super(message, { cause: options.cause });
    this.name = 'AppError';
    this.code = code;
    this.status = options.status ?? statusOf[code];
    this.fields = options.fields;
  }
}

/** 404 for anything unknown or not visible to the caller (the two are not told apart). */
export const notFound = (what: string) => new AppError('not_found', `${what} not found`);
