import express from 'express';
import request from 'supertest';
import { describe, expect, it } from 'vitest';
import { helmetFor, securityHeaders } from '../../server/middleware/securityHeaders';

const headersOf = async (middleware: express.RequestHandler) => {
  const app = express();
  app.disable('x-powered-by');
  app.use(middleware);
  app.get('/', (_req, res) => {
    res.send('ok');
  });
  const response = await request(app).get('/');
  const { date: _date, etag: _etag, ...rest } = response.headers;
  return rest;
};

describe('securityHeaders', () => {
  for (const options of [
    { production: true, behindTls: true },
    { production: true, behindTls: false },
    { production: false, behindTls: false },
  ]) {
    it(`sets exactly the headers helmet sets per request (${JSON.stringify(options)})`, async () => {
      const fixed = await headersOf(securityHeaders(options));
      expect(fixed).toEqual(await headersOf(helmetFor(options)));
      if (options.production) expect(fixed['content-security-policy']).toMatch(/frame-ancestors 'self'/);
      expect(fixed['strict-transport-security'] !== undefined).toBe(options.behindTls);
      expect(fixed['x-content-type-options']).toBe('nosniff');
    });
  }
});
