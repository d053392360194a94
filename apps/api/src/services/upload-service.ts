import { createHash } from 'node:crypto';
import type { Transaction } from 'sequelize';
import { parseAttitudeCsv, SrpError } from '@photon-ledger/srp-core';
import type {
  AttitudeProfileUploadResult,
  PlateSetUploadForm,
  PlateSetUploadResult,
  Upload,
  UploadListQuery,
  User,
  VehicleSpec,
} from '@photon-ledger/shared';
import { AppError, notFound } from '../errors/app-error';
import type { ReceivedFile } from '../middleware/upload';
import { UploadModel, audit, type UploadKind } from '../models';
import { authorOf, authorsById } from './audit-service';
import { insertRevision, insertVehicle } from './vehicle-service';
import { parsePlateSetCsv, plateSetProblemKey, type PlateSetProblem } from './plate-set-csv';

function toUpload(row: UploadModel, authors: Awaited<ReturnType<typeof authorsById>>): Upload {
  return {
    id: row.id,
    missionId: row.missionId,
    kind: row.kind,
    fileName: row.fileName,
    contentType: row.contentType,
    sizeBytes: row.sizeBytes,
    sha256: row.sha256,
    author: authorOf(authors, row.createdBy),
    createdAt: row.createdAt.toISOString(),
    // The summary was written by this service for this kind.
    summary: row.summary,
  } as Upload;
}

/** The file as UTF-8 text; anything else is refused on `file`. */
function utf8Text(file: ReceivedFile): string {
  try {
    return new TextDecoder('utf-8', { fatal: true }).decode(file.buffer);
  } catch (err) {
    throw new AppError('validation_failed', 'file: the file is not UTF-8 text; save the CSV as UTF-8', {
      fields: { file: 'not UTF-8 text; save the CSV as UTF-8' },
      cause: err,
    });
  }
}

/** Stores the bytes with their size and SHA-256, audited, inside the caller's transaction. */
async function storeUpload(
  transaction: Transaction,
  user: User,
  missionId: string,
  kind: UploadKind,
  file: ReceivedFile,
  summary: Record<string, unknown>,
): Promise<UploadModel> {
  const row = await UploadModel.create(
    {
      missionId,
      kind,
      fileName: file.originalName,
      contentType: file.contentType,
      sizeBytes: file.buffer.length,
      sha256: createHash('sha256').update(file.buffer).digest('hex'),
      summary,
      data: file.buffer,
      createdBy: user.id,
    },
    { transaction },
  );
  await audit(
    {
      userId: user.id,
      missionId,
      action: 'upload-created',
      entityType: 'upload',
      entityId: row.id,
      detail: { kind, fileName: row.fileName, sizeBytes: row.sizeBytes, sha256: row.sha256 },
    },
    transaction,
  );
  return row;
}

function refused(what: string, problems: PlateSetProblem[]): AppError {
  const fields: Record<string, string> = {};
  for (const p of problems) {
    const key = plateSetProblemKey(p);
    if (!(key in fields)) fields[key] = p.message;
  }
  const first = problems[0]!;
  const more = problems.length > 1 ? ` (and ${problems.length - 1} more listed in fields)` : '';
  return new AppError('validation_failed', `${what} was refused: ${plateSetProblemKey(first)}: ${first.message}${more}`, { fields });
}

/**
 * A plate-set CSV becomes a revision: of an existing vehicle (its name, mass, centre of mass and
 * description kept, the plates replaced), or revision 1 of a new vehicle. The upload row and the
 * revision are written in one transaction, so a refused file leaves nothing behind.
 */
export async function uploadPlateSet(user: User, missionId: string, file: ReceivedFile, form: PlateSetUploadForm): Promise<PlateSetUploadResult> {
  const parsed = parsePlateSetCsv(utf8Text(file));
  if (!parsed.ok) throw refused('the plate set', parsed.problems);
  const plates = parsed.plates;
  const totalAreaM2 = plates.reduce((sum, p) => sum + p.areaM2, 0);
  const note = form.note ?? `plates from ${file.originalName}`;

  const sequelize = UploadModel.sequelize!;
  return sequelize.transaction(async (transaction) => {
    const upload = await storeUpload(transaction, user, missionId, 'plate-set', file, { plateCount: plates.length, totalAreaM2 });
    const write = { note, sourceUploadId: upload.id };
    const saved =
      form.target === 'existing'
        ? await insertRevision(transaction, user, missionId, form.vehicleId, form.basedOnRevision, (latest) => withPlates(latest, plates), write)
        : await insertVehicle(
            transaction,
            user,
            missionId,
            form.name,
            {
              kind: 'plates',
              name: form.name,
              ...(form.description !== undefined ? { description: form.description } : {}),
              massKg: form.massKg,
              centreOfMassM: form.centreOfMassM,
              plates,
            },
            write,
          );
    await upload.update(
      { summary: { plateCount: plates.length, totalAreaM2, vehicleId: saved.vehicle.id, revision: saved.revision.revision } },
      { transaction },
    );
    const authors = new Map([[user.id, { id: user.id, displayName: user.displayName }]]);
    return { upload: toUpload(upload, authors), vehicle: saved.vehicle, revision: saved.revision };
  });
}

