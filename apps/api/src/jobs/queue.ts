import PgBoss from 'pg-boss';
import { QueryTypes, type Sequelize, type Transaction } from 'sequelize';

/** Queue of analysis runs: one job per run attempt, payload `{ runId }` (shared propagationJobSchema). */
export const PROPAGATION_QUEUE = 'propagation';

/**
 * Send options per queue. The run row, not pg-boss, is the truth about a run: workers claim it
 * with a guarded UPDATE and prove they are alive by a heartbeat, so pg-boss's expiry only bounds a
 * job's wall time (a retried or duplicated job finds the run held or finished and does nothing).
 */
const sendDefaults: Record<string, PgBoss.SendOptions> = {
  [PROPAGATION_QUEUE]: { retryLimit: 3, retryDelay: 5, expireInSeconds: 6 * 3600 },
};

/** Options of `openQueue`. */
export interface OpenQueueOptions {
  /** Connections in pg-boss's own pool. */
  maxConnections?: number;
  /** How often an idle work loop polls (s, at least 0.5). */
  pollSeconds?: number;
  /** Run pg-boss maintenance (expiry, archiving) from this instance; workers do, a sender need not. */
  maintenance?: boolean;
}

/** Opens the PostgreSQL job queue (pg-boss keeps its tables in the `pgboss` schema). */
export async function openQueue(databaseUrl: string, options: OpenQueueOptions = {}): Promise<PgBoss> {
  const boss = new PgBoss({
    connectionString: databaseUrl,
    schema: 'pgboss',
    max: options.maxConnections ?? 4,
    supervise: options.maintenance ?? true,
    // No cron jobs: the clock monitor and schedule loop would only add queries.
    schedule: false,
    ...(options.pollSeconds ? { pollingIntervalSeconds: options.pollSeconds } : {}),
  });
  boss.on('error', (err) => console.error('[queue]', err));
  await boss.start();
  return boss;
}

const createdQueues = new WeakMap<PgBoss, Set<string>>();

/** Creates `queue` once per pg-boss instance (creating an existing queue is a no-op). */
export async function ensureQueue(boss: PgBoss, queue: string): Promise<void> {
  let created = createdQueues.get(boss);
  if (!created) createdQueues.set(boss, (created = new Set()));
  if (created.has(queue)) return;
  await boss.createQueue(queue);
  created.add(queue);
}

/** A Sequelize transaction to put a job in, so the job exists exactly when the rows written with it do. */
export interface InTransaction {
  sequelize: Sequelize;
  transaction: Transaction;
}

/** pg-boss's database adapter running its SQL on the connection of a Sequelize transaction. */
function transactionDb({ sequelize, transaction }: InTransaction): PgBoss.Db {
  return {
    executeSql: async (text, values) => {
      // Sequelize refuses undefined bind values; pg sends null for them anyway.
      const bind = values.map((v: unknown) => (v === undefined ? null : v));
      const rows = await sequelize.query<Record<string, unknown>>(text, { bind, transaction, type: QueryTypes.SELECT });
      return { rows };
    },
  };
}

/** Options of `sendJob`. */
export interface SendJobOptions {
  /** pg-boss singleton key: at most one queued job with this key. */
  singletonKey?: string;
  /** Insert the job inside this transaction (atomic with the caller's rows). */
  inTransaction?: InTransaction;
}

/**
 * Queues `data` on `queue` with the queue's send defaults; returns the job id (null when a
 * singleton key refused it). The queue is created first, outside any transaction.
 */
export async function sendJob(boss: PgBoss, queue: string, data: object, options: SendJobOptions = {}): Promise<string | null> {
  await ensureQueue(boss, queue);
  const sendOptions: PgBoss.SendOptions = {
    ...sendDefaults[queue],
    ...(options.singletonKey ? { singletonKey: options.singletonKey } : {}),
    ...(options.inTransaction ? { db: transactionDb(options.inTransaction) } : {}),
  };
  return boss.send(queue, data, sendOptions);
}
