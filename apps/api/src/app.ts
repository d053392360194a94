import express, { type Express } from 'express';
import cookieParser from 'cookie-parser';
import { existsSync } from 'node:fs';
import path from 'node:path';
import type { Sequelize } from 'sequelize';
import type { Config } from './config';
import { AppError } from './errors/app-error';
import { errorMiddleware } from './errors/handle-error';
import { requireUser } from './middleware/auth';
import { authRoutes } from './routes/auth-routes';
import { missionRoutes } from './routes/mission-routes';
import { publicRoutes } from './routes/public-routes';
import { openApiRoutes } from './routes/openapi-routes';
import { userRoutes } from './routes/user-routes';
import { vehicleRoutes } from './routes/vehicle-routes';
import { scenarioRoutes } from './routes/scenario-routes';
import { uploadRoutes } from './routes/upload-routes';
import { auditRoutes } from './routes/audit-routes';
import { runRoutes } from './routes/run-routes';
import { resultRoutes } from './routes/result-routes';
import { requirementRoutes } from './routes/requirement-routes';
import { exportRoutes } from './routes/export-routes';
import { studyRoutes } from './routes/study-routes';
import { reviewRoutes } from './routes/review-routes';
import { commentRoutes } from './routes/comment-routes';
import { mailRoutes } from './routes/mail-routes';
import { meshRoutes } from './routes/mesh-routes';
import type { RouteContext } from './routes/route-context';
import type { JobSender } from './jobs/job-sender';
import { createJobSender } from './jobs/pg-boss-sender';

/** Version reported by `/api/health`. */
export const API_VERSION = '0.1.0';

/** Builds the Express application; the caller owns the database connection and the listener. */
export function createApp(config: Config, sequelize: Sequelize, jobs: JobSender = createJobSender(config.PL_DATABASE_URL)): Express {
  const ctx: RouteContext = { config, sequelize, jobs };
  const app = express();
  app.disable('x-powered-by');
  // Behind a reverse proxy the client address (used by the sign-in rate limit) comes from X-Forwarded-For.
  app.set('trust proxy', /^\d+$/.test(config.PL_TRUST_PROXY) ? Number(config.PL_TRUST_PROXY) : config.PL_TRUST_PROXY);

  const api = express.Router();
  api.use(express.json({ limit: '1mb' }));
  api.use(cookieParser());
  api.use(publicRoutes(config, sequelize, API_VERSION));
  api.use(openApiRoutes(API_VERSION));
  api.use(authRoutes(config));
  api.use(requireUser(config.PL_JWT_SECRET));
  api.use(missionRoutes());
  api.use(userRoutes());
  api.use(vehicleRoutes(ctx));
  api.use(scenarioRoutes(ctx));
  api.use(uploadRoutes(ctx));
  api.use(auditRoutes(ctx));
  api.use(runRoutes(ctx));
  api.use(resultRoutes(ctx));
  api.use(requirementRoutes(ctx));
  api.use(exportRoutes(ctx));
  api.use(studyRoutes(ctx));
  api.use(reviewRoutes(ctx));
  api.use(commentRoutes(ctx));
  api.use(mailRoutes(ctx));
  api.use(meshRoutes(ctx));
  api.use((req) => {
    throw new AppError('not_found', `no API route ${req.method} /api${req.path}`);
  });
  api.use(errorMiddleware);
  app.use('/api', api);

  if (config.PL_WEB_DIST) serveWebClient(app, config.PL_WEB_DIST);
  return app;
}

/** Serves the built web client, with index.html for every client-side route. */
function serveWebClient(app: Express, distDir: string): void {
  const indexHtml = path.resolve(distDir, 'index.html');
  if (!existsSync(indexHtml)) throw new Error(`PL_WEB_DIST=${distDir} has no index.html: build the web app first`);
  app.use(express.static(distDir, { index: false, maxAge: '1h', immutable: false }));
  // '/{*splat}' also matches '/' itself, which '/*splat' does not.
  app.get('/{*splat}', (_req, res) => {
    res.setHeader('Cache-Control', 'no-cache');
    res.sendFile(indexHtml);
  });
}
