import type PgBoss from 'pg-boss';
import { QueryTypes, type Sequelize } from 'sequelize';
import { STUDY_CASE_QUEUE } from '../services/study-service';
import { sendJob } from './queue';

/**
 * Takes back every running study case whose worker has not reported for `staleSeconds` (the
 * worker died or froze): queued again with a new job, or cancelled when its study was cancelled,
 * in one transaction. The UPDATE's `status = 'running'` guard gives each case to exactly one of
 * several reapers running at once. Returns the ids queued again.
 */
export async function reapStaleStudyCases(sequelize: Sequelize, boss: PgBoss, staleSeconds: number): Promise<string[]> {
  return sequelize.transaction(async (transaction) => {
    const rows = await sequelize.query<{ id: string; status: string }>(
      `UPDATE study_cases c
          SET status = CASE WHEN s.cancel_requested THEN 'cancelled' ELSE 'queued' END,
              worker_id = NULL, heartbeat_at = NULL, updated_at = now(),
              finished_at = CASE WHEN s.cancel_requested THEN now() ELSE NULL END
         FROM trade_studies s
        WHERE s.id = c.study_id AND c.status = 'running'
          AND (c.heartbeat_at IS NULL OR c.heartbeat_at < now() - make_interval(secs => $1))
        RETURNING c.id, c.status`,
      { bind: [staleSeconds], type: QueryTypes.SELECT, transaction },
    );
    const queued = rows.filter((r) => r.status === 'queued').map((r) => r.id);
    for (const caseId of queued) await sendJob(boss, STUDY_CASE_QUEUE, { caseId }, { inTransaction: { sequelize, transaction } });
    return queued;
  });
}
