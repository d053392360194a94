/**
 * Ephemeris samples of a run in PostgreSQL, as chunks of packed rows (table run_sample_chunks):
 * each chunk holds up to SAMPLE_CHUNK_ROWS rows of `stride` little-endian float64 numbers, in the
 * column order of srp-core's SampleLayout. A million samples are about 250 chunks: cheap to insert
 * in one transaction and to stream back one chunk at a time with flat memory.
 */
import { QueryTypes, type Sequelize, type Transaction } from 'sequelize';
import { RunSampleChunkModel } from '../models';

/** Rows per stored chunk (about 170 kB at 21 columns). */
export const SAMPLE_CHUNK_ROWS = 1024;

const littleEndian = new Uint8Array(new Float64Array([1]).buffer)[7] === 0x3f;

/** Rows [from, to) of a packed history as the stored bytes (little-endian float64). */
function packRows(samples: Float64Array, stride: number, from: number, to: number): Buffer {
  const view = samples.subarray(from * stride, to * stride);
  const bytes = Buffer.from(view.buffer, view.byteOffset, view.byteLength);
  if (littleEndian) return Buffer.from(bytes); // copy: the caller's array may be reused
  const out = Buffer.alloc(view.length * 8);
  for (let i = 0; i < view.length; i += 1) out.writeDoubleLE(view[i]!, i * 8);
  return out;
}

/** Decodes a stored chunk into numbers (a copy, aligned). */
export function unpackRows(data: Buffer): Float64Array {
  const out = new Float64Array(data.length / 8);
  if (littleEndian) {
    new Uint8Array(out.buffer).set(data);
    return out;
  }
  for (let i = 0; i < out.length; i += 1) out[i] = data.readDoubleLE(i * 8);
  return out;
}

/**
 * Replaces the stored samples of a run with `sampleCount` rows of `samples` (inside the caller's
 * transaction, so a retried job never leaves two copies or half of one).
 */
export async function writeSamples(
  runId: string,
  samples: Float64Array,
  stride: number,
  sampleCount: number,
  transaction: Transaction,
): Promise<number> {
  await RunSampleChunkModel.destroy({ where: { runId }, transaction });
  let chunks = 0;
  // Insert in batches of chunks: one statement per batch keeps round trips few and messages small.
  const batch: { runId: string; chunkIndex: number; tStart: number; tEnd: number; rowCount: number; data: Buffer }[] = [];
  for (let from = 0; from < sampleCount; from += SAMPLE_CHUNK_ROWS) {
    const to = Math.min(sampleCount, from + SAMPLE_CHUNK_ROWS);
    batch.push({
      runId,
      chunkIndex: chunks,
      tStart: samples[from * stride]!,
      tEnd: samples[(to - 1) * stride]!,
      rowCount: to - from,
      data: packRows(samples, stride, from, to),
    });
    chunks += 1;
    if (batch.length === 16) {
      await RunSampleChunkModel.bulkCreate(batch, { transaction });
      batch.length = 0;
    }
  }
  if (batch.length > 0) await RunSampleChunkModel.bulkCreate(batch, { transaction });
  return chunks;
}

/** A decoded chunk: `rowCount` rows of `stride` numbers. */
export interface SampleChunk {
  chunkIndex: number;
  rowCount: number;
  rows: Float64Array;
}

/**
 * Streams a run's chunks in time order, one query per chunk (keyset on chunk_index), optionally
 * only those that overlap [fromT, toT] (s from the epoch). Memory stays one chunk whatever the run's size.
 */
export async function* readSampleChunks(
  sequelize: Sequelize,
  runId: string,
  range: { fromT?: number; toT?: number } = {},
): AsyncGenerator<SampleChunk, void, undefined> {
  let next = -1;
  if (range.fromT !== undefined) {
    const [first] = await sequelize.query<{ chunk_index: number }>(
      `SELECT chunk_index FROM run_sample_chunks WHERE run_id = :runId AND t_end >= :fromT ORDER BY chunk_index LIMIT 1`,
      { replacements: { runId, fromT: range.fromT }, type: QueryTypes.SELECT },
    );
    if (!first) return;
    next = first.chunk_index - 1;
  }
  for (;;) {
    const [row] = await sequelize.query<{ chunk_index: number; row_count: number; t_start: number; data: Buffer }>(
      `SELECT chunk_index, row_count, t_start, data FROM run_sample_chunks
        WHERE run_id = :runId AND chunk_index > :next ORDER BY chunk_index LIMIT 1`,
      { replacements: { runId, next }, type: QueryTypes.SELECT },
    );
    if (!row) return;
    if (range.toT !== undefined && row.t_start > range.toT) return;
    yield { chunkIndex: row.chunk_index, rowCount: row.row_count, rows: unpackRows(row.data) };
    next = row.chunk_index;
  }
}
