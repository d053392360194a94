/**
 * What passes between a job slot's main thread and its computation thread (compute-thread.ts on
 * one side, thread-host.ts on the other): plain data only, cloned or transferred by postMessage.
 * One protocol for every kind of computation (runs, study cases, coefficient-table bands).
 */

/** workerData of a computation thread. */
export interface ThreadStart {
  /** file: URL of the thread's TypeScript entry, loaded by run-thread-boot.mjs. */
  entry: string;
  /** One Int32 on a SharedArrayBuffer: 1 asks the computation in hand to stop at its next check. */
  cancelFlag: SharedArrayBuffer;
}

/** A request to the thread: one computation (the thread takes one at a time). */
export interface ThreadRequest<Input> {
  /** Echoed in every answer, so a late message of an earlier computation is never mistaken. */
  token: number;
  input: Input;
}

/** Why a computation failed, with the offending field when srp-core named one. */
export interface ThreadError {
  message: string;
  /** SrpError code, when it was one. */
  code?: string;
  /** Dot path of the offending input (`attitude.profileId.5.q_x`, `plates.3.front.specular`). */
  field?: string;
}

/** Messages from the thread per request: progress any number of times, then exactly one outcome. */
export type ThreadMessage<Result> = { token: number } & (
  | { kind: 'progress'; progress: number }
  | { kind: 'succeeded'; result: Result }
  | { kind: 'cancelled' }
  | { kind: 'failed'; error: ThreadError }
);
