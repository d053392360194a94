import type { Request, Response } from 'express';
import multer from 'multer';
import { AppError } from '../errors/app-error';

/** The form field that carries the file. */
export const UPLOAD_FIELD = 'file';

/** A file received into memory, with the form's text fields beside it. */
export interface ReceivedFile {
  buffer: Buffer;
  /** The name on the uploader's machine (UTF-8), at most 255 characters. */
  originalName: string;
  /** Content type as the client declared it. */
  contentType: string;
  /** Text fields of the form (strings). */
  fields: Record<string, unknown>;
}

const readers = new Map<number, ReturnType<ReturnType<typeof multer>['single']>>();

/** One multer middleware per size limit, built on first use. */
function readerFor(maxBytes: number) {
  let reader = readers.get(maxBytes);
  if (!reader) {
    reader = multer({
      storage: multer.memoryStorage(),
      limits: { fileSize: maxBytes, files: 1, fields: 20, fieldSize: 16 * 1024, parts: 21 },
      // Browsers send non-ASCII file names as raw UTF-8 in the part header.
      defParamCharset: 'utf8',
    }).single(UPLOAD_FIELD);
    readers.set(maxBytes, reader);
  }
  return reader;
}

function megabytes(bytes: number): string {
  return `${(bytes / (1024 * 1024)).toLocaleString('en', { maximumFractionDigits: 1 })} MB`;
}

/** Multer's refusals, said in the product's words and put on the field they concern. */
function multerProblem(err: multer.MulterError, maxBytes: number): AppError {
  const on = (field: string, message: string) => new AppError('validation_failed', `${field}: ${message}`, { fields: { [field]: message }, cause: err });
  switch (err.code) {
    case 'LIMIT_FILE_SIZE':
      return on(UPLOAD_FIELD, `the file is larger than the ${megabytes(maxBytes)} accepted here`);
    case 'LIMIT_UNEXPECTED_FILE':
      return on(UPLOAD_FIELD, `send the file in the form field "${UPLOAD_FIELD}"${err.field ? ` (got "${err.field}")` : ''}, and only one file`);
    case 'LIMIT_FILE_COUNT':
      return on(UPLOAD_FIELD, 'send exactly one file');
    case 'LIMIT_FIELD_VALUE':
      return on(err.field ?? UPLOAD_FIELD, 'this form field is too long');
    default:
      return on(UPLOAD_FIELD, `the form could not be read (${err.message})`);
  }
}

/**
 * Reads a multipart/form-data request holding one file in the field `file` (at most `maxBytes`)
 * into memory. Call it after the caller is known to be allowed, so refused requests never have
 * their files read. Every refusal is a 400 naming `file` (or the form field concerned).
 */
export async function receiveFile(req: Request, res: Response, maxBytes: number): Promise<ReceivedFile> {
  await new Promise<void>((resolve, reject) => {
    readerFor(maxBytes)(req, res, (err: unknown) => {
      if (err === undefined || err === null) resolve();
      else if (err instanceof multer.MulterError) reject(multerProblem(err, maxBytes));
      else reject(new AppError('validation_failed', `file: the multipart body could not be read`, { fields: { [UPLOAD_FIELD]: 'the multipart body could not be read; send multipart/form-data' }, cause: err }));
    });
  });
  const file = req.file;
  if (!file || !file.buffer) {
    throw new AppError('validation_failed', `file: attach the file as multipart/form-data in the field "${UPLOAD_FIELD}"`, {
      fields: { [UPLOAD_FIELD]: `attach the file as multipart/form-data in the field "${UPLOAD_FIELD}"` },
    });
  }
  return {
    buffer: file.buffer,
    originalName: (file.originalname || 'upload.csv').slice(0, 255),
    contentType: /^[\w.+-]+\/[\w.+-]+(;.*)?$/.test(file.mimetype) ? file.mimetype.slice(0, 120) : 'text/csv',
    fields: { ...(req.body as Record<string, unknown> | undefined) },
  };
}
