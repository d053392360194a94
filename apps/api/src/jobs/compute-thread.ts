import { Worker } from 'node:worker_threads';
import type { ThreadError, ThreadMessage, ThreadRequest, ThreadStart } from './thread-protocol';

/** How a computation in a thread ended. */
export type ComputationResult<Result> =
  | { kind: 'succeeded'; result: Result }
  | { kind: 'cancelled' }
  | { kind: 'failed'; error: ThreadError }
  /** Stopped from outside by `abort()` (worker shutting down, or the work was taken away). */
  | { kind: 'aborted' };

/** One computation in hand. */
export interface Computation<Result> {
  /** Settles once, when the computation has ended. */
  readonly done: Promise<ComputationResult<Result>>;
  /** Asks the computation to stop at its next check; it then ends as `cancelled`. */
  requestCancel(): void;
  /** Ends the thread at once (a new one is started for the next computation). */
  abort(): Promise<void>;
}

const bootUrl = new URL('./run-thread-boot.mjs', import.meta.url);

interface InHand<Result> {
  token: number;
  onProgress: (progress: number) => void;
  finish: (result: ComputationResult<Result>) => void;
}

/**
 * A worker slot's computation thread, kept between computations: starting one costs about a
 * second of module loading and JIT warm-up, more than a short run itself, and the thread may keep
 * state between requests (a mesh scene). One computation at a time. `entry` is the thread's
 * TypeScript module, which calls `serveComputations` (thread-host.ts).
 */
export class ComputeThread<Input, Result> {
  private worker: Worker | null = null;
  private readonly cancelFlag = new SharedArrayBuffer(Int32Array.BYTES_PER_ELEMENT);
  private readonly cancel = new Int32Array(this.cancelFlag);
  private inHand: InHand<Result> | null = null;
  private aborting = false;
  private nextToken = 1;

  constructor(private readonly entry: URL) {}

  /** Starts the thread now rather than at the first computation. */
  warmUp(): void {
    this.thread();
  }

  /** Starts a computation; `onProgress` gets what the thread reports. */
  compute(input: Input, onProgress: (progress: number) => void): Computation<Result> {
    if (this.inHand) throw new Error('a compute thread takes one computation at a time');
    const worker = this.thread();
    const token = this.nextToken++;
    Atomics.store(this.cancel, 0, 0);
    const done = new Promise<ComputationResult<Result>>((resolve) => {
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
    worker.postMessage({ token, input } satisfies ThreadRequest<Input>);
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
    const start: ThreadStart = { entry: this.entry.href, cancelFlag: this.cancelFlag };
    const worker = new Worker(bootUrl, { workerData: start });
    worker.on('message', (message: ThreadMessage<Result>) => {
      const inHand = this.inHand;
      if (!inHand || message.token !== inHand.token) return;
      if (message.kind === 'progress') inHand.onProgress(message.progress);
      else if (message.kind === 'succeeded') inHand.finish({ kind: 'succeeded', result: message.result });
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
