import type { AddressInfo } from 'node:net';
import { loadConfig } from './config';
import { createDatabase } from './db';
import { createApp } from './app';
import { installProcessHandlers } from './errors/handle-error';
import { startWorker, type Worker } from './worker';

installProcessHandlers('api');
const config = loadConfig();
const sequelize = createDatabase(config.PL_DATABASE_URL);
await sequelize.authenticate();

const app = createApp(config, sequelize);
const worker: Worker | null =
  config.PL_WORKERS_IN_PROCESS > 0 ? await startWorker(config.PL_DATABASE_URL, config.PL_WORKERS_IN_PROCESS) : null;

const server = app.listen(config.PL_PORT, config.PL_HOST, () => {
  const { port } = server.address() as AddressInfo;
  // The stack script and the end-to-end tests read this line to learn the port.
  console.log(`Photon Ledger API listening on http://${config.PL_HOST}:${port} (in-process workers: ${config.PL_WORKERS_IN_PROCESS})`);
});

async function shutdown(): Promise<void> {
  server.close();
  await worker?.stop();
  await sequelize.close();
  process.exit(0);
}
process.once('SIGINT', shutdown);
process.once('SIGTERM', shutdown);
