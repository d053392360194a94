import os from 'node:os';
import type PgBoss from 'pg-boss';
import type { Sequelize } from 'sequelize';
import { PropagationSlot } from './propagation-job';
import { PROPAGATION_QUEUE } from './queue';
import { StudyCaseSlot } from './study-case-job';
import { STUDY_CASE_QUEUE } from '../services/study-service';
import { MailSlot } from '../services/mail-delivery';
import { SEND_MAIL_QUEUE } from '../services/mail-service';
import { TableChunkSlot } from './coefficient-table-job';
import { TABLE_CHUNK_QUEUE } from '../services/coefficient-table-service';

/** What a worker gives each of its job slots. */
export interface JobContext {
  sequelize: Sequelize;
  /** The worker's queue connection. */
  boss: PgBoss;
  /** A running run without a heartbeat for this long is presumed abandoned (s). */
  staleSeconds: number;
}

/** One unit of a worker's concurrency on a queue: takes one job at a time. */
export interface JobSlot {
  /** `host:pid:n`, unique among live workers (what runs' worker_id names). */
  readonly workerId: string;
  /** pg-boss handler; throws only for failures worth a retry. */
  handle: (jobs: PgBoss.Job<unknown>[]) => Promise<void>;
  /** Resolves when no job is in hand. */
  whenIdle(): Promise<void>;
  /** Stops the job in hand and puts its work back on the queue (the worker is stopping). */
  release(): Promise<void>;
  /** Frees the slot's resources, after its last job. */
  close(): Promise<void>;
}

/** A job type: its queue name and how a worker makes a slot for it. */
export interface JobDefinition {
  queue: string;
  createSlot: (context: JobContext) => JobSlot;
}

/** Every job type workers take. */
export const jobDefinitions: JobDefinition[] = [
  { queue: PROPAGATION_QUEUE, createSlot: (context) => new PropagationSlot(context, os.hostname()) },
  { queue: SEND_MAIL_QUEUE, createSlot: (context) => new MailSlot(context) },
  { queue: STUDY_CASE_QUEUE, createSlot: (context) => new StudyCaseSlot(context, os.hostname()) },
  { queue: TABLE_CHUNK_QUEUE, createSlot: (context) => new TableChunkSlot(context, os.hostname()) },
];
