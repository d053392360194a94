/** Sends jobs to the PostgreSQL queue from the API process (implemented with the run issue). */
export interface JobSender {
  /** Queues `data` on `queue`; returns the job id. */
  send(queue: string, data: object, options?: { singletonKey?: string }): Promise<string | null>;
  /** Closes the queue connection, if one was opened. */
  close(): Promise<void>;
}
