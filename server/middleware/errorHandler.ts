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
    if (error.status >= 400 && error.status < 500) {
      return { status: error.status, body: { code: 'bad_request', message: 'The request could not be read. Send JSON in UTF-8.' }, log: false };
    }
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
    if (log) logger.error(`${req.method} ${req.originalUrl} failed`, error);
    res.status(status).json({ error: body });
  };
}

/** Unknown /api paths answer JSON rather than the client's index page. */
export const apiNotFound: RequestHandler = (req, res) => {
  res.status(404).json({ error: { code: 'not_found', message: `There is no API route ${req.method} ${req.originalUrl}.` } });
};
