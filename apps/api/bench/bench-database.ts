/**
 * A throwaway PostgreSQL for benchmarks: a private cluster in /tmp on a free port (fsync off),
 * one database migrated and seeded with the demo data. Set PL_TEST_ADMIN_URL to use an existing
 * scratch cluster instead (the database is then created in it and dropped at the end).
 */
import { mkdtempSync, rmSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { loadDemoData } from '@photon-ledger/fixtures';
import { createDatabase } from '../src/db';
import { migrateUp } from '../src/migrator';
import { seedDemoData } from '../src/services/seed-service';
import { dropDatabase, ensureDatabase, freePort, giveToServer, startCluster } from '../scripts/postgres-cluster';

/** A migrated, seeded database for one benchmark process. */
export interface BenchDatabase {
  databaseUrl: string;
  /** Drops the database and stops the cluster if this process started it. */
  close: () => Promise<void>;
}

export async function openBenchDatabase(): Promise<BenchDatabase> {
  let adminUrl = process.env.PL_TEST_ADMIN_URL;
  let stopCluster: (() => void) | null = null;
  let baseDir: string | null = null;
  if (!adminUrl) {
    baseDir = mkdtempSync(path.join(os.tmpdir(), 'photon-ledger-bench-'));
    giveToServer(baseDir);
    const cluster = await startCluster({ baseDir, port: await freePort(), fast: true });
    adminUrl = cluster.adminUrl;
    stopCluster = cluster.stop;
  }
  const name = `photon_ledger_bench_${process.pid}`;
  await ensureDatabase(adminUrl, name, { fresh: true });
  const url = new URL(adminUrl);
  url.pathname = `/${name}`;
  const sequelize = createDatabase(url.toString());
  await migrateUp(sequelize);
  await seedDemoData(sequelize, loadDemoData());
  await sequelize.close();
  const admin = adminUrl;
  return {
    databaseUrl: url.toString(),
    close: async () => {
      await dropDatabase(admin, name);
      stopCluster?.();
      if (baseDir) rmSync(baseDir, { recursive: true, force: true });
    },
  };
}
