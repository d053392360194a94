import { z } from 'zod';
import { createDatabase } from '../db';
import { migrateUp } from '../migrator';

// The migration CLI needs only the database; it does not require the rest of the configuration.
const env = z.object({ PL_DATABASE_URL: z.url({ message: 'PL_DATABASE_URL must be a postgres:// URL' }) }).parse(process.env);
const sequelize = createDatabase(env.PL_DATABASE_URL);
try {
  const applied = await migrateUp(sequelize);
  console.log(applied.length ? `migrations applied: ${applied.join(', ')}` : 'migrations: up to date');
} finally {
  await sequelize.close();
}
