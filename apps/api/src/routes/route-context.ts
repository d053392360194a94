import type { Sequelize } from 'sequelize';
import type { Config } from '../config';
import type { JobSender } from '../jobs/job-sender';

/** What mission-scoped routers are built with. */
export interface RouteContext {
  config: Config;
  sequelize: Sequelize;
  /** Puts jobs on the PostgreSQL queue. */
  jobs: JobSender;
}
