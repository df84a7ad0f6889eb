import { Router } from 'express';
import { countDesignParts } from '../../../src/domain/checks/findingCap';
import type { AnalysisLimits } from '../../config';
import { AppError } from '../../middleware/appError';
import { requireAuth } from '../../middleware/requireAuth';
import { validate } from '../../middleware/validate';
import { documentErrorsToAppError } from '../designs/documentCheck';
import { AnalysisBusy, AnalysisTimeout, type AnalysisPool } from './pool';
import { analysisBodySchema } from './schemas';


const thousands = (n: number) => n.toLocaleString('en-US');

/**
 * POST /api/analysis — checks and analyses a posted document in a worker thread; any signed-in user.
 * Refuses documents over the part limit (413) and analyses over the time limit (422).
 */
export function analysisRouter(pool: AnalysisPool, limits: AnalysisLimits): Router {
  const router = Router();
  router.post('/', requireAuth, validate({ body: analysisBodySchema }), async (req, res) => {
    const { document } = req.body;
    const parts = countDesignParts(document);
    if (parts > limits.maxParts) {
      throw new AppError(
        413,
        'analysis_too_large',
        `This design has ${thousands(parts)} parts; the server analyses at most ${thousands(limits.maxParts)} at a time. Split it into smaller designs, or ask your administrator to raise ANALYSIS_MAX_PARTS.`,
        { details: { parts, maxParts: limits.maxParts } },
      );
    }
    let result;
    try {
      result = await pool.run(document);
    } catch (error) {
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
    if (!result.ok) throw documentErrorsToAppError(result.errors);
    res.type('application/json').send(result.json);
  });
  return router;
}
