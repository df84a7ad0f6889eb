import compression from 'compression';
import express, { type Express } from 'express';
import type { AppConfig } from './config';
import type { Database } from './db/database';
import { serverLogger, type Logger } from './logger';
import { serveClient } from './middleware/clientStatic';
import { csrfGuard } from './middleware/csrfGuard';
import { embeddable } from './middleware/embeddable';
import { apiNotFound, errorHandler } from './middleware/errorHandler';
import { recordSecurityHeaders, securityHeaders } from './middleware/securityHeaders';
import { createHotReads, type HotReads } from './hotReads';
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
import { DESIGN_LIST_ROLES, designsRouter } from './modules/designs/router';
import { createDesignsService } from './modules/designs/service';
import { healthRouter } from './modules/health/router';
import { usersRouter } from './modules/users/router';
import { createUsersService } from './modules/users/service';
import { APP_VERSION } from './version';
import { createPasswordResets } from './modules/auth/passwordReset';
import { passwordResetRouter } from './modules/auth/passwordResetRouter';
import { classesRouter } from './modules/classes/router';
import { createClassesService } from './modules/classes/service';
import { linkLimitOf, linksRouter, sharedRouter, type LinkRateLimit } from './modules/links/router';
import { createLinksService } from './modules/links/service';
import { createMailService, type MailService } from './modules/mail/mailService';
import { outboxRouter } from './modules/mail/router';
import { designSharesRouter, reviewsRouter } from './modules/reviews/router';
import { createReviewsService } from './modules/reviews/service';
import { importRouter, revisionsRouter } from './modules/revisions/router';
import { designUploadsRouter, uploadsRouter } from './modules/uploads/router';
import { createUploadsService } from './modules/uploads/service';

export type { Mailer } from './modules/mail/mailService';

export interface AppDependencies {
  config: AppConfig;
  db: Database;
  logger?: Logger;
  rateLimit?: SignInRateLimit;
  /** bcrypt cost for new password hashes (tests lower it). */
  passwordCost?: number;
  /** Worker threads for POST /api/analysis (tests may pass a fake); default: a pool from config.analysis. */
  analysisPool?: AnalysisPool;
  /** Outgoing mail; by default nodemailer to SMTP from the config, or to the local fake SMTP server. */
  mail?: MailService;
  /** Requests per address on the public link routes (default: config.linkRequestsPerMinute per minute). */
  linkRateLimit?: LinkRateLimit;
}

const sessionStores = new WeakMap<Express, SessionStore>();
const stoppers = new WeakMap<Express, () => Promise<void>>();
const mailServices = new WeakMap<Express, MailService>();

/** The app's mail service (tests read the fake SMTP server's messages through it). */
export function mailServiceOf(app: Express): MailService | undefined {
  return mailServices.get(app);
}
const analysisPools = new WeakMap<Express, AnalysisPool>();
const hotReadsOfApp = new WeakMap<Express, HotReads>();

/** The app's hot reads (tests count the answers served from memory). */
export function hotReadsOf(app: Express): HotReads | undefined {
  return hotReadsOfApp.get(app);
}

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
  const mail = deps.mail ?? createMailService(config, logger);
  const designs = createDesignsService(db);
  const links = createLinksService(db);
  const classes = createClassesService(db, links);
  const resets = createPasswordResets(db, passwords, mail.mailer);
  const reviews = createReviewsService({ db, passwords, resets, mailer: mail.mailer });
  const uploads = createUploadsService(db, config.uploadsDir);
  const signInLimiter = signInRateLimiter(deps.rateLimit ?? DEFAULT_SIGN_IN_RATE_LIMIT);

  const app = express();
  sessionStores.set(app, store);
  analysisPools.set(app, analysisPool);
  mailServices.set(app, mail);
  stoppers.set(app, async () => {
    links.stop();
    await links.flushOpens().catch(() => undefined);
    await mail.stop();
  });
  app.disable('x-powered-by');
  app.set('trust proxy', config.trustProxy);
  app.set('query parser', 'simple');

  const headerOptions = { production, behindTls: config.trustProxy !== false };
  const fixedHeaders = recordSecurityHeaders(headerOptions);
  app.use(securityHeaders(headerOptions, fixedHeaders));
  // API answers carry no-store, so an ETag would only cost a hash of every body.
  app.set('etag', false);

  // The designs list and link reads, repeated from memory ahead of the router (see hotReads.ts).
  const linkLimit = linkLimitOf(deps.linkRateLimit ?? { max: config.linkRequestsPerMinute, windowMs: 60_000 });
  const hotReads = createHotReads({
    db,
    securityHeaders: fixedHeaders,
    listRoles: DESIGN_LIST_ROLES,
    linkLimit,
    countLinkOpen: links.countOpen,
    trustProxy: app.get('trust proxy fn'),
    requestLog: config.logRequests ? logger : undefined,
  });
  hotReadsOfApp.set(app, hotReads);
  const handle = app.handle.bind(app);
  app.handle = (req, res, callback) => hotReads.serve(req, res, () => handle(req, res, callback));
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

  // POST /api/analysis reads its body as text and parses it in a worker thread (see its router).
  const jsonBody = express.json({ limit: '6mb' });
  app.use('/api', (req, res, next) => (req.method === 'POST' && /^\/analysis\/?$/i.test(req.path) ? next() : jsonBody(req, res, next)));
  app.use('/api', (_req, res, next) => {
    res.setHeader('Cache-Control', 'no-store');
    next();
  });
  app.use('/api/health', healthRouter(db, APP_VERSION, logger));
  // Read-only links need no session and never write: mounted before sessions and the CSRF guard.
  app.use('/api/shared', sharedRouter({ links, limit: linkLimit, hotReads }));
  app.use('/api', csrfGuard, sessions, passport.initialize(), passport.session(), hotReads.rememberSignedIn);

  app.use('/api/auth/password-reset', passwordResetRouter({ resets, config, limiter: signInLimiter }));
  app.use('/api/auth', authRouter({ auth, passport, signInLimiter }));
  app.use('/api/users', usersRouter(createUsersService(db, passwords)));
  app.use('/api/outbox', outboxRouter(mail));
  app.use('/api/links', linksRouter({ links, designs, mailer: mail.mailer, config }));
  app.use('/api/classes', classesRouter({ classes, config }));
  app.use('/api/reviews', reviewsRouter({ reviews, config }));
  app.use('/api/uploads', uploadsRouter(uploads));
  app.use('/api/designs/import', importRouter(designs));
  app.use('/api/designs/:designId/shares', designSharesRouter({ reviews, config }));
  app.use('/api/designs/:designId/uploads', designUploadsRouter(uploads));
  app.use('/api/designs/:designId', revisionsRouter({ db, designs }));
  const builds = createBuildsService(db);
  app.use('/api/designs', designsRouter(designs, { builderMayRead: builds.builderMayRead, hotReads }));
  app.use('/api/builds', buildsRouter(builds));
  app.use('/api/analysis', analysisRouter(analysisPool, config.analysis));
  app.use('/api', apiNotFound);

  // The link viewer page may be embedded in an iframe anywhere; every other page keeps frame-ancestors 'self'.
  app.use('/view', embeddable);
  if (production) serveClient(app, config.clientDist, logger);

  app.use(errorHandler(logger));
  return app;
}

/** Stops the app's background work (expired-session sweeps, analysis threads, link counters, mail) before the database closes. */
export function stopBackgroundWork(app: Express): Promise<void> {
  sessionStores.get(app)?.stopExpiringSessions();
  return Promise.all([analysisPools.get(app)?.close(), stoppers.get(app)?.()]).then(() => undefined);
}
