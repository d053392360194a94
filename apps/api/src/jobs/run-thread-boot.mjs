// Entry of a run thread: registers tsx in the thread (a worker thread does not inherit the
// parent's loader hooks, and `--import tsx` in execArgv does not reach the entry on Node 20),
// then loads the TypeScript entry named in workerData. Works under `tsx` and under vitest alike.
import { workerData } from 'node:worker_threads';
import { register } from 'tsx/esm/api';

register();
await import(workerData.entry);
