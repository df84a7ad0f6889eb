import express, { Router } from 'express';
import type { AnalysisLimits } from '../../config';
import { AppError } from '../../middleware/appError';
import { requireAuth } from '../../middleware/requireAuth';
import { documentErrorsToAppError } from '../designs/documentCheck';
import { AnalysisBusy, AnalysisTimeout, type AnalysisPool } from './pool';

const thousands = (n: number) => n.toLocaleString('en-US');

/**
 * POST /api/analysis — checks and analyses a posted document in a worker thread; any signed-in user.
 * Refuses documents over the part limit (413) and analyses over the time limit (422).
 */
export function analysisRouter(pool: AnalysisPool, limits: AnalysisLimits): Router {
  const router = Router();
  // The body stays JSON text here (app.ts skips the JSON parser for this route): parsing and checking
  // a design of thousands of parts takes tens of milliseconds, which the worker spends instead, so
  // the request thread stays free for other requests.
  const bodyText = express.text({ type: 'application/json', limit: '6mb' });
  router.post('/', requireAuth, bodyText, async (req, res) => {
    if (typeof req.body !== 'string') {
      throw new AppError(400, 'invalid_request', 'Send a JSON body with Content-Type: application/json.');
    }
    const gone = new AbortController();
    res.on('close', () => {
      if (!res.writableFinished) gone.abort();
    });
    let result;
    try {
      result = await pool.run(req.body, limits.maxParts, gone.signal);
    } catch (error) {
      if (gone.signal.aborted) return; // nobody is waiting for an answer
      if (error instanceof AnalysisTimeout) {
        throw new AppError(
          422,
          'analysis_too_slow',
          `The analysis of this design took longer than the server's limit of ${thousands(error.limitMs / 1000)} s and was stopped. Look for many parts stacked in one place, or split the design.`,
          { details: { timeLimitMs: error.limitMs } },
        );
      }
      if (error instanceof AnalysisBusy) {
        throw new AppError(503, 'analysis_busy', 'The server is busy analysing other designs. Try again in a moment.', { expected: true });
      }
      throw error;
    }
    if (gone.signal.aborted) return; // nobody is waiting for an answer
    if (result.ok) {
      res.type('application/json').send(result.json);
      return;
    }
    if ('refused' in result) {
      const { code, message, fields } = result.refused;
      throw new AppError(400, code, message, fields ? { fields } : {});
    }
    if ('tooLarge' in result) {
      const { parts } = result.tooLarge;
      throw new AppError(
        413,
        'analysis_too_large',
        `This design has ${thousands(parts)} parts; the server analyses at most ${thousands(limits.maxParts)} at a time. Split it into smaller designs, or ask your administrator to raise ANALYSIS_MAX_PARTS.`,
        { details: { parts, maxParts: limits.maxParts } },
      );
    }
    if ('cancelled' in result) return;
    throw documentErrorsToAppError(result.errors);
  });
  return router;
}
