import { randomBytes } from 'node:crypto';
import { mkdirSync } from 'node:fs';
import { availableParallelism } from 'node:os';
import { dirname, join, resolve } from 'node:path';
import { z } from 'zod';
import { DEFAULT_ANALYSIS_MAX_PARTS, DEFAULT_ANALYSIS_TIME_LIMIT_MS } from '../src/domain/checks/findingCap';

/** Settings read once from the environment at start-up; everything else receives this object. */
export interface AppConfig {
  nodeEnv: 'development' | 'production' | 'test';
  port: number;
  host: string;
  /** Absolute path of the SQLite file (its directory exists). */
  databasePath: string;
  sessionSecret: string;
  /** Folder of the built client served in production. */
  clientDist: string;
  /** Express "trust proxy" value: false, true, a hop count, or addresses/names. */
  trustProxy: boolean | number | string;
  logRequests: boolean;
  /** Seed the demo shop when the database has no users yet: only when asked (SEED_DEMO=1; `npm start` asks). */
  seedDemo: boolean;
  /** Limits of POST /api/analysis, which runs in a pool of worker threads. */
  analysis: AnalysisLimits;
  /** Outgoing mail: real SMTP when `smtp` is set; otherwise a local fake server (development, tests). */
  /** `catcher`: with no SMTP, run the local fake SMTP server (default outside production; MAIL_CATCHER=true forces it, e.g. for end-to-end tests). */
  mail: { from: string; smtp: SmtpSettings | null; catcher: boolean };
  /** Base address put into e-mailed links; null means "the address the request came to". */
  publicUrl: string | null;
  /** Folder of uploaded files (outside the served client folder). */
  uploadsDir: string;
  /** Requests per client address per minute on the public read-only link routes (/api/shared). */
  linkRequestsPerMinute: number;
}

export interface SmtpSettings {
  host: string;
  port: number;
  secure: boolean;
  user?: string;
  pass?: string;
}

export interface AnalysisLimits {
  /** Parts (profiles + joints + panels + accessories) above which a document is refused with 413. */
  maxParts: number;
  /** Wall time after which the analysis is stopped and refused with 422, ms. */
  timeLimitMs: number;
  /** Worker threads analysing at once. */
  threads: number;
}

export const DEFAULT_ANALYSIS_LIMITS: AnalysisLimits = {
  maxParts: DEFAULT_ANALYSIS_MAX_PARTS,
  timeLimitMs: DEFAULT_ANALYSIS_TIME_LIMIT_MS,
  threads: Math.max(1, Math.min(4, availableParallelism())),
};

/** Default requests per address per minute on the public link routes. */
export const DEFAULT_LINK_REQUESTS_PER_MINUTE = 600;

const booleanText = z
  .enum(['true', 'false', '1', '0', 'yes', 'no', ''], {
    error: 'Use true or false',
  })
  .transform((text) => text === 'true' || text === '1' || text === 'yes');

const wholeNumber = (min: number, max: number) =>
  z.coerce
    .number({ error: `Use a whole number from ${min} to ${max}` })
    .int(`Use a whole number from ${min} to ${max}`)
    .min(min, `Use a whole number from ${min} to ${max}`)
    .max(max, `Use a whole number from ${min} to ${max}`);

const environmentSchema = z
  .object({
    NODE_ENV: z
      .enum(['development', 'production', 'test'], { error: 'Use development, production or test' })
      .default('development'),
    PORT: z.coerce
      .number({ error: 'Use a whole number between 1 and 65535' })
      .int('Use a whole number between 1 and 65535')
      .min(1, 'Use a whole number between 1 and 65535')
      .max(65535, 'Use a whole number between 1 and 65535')
      .default(3000),
    // Loopback unless told otherwise: a plain start is not reachable from other machines.
    HOST: z.string().min(1, 'Give a host name or address, e.g. 127.0.0.1 or 0.0.0.0').default('127.0.0.1'),
    DATABASE_PATH: z.string().min(1, 'Give a file path for the SQLite database').default('data/slotwise.sqlite'),
    SESSION_SECRET: z.string().optional(),
    CLIENT_DIST: z.string().min(1, 'Give the folder of the built client').default('dist'),
    TRUST_PROXY: z.string().optional(),
    LOG_REQUESTS: booleanText.optional(),
    SEED_DEMO: booleanText.optional(),
    ANALYSIS_MAX_PARTS: wholeNumber(1, 1_000_000).optional(),
    ANALYSIS_TIME_LIMIT_MS: wholeNumber(100, 600_000).optional(),
    ANALYSIS_THREADS: wholeNumber(1, 64).optional(),
    SMTP_HOST: z.string().optional(),
    SMTP_PORT: z.coerce.number({ error: 'Use a whole number between 1 and 65535' }).int().min(1).max(65535).optional(),
    SMTP_SECURE: booleanText.optional(),
    SMTP_USER: z.string().optional(),
    SMTP_PASS: z.string().optional(),
    MAIL_FROM: z.string().optional(),
    MAIL_CATCHER: booleanText.optional(),
    PUBLIC_URL: z.url({ error: 'Give the address people reach Slotwise at, e.g. https://frames.example.com' }).optional(),
    UPLOADS_DIR: z.string().optional(),
    LINK_RATE_LIMIT_PER_MINUTE: wholeNumber(1, 10_000_000).optional(),
  })
  .superRefine((env, ctx) => {
    if (env.NODE_ENV !== 'production') return;
    if (!env.SESSION_SECRET) {
      ctx.addIssue({ code: 'custom', path: ['SESSION_SECRET'], message: 'Required in production: set a random string of at least 32 characters' });
    } else if (env.SESSION_SECRET.length < 32) {
      ctx.addIssue({ code: 'custom', path: ['SESSION_SECRET'], message: 'Use at least 32 characters in production' });
    }
  });

