import { Router } from 'express';
import type { AppConfig } from '../../config';
import { requireRole } from '../../middleware/requireAuth';
import { validate } from '../../middleware/validate';
import { publicBaseUrl } from '../../publicUrl';
import { sendRevisionJson } from '../designs/revisionJson';
import { commentBodySchema, decisionBodySchema, designParamsSchema, inviteBodySchema, reviewQuerySchema } from './schemas';
import type { ReviewsService } from './service';

/** /api/designs/:designId/shares — invite a customer to review (owner, designer). */
export function designSharesRouter(deps: { reviews: ReviewsService; config: AppConfig }): Router {
  const router = Router({ mergeParams: true });
  router.use(requireRole('owner', 'designer'));

  router.get('/', validate({ params: designParamsSchema }), async (req, res) => {
    const { designId } = req.params;
    res.json({ shares: await deps.reviews.shares(req.user!, designId) });
  });

  router.post('/', validate({ params: designParamsSchema, body: inviteBodySchema }), async (req, res) => {
    const { designId } = req.params;
    const result = await deps.reviews.invite(req.user!, designId, req.body, publicBaseUrl(req, deps.config));
    res.status(201).json(result);
  });
  return router;
}

/** /api/reviews — a customer's shared designs; one design's review thread (customer, owner, designer). */
export function reviewsRouter(deps: { reviews: ReviewsService; config: AppConfig }): Router {
  const { reviews, config } = deps;
  const router = Router();

  router.get('/', requireRole('customer'), async (req, res) => {
    res.json({ designs: await reviews.listForCustomer(req.user!) });
  });

  router.route('/:designId').get(requireRole('customer', 'owner', 'designer')).get(validate({ params: designParamsSchema, query: reviewQuerySchema }), async (req, res) => {
    const { designId } = req.params;
    const { revision: number } = req.query;
    const { design, revision, comments, decisions } = await reviews.get(req.user!, designId, number);
    sendRevisionJson(res, { design, comments, decisions }, revision.meta, revision.documentJson);
  });

  router.route('/:designId/comments').post(requireRole('customer', 'owner', 'designer')).post(validate({ params: designParamsSchema, body: commentBodySchema }), async (req, res) => {
    const { designId } = req.params;
    res.status(201).json({ comment: await reviews.comment(req.user!, designId, req.body, publicBaseUrl(req, config)) });
  });

  router.route('/:designId/decisions').post(requireRole('customer')).post(validate({ params: designParamsSchema, body: decisionBodySchema }), async (req, res) => {
    const { designId } = req.params;
    res.status(201).json({ decision: await reviews.decide(req.user!, designId, req.body, publicBaseUrl(req, config)) });
  });

  return router;
}
