import PgBoss from 'pg-boss';

/** Opens the PostgreSQL job queue (pg-boss keeps its tables in the `pgboss` schema). */
export async function openQueue(databaseUrl: string): Promise<PgBoss> {
  const boss = new PgBoss({ connectionString: databaseUrl, schema: 'pgboss' });
  boss.on('error', (err) => console.error('[queue]', err));
  await boss.start();
  return boss;
}
