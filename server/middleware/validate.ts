import type { RequestHandler } from 'express';
import type { ParamsDictionary } from 'express-serve-static-core';
import type { ParsedQs } from 'qs';
import type { z } from 'zod';
import { AppError } from './appError';
import { describeZodIssues } from './zodFields';

interface Schemas<P extends z.ZodType, B extends z.ZodType, Q extends z.ZodType> {
  body?: B;
  query?: Q;
  params?: P;
}

/** What a part reads as after `validate`: the schema's output, or Express's default when no schema is given. */
type Parsed<S extends z.ZodType, Default> = unknown extends z.output<S> ? Default : z.output<S>;

/**
 * Parses the request parts with zod and replaces them with the parsed values, so handlers read
 * clean, defaulted data. Any failure becomes a 400 with `fields` and nothing downstream runs.
 */
export function validate<P extends z.ZodType = z.ZodUnknown, B extends z.ZodType = z.ZodUnknown, Q extends z.ZodType = z.ZodUnknown>(
  schemas: Schemas<P, B, Q>,
): RequestHandler<Parsed<P, ParamsDictionary>, unknown, Parsed<B, unknown>, Parsed<Q, ParsedQs>> {
  return (req, _res, next) => {
    for (const part of ['params', 'query', 'body'] as const) {
      const schema = schemas[part];
      if (!schema) continue;
      const input = part === 'body' && req.body === undefined ? undefined : req[part];
      const result = schema.safeParse(input);
      if (!result.success) {
        const { fields, message } = describeZodIssues(result.error.issues, part === 'body' ? '' : part);
        if (part === 'body' && input === undefined) {
          throw new AppError(400, 'invalid_request', 'Send a JSON body with Content-Type: application/json.', { fields });
        }
        throw new AppError(400, 'invalid_request', message, { fields });
      }
      // Express 5 defines req.query as a getter, so it cannot be assigned directly.
      Object.defineProperty(req, part, { value: result.data, writable: true, configurable: true, enumerable: true });
    }
    next();
  };
}