/** Thrown when the environment is unusable; the message lists every problem by variable name. */
export class ConfigError extends Error {
  constructor(message: string) {
    super(message);
    this.name = 'ConfigError';
  }
}

function parseTrustProxy(text: string | undefined): AppConfig['trustProxy'] {
  if (text === undefined || text === '' || text === 'false' || text === '0') return false;
  if (text === 'true') return true;
  if (/^\d+$/.test(text)) return Number(text);
  return text;
}

/**
 * Reads and checks the environment. Creates the database directory. In development and tests
 * a missing SESSION_SECRET is replaced by a random one (sessions then end at restart) with a warning.
 */
export function loadConfig(
  environment: NodeJS.ProcessEnv = process.env,
  warn: (message: string) => void = (message) => console.warn(message),
): AppConfig {
  const parsed = environmentSchema.safeParse(environment);
  if (!parsed.success) {
    const lines = parsed.error.issues.map((issue) => `  ${issue.path.join('.') || '(environment)'}: ${issue.message}`);
    throw new ConfigError(`Slotwise cannot start: the environment has problems.\n${lines.join('\n')}`);
  }
  const env = parsed.data;

  let sessionSecret = env.SESSION_SECRET;
  if (!sessionSecret) {
    sessionSecret = randomBytes(32).toString('hex');
    warn('SESSION_SECRET is not set: using a random one, so sign-ins end when the server restarts.');
  }

  const databasePath = resolve(env.DATABASE_PATH);
  try {
    mkdirSync(dirname(databasePath), { recursive: true });
  } catch (error) {
    throw new ConfigError(
      `Slotwise cannot start: the folder for DATABASE_PATH (${dirname(databasePath)}) cannot be created: ${(error as Error).message}`,
    );
  }

  return {
    nodeEnv: env.NODE_ENV,
    port: env.PORT,
    host: env.HOST,
    databasePath,
    sessionSecret,
    clientDist: resolve(env.CLIENT_DIST),
    trustProxy: parseTrustProxy(env.TRUST_PROXY),
    logRequests: env.LOG_REQUESTS ?? env.NODE_ENV !== 'test',
    // Tests and development get the demo shop; production only when asked.
    seedDemo: env.SEED_DEMO ?? env.NODE_ENV !== 'production',
    analysis: {
      maxParts: env.ANALYSIS_MAX_PARTS ?? DEFAULT_ANALYSIS_LIMITS.maxParts,
      timeLimitMs: env.ANALYSIS_TIME_LIMIT_MS ?? DEFAULT_ANALYSIS_LIMITS.timeLimitMs,
      threads: env.ANALYSIS_THREADS ?? DEFAULT_ANALYSIS_LIMITS.threads,
    },
    mail: {
      from: env.MAIL_FROM || 'Slotwise <no-reply@slotwise.invalid>',
      smtp: env.SMTP_HOST
        ? { host: env.SMTP_HOST, port: env.SMTP_PORT ?? 587, secure: env.SMTP_SECURE ?? false, user: env.SMTP_USER || undefined, pass: env.SMTP_PASS || undefined }
        : null,
      catcher: env.MAIL_CATCHER ?? env.NODE_ENV !== 'production',
    },
    publicUrl: env.PUBLIC_URL ? env.PUBLIC_URL.replace(/\/+$/, '') : null,
    uploadsDir: resolve(env.UPLOADS_DIR || join(dirname(databasePath), 'uploads')),
    linkRequestsPerMinute: env.LINK_RATE_LIMIT_PER_MINUTE ?? DEFAULT_LINK_REQUESTS_PER_MINUTE,
  };
}
