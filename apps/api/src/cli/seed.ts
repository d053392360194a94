import { z } from 'zod';
import { loadDemoData, loadDemoWorkspace } from '@photon-ledger/fixtures';
import { createDatabase } from '../db';
import { seedDemoData } from '../services/seed-service';
import { seedDemoWorkspace } from '../services/demo-workspace-service';

const env = z.object({ PL_DATABASE_URL: z.url({ message: 'PL_DATABASE_URL must be a postgres:// URL' }) }).parse(process.env);
const sequelize = createDatabase(env.PL_DATABASE_URL);
try {
  const r = await seedDemoData(sequelize, loadDemoData());
  console.log(`demo data: ${r.usersCreated} users, ${r.missionsCreated} missions, ${r.membershipsCreated} memberships created`);
  const w = await seedDemoWorkspace(sequelize, loadDemoWorkspace());
  console.log(`demo workspace: ${w.vehiclesCreated} vehicles, ${w.scenariosCreated} scenarios, ${w.requirementsCreated} requirements, ${w.runsCreated} runs created`);
} finally {
  await sequelize.close();
}
