import type { AddressInfo } from 'node:net';
import { loadConfig } from './config';
import { createDatabase } from './db';
import { createApp } from './app';
import { installProcessHandlers } from './errors/handle-error';
import { createJobSender } from './jobs/pg-boss-sender';
import { startWorker, type Worker } from './worker';

installProcessHandlers('api');
const config = loadConfig();
const sequelize = createDatabase(config.PL_DATABASE_URL);
await sequelize.authenticate();

const worker: Worker | null =
  config.PL_WORKERS_IN_PROCESS > 0
    ? await startWorker({
        databaseUrl: config.PL_DATABASE_URL,
        concurrency: config.PL_WORKERS_IN_PROCESS,
        staleSeconds: config.PL_RUN_STALE_SECONDS,
        pollSeconds: config.PL_WORKER_POLL_SECONDS,
        sequelize,
      })
    : null;
// The in-process worker takes a new run at once instead of at its next poll.
const jobs = createJobSender(config.PL_DATABASE_URL, { onQueued: () => worker?.wake() });
const app = createApp(config, sequelize, jobs);

const server = app.listen(config.PL_PORT, config.PL_HOST, () => {
  const { port } = server.address() as AddressInfo;
  // The stack script and the end-to-end tests read this line to learn the port.
  console.log(`Photon Ledger API listening on http://${config.PL_HOST}:${port} (in-process workers: ${config.PL_WORKERS_IN_PROCESS})`);
});

async function shutdown(): Promise<void> {
  server.close();
  // Runs in hand get a few seconds to finish; the rest go back to the queue for the next start
  // (or for another worker).
  await worker?.stop({ graceMs: 5_000 });
  await jobs.close();
  await sequelize.close();
  process.exit(0);
}
process.once('SIGINT', shutdown);
process.once('SIGTERM', shutdown);
