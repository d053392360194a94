import { z } from 'zod';
import { loadDemoData } from '@photon-ledger/fixtures';
import { createDatabase } from '../db';
import { seedDemoData } from '../services/seed-service';

const env = z.object({ PL_DATABASE_URL: z.url({ message: 'PL_DATABASE_URL must be a postgres:// URL' }) }).parse(process.env);
const sequelize = createDatabase(env.PL_DATABASE_URL);
try {
  const r = await seedDemoData(sequelize, loadDemoData());
  console.log(`demo data: ${r.usersCreated} users, ${r.missionsCreated} missions, ${r.membershipsCreated} memberships created`);
} finally {
  await sequelize.close();
}