/** The latest spec's name, description, mass and centre of mass with new plates. */
function withPlates(latest: VehicleSpec, plates: Extract<VehicleSpec, { kind: 'plates' }>['plates']): VehicleSpec {
  return {
    kind: 'plates',
    name: latest.name,
    ...(latest.description !== undefined ? { description: latest.description } : {}),
    massKg: latest.massKg,
    centreOfMassM: latest.centreOfMassM,
    plates,
  };
}

/**
 * An attitude-profile CSV, read with srp-core's parser (the one runs use) and stored with its
 * row count and time span; its id is what a tabulated attitude law names as `profileId`.
 */
export async function uploadAttitudeProfile(user: User, missionId: string, file: ReceivedFile): Promise<AttitudeProfileUploadResult> {
  const text = utf8Text(file);
  if (text.trim() === '') {
    throw refused('the attitude profile', [{ row: undefined, column: undefined, message: 'the file is empty: expected a header time_utc (or t_s),q_w,q_x,q_y,q_z and at least 2 rows' }]);
  }
  let profile: ReturnType<typeof parseAttitudeCsv>;
  try {
    profile = parseAttitudeCsv(text, { field: 'file' });
  } catch (err) {
    if (!(err instanceof SrpError)) throw err;
    const details = err.details as { row?: number; column?: string };
    // The parser's message starts with "file row N, column C: "; the key says where already.
    const message = err.message.replace(/^file( row \d+(, column [^:]+)?)?: /, '');
    throw refused('the attitude profile', [{ row: details.row, column: details.column, message }]);
  }
  const times = profile.timesS;
  const summary = {
    rowCount: times.length,
    startSeconds: times[0]!,
    endSeconds: times[times.length - 1]!,
    ...(profile.epochUtc !== undefined ? { epochUtc: profile.epochUtc } : {}),
    timeColumn: profile.timeColumn,
  };
  const sequelize = UploadModel.sequelize!;
  const upload = await sequelize.transaction((transaction) => storeUpload(transaction, user, missionId, 'attitude-profile', file, summary));
  const authors = new Map([[user.id, { id: user.id, displayName: user.displayName }]]);
  return { upload: toUpload(upload, authors) };
}

/** The mission's uploads, newest first, without their bytes. */
export async function listUploads(missionId: string, query: UploadListQuery): Promise<Upload[]> {
  const rows = await UploadModel.findAll({
    where: { missionId, ...(query.kind ? { kind: query.kind } : {}) },
    order: [
      ['createdAt', 'DESC'],
      ['id', 'ASC'],
    ],
  });
  const authors = await authorsById(rows.map((r) => r.createdBy));
  return rows.map((r) => toUpload(r, authors));
}

/** The stored bytes of an upload of this mission, with the name and type to send them under. */
export async function getUploadContent(missionId: string, uploadId: string): Promise<{ fileName: string; contentType: string; data: Buffer }> {
  const row = await UploadModel.unscoped().findOne({ where: { id: uploadId, missionId }, attributes: ['fileName', 'contentType', 'data'] });
  if (!row) throw notFound('upload');
  return { fileName: row.fileName, contentType: row.contentType, data: row.data };
}

/** Whether `uploadId` is an attitude-profile upload of this mission (scenarios may name only those). */
export async function isMissionAttitudeProfile(missionId: string, uploadId: string): Promise<boolean> {
  const row = await UploadModel.findOne({ where: { id: uploadId, missionId, kind: 'attitude-profile' }, attributes: ['id'] });
  return row !== null;
}

/** The text of an attitude-profile upload of this mission, for building a run; 404 if there is none. */
export async function attitudeProfileText(missionId: string, uploadId: string): Promise<string> {
  const row = await UploadModel.unscoped().findOne({ where: { id: uploadId, missionId, kind: 'attitude-profile' }, attributes: ['data'] });
  if (!row) throw notFound('attitude profile');
  return row.data.toString('utf8');
}
