import { Worker } from 'node:worker_threads';
import type { RunOutcome } from '../services/run-outcome';
import type { RunThreadError, RunThreadInput, RunThreadMessage, RunThreadRequest, RunThreadStart } from './run-thread-protocol';

/** How a computation in a thread ended. */
export type ComputationResult =
  | { kind: 'succeeded'; outcome: RunOutcome }
  | { kind: 'cancelled' }
  | { kind: 'failed'; error: RunThreadError }
  /** Stopped from outside by `abort()` (worker shutting down, or the run was taken away). */
  | { kind: 'aborted' };

/** One computation in hand. */
export interface Computation {
  /** Settles once, when the computation has ended. */
  readonly done: Promise<ComputationResult>;
  /** Asks the computation to stop at its next integrator step; it then ends as `cancelled`. */
  requestCancel(): void;
  /** Ends the thread at once (a new one is started for the next computation). */
  abort(): Promise<void>;
}

const bootUrl = new URL('./run-thread-boot.mjs', import.meta.url);
const entryUrl = new URL('./run-thread.ts', import.meta.url).href;

interface InHand {
  token: number;
  onProgress: (fraction: number) => void;
  finish: (result: ComputationResult) => void;
}

/**
 * A worker slot's computation thread (run-thread.ts), kept between runs: starting one costs about
 * a second of module loading and JIT warm-up, more than a short run itself. One computation at a time.
 */
export class ComputeThread {
  private worker: Worker | null = null;
  private readonly cancelFlag = new SharedArrayBuffer(Int32Array.BYTES_PER_ELEMENT);
  private readonly cancel = new Int32Array(this.cancelFlag);
  private inHand: InHand | null = null;
  private aborting = false;
  private nextToken = 1;

  /** Starts the thread now rather than at the first computation. */
  warmUp(): void {
    this.thread();
  }

  /** Computes a run; `onProgress` gets the fraction done (0..1). */
  compute(input: RunThreadInput, onProgress: (fraction: number) => void): Computation {
    if (this.inHand) throw new Error('a compute thread takes one computation at a time');
    const worker = this.thread();
    const token = this.nextToken++;
    Atomics.store(this.cancel, 0, 0);
    const done = new Promise<ComputationResult>((resolve) => {
      this.inHand = {
        token,
        onProgress,
        finish: (result) => {
          if (this.inHand?.token !== token) return;
          this.inHand = null;
          this.worker?.unref();
          resolve(result);
        },
      };
    });
    // Referenced while it computes, so that awaiting the result keeps the process alive.
    worker.ref();
    worker.postMessage({ token, input } satisfies RunThreadRequest);
    return {
      done,
      requestCancel: () => {
        if (this.inHand?.token === token) Atomics.store(this.cancel, 0, 1);
      },
      abort: async () => {
        if (this.inHand?.token !== token || !this.worker) return;
        this.aborting = true;
        await this.worker.terminate();
      },
    };
  }

  /** Ends the thread; a computation in hand ends as `aborted`. */
  async close(): Promise<void> {
    if (!this.worker) return;
    this.aborting = true;
    await this.worker.terminate();
  }

  private thread(): Worker {
    if (this.worker) return this.worker;
    const start: RunThreadStart = { entry: entryUrl, cancelFlag: this.cancelFlag };
    const worker = new Worker(bootUrl, { workerData: start });
    worker.on('message', (message: RunThreadMessage) => {
      const inHand = this.inHand;
      if (!inHand || message.token !== inHand.token) return;
      if (message.kind === 'progress') inHand.onProgress(message.fraction);
      else if (message.kind === 'succeeded') inHand.finish({ kind: 'succeeded', outcome: message.outcome });
      else if (message.kind === 'failed') inHand.finish({ kind: 'failed', error: message.error });
      else inHand.finish({ kind: 'cancelled' });
    });
    worker.on('error', (err) => {
      this.inHand?.finish({ kind: 'failed', error: { message: `computation thread crashed: ${err.message}` } });
    });
    worker.on('exit', (code) => {
      if (this.worker === worker) this.worker = null;
      const aborted = this.aborting;
      this.aborting = false;
      this.inHand?.finish(aborted ? { kind: 'aborted' } : { kind: 'failed', error: { message: `computation thread exited with code ${code}` } });
    });
    // An idle thread must not keep the process alive (the queue's loops decide that).
    worker.unref();
    this.worker = worker;
    return worker;
  }
}
