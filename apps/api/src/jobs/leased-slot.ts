/**
 * What every computing job slot shares (runs, study cases, coefficient-table bands): a kept
 * computation thread, one job at a time, a lease on the work's row proved by a heartbeat while the
 * thread computes (a lost lease aborts the computation, a cancel request is passed on), and an
 * orderly stop that gives the work back to the queue. Subclasses claim, load, store and give back.
 */
import type PgBoss from 'pg-boss';
import { ComputeThread, type Computation, type ComputationResult } from './compute-thread';
import type { ThreadError } from './thread-protocol';
import type { JobContext, JobSlot } from './index';

/** Milliseconds between heartbeats: every second, and at least three per stale period. */
export function heartbeatIntervalMs(staleSeconds: number): number {
  return Math.min(1000, (staleSeconds * 1000) / 3);
}

/** The message a failed computation leaves: srp-core's, with the field in front when the message does not name it. */
export function failureMessage(error: ThreadError): string {
  const { field, message } = error;
  if (!field || message.includes(field) || message.startsWith(field.split('.')[0]!)) return message;
  return `${field}: ${message}`;
}

/** A heartbeat's answer: does this worker still hold the work, and was it asked to stop? */
export interface LeaseAnswer {
  held: boolean;
  cancel: boolean;
}

/** How a held computation ended; `lost` when the lease went to another worker meanwhile. */
export interface HeldOutcome<Result> {
  result: ComputationResult<Result>;
  lost: boolean;
}

/**
 * Drain mode, for queues of many short jobs (study cases, table bands): pg-boss's work loop waits
 * its polling interval between batches, so after the job handed in the slot fetches further jobs
 * itself (completing or failing each) for up to `ms` before it returns to the loop.
 */
export interface DrainOptions {
  queue: string;
  ms: number;
}

export abstract class LeasedSlot<Input, Result> implements JobSlot {
  protected readonly thread: ComputeThread<Input, Result>;
  /** The worker is stopping: work in hand is given back to the queue instead of finished. */
  protected releasing = false;
  private computation: Computation<Result> | null = null;
  private idle: Promise<void> = Promise.resolve();

  constructor(
    protected readonly context: JobContext,
    /** `host:pid:name`, unique among live workers (what the work rows' worker_id names). */
    readonly workerId: string,
    threadEntry: URL,
    private readonly drain: DrainOptions | null,
  ) {
    this.thread = new ComputeThread<Input, Result>(threadEntry);
  }

  /** Runs one job: claim, load, `computeHeld`, store. Throws only for failures worth a retry. */
  protected abstract runJob(job: PgBoss.Job<unknown>): Promise<void>;

  /** pg-boss handler. */
  readonly handle = async (jobs: PgBoss.Job<unknown>[]): Promise<void> => {
    let ended!: () => void;
    this.idle = new Promise((resolve) => (ended = resolve));
    try {
      for (const job of jobs) await this.runOne(job);
      if (!this.drain) return;
      const { boss } = this.context;
      const { queue, ms } = this.drain;
      const until = Date.now() + ms;
      while (!this.releasing && Date.now() < until) {
        const [next] = await boss.fetch<unknown>(queue, { batchSize: 1 });
        if (!next) break;
        try {
          await this.runOne(next);
        } catch (err) {
          await boss.fail(queue, next.id, { message: err instanceof Error ? err.message : String(err) });
          continue;
        }
        await boss.complete(queue, next.id);
      }
    } finally {
      ended();
    }
  };

  /** Resolves when no job is in hand. */
  whenIdle(): Promise<void> {
    return this.idle;
  }

  /** Stops the computation in hand and gives its work back to the queue. */
  async release(): Promise<void> {
    this.releasing = true;
    await this.computation?.abort();
    await this.idle;
  }

  /** Ends the computation thread (after the last job). */
  close(): Promise<void> {
    return this.thread.close();
  }

  /**
   * Computes `input` in the slot's thread while `beat` proves the lease every heartbeat interval.
   * A beat that fails is logged, not fatal: enough of them and the work goes to another worker.
   */
  protected async computeHeld(input: Input, onProgress: (progress: number) => void, beat: () => Promise<LeaseAnswer>, what: string): Promise<HeldOutcome<Result>> {
    const computation = this.thread.compute(input, onProgress);
    this.computation = computation;
    let lost = false;
    let beating: Promise<void> | null = null;
    const timer = setInterval(() => {
      if (beating) return;
      beating = beat()
        .then(async (answer) => {
          if (!answer.held) {
            // Taken back (this worker was presumed dead) or finished elsewhere: stop, write nothing.
            lost = true;
            await computation.abort();
          } else if (answer.cancel) {
            computation.requestCancel();
          }
        })
        .catch((err: unknown) => console.error(`[worker] heartbeat of ${what} failed:`, err))
        .finally(() => {
          beating = null;
        });
    }, heartbeatIntervalMs(this.context.staleSeconds));
    let result: ComputationResult<Result>;
    try {
      result = await computation.done;
    } finally {
      clearInterval(timer);
      await beating;
      this.computation = null;
    }
    // Read after the last beat settled: it may have found the lease lost.
    return { result, lost };
  }

  private async runOne(job: PgBoss.Job<unknown>): Promise<void> {
    try {
      await this.runJob(job);
    } finally {
      this.computation = null;
    }
  }
}
