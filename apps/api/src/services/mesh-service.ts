/**
 * Meshes: import an uploaded OBJ/STL file into the body frame with srp-core's reader (the upload,
 * the mesh and the audit line in one transaction; a refused file leaves nothing behind), list and
 * read them, and serve the geometry in the compact binary form of api-meshes.ts.
 */
import { createHash, randomUUID } from 'node:crypto';
import { UniqueConstraintError } from 'sequelize';
import { readMesh, SrpError, type TriangleMesh } from '@photon-ledger/srp-core';
import { MESH_MAX_TRIANGLES, type MeshImportForm, type MeshSummary, type User } from '@photon-ledger/shared';
import { AppError, notFound } from '../errors/app-error';
import type { ReceivedFile } from '../middleware/upload';
import { audit, MeshModel, UploadModel } from '../models';
import { authorOf, authorsById } from './audit-service';

/** Bytes per stored triangle: 9 float64 coordinates and one uint32 group index. */
const STORED_TRIANGLE_BYTES = 9 * 8 + 4;
/** Bytes per triangle of the geometry answer: 9 float32 coordinates and one uint32 group index. */
const SERVED_TRIANGLE_BYTES = 9 * 4 + 4;

/** Packs a mesh as stored: little-endian float64 positions, then uint32 group indices. */
export function encodeGeometry(mesh: TriangleMesh): Buffer {
  const count = mesh.groupOfTriangle.length;
  const buffer = Buffer.allocUnsafe(count * STORED_TRIANGLE_BYTES);
  const positions = mesh.positions;
  for (let i = 0; i < positions.length; i++) buffer.writeDoubleLE(positions[i]!, i * 8);
  const groupsAt = positions.length * 8;
  for (let t = 0; t < count; t++) buffer.writeUInt32LE(mesh.groupOfTriangle[t]!, groupsAt + t * 4);
  return buffer;
}

/** Unpacks stored geometry into srp-core's mesh. */
export function decodeGeometry(geometry: Buffer, groupNames: readonly string[]): TriangleMesh {
  const count = geometry.length / STORED_TRIANGLE_BYTES;
  if (!Number.isInteger(count)) throw new Error(`stored mesh geometry has ${geometry.length} bytes, not a multiple of ${STORED_TRIANGLE_BYTES}`);
  const positions = new Float64Array(count * 9);
  for (let i = 0; i < positions.length; i++) positions[i] = geometry.readDoubleLE(i * 8);
  const groupOfTriangle = new Uint32Array(count);
  const groupsAt = positions.length * 8;
  for (let t = 0; t < count; t++) groupOfTriangle[t] = geometry.readUInt32LE(groupsAt + t * 4);
  return { positions, groupOfTriangle, groupNames: [...groupNames] };
}

function toMeshSummary(row: MeshModel, authors: Awaited<ReturnType<typeof authorsById>>): MeshSummary {
  const author = authorOf(authors, row.createdBy);
  return {
    id: row.id,
    missionId: row.missionId,
    uploadId: row.uploadId,
    name: row.name,
    fileName: row.fileName,
    format: row.format,
    units: row.units,
    rotationDeg: row.rotationDeg,
    translationM: row.translationM,
    triangleCount: row.triangleCount,
    droppedDegenerate: row.droppedDegenerate,
    groups: row.groups,
    totalAreaM2: row.totalAreaM2,
    boundsM: row.boundsM,
    geometrySha256: row.geometrySha256,
    createdAt: row.createdAt.toISOString(),
    createdBy: author ? { id: author.id, displayName: author.displayName } : null,
  };
}

/** The reader's message without the file name in front: `line 12: ...` or `triangle 3: ...`. */
function fileProblem(err: SrpError): string {
  const details = err.details as { line?: number; triangle?: number };
  for (const place of [details.line !== undefined ? `line ${details.line}: ` : null, details.triangle !== undefined ? `triangle ${details.triangle}: ` : null]) {
    if (!place) continue;
    const at = err.message.indexOf(`, ${place}`);
    if (at >= 0) return err.message.slice(at + 2);
  }
  return err.message.replace(/^mesh file[^:]*: /, '');
}

/**
 * Reads the file into a mesh and stores the upload (kind `mesh`, with size and SHA-256), the mesh
 * and an audit line in one transaction.
 * @throws AppError 400 on `file` (`line N: ...`) for a file the reader refuses; 409 on `name` for a
 *   name already used by a mesh of the mission
 */
