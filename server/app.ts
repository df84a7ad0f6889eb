import compression from 'compression';
import express, { type Express } from 'express';
import type { AppConfig } from './config';
import type { Database } from './db/database';
import { serverLogger, type Logger } from './logger';
import { serveClient } from './middleware/clientStatic';
import { csrfGuard } from './middleware/csrfGuard';
import { apiNotFound, errorHandler } from './middleware/errorHandler';
import { securityHeaders } from './middleware/securityHeaders';
import { createAnalysisPool, type AnalysisPool } from './modules/analysis/pool';
import { analysisRouter } from './modules/analysis/router';
import { createPassport } from './modules/auth/passport';
import { createPasswords, DEFAULT_PASSWORD_COST } from './modules/auth/passwords';
import { authRouter } from './modules/auth/router';
import { createAuthService } from './modules/auth/service';
import { createSessionMiddleware, type SessionStore } from './modules/auth/sessionMiddleware';
import { DEFAULT_SIGN_IN_RATE_LIMIT, signInRateLimiter, type SignInRateLimit } from './modules/auth/signInRateLimit';
import { buildsRouter } from './modules/builds/router';
import { createBuildsService } from './modules/builds/service';
import { designsRouter } from './modules/designs/router';
import { createDesignsService } from './modules/designs/service';
import { healthRouter } from './modules/health/router';
import { usersRouter } from './modules/users/router';
import { createUsersService } from './modules/users/service';
import { APP_VERSION } from './version';

/** Outgoing mail; a local fake stands in until the mail module lands. */
export interface Mailer {
  send(message: { to: string; subject: string; text: string }): Promise<void>;
}

export interface AppDependencies {
  config: AppConfig;
  db: Database;
  logger?: Logger;
  rateLimit?: SignInRateLimit;
  /** bcrypt cost for new password hashes (tests lower it). */
  passwordCost?: number;
  mailer?: Mailer;
  /** Worker threads for POST /api/analysis (tests may pass a fake); default: a pool from config.analysis. */
  analysisPool?: AnalysisPool;
}

const sessionStores = new WeakMap<Express, SessionStore>();
const analysisPools = new WeakMap<Express, AnalysisPool>();

/** Builds the whole HTTP application without listening, so tests can drive it on a temporary database. */
export function createApp(deps: AppDependencies): Express {
  const { config, db } = deps;
  const logger = deps.logger ?? serverLogger;
  const analysisPool = deps.analysisPool ?? createAnalysisPool(config.analysis);
  const production = config.nodeEnv === 'production';
  const passwords = createPasswords(deps.passwordCost ?? DEFAULT_PASSWORD_COST);
  const auth = createAuthService(db, passwords);
  const passport = createPassport(auth);
  const { middleware: sessions, store } = createSessionMiddleware(db, config.sessionSecret);

  const app = express();
  sessionStores.set(app, store);
  analysisPools.set(app, analysisPool);
  app.disable('x-powered-by');
  app.set('trust proxy', config.trustProxy);
  app.set('query parser', 'simple');

  app.use(securityHeaders({ production, behindTls: config.trustProxy !== false }));
  // API answers are JSON built per request (a save echoes a ~1 MB document): gzip's fastest level
  // takes about a third less time for ~20 % more bytes there; static files keep the default level.
  const compressApi = compression({ level: 1 });
  const compressFiles = compression();
  app.use((req, res, next) => (req.path.startsWith('/api/') ? compressApi : compressFiles)(req, res, next));
  if (config.logRequests) {
    // One structured line per request; the URL is a field, so nothing in it can rewrite the log.
    app.use((req, res, next) => {
      const started = process.hrtime.bigint();
      res.on('finish', () => {
        const ms = Number(process.hrtime.bigint() - started) / 1e6;
        logger.info('Request', { method: req.method, url: req.originalUrl, status: res.statusCode, ms: Math.round(ms * 10) / 10 });
      });
      next();
    });
  }

  app.use('/api', express.json({ limit: '6mb' }));
  app.use('/api', (_req, res, next) => {
    res.setHeader('Cache-Control', 'no-store');
    next();
  });
  app.use('/api/health', healthRouter(db, APP_VERSION, logger));
  app.use('/api', csrfGuard, sessions, passport.initialize(), passport.session());

  app.use('/api/auth', authRouter({ auth, passport, signInLimiter: signInRateLimiter(deps.rateLimit ?? DEFAULT_SIGN_IN_RATE_LIMIT) }));
  app.use('/api/users', usersRouter(createUsersService(db, passwords)));
  const builds = createBuildsService(db);
  app.use('/api/designs', designsRouter(createDesignsService(db), { builderMayRead: builds.builderMayRead }));
  app.use('/api/builds', buildsRouter(builds));
  app.use('/api/analysis', analysisRouter(analysisPool, config.analysis));
  app.use('/api', apiNotFound);

  if (production) serveClient(app, config.clientDist, logger);

  app.use(errorHandler(logger));
  return app;
}

/** Stops the app's background work (expired-session sweeps, analysis threads) before the database closes. */
export function stopBackgroundWork(app: Express): Promise<void> {
  sessionStores.get(app)?.stopExpiringSessions();
  return analysisPools.get(app)?.close() ?? Promise.resolve();
}
