/**
 * Exports of a succeeded run, streamed: the CSV ephemeris and the CCSDS OEM are written chunk by
 * chunk as the stored sample chunks are read, with backpressure (a chunk is written only when the
 * client has taken the last one, and the reader stays at most one batch of chunks ahead), so a run
 * of millions of samples costs a few megabytes of memory. The bytes are those of srp-core's
 * ephemerisCsv and oemText for the same history.
 */
import type { ServerResponse } from 'node:http';
import { QueryTypes, type Sequelize } from 'sequelize';
import { stringify } from 'csv-stringify/sync';
import {
  createSampleLayout,
  EXPORT_CAUTION,
  ephemerisCsvHeader,
  ephemerisCsvRowBytes,
  oemDataLines,
  oemHeader,
  parseUtcEpoch,
  type Epoch,
  type SampleHistory,
  type SampleLayout,
} from '@photon-ledger/srp-core';
import { budgetCsvColumns, type User } from '@photon-ledger/shared';
import { AppError } from '../errors/app-error';
import { reportError, toAppError } from '../errors/handle-error';
import { budgetReportOf, prefetchedChunks, succeededRunFor, type SucceededRun } from './result-service';

/** A file ready to stream: its headers and its content, piece by piece (text, or bytes already encoded). */
export interface ExportFile {
  fileName: string;
  contentType: string;
  pieces: AsyncIterable<string | Uint8Array>;
}

/** The ORIGINATOR of our OEMs. */
export const OEM_ORIGINATOR = 'PHOTON LEDGER';

/**
 * Lower-case ASCII words joined by '-', for file names: accents dropped, anything else a separator.
 */
export function fileSlug(text: string, fallback: string): string {
  const slug = text
    .normalize('NFKD')
    .replace(/[\u0300-\u036f]/g, '')
    .toLowerCase()
    .replace(/[^a-z0-9]+/g, '-')
    .replace(/^-+|-+$/g, '')
    .slice(0, 60)
    .replace(/-+$/, '');
  return slug === '' ? fallback : slug;
}

/** `<mission-slug>-<scenario-name-slug>-<run id first 8>-<what>`. */
function exportFileName(run: SucceededRun, what: string): string {
  return `${run.mission.slug}-${fileSlug(run.summary?.scenarioName ?? run.scenario.name, 'scenario')}-${run.runId.slice(0, 8)}-${what}`;
}

/** First and last sample times of a run (s from the epoch). */
async function timeSpan(sequelize: Sequelize, runId: string): Promise<{ first: number; last: number }> {
  const [row] = await sequelize.query<{ first: number | null; last: number | null }>(
    'SELECT min(t_start) AS first, max(t_end) AS last FROM run_sample_chunks WHERE run_id = :runId',
    { replacements: { runId }, type: QueryTypes.SELECT },
  );
  if (!row || row.first === null || row.last === null) throw new AppError('conflict', 'the run has no stored samples to export');
  return { first: row.first, last: row.last };
}

/** The run's epoch exactly as the run parsed it (the scenario's epochUtc, not the rounded summary text). */
function runEpoch(run: SucceededRun): Epoch {
  return parseUtcEpoch(run.scenario.orbit.epochUtc, 'epochUtc');
}

/** Every stored chunk in turn, formatted by `format` from the chunk's rows (numbered from `firstRowIndex`). */
async function* formattedChunks<T>(
  sequelize: Sequelize,
  runId: string,
  layout: SampleLayout,
  format: (history: SampleHistory, firstRowIndex: number) => T,
): AsyncGenerator<T, void, undefined> {
  let firstRowIndex = 0;
  for await (const chunk of prefetchedChunks(sequelize, runId)) {
    yield format({ layout, samples: chunk.rows, sampleCount: chunk.rowCount }, firstRowIndex);
    firstRowIndex += chunk.rowCount;
  }
}

/** The CSV ephemeris: srp-core's header (product, caution, frame, central body, time scale, epoch, units), then the rows. */
export async function ephemerisCsvExport(sequelize: Sequelize, user: User, missionId: string, runId: string): Promise<ExportFile> {
  const run = await succeededRunFor(sequelize, user, missionId, runId, ['summary']);
  const epoch = runEpoch(run);
  const layout = createSampleLayout(run.layout.forceNames);
  const header = ephemerisCsvHeader({ epoch, centralBody: run.summary!.centralBody });
  async function* pieces(): AsyncGenerator<string | Uint8Array, void, undefined> {
    yield header;
    // Bytes written digit by digit: the same text as ephemerisCsvRows, with no strings to build and collect.
    yield* formattedChunks(sequelize, runId, layout, (history, firstRowIndex) => ephemerisCsvRowBytes(history, { epoch, firstRowIndex }));
  }
  return { fileName: exportFileName(run, 'ephemeris.csv'), contentType: 'text/csv; charset=utf-8', pieces: pieces() };
}

