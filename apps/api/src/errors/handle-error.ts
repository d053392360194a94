import type { ErrorRequestHandler } from 'express';
import type { ApiError } from '@photon-ledger/shared';
import { AppError } from './app-error';

/** Turns anything thrown into an AppError; unknown errors become `internal` and are logged. */
export function toAppError(err: unknown): AppError {
  if (err instanceof AppError) return err;
  // body-parser marks malformed JSON with type 'entity.parse.failed'
  if (isRecord(err) && err.type === 'entity.parse.failed') {
    return new AppError('validation_failed', 'request body is not valid JSON', { cause: err });
  }
  if (isRecord(err) && err.type === 'entity.too.large') {
    return new AppError('validation_failed', 'request body is too large', { cause: err, status: 413 });
  }
  return new AppError('internal', 'internal error', { cause: err });
}

/** The one place errors are reported: the Express handler, the worker and process handlers use it. */
export function reportError(err: AppError, context: string): void {
  if (err.code === 'internal') {
    console.error(`[${context}]`, err.cause ?? err);
  }
}

/** Express error middleware producing the shared error shape. */
export const errorMiddleware: ErrorRequestHandler = (err, req, res, _next) => {
  const appError = toAppError(err);
  reportError(appError, `${req.method} ${req.path}`);
  const body: ApiError = {
    error: {
      code: appError.code,
      message: appError.message,
      ...(appError.fields ? { fields: appError.fields } : {}),
    },
  };
  res.status(appError.status).json(body);
};

/** Last-resort handlers for the API and worker processes. */
export function installProcessHandlers(context: string): void {
  process.on('unhandledRejection', (reason) => reportError(toAppError(reason), `${context} unhandledRejection`));
  process.on('uncaughtException', (error) => {
    reportError(toAppError(error), `${context} uncaughtException`);
    process.exitCode = 1;
  });
}

function isRecord(v: unknown): v is Record<string, unknown> {
  return typeof v === 'object' && v !== null;
}
