import type { ErrorRequestHandler, RequestHandler } from 'express';
import { UniqueConstraintError, ValidationError as SequelizeValidationError, ForeignKeyConstraintError } from 'sequelize';
import { ZodError } from 'zod';
import type { Logger } from '../logger';
import { AppError } from './appError';
import { describeZodIssues } from './zodFields';

interface ErrorBody {
  code: string;
  message: string;
  fields?: Record<string, string>;
  [extra: string]: unknown;
}

const INTERNAL_MESSAGE = 'Something went wrong on our side. Try again in a moment; if it keeps happening, tell your administrator.';

/** Errors thrown by express.json (body-parser) carry a `type` and a `status`. */
function isBodyParserError(error: unknown): error is { type: string; status: number; message: string } {
  return typeof error === 'object' && error !== null && 'type' in error && typeof (error as { status?: unknown }).status === 'number';
}

/**
 * Any other error that carries a 4xx status (`status` or `statusCode`, as http-errors makes them):
 * the router's "Failed to decode param", serve-static's bad paths, body-parser's decoding errors.
 */
function clientErrorStatus(error: unknown): number | undefined {
  if (typeof error !== 'object' || error === null) return undefined;
  const { status, statusCode } = error as { status?: unknown; statusCode?: unknown };
  const value = typeof status === 'number' ? status : typeof statusCode === 'number' ? statusCode : undefined;
  return value !== undefined && value >= 400 && value < 500 ? value : undefined;
}

const BODY_ERROR_MESSAGES: Record<string, { code: string; message: string }> = {
  'encoding.unsupported': { code: 'unsupported_encoding', message: 'The request body uses a Content-Encoding the server does not accept. Send it plain, gzip, deflate or br.' },
  'charset.unsupported': { code: 'unsupported_charset', message: 'The request body uses a character set the server does not accept. Send JSON in UTF-8.' },
  'request.aborted': { code: 'request_aborted', message: 'The request body was cut off before it was complete.' },
  'request.size.invalid': { code: 'bad_request', message: 'The request body is not as long as its Content-Length says.' },
};

function toResponse(error: unknown): { status: number; body: ErrorBody; log: boolean } {
  if (error instanceof AppError) {
    const body: ErrorBody = { code: error.code, message: error.message };
    if (error.fields) body.fields = error.fields;
    for (const [key, value] of Object.entries(error.details ?? {})) if (!(key in body)) body[key] = value;
    return { status: error.status, body, log: !error.expected };
  }
  if (error instanceof ZodError) {
    const { fields, message } = describeZodIssues(error.issues);
    return { status: 400, body: { code: 'invalid_request', message, fields }, log: false };
  }
  if (error instanceof UniqueConstraintError) {
    const fields = Object.fromEntries(error.errors.map((item) => [item.path ?? 'value', 'This value is already taken']));
    return { status: 409, body: { code: 'conflict', message: 'That value is already taken.', fields }, log: false };
  }
  if (error instanceof SequelizeValidationError) {
    const fields = Object.fromEntries(error.errors.map((item) => [item.path ?? 'value', item.message]));
    return { status: 400, body: { code: 'invalid_request', message: 'Please correct the highlighted fields.', fields }, log: false };
  }
  if (error instanceof ForeignKeyConstraintError) {
    return { status: 409, body: { code: 'conflict', message: 'That refers to something that no longer exists.' }, log: false };
  }
  if (isBodyParserError(error)) {
    if (error.type === 'entity.parse.failed') {
      return { status: 400, body: { code: 'malformed_json', message: 'The request body is not valid JSON.' }, log: false };
    }
    if (error.type === 'entity.too.large') {
      return { status: 413, body: { code: 'payload_too_large', message: 'The request is too large (the limit is 6 MB).' }, log: false };
    }
    const known = BODY_ERROR_MESSAGES[error.type];
    if (known && error.status >= 400 && error.status < 500) return { status: error.status, body: known, log: false };
  }
  if (error instanceof URIError || /failed to decode/i.test(String((error as Error | null)?.message))) {
    return { status: 400, body: { code: 'bad_address', message: 'The address has broken percent-encoding (such as %ff). Check the link and try again.' }, log: false };
  }
  const clientStatus = clientErrorStatus(error);
  if (clientStatus !== undefined) {
    const message =
      clientStatus === 400
        ? 'The request could not be read: its body does not match its Content-Encoding, or it is not JSON in UTF-8.'
        : clientStatus === 404
          ? 'Not found.'
          : 'The request could not be handled as sent.';
    return { status: clientStatus, body: { code: clientStatus === 404 ? 'not_found' : 'bad_request', message }, log: false };
  }
  return { status: 500, body: { code: 'internal', message: INTERNAL_MESSAGE }, log: true };
}

/** The one place errors become responses: known kinds map to 4xx, anything else is logged and hidden. */
export function errorHandler(logger: Logger): ErrorRequestHandler {
  return (error, req, res, next) => {
    if (res.headersSent) {
      next(error);
      return;
    }
    const { status, body, log } = toResponse(error);
    // The URL is a field, never part of the message: it may hold %s, %c or escape sequences.
    if (log) logger.error('Request failed', { method: req.method, url: req.originalUrl, status, err: error });
    res.status(status).json({ error: body });
  };
}

/** Unknown /api paths answer JSON rather than the client's index page. */
export const apiNotFound: RequestHandler = (req, res) => {
  res.status(404).json({ error: { code: 'not_found', message: `There is no API route ${req.method} ${req.originalUrl}.` } });
};
