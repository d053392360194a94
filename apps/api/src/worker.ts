import type PgBoss from 'pg-boss';
import { fileURLToPath } from 'node:url';
import { loadConfig, workerConfigSchema } from './config';
import { installProcessHandlers } from './errors/handle-error';
import { openQueue } from './jobs/queue';
import { jobDefinitions } from './jobs';

/** A running worker: stop it to finish the jobs in hand and disconnect. */
export interface Worker {
  stop: () => Promise<void>;
}

/** Starts a worker taking jobs from the PostgreSQL queue, `concurrency` at a time per queue. */
export async function startWorker(databaseUrl: string, concurrency: number): Promise<Worker> {
  const boss: PgBoss = await openQueue(databaseUrl);
  for (const job of jobDefinitions) {
    await boss.createQueue(job.queue);
    // pg-boss 10 runs one fetch loop per work() call: one loop per unit of concurrency.
    for (let i = 0; i < concurrency; i += 1) await boss.work(job.queue, { batchSize: 1 }, job.handle);
  }
  return { stop: () => boss.stop({ graceful: true, wait: true }) };
}

// Run as a process of its own: `tsx src/worker.ts` (any number, on any machine that reaches the database).
if (process.argv[1] === fileURLToPath(import.meta.url)) {
  installProcessHandlers('worker');
  const config = loadConfig(process.env, workerConfigSchema);
  const worker = await startWorker(config.PL_DATABASE_URL, config.PL_WORKER_CONCURRENCY);
  console.log(`worker ready (job types: ${jobDefinitions.map((j) => j.queue).join(', ') || 'none yet'})`);
  const stop = async () => {
    await worker.stop();
    process.exit(0);
  };
  process.once('SIGINT', stop);
  process.once('SIGTERM', stop);
}