/**
 * The CCSDS OEM (KVN): OBJECT_NAME the vehicle's name, OBJECT_ID its revision id (no international
 * designator is known), MESSAGE_ID the run id, ORIGINATOR 'PHOTON LEDGER', the caution as a COMMENT.
 */
export async function ephemerisOemExport(sequelize: Sequelize, user: User, missionId: string, runId: string): Promise<ExportFile> {
  const run = await succeededRunFor(sequelize, user, missionId, runId, ['summary']);
  const summary = run.summary!;
  const epoch = runEpoch(run);
  const layout = createSampleLayout(run.layout.forceNames);
  const { first, last } = await timeSpan(sequelize, runId);
  const header = oemHeader(
    {
      epoch,
      centralBody: summary.centralBody,
      objectName: summary.vehicle.name,
      objectId: summary.vehicle.revisionId,
      originator: OEM_ORIGINATOR,
      messageId: runId,
    },
    first,
    last,
  );
  async function* pieces(): AsyncGenerator<string, void, undefined> {
    yield header;
    yield* formattedChunks(sequelize, runId, layout, (history, firstRowIndex) =>
      [...oemDataLines(history, { epoch, rowsPerChunk: history.sampleCount, firstRowIndex })].join(''),
    );
  }
  // No media type is registered for OEM in KVN form: plain text, as the standard's examples are.
  return { fileName: exportFileName(run, 'ephemeris.oem'), contentType: 'text/plain; charset=utf-8', pieces: pieces() };
}

/** One line of text for a '# key: value' comment. */
const commentValue = (text: string) => text.replace(/[\r\n]+/g, ' ');

/** A number as the budget CSV prints it (shortest text that reads back to the same double), '' for none. */
const csvNumber = (x: number | null | undefined) => (x === null || x === undefined ? '' : String(x));

/**
 * The budget as CSV: comment lines (caution, mission, scenario, run, epoch, when the requirements
 * were read), then one row per line with its requirement, margin and status.
 */
export async function budgetCsvExport(sequelize: Sequelize, user: User, missionId: string, runId: string): Promise<ExportFile> {
  const run = await succeededRunFor(sequelize, user, missionId, runId, ['budget', 'summary']);
  const report = await budgetReportOf(run);
  const comments = [
    `# caution: ${EXPORT_CAUTION}`,
    `# mission: ${commentValue(run.mission.name)} (${run.mission.slug})`,
    `# scenario: ${commentValue(run.summary!.scenarioName)}`,
    `# run: ${runId}`,
    `# epoch: ${report.epochUtc}`,
    `# requirements_as_of: ${report.requirementsAsOf}`,
  ];
  const rows = report.lines.map((l) => [
    l.key,
    l.label,
    csvNumber(l.value),
    l.unit,
    l.requirement?.comparator ?? '',
    csvNumber(l.requirement?.value),
    csvNumber(l.requirement?.minMarginPercent),
    csvNumber(l.marginPercent),
    l.status,
  ]);
  const text = `${comments.join('\n')}\n${stringify([[...budgetCsvColumns], ...rows])}`;
  async function* pieces(): AsyncGenerator<string, void, undefined> {
    yield text;
  }
  return { fileName: exportFileName(run, 'budget.csv'), contentType: 'text/csv; charset=utf-8', pieces: pieces() };
}

/**
 * Writes `file` to the response with backpressure: after a write the buffer refuses, the next piece
 * waits for 'drain'. When the client goes away the pieces stop being read (their generator is
 * closed, so no further chunk is fetched). An error after the first byte cannot become an error
 * answer any more: it is reported and the connection cut, so the client sees a truncated transfer.
 */
export async function streamExport(res: ServerResponse, file: ExportFile): Promise<void> {
  let gone = false;
  const onClose = () => {
    gone = true;
  };
  res.on('close', onClose);
  res.setHeader('Content-Type', file.contentType);
  res.setHeader('Content-Disposition', `attachment; filename="${file.fileName}"`);
  res.setHeader('X-Content-Type-Options', 'nosniff');
  try {
    for await (const piece of file.pieces) {
      if (gone || res.destroyed) break;
      if (!res.write(piece)) {
        await new Promise<void>((resolve) => {
          const done = () => {
            res.off('drain', done);
            res.off('close', done);
            resolve();
          };
          res.on('drain', done);
          res.on('close', done);
        });
      }
    }
    if (!gone && !res.destroyed) res.end();
  } catch (err) {
    if (!res.headersSent) {
      for (const name of ['Content-Type', 'Content-Disposition', 'X-Content-Type-Options']) res.removeHeader(name);
      throw err;
    }
    reportError(toAppError(err), 'export stream');
    res.destroy();
  } finally {
    res.off('close', onClose);
  }
}
