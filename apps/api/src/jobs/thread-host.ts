/**
 * The thread side of compute-thread.ts: serves computation requests one at a time, posting
 * progress, then exactly one outcome; a thrown error becomes `failed` with srp-core's field.
 */
import { parentPort, workerData } from 'node:worker_threads';
import { SrpError } from '@photon-ledger/srp-core';
import type { ThreadError, ThreadMessage, ThreadRequest, ThreadStart } from './thread-protocol';

/** What a computation is given besides its input. */
export interface ComputationControl {
  /** Reports progress (a number the slot interprets: a fraction, rows done...). */
  onProgress(progress: number): void;
  /** True once the slot asked the computation to stop. */
  isCancelled(): boolean;
}

/** A computation's answer: its result and the buffers to hand over rather than copy; null when cancelled. */
export type ComputationAnswer<Result> = { result: Result; transfer?: ArrayBuffer[] } | null;

function describe(err: unknown): ThreadError {
  if (err instanceof SrpError) return { message: err.message, code: err.code, ...(err.details.field ? { field: err.details.field } : {}) };
  if (err instanceof Error) return { message: err.message };
  return { message: String(err) };
}

/** Makes this worker thread answer requests with `compute`. */
export function serveComputations<Input, Result>(compute: (input: Input, control: ComputationControl) => ComputationAnswer<Result>): void {
  const port = parentPort;
  if (!port) throw new Error('a computation thread runs as a worker thread only');
  const cancel = new Int32Array((workerData as ThreadStart).cancelFlag);
  port.on('message', ({ token, input }: ThreadRequest<Input>) => {
    const post = (message: ThreadMessage<Result>, transfer: ArrayBuffer[] = []) => port.postMessage(message, transfer);
    try {
      const answer = compute(input, {
        onProgress: (progress) => post({ token, kind: 'progress', progress }),
        isCancelled: () => Atomics.load(cancel, 0) === 1,
      });
      if (answer) post({ token, kind: 'succeeded', result: answer.result }, answer.transfer ?? []);
      else post({ token, kind: 'cancelled' });
    } catch (err) {
      post({ token, kind: 'failed', error: describe(err) });
    }
  });
}
