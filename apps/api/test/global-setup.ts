import type { TestProject } from 'vitest/node';
import { loadDemoData } from '@photon-ledger/fixtures';
import { createDatabase } from '../src/db';
import { migrateUp } from '../src/migrator';
import { seedDemoData } from '../src/services/seed-service';
import { dropDatabase, ensureDatabase } from '../scripts/postgres-cluster';

// One database per test process: several test runs may share a scratch cluster.
const DB_NAME = `photon_ledger_api_test_${process.pid}`;

declare module 'vitest' {
  export interface ProvidedContext {
    databaseUrl: string;
  }
}

/** A fresh migrated and seeded database on the throwaway cluster that `npm test` started. */
export default async function setup(project: TestProject): Promise<() => Promise<void>> {
  const adminUrl = process.env.PL_TEST_ADMIN_URL;
  if (!adminUrl) {
    throw new Error('PL_TEST_ADMIN_URL is not set: run the tests with `npm test` (it starts a throwaway PostgreSQL)');
  }
  await ensureDatabase(adminUrl, DB_NAME, { fresh: true });
  const url = new URL(adminUrl);
  url.pathname = `/${DB_NAME}`;
  const sequelize = createDatabase(url.toString());
  await migrateUp(sequelize);
  await seedDemoData(sequelize, loadDemoData());
  await sequelize.close();
  project.provide('databaseUrl', url.toString());
  return () => dropDatabase(adminUrl, DB_NAME);
}