export async function importMesh(user: User, missionId: string, file: ReceivedFile, form: MeshImportForm): Promise<MeshSummary> {
  let imported: ReturnType<typeof readMesh>;
  try {
    imported = readMesh(new Uint8Array(file.buffer.buffer, file.buffer.byteOffset, file.buffer.length), {
      fileName: file.originalName,
      units: form.units,
      rotationDeg: form.rotationDeg,
      translationM: form.translationM,
      maxTriangles: MESH_MAX_TRIANGLES,
    });
  } catch (err) {
    if (!(err instanceof SrpError)) throw err;
    const field = err.details.field && err.details.field !== 'file' ? err.details.field : 'file';
    const problem = field === 'file' ? fileProblem(err) : err.message;
    throw new AppError('validation_failed', `the mesh was refused: ${field}: ${problem}`, { fields: { [field]: problem }, cause: err });
  }
  const geometry = encodeGeometry(imported.mesh);
  const geometrySha256 = createHash('sha256').update(geometry).digest('hex');
  const name = form.name ?? file.originalName.slice(0, 120);
  const meshId = randomUUID();
  const triangleCount = imported.mesh.groupOfTriangle.length;

  const sequelize = MeshModel.sequelize!;
  try {
    const row = await sequelize.transaction(async (transaction) => {
      const upload = await UploadModel.create(
        {
          missionId,
          kind: 'mesh',
          fileName: file.originalName,
          contentType: file.contentType,
          sizeBytes: file.buffer.length,
          sha256: createHash('sha256').update(file.buffer).digest('hex'),
          summary: { meshId, format: imported.format, triangleCount, droppedDegenerate: imported.droppedDegenerate },
          data: file.buffer,
          createdBy: user.id,
        },
        { transaction },
      );
      const mesh = await MeshModel.create(
        {
          id: meshId,
          missionId,
          uploadId: upload.id,
          name,
          fileName: file.originalName,
          format: imported.format,
          units: form.units,
          rotationDeg: form.rotationDeg,
          translationM: form.translationM,
          triangleCount,
          droppedDegenerate: imported.droppedDegenerate,
          groups: imported.groups.map((g) => ({ name: g.name, triangleCount: g.triangleCount, areaM2: g.areaM2 })),
          totalAreaM2: imported.totalAreaM2,
          boundsM: imported.boundsM,
          geometry,
          geometrySha256,
          createdBy: user.id,
        },
        { transaction },
      );
      await audit(
        {
          userId: user.id,
          missionId,
          action: 'mesh-imported',
          entityType: 'mesh',
          entityId: meshId,
          detail: {
            name,
            fileName: file.originalName,
            uploadId: upload.id,
            sha256: upload.sha256,
            format: imported.format,
            triangleCount,
            droppedDegenerate: imported.droppedDegenerate,
          },
        },
        transaction,
      );
      return mesh;
    });
    const authors = new Map([[user.id, { id: user.id, displayName: user.displayName }]]);
    return toMeshSummary(row, authors);
  } catch (err) {
    if (err instanceof UniqueConstraintError) {
      throw new AppError('conflict', `a mesh named "${name}" already exists in this mission`, {
        fields: { name: 'already used by another mesh of this mission: choose another name' },
        cause: err,
      });
    }
    throw err;
  }
}

/** The mission's meshes, newest first. */
export async function listMeshes(missionId: string): Promise<MeshSummary[]> {
  const rows = await MeshModel.findAll({ where: { missionId }, order: [['createdAt', 'DESC'], ['id', 'ASC']] });
  const authors = await authorsById(rows.map((r) => r.createdBy));
  return rows.map((r) => toMeshSummary(r, authors));
}

/** A mesh of the mission; 404 when there is none. */
export async function getMesh(missionId: string, meshId: string): Promise<MeshSummary> {
  const row = await MeshModel.findOne({ where: { id: meshId, missionId } });
  if (!row) throw notFound('mesh');
  return toMeshSummary(row, await authorsById([row.createdBy]));
}

/** A mesh's stored triangles as srp-core's mesh (for the table jobs); null when it is gone. */
export async function loadTriangleMesh(meshId: string): Promise<TriangleMesh | null> {
  const row = await MeshModel.unscoped().findByPk(meshId, { attributes: ['id', 'groups', 'geometry'] });
  return row ? decodeGeometry(row.geometry, row.groups.map((g) => g.name)) : null;
}

/**
 * `GET .../geometry`: float32 coordinates (9 per triangle) then uint32 group indices, little-endian,
 * as api-meshes.ts documents; with the triangle count for the header.
 */
export async function meshGeometry(missionId: string, meshId: string): Promise<{ triangleCount: number; body: Buffer }> {
  const row = await MeshModel.unscoped().findOne({ where: { id: meshId, missionId }, attributes: ['id', 'triangleCount', 'geometry'] });
  if (!row) throw notFound('mesh');
  const count = row.triangleCount;
  const stored = row.geometry;
  const body = Buffer.allocUnsafe(count * SERVED_TRIANGLE_BYTES);
  for (let i = 0; i < count * 9; i++) body.writeFloatLE(stored.readDoubleLE(i * 8), i * 4);
  // The group indices are the same bytes in both layouts.
  stored.copy(body, count * 36, count * 72, count * 72 + count * 4);
  return { triangleCount: count, body };
}
