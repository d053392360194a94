import { Umzug, SequelizeStorage } from 'umzug';
import type { Sequelize } from 'sequelize';
import { migrations } from './migrations';

// Any constant shared by all processes: concurrent starts (API and workers) migrate one at a time.
const MIGRATION_LOCK_KEY = 7_206_114_031;

/** Applies pending migrations under a PostgreSQL advisory lock; returns the names applied. */
export async function migrateUp(sequelize: Sequelize): Promise<string[]> {
  const qi = sequelize.getQueryInterface();
  const umzug = new Umzug({
    migrations: migrations.map((m) => ({ name: m.name, up: () => m.up(qi), down: () => m.down(qi) })),
    context: qi,
    storage: new SequelizeStorage({ sequelize, tableName: 'schema_migrations' }),
    logger: undefined,
  });
  // The lock lives on this transaction's connection until it ends; migrations run on other connections.
  return sequelize.transaction(async (transaction) => {
    await sequelize.query('SELECT pg_advisory_xact_lock(:key)', { replacements: { key: MIGRATION_LOCK_KEY }, transaction });
    const applied = await umzug.up();
    return applied.map((m) => m.name);
  });
}
