import type PgBoss from 'pg-boss';
import type { JobSender } from './job-sender';
import { openQueue } from './queue';

/** A JobSender on pg-boss that opens its connection on the first send (the API may never queue anything). */
export function createJobSender(databaseUrl: string): JobSender {
  let boss: Promise<PgBoss> | null = null;
  const created = new Set<string>();
  return {
    async send(queue, data, options = {}) {
      boss ??= openQueue(databaseUrl);
      const b = await boss;
      if (!created.has(queue)) {
        await b.createQueue(queue);
        created.add(queue);
      }
      return b.send(queue, data, options.singletonKey ? { singletonKey: options.singletonKey } : {});
    },
    async close() {
      if (boss) await (await boss).stop({ graceful: false, wait: true });
      boss = null;
    },
  };
}
