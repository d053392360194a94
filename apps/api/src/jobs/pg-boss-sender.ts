import type PgBoss from 'pg-boss';
import type { JobSender } from './job-sender';
import { openQueue, sendJob } from './queue';

/** Options of `createJobSender`. */
export interface JobSenderOptions {
  /**
   * Called once a job is visible to workers (after the commit of its transaction): the API's
   * in-process worker uses it to fetch at once instead of at its next poll.
   */
  onQueued?: (queue: string) => void;
}

/** A JobSender on pg-boss that opens its connection on the first send (the API may never queue anything). */
export function createJobSender(databaseUrl: string, options: JobSenderOptions = {}): JobSender {
  let boss: Promise<PgBoss> | null = null;
  return {
    async send(queue, data, sendOptions = {}) {
      // Maintenance is left to the workers: a sender only inserts jobs.
      boss ??= openQueue(databaseUrl, { maxConnections: 2, maintenance: false }).catch((err: unknown) => {
        boss = null; // the next send tries again
        throw err;
      });
      const id = await sendJob(await boss, queue, data, sendOptions);
      const { onQueued } = options;
      if (id && onQueued) {
        if (sendOptions.inTransaction) sendOptions.inTransaction.transaction.afterCommit(() => onQueued(queue));
        else onQueued(queue);
      }
      return id;
    },
    async close() {
      if (boss) await (await boss).stop({ graceful: false, wait: true });
      boss = null;
    },
  };
}
