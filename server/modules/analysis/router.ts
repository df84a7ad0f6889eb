import { Router } from 'express';
import { analyze } from '../../domainBridge';
import { requireAuth } from '../../middleware/requireAuth';
import { validate } from '../../middleware/validate';
import { requireValidDocument } from '../designs/documentCheck';
import { analysisBodySchema } from './schemas';

/** POST /api/analysis — runs the domain analysis on a posted document; any signed-in user. */
export function analysisRouter(): Router {
  const router = Router();
  router.post('/', requireAuth, validate({ body: analysisBodySchema }), async (req, res) => {
    const { document } = req.body;
    const design = await requireValidDocument(document);
    res.json({ analysis: analyze(design) });
  });
  return router;
}
