import type PgBoss from 'pg-boss';
import type { Sequelize } from 'sequelize';
import { takeBackRuns, type RequeuedRun } from './run-lease';
import { reapStaleStudyCases } from './study-case-reaper';
import { reapStaleTableChunks } from './coefficient-table-job';

/**
 * Takes back every running run whose worker has not reported for `staleSeconds` (the worker died,
 * froze or lost the database) and queues it again. Any number of workers may call this at once:
 * the guarded UPDATE gives each run to exactly one of them.
 */
export function reapStaleRuns(sequelize: Sequelize, boss: PgBoss, staleSeconds: number): Promise<RequeuedRun[]> {
  return takeBackRuns(sequelize, boss, {
    where: 'r.heartbeat_at IS NULL OR r.heartbeat_at < now() - make_interval(secs => :staleSeconds)',
    replacements: { staleSeconds },
    reason: `its worker sent no heartbeat for ${staleSeconds} s`,
  });
}

/** A periodic reaper; stop it before closing the database. */
export interface RunReaper {
  stop(): Promise<void>;
}

/**
 * Runs `reapStaleRuns` now and then every `staleSeconds / 2` (1 to 15 s) until stopped;
 * `onRequeued` hears of runs put back on the queue (the worker wakes its loops for them).
 */
export function startRunReaper(sequelize: Sequelize, boss: PgBoss, staleSeconds: number, onRequeued: () => void): RunReaper {
  const intervalMs = Math.min(15_000, Math.max(1_000, (staleSeconds * 1000) / 2));
  let pass: Promise<void> | null = null;
  const tick = () => {
    if (pass) return;
    pass = reapStaleRuns(sequelize, boss, staleSeconds)
      .then(async (runs) => {
        for (const run of runs) console.log(`[worker] run ${run.id} taken back from ${run.workerId ?? 'an unknown worker'}: ${run.status}`);
        // Study cases follow the same lease rule as runs.
        const cases = await reapStaleStudyCases(sequelize, boss, staleSeconds);
        if (cases.length > 0) console.log(`[worker] ${cases.length} study case(s) taken back from workers that stopped reporting`);
        // So do coefficient-table chunks (queued again once, then failed).
        const chunks = await reapStaleTableChunks(sequelize, boss, staleSeconds);
        if (chunks.length > 0) console.log(`[worker] ${chunks.length} coefficient-table chunk(s) taken back from workers that stopped reporting`);
        if (runs.some((r) => r.status === 'queued') || cases.length > 0 || chunks.length > 0) onRequeued();
      })
      // A failed pass (database briefly away) is retried at the next tick.
      .catch((err: unknown) => console.error('[worker] reaper pass failed:', err))
      .finally(() => {
        pass = null;
      });
  };
  const timer = setInterval(tick, intervalMs);
  timer.unref();
  tick();
  return {
    stop: async () => {
      clearInterval(timer);
      await pass;
    },
  };
}
