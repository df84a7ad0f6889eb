import { pino, type DestinationStream, type Logger as PinoLogger } from 'pino';

/**
 * The few logging calls the server makes; tests pass a silent or recording logger.
 * `details` is an Error (logged as `err`) or an object of fields (`{ url, method, err }`); the
 * message is always a fixed text, never a format string built from request data.
 */
export interface Logger {
  info(message: string, details?: unknown): void;
  warn(message: string, details?: unknown): void;
  error(message: string, details?: unknown): void;
}

function fieldsOf(details: unknown): Record<string, unknown> | undefined {
  if (details === undefined) return undefined;
  if (details instanceof Error) return { err: details };
  if (typeof details === 'object' && details !== null && !Array.isArray(details)) return details as Record<string, unknown>;
  return { details };
}

/** Wraps a pino logger in the server's Logger: one JSON line per entry, request data as fields. */
export function loggerFromPino(base: PinoLogger): Logger {
  const write = (level: 'info' | 'warn' | 'error') => (message: string, details?: unknown) => {
    const fields = fieldsOf(details);
    if (fields) base[level](fields, '%s', message);
    else base[level]('%s', message);
  };
  return { info: write('info'), warn: write('warn'), error: write('error') };
}

/** A structured (JSON lines) logger with pino's standard serialisers for errors. */
export function createLogger(options: { level?: string; destination?: DestinationStream } = {}): Logger {
  const base = pino(
    { level: options.level ?? process.env.LOG_LEVEL ?? 'info', base: undefined, serializers: { err: pino.stdSerializers.err } },
    options.destination ?? pino.destination({ fd: 1, sync: true }),
  );
  return loggerFromPino(base);
}

let shared: Logger | undefined;
/** The process's logger (stdout, JSON lines), created on first use. */
export const serverLogger: Logger = {
  info: (message, details) => (shared ??= createLogger()).info(message, details),
  warn: (message, details) => (shared ??= createLogger()).warn(message, details),
  error: (message, details) => (shared ??= createLogger()).error(message, details),
};
/** Kept for callers written before the structured logger. */
export const consoleLogger = serverLogger;

export const silentLogger: Logger = { info() {}, warn() {}, error() {} };
