import type { InTransaction } from './queue';

/** Options of `JobSender.send`. */
export interface JobSendOptions {
  /** At most one queued job with this key. */
  singletonKey?: string;
  /**
   * Insert the job inside this transaction: it exists exactly when the caller's rows do, and
   * workers can see it only once the transaction commits.
   */
  inTransaction?: InTransaction;
}

/** Sends jobs to the PostgreSQL queue from the API process. */
export interface JobSender {
  /** Queues `data` on `queue`; returns the job id. */
  send(queue: string, data: object, options?: JobSendOptions): Promise<string | null>;
  /** Closes the queue connection, if one was opened. */
  close(): Promise<void>;
}
