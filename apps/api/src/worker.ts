import type PgBoss from 'pg-boss';
import type { Sequelize } from 'sequelize';
import { fileURLToPath } from 'node:url';
import { loadConfig, workerConfigSchema } from './config';
import { createDatabase } from './db';
import { installProcessHandlers } from './errors/handle-error';
import { ensureQueue, openQueue } from './jobs/queue';
import { jobDefinitions, type JobContext, type JobSlot } from './jobs';
import { startRunReaper } from './jobs/run-reaper';

/** Options of `startWorker`. */
export interface WorkerOptions {
  databaseUrl: string;
  /** Jobs taken at once per job type (one computation thread each). */
  concurrency: number;
  /** A running run without a heartbeat for this long is taken back and queued again (s). */
  staleSeconds: number;
  /** How often an idle loop polls the queue (s, at least 0.5). */
  pollSeconds: number;
  /**
   * The API process's connection, for its in-process worker: Sequelize models are bound to one
   * connection per process. Without it the worker opens (and closes) its own.
   */
  sequelize?: Sequelize;
}

/** A running worker. */
export interface Worker {
  /** The slots' ids (`host:pid:n`), as runs' worker_id names them. */
  readonly slotIds: readonly string[];
  /** Makes idle loops look for jobs now rather than at their next poll. */
  wake(): void;
  /**
   * Stops taking jobs, lets the jobs in hand finish for up to `graceMs` (default 0), gives the
   * rest back to the queue (their runs are queued again at once), and disconnects.
   */
  stop(options?: { graceMs?: number }): Promise<void>;
}

/**
 * Starts a worker: `concurrency` loops per job type taking jobs from the PostgreSQL queue, and a
 * reaper that takes back runs whose worker stopped reporting. Any number of workers, on any
 * machines that reach the database, share the work.
 */
export async function startWorker(options: WorkerOptions): Promise<Worker> {
  const { databaseUrl, concurrency, staleSeconds, pollSeconds } = options;
  const sequelize = options.sequelize ?? createDatabase(databaseUrl);
  // One connection per fetch loop (each job type has `concurrency` of them), plus the reaper's and
  // pg-boss's own maintenance: too few and the loops queue for connections behind each other.
  const boss: PgBoss = await openQueue(databaseUrl, { maxConnections: jobDefinitions.length * concurrency + 2, pollSeconds });
  const context: JobContext = { sequelize, boss, staleSeconds };
  const slots: JobSlot[] = [];
  const loopIds: string[] = [];
  let stopping = false;
  let stopped: Promise<void> | null = null;
  let endGrace = () => {};

  for (const job of jobDefinitions) {
    await ensureQueue(boss, job.queue);
    for (let i = 0; i < concurrency; i += 1) {
      const slot = job.createSlot(context);
      slots.push(slot);
      // A job fetched while the worker stops is failed back to the queue (pg-boss retries it
      // elsewhere after its retry delay) rather than started.
      const handler = async (jobs: PgBoss.Job<unknown>[]) => {
        if (stopping) throw new Error('worker stopping; the job goes back to the queue');
        await slot.handle(jobs);
      };
      // pg-boss 10 runs one fetch loop per work() call: one loop per unit of concurrency.
      loopIds.push(await boss.work(job.queue, { batchSize: 1, pollingIntervalSeconds: pollSeconds }, handler));
    }
  }
  const wake = () => {
    for (const id of loopIds) boss.notifyWorker(id);
  };
  const reaper = startRunReaper(sequelize, boss, staleSeconds, wake);

  return {
    slotIds: slots.map((s) => s.workerId),
    wake,
    stop: ({ graceMs = 0 } = {}) => {
      // A second call (a second Ctrl-C) cuts the grace period short.
      if (stopped) {
        if (graceMs === 0) endGrace();
        return stopped;
      }
      stopping = true;
      stopped = (async () => {
        for (const job of jobDefinitions) await boss.offWork(job.queue);
        await reaper.stop();
        if (graceMs > 0) {
          const grace = new Promise<void>((resolve) => {
            endGrace = resolve;
            setTimeout(resolve, graceMs).unref();
          });
          await Promise.race([Promise.all(slots.map((s) => s.whenIdle())), grace]);
        }
        await Promise.all(slots.map((s) => s.release()));
        await Promise.all(slots.map((s) => s.close()));
        await boss.stop({ graceful: true, wait: true, timeout: 5_000 });
        if (!options.sequelize) await sequelize.close();
      })();
      return stopped;
    },
  };
}

// Run as a process of its own: `tsx src/worker.ts` (any number, on any machine that reaches the database).
if (process.argv[1] === fileURLToPath(import.meta.url)) {
  installProcessHandlers('worker');
  const config = loadConfig(process.env, workerConfigSchema);
  const worker = await startWorker({
    databaseUrl: config.PL_DATABASE_URL,
    concurrency: config.PL_WORKER_CONCURRENCY,
    staleSeconds: config.PL_RUN_STALE_SECONDS,
    pollSeconds: config.PL_WORKER_POLL_SECONDS,
  });
  console.log(`worker ready: ${worker.slotIds.join(', ')} (job types: ${jobDefinitions.map((j) => j.queue).join(', ')})`);
  let signals = 0;
  const stop = async () => {
    signals += 1;
    // The first signal lets the runs in hand finish for a minute; a second gives them back at once.
    if (signals > 1) console.log('stopping now: runs in hand go back to the queue');
    await worker.stop({ graceMs: signals > 1 ? 0 : 60_000 });
    process.exit(0);
  };
  process.on('SIGINT', () => void stop());
  process.on('SIGTERM', () => void stop());
}
