import type PgBoss from 'pg-boss';

/** A job type: its queue name and the handler a worker runs for each job. */
export interface JobDefinition {
  queue: string;
  handle: (jobs: PgBoss.Job<unknown>[]) => Promise<void>;
}

/** Every job type workers take. Analysis runs join this list with the run issue. */
export const jobDefinitions: JobDefinition[] = [];
